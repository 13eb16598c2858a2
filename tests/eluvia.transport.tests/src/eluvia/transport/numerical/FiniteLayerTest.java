package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.internal.FiniteLayerModel;

/**
 * A single linear layer with the default settings against the exact finite-layer solution
 * (Brenner 1962 series in the initial-value form of van Genuchten and Alves 1982, the analytic
 * part of this bundle), pore volumes to target found from it with the Commons Math 3.6.1
 * BrentSolver.
 */
final class FiniteLayerTest {
    /**
     * Defaults: at least 100 cells, cell Peclet number at most 0.25, local step tolerance 1e-5.
     * Measured while choosing them: relative errors in pore volumes to target of 2e-4 to 8e-4
     * for P = 1, 10 and 100 and targets 0.01 and 1e-4.
     */
    private static final double DEFAULT_ACCURACY = 1e-3;

    @ParameterizedTest
    @CsvSource({ "1, 2, 0.01", "1, 2, 1e-4", "10, 2, 0.01", "10, 5, 1e-4", "100, 2, 0.01", "100, 3, 1e-4" })
    void poreVolumesToTargetMatchTheSeries(double peclet, double retardation, double target) {
        SoilLayer layer = Columns.sand(1, 1 / peclet)
                .isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(retardation))).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
        FlushingRunResult r = new NumericalFlushingSolver(col, SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(1000).targetForAll(target).build());
        FiniteLayerModel exact = new FiniteLayerModel(retardation, peclet, 0);
        BrentSolver brent = new BrentSolver(1e-12, 1e-12);
        for (CleanupCriterion c : CleanupCriterion.values()) {
            // computed in the test: Brenner (1962) series of FiniteLayerModel, root by Commons Math 3.6.1 BrentSolver
            double expected = brent.solve(10_000, t -> exact.remainingFraction(c, t) - target, 1e-3, 1000);
            TargetOutcome o = r.outcome(c);
            assertTrue(o.reached(), o.message());
            assertEquals(expected, o.poreVolumes(), DEFAULT_ACCURACY * expected, c + " at P = " + peclet);
            assertEquals(col.daysForPoreVolumes(o.poreVolumes()), o.days(), 1e-9 * o.days());
        }
        assertTrue(r.massBalance().relativeError() < 1e-8);
    }

    @ParameterizedTest
    @CsvSource({ "3, 0.5", "3, 1.5", "3, 4", "30, 1.2" })
    void effluentHistoryMatchesTheSeries(double peclet, double poreVolumes) {
        double retardation = 2;
        SoilLayer layer = Columns.sand(1, 1 / peclet)
                .isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(retardation))).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.soilPerLayer(100));
        FlushingRunResult r = new NumericalFlushingSolver(col, SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(poreVolumes).profilesAtDays(col.daysForPoreVolumes(poreVolumes))
                        .build());
        FiniteLayerModel exact = new FiniteLayerModel(retardation, peclet, 0);
        double[] eff = r.effluentMilligramsPerLitre();
        double c0 = r.initialPoreWaterMilligramsPerLitre();
        // computed in the test from the Brenner (1962) series (FiniteLayerModel); 1e-3 of the
        // initial value: the grid error of the front at the defaults is a few 1e-4
        assertEquals(exact.remainingFraction(CleanupCriterion.EFFLUENT, poreVolumes), eff[eff.length - 1] / c0, 1e-3);
        assertEquals(exact.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, poreVolumes), r.finalMeanResidualFraction(),
                1e-3);
        // initial soil 100 mg/kg with R = 2: pore water 100 / (theta/rho_b + Kd) mg/L [exact formula]
        double kd = Columns.kdForRetardation(retardation);
        assertEquals(100 / (0.3 / 1.6 + kd), c0, 1e-9 * c0);
        ResidualProfile p = r.profiles().get(0);
        // the deepest cell holds the highest residual (maximum principle; analytic helper's notes)
        double[] soil = p.soilMilligramsPerKilogram();
        assertEquals(soil.length - 1, argMax(soil));
    }

    private static int argMax(double[] a) {
        int k = 0;
        for (int i = 1; i < a.length; i++) {
            if (a[i] > a[k]) {
                k = i;
            }
        }
        return k;
    }
}
