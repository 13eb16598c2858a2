package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.cost.LineItem;
import eluvia.design.AlternativeResult;
import eluvia.design.Cautions;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFiles;
import eluvia.report.internal.Html;
import eluvia.site.model.Project;

final class DesignPackageTest {

    @Test
    void sha256MatchesTheStandardTestVector() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                DesignPackage.sha256("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void packageOfTheExampleHoldsResultsCautionsAndTheFileHash(@TempDir Path dir) throws Exception {
        byte[] bytes;
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            bytes = in.readAllBytes();
        }
        Project project = ProjectFiles.load(new java.io.ByteArrayInputStream(bytes), "example");
        DesignRun run = DesignPipeline.run(project);
        List<Path> files = DesignPackage.write(project, run, bytes, "test", dir);
        assertEquals(2, files.size());
        String json = Files.readString(dir.resolve(DesignPackage.RESULTS_JSON));
        String html = Files.readString(dir.resolve(DesignPackage.INDEX_HTML));
        String sha = DesignPackage.sha256(bytes);
        assertTrue(json.contains("\"projectSha256\": \"" + sha + "\""));
        assertTrue(html.contains(sha));
        for (String caution : Cautions.forFlushing()) {
            assertTrue(html.contains(caution.substring(0, 40)), "caution missing from the HTML: " + caution);
        }
        for (FlushingDesignResult r : run.flushing()) {
            assertTrue(json.contains("\"design\": \"" + r.designName() + "\""));
            assertTrue(html.contains(r.designName()));
        }
        assertTrue(html.contains("Brenner (1962)"), "methods must name their published source");
        // the whole job is in the package: zone analysis, enlargement, alternatives with quantities and costs
        assertTrue(json.contains("\"formatVersion\": " + ResultsJson.FORMAT_VERSION), json.substring(0, 200));
        for (String key : List.of("\"zoneAnalysis\"", "\"enlargement\"", "\"excavations\"", "\"alternatives\"",
                "\"costOfDelay\"", "\"governingMethod\"", "\"quantitySource\"", "\"presentValue\"")) {
            assertTrue(json.contains(key), "results.json lacks " + key);
        }
        for (AlternativeResult a : run.alternatives()) {
            assertTrue(json.contains("\"name\": \"" + a.name() + "\""), a.name());
            assertTrue(html.contains(Html.esc(a.name())), a.name());
        }
        assertTrue(html.contains("Alternatives side by side"));
        assertTrue(html.contains("Crank (1975)"), "the enlargement must name its published source");
    }

    @Test
    void everyCostLineInResultsJsonNamesAQuantityOfItsAlternative() throws Exception {
        Project project = ExampleProjects.loadRiversideDepot();
        DesignRun run = DesignPipeline.run(project);
        String json = ResultsJson.of(run, null, "test");
        for (AlternativeResult a : run.alternatives()) {
            if (!a.available()) {
                continue;
            }
            for (LineItem line : a.estimate().lines()) {
                // the line's quantity is one of the alternative's, with its source written beside it
                assertTrue(a.quantities().contains(line.quantity().name()));
                assertTrue(json.contains("\"quantity\": \"" + line.quantity().name() + "\""), line.quantity().name());
            }
        }
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
}
