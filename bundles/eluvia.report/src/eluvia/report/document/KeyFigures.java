package eluvia.report.document;

import java.util.List;

/**
 * A row (or rows) of headline numbers set as cards.
 *
 * @param figures the cards in reading order (1 to 12)
 */
public record KeyFigures(List<KeyFigure> figures) implements Block {

    /** The most cards one block holds; more would no longer be "key". */
    public static final int MAX_FIGURES = 12;

    public KeyFigures {
        ReportContentException.requireNonNull("key figures", figures);
        figures = List.copyOf(figures);
        if (figures.isEmpty() || figures.size() > MAX_FIGURES) {
            throw new ReportContentException("number of key figures", Integer.toString(figures.size()),
                    "1 to " + MAX_FIGURES, figures.isEmpty() ? null : "split them into two blocks or move some to a table");
        }
    }

    public static KeyFigures of(KeyFigure... figures) {
        return new KeyFigures(List.of(figures));
    }
}
