package eluvia.report.pdf;

import java.util.Map;

/**
 * Maps text to the characters the PDF's standard Helvetica fonts can show (Windows code page 1252:
 * Latin letters with accents, the typographic quotes and dashes, x, the degree, micro, squared and
 * cubed signs...). Greek letters used as symbols become their names (theta, rho), relations become
 * ASCII ("<=", ">="), sub- and superscript digits become plain digits; anything else left becomes
 * "?". Standard fonts need no embedding, so every PDF reader shows the same text.
 */
final class PdfText {

    private static final Map<Character, String> REPLACEMENTS = Map.ofEntries(Map.entry('\u03b1', "alpha"),
            Map.entry('\u03b2', "beta"), Map.entry('\u03b3', "gamma"), Map.entry('\u03b4', "delta"),
            Map.entry('\u0394', "Delta"), Map.entry('\u03b5', "epsilon"), Map.entry('\u03b8', "theta"),
            Map.entry('\u03ba', "kappa"), Map.entry('\u03bb', "lambda"), Map.entry('\u03bc', "\u00b5"),
            Map.entry('\u03bd', "nu"), Map.entry('\u03c0', "pi"), Map.entry('\u03c1', "rho"), Map.entry('\u03c3', "sigma"),
            Map.entry('\u03a3', "Sigma"), Map.entry('\u03c4', "tau"), Map.entry('\u03c6', "phi"), Map.entry('\u03c9', "omega"),
            Map.entry('\u03a9', "Omega"), Map.entry('\u2264', "<="), Map.entry('\u2265', ">="), Map.entry('\u2260', "!="),
            Map.entry('\u2248', "~"), Map.entry('\u2212', "-"), Map.entry('\u2010', "-"), Map.entry('\u2011', "-"),
            Map.entry('\u2192', "->"), Map.entry('\u2190', "<-"), Map.entry('\u221e', "infinity"), Map.entry('\u221a', "sqrt"),
            Map.entry('\u2070', "0"), Map.entry('\u2074', "4"), Map.entry('\u2075', "5"), Map.entry('\u2076', "6"),
            Map.entry('\u2077', "7"), Map.entry('\u2078', "8"), Map.entry('\u2079', "9"), Map.entry('\u207b', "-"),
            Map.entry('\u2080', "0"), Map.entry('\u2081', "1"), Map.entry('\u2082', "2"), Map.entry('\u2083', "3"),
            Map.entry('\u2084', "4"), Map.entry('\u2085', "5"), Map.entry('\u2086', "6"), Map.entry('\u2087', "7"),
            Map.entry('\u2088', "8"), Map.entry('\u2089', "9"), Map.entry('\u2009', " "), Map.entry('\u202f', " "),
            Map.entry('\u00a0', "\u00a0"), Map.entry('\u2022', "\u2022"));

    private PdfText() {
    }

    /** The text with every character the standard fonts lack replaced (see the class comment). */
    static String map(String text) {
        StringBuilder b = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (inCp1252(c)) {
                if (b != null) {
                    b.append(c);
                }
                continue;
            }
            if (b == null) {
                b = new StringBuilder(text.length() + 16);
                b.append(text, 0, i);
            }
            String r = REPLACEMENTS.get(c);
            b.append(r != null ? r : "?");
        }
        return b == null ? text : b.toString();
    }

    /** Whether code page 1252 (the encoding of the standard fonts here) has the character. */
    static boolean inCp1252(char c) {
        if (c == '\n' || c == '\t' || (c >= 0x20 && c < 0x7f) || (c >= 0xa0 && c <= 0xff)) {
            return true;
        }
        return "\u20ac\u201a\u0192\u201e\u2026\u2020\u2021\u02c6\u2030\u0160\u2039\u0152\u017d\u2018\u2019\u201c\u201d\u2022\u2013\u2014\u02dc\u2122\u0161\u203a\u0153\u017e\u0178"
                .indexOf(c) >= 0;
    }
}
