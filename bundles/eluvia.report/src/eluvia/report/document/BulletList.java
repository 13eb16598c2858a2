package eluvia.report.document;

import java.util.Arrays;
import java.util.List;

/**
 * An unordered list of short paragraphs.
 *
 * @param items the items in order (at least one)
 */
public record BulletList(List<Paragraph> items) implements Block {

    public BulletList {
        ReportContentException.requireNonNull("items of a bullet list", items);
        items = List.copyOf(items);
        if (items.isEmpty()) {
            throw new ReportContentException("bullet list", "empty", "at least one item", null);
        }
    }

    /** A list of plain-text items (see {@link Paragraph#of(String)}). */
    public static BulletList of(String... plainItems) {
        return new BulletList(Arrays.stream(plainItems).map(Paragraph::of).toList());
    }

    /** A list of items in light mark-up (see {@link Paragraph#marked(String)}). */
    public static BulletList marked(String... markedItems) {
        return new BulletList(Arrays.stream(markedItems).map(Paragraph::marked).toList());
    }
}
