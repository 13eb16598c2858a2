package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.parser.PdfTextExtractor;

import eluvia.cost.LineItem;
import eluvia.design.AlternativeResult;
import eluvia.design.Cautions;
import eluvia.design.FlushingDesignResult;
import eluvia.report.document.Document;
import eluvia.report.document.Figure;

/** The package of the shipped (invented) example: files, hash, headline numbers, PDF and verification. */
final class DesignPackageTest {

    @TempDir
    static Path dir;
    private static PackageResult result;
    private static String html;
    private static String json;

    @BeforeAll
    static void writeThePackageOnce() throws IOException {
        result = DesignPackage.write(ExampleRun.PROJECT, ExampleRun.RUN, ExampleRun.BYTES, "test", dir,
                PackageOptions.defaults());
        html = Files.readString(dir.resolve(DesignPackage.INDEX_HTML));
        json = Files.readString(dir.resolve(DesignPackage.RESULTS_JSON));
    }

    @Test
    void sha256MatchesTheStandardTestVector() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                DesignPackage.sha256("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void hashInEveryOutputIsThatOfTheProjectFile() throws Exception {
        // recomputed independently with the JDK's MessageDigest
        String expected = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(ExampleRun.BYTES));
        assertTrue(json.contains("\"projectSha256\": \"" + expected + "\""));
        assertTrue(html.contains(expected));
        String[] pages = pdfPages(dir.resolve(DesignPackage.PDF));
        assertTrue(pages[0].contains(expected), "the cover names the project file digest");
        String all = String.join("\n", pages);
        assertTrue(all.indexOf(expected) != all.lastIndexOf(expected),
                "the cover and the reproduction section both name the digest");
    }

    @Test
    void packageHoldsJsonHtmlPdfAndAPngAndCsvPerFigure() throws IOException {
        Document d = document();
        assertTrue(result.files().contains(dir.resolve(DesignPackage.RESULTS_JSON)));
        assertTrue(result.files().contains(dir.resolve(DesignPackage.INDEX_HTML)));
        assertTrue(result.files().contains(dir.resolve(DesignPackage.PDF)));
        assertFalse(d.figures().isEmpty());
        for (Figure f : d.figures()) {
            Path csv = dir.resolve(f.id() + ".csv");
            assertTrue(Files.size(dir.resolve(f.id() + ".png")) > 0, f.id());
            try (Reader r = Files.newBufferedReader(csv);
                    CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).build().parse(r)) {
                List<CSVRecord> rows = p.getRecords();
                // the CSV holds exactly the numbers of the chart, read back with Commons CSV
                assertEquals(f.chart().data().rows().size(), rows.size(), f.id());
                assertEquals(f.chart().data().headers(), p.getHeaderNames(), f.id());
            }
            assertTrue(html.contains(f.id() + ".png"), "the page shows " + f.id());
        }
        // a figure of each kind the example supports: residual curves per design, plan, enlargement, costs
        for (FlushingDesignResult r : ExampleRun.RUN.flushing()) {
            assertTrue(d.figures().stream().anyMatch(f -> f.id().startsWith("residual-")
                    && f.caption().contains(r.designName())), r.designName());
        }
        assertTrue(d.figures().stream().anyMatch(f -> f.id().startsWith("plan-")));
        assertTrue(d.figures().stream().anyMatch(f -> f.id().equals("enlargement")));
        assertTrue(d.figures().stream().anyMatch(f -> f.id().startsWith("section-")));
        assertTrue(d.figures().stream().anyMatch(f -> f.id().startsWith("cost-")));
    }

    @Test
    void everyChapterCautionAndMethodSourceIsThere() {
        for (String chapter : DesignReport.CHAPTERS) {
            assertTrue(html.contains(chapter), "chapter missing: " + chapter);
        }
        for (String caution : Cautions.all()) {
            // the example has an excavation design and invented rates: all four cautions apply
            assertTrue(html.contains(caution.substring(0, 40)), "caution missing from the HTML: " + caution);
        }
        for (String source : List.of("Brenner (1962)", "Ogata and Banks (1961)", "Millington and Quirk (1961)",
                "van Genuchten and Wierenga (1976)", "Crank (1975)", "Shepard (1968)", "prismoidal",
                "EPA 540-R-00-002", "18R-97")) {
            assertTrue(html.contains(source), "methods must name their published source: " + source);
        }
        for (String field : List.of("Name", "Licence number", "Signature", "Date")) {
            assertTrue(html.contains(field), "sign-off field " + field);
        }
        assertTrue(html.contains(DesignReport.revision(ExampleRun.PROJECT)));
        assertFalse(html.contains(DesignReport.FAILED_BANNER), "all verification cases pass in a sound build");
        assertTrue(result.verificationPassed());
    }

    @Test
    void headlineNumbersEqualThoseOfResultsJson() {
        String page = html.replace(",", "");
        for (FlushingDesignResult r : ExampleRun.RUN.flushing()) {
            int at = json.indexOf("\"design\": \"" + r.designName() + "\"");
            assertTrue(at >= 0, r.designName());
            for (String key : List.of("poreVolumes", "calendarDays", "waterCapturedM3")) {
                Matcher m = Pattern.compile("\"" + key + "\": ([-0-9.eE+]+)").matcher(json);
                assertTrue(m.find(at), key);
                // results.json to 4 significant figures, rounded here with BigDecimal, is what the page shows
                String expected = new BigDecimal(m.group(1)).round(new MathContext(4)).stripTrailingZeros().toPlainString();
                assertTrue(page.contains(">" + expected + "<") || page.contains(">" + expected + " ")
                        || page.contains(">" + withTrailingZeros(m.group(1)) + "<"),
                        key + " of " + r.designName() + ": " + expected + " not on the page");
            }
        }
    }

    private static String withTrailingZeros(String jsonNumber) {
        BigDecimal v = new BigDecimal(jsonNumber).round(new MathContext(4));
        int digitsBeforePoint = v.precision() - v.scale();
        return v.setScale(Math.max(0, 4 - digitsBeforePoint)).toPlainString();
    }

    @Test
    void resultsJsonHoldsTheWholeJobAndEveryCostLineIsTraceable() {
        assertTrue(json.contains("\"formatVersion\": " + ResultsJson.FORMAT_VERSION));
        for (String key : List.of("\"settings\"", "\"zoneAnalysis\"", "\"enlargement\"", "\"excavations\"",
                "\"alternatives\"", "\"costOfDelay\"", "\"governingMethod\"", "\"quantitySource\"")) {
            assertTrue(json.contains(key), "results.json lacks " + key);
        }
        for (AlternativeResult a : ExampleRun.RUN.alternatives()) {
            assertTrue(json.contains("\"name\": \"" + a.name() + "\""), a.name());
            if (!a.available()) {
                continue;
            }
            // results.json holds the run's present value itself (formatted by the same writer): the file is the run
            String pv = new Json().beginObject().field("presentValue", a.estimate().presentValue().amount()).endObject()
                    .toString().trim();
            assertTrue(json.contains(pv.substring(1, pv.length() - 1).trim()), a.name() + ": " + pv);
            for (LineItem line : a.estimate().lines()) {
                // every line's quantity is one of the alternative's, and its name and source are written beside it
                assertTrue(a.quantities().contains(line.quantity().name()), line.quantity().name());
                assertTrue(json.contains("\"quantity\": \"" + line.quantity().name() + "\""), line.quantity().name());
            }
        }
    }

    @Test
    void pdfOpensAndHasEveryChapter() throws IOException {
        String[] pages = pdfPages(dir.resolve(DesignPackage.PDF));
        assertTrue(pages.length >= 10, "a cover, the contents and the chapters: " + pages.length + " pages");
        assertTrue(pages[0].contains(DesignReport.TITLE) && pages[0].contains("Licence number"));
        String all = String.join("\n", pages);
        for (String chapter : DesignReport.CHAPTERS) {
            assertTrue(all.contains(chapter), "chapter missing from the PDF: " + chapter);
        }
    }

    @Test
    void aFailingVerificationCaseIsReportedLoudly(@TempDir Path failedDir) throws IOException {
        // a deliberately wrong reference: the Ogata-Banks check value of REFERENCES.md is 0.585289, not 0.6
        List<VerificationAppendix.Case> cases = new java.util.ArrayList<>(VerificationAppendix.standardCases());
        cases.set(0, cases.get(0).withReferenceValue(0.6));
        String first = ExampleRun.RUN.flushing().get(0).designName();
        PackageResult failed = DesignPackage.write(ExampleRun.PROJECT, ExampleRun.RUN, ExampleRun.BYTES, "test", failedDir,
                PackageOptions.defaults().withAlternatives(Set.of(first)).withVerificationCases(cases));
        assertFalse(failed.verificationPassed());
        assertEquals(1, failed.verification().failures().size());
        String failedHtml = Files.readString(failedDir.resolve(DesignPackage.INDEX_HTML));
        assertTrue(failedHtml.contains(DesignReport.FAILED_BANNER));
        assertTrue(failedHtml.contains(">" + DesignReport.FAILED + "<"), "the appendix row says FAILED");
        String[] pages = pdfPages(failedDir.resolve(DesignPackage.PDF));
        assertTrue(pages[0].contains(DesignReport.FAILED_BANNER), "the cover says FAILED");
        // only the chosen design is reported
        for (FlushingDesignResult r : ExampleRun.RUN.flushing()) {
            assertEquals(r.designName().equals(first), failedHtml.contains("Flushing: " + r.designName()), r.designName());
        }
    }

    @Test
    void pdfCanBeLeftOut(@TempDir Path noPdf) throws IOException {
        PackageResult r = DesignPackage.write(ExampleRun.PROJECT, ExampleRun.RUN, null, "test", noPdf,
                PackageOptions.defaults().withPdf(false).withAlternatives(Set.of("none of them")));
        assertFalse(Files.exists(noPdf.resolve(DesignPackage.PDF)));
        assertTrue(Files.readString(noPdf.resolve(DesignPackage.INDEX_HTML)).contains("not computed"),
                "without file bytes the package says the digest was not computed");
        assertTrue(r.verificationPassed());
    }

    @Test
    void badInputsAreRefusedWithTheirName(@TempDir Path d) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DesignPackage.write(null, ExampleRun.RUN, null, "test", d, PackageOptions.defaults()));
        assertTrue(e.getMessage().contains("project"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> DesignPackage.write(ExampleRun.PROJECT, ExampleRun.RUN, null, "test", d, null));
        assertTrue(e.getMessage().contains("options"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> PackageOptions.defaults().withAlternatives(Set.of()));
    }

    @Test
    void jsonWriterEscapesAndWritesNonFiniteNumbersAsNull() {
        // RFC 8259 section 7: quotation mark, reverse solidus and control characters must be escaped;
        // section 6: NaN and infinity are not permitted, written here as null.
        String s = new Json().beginObject().field("a\"b", "x\\y\n").field("nan", Double.NaN).field("n", 2.5)
                .field("i", 3).endObject().toString();
        assertTrue(s.contains("\"a\\\"b\": \"x\\\\y\\n\""), s);
        assertTrue(s.contains("\"nan\": null"), s);
        assertTrue(s.contains("\"n\": 2.5"), s);
        assertTrue(s.contains("\"i\": 3"), s);
    }

    private static Document document() {
        return DesignReport.build(ExampleRun.PROJECT, ExampleRun.RUN, DesignPackage.sha256(ExampleRun.BYTES), "test",
                java.time.LocalDate.ofInstant(ExampleRun.RUN.startedAt(), java.time.ZoneOffset.UTC), PackageOptions.defaults(),
                result.verification());
    }

    static String[] pdfPages(Path pdf) throws IOException {
        PdfReader reader = new PdfReader(Files.readAllBytes(pdf));
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
}
