package eluvia.cost;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import eluvia.cost.internal.Checks;

/**
 * An ordered set of {@link Quantity} values with unique names: the take-off of one alternative.
 *
 * <p>The excavation and flushing take-offs produce one each ({@link ExcavationQuantities#toQuantitySet()},
 * {@link FlushingQuantities#toQuantitySet()}); a hybrid alternative merges them with
 * {@link #merge(QuantitySet)}; an {@link EstimateRecipe} prices one. Immutable.
 */
public final class QuantitySet {
    private final Map<String, Quantity> byName;

    private QuantitySet(Map<String, Quantity> byName) {
        this.byName = Collections.unmodifiableMap(byName);
    }

    /** A set of the given quantities; throws if two share a name. */
    public static QuantitySet of(List<Quantity> quantities) {
        Checks.notNull("quantities", quantities);
        Map<String, Quantity> map = new LinkedHashMap<>();
        for (Quantity q : quantities) {
            Checks.notNull("quantity", q);
            if (map.putIfAbsent(q.name(), q) != null) {
                throw new CostInputException("quantity name", "\"" + q.name() + "\"",
                        "unique within one take-off", "rename one of the two quantities with this name");
            }
        }
        return new QuantitySet(map);
    }

    /** A set of the given quantities; throws if two share a name. */
    public static QuantitySet of(Quantity... quantities) {
        return of(List.of(quantities));
    }

    /** The quantity with this name; throws, listing the names there are, if there is none. */
    public Quantity get(String name) {
        Quantity q = byName.get(name);
        if (q == null) {
            throw new CostInputException("quantity name", "\"" + name + "\"",
                    "one of the take-off's names " + byName.keySet(),
                    "add the quantity to the take-off or correct the name in the estimate line");
        }
        return q;
    }

    /** Whether a quantity of this name is present. */
    public boolean contains(String name) {
        return byName.containsKey(name);
    }

    /** All quantities in insertion order. */
    public List<Quantity> all() {
        return List.copyOf(byName.values());
    }

    /** This set plus {@code quantity}; throws if the name is taken. */
    public QuantitySet with(Quantity quantity) {
        List<Quantity> list = new ArrayList<>(byName.values());
        list.add(quantity);
        return of(list);
    }

    /** This set followed by {@code other}; throws if a name is in both. */
    public QuantitySet merge(QuantitySet other) {
        Checks.notNull("quantities to merge", other);
        List<Quantity> list = new ArrayList<>(byName.values());
        list.addAll(other.byName.values());
        return of(list);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof QuantitySet other && byName.equals(other.byName);
    }

    @Override
    public int hashCode() {
        return byName.hashCode();
    }

    @Override
    public String toString() {
        return byName.values().toString();
    }
}
