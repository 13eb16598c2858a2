package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;
import eluvia.transport.internal.FiniteLayerModel;

/**
 * The modal (exact-in-time) solution of the finite-volume equations against three independent
 * references: the exact finite-layer series (Brenner 1962) as the grid is refined, a Commons Math
 * 3.6.1 Dormand-Prince method-of-lines solve of the same grid, and the implicit BDF2 solver on
 * the same grid (whose difference from the modal solution is then its time error alone).
 */
final class ModalFlushingSolutionTest {
    private static final double R = 2;

    /** 1 m, theta 0.3, R = 2, q = 0.1 m/day, dispersivity 1/P m, initially 1 mg/L. */
    private static FlushingColumn column(double peclet) {
        SoilLayer layer = Columns.sand(1, 1 / peclet).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R))).build();
        return FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
    }

    private static SolverSettings cells(int n) {
        return SolverSettings.builder().minimumCellsPerLayer(n).maximumCellPeclet(2).build();
    }

    private static double exactPoreVolumes(double peclet, double target) {
        FiniteLayerModel exact = new FiniteLayerModel(R, peclet, 0);
        return new BrentSolver(1e-14, 1e-14).solve(10_000,
                t -> exact.remainingFraction(CleanupCriterion.EFFLUENT, t) - target, 1e-3, 1000);
    }

    @Test
    void convergesToTheBrennerSeriesAtSecondOrderInSpace() {
        // reference: exact finite-layer series (Brenner 1962), root by Commons Math BrentSolver
        double exact = exactPoreVolumes(10, 0.01);
        double[] errors = new double[3];
        int[] n = { 16, 32, 64 };
        for (int k = 0; k < 3; k++) {
            ModalFlushingSolution m = ModalFlushingSolution.of(column(10), cells(n[k]));
            assertEquals(n[k], m.cellCount());
            errors[k] = m.poreVolumesToTarget(CleanupCriterion.EFFLUENT, 0.01, 1000).poreVolumes() / exact - 1;
        }
        // central finite volumes: expected order 2 (NumericalFlushingSolver class comment)
        assertEquals(2.0, Math.log(errors[0] / errors[1]) / Math.log(2), 0.15);
        assertEquals(2.0, Math.log(errors[1] / errors[2]) / Math.log(2), 0.15);
        assertTrue(Math.abs(errors[2]) < 1e-4, "error at 64 cells " + errors[2]);
    }

    @Test
    void richardsonExtrapolationInSpaceGainsAnOrder() {
        // reference: exact finite-layer series (Brenner 1962); coarse 8 cells, fine 16, P = 10
        double exact = exactPoreVolumes(10, 0.01);
        ExtrapolatedTarget x = ModalFlushingSolution.extrapolatedPoreVolumesToTarget(column(10), cells(8),
                CleanupCriterion.EFFLUENT, 0.01, 1000);
        assertTrue(x.reached());
        double fineError = Math.abs(x.finePoreVolumes() / exact - 1);
        double extrapolatedError = Math.abs(x.poreVolumes() / exact - 1);
        assertTrue(extrapolatedError < fineError / 5, "fine " + fineError + ", extrapolated " + extrapolatedError);
        // the error estimate of the fine grid is of the right size (within a factor of 2)
        double estimate = x.errorEstimatePoreVolumes() / exact;
        assertTrue(estimate > fineError / 2 && estimate < 2 * fineError, "estimate " + estimate + ", actual " + fineError);
        // the cost measure as documented: the sum of the squared cell counts
        assertEquals(8 * 8 + 16 * 16, x.cellSteps());
    }

    @Test
    void matchesTheMethodOfLinesOnTheSameGrid() {
        // reference: Commons Math 3.6.1 DormandPrince853 on the same finite-volume equations
        // (MethodOfLinesReference, relative tolerance 1e-10); both are exact in time up to their tolerances
        FlushingColumn col = column(4);
        SolverSettings s = cells(20);
        ModalFlushingSolution m = ModalFlushingSolution.of(col, s);
        MethodOfLinesReference mol = new MethodOfLinesReference(col.layers(), 20, col.darcyFluxMetresPerDay(), 0);
        double[] start = new double[20];
        java.util.Arrays.fill(start, 1.0);
        double[] y0 = mol.initialState(start);
        // stored amount per bulk volume over pore water: theta R = 0.3 x 2 (linear sorption)
        double storage = 0.3 * R;
        double[] days = { 0.5, 3, 6, 12, 20 };
        for (int k = 0; k < days.length; k++) {
            double[] y = mol.stateAtDays(y0, days[k], 1e-10);
            double[] modal = m.poreWaterMilligramsPerLitre(days[k]);
            for (int i = 0; i < modal.length; i++) {
                assertEquals(y[i] / storage, modal[i], 1e-8, "cell " + i + " at " + days[k] + " days");
            }
            assertEquals(modal[modal.length - 1], m.effluentMilligramsPerLitre(days[k]), 1e-12);
        }
    }

    @Test
    void implicitSolverDiffersOnlyByItsSecondOrderTimeError() {
        // same grid: the BDF2 solver minus the modal solution is BDF2's time error alone, which
        // halves twice over when the step halves (order 2, Hairer, Norsett and Wanner 1993)
        FlushingColumn col = column(10);
        ModalFlushingSolution m = ModalFlushingSolution.of(col, cells(24));
        double exactInTime = m.poreVolumesToTarget(CleanupCriterion.EFFLUENT, 0.01, 1000).poreVolumes();
        double[] err = new double[3];
        double[] steps = { 0.04, 0.02, 0.01 };
        for (int k = 0; k < 3; k++) {
            SolverSettings s = SolverSettings.builder().minimumCellsPerLayer(24).maximumCellPeclet(2)
                    .fixedStepPoreVolumes(steps[k]).build();
            double pv = new NumericalFlushingSolver(col, s)
                    .run(FlushingRunRequest.upToPoreVolumes(100).target(CleanupCriterion.EFFLUENT, 0.01).build())
                    .outcome(CleanupCriterion.EFFLUENT).poreVolumes();
            err[k] = pv - exactInTime;
        }
        assertEquals(2.0, Math.log(err[0] / err[1]) / Math.log(2), 0.2, "errors " + err[0] + ", " + err[1]);
        assertEquals(2.0, Math.log(err[1] / err[2]) / Math.log(2), 0.2, "errors " + err[1] + ", " + err[2]);
    }

    @Test
    void allThreeCriteriaMatchTheImplicitSolverWithFineSteps() {
        // implicit solver with steps of 0.002 pore volumes: time error below 1e-5 (previous test's order)
        FlushingColumn col = column(3);
        SolverSettings grid = cells(30);
        ModalFlushingSolution m = ModalFlushingSolution.of(col, grid);
        FlushingRunResult r = new NumericalFlushingSolver(col, grid.toBuilder().fixedStepPoreVolumes(0.002).build())
                .run(FlushingRunRequest.upToPoreVolumes(8).build());
        double[] pv = r.poreVolumes();
        for (int i = 250; i < pv.length; i += 500) {
            assertEquals(r.effluentMilligramsPerLitre()[i], m.remainingFraction(CleanupCriterion.EFFLUENT, pv[i]), 2e-5);
            assertEquals(r.meanResidualFraction()[i], m.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, pv[i]), 2e-5);
            assertEquals(r.maxResidualFraction()[i], m.remainingFraction(CleanupCriterion.MAX_RESIDUAL, pv[i]), 2e-5);
        }
    }

    @Test
    void massLeavesOnlyThroughTheOutlet() {
        // mass balance of the exact solution: stored(0) - stored(t) = integral of q C_out dt
        // (clean inflow, no decay); integral by Commons Math 3.6.1 IterativeLegendreGaussIntegrator
        FlushingColumn col = column(5);
        ModalFlushingSolution m = ModalFlushingSolution.of(col, cells(25));
        double q = col.darcyFluxMetresPerDay();
        double t = 15;
        double out = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-14).integrate(100_000,
                d -> q * m.effluentMilligramsPerLitre(d) * 1000, 0, t);
        double stored0 = m.storedMilligramsPerSquareMetre(0);
        // initial stored mass: (theta + rho_b Kd) C0 L = theta R C0 L = 0.3 x 2 x 1 mg/L x 1 m = 600 mg/m2
        assertEquals(600, stored0, 1e-9);
        assertEquals(stored0 - m.storedMilligramsPerSquareMetre(t), out, 1e-8 * stored0);
    }

    @Test
    void equalDecayInEveryPhaseScalesTheSolutionByExpMinusMuT() {
        // with the same first-order rate mu in water and on solids every mode decays mu faster:
        // C(t) = exp(-mu t) C_without_decay(t) (exact for linear sorption)
        double mu = 0.07;
        SoilLayer decaying = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R)))
                .decayInWaterPerDay(mu).decayOnSolidsPerDay(mu).build();
        FlushingColumn col = FlushingColumn.singleLayer(decaying, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
        ModalFlushingSolution with = ModalFlushingSolution.of(col, cells(20));
        ModalFlushingSolution without = ModalFlushingSolution.of(column(10), cells(20));
        for (double d : new double[] { 1, 5, 10, 30 }) {
            assertEquals(Math.exp(-mu * d) * without.effluentMilligramsPerLitre(d), with.effluentMilligramsPerLitre(d),
                    1e-12);
        }
    }

    @Test
    void contaminatedInflowApproachesItsConcentration() {
        // steady state with inflow C_in and no decay: C = C_in everywhere (conservation, common practice)
        SoilLayer layer = Columns.sand(1, 0.2).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R))).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0.4, InitialCondition.poreWaterPerLayer(0));
        ModalFlushingSolution m = ModalFlushingSolution.of(col, cells(20));
        for (double c : m.poreWaterMilligramsPerLitre(1e4)) {
            assertEquals(0.4, c, 1e-12);
        }
        assertEquals(0, m.effluentMilligramsPerLitre(0), 1e-12);
    }

    @Test
    void layeredColumnMatchesTheImplicitSolver() {
        // two layers of different sorption and dispersivity; implicit solver with fine fixed steps
        // (time error below 1e-5) on the same grid as the reference
        SoilLayer top = Columns.sand(0.6, 0.05).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(3))).build();
        SoilLayer bottom = Columns.sand(0.9, 0.15).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(1.5)))
                .build();
        FlushingColumn col = new FlushingColumn(List.of(top, bottom), 0.1, 0, InitialCondition.poreWaterPerLayer(2, 0.5));
        SolverSettings grid = SolverSettings.builder().minimumCellsPerLayer(20).maximumCellPeclet(1).build();
        ModalFlushingSolution m = ModalFlushingSolution.of(col, grid);
        FlushingRunResult r = new NumericalFlushingSolver(col, grid.toBuilder().fixedStepPoreVolumes(0.002).build())
                .run(FlushingRunRequest.upToPoreVolumes(6).build());
        assertEquals(r.cellCount(), m.cellCount());
        double[] pv = r.poreVolumes();
        for (int i = 100; i < pv.length; i += 400) {
            for (CleanupCriterion c : CleanupCriterion.values()) {
                double implicit = c == CleanupCriterion.EFFLUENT ? r.effluentMilligramsPerLitre()[i] / 2
                        : c == CleanupCriterion.MEAN_RESIDUAL ? r.meanResidualFraction()[i] : r.maxResidualFraction()[i];
                assertEquals(implicit, m.remainingFraction(c, pv[i]), 2e-5, c + " at " + pv[i] + " pore volumes");
            }
        }
    }

    @Test
    void columnsItCannotTakeAreRefusedWithTheReason() {
        SoilLayer freundlich = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.freundlich(0.5, 0.8)).build();
        TransportInputException e = assertThrows(TransportInputException.class, () -> ModalFlushingSolution
                .of(FlushingColumn.singleLayer(freundlich, 0.1, 0, InitialCondition.poreWaterPerLayer(1)), cells(10)));
        assertEquals("sorption of the column", e.quantity());
        SoilLayer twoRegion = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(0.2)).mobileWaterFraction(0.6)
                .massTransferRatePerDay(0.1).build();
        assertFalse(ModalFlushingSolution.applies(
                FlushingColumn.singleLayer(twoRegion, 0.1, 0, InitialCondition.poreWaterPerLayer(1)), cells(10)));
        // P = 200 in one layer: scale spread about exp(100), far above the limit
        TransportInputException wide = assertThrows(TransportInputException.class,
                () -> ModalFlushingSolution.of(column(200), SolverSettings.defaults()));
        assertTrue(wide.quantity().startsWith("spread of the modal scale factors"), wide.quantity());
        assertTrue(wide.getMessage().contains("implicit solver"), wide.getMessage());
        // upwind advection without dispersion couples each face one way
        SoilLayer plug = Columns.sand(1, 0).isotherm(SorptionIsotherm.linear(0.2)).build();
        TransportInputException oneWay = assertThrows(TransportInputException.class, () -> ModalFlushingSolution
                .of(FlushingColumn.singleLayer(plug, 0.1, 0, InitialCondition.poreWaterPerLayer(1)), cells(10)));
        assertTrue(oneWay.quantity().startsWith("coupling of cells"), oneWay.quantity());
    }
}
