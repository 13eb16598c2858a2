package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * One alternative for the side-by-side comparison: its quantities, duration and costs.
 *
 * @param kind                 flushing, excavation or hybrid
 * @param durationCalendarDays calendar days from start of work to the cleanup level, 0 or more
 * @param estimate             the priced take-off (its quantities are the alternative's)
 */
public record AlternativeSummary(AlternativeKind kind, double durationCalendarDays, CostEstimate estimate) {

    /** Checks the fields. */
    public AlternativeSummary {
        Checks.notNull("alternative kind", kind);
        Checks.nonNegative("durationCalendarDays", durationCalendarDays);
        Checks.notNull("cost estimate", estimate);
    }

    /** The alternative's name (the estimate's). */
    public String name() {
        return estimate.recipe().name();
    }

    /** The quantities priced. */
    public QuantitySet quantities() {
        return estimate.quantities();
    }

    /** Total capital cost. */
    public Money capital() {
        return estimate.capital().total();
    }

    /** Total annual O&amp;M cost. */
    public Money annualOperationAndMaintenance() {
        return estimate.annual().total();
    }

    /** Present value. */
    public Money presentValue() {
        return estimate.presentValue();
    }

    /** Low end of the present value. */
    public Money presentValueLow() {
        return estimate.presentValueLow();
    }

    /** High end of the present value. */
    public Money presentValueHigh() {
        return estimate.presentValueHigh();
    }
}
