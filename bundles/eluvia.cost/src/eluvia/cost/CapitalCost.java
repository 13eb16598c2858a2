package eluvia.cost;

/**
 * The capital cost of an estimate, laid out as in US EPA / USACE (2000): subtotal, contingency,
 * professional and technical services, total. All in the price book's currency.
 *
 * @param subtotal               sum of the capital lines
 * @param scopeContingency       scope contingency (per cent of the subtotal)
 * @param bidContingency         bid contingency (per cent of the subtotal)
 * @param projectManagement      project management (per cent of subtotal plus contingency)
 * @param remedialDesign         remedial design (per cent of subtotal plus contingency)
 * @param constructionManagement construction management (per cent of subtotal plus contingency)
 */
public record CapitalCost(Money subtotal, Money scopeContingency, Money bidContingency, Money projectManagement,
        Money remedialDesign, Money constructionManagement) {

    /** Marks up {@code subtotal} with {@code markups}. */
    public static CapitalCost of(Money subtotal, CapitalMarkups markups) {
        Money scope = subtotal.percent(markups.scopeContingencyPercent());
        Money bid = subtotal.percent(markups.bidContingencyPercent());
        Money base = subtotal.plus(scope).plus(bid);
        return new CapitalCost(subtotal, scope, bid, base.percent(markups.projectManagementPercent()),
                base.percent(markups.remedialDesignPercent()), base.percent(markups.constructionManagementPercent()));
    }

    /** Subtotal plus both contingencies. */
    public Money subtotalWithContingency() {
        return subtotal.plus(scopeContingency).plus(bidContingency);
    }

    /** Professional and technical services: project management + remedial design + construction management. */
    public Money professionalServices() {
        return projectManagement.plus(remedialDesign).plus(constructionManagement);
    }

    /** Total capital cost. */
    public Money total() {
        return subtotalWithContingency().plus(professionalServices());
    }
}
