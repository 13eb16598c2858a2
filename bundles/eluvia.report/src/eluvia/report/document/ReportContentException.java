package eluvia.report.document;

/**
 * Thrown when a document, a block or a chart is given content that cannot be written: a blank
 * heading, a table row with the wrong number of cells, a figure id that is not a safe file name, a
 * non-finite number in a chart. The message names the item, the value given, what is allowed and,
 * where it is not obvious, the fix.
 */
public final class ReportContentException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /**
     * @param item    what was wrong, e.g. "table row 3"
     * @param value   the value given, as text
     * @param allowed what is allowed, e.g. "exactly 4 cells, one per column"
     * @param fix     how to put it right, or null where the allowed range says it all
     */
    public ReportContentException(String item, String value, String allowed, String fix) {
        super(item + " is " + value + "; allowed: " + allowed + (fix == null ? "" : ". " + fix));
    }

    /** Throws unless {@code text} has a character that is not white space. Returns the text. */
    static String requireText(String item, String text) {
        if (text == null || text.isBlank()) {
            throw new ReportContentException(item, text == null ? "missing (null)" : "blank (\"" + text + "\")",
                    "text with at least one visible character", null);
        }
        return text;
    }

    /** Returns null for null, otherwise the text if it is not blank; blank text throws. */
    static String optionalText(String item, String text) {
        if (text == null) {
            return null;
        }
        return requireText(item, text);
    }

    /** Throws if {@code value} is null. */
    static <T> T requireNonNull(String item, T value) {
        if (value == null) {
            throw new ReportContentException(item, "missing (null)", "a value", null);
        }
        return value;
    }
}
