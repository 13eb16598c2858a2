package eluvia.cost;

/**
 * An input to a quantity take-off or cost estimate outside its allowed range.
 *
 * <p>The message names the quantity (with its unit), the value given, the allowed range and, where
 * it is not obvious, the fix, so that a caller at the bundle boundary can show it to the engineer
 * unchanged, e.g. {@code swellFraction = 25.0 is outside the allowed range [0, 1]: enter the swell
 * as a fraction of the bank volume (0.25 for 25 %)}.
 */
public class CostInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String quantity;
    private final String value;
    private final String allowedRange;

    /**
     * @param quantity     name of the offending quantity with its unit, e.g. {@code depthMetres}
     * @param value        the value that was given
     * @param allowedRange the allowed range in words, e.g. {@code "greater than 0 and finite"}
     */
    public CostInputException(String quantity, Object value, String allowedRange) {
        this(quantity, value, allowedRange, null);
    }

    /**
     * @param quantity     name of the offending quantity with its unit
     * @param value        the value that was given
     * @param allowedRange the allowed range in words
     * @param fix          what the engineer should do, or {@code null} when it is obvious
     */
    public CostInputException(String quantity, Object value, String allowedRange, String fix) {
        super(quantity + " = " + value + " is outside the allowed range " + allowedRange
                + (fix == null ? "" : ": " + fix));
        this.quantity = quantity;
        this.value = String.valueOf(value);
        this.allowedRange = allowedRange;
    }

    /** The name of the offending quantity, with its unit where it has one. */
    public String quantity() {
        return quantity;
    }

    /** The value that was given, as text. */
    public String value() {
        return value;
    }

    /** The allowed range in words. */
    public String allowedRange() {
        return allowedRange;
    }
}
