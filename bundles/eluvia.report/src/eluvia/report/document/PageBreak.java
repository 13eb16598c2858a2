package eluvia.report.document;

/**
 * A hint that the next block should start a new page when printed. The PDF starts a new page; the
 * HTML asks the browser to break there when printing.
 */
public record PageBreak() implements Block {

    /** The one value there is need for. */
    public static final PageBreak HINT = new PageBreak();
}
