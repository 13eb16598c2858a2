package eluvia.report.document;

import java.util.List;

/**
 * A numbered section of a {@link Document}: a heading at a level (1 = chapter, 2, 3) and its blocks.
 * Sections are listed flat in reading order; the level says how they nest. Renderers number them
 * (1, 1.1, 1.1.1) from the levels.
 *
 * @param heading the heading, without a number
 * @param level   1, 2 or 3
 * @param blocks  the content (may be empty, e.g. for a chapter that only holds sub-sections)
 */
public record Section(String heading, int level, List<Block> blocks) {

    /** The deepest level a section may have. */
    public static final int MAX_LEVEL = 3;

    public Section {
        ReportContentException.requireText("section heading", heading);
        if (level < 1 || level > MAX_LEVEL) {
            throw new ReportContentException("level of section \"" + heading + "\"", Integer.toString(level),
                    "1 to " + MAX_LEVEL, null);
        }
        ReportContentException.requireNonNull("blocks of section \"" + heading + "\"", blocks);
        blocks = List.copyOf(blocks);
        for (Block b : blocks) {
            ReportContentException.requireNonNull("a block of section \"" + heading + "\"", b);
        }
    }

    /** A section with these blocks. */
    public static Section of(String heading, int level, Block... blocks) {
        return new Section(heading, level, List.of(blocks));
    }
}
