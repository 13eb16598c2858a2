package eluvia.cost;

/**
 * Percentages added to each annual O&amp;M and periodic subtotal: contingency (% of the subtotal),
 * then project management and technical support (% of subtotal plus contingency), as the US EPA /
 * USACE (2000) guide lays out O&amp;M costs (as remembered, not re-checked against the guide). Inputs
 * in [0, 100].
 *
 * @param contingencyPercent       contingency, % of the subtotal
 * @param projectManagementPercent project management, % of subtotal plus contingency
 * @param technicalSupportPercent  technical support, % of subtotal plus contingency
 */
public record OperatingMarkups(double contingencyPercent, double projectManagementPercent,
        double technicalSupportPercent) {

    /** Checks the fields. */
    public OperatingMarkups {
        CapitalMarkups.percent("O&M contingencyPercent", contingencyPercent);
        CapitalMarkups.percent("O&M projectManagementPercent", projectManagementPercent);
        CapitalMarkups.percent("O&M technicalSupportPercent", technicalSupportPercent);
    }

    /** No markups. */
    public static OperatingMarkups none() {
        return new OperatingMarkups(0, 0, 0);
    }
}
