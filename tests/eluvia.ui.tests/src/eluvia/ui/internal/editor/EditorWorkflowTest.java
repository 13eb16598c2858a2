package eluvia.ui.internal.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.UnitSystem;
import eluvia.site.validation.Problem;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;

/**
 * The shipped example in the editor with the Flushing results and Problems views: results shown
 * are the pipeline's, an edit changes them, undo restores them, a bad value is kept and explained,
 * and a validation problem leads to its field.
 */
final class EditorWorkflowTest {

    private static final SitePackage P = SitePackage.eINSTANCE;

    @TempDir
    Path dir;

    private static Text field(ProjectFixture f, String label) {
        return Gui.field(f.editor, Text.class, label);
    }

    @Test
    void anEditChangesTheResultsAndUndoRestoresThem() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            ResultState first = f.awaitResults();
            assertEquals(ResultState.Status.READY, first.status(), first.failure());
            f.gui.screenshot("editor-site-page");

            // The view shows what the pipeline computes for the same inputs, run here independently.
            DesignRun direct = DesignPipeline.run(f.document.snapshot());
            FlushingDesignResult expected = direct.flushing().get(0);
            FlushingDesignResult shown = f.results.shownRun().flushing().get(0);
            assertEquals(expected.poreVolumes(), shown.poreVolumes(), 1e-9 * expected.poreVolumes());
            assertTrue(f.results.headlineText().contains(Numbers.format(expected.poreVolumes(), Numbers.RESULT_DIGITS)),
                    f.results.headlineText());
            assertEquals(expected.designName(), f.results.table().getItem(0).getText(0));
            f.gui.screenshot("flushing-results");

            f.editor.showPage(f.editor.pageIndex("Flushing"));
            f.gui.flush();
            FlushingDesign design = f.document.project().getFlushingDesigns().get(0);
            double fluxBefore = design.getDarcyFluxMetresPerDay();
            Text flux = field(f, "Darcy flux (m/d)");
            flux.setFocus();
            // typed keystroke by keystroke: one undoable edit for the whole typing
            flux.setText("0");
            flux.setText("0.");
            flux.setText(Double.toString(fluxBefore * 2));
            assertEquals(fluxBefore * 2, design.getDarcyFluxMetresPerDay(), 1e-15);
            assertTrue(f.document.isDirty());
            ResultState second = f.awaitResults();
            f.gui.screenshot("editor-flushing-page");
            // Duration is t = T theta L / q (REFERENCES.md, pore volume T = q t / (theta L)): doubling q
            // halves the days for the same T; T itself changes little because dispersion grows with v
            // when alpha_L v dominates tau D0, so the ratio is near 1/2 (5 % allowed for that change).
            double before = first.run().flushing().get(0).calendarDays();
            double after = second.run().flushing().get(0).calendarDays();
            assertEquals(0.5, after / before, 0.05);

            f.document.undo();
            assertEquals(fluxBefore, design.getDarcyFluxMetresPerDay(), "one undo takes back the whole typing");
            assertFalse(f.document.isDirty());
            f.gui.flush();
            assertEquals(Numbers.format(fluxBefore), flux.getText(), "the field follows the undo");
            ResultState third = f.awaitResults();
            assertEquals(before, third.run().flushing().get(0).calendarDays(), 1e-9 * before,
                    "the results after undo are those of the original inputs");
            f.document.redo();
            assertEquals(fluxBefore * 2, design.getDarcyFluxMetresPerDay(), 1e-15);
        }
    }

    @Test
    void aBadValueIsKeptAsTypedExplainedAndKeptFromTheModel() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            f.editor.showPage(f.editor.pageIndex("Flushing"));
            f.gui.flush();
            FlushingDesign design = f.document.project().getFlushingDesigns().get(0);
            double fluxBefore = design.getDarcyFluxMetresPerDay();
            Text flux = field(f, "Darcy flux (m/d)");
            flux.setText("-3");
            f.gui.flush();
            assertEquals("-3", flux.getText(), "what the user typed stays in the field");
            assertEquals(fluxBefore, design.getDarcyFluxMetresPerDay());
            assertFalse(f.document.isDirty());
            String message = String.join("\n", f.editor.fieldMessages());
            assertTrue(message.contains("Darcy flux (m/d)") && message.contains("greater than 0"), message);
            f.gui.screenshot("editor-bad-value");
            flux.setText("abc");
            message = String.join("\n", f.editor.fieldMessages());
            assertTrue(message.contains("not a number"), message);
            flux.setText("0.25");
            assertEquals(0.25, design.getDarcyFluxMetresPerDay());
            assertTrue(f.editor.fieldMessages().isEmpty(), f.editor.fieldMessages().toString());
        }
    }

    @Test
    void aValidationProblemIsListedAsYouTypeAndLeadsToItsField() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            assertTrue(f.problems.problems().stream().noneMatch(p -> p.field().equals("waterContent")));
            f.editor.showPage(f.editor.pageIndex("Soil layers"));
            f.gui.flush();
            SoilLayer layer = f.document.project().getSite().getLayers().get(0);
            // A water content above the porosity passes the field's own range (0, 1) but not the
            // consistency rule theta <= n (a volumetric fraction cannot exceed the pore space).
            Text water = field(f, "Water content during flushing (-)");
            water.setText(Double.toString(layer.getPorosity() + 0.05));
            f.gui.flush();
            assertEquals(layer.getPorosity() + 0.05, layer.getWaterContent(), 1e-12, "the value reached the model");
            f.gui.idle(eluvia.ui.internal.views.ProblemsView.DEBOUNCE_MILLISECONDS + 100);
            f.gui.waitUntil("the problem to be listed",
                    () -> f.problems.problems().stream().anyMatch(p -> p.object() == layer && p.field().equals("waterContent")));
            int row = -1;
            for (int i = 0; i < f.problems.problems().size(); i++) {
                Problem p = f.problems.problems().get(i);
                if (p.object() == layer && p.field().equals("waterContent")) {
                    row = i;
                }
            }
            Problem p = f.problems.problems().get(row);
            assertTrue(p.allowedRange().contains("porosity"), p.allowedRange());
            assertTrue(!p.fix().isEmpty(), "the problem says how to fix it");
            ResultState blocked = f.awaitResults();
            assertEquals(ResultState.Status.INPUT_ERRORS, blocked.status());

            // go elsewhere first, then navigate from the Problems view
            f.editor.showPage(f.editor.pageIndex("Site"));
            f.gui.flush();
            assertTrue(f.problems.goTo(row));
            f.gui.flush();
            assertEquals(f.editor.pageIndex("Soil layers"), f.editor.tabs().getSelectionIndex());
            Control focused = f.gui.display.getFocusControl();
            assertNotNull(focused, "a control has the focus");
            assertSame(water.isDisposed() ? field(f, "Water content during flushing (-)") : water, focused,
                    "the water content field of that layer has the focus");
            f.gui.screenshot("problems-navigation");
        }
    }

    @Test
    void everyPageOfTheExampleOpensAndIsPictured() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            int pages = f.editor.tabs().getItemCount();
            assertEquals(12, pages, "site, layers, contaminants, sampling, cleanup levels, zones, flushing, excavation, "
                    + "price books, column tests, uncertainty, zone analysis");
            for (int i = 0; i < pages; i++) {
                f.editor.showPage(i);
                f.gui.flush();
                assertNotNull(f.editor.tabs().getItem(i).getControl(), f.editor.tabs().getItem(i).getText());
                f.gui.screenshot("editor-page-" + (i + 1) + "-" + f.editor.tabs().getItem(i).getText().replace(' ', '-'));
            }
            assertTrue(f.editor.fieldMessages().isEmpty(), "the example's values are all within their fields' ranges: "
                    + f.editor.fieldMessages());
            // whole numbers are shown exactly, never rounded to six figures (a seed of eight digits)
            f.editor.showPage(f.editor.pageIndex("Uncertainty"));
            f.gui.flush();
            long seed = f.document.project().getUncertainty().getSeed();
            assertEquals(Long.toString(seed), Gui.field(f.editor, Text.class, "Seed (same seed, same results) (-)").getText());
        }
    }

    @Test
    void theExcavationCautionShowsWhileThePitIsDeeperThanFiveFeet() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            f.editor.showPage(f.editor.pageIndex("Excavation"));
            f.gui.flush();
            eluvia.site.model.ExcavationDesign design = f.document.project().getExcavationDesigns().get(0);
            // 5 ft = 1.524 m (1 ft = 0.3048 m exactly, REFERENCES.md; US OSHA 29 CFR 1926 Subpart P threshold)
            assertEquals(1.524, ExcavationPage.PROTECTIVE_SYSTEM_DEPTH_METRES, 1e-12);
            assertTrue(ExcavationPage.pitDepthMetres(design) > 1.524, "the example's pit is deeper than 5 ft");
            org.eclipse.swt.widgets.Composite caution = Gui.find(f.editor, org.eclipse.swt.widgets.Composite.class,
                    c -> "caution".equals(c.getData("eluvia.role")) && c.getChildren().length > 0
                            && ((org.eclipse.swt.widgets.Label) c.getChildren()[0]).getText().contains("1.5 m"));
            assertTrue(caution.isVisible());
            f.gui.screenshot("editor-excavation-page");
            f.document.execute(org.eclipse.emf.edit.command.SetCommand.create(f.document.domain(), design,
                    SitePackage.eINSTANCE.getExcavationDesign_Zone(), null));
            f.gui.flush();
            assertFalse(caution.isVisible(), "no pit, no caution");
            f.document.undo();
            f.gui.flush();
            assertTrue(caution.isVisible());
        }
    }

    @Test
    void usCustomaryUnitsAreShownAndTypedButSiIsStored() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.US_CUSTOMARY)) {
            f.awaitResults();
            f.editor.showPage(f.editor.pageIndex("Flushing"));
            f.gui.flush();
            FlushingDesign design = f.document.project().getFlushingDesigns().get(0);
            Text flux = field(f, "Darcy flux (ft/d)");
            // 1 ft = 0.3048 m exactly (REFERENCES.md, Units)
            assertEquals(design.getDarcyFluxMetresPerDay() / 0.3048, Numbers.parse(flux.getText()),
                    1e-5 * design.getDarcyFluxMetresPerDay() / 0.3048, "six significant figures shown");
            flux.setText("1");
            assertEquals(0.3048, design.getDarcyFluxMetresPerDay(), 1e-15);
            f.gui.screenshot("editor-us-units");
            f.editor.setUnits(UnitSystem.SI);
            f.gui.flush();
            assertEquals("0.3048", field(f, "Darcy flux (m/d)").getText());
        }
    }
}
