package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;
import eluvia.transport.internal.FiniteLayerModel;

/** Richardson extrapolation of the pore volumes to target against the Brenner (1962) series. */
final class ExtrapolatedTargetSearchTest {

    @ParameterizedTest
    @CsvSource({ "1, EFFLUENT, 0.01, 20", "10, EFFLUENT, 0.01, 20", "10, MEAN_RESIDUAL, 1e-4, 20",
            "100, MAX_RESIDUAL, 0.01, 200" })
    void extrapolationRemovesTheSecondOrderError(double peclet, CleanupCriterion criterion, double target, int cells) {
        double retardation = 2;
        SoilLayer layer = Columns.sand(1, 1 / peclet)
                .isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(retardation))).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
        SolverSettings settings = SolverSettings.builder().minimumCellsPerLayer(cells).maximumCellPeclet(2).build();
        ExtrapolatedTarget e = ExtrapolatedTargetSearch.poreVolumesToTarget(col, settings, 0.01, criterion, target, 1000);
        FiniteLayerModel exact = new FiniteLayerModel(retardation, peclet, 0);
        // computed in the test: Brenner (1962) series of FiniteLayerModel, root by Commons Math 3.6.1 BrentSolver
        double expected = new BrentSolver(1e-14, 1e-14).solve(10_000, t -> exact.remainingFraction(criterion, t) - target,
                1e-3, 1000);
        assertTrue(e.reached());
        double fineError = Math.abs(e.finePoreVolumes() - expected);
        // second order: the fine run (half the cell and the step) is about four times closer
        assertEquals(4.0, Math.abs(e.coarsePoreVolumes() - expected) / fineError, 0.4);
        // the estimate |fine - coarse| / 3 tracks the fine run's error within 20 %
        assertEquals(fineError, e.errorEstimatePoreVolumes(), 0.2 * fineError);
        // measured while writing: extrapolated errors 1e-8 to 4e-5 relative; 5e-5 allowed
        assertEquals(expected, e.poreVolumes(), 5e-5 * expected);
        assertTrue(Math.abs(e.poreVolumes() - expected) < 0.2 * fineError);
        // cost: the coarse run plus one with twice the cells and twice the steps
        assertTrue(e.cellSteps() > 0);
    }

    @Test
    void notReachedAndBadInput() {
        SoilLayer layer = Columns.sand(1, 0.1).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
        ExtrapolatedTarget e = ExtrapolatedTargetSearch.poreVolumesToTarget(col, SolverSettings.defaults(), 0.05,
                CleanupCriterion.EFFLUENT, 1e-3, 1);
        assertFalse(e.reached());
        assertTrue(Double.isNaN(e.poreVolumes()));
        TransportInputException x = assertThrows(TransportInputException.class, () -> ExtrapolatedTargetSearch
                .poreVolumesToTarget(col, SolverSettings.defaults(), 0, CleanupCriterion.EFFLUENT, 0.01, 10));
        assertTrue(x.quantity().contains("coarse time step"));
        assertThrows(TransportInputException.class, () -> ExtrapolatedTargetSearch.poreVolumesToTarget(col, null, 0.01,
                CleanupCriterion.EFFLUENT, 0.01, 10));
        // the fine run needs twice the cells: beyond the cell limit it is refused
        TransportInputException y = assertThrows(TransportInputException.class,
                () -> ExtrapolatedTargetSearch.poreVolumesToTarget(col,
                        SolverSettings.builder().minimumCellsPerLayer(150).maximumCellCount(200).build(), 0.01,
                        CleanupCriterion.EFFLUENT, 0.01, 10));
        assertEquals("300", y.value());
    }
}
