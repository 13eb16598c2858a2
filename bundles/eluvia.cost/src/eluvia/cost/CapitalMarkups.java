package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * Percentages added to the capital subtotal, in the order of the US EPA / USACE (2000)
 * feasibility-study costing guide (EPA 540-R-00-002).
 *
 * <p>Scope and bid contingency are per cent of the capital subtotal; project management, remedial
 * design and construction management (the professional and technical services) are per cent of the
 * subtotal plus contingency. The guide's worked examples lay the estimate out this way (as
 * remembered, not re-checked against the guide); its recommended percentages depend on the project
 * and are not built in: they are inputs, in [0, 100].
 *
 * @param scopeContingencyPercent       scope contingency, % of the capital subtotal
 * @param bidContingencyPercent         bid contingency, % of the capital subtotal
 * @param projectManagementPercent      project management, % of subtotal plus contingency
 * @param remedialDesignPercent         remedial design, % of subtotal plus contingency
 * @param constructionManagementPercent construction management, % of subtotal plus contingency
 */
public record CapitalMarkups(double scopeContingencyPercent, double bidContingencyPercent,
        double projectManagementPercent, double remedialDesignPercent, double constructionManagementPercent) {

    /** Checks the fields. */
    public CapitalMarkups {
        percent("scopeContingencyPercent", scopeContingencyPercent);
        percent("bidContingencyPercent", bidContingencyPercent);
        percent("projectManagementPercent", projectManagementPercent);
        percent("remedialDesignPercent", remedialDesignPercent);
        percent("constructionManagementPercent", constructionManagementPercent);
    }

    /** No markups. */
    public static CapitalMarkups none() {
        return new CapitalMarkups(0, 0, 0, 0, 0);
    }

    static double percent(String name, double value) {
        return Checks.closed(name, value, 0.0, 100.0, "enter per cent (15 for 15 %)");
    }
}
