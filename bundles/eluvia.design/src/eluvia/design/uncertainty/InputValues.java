package eluvia.design.uncertainty;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The values of all inputs for one evaluation of a model (one Monte Carlo run or one tornado
 * case), by input name; each value is in the unit of its {@link UncertainInput}. Immutable.
 */
public final class InputValues {
    private final List<String> names;
    private final Map<String, Integer> indexByName;
    private final double[] values;

    InputValues(List<String> names, Map<String, Integer> indexByName, double[] values) {
        this.names = names;
        this.indexByName = indexByName;
        this.values = values;
    }

    /**
     * Values from a map (in iteration order), e.g. to evaluate a model once outside a simulation.
     *
     * @param valuesByName finite values by input name
     */
    public static InputValues of(Map<String, Double> valuesByName) {
        UncertaintyInputException.requireNonNull("input values", valuesByName);
        List<String> names = new ArrayList<>(valuesByName.size());
        double[] values = new double[valuesByName.size()];
        for (Map.Entry<String, Double> entry : valuesByName.entrySet()) {
            UncertaintyInputException.requireName("name of an input value", entry.getKey());
            Double value = UncertaintyInputException.requireNonNull("value of input '" + entry.getKey() + "'",
                    entry.getValue());
            values[names.size()] = UncertaintyInputException.requireFinite(
                    "value of input '" + entry.getKey() + "'", value);
            names.add(entry.getKey());
        }
        return new InputValues(List.copyOf(names), indexOf(names), values);
    }

    static Map<String, Integer> indexOf(List<String> names) {
        Map<String, Integer> index = new HashMap<>();
        for (int i = 0; i < names.size(); i++) {
            index.put(names.get(i), i);
        }
        return Collections.unmodifiableMap(index);
    }

    /**
     * The value of the named input, in its unit.
     *
     * @throws UncertaintyInputException if there is no input of that name
     */
    public double get(String name) {
        Integer index = indexByName.get(name);
        if (index == null) {
            throw new UncertaintyInputException("input name", name, "one of " + names);
        }
        return values[index];
    }

    /** Whether there is an input of that name. */
    public boolean contains(String name) {
        return indexByName.containsKey(name);
    }

    /** The input names, in the order of the study. */
    public List<String> names() {
        return names;
    }

    /** The values by name, in the order of the study (a copy). */
    public Map<String, Double> asMap() {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < names.size(); i++) {
            map.put(names.get(i), values[i]);
        }
        return Collections.unmodifiableMap(map);
    }

    @Override
    public String toString() {
        return asMap().toString();
    }
}
