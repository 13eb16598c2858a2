package eluvia.ui.internal.fields;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * Numbers as the workbench shows and reads them: plain decimal notation with a point, no
 * grouping, up to six significant figures (scientific notation for very small or large values).
 */
public final class Numbers {

    /** Significant figures of numbers in fields. */
    public static final int FIELD_DIGITS = 6;
    /** Significant figures of results. */
    public static final int RESULT_DIGITS = 3;

    private Numbers() {
    }

    /** A number as a user would type it, six significant figures. */
    public static String format(double value) {
        return format(value, FIELD_DIGITS);
    }

    /** A number with the given significant figures, trailing zeros dropped. */
    public static String format(double value, int significantDigits) {
        if (Double.isNaN(value)) {
            return "\u2013";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "\u221e" : "-\u221e";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(value).round(new MathContext(significantDigits));
        double abs = Math.abs(value);
        if (abs >= 1e-4 && abs < 1e9) {
            String s = d.stripTrailingZeros().toPlainString();
            return s;
        }
        String s = String.format(Locale.ROOT, "%." + (significantDigits - 1) + "e", value);
        String mantissa = s.substring(0, s.indexOf('e'));
        String exponent = s.substring(s.indexOf('e') + 1);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        int e = Integer.parseInt(exponent);
        return mantissa + "e" + e;
    }

    /**
     * Reads a number typed by the user: decimal point, optional exponent, surrounding blanks
     * ignored. Commas are not accepted (they are ambiguous between decimal and grouping marks).
     *
     * @return the number, or NaN when the text is not a number
     */
    public static double parse(String text) {
        if (text == null) {
            return Double.NaN;
        }
        String t = text.trim();
        if (t.isEmpty() || !t.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) {
            return Double.NaN;
        }
        try {
            return Double.parseDouble(t);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    /** Whether two stored values are the same number for editing purposes (relative 1e-12). */
    public static boolean same(double a, double b) {
        if (a == b) {
            return true;
        }
        return Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
    }
}
