package eluvia.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.imageio.ImageIO;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.report.document.Block;
import eluvia.report.document.Caution;
import eluvia.report.document.Column;
import eluvia.report.document.Document;
import eluvia.report.document.Figure;
import eluvia.report.document.KeyFigure;
import eluvia.report.document.KeyFigures;
import eluvia.report.document.ReportContentException;
import eluvia.report.document.Section;
import eluvia.report.document.Table;
import eluvia.report.document.TestDocuments;

/** The HTML page holds everything the document says, and every figure has its PNG and CSV beside it. */
final class HtmlDocumentWriterTest {

    @Test
    void pageHoldsEverySectionCellCaptionAndCard(@TempDir Path dir) throws IOException {
        Document d = TestDocuments.everyBlock();
        HtmlDocumentWriter.write(d, dir);
        String html = Files.readString(dir.resolve(HtmlDocumentWriter.INDEX_HTML), StandardCharsets.UTF_8);
        String text = visibleText(html);
        assertTrue(text.contains("Design package <test> & check"), "title");
        assertTrue(text.contains("Subtitle of the invented scenario"));
        assertTrue(text.contains(TestDocuments.SHA));
        assertTrue(text.contains("B (for review)") && text.contains("2026-03-14") && text.contains("0.1.0.test"));
        List<String> numbers = d.sectionNumbers();
        for (int i = 0; i < d.sections().size(); i++) {
            Section s = d.sections().get(i);
            assertTrue(text.contains(numbers.get(i) + " " + s.heading()), "heading " + s.heading());
            for (Block b : s.blocks()) {
                if (b instanceof Table t) {
                    for (Column c : t.columns()) {
                        assertTrue(text.contains(c.heading()), c.heading());
                    }
                    for (List<String> row : t.rows()) {
                        for (String cell : row) {
                            assertTrue(html.contains(">" + HtmlDocumentWriter.esc(cell) + "</td>"), "cell " + cell);
                        }
                    }
                    assertTrue(text.contains("Table 1. " + t.caption()));
                } else if (b instanceof Figure f) {
                    assertTrue(text.contains(f.caption()), f.caption());
                    assertTrue(html.contains("src=\"" + f.id() + ".png\""));
                    assertTrue(html.contains("href=\"" + f.id() + ".csv\""));
                } else if (b instanceof KeyFigures k) {
                    for (KeyFigure f : k.figures()) {
                        assertTrue(text.contains(f.label()) && text.contains(f.value()), f.label());
                    }
                } else if (b instanceof Caution c) {
                    assertTrue(text.contains(c.title()));
                }
            }
        }
        assertTrue(text.contains("Figure 1. Residual fraction") && text.contains("Figure 2. Plan view"));
        assertTrue(text.contains("Licence number"));
        assertTrue(text.contains("Flushing needs 14.2 pore volumes"));
        assertTrue(html.contains("<strong>14.2 pore volumes</strong>") && html.contains("<em>invented</em>"));
        assertTrue(html.contains("class=\"page-break\""));
        assertFalse(html.contains("<test>") || html.contains("<lens>") || html.contains("& check"),
                "text is escaped, never taken as mark-up");
        assertFalse(html.contains("<script") || html.contains("http"), "the page fetches nothing and runs nothing");
        for (String tag : new String[] { "section", "table", "figure", "aside", "div", "ul", "dl", "p" }) {
            assertEquals(count(html, "<" + tag + "[ >]"), count(html, "</" + tag + ">"), "balanced <" + tag + ">");
        }
    }

    @Test
    void everyFigureWritesAPngAndACsvThatReadsBack(@TempDir Path dir) throws IOException {
        Document d = TestDocuments.everyBlock();
        List<Path> written = HtmlDocumentWriter.write(d, dir);
        assertEquals(dir.resolve("index.html"), written.get(0));
        assertEquals(1 + 2 * d.figures().size(), written.size());
        for (Figure f : d.figures()) {
            Path png = dir.resolve(f.id() + ".png");
            Path csv = dir.resolve(f.id() + ".csv");
            assertTrue(written.contains(png) && written.contains(csv));
            BufferedImage image = ImageIO.read(png.toFile());
            assertEquals((int) (HtmlDocumentWriter.FIGURE_WIDTH_CSS_PX * HtmlDocumentWriter.PIXEL_SCALE), image.getWidth());
            assertEquals((int) (HtmlDocumentWriter.FIGURE_HEIGHT_CSS_PX * HtmlDocumentWriter.PIXEL_SCALE), image.getHeight());
            List<List<String>> rows = new ArrayList<>();
            // read back with Commons CSV 1.14.1, independent of our writer
            try (Reader r = Files.newBufferedReader(csv, StandardCharsets.UTF_8);
                    CSVParser p = CSVFormat.RFC4180.parse(r)) {
                for (CSVRecord rec : p) {
                    rows.add(rec.toList());
                }
            }
            assertEquals(f.chart().data().headers(), rows.get(0));
            assertEquals(f.chart().data().rows(), rows.subList(1, rows.size()));
        }
        // the residual-fraction chart: one row per point, numbers exactly as given
        Path csv = dir.resolve("residual-fraction.csv");
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        assertEquals("series,Pore volumes flushed (-),Residual fraction C/C0 (-)", lines.get(0));
        double[] y = TestDocuments.residualChart().series().get(0).y();
        for (int i = 0; i < y.length; i++) {
            assertEquals(y[i], Double.parseDouble(lines.get(1 + i).split(",")[2]));
        }
    }

    @Test
    void nothingToWriteIsRefused(@TempDir Path dir) {
        assertThrows(ReportContentException.class, () -> HtmlDocumentWriter.write(null, dir));
        assertThrows(ReportContentException.class, () -> HtmlDocumentWriter.write(TestDocuments.everyBlock(), null));
    }

    /** The page text with tags removed and the five escapes undone, white space collapsed. */
    private static String visibleText(String html) {
        String noStyle = html.replaceAll("(?s)<style>.*?</style>", " ");
        String text = noStyle.replaceAll("<[^>]+>", " ");
        text = text.replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&#39;", "'")
                .replace("&amp;", "&");
        return text.replaceAll("\\s+", " ").replace(" .", ".");
    }

    private static int count(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(html);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }
}
