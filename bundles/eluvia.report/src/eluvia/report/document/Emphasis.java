package eluvia.report.document;

/** How a run of paragraph text is set: plain, emphasised (italic) or strong (bold). */
public enum Emphasis {
    /** Upright, regular weight. */
    PLAIN,
    /** Italic: a term, a symbol, a title. */
    EMPHASIS,
    /** Bold: a figure or a warning the reader must not miss. */
    STRONG
}
