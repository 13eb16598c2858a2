package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * One unit rate of a {@link PriceBook}.
 *
 * @param id          unique key within the book, e.g. {@code "haul-contaminated"}
 * @param description what the rate pays for
 * @param unit        the unit the rate is per
 * @param ratePerUnit rate in {@code currency} per {@code unit}, 0 or more
 * @param currency    currency label, the book's
 * @param sourceNote  where the rate comes from (quote, database, year, location)
 * @param invented    true for the invented rates of the shipped example; such a rate must never
 *                    reach a real estimate, and every estimate using one carries a caution
 */
public record PriceItem(String id, String description, CostUnit unit, double ratePerUnit, String currency,
        String sourceNote, boolean invented) {

    /** Checks the fields. */
    public PriceItem {
        Checks.text("price item id", id);
        Checks.text("description of price item '" + id + "'", description);
        Checks.notNull("unit of price item '" + id + "'", unit);
        Checks.nonNegative("ratePerUnit of price item '" + id + "' (currency per " + (unit == null ? "?" : unit.symbol())
                + ")", ratePerUnit);
        Checks.text("currency of price item '" + id + "'", currency);
        Checks.text("sourceNote of price item '" + id + "'", sourceNote);
    }

    /** The rate as money per one {@link #unit()}. */
    public Money rate() {
        return new Money(ratePerUnit, currency);
    }
}
