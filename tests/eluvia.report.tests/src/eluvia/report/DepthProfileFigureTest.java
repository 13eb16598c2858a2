package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DepthProfileSet;
import eluvia.design.DepthProfiles;
import eluvia.design.FlushingDesignResult;
import eluvia.report.chart.DepthProfile;
import eluvia.report.chart.XySeries;
import eluvia.report.content.ResultFigures;
import eluvia.report.document.Document;
import eluvia.report.document.Figure;

/** The concentration-against-depth figure of each flushing design of the shipped (invented) example. */
final class DepthProfileFigureTest {

    @TempDir
    static Path dir;
    private static PackageResult result;
    private static String html;

    @BeforeAll
    static void writeThePackageOnce() throws IOException {
        result = DesignPackage.write(ExampleRun.PROJECT, ExampleRun.RUN, ExampleRun.BYTES, "test", dir,
                PackageOptions.defaults());
        html = Files.readString(dir.resolve(DesignPackage.INDEX_HTML));
    }

    @Test
    void everyFlushingDesignWithProfilesHasItsDepthFigureAndCsv() throws IOException {
        Document d = DesignReport.build(ExampleRun.PROJECT, ExampleRun.RUN, DesignPackage.sha256(ExampleRun.BYTES), "test",
                java.time.LocalDate.ofInstant(ExampleRun.RUN.startedAt(), java.time.ZoneOffset.UTC),
                PackageOptions.defaults(), result.verification());
        int drawn = 0;
        for (FlushingDesignResult r : ExampleRun.RUN.flushing()) {
            DepthProfileSet s = DepthProfiles.ofControlling(ExampleRun.PROJECT, r);
            String id = ResultFigures.id("depth", r.designName());
            Figure f = d.figures().stream().filter(x -> x.id().equals(id)).findFirst().orElse(null);
            if (!s.available()) {
                assertNull(f, id);
                assertTrue(html.contains(s.unavailableReason()), "the page says why there is no profile: " + id);
                continue;
            }
            drawn++;
            assertTrue(f != null, "figure " + id);
            DepthProfile chart = (DepthProfile) f.chart();
            // one series per time: 0, 25, 50 and 100 % of the design's pore volumes
            assertEquals(DepthProfiles.DEFAULT_SHARES.size(), chart.profiles().size(), id);
            assertEquals("mg/kg", chart.concentrationAxis().unit());
            assertEquals("m", chart.depthAxis().unit());
            assertTrue(f.caption().contains(r.designName()) && f.caption().contains(s.contaminantName()), f.caption());
            // the chart draws the design bundle's numbers: the first series is the initial profile
            XySeries first = chart.profiles().get(0);
            assertEquals(s.profiles().get(0).soilMilligramsPerKg().length, first.size());
            for (double c : first.x()) {
                assertEquals(s.initialSoilMilligramsPerKg(), c, 1e-9 * s.initialSoilMilligramsPerKg());
            }
            assertTrue(chart.concentrationMarkers().stream()
                    .anyMatch(m -> m.value() == s.cleanupLevelMilligramsPerKg()), "cleanup level marked");
            // depth increases downward within the treated column
            double[] z = first.y();
            assertTrue(z[0] > s.topDepthMetres() && z[z.length - 1] < s.bottomDepthMetres(), id);

            Path csv = dir.resolve(id + ".csv");
            assertTrue(result.files().contains(csv), id + ".csv written");
            assertTrue(Files.size(dir.resolve(id + ".png")) > 0, id + ".png");
            assertTrue(html.contains(id + ".png"), "the page shows " + id);
            try (Reader in = Files.newBufferedReader(csv);
                    CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).build().parse(in)) {
                List<CSVRecord> rows = p.getRecords();
                int points = chart.profiles().stream().mapToInt(XySeries::size).sum();
                // read back with Commons CSV: one row per drawn point, units in the headers
                assertEquals(points, rows.size(), id);
                assertTrue(p.getHeaderNames().stream().anyMatch(h -> h.contains("mg/kg")), p.getHeaderNames().toString());
                assertTrue(p.getHeaderNames().stream().anyMatch(h -> h.contains("(m)")), p.getHeaderNames().toString());
            }
        }
        assertFalse(ExampleRun.RUN.flushing().isEmpty());
        assertTrue(drawn > 0, "the example has at least one design with profiles");
    }

    @Test
    void noProfilesNoFigure() {
        assertNull(ResultFigures.depthProfiles(null));
        DepthProfileSet none = new DepthProfileSet("d", "c", false, "test reason", Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, List.of(), Double.NaN, List.of(), null, "");
        assertNull(ResultFigures.depthProfiles(none));
    }
}
