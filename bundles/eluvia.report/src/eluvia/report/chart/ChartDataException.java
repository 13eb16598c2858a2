package eluvia.report.chart;

/**
 * Thrown when a chart is given data it cannot draw: a non-finite number, series of unequal
 * length, a non-positive value on a logarithmic axis. The message names the item, the value, what
 * is allowed and, where it is not obvious, the fix.
 */
public final class ChartDataException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    public ChartDataException(String item, String value, String allowed, String fix) {
        super(item + " is " + value + "; allowed: " + allowed + (fix == null ? "" : ". " + fix));
    }

    static String requireText(String item, String text) {
        if (text == null || text.isBlank()) {
            throw new ChartDataException(item, text == null ? "missing (null)" : "blank", "text with a visible character",
                    null);
        }
        return text;
    }

    /** Null or empty becomes "" (no title); other text must not be blank. */
    static String optionalTitle(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        return requireText("chart title", text);
    }

    static <T> T requireNonNull(String item, T value) {
        if (value == null) {
            throw new ChartDataException(item, "missing (null)", "a value", null);
        }
        return value;
    }

    static double finite(String item, double value) {
        if (!Double.isFinite(value)) {
            throw new ChartDataException(item, Double.toString(value), "a finite number", null);
        }
        return value;
    }

    static double[] finiteCopy(String item, double[] values) {
        requireNonNull(item, values);
        for (int i = 0; i < values.length; i++) {
            finite(item + " [" + i + "]", values[i]);
        }
        return values.clone();
    }

    static void positive(String item, double value, String fix) {
        if (!(value > 0)) {
            throw new ChartDataException(item, Double.toString(value), "greater than 0 (the axis is logarithmic)", fix);
        }
    }
}
