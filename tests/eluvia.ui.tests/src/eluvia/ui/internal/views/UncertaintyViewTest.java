package eluvia.ui.internal.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.edit.command.RemoveCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DesignPipeline;
import eluvia.design.UncertaintyAnalysis;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.OutputStatistics;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.PriceItem;
import eluvia.site.model.SitePackage;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySettings;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.uncertainty.UncertaintySetup;

/** The Uncertainty view runs the engine over the pipeline as a job, shows histogram and tornado, and cancels. */
final class UncertaintyViewTest {

    private static final SitePackage P = SitePackage.eINSTANCE;

    @TempDir
    Path dir;

    private static UncertaintyView view(ProjectFixture f) {
        SashForm host = new SashForm(f.gui.shell, SWT.VERTICAL);
        UncertaintyView view = new UncertaintyView(host, f.documents);
        f.gui.shell.layout(true, true);
        f.gui.flush();
        return view;
    }

    private static void runs(ProjectFixture f, int runs) {
        f.document.execute(SetCommand.create(f.document.domain(), f.document.project().getUncertainty(),
                P.getUncertaintySettings_RunCount(), runs));
    }

    @Test
    void anInputTheFlushingDoesNotDependOnLeavesItsResultsAtThePipelinesValue() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            UncertaintySettings s = f.document.project().getUncertainty();
            assertNotNull(s, "the example has an uncertainty analysis");
            // keep only the input on a unit rate: flushing pore volumes, days and water do not depend on it
            List<UncertainInput> others = s.getInputs().stream().filter(i -> !(i.getTarget() instanceof PriceItem)).toList();
            f.document.execute(RemoveCommand.create(f.document.domain(), s, P.getUncertaintySettings_RankCorrelations(),
                    List.copyOf(s.getRankCorrelations())));
            f.document.execute(RemoveCommand.create(f.document.domain(), s, P.getUncertaintySettings_Inputs(), others));
            assertEquals(1, s.getInputs().size());
            runs(f, 2);
            UncertaintyView view = view(f);
            view.runSimulation();
            f.gui.waitUntil("the simulation", () -> view.result() != null || view.failure() != null);
            assertNull(view.failure());
            UncertaintyResults r = view.result();
            assertFalse(r.cancelled());
            assertEquals(2, r.completedRunCount(), view.statusText());
            var copy = f.document.snapshot();
            double pv = DesignPipeline.run(copy).flushing().get(0).poreVolumes();
            var headline = r.headline(copy.getFlushingDesigns().get(0).getName(), UncertaintyAnalysis.PORE_VOLUMES);
            // the pipeline's figure, run here independently, with no spread
            assertEquals(pv, headline.baseValue(), 1e-9 * pv);
            assertEquals(pv, headline.statistics().mean(), 1e-9 * pv);
            assertEquals(0, headline.statistics().standardDeviation(), 1e-9 * pv);
        }
    }

    @Test
    void aSimulationShowsItsHistogramAndTornadoAndCanBeCancelled() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            // more runs than inputs plus one: Iman-Conover needs them for the example's rank correlation
            runs(f, 8);
            UncertaintyView view = view(f);
            view.runSimulation();
            f.gui.waitUntil("the simulation", () -> view.result() != null || view.failure() != null);
            assertNull(view.failure());
            UncertaintyResults done = view.result();
            assertEquals(8, done.simulation().evaluatedRunCount(), view.statusText());
            f.gui.flush();
            assertNotNull(view.histogramCanvas().chart(), view.statusText());
            assertNotNull(view.tornadoCanvas().chart(), view.statusText());
            String design = f.document.project().getFlushingDesigns().get(0).getName();
            OutputStatistics st = done.headline(design, UncertaintyAnalysis.PORE_VOLUMES).statistics();
            // percentiles of any sample are ordered (Hyndman-Fan definition 7)
            assertTrue(st.p10() <= st.p50() && st.p50() <= st.p90(), st.toString());
            f.gui.shell.setSize(1280, 860);
            f.gui.flush();
            f.gui.screenshot("uncertainty-view");

            // A long run cancelled once it has started: the engine returns a partial result marked cancelled.
            runs(f, 100_000);
            view.runSimulation();
            f.gui.waitUntil("the job to start", () -> view.job() != null && view.job().getState() == Job.RUNNING);
            view.cancelSimulation();
            f.gui.waitUntil("the cancelled result", () -> view.result() != null || view.failure() != null);
            assertNull(view.failure());
            UncertaintyResults cancelled = view.result();
            assertTrue(cancelled.cancelled());
            assertTrue(cancelled.simulation().evaluatedRunCount() < 100_000, "stopped early");
            assertTrue(view.statusText().startsWith("Cancelled"), view.statusText());
        }
    }

    @Test
    void suggestedInputsCentreOnTheProjectsValuesAndAProjectWithoutInputsIsRefused() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.document.execute(SetCommand.create(f.document.domain(), f.document.project(), P.getProject_Uncertainty(), null));
            assertNull(f.document.project().getUncertainty());
            UncertaintyView view = view(f);
            view.runSimulation();
            assertNull(view.job(), "nothing to run without uncertain inputs");
            view.addSuggestions();
            UncertaintySettings s = f.document.project().getUncertainty();
            assertFalse(s.getInputs().isEmpty());
            double flux = f.document.project().getFlushingDesigns().get(0).getDarcyFluxMetresPerDay();
            UncertainInput first = s.getInputs().get(0);
            assertEquals(InputDistributionKind.TRIANGULAR, first.getDistribution());
            assertEquals(flux, first.getModeInFeatureUnit(), 0.0);
            assertEquals(flux * (1 - UncertaintySetup.FLUX_SPREAD_PERCENT / 100), first.getMinimumInFeatureUnit(), 1e-15);
            assertEquals("m/d", UncertaintySetup.unitOf(first.getFeatureName()));
            f.document.undo();
            assertNull(f.document.project().getUncertainty(), "one undo takes the suggestions back");
        }
    }
}
