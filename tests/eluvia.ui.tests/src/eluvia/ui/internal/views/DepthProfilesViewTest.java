package eluvia.ui.internal.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DepthProfileSet;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.report.chart.DepthProfile;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.document.ResultState;

/**
 * The Depth profiles view on the shipped example: a chart for the first flushing design, and the
 * slider changes the share of the design pore volumes shown (recomputed in a background job).
 */
final class DepthProfilesViewTest {

    @TempDir
    Path dir;

    private static DepthProfileSet awaitProfiles(ProjectFixture f, DepthProfilesView view, List<Double> shares) {
        f.gui.waitUntil("the depth profiles at " + shares, () -> {
            DepthProfileSet s = view.shownProfiles();
            return !view.busy() && s != null
                    && shares.equals(s.profiles().stream().map(DepthProfileSet.Profile::shareOfDesign).toList());
        });
        return view.shownProfiles();
    }

    @Test
    void theViewShowsTheFirstDesignsProfilesAndTheSliderMovesThem() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI); Gui viewShell = Gui.open(1000, 720)) {
            SashForm host = new SashForm(viewShell.shell, SWT.VERTICAL);
            DepthProfilesView view = (DepthProfilesView) ResultPart.create("depthProfiles", host, f.documents);
            viewShell.show();
            ResultState state = f.awaitResults();
            assertEquals(ResultState.Status.READY, state.status(), state.failure());
            DesignRun direct = DesignPipeline.run(f.document.snapshot());
            FlushingDesignResult first = direct.flushing().get(0);
            assertEquals(first.designName(), view.designCombo().getText());
            assertEquals(first.controllingContaminant(), view.contaminantCombo().getText());
            assertEquals(DepthProfilesView.INITIAL_PERCENT, view.shareScale().getSelection());

            DepthProfileSet half = awaitProfiles(f, view, List.of(0.0, 0.5, 1.0));
            assertTrue(half.available(), half.unavailableReason());
            // pore volumes at a share are that share of the design's pore volumes (the design's own figure,
            // from the pipeline run independently here); 1e-9 relative for the days-to-pore-volumes round trip
            double designPv = first.poreVolumes();
            assertEquals(0.5 * designPv, half.profiles().get(1).poreVolumes(), 1e-9 * designPv);
            DepthProfile chart = (DepthProfile) view.canvas().chart();
            assertNotNull(chart, view.canvas().message());
            assertEquals(3, chart.profiles().size(), "one series per time");
            viewShell.flush();
            view.canvas().redraw();
            viewShell.flush();
            assertTrue(view.canvas().renderCount() > 0, "the chart was drawn");
            viewShell.idle(300);
            viewShell.screenshot("depth-profiles-view");

            String halfName = chart.profiles().get(1).name();
            view.shareScale().setSelection(20);
            view.shareScale().notifyListeners(SWT.Selection, null);
            DepthProfileSet fifth = awaitProfiles(f, view, List.of(0.0, 0.2, 1.0));
            assertEquals(0.2 * designPv, fifth.profiles().get(1).poreVolumes(), 1e-9 * designPv);
            DepthProfile moved = (DepthProfile) view.canvas().chart();
            assertNotEquals(halfName, moved.profiles().get(1).name(), "the shown pore volumes changed");
            // flushing only lowers the soil concentration: at 20 % of the design no cell holds more than
            // at the start (maximum principle of clean-water flushing, common practice; 1e-6 for the solver's step tolerance)
            double[] start = fifth.profiles().get(0).soilMilligramsPerKg();
            double[] later = fifth.profiles().get(1).soilMilligramsPerKg();
            for (int i = 0; i < start.length; i++) {
                assertTrue(later[i] <= start[i] * (1 + 1e-6), "cell " + i);
            }
            view.canvas().redraw();
            viewShell.idle(300);
            viewShell.screenshot("depth-profiles-view-20-percent");

            // the slider's ends draw the start and the design's pore volumes only
            view.shareScale().setSelection(100);
            view.shareScale().notifyListeners(SWT.Selection, null);
            DepthProfileSet end = awaitProfiles(f, view, List.of(0.0, 1.0));
            assertEquals(designPv, end.profiles().get(1).poreVolumes(), 1e-9 * designPv);
        }
    }

    @Test
    void sharesOutsideTheSliderAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DepthProfilesView.shares(101));
        assertTrue(e.getMessage().contains("101") && e.getMessage().contains("0 to 100"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> DepthProfilesView.shares(-1));
        assertEquals(List.of(0.0, 0.25, 1.0), DepthProfilesView.shares(25)); // 25 % as a fraction, exact
    }
}
