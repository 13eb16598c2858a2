package eluvia.ui.internal.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.ContaminantZone;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.site.model.SitePackage;
import eluvia.site.model.UnitSystem;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.FieldMessages;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Range;
import eluvia.ui.internal.fields.UnitDisplay;
import eluvia.zone.LagClass;

/**
 * The Zone analysis page on the shipped example: an edit reaches the model as one undoable
 * command, bad values are kept as typed and explained, the delays are a list of numbers, the
 * settings can be created with one undoable command, and the experimental variogram of the latest
 * results is shown.
 */
final class ZoneAnalysisPageTest {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private static final String PAGE = "Zone analysis";
    private static final String POWER = "Inverse-distance power (-)";
    private static final String DELAYS = "Delays before the remedy starts (years)";

    @TempDir
    Path dir;

    @Test
    void thePowerFieldEditsTheModelAndUndoRestoresIt() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            ResultState state = f.awaitResults();
            assertEquals(ResultState.Status.READY, state.status(), state.failure());
            f.editor.showPage(f.editor.pageIndex(PAGE));
            f.gui.flush();
            ZoneAnalysisSettings s = f.document.project().getZoneAnalysis();
            assertNotNull(s, "the example has zone-analysis settings");
            double before = s.getInverseDistancePower();
            // the example leaves the power at the model's default, 2 (common practice)
            assertEquals(2.0, before, 0.0);
            Text power = Gui.field(f.editor, Text.class, POWER);
            assertEquals("2", power.getText());
            power.setFocus();
            power.setText("3");
            assertEquals(3.0, s.getInverseDistancePower(), 0.0); // typed
            assertTrue(f.document.isDirty());
            assertTrue(f.document.canUndo());
            f.gui.screenshot("editor-zone-analysis-page");
            f.document.undo();
            f.gui.flush();
            assertEquals(before, s.getInverseDistancePower(), 0.0);
            assertEquals("2", power.getText());

            // a power outside (0, 20] (site validation's range) is kept as typed, explained, and not stored
            power.setText("0");
            assertEquals(before, s.getInverseDistancePower(), 0.0);
            assertEquals("0", power.getText());
            assertTrue(f.editor.fieldMessages().stream().anyMatch(m -> m.contains(POWER) && m.contains("0")),
                    f.editor.fieldMessages().toString());
            power.setText("2.5");
            assertEquals(2.5, s.getInverseDistancePower(), 0.0); // typed
            assertTrue(f.editor.fieldMessages().isEmpty(), f.editor.fieldMessages().toString());
        }
    }

    @Test
    void theDelaysAreNumbersSeparatedBySpaces() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            f.editor.showPage(f.editor.pageIndex(PAGE));
            f.gui.flush();
            ZoneAnalysisSettings s = f.document.project().getZoneAnalysis();
            Text delays = Gui.field(f.editor, Text.class, DELAYS);
            // the example's delays, years (examples/riverside-depot.eluvia)
            assertEquals("0 1 2 5 10", delays.getText());
            List<Double> before = List.copyOf(s.getDelayYears());

            delays.setFocus();
            delays.setText("0 2 1");
            assertEquals(before, s.getDelayYears(), "not increasing: kept as typed, not stored");
            assertEquals("0 2 1", delays.getText());
            assertFalse(f.editor.fieldMessages().isEmpty());
            delays.setText("0 x");
            assertEquals(before, s.getDelayYears(), "not a number: not stored");
            delays.setText("0 150");
            assertEquals(before, s.getDelayYears(), "above 100 years: not stored");
            delays.setText("0 3 6");
            assertEquals(List.of(0.0, 3.0, 6.0), s.getDelayYears()); // typed
            assertTrue(f.editor.fieldMessages().isEmpty(), f.editor.fieldMessages().toString());
            f.document.undo();
            f.gui.flush();
            assertEquals(before, s.getDelayYears());
            assertEquals("0 1 2 5 10", delays.getText());
        }
    }

    @Test
    void theSettingsAreCreatedWithOneUndoableCommand() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            f.editor.showPage(f.editor.pageIndex(PAGE));
            f.gui.flush();
            f.document.execute(SetCommand.create(f.document.domain(), f.document.project(), P.getProject_ZoneAnalysis(), null));
            f.gui.flush();
            assertNull(f.document.project().getZoneAnalysis());
            Button use = Gui.find(f.editor, Button.class, b -> "Use zone-analysis settings".equals(b.getText()));
            use.notifyListeners(SWT.Selection, null);
            f.gui.flush();
            ZoneAnalysisSettings created = f.document.project().getZoneAnalysis();
            assertNotNull(created);
            // the model's defaults: power 2 and 16 neighbours (common practice, site.ecore)
            assertEquals(2.0, created.getInverseDistancePower(), 0.0);
            assertEquals(16, created.getMaximumNeighbours());
            assertNotNull(Gui.field(f.editor, Text.class, POWER), "the fields replace the button");
            f.document.undo();
            f.gui.flush();
            assertNull(f.document.project().getZoneAnalysis());
        }
    }

    @Test
    void theExperimentalVariogramOfTheLatestResultsIsShown() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            ResultState state = f.awaitResults();
            f.editor.showPage(f.editor.pageIndex(PAGE));
            f.gui.flush();
            DesignRun direct = DesignPipeline.run(f.document.snapshot());
            assertTrue(direct.zoneAnalysis().available(), direct.zoneAnalysis().unavailableReason());
            Table table = Gui.find(f.editor, Table.class, t -> t.getColumnCount() == 5);
            int rows = 0;
            for (ContaminantZone c : direct.zoneAnalysis().contaminants()) {
                if (c.experimentalVariogram() == null) {
                    continue;
                }
                long pairs = 0;
                for (LagClass l : c.experimentalVariogram().lagClasses()) {
                    // the row shows the pipeline's class, run independently here
                    assertEquals(c.contaminantName(), table.getItem(rows).getText(0));
                    assertEquals(Long.toString(l.pairCount()), table.getItem(rows).getText(3));
                    pairs += l.pairCount();
                    rows++;
                }
                // every pair counted once: at most n (n - 1) / 2 pairs for n samples (common practice)
                long n = c.sampleCount();
                assertTrue(pairs <= n * (n - 1) / 2, pairs + " pairs for " + n + " samples");
            }
            assertTrue(rows > 0, "the example's samples give an experimental variogram");
            assertEquals(rows, table.getItemCount());
            assertEquals(state.run().zoneAnalysis().contaminants().size(), direct.zoneAnalysis().contaminants().size());
            f.gui.screenshot("editor-zone-analysis-variogram");
        }
    }

    @Test
    void aListFieldNeedsAManyValuedAttribute() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            Composite c = new Composite(f.gui.shell, SWT.NONE);
            ZoneAnalysisSettings s = f.document.project().getZoneAnalysis();
            Bindings b = new Bindings(f.document, new UnitDisplay(UnitSystem.SI), new FieldMessages(c), null);
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> b.numberList(c, s,
                    P.getZoneAnalysisSettings_InverseDistancePower(), NumberSpec.fixed("Power", "-", Range.positive()), false));
            assertTrue(e.getMessage().contains("inverseDistancePower"), e.getMessage());
        }
    }
}
