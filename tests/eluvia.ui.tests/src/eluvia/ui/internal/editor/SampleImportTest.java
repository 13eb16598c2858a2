package eluvia.ui.internal.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.files.ExampleProjects;
import eluvia.site.model.UnitSystem;
import eluvia.site.sampling.ImportReport;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.FieldMessages;
import eluvia.ui.internal.fields.UnitDisplay;

/** The sampling page's CSV import adds what eluvia.site read, as one undoable edit, and reports bad rows. */
final class SampleImportTest {

    @TempDir
    Path dir;

    @Test
    void theShippedSampleFileIsImportedAndUndoneInOneStep() throws Exception {
        Path csv = dir.resolve("samples.csv");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT_SAMPLES)) {
            Files.copy(in, csv);
        }
        Files.writeString(csv, Files.readString(csv) + "B-9,1,2,,0.5,x,Benzene,3,,\n");
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            int before = f.document.project().getSite().getSamplingLocations().size();
            SampleImport importer = new SampleImport(new Bindings(f.document, new UnitDisplay(UnitSystem.SI),
                    new FieldMessages(f.gui.shell), null));
            ImportReport report = importer.importFile(f.gui.shell, csv, false);
            // the shipped file: 8 rows at 3 locations (B-3, B-4, B-5), all readable; the row added
            // here has a bottom depth that is not a number and is reported with its line
            assertEquals(8, report.samplesImported());
            assertEquals(1, report.rejected().size());
            assertTrue(report.rejected().get(0).message().contains("bottom_depth_m"), report.rejected().get(0).message());
            assertEquals(before + 3, f.document.project().getSite().getSamplingLocations().size());
            assertTrue(f.document.isDirty());
            f.document.undo();
            assertEquals(before, f.document.project().getSite().getSamplingLocations().size());
        }
    }
}
