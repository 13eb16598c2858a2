package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * One line of an {@link EstimateRecipe}: which price item to apply to which quantity, as which kind
 * of cost.
 *
 * @param priceItemId  id of the rate in the recipe's price book
 * @param quantityName name of the quantity in the take-off being priced
 * @param category     capital, annual O&amp;M or periodic
 * @param year         year a periodic cost falls in (0 to 1000); 0 for capital and annual lines
 */
public record LineSpec(String priceItemId, String quantityName, CostCategory category, int year) {

    /** Checks the fields. */
    public LineSpec {
        Checks.text("price item id", priceItemId);
        Checks.text("quantity name", quantityName);
        Checks.notNull("cost category", category);
        if (category == CostCategory.PERIODIC) {
            if (year < 0 || year > 1000) {
                throw new CostInputException("year of periodic line '" + priceItemId + "'", year, "[0, 1000]");
            }
        } else if (year != 0) {
            throw new CostInputException("year of " + category + " line '" + priceItemId + "'", year, "0",
                    "only periodic costs fall in a given year; capital is year 0 and annual O&M years 1 to n");
        }
    }

    /** A capital line. */
    public static LineSpec capital(String priceItemId, String quantityName) {
        return new LineSpec(priceItemId, quantityName, CostCategory.CAPITAL, 0);
    }

    /** An annual O&amp;M line; the quantity is per year of operation. */
    public static LineSpec annual(String priceItemId, String quantityName) {
        return new LineSpec(priceItemId, quantityName, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE, 0);
    }

    /** A periodic line falling in {@code year}. */
    public static LineSpec periodic(String priceItemId, String quantityName, int year) {
        return new LineSpec(priceItemId, quantityName, CostCategory.PERIODIC, year);
    }
}
