package eluvia.report.internal;

import java.util.Locale;

/** Small helpers for writing HTML: escaping and number formatting with units. */
public final class Html {

    private Html() {
    }

    /** Escapes text for HTML element content and attribute values. */
    public static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
            case '<' -> b.append("&lt;");
            case '>' -> b.append("&gt;");
            case '&' -> b.append("&amp;");
            case '"' -> b.append("&quot;");
            case '\'' -> b.append("&#39;");
            default -> b.append(c);
            }
        }
        return b.toString();
    }

    /** A number to {@code sig} significant figures, grouped thousands, or an en dash for NaN. */
    public static String num(double v, int sig) {
        if (Double.isNaN(v)) {
            return "\u2013";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "\u221e" : "-\u221e";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e-3 && a < 1e9) {
            int decimals = Math.max(0, sig - 1 - (int) Math.floor(Math.log10(a)));
            return String.format(Locale.ROOT, "%,." + decimals + "f", v);
        }
        return String.format(Locale.ROOT, "%." + (sig - 1) + "e", v);
    }
}
