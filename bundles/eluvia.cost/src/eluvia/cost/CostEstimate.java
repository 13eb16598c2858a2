package eluvia.cost;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

import eluvia.cost.internal.Checks;

/**
 * A priced take-off: lines, capital, annual O&amp;M and periodic costs with their markups, present
 * value and accuracy range. Made by {@link EstimateRecipe#price(QuantitySet)}. All money in the price
 * book's currency.
 *
 * <p>Every number traces back: {@link #trace()} lists each line as quantity x rate with the
 * quantity's source, then the markups and present-value factors with their rules.
 *
 * @param recipe          the recipe priced
 * @param quantities      the take-off priced
 * @param lines           the priced lines, in recipe order
 * @param operatingYears  years of annual O&amp;M (years 1 to n)
 * @param capital         capital cost (year 0)
 * @param annual          annual O&amp;M cost, each year 1 to n
 * @param periodic        periodic costs by year
 * @param cautions        cautions (invented rates)
 */
public record CostEstimate(EstimateRecipe recipe, QuantitySet quantities, List<LineItem> lines, int operatingYears,
        CapitalCost capital, OperatingCost annual, SortedMap<Integer, OperatingCost> periodic,
        List<Caution> cautions) {

    /** Copies the collections. */
    public CostEstimate {
        lines = List.copyOf(lines);
        periodic = Collections.unmodifiableSortedMap(new TreeMap<>(periodic));
        cautions = List.copyOf(cautions);
    }

    /** Prices {@code quantities} with {@code recipe}. */
    public static CostEstimate of(EstimateRecipe recipe, QuantitySet quantities) {
        Checks.notNull("estimate recipe", recipe);
        Checks.notNull("quantities", quantities);
        String currency = recipe.priceBook().currency();
        List<LineItem> lines = new ArrayList<>();
        Money capital = Money.zero(currency);
        Money annual = Money.zero(currency);
        SortedMap<Integer, Money> periodicSubtotals = new TreeMap<>();
        boolean invented = false;
        for (LineSpec spec : recipe.lines()) {
            LineItem line = LineItem.price(spec, recipe.priceBook().item(spec.priceItemId()),
                    quantities.get(spec.quantityName()));
            lines.add(line);
            invented |= line.item().invented();
            switch (spec.category()) {
                case CAPITAL -> capital = capital.plus(line.cost());
                case ANNUAL_OPERATION_AND_MAINTENANCE -> annual = annual.plus(line.cost());
                case PERIODIC -> periodicSubtotals.merge(spec.year(), line.cost(), Money::plus);
            }
        }
        SortedMap<Integer, OperatingCost> periodic = new TreeMap<>();
        for (Map.Entry<Integer, Money> e : periodicSubtotals.entrySet()) {
            periodic.put(e.getKey(), OperatingCost.of(e.getValue(), recipe.operatingMarkups()));
        }
        List<Caution> cautions = new ArrayList<>();
        if (invented) {
            cautions.add(new Caution(Caution.INVENTED_RATES, "This estimate uses unit rates invented for the example "
                    + "price book '" + recipe.priceBook().name() + "'. They are not market rates: supply your own "
                    + "before using any figure."));
        }
        return new CostEstimate(recipe, quantities, lines, recipe.operatingPeriod().years(quantities),
                CapitalCost.of(capital, recipe.capitalMarkups()), OperatingCost.of(annual, recipe.operatingMarkups()),
                periodic, cautions);
    }

    /** The currency of every amount. */
    public String currency() {
        return recipe.priceBook().currency();
    }

    /** Real discount rate, % per year. */
    public double discountRatePercent() {
        return recipe.discountRatePercent();
    }

    /** P/A at the discount rate over the operating years (dimensionless). */
    public double seriesFactor() {
        return PresentValue.seriesFactor(recipe.discountRatePercent(), operatingYears);
    }

    /** Present value of the annual O&amp;M: total annual x P/A. */
    public Money presentValueOfAnnual() {
        return annual.total().times(seriesFactor());
    }

    /** Present value of the periodic costs: sum of each year's total x P/F(year). */
    public Money presentValueOfPeriodic() {
        Money sum = Money.zero(currency());
        for (Map.Entry<Integer, OperatingCost> e : periodic.entrySet()) {
            sum = sum.plus(e.getValue().total().times(PresentValue.singleFactor(recipe.discountRatePercent(), e.getKey())));
        }
        return sum;
    }

    /** Undiscounted sum of the periodic totals. */
    public Money periodicTotal() {
        Money sum = Money.zero(currency());
        for (OperatingCost c : periodic.values()) {
            sum = sum.plus(c.total());
        }
        return sum;
    }

    /** Present value at the start of work: total capital + PV of annual O&amp;M + PV of periodic costs. */
    public Money presentValue() {
        return capital.total().plus(presentValueOfAnnual()).plus(presentValueOfPeriodic());
    }

    /** Low end of the present value by the recipe's accuracy range. */
    public Money presentValueLow() {
        return recipe.accuracy().low(presentValue());
    }

    /** High end of the present value by the recipe's accuracy range. */
    public Money presentValueHigh() {
        return recipe.accuracy().high(presentValue());
    }

    /** The trace: each line with its quantity source, the markups, factors and their rules. */
    public List<String> trace() {
        List<String> t = new ArrayList<>();
        t.add("Estimate '" + recipe.name() + "', price book '" + recipe.priceBook().name() + "', currency " + currency());
        for (LineItem line : lines) {
            t.add(line.trace() + " => " + line.cost());
        }
        CapitalMarkups cm = recipe.capitalMarkups();
        t.add("capital subtotal " + capital.subtotal() + "; scope contingency " + cm.scopeContingencyPercent()
                + " % and bid contingency " + cm.bidContingencyPercent() + " % of the subtotal => "
                + capital.scopeContingency() + " + " + capital.bidContingency());
        t.add("professional/technical services on subtotal with contingency " + capital.subtotalWithContingency()
                + ": project management " + cm.projectManagementPercent() + " %, remedial design "
                + cm.remedialDesignPercent() + " %, construction management " + cm.constructionManagementPercent()
                + " % => " + capital.professionalServices() + "; total capital " + capital.total());
        OperatingMarkups om = recipe.operatingMarkups();
        t.add("annual O&M subtotal " + annual.subtotal() + "; contingency " + om.contingencyPercent()
                + " %, project management " + om.projectManagementPercent() + " %, technical support "
                + om.technicalSupportPercent() + " % => total annual " + annual.total() + " for years 1 to "
                + operatingYears);
        for (Map.Entry<Integer, OperatingCost> e : periodic.entrySet()) {
            t.add("periodic, year " + e.getKey() + ": subtotal " + e.getValue().subtotal() + " => total "
                    + e.getValue().total() + ", P/F = " + PresentValue.singleFactor(recipe.discountRatePercent(), e.getKey()));
        }
        t.add("present value at " + recipe.discountRatePercent() + " % real per year"
                + (recipe.usesDefaultDiscountRate() ? " (" + PresentValue.DEFAULT_RATE_RULE + ")" : " (user input)")
                + ": P/A = [(1+i)^n - 1]/[i(1+i)^n] = " + seriesFactor() + " for n = " + operatingYears
                + "; P/F = (1+i)^-n; present value " + presentValue());
        AccuracyRange a = recipe.accuracy();
        t.add("accuracy " + a.lowPercent() + " % / +" + a.highPercent() + " % (" + a.source() + ", "
                + a.status().label() + ") => " + presentValueLow() + " to " + presentValueHigh());
        for (Caution c : cautions) {
            t.add("CAUTION: " + c.text());
        }
        return t;
    }
}
