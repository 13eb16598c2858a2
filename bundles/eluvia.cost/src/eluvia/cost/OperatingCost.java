package eluvia.cost;

/**
 * An annual O&amp;M or a periodic cost: subtotal, contingency, project management, technical support.
 * All in the price book's currency.
 *
 * @param subtotal          sum of the lines
 * @param contingency       contingency (per cent of the subtotal)
 * @param projectManagement project management (per cent of subtotal plus contingency)
 * @param technicalSupport  technical support (per cent of subtotal plus contingency)
 */
public record OperatingCost(Money subtotal, Money contingency, Money projectManagement, Money technicalSupport) {

    /** Marks up {@code subtotal} with {@code markups}. */
    public static OperatingCost of(Money subtotal, OperatingMarkups markups) {
        Money contingency = subtotal.percent(markups.contingencyPercent());
        Money base = subtotal.plus(contingency);
        return new OperatingCost(subtotal, contingency, base.percent(markups.projectManagementPercent()),
                base.percent(markups.technicalSupportPercent()));
    }

    /** Total. */
    public Money total() {
        return subtotal.plus(contingency).plus(projectManagement).plus(technicalSupport);
    }
}
