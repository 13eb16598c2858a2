package eluvia.report.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.Collections;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The document model: light mark-up, section numbering and every check on content. */
final class DocumentModelTest {

    private static final DocumentMetadata META = new DocumentMetadata("Invented test site", "A", LocalDate.of(2026, 1, 2),
            "0.1.0", null);

    @Test
    void markedTextBecomesRunsOfEmphasis() {
        // expected runs read off the mark-up rules in the Javadoc of Paragraph.marked, by hand
        Paragraph p = Paragraph.marked("Flush *at least* **14.2 pore volumes** \\* twice");
        assertEquals(List.of(new TextRun("Flush ", Emphasis.PLAIN), new TextRun("at least", Emphasis.EMPHASIS),
                new TextRun(" ", Emphasis.PLAIN), new TextRun("14.2 pore volumes", Emphasis.STRONG),
                new TextRun(" * twice", Emphasis.PLAIN)), p.runs());
        assertEquals("Flush at least 14.2 pore volumes * twice", p.plainText());
    }

    @Test
    void plainTextKeepsAsterisks() {
        assertEquals(List.of(new TextRun("a *b* c", Emphasis.PLAIN)), Paragraph.of("a *b* c").runs());
    }

    @ParameterizedTest
    @ValueSource(strings = { "*not closed", "**bold* mixed", "a ** b", "*outer **inner** outer*", "empty **** span" })
    void unbalancedMarkUpIsRefused(String text) {
        ReportContentException e = assertThrows(ReportContentException.class, () -> Paragraph.marked(text));
        assertTrue(e.getMessage().contains(text), e.getMessage());
        assertTrue(e.getMessage().contains("\\*"), "the message says how to write a literal asterisk: " + e.getMessage());
    }

    @Test
    void sectionsAreNumberedFromTheirLevels() {
        Document d = Document.builder("Numbering", META).section("A", 1).section("A.a", 2).section("A.b", 2)
                .section("A.b.i", 3).section("B", 1).section("B.a", 2).build();
        // numbering of nested levels worked out by hand
        assertEquals(List.of("1", "1.1", "1.2", "1.2.1", "2", "2.1"), d.sectionNumbers());
    }

    @Test
    void aSectionMayNotSkipALevel() {
        ReportContentException e = assertThrows(ReportContentException.class,
                () -> Document.builder("Skip", META).section("A", 1).section("A.a.i", 3).build());
        assertTrue(e.getMessage().contains("\"A.a.i\"") && e.getMessage().contains("1 to 2"), e.getMessage());
        assertThrows(ReportContentException.class, () -> Document.builder("Start deep", META).section("A.a", 2).build());
        assertThrows(ReportContentException.class, () -> Document.builder("Empty", META).build());
    }

    @ParameterizedTest
    @ValueSource(ints = { 0, 4, -1 })
    void sectionLevelOutsideOneToThreeIsRefused(int level) {
        assertThrows(ReportContentException.class, () -> Section.of("Heading", level));
    }

    @Test
    void figuresAndTablesAreListedInReadingOrder() {
        Table t1 = Table.with(Column.text("Name")).row("first").build();
        Table t2 = Table.with(Column.text("Name")).row("second").build();
        Document d = Document.builder("Order", META).section("A", 1, t1, Paragraph.of("text")).section("B", 1, t2)
                .build();
        assertEquals(List.of(t1, t2), d.tables());
        assertEquals(List.of(), d.figures());
    }

    @Test
    void tableRowsMustHaveOneCellPerColumn() {
        ReportContentException e = assertThrows(ReportContentException.class,
                () -> Table.with(Column.text("Name"), Column.number("Depth", "m")).row("ok", "1.0").row("short").build());
        assertTrue(e.getMessage().contains("table row 2") && e.getMessage().contains("exactly 2 cells"), e.getMessage());
        assertThrows(ReportContentException.class,
                () -> new Table(List.of(Column.text("Name")), List.of(Collections.singletonList(null)), null));
        assertThrows(ReportContentException.class, () -> new Table(List.of(), List.of(), null));
        assertThrows(ReportContentException.class, () -> Table.with(Column.text("Name")).caption(" ").build());
    }

    @Test
    void columnsCarryTheirUnitInTheHeading() {
        assertEquals("Bank volume (m\u00b3)", Column.number("Bank volume", "m\u00b3").headingWithUnit());
        assertEquals("Alternative", Column.text("Alternative").headingWithUnit());
        assertNull(Column.text("Alternative").unit());
        assertThrows(ReportContentException.class, () -> Column.number("Depth", ""));
        assertThrows(ReportContentException.class, () -> Column.text(""));
        assertThrows(ReportContentException.class, () -> new Column("Depth", "m", null));
    }

    @ParameterizedTest
    @ValueSource(strings = { "Has-Caps", "-leading-hyphen", "", "a/b", "a b", "dot.png",
            "x1234567890123456789012345678901234567890123456789012345678901234" })
    void figureIdsMustBeSafeFileNames(String id) {
        ReportContentException e = assertThrows(ReportContentException.class,
                () -> new Figure(id, TestCharts.line(), "Caption"));
        assertTrue(e.getMessage().contains("figure id"), e.getMessage());
    }

    @Test
    void figureIdsAreUniqueInADocument() {
        Figure a = new Figure("residual", TestCharts.line(), "First");
        Figure b = new Figure("residual", TestCharts.line(), "Second");
        ReportContentException e = assertThrows(ReportContentException.class,
                () -> Document.builder("Twice", META).section("A", 1, a).section("B", 1, b).build());
        assertTrue(e.getMessage().contains("\"residual\"") && e.getMessage().contains("used twice"), e.getMessage());
        assertThrows(ReportContentException.class, () -> new Figure("ok", null, "Caption"));
        assertThrows(ReportContentException.class, () -> new Figure("ok", TestCharts.line(), " "));
    }

    @Test
    void metadataChecksTheDigest() {
        String sha = "a".repeat(64);
        assertEquals(sha, new DocumentMetadata("P", "A", LocalDate.of(2026, 1, 2), "0.1.0", sha).projectSha256());
        for (String bad : new String[] { "A".repeat(64), "a".repeat(63), "g".repeat(64) }) {
            ReportContentException e = assertThrows(ReportContentException.class,
                    () -> new DocumentMetadata("P", "A", LocalDate.of(2026, 1, 2), "0.1.0", bad));
            assertTrue(e.getMessage().contains("SHA-256"), e.getMessage());
        }
        assertThrows(ReportContentException.class, () -> new DocumentMetadata(" ", "A", LocalDate.of(2026, 1, 2), "0.1", null));
        assertThrows(ReportContentException.class, () -> new DocumentMetadata("P", "", LocalDate.of(2026, 1, 2), "0.1", null));
        assertThrows(ReportContentException.class, () -> new DocumentMetadata("P", "A", null, "0.1", null));
        assertThrows(ReportContentException.class, () -> new DocumentMetadata("P", "A", LocalDate.of(2026, 1, 2), null, null));
    }

    @Test
    void blocksRefuseEmptyContent() {
        assertThrows(ReportContentException.class, () -> Paragraph.of("  "));
        assertThrows(ReportContentException.class, () -> new Paragraph(List.of()));
        assertThrows(ReportContentException.class, () -> new Paragraph(List.of(new TextRun("  ", Emphasis.PLAIN))));
        assertThrows(ReportContentException.class, () -> new TextRun("", Emphasis.PLAIN));
        assertThrows(ReportContentException.class, () -> new TextRun("x", null));
        assertThrows(ReportContentException.class, () -> new BulletList(List.of()));
        assertThrows(ReportContentException.class, () -> new Caution("Title", List.of()));
        assertThrows(ReportContentException.class, () -> Caution.of(" ", "text"));
        assertThrows(ReportContentException.class, () -> new KeyFigures(List.of()));
        KeyFigure k = new KeyFigure("Duration", "180", "d", null);
        assertThrows(ReportContentException.class, () -> new KeyFigures(Collections.nCopies(KeyFigures.MAX_FIGURES + 1, k)));
        assertThrows(ReportContentException.class, () -> new KeyFigure("Duration", "180", "", null));
        assertThrows(ReportContentException.class, () -> new KeyFigure("Duration", "180", "d", " "));
        assertThrows(ReportContentException.class, () -> new SignOffBlock("Statement", List.of()));
        assertThrows(ReportContentException.class, () -> new SignOffBlock("Statement", List.of("Name", " ")));
        assertThrows(ReportContentException.class, () -> SignOffBlock.licensedEngineer(""));
        assertThrows(ReportContentException.class, () -> Document.builder(" ", META).section("A", 1).build());
        assertThrows(ReportContentException.class, () -> Document.builder("Title", null).section("A", 1).build());
        assertThrows(ReportContentException.class, () -> Document.builder("T", META).subtitle(" ").section("A", 1).build());
    }

    @Test
    void keyFigureOfADimensionlessNumberPrintsNoUnit() {
        assertEquals("", new KeyFigure("Pore volumes", "14.2", Column.DIMENSIONLESS, null).printedUnit());
        assertEquals("m\u00b3", new KeyFigure("Water to treat", "8,450", "m\u00b3", null).printedUnit());
        assertEquals(List.of("Name", "Licence number", "Signature", "Date"),
                SignOffBlock.licensedEngineer("Checked.").fields());
    }
}
