package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.PoreVolumeSearch;
import eluvia.transport.internal.TwoRegionModel;

/**
 * Two-region (mobile-immobile) and two-site flushing against the exact Laplace-domain solution
 * of the analytic part of this bundle (van Genuchten and Wierenga 1976, inverted by de Hoog,
 * Knight and Stokes 1982) and against a method-of-lines solve of the same two-region equations
 * on the same grid, integrated by the Commons Math 3.6.1 DormandPrince853Integrator with its event
 * locator for the crossing time.
 */
final class TwoRegionTest {
    private static final int CELLS = 40;

    private static SoilLayer layer() {
        // invented case: phi = 0.6, f = 0.5, alpha = 0.05 1/d, R = 3, P = 20, omega = alpha L / q = 0.5
        return Columns.sand(1, 0.05).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(3)))
                .mobileWaterFraction(0.6).mobileSorbingSiteFraction(0.5).massTransferRatePerDay(0.05).build();
    }

    @Test
    void poreVolumesToTargetMatchTheMethodOfLines() {
        SoilLayer layer = layer();
        double q = 0.1;
        FlushingColumn col = FlushingColumn.singleLayer(layer, q, 0, InitialCondition.poreWaterPerLayer(2));
        SolverSettings settings = SolverSettings.builder().minimumCellsPerLayer(CELLS).maximumCellPeclet(2).build();
        NumericalFlushingSolver solver = new NumericalFlushingSolver(col, settings);
        assertEquals(CELLS, solver.cellCount());
        FlushingRunResult r = solver.run(FlushingRunRequest.upToPoreVolumes(500)
                .target(CleanupCriterion.EFFLUENT, 0.01).target(CleanupCriterion.MEAN_RESIDUAL, 0.01).build());
        MethodOfLinesReference ref = new MethodOfLinesReference(List.of(layer), CELLS, q, 0);
        double[] y0 = ref.initialState(ConvergenceOrderTest.filled(CELLS, 2));
        for (CleanupCriterion c : List.of(CleanupCriterion.EFFLUENT, CleanupCriterion.MEAN_RESIDUAL)) {
            // computed in the test with Commons Math 3.6.1 DormandPrince853Integrator (rel. tol. 1e-9)
            double expectedDays = ref.daysToTarget(y0, c, 0.01, 2, col.daysForPoreVolumes(500), 1e-9);
            double expected = col.poreVolumesAfterDays(expectedDays);
            TargetOutcome o = r.outcome(c);
            assertTrue(o.reached(), o.message());
            // task requirement: within 0.5 % in pore volumes to target
            assertEquals(expected, o.poreVolumes(), 0.005 * expected, c.word());
        }
        // the tail: non-equilibrium needs far more than the equilibrium R ln(100) = 13.8 pore volumes
        assertTrue(r.outcome(CleanupCriterion.MEAN_RESIDUAL).poreVolumes() > 13.8);
        assertTrue(Math.abs(r.massBalance().relativeError()) < 1e-8);
    }

    @Test
    void fastExchangeApproachesEquilibrium() {
        double q = 0.1;
        SoilLayer slow = layer();
        SoilLayer fast = Columns.sand(1, 0.05).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(3)))
                .mobileWaterFraction(0.6).mobileSorbingSiteFraction(0.5).massTransferRatePerDay(500).build();
        SoilLayer equilibrium = Columns.sand(1, 0.05).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(3)))
                .build();
        double[] pv = new double[3];
        SoilLayer[] layers = { slow, fast, equilibrium };
        for (int k = 0; k < 3; k++) {
            FlushingColumn col = FlushingColumn.singleLayer(layers[k], q, 0, InitialCondition.poreWaterPerLayer(1));
            pv[k] = new NumericalFlushingSolver(col, SolverSettings.defaults())
                    .run(FlushingRunRequest.upToPoreVolumes(500).target(CleanupCriterion.MEAN_RESIDUAL, 0.01).build())
                    .outcome(CleanupCriterion.MEAN_RESIDUAL).poreVolumes();
        }
        // omega = 500 (alpha L / q): local equilibrium is the limit (van Genuchten and Wierenga 1976);
        // note the mobile-region Peclet number differs: theta_m D_m is the same alpha_L q, so P is too
        assertEquals(pv[2], pv[1], 0.01 * pv[2]);
        assertTrue(pv[0] > 1.5 * pv[2], "slow exchange makes a tail: " + pv[0] + " vs " + pv[2]);
    }

    /**
     * phi, f, alpha (1/d), R, P; beta = (theta_m + f rho_b Kd) / (theta + rho_b Kd) and
     * omega = alpha L / q (van Genuchten and Wierenga 1976; the two-site form of Nkedi-Kizza et
     * al. 1984 has phi = 1, the same beta and omega).
     */
    @ParameterizedTest
    @CsvSource({ "0.6, 0.5, 0.05, 3, 20", "0.4, 0.4, 0.02, 2, 10", "1.0, 0.3, 0.2, 5, 10", "0.7, 0.0, 0.5, 1.5, 50" })
    void poreVolumesToTargetMatchTheLaplaceSolution(double phi, double f, double alpha, double retardation,
            double peclet) {
        double q = 0.1;
        double kd = Columns.kdForRetardation(retardation);
        SoilLayer layer = Columns.sand(1, 1 / peclet).isotherm(SorptionIsotherm.linear(kd)).mobileWaterFraction(phi)
                .mobileSorbingSiteFraction(f).massTransferRatePerDay(alpha).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, q, 0, InitialCondition.poreWaterPerLayer(1));
        double beta = (phi * 0.3 + f * 1.6 * kd) / (0.3 + 1.6 * kd);
        double omega = alpha * 1 / q;
        TwoRegionModel exact = new TwoRegionModel(retardation, peclet, 0, beta, omega);
        FlushingRunResult r = new NumericalFlushingSolver(col, SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(2000).targetForAll(0.01).build());
        for (CleanupCriterion c : CleanupCriterion.values()) {
            // analytic part of this bundle: Laplace-domain solution, de Hoog inversion, PoreVolumeSearch
            PoreVolumeResult expected = PoreVolumeSearch.solve(exact, c, 0.01, 2000);
            TargetOutcome o = r.outcome(c);
            assertTrue(expected.reachable() && o.reached(), o.message());
            // task requirement: within 0.5 % in pore volumes to target
            assertEquals(expected.poreVolumes(), o.poreVolumes(), 0.005 * expected.poreVolumes(), c.word());
        }
    }
}
