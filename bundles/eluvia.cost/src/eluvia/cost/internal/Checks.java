package eluvia.cost.internal;

import eluvia.cost.CostInputException;

/** Argument checks that throw {@link CostInputException} with the quantity, value and range. */
public final class Checks {
    private Checks() {
    }

    /** Throws unless {@code value} is finite and strictly positive. Returns the value. */
    public static double positive(String quantity, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new CostInputException(quantity, value, "(0, infinity): greater than 0 and finite");
        }
        return value;
    }

    /** Throws unless {@code value} is finite and not negative. Returns the value. */
    public static double nonNegative(String quantity, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new CostInputException(quantity, value, "[0, infinity): 0 or greater and finite");
        }
        return value;
    }

    /** Throws unless {@code lo <= value <= hi}. Returns the value. */
    public static double closed(String quantity, double value, double lo, double hi, String fix) {
        if (!(value >= lo && value <= hi)) {
            throw new CostInputException(quantity, value, "[" + lo + ", " + hi + "]", fix);
        }
        return value;
    }

    /** Throws unless {@code lo <= value < hi}. Returns the value. */
    public static double closedOpen(String quantity, double value, double lo, double hi, String fix) {
        if (!(value >= lo && value < hi)) {
            throw new CostInputException(quantity, value, "[" + lo + ", " + hi + ")", fix);
        }
        return value;
    }

    /** Throws unless {@code lo < value <= hi}. Returns the value. */
    public static double openClosed(String quantity, double value, double lo, double hi, String fix) {
        if (!(value > lo && value <= hi)) {
            throw new CostInputException(quantity, value, "(" + lo + ", " + hi + "]", fix);
        }
        return value;
    }

    /** Throws unless {@code value} is not null. Returns the value. */
    public static <T> T notNull(String quantity, T value) {
        if (value == null) {
            throw new CostInputException(quantity, "null", "a value (not null)");
        }
        return value;
    }

    /** Throws unless {@code value} is neither null nor blank. Returns the value. */
    public static String text(String quantity, String value) {
        if (value == null || value.isBlank()) {
            throw new CostInputException(quantity, value == null ? "null" : "\"" + value + "\"",
                    "non-blank text");
        }
        return value;
    }
}
