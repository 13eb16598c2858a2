package eluvia.ui.internal.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DesignPipeline;
import eluvia.design.uncertainty.OutputStatistics;
import eluvia.design.uncertainty.UncertaintyResult;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.uncertainty.UncertainParameter;
import eluvia.ui.internal.uncertainty.UncertaintySetup;

/** The Uncertainty view runs the engine over the pipeline as a job, shows histogram and tornado, and cancels. */
final class UncertaintyViewTest {

    @TempDir
    Path dir;

    private static UncertaintyView view(ProjectFixture f) {
        SashForm host = new SashForm(f.gui.shell, SWT.VERTICAL);
        UncertaintyView view = new UncertaintyView(host, f.documents);
        f.gui.shell.layout(true, true);
        f.gui.flush();
        return view;
    }

    @Test
    void aShortSimulationCompletesAndAFixedInputCaseEqualsThePipeline() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            UncertaintyView view = view(f);
            assertFalse(view.parameters().isEmpty(), "inputs are offered");
            // Every input fixed: each run is the pipeline on the project as it is, so every output
            // equals the pipeline's own figure (run here independently) with zero spread.
            for (UncertainParameter p : view.parameters()) {
                p.setKind(UncertainParameter.Kind.FIXED);
            }
            view.runsSpinner().setSelection(4);
            view.runSimulation();
            f.gui.waitUntil("the simulation", () -> view.result() != null);
            UncertaintyResult r = view.result();
            assertFalse(r.cancelled());
            assertEquals(4, r.completedRunCount());
            String design = f.document.project().getFlushingDesigns().get(0).getName();
            var copy = f.document.snapshot();
            double pv = DesignPipeline.flush(copy, copy.getFlushingDesigns().get(0)).poreVolumes();
            OutputStatistics st = r.statistics(UncertaintySetup.poreVolumesOutput(design));
            assertEquals(pv, st.mean(), 1e-9 * pv);
            assertEquals(0, st.standardDeviation(), 1e-9 * pv);
        }
    }

    @Test
    void aSimulationShowsItsHistogramAndTornadoAndCanBeCancelled() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            UncertaintyView view = view(f);
            view.runsSpinner().setSelection(12);
            view.runSimulation();
            f.gui.waitUntil("the simulation", () -> view.result() != null);
            UncertaintyResult done = view.result();
            assertEquals(12, done.evaluatedRunCount());
            f.gui.flush();
            assertNotNull(view.histogramCanvas().chart(), view.statusText());
            assertNotNull(view.tornadoCanvas().chart(), view.statusText());
            String design = f.document.project().getFlushingDesigns().get(0).getName();
            OutputStatistics st = done.statistics(UncertaintySetup.poreVolumesOutput(design));
            // percentiles are ordered (a property of any sample, Hyndman-Fan definition 7)
            assertTrue(st.p10() <= st.p50() && st.p50() <= st.p90(), st.toString());
            f.gui.shell.setSize(1280, 860);
            f.gui.flush();
            f.gui.screenshot("uncertainty-view");

            // A long run, cancelled as soon as it has started: the engine returns a partial result marked cancelled.
            view.runsSpinner().setSelection(100_000);
            view.runSimulation();
            f.gui.waitUntil("the job to start", () -> view.job() != null && view.job().getState() == Job.RUNNING);
            view.cancelSimulation();
            f.gui.waitUntil("the cancelled result", () -> view.result() != null);
            UncertaintyResult cancelled = view.result();
            assertTrue(cancelled.cancelled());
            assertTrue(cancelled.evaluatedRunCount() < 100_000, "stopped early");
            assertTrue(view.statusText().startsWith("Cancelled"), view.statusText());
        }
    }
}
