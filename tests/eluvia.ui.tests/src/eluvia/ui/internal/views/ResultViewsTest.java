package eluvia.ui.internal.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingMethod;
import eluvia.report.chart.BarChart;
import eluvia.site.model.UnitSystem;
import eluvia.transport.CleanupCriterion;
import eluvia.ui.internal.ProjectFixture;

/** The chart views show the pipeline's numbers as the report bundle's charts. */
final class ResultViewsTest {

    @TempDir
    Path dir;

    @Test
    void thePoreVolumesChartHoldsThePipelinesNumbersAndIsDrawn() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            SashForm host = new SashForm(f.gui.shell, SWT.VERTICAL);
            PoreVolumesView view = new PoreVolumesView(host, f.documents);
            f.gui.shell.layout(true, true);
            f.awaitResults();
            f.gui.flush();
            assertNotNull(view.shownRun());
            DesignRun direct = DesignPipeline.run(f.document.snapshot());
            ContaminantFlushing expected = direct.flushing().get(0).contaminants().get(0);
            assertEquals(direct.flushing().get(0).designName(), view.firstCombo().getText());
            assertEquals(expected.contaminantName(), view.secondCombo().getText());
            BarChart chart = (BarChart) view.canvas().chart();
            assertEquals(List.of(CleanupCriterion.EFFLUENT.description(), CleanupCriterion.MEAN_RESIDUAL.description(),
                    CleanupCriterion.MAX_RESIDUAL.description()), chart.categories());
            for (int i = 0; i < 3; i++) {
                var e = expected.estimate(CleanupCriterion.values()[i]);
                // the bars are the pipeline's own figures, run independently here
                assertEquals(e.result().poreVolumes(), chart.series().get(0).values()[i], 1e-9 * e.result().poreVolumes());
                assertEquals(e.wellMixedPoreVolumes(), chart.series().get(1).values()[i], 1e-9 * e.wellMixedPoreVolumes());
                assertEquals(e.plugFlowPoreVolumes(), chart.series().get(2).values()[i], 1e-9 * e.plugFlowPoreVolumes());
                // the well-mixed estimate is the slow bound and plug flow (T = R) the fast one
                // (REFERENCES.md: P -> 0 and P -> infinity limits of the finite layer)
                assertTrue(e.plugFlowPoreVolumes() <= e.result().poreVolumes() + 1e-9);
            }
            f.gui.shell.setSize(1280, 860);
            f.gui.flush();
            view.canvas().redraw();
            f.gui.flush();
            assertTrue(view.canvas().renderCount() > 0, "the chart was drawn");
            f.gui.screenshot("pore-volumes-view");

            // another contaminant of the same design
            view.secondCombo().select(1);
            view.secondCombo().notifyListeners(SWT.Selection, null);
            assertEquals(direct.flushing().get(0).contaminants().get(1).estimate(CleanupCriterion.EFFLUENT).result()
                    .poreVolumes(), ((BarChart) view.canvas().chart()).series().get(0).values()[0], 1e-6);

            // the second design is held to the two-region solution: its bars are that solution's figures
            view.firstCombo().select(1);
            view.firstCombo().notifyListeners(SWT.Selection, null);
            ContaminantFlushing tce = direct.flushing().get(1).contaminants().stream()
                    .filter(c -> c.governingMethod() == FlushingMethod.TWO_REGION).findFirst().orElseThrow();
            view.secondCombo().select(List.of(view.secondCombo().getItems()).indexOf(tce.contaminantName()));
            view.secondCombo().notifyListeners(SWT.Selection, null);
            BarChart governed = (BarChart) view.canvas().chart();
            assertTrue(governed.series().get(0).name().contains(FlushingMethod.TWO_REGION.label()), governed.series().get(0).name());
            for (int i = 0; i < 3; i++) {
                assertEquals(tce.governingResult(CleanupCriterion.values()[i]).poreVolumes(),
                        governed.series().get(0).values()[i], 1e-9);
            }
        }
    }

    @Test
    void withoutAProjectTheViewsSayNothingIsOpen() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.documents.unregister(f.document);
            SashForm host = new SashForm(f.gui.shell, SWT.VERTICAL);
            PoreVolumesView view = new PoreVolumesView(host, f.documents);
            FlushingResultsView results = new FlushingResultsView(host, f.documents);
            f.gui.flush();
            assertNull(view.canvas().chart());
            assertEquals("No project is open.", results.statusText());
            f.documents.register(f.document, f.editor);
        }
    }
}
