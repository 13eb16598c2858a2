package eluvia.report.document;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A design-package document as plain data, independent of how it is printed: title, subtitle,
 * metadata, an optional sign-off block for the cover, and sections of {@link Block}s. The HTML and
 * the PDF writers render the same document, so both say the same thing.
 *
 * <p>Sections nest by level: the first is level 1 and each may go at most one level deeper than
 * the one before. Figure ids are unique (they name files).
 *
 * @param title        the title, e.g. "Soil flushing design package"
 * @param subtitle     a second line, or null for none
 * @param metadata     project, revision, date, program version, project file digest
 * @param coverSignOff the sign-off block printed on the cover, or null for none
 * @param sections     the sections in reading order (at least one)
 */
public record Document(String title, String subtitle, DocumentMetadata metadata, SignOffBlock coverSignOff,
        List<Section> sections) {

    public Document {
        ReportContentException.requireText("document title", title);
        ReportContentException.optionalText("document subtitle", subtitle);
        ReportContentException.requireNonNull("document metadata", metadata);
        ReportContentException.requireNonNull("sections", sections);
        sections = List.copyOf(sections);
        if (sections.isEmpty()) {
            throw new ReportContentException("sections of document \"" + title + "\"", "none", "at least one section", null);
        }
        int previous = 0;
        Set<String> figureIds = new HashSet<>();
        for (Section s : sections) {
            if (s.level() > previous + 1) {
                throw new ReportContentException("level of section \"" + s.heading() + "\"", Integer.toString(s.level()),
                        previous == 0 ? "1 for the first section" : "1 to " + (previous + 1) + " after a level-" + previous
                                + " section", "add the missing intermediate section");
            }
            previous = s.level();
            for (Block b : s.blocks()) {
                if (b instanceof Figure f && !figureIds.add(f.id())) {
                    throw new ReportContentException("figure id \"" + f.id() + "\"", "used twice",
                            "unique in the document", "ids name the files <id>.png and <id>.csv");
                }
            }
        }
    }

    /**
     * The number of each section from the levels, in section order: "1", "1.1", "1.2", "2", "2.1.1"...
     */
    public List<String> sectionNumbers() {
        int[] counters = new int[Section.MAX_LEVEL + 1];
        List<String> numbers = new ArrayList<>(sections.size());
        for (Section s : sections) {
            counters[s.level()]++;
            for (int l = s.level() + 1; l <= Section.MAX_LEVEL; l++) {
                counters[l] = 0;
            }
            StringBuilder b = new StringBuilder();
            for (int l = 1; l <= s.level(); l++) {
                if (l > 1) {
                    b.append('.');
                }
                b.append(counters[l]);
            }
            numbers.add(b.toString());
        }
        return numbers;
    }

    /** Every figure of the document in reading order; figure n of the text is element n - 1. */
    public List<Figure> figures() {
        return blocksOf(Figure.class);
    }

    /** Every table of the document in reading order; table n of the text is element n - 1. */
    public List<Table> tables() {
        return blocksOf(Table.class);
    }

    private <T extends Block> List<T> blocksOf(Class<T> kind) {
        List<T> found = new ArrayList<>();
        for (Section s : sections) {
            for (Block b : s.blocks()) {
                if (kind.isInstance(b)) {
                    found.add(kind.cast(b));
                }
            }
        }
        return found;
    }

    /** Starts a document. */
    public static Builder builder(String title, DocumentMetadata metadata) {
        return new Builder(title, metadata);
    }

    /** Collects the parts of a {@link Document}. */
    public static final class Builder {
        private final String title;
        private final DocumentMetadata metadata;
        private String subtitle;
        private SignOffBlock coverSignOff;
        private final List<Section> sections = new ArrayList<>();

        private Builder(String title, DocumentMetadata metadata) {
            this.title = title;
            this.metadata = metadata;
        }

        public Builder subtitle(String text) {
            this.subtitle = text;
            return this;
        }

        public Builder coverSignOff(SignOffBlock block) {
            this.coverSignOff = block;
            return this;
        }

        /** Adds a section. */
        public Builder section(Section section) {
            sections.add(section);
            return this;
        }

        /** Adds a section with these blocks. */
        public Builder section(String heading, int level, Block... blocks) {
            return section(Section.of(heading, level, blocks));
        }

        public Document build() {
            return new Document(title, subtitle, metadata, coverSignOff, sections);
        }
    }
}
