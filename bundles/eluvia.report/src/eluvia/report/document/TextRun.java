package eluvia.report.document;

/**
 * A stretch of paragraph text set in one {@link Emphasis}.
 *
 * @param text     the text (not empty; may be white space between two emphasised runs)
 * @param emphasis how it is set
 */
public record TextRun(String text, Emphasis emphasis) {

    public TextRun {
        if (text == null || text.isEmpty()) {
            throw new ReportContentException("text run", text == null ? "missing (null)" : "empty", "at least one character",
                    null);
        }
        ReportContentException.requireNonNull("emphasis of text run \"" + text + "\"", emphasis);
    }
}
