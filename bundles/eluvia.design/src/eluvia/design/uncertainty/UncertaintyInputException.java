package eluvia.design.uncertainty;

/**
 * An input to an uncertainty study (a distribution parameter, a rank correlation, a setting of the
 * simulation, a name) outside its allowed range.
 *
 * <p>The message names the quantity (and the uncertain input it belongs to), the value given, the
 * allowed range and, where it is not obvious, the fix, so that the workbench and the command line
 * can show it to the engineer unchanged.
 */
public class UncertaintyInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String quantity;
    private final String value;
    private final String allowedRange;

    /**
     * @param quantity     the offending quantity, e.g. {@code "standard deviation of input 'porosity'"}
     * @param value        the value that was given
     * @param allowedRange the allowed range in words, optionally followed by the fix
     */
    public UncertaintyInputException(String quantity, Object value, String allowedRange) {
        super(quantity + " = " + value + " is outside the allowed range: " + allowedRange);
        this.quantity = quantity;
        this.value = String.valueOf(value);
        this.allowedRange = allowedRange;
    }

    /** The offending quantity, naming the input it belongs to where there is one. */
    public String quantity() {
        return quantity;
    }

    /** The value that was given, as text. */
    public String value() {
        return value;
    }

    /** The allowed range in words, optionally followed by the fix. */
    public String allowedRange() {
        return allowedRange;
    }

    /** The same problem, with {@code context} (e.g. {@code "input 'porosity'"}) added to the quantity. */
    UncertaintyInputException in(String context) {
        return new UncertaintyInputException(quantity + " of " + context, value, allowedRange);
    }

    static double requireFinite(String quantity, double value) {
        if (!Double.isFinite(value)) {
            throw new UncertaintyInputException(quantity, value, "a finite number");
        }
        return value;
    }

    static double requirePositive(String quantity, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new UncertaintyInputException(quantity, value, "greater than 0 and finite");
        }
        return value;
    }

    static <T> T requireNonNull(String quantity, T value) {
        if (value == null) {
            throw new UncertaintyInputException(quantity, null, "must be given (not null)");
        }
        return value;
    }

    static String requireName(String quantity, String name) {
        if (name == null || name.isBlank()) {
            throw new UncertaintyInputException(quantity, name == null ? null : "\"" + name + "\"",
                    "a non-blank name");
        }
        return name;
    }
}
