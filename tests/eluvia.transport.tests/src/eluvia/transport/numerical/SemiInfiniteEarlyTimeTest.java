package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

/**
 * Early time in a long column, where the bottom is not yet felt, against the semi-infinite
 * solutions of Lindstrom et al. (1967, flux inlet) and Ogata and Banks (1961, which gives the
 * flux-averaged concentration of the flux-inlet problem, Parker and van Genuchten 1984).
 *
 * <p>Case: v = 1 m/d (q = 0.3 m/d, theta = 0.3), alpha_L = 0.1 m so D = 0.1 m2/d, x = 1 m,
 * t = 1 d, R = 1 (and t = 2 d with R = 2): P = 10, T = 1 at x = 1 m. The column is 5 m deep, so
 * at t = 2 d the front is 3 m above the outlet (erfc of 7 standard deviations: below 1e-20).
 */
final class SemiInfiniteEarlyTimeTest {
    /** Grid 0.01 m: the convergence test shows second order with an error of about 1e-4 at 0.0125 m. */
    private static final int CELLS = 500;
    /** Tolerance from that grid error (6.5e-5 expected at 0.01 m), with margin. */
    private static final double GRID_TOLERANCE = 2e-4;

    /** Lindstrom et al. (1967) flux-inlet step-input resident concentration, C/C0. */
    static double lindstromFluxInlet(double v, double d, double r, double x, double t) {
        double s = 2 * Math.sqrt(d * r * t);
        return 0.5 * Erf.erfc((r * x - v * t) / s)
                + Math.sqrt(v * v * t / (Math.PI * d * r)) * Math.exp(-Math.pow(r * x - v * t, 2) / (4 * d * r * t))
                - 0.5 * (1 + v * x / d + v * v * t / (d * r)) * Math.exp(v * x / d) * Erf.erfc((r * x + v * t) / s);
    }

    private static ResidualProfile profileAfter(double kd, double inflow, double initial, double days) {
        SoilLayer layer = Columns.sand(5, 0.1).isotherm(SorptionIsotherm.linear(kd)).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.3, inflow, InitialCondition.poreWaterPerLayer(initial));
        // fixed steps of 5e-4 d (1e-4 pore volumes of this column): time error far below the grid error
        SolverSettings settings = SolverSettings.builder().minimumCellsPerLayer(CELLS).fixedStepPoreVolumes(1e-4).build();
        FlushingRunResult r = new NumericalFlushingSolver(col, settings)
                .run(FlushingRunRequest.upToPoreVolumes(col.poreVolumesAfterDays(days)).profilesAtDays(days).build());
        return r.profiles().get(0);
    }

    @Test
    void formulaInTheTestReproducesThePublishedCheckValue() {
        // REFERENCES.md [COMP]: flux inlet 0.493058, computed from Lindstrom et al. (1967)
        assertEquals(0.493058, lindstromFluxInlet(1, 0.1, 1, 1, 1), 5e-7);
        // REFERENCES.md [COMP]: t = 2 d with R = 2 gives the same number
        assertEquals(0.493058, lindstromFluxInlet(1, 0.1, 2, 1, 2), 5e-7);
    }

    @Test
    void stepInputResidentConcentrationMatchesLindstrom() {
        ResidualProfile p = profileAfter(0, 1, 0, 1);
        double c = Columns.at(p.depthMetres(), p.poreWaterMilligramsPerLitre(), 1.0);
        // REFERENCES.md [COMP]: Lindstrom et al. (1967) flux inlet, P = 10, T = 1
        assertEquals(0.493058, c, GRID_TOLERANCE);
    }

    @Test
    void retardationTwoAtTwoDaysGivesTheSameValue() {
        ResidualProfile p = profileAfter(Columns.kdForRetardation(2), 1, 0, 2);
        double c = Columns.at(p.depthMetres(), p.poreWaterMilligramsPerLitre(), 1.0);
        // REFERENCES.md [COMP]: t = 2 d with R = 2, Lindstrom et al. (1967)
        assertEquals(0.493058, c, GRID_TOLERANCE);
    }

    @Test
    void flushingALayerAtCiIsOneMinusTheStepSolution() {
        ResidualProfile p = profileAfter(0, 0, 1, 1);
        double c = Columns.at(p.depthMetres(), p.poreWaterMilligramsPerLitre(), 1.0);
        // REFERENCES.md: van Genuchten and Alves (1982), C/Ci = 1 - A with A = 0.493058 [COMP]
        assertEquals(1 - 0.493058, c, GRID_TOLERANCE);
    }

    @Test
    void fluxAveragedConcentrationMatchesOgataBanks() {
        ResidualProfile p = profileAfter(0, 1, 0, 1);
        double[] z = p.depthMetres();
        double[] c = p.poreWaterMilligramsPerLitre();
        // the face at 1 m lies between two cells of 0.01 m: C_f = C - (D / v) dC/dx there
        int i = (int) Math.round(1.0 / 0.01) - 1;
        assertTrue(Math.abs(z[i] + 0.005 - 1.0) < 1e-12, "face at 1 m");
        double face = 0.5 * (c[i] + c[i + 1]);
        double gradient = (c[i + 1] - c[i]) / (z[i + 1] - z[i]);
        double fluxAveraged = face - 0.1 / 1.0 * gradient;
        // REFERENCES.md [COMP]: first-type inlet (Ogata and Banks 1961) 0.585289, which is the
        // flux-averaged concentration of the flux-inlet problem (Parker and van Genuchten 1984)
        assertEquals(0.585289, fluxAveraged, GRID_TOLERANCE);
    }
}
