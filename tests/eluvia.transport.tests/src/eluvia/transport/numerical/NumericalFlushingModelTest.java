package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;
import eluvia.transport.FlushingModels;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.LayerTransport;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.PoreVolumeSearch;
import eluvia.transport.TransportInputException;

/** The numerical solver behind the FlushingModel interface, used by PoreVolumeSearch. */
final class NumericalFlushingModelTest {
    /** Invented screening layer: 2 m, theta 0.3, n 0.4, 1600 kg/m3, Kd 0.5 L/kg, q 0.05 m/d, alpha_L 0.2 m, D0 1e-9 m2/s, decay 1e-3 /d. */
    private static final LayerFlushingInput INPUT = new LayerFlushingInput(2, 0.3, 0.4, 1600, 0.5, 0.05, 0.2, 1e-9, 1e-3);

    @Test
    void searchOverTheNumericalModelMatchesTheFiniteLayerModel() {
        FlushingModel numerical = NumericalFlushingModel.of(INPUT, SolverSettings.defaults());
        FlushingModel exact = FlushingModels.finiteLayer(LayerTransport.of(INPUT));
        for (CleanupCriterion c : CleanupCriterion.values()) {
            // analytic part of this bundle: Brenner (1962) series times the decay factor
            PoreVolumeResult expected = PoreVolumeSearch.solve(exact, c, 0.005, 100);
            PoreVolumeResult got = PoreVolumeSearch.solve(numerical, c, 0.005, 100);
            assertTrue(got.reachable(), got.describe());
            // default accuracy of the solver (FiniteLayerTest) 2e-3, plus interpolation
            assertEquals(expected.poreVolumes(), got.poreVolumes(), 2e-3 * expected.poreVolumes(), c.word());
            PoreVolumeResult direct = ((NumericalFlushingModel) numerical).poreVolumesToTarget(c, 0.005, 100);
            // the solver's own crossing and the interpolated history: same run, same steps
            assertEquals(direct.poreVolumes(), got.poreVolumes(), 1e-4 * direct.poreVolumes(), c.word());
        }
        assertEquals("numerical", numerical.name());
        assertEquals(1.0, numerical.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, 0), 1e-15);
    }

    @Test
    void remainingFractionFollowsTheSeriesAlongTheWay() {
        FlushingModel numerical = NumericalFlushingModel.of(INPUT, SolverSettings.defaults());
        FlushingModel exact = FlushingModels.finiteLayer(LayerTransport.of(INPUT));
        for (double t : new double[] { 0.3, 1.1, 2.7, 6.4, 15 }) {
            for (CleanupCriterion c : CleanupCriterion.values()) {
                // analytic part of this bundle; 1e-3 of the initial value, the grid error at the defaults
                assertEquals(exact.remainingFraction(c, t), numerical.remainingFraction(c, t), 1e-3, c + " at " + t);
            }
        }
        // beyond the first stored run (10 pore volumes minimum): reruns longer
        assertTrue(numerical.remainingFraction(CleanupCriterion.EFFLUENT, 400) < 1e-6);
    }

    @Test
    void layeredNonlinearColumnWorksThroughTheSearch() {
        SoilLayer top = Columns.sand(0.6, 0.06).isotherm(SorptionIsotherm.freundlich(2, 0.75)).build();
        SoilLayer bottom = Columns.sand(0.9, 0.09).isotherm(SorptionIsotherm.langmuir(30, 0.05)).build();
        FlushingColumn col = new FlushingColumn(List.of(top, bottom), 0.1, 0, InitialCondition.soilPerLayer(20, 5));
        NumericalFlushingModel model = new NumericalFlushingModel(col, SolverSettings.defaults());
        PoreVolumeResult viaSearch = PoreVolumeSearch.solve(model, CleanupCriterion.MEAN_RESIDUAL, 0.02, 300);
        PoreVolumeResult direct = model.poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL, 0.02, 300);
        assertTrue(direct.reachable(), direct.describe());
        // same run, interpolated history against the solver's own crossing
        assertEquals(direct.poreVolumes(), viaSearch.poreVolumes(), 1e-4 * direct.poreVolumes());
        PoreVolumeResult never = model.poreVolumesToTarget(CleanupCriterion.MAX_RESIDUAL, 1e-6, 2);
        assertFalse(never.reachable());
        assertThrows(TransportInputException.class, () -> model.remainingFraction(CleanupCriterion.EFFLUENT, -1));
        assertThrows(TransportInputException.class, () -> model.remainingFraction(null, 1));
        assertThrows(TransportInputException.class, () -> NumericalFlushingModel.of(null, SolverSettings.defaults()));
    }
}
