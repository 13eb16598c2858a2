package eluvia.report.pdf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.SimpleBookmark;
import com.lowagie.text.pdf.parser.PdfTextExtractor;

import eluvia.report.document.Document;
import eluvia.report.document.Paragraph;
import eluvia.report.document.ReportContentException;
import eluvia.report.document.TestDocuments;

/** The PDF reads back with OpenPDF's own reader: pages, text, vector figures, bookmarks. */
final class PdfDocumentWriterTest {

    private static String[] pagesText(byte[] pdf) throws IOException {
        PdfReader reader = new PdfReader(pdf);
        try {
            PdfTextExtractor extractor = new PdfTextExtractor(reader);
            String[] pages = new String[reader.getNumberOfPages()];
            for (int i = 0; i < pages.length; i++) {
                pages[i] = extractor.getTextFromPage(i + 1);
            }
            return pages;
        } finally {
            reader.close();
        }
    }

    @Test
    void coverThenOnePagePerHintedBreak() throws IOException {
        byte[] pdf = PdfDocumentWriter.toBytes(TestDocuments.pagesApart(3));
        String[] pages = pagesText(pdf);
        // a cover, the contents, then sections 1, 2 and 3 each on its own page (a break hint ends 1 and 2)
        assertEquals(5, pages.length);
        assertTrue(pages[0].contains("Paged") && pages[0].contains("Licence number") && pages[0].contains("Signature"),
                pages[0]);
        assertTrue(pages[0].contains(TestDocuments.SHA), "the cover names the project file digest");
        assertFalse(pages[0].contains("Page 1"), "the cover has no running footer");
        for (int s = 1; s <= 3; s++) {
            // the contents give each section's page: section s is on page s + 2
            assertTrue(Pattern.compile("(?m)^\\s*" + s + "\\s*Section " + s + "\\s*" + (s + 2) + "\\s*$").matcher(pages[1])
                    .find(), pages[1]);
        }
        for (int p = 2; p <= 5; p++) {
            String text = pages[p - 1];
            if (p > 2) {
                assertTrue(text.contains("Section " + (p - 2)), text);
            }
            // the total is a form drawn after "of ", which the text extractor joins without a space
            assertTrue(Pattern.compile("Page " + p + " of\\s*5").matcher(text).find(), text);
            assertTrue(text.contains("Invented test site"), "running header: " + text);
            assertTrue(text.contains("Revision B (for review)"), "footer: " + text);
        }
    }

    @Test
    void longTablesSplitAcrossPagesWithTheirHeaderRepeated() throws IOException {
        int rows = 150;
        String[] pages = pagesText(PdfDocumentWriter.toBytes(TestDocuments.longTable(rows)));
        // rows are about 14 pt high and a page holds about 700 pt: 150 rows need three pages or more after
        // the cover and the contents
        assertTrue(pages.length >= 5, "pages: " + pages.length);
        Pattern label = Pattern.compile("R-(\\d{3})");
        List<Integer> seen = new ArrayList<>();
        for (int p = 2; p < pages.length; p++) {
            Matcher m = label.matcher(pages[p]);
            boolean any = false;
            while (m.find()) {
                seen.add(Integer.parseInt(m.group(1)));
                any = true;
            }
            if (any) {
                assertTrue(pages[p].contains("Sample label") && pages[p].contains("Concentration")
                        && pages[p].contains("(mg/kg)"), "header row on page " + (p + 1));
                assertTrue(pages[p].contains("Table 1."), "caption on page " + (p + 1));
            }
        }
        List<Integer> expected = new ArrayList<>();
        for (int i = 1; i <= rows; i++) {
            expected.add(i);
        }
        assertEquals(expected, seen, "every row once, in order");
    }

    @Test
    void figuresAreVectorDrawingsAndHeadingsAreBookmarks(@TempDir Path dir) throws IOException {
        Document d = TestDocuments.everyBlock();
        Path file = dir.resolve("package.pdf");
        PdfDocumentWriter.write(d, file);
        byte[] pdf = Files.readAllBytes(file);
        PdfReader reader = new PdfReader(pdf);
        try {
            Set<String> forms = new HashSet<>();
            for (int p = 1; p <= reader.getNumberOfPages(); p++) {
                PdfDictionary resources = reader.getPageN(p).getAsDict(PdfName.RESOURCES);
                PdfDictionary xObjects = resources == null ? null : resources.getAsDict(PdfName.XOBJECT);
                if (xObjects == null) {
                    continue;
                }
                for (PdfName name : xObjects.getKeys()) {
                    PdfDictionary x = (PdfDictionary) PdfReader.getPdfObject(xObjects.get(name));
                    assertFalse(PdfName.IMAGE.equals(x.getAsName(PdfName.SUBTYPE)), "a bitmap on page " + p);
                    if (PdfName.FORM.equals(x.getAsName(PdfName.SUBTYPE))) {
                        forms.add(xObjects.get(name).toString());
                    }
                }
            }
            // each figure is one form XObject; so is the "of N" of the footer, shared by all pages
            assertEquals(d.figures().size() + 1, forms.size(), forms.toString());

            List<Map<String, Object>> marks = SimpleBookmark.getBookmarkList(reader);
            List<String> titles = new ArrayList<>();
            collect(marks, titles, 0);
            assertEquals(List.of("0:1  Summary & scope", "0:2  Inputs", "1:2.1  Results", "0:3  Sign-off"), titles);
            Map<String, String> info = new HashMap<>(reader.getInfo());
            assertEquals("Design package <test> & check", info.get("Title"));
            assertTrue(info.get("Creator").startsWith("Eluvia 0.1.0.test"));
        } finally {
            reader.close();
        }
        String[] pages = pagesText(pdf);
        String all = String.join("\n", pages);
        for (String s : new String[] { "Flushing needs", "14.2 pore volumes", "Pore volumes to target", "P10 to P90",
                "Capture the flushed water", "Layer one: silty sand", "Clay <lens>", "Table 1.", "Soil layers as used",
                "Figure 1.", "Residual fraction against pore volumes.", "Figure 2.", "Body statement for the checker." }) {
            assertTrue(all.contains(s), s);
        }
        // "plan-view" follows a page-break hint: it starts a page of its own
        int planPage = -1;
        for (int p = 0; p < pages.length; p++) {
            if (pages[p].contains("Plan view of the zone")) {
                planPage = p;
            }
        }
        assertFalse(pages[planPage - 1].contains("Plan view of the zone"));
        assertTrue(pages[planPage - 1].contains("Residual fraction against pore volumes."));
    }

    @SuppressWarnings("unchecked")
    private static void collect(List<Map<String, Object>> marks, List<String> into, int depth) {
        if (marks == null) {
            return;
        }
        for (Map<String, Object> m : marks) {
            into.add(depth + ":" + m.get("Title"));
            collect((List<Map<String, Object>>) m.get("Kids"), into, depth + 1);
        }
    }

    @Test
    void aHeadingTooLongForTheContentsLineIsShortenedThere() throws IOException {
        String longHeading = "A heading far too long for one line of the contents page ".repeat(3).trim();
        Document d = Document.builder("Long heading", TestDocuments.META).section(longHeading, 1, Paragraph.of("Text."))
                .build();
        String[] pages = pagesText(PdfDocumentWriter.toBytes(d));
        assertEquals(3, pages.length);
        assertTrue(pages[1].contains("A heading far too long") && pages[1].contains("\u2026"), pages[1]);
        assertFalse(pages[1].contains(longHeading), "shortened on the contents page");
        assertTrue(pages[2].replaceAll("\\s+", " ").contains(longHeading), "whole in the body");
    }

    @Test
    void nothingToWriteIsRefused() {
        assertThrows(ReportContentException.class, () -> PdfDocumentWriter.toBytes(null));
        assertThrows(ReportContentException.class,
                () -> PdfDocumentWriter.write(TestDocuments.pagesApart(1), (java.io.OutputStream) null));
        assertThrows(ReportContentException.class, () -> PdfDocumentWriter.write(TestDocuments.pagesApart(1), (Path) null));
    }

    @Test
    void textIsMappedToWhatTheStandardFontsHold() {
        // code page 1252 has the micro, squared, cubed and degree signs and the en dash; Greek and relations it lacks
        assertEquals("theta <= 5 m\u00b3, \u00b5g/L at 10 \u00b0C \u2013 C0", PdfText.map("\u03b8 \u2264 5 m\u00b3, \u03bcg/L at 10 \u00b0C \u2013 C\u2080"));
        assertEquals("rho_b alpha_L", PdfText.map("\u03c1_b \u03b1_L"));
        assertEquals("a ? b", PdfText.map("a \u6f22 b"));
        String plain = "Plain ASCII stays the same object";
        assertTrue(plain == PdfText.map(plain));
    }
}
