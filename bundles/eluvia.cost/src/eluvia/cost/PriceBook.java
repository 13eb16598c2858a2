package eluvia.cost;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import eluvia.cost.internal.Checks;

/**
 * A named set of unit rates in one currency. Immutable.
 *
 * <p>The shipped example ({@link ExamplePriceBook}) has invented rates; users supply their own
 * (vendor quotes, cost databases, past bids), each with a source note.
 */
public final class PriceBook {
    private final String name;
    private final String currency;
    private final Map<String, PriceItem> items;

    /**
     * @param name     name of the book, e.g. {@code "2027 regional quotes"}
     * @param currency currency of every item
     * @param items    the rates, unique ids, all in {@code currency}
     */
    public PriceBook(String name, String currency, List<PriceItem> items) {
        this.name = Checks.text("price book name", name);
        this.currency = Checks.text("price book currency", currency);
        Checks.notNull("price items", items);
        Map<String, PriceItem> map = new LinkedHashMap<>();
        for (PriceItem item : items) {
            Checks.notNull("price item", item);
            if (!item.currency().equals(currency)) {
                throw new CostInputException("currency of price item '" + item.id() + "'", item.currency(),
                        "the book currency " + currency, "one book holds one currency; this bundle does not convert");
            }
            if (map.putIfAbsent(item.id(), item) != null) {
                throw new CostInputException("price item id", "\"" + item.id() + "\"", "unique within the book");
            }
        }
        this.items = Collections.unmodifiableMap(map);
    }

    /** The book's name. */
    public String name() {
        return name;
    }

    /** The currency of every rate. */
    public String currency() {
        return currency;
    }

    /** All items in the order given. */
    public List<PriceItem> items() {
        return List.copyOf(items.values());
    }

    /** The item with this id; throws, listing the ids there are, if there is none. */
    public PriceItem item(String id) {
        PriceItem item = items.get(id);
        if (item == null) {
            throw new CostInputException("price item id", "\"" + id + "\"", "one of " + items.keySet(),
                    "add the item to price book '" + name + "' or correct the id");
        }
        return item;
    }

    /** Whether any item is marked invented. */
    public boolean hasInventedRates() {
        return items.values().stream().anyMatch(PriceItem::invented);
    }
}
