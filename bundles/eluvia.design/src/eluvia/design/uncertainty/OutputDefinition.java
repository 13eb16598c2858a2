package eluvia.design.uncertainty;

/**
 * One named output of a model, with its unit (e.g. {@code "pore volumes"} in {@code "1"},
 * {@code "duration"} in {@code "d"}, {@code "cost of flushing"} in the currency of the price book).
 *
 * @param name a unique, non-blank name within a study
 * @param unit the unit of the output's values; {@code "1"} for a dimensionless output
 */
public record OutputDefinition(String name, String unit) {
    /** Checks the name and the unit. */
    public OutputDefinition {
        UncertaintyInputException.requireName("name of an output", name);
        if (unit == null || unit.isBlank()) {
            throw new UncertaintyInputException("unit of output '" + name + "'", unit == null ? null : "\"" + unit + "\"",
                    "a non-blank unit, e.g. \"d\"; write \"1\" for a dimensionless output");
        }
    }
}
