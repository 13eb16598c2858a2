package eluvia.cost;

import java.util.Locale;

/**
 * A priced line: quantity x unit rate, with the trace line -&gt; quantity -&gt; source.
 *
 * @param spec     the recipe line it comes from
 * @param item     the unit rate applied
 * @param quantity the quantity priced (same unit as the rate)
 * @param cost     quantity amount x rate, in the book's currency
 */
public record LineItem(LineSpec spec, PriceItem item, Quantity quantity, Money cost) {

    /** Prices {@code quantity} at {@code item}; throws if their units differ. */
    public static LineItem price(LineSpec spec, PriceItem item, Quantity quantity) {
        if (item.unit() != quantity.unit()) {
            throw new CostInputException("unit of quantity '" + quantity.name() + "'", quantity.unit().symbol(),
                    "the unit of price item '" + item.id() + "', " + item.unit().symbol(),
                    "price the quantity with a rate in the same unit, or use the quantity in that unit");
        }
        return new LineItem(spec, item, quantity, item.rate().times(quantity.amount()));
    }

    /** One line of text that takes a reviewer from the cost back to the source of its quantity. */
    public String trace() {
        return String.format(Locale.ROOT, "%s: %s = %.4f %s x %.4f %s/%s [rate: %s%s]; quantity '%s' from: %s",
                spec.category() == CostCategory.PERIODIC ? "periodic, year " + spec.year()
                        : spec.category().name().toLowerCase(Locale.ROOT).replace('_', ' '),
                item.description(), quantity.amount(), quantity.unit().symbol(), item.ratePerUnit(), item.currency(),
                item.unit().symbol(), item.sourceNote(), item.invented() ? ", INVENTED" : "", quantity.name(),
                quantity.source());
    }
}
