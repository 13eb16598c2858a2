package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The finite-layer solution (Brenner series and image form) against an independent
 * method-of-lines solve with the Commons Math 3.6.1 DormandPrince853Integrator
 * ({@link LayerMethodOfLines}, kept in this test code). The reference is the Richardson
 * extrapolate of N and 2N cells (N = 25 for P = 1, 64 or 100 for P = 10, 200 for P = 60: the finer
 * grids for the sharper fronts). The tolerance is the error estimate of the 2N solution of this
 * second-order scheme, |f_2N - f_N| / 3, which the extrapolate does not exceed once the grid is
 * in its asymptotic range, plus 2e-8 for the integrator tolerances (relative 1e-11 per step).
 */
final class FiniteLayerAgainstMethodOfLinesTest {
    private static final double[] PORE_VOLUMES = {0.1, 0.3, 0.6, 1.0, 1.5, 2.5};

    @ParameterizedTest(name = "P = {0}, R = {1}, k = {2}")
    @CsvSource({
        // P, R, decay per pore volume, cells of the coarse grid
        "1, 1, 0, 25",
        "10, 1, 0, 100",
        "10, 2.5, 0, 64",
        "10, 1.5, 0.3, 64",
        "60, 1, 0, 200" })
    void matchesMethodOfLines(double peclet, double retardation, double decay, int cells) {
        FlushingModel model = FlushingModels.finiteLayer(new LayerTransport(retardation, 1, 1, 0.1, peclet, decay));
        double[] t = new double[PORE_VOLUMES.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = PORE_VOLUMES[i] * retardation;
        }
        LayerMethodOfLines.Estimate[][] ref = LayerMethodOfLines.extrapolated(peclet, retardation, decay, cells, t);
        CleanupCriterion[] criteria = {CleanupCriterion.EFFLUENT, CleanupCriterion.MEAN_RESIDUAL,
            CleanupCriterion.MAX_RESIDUAL };
        for (int i = 0; i < t.length; i++) {
            for (int c = 0; c < 3; c++) {
                LayerMethodOfLines.Estimate e = ref[i][c];
                double tolerance = e.errorScale() / 3 + 2e-8;
                assertTrue(e.errorScale() < 1e-3, "grid too coarse for a meaningful check: " + e.errorScale());
                // computed in the test by the method of lines with Commons Math 3.6.1 DormandPrince853Integrator
                assertEquals(e.value(), model.remainingFraction(criteria[c], t[i]), tolerance,
                        criteria[c] + " at T = " + t[i]);
            }
        }
    }
}
