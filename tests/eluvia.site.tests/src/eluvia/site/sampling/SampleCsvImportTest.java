package eluvia.site.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.site.model.Project;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.tests.TestProjects;

/** Sample CSV import: what is read, and a reason for every row that is not. Data invented for the tests. */
final class SampleCsvImportTest {

    private static final String HEADER = "location,easting_m,northing_m,ground_elevation_m,top_depth_m,bottom_depth_m,"
            + "contaminant,concentration_mg_per_kg,non_detect,detection_limit_mg_per_kg\n";

    private static ImportReport read(String csv, Project project) throws Exception {
        return SampleCsvImport.read(new StringReader(csv), "samples.csv", project);
    }

    @Test
    void goodRowsAreImportedGroupedByLocation() throws Exception {
        Project project = TestProjects.example();
        String csv = HEADER
                + "B-7,40.0,20.5,12.7,0.5,1.0,Benzene,3.2,,\n"
                + "B-7,40.0,20.5,12.7,0.5,1.0,79-01-6,<0.05,,\n"
                + "# a comment line\n"
                + "\"B-8, north\",41.5,25,,1.0,1.5,trichloroethylene,0.05,ND,0.05\n";

        ImportReport report = read(csv, project);

        assertEquals(List.of(), report.rejected());
        assertEquals(3, report.rowsRead());
        assertEquals(3, report.samplesImported());
        assertEquals(2, report.locations().size());
        SamplingLocation b7 = report.locations().get(0);
        assertEquals("B-7", b7.getName());
        assertEquals(40.0, b7.getEastingMetres(), 0.0);
        assertEquals(12.7, b7.getGroundElevationMetres(), 0.0);
        Sample first = b7.getSamples().get(0);
        assertEquals(project.getContaminants().get(0), first.getContaminant());
        assertEquals(3.2, first.getConcentrationMilligramsPerKg(), 0.0);
        assertFalse(first.isNonDetect());
        Sample lessThan = b7.getSamples().get(1);
        assertEquals(project.getContaminants().get(1), lessThan.getContaminant(), "matched by CAS number");
        assertTrue(lessThan.isNonDetect());
        assertEquals(0.05, lessThan.getDetectionLimitMilligramsPerKg(), 0.0);
        SamplingLocation b8 = report.locations().get(1);
        assertEquals("B-8, north", b8.getName());
        assertEquals(project.getSite().getGroundSurfaceElevationMetres(), b8.getGroundElevationMetres(), 0.0,
                "an empty ground elevation takes the site's");
        assertTrue(b8.getSamples().get(0).isNonDetect());
    }

    @Test
    void everyBadRowIsReportedWithItsLineAndReason() throws Exception {
        Project project = TestProjects.example();
        String csv = HEADER
                + "B-1,15,15,12.6,0.5,1.0,Benzene,2.0,,\n"          // line 2: good
                + ",15,15,12.6,0.5,1.0,Benzene,2.0,,\n"             // 3: no location
                + "B-2,east,15,12.6,0.5,1.0,Benzene,2.0,,\n"        // 4: not a number
                + "B-2,26,28,12.4,-1,1.0,Benzene,2.0,,\n"           // 5: negative depth
                + "B-2,26,28,12.4,2.0,1.0,Benzene,2.0,,\n"          // 6: bottom above top
                + "B-2,26,28,12.4,0.5,1.0,Toluene,2.0,,\n"          // 7: unknown contaminant
                + "B-2,26,28,12.4,0.5,1.0,Benzene,-3,,\n"           // 8: negative concentration
                + "B-2,26,28,12.4,0.5,1.0,Benzene,0.1,yes,\n"       // 9: non-detect without limit
                + "B-2,26,28,12.4,0.5,1.0,Benzene,0.1,maybe,0.1\n"  // 10: bad flag
                + "B-1,99,15,12.6,1.0,1.5,Benzene,2.0,,\n"          // 11: B-1 moved
                + "B-2,26,28,12.4,0.5,1.0,Benzene,\"0,35\",,\n"     // 12: decimal comma
                + "B-2,26,28\n"                                      // 13: short row
                + "B-2,26,28,12.4,0.5,1.0,Benzene,Infinity,,\n";    // 14: infinite

        ImportReport report = read(csv, project);

        assertEquals(13, report.rowsRead());
        assertEquals(1, report.samplesImported());
        List<Long> lines = report.rejected().stream().map(RejectedRow::line).toList();
        assertEquals(List.of(3L, 4L, 5L, 6L, 7L, 8L, 9L, 10L, 11L, 12L, 13L, 14L), lines);
        assertReason(report, 3, "location is empty");
        assertReason(report, 4, "easting_m = 'east' is not a number");
        assertReason(report, 5, "top_depth_m = -1.0: allowed 0 or more");
        assertReason(report, 6, "bottom_depth_m = 1.0: allowed at least top_depth_m = 2.0");
        assertReason(report, 7, "contaminant = 'Toluene' is not a contaminant of the project");
        assertReason(report, 8, "concentration_mg_per_kg = -3.0");
        assertReason(report, 9, "for a non-detect");
        assertReason(report, 10, "non_detect = 'maybe'");
        assertReason(report, 11, "on line 2");
        assertReason(report, 12, "use a point as decimal separator: 0.35");
        assertReason(report, 13, "column ");
        assertReason(report, 14, "allowed a finite number");
        assertTrue(report.summary().contains("12 rows not imported"), report.summary());
        assertTrue(report.summary().contains("line 7: contaminant = 'Toluene'"), report.summary());
    }

    @Test
    void semicolonFilesAndColumnsInAnyOrderAreRead() throws Exception {
        String csv = "Contaminant;Location;Top_Depth_m;Bottom_Depth_m;Easting_m;Northing_m;Concentration_mg_per_kg\n"
                + "Benzene;TP-1;0.2;0.4;5;6;1.5\n";

        ImportReport report = read(csv, TestProjects.example());

        assertEquals(List.of(), report.rejected());
        assertEquals(1.5, report.locations().get(0).getSamples().get(0).getConcentrationMilligramsPerKg(), 0.0);
    }

    @Test
    void aHeaderWithoutRequiredColumnsImportsNothingAndSaysWhich() throws Exception {
        ImportReport report = read("location,x,y,depth,contaminant,value\nB-1,1,2,3,Benzene,4\n", TestProjects.example());

        assertEquals(0, report.samplesImported());
        assertEquals(1, report.rejected().size());
        assertTrue(report.rejected().get(0).reason().contains("easting_m, northing_m, top_depth_m, bottom_depth_m, concentration_mg_per_kg"),
                report.rejected().get(0).reason());
    }

    @Test
    void anUnclosedQuoteStopsTheReadWithItsLine() throws Exception {
        String csv = HEADER + "B-1,15,15,12.6,0.5,1.0,Benzene,2.0,,\n\"B-2,26,28,12.4,0.5,1.0,Benzene,2.0,,\n";

        ImportReport report = read(csv, TestProjects.example());

        assertEquals(1, report.samplesImported());
        assertEquals(1, report.rejected().size());
        assertTrue(report.rejected().get(0).reason().contains("not valid CSV"), report.rejected().get(0).reason());
    }

    @Test
    void importedSamplesJoinExistingLocationsOfTheSameName() throws Exception {
        Project project = TestProjects.example();
        int before = project.getSite().getSamplingLocations().get(0).getSamples().size();
        ImportReport report = read(HEADER + "b-1,15,15,12.6,3.0,3.5,Benzene,0.2,,\nB-9,50,50,12,0,0.5,Benzene,0.1,,\n", project);

        SampleCsvImport.addTo(project.getSite(), report);

        assertEquals(before + 1, project.getSite().getSamplingLocations().get(0).getSamples().size());
        var locations = project.getSite().getSamplingLocations();
        assertEquals("B-9", locations.get(locations.size() - 1).getName(), "a new location is appended");
    }

    @Test
    void theShippedExampleSamplesImportCleanly() throws Exception {
        Project project = TestProjects.example();
        ImportReport report;
        try (java.io.Reader reader = new java.io.InputStreamReader(
                eluvia.site.files.ExampleProjects.open(eluvia.site.files.ExampleProjects.RIVERSIDE_DEPOT_SAMPLES),
                java.nio.charset.StandardCharsets.UTF_8)) {
            report = SampleCsvImport.read(reader, "riverside-depot-samples.csv", project);
        }

        assertEquals(List.of(), report.rejected());
        assertEquals(8, report.samplesImported());
        assertEquals(3, report.locations().size());
        SampleCsvImport.addTo(project.getSite(), report);
        assertFalse(eluvia.site.validation.SiteValidator.hasErrors(eluvia.site.validation.SiteValidator.validate(project)));
    }

    @Test
    void nullArgumentsAreRefused() {
        assertThrows(NullPointerException.class, () -> SampleCsvImport.read(null, "x", TestProjects.example()));
        assertThrows(NullPointerException.class, () -> SampleCsvImport.read(new StringReader(HEADER), "x", null));
    }

    private static void assertReason(ImportReport report, long line, String text) {
        RejectedRow row = report.rejected().stream().filter(r -> r.line() == line).findFirst()
                .orElseThrow(() -> new AssertionError("line " + line + " not rejected: " + report.rejected()));
        assertTrue(row.reason().contains(text), row.message());
    }
}
