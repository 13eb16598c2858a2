package eluvia.zone;

/**
 * An input to a zone calculation (a sample, the block model, an estimator setting, a cleanup
 * level) outside its allowed range.
 *
 * <p>The message names the quantity with its unit, the value given, the allowed range and, where
 * it is not obvious, what to do about it, so that the design pipeline can show it to the engineer
 * unchanged.
 */
public class ZoneInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String quantity;
    private final String value;
    private final String allowedRange;

    /**
     * @param quantity     the name of the offending quantity, with its unit where it has one
     * @param value        the value that was given
     * @param allowedRange the allowed range in words, optionally followed by the fix
     */
    public ZoneInputException(String quantity, Object value, String allowedRange) {
        super(quantity + " = " + value + " is outside the allowed range: " + allowedRange);
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

    /** The allowed range in words, e.g. "greater than 0 and finite". */
    public String allowedRange() {
        return allowedRange;
    }

    /** Throws unless {@code value} is finite and strictly positive; returns the value. */
    public static double requirePositive(String quantity, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new ZoneInputException(quantity, value, "greater than 0 and finite");
        }
        return value;
    }

    /** Throws unless {@code value} is finite and not negative; returns the value. */
    public static double requireNonNegative(String quantity, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new ZoneInputException(quantity, value, "0 or greater and finite");
        }
        return value;
    }

    /** Throws unless {@code value} is finite (any sign); returns the value. */
    public static double requireFinite(String quantity, double value) {
        if (!Double.isFinite(value)) {
            throw new ZoneInputException(quantity, value, "a finite number");
        }
        return value;
    }

    /** Throws unless {@code value >= min}; returns the value. */
    public static int requireAtLeast(String quantity, int value, int min) {
        if (value < min) {
            throw new ZoneInputException(quantity, value, min + " or greater");
        }
        return value;
    }

    /** Throws unless {@code value} is not null; returns the value. */
    public static <T> T requireNonNull(String quantity, T value) {
        if (value == null) {
            throw new ZoneInputException(quantity, null, "must be given (not null)");
        }
        return value;
    }
}
