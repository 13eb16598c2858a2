package eluvia.report.document;

import java.util.List;

/**
 * A caution box: something the reader must know before relying on the numbers (limits of the
 * method, permits, safety rules to follow where the site is).
 *
 * @param title      a short heading, e.g. "Flushed water must be captured and treated"
 * @param paragraphs the explanation (at least one paragraph)
 */
public record Caution(String title, List<Paragraph> paragraphs) implements Block {

    public Caution {
        ReportContentException.requireText("caution title", title);
        ReportContentException.requireNonNull("paragraphs of caution \"" + title + "\"", paragraphs);
        paragraphs = List.copyOf(paragraphs);
        if (paragraphs.isEmpty()) {
            throw new ReportContentException("caution \"" + title + "\"", "without text", "at least one paragraph", null);
        }
    }

    /** A caution with one paragraph of light mark-up (see {@link Paragraph#marked(String)}). */
    public static Caution of(String title, String markedText) {
        return new Caution(title, List.of(Paragraph.marked(markedText)));
    }
}
