package eluvia.transport;

/**
 * An input to a transport calculation outside its physical or numerical range.
 *
 * <p>The message names the quantity, the value given and the allowed range, so that a caller at
 * the bundle boundary can show it to the engineer unchanged.
 */
public class TransportInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String quantity;
    private final String value;
    private final String allowedRange;

    public TransportInputException(String quantity, Object value, String allowedRange) {
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

    /** The allowed range in words, e.g. "greater than 0" or "(0, porosity]". */
    public String allowedRange() {
        return allowedRange;
    }

    /** Throws unless {@code value} is finite and strictly positive. Returns the value. */
    public static double requirePositive(String quantity, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new TransportInputException(quantity, value, "greater than 0 and finite");
        }
        return value;
    }

    /** Throws unless {@code value} is finite and not negative. Returns the value. */
    public static double requireNonNegative(String quantity, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new TransportInputException(quantity, value, "0 or greater and finite");
        }
        return value;
    }

    /** Throws unless {@code lo < value < hi}. Returns the value. */
    public static double requireOpenInterval(String quantity, double value, double lo, double hi) {
        if (!(value > lo && value < hi)) {
            throw new TransportInputException(quantity, value, "between " + lo + " and " + hi + ", both excluded");
        }
        return value;
    }
}
