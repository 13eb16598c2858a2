package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Observed order of convergence on refinement: in space against the Lindstrom et al. (1967)
 * formula (exact for the semi-infinite column at early time), in time against a Commons Math
 * 3.6.1 DormandPrince853 method-of-lines solve of the same grid (so only the time error remains).
 */
final class ConvergenceOrderTest {

    private static double stepInputAt1Metre(int cells) {
        SoilLayer layer = Columns.sand(5, 0.1).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.3, 1, InitialCondition.poreWaterPerLayer(0));
        SolverSettings settings = SolverSettings.builder().minimumCellsPerLayer(cells).maximumCellPeclet(2)
                .fixedStepPoreVolumes(1e-4).build();
        FlushingRunResult r = new NumericalFlushingSolver(col, settings)
                .run(FlushingRunRequest.upToPoreVolumes(0.2).profilesAtDays(1.0).build());
        ResidualProfile p = r.profiles().get(0);
        return Columns.at(p.depthMetres(), p.poreWaterMilligramsPerLitre(), 1.0);
    }

    @Test
    void secondOrderInSpace() {
        // exact value computed in the test from Lindstrom et al. (1967) with Commons Math 3.6.1 Erf
        double exact = SemiInfiniteEarlyTimeTest.lindstromFluxInlet(1, 0.1, 1, 1, 1);
        double e1 = Math.abs(stepInputAt1Metre(50) - exact);
        double e2 = Math.abs(stepInputAt1Metre(100) - exact);
        double e3 = Math.abs(stepInputAt1Metre(200) - exact);
        assertTrue(e1 > 4 * e3, "errors " + e1 + ", " + e2 + ", " + e3);
        double order12 = Math.log(e1 / e2) / Math.log(2);
        double order23 = Math.log(e2 / e3) / Math.log(2);
        // central differences with a flux inlet: expected order 2 (DESIGN of the solver class)
        assertEquals(2.0, order12, 0.2);
        assertEquals(2.0, order23, 0.2);
        assertTrue(e3 < 1e-3, "error at dz = 0.025 m: " + e3);
    }

    @Test
    void upwindIsFirstOrderInSpace() {
        double exact = SemiInfiniteEarlyTimeTest.lindstromFluxInlet(1, 0.1, 1, 1, 1);
        double[] err = new double[3];
        int[] cells = { 400, 800, 1600 };
        for (int k = 0; k < 3; k++) {
            SoilLayer layer = Columns.sand(5, 0.1).build();
            FlushingColumn col = FlushingColumn.singleLayer(layer, 0.3, 1, InitialCondition.poreWaterPerLayer(0));
            SolverSettings settings = SolverSettings.builder().minimumCellsPerLayer(cells[k]).maximumCellPeclet(2)
                    .advectionScheme(AdvectionScheme.UPWIND).fixedStepPoreVolumes(1e-4).build();
            FlushingRunResult r = new NumericalFlushingSolver(col, settings)
                    .run(FlushingRunRequest.upToPoreVolumes(0.2).profilesAtDays(1.0).build());
            ResidualProfile p = r.profiles().get(0);
            err[k] = Math.abs(Columns.at(p.depthMetres(), p.poreWaterMilligramsPerLitre(), 1.0) - exact);
        }
        // upwind: expected order 1 (numerical dispersivity dz / 2)
        assertEquals(1.0, Math.log(err[0] / err[1]) / Math.log(2), 0.2);
        assertEquals(1.0, Math.log(err[1] / err[2]) / Math.log(2), 0.2);
    }

    @Test
    void secondOrderInTime() {
        SoilLayer layer = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(2))).build();
        int cells = 40;
        double q = 0.1;
        FlushingColumn col = FlushingColumn.singleLayer(layer, q, 0, InitialCondition.poreWaterPerLayer(1));
        double days = col.daysForPoreVolumes(1.5);
        MethodOfLinesReference ref = new MethodOfLinesReference(List.of(layer), cells, q, 0);
        double[] y0 = ref.initialState(filled(cells, 1));
        // computed in the test with Commons Math 3.6.1 DormandPrince853Integrator, rel. tol. 1e-11
        double reference = ref.effluentAtDays(y0, days, 1e-11);
        double[] err = new double[3];
        double[] steps = { 0.03, 0.015, 0.0075 };
        for (int k = 0; k < 3; k++) {
            SolverSettings settings = SolverSettings.builder().minimumCellsPerLayer(cells)
                    .fixedStepPoreVolumes(steps[k]).build();
            FlushingRunResult r = new NumericalFlushingSolver(col, settings)
                    .run(FlushingRunRequest.upToPoreVolumes(1.5).build());
            double[] eff = r.effluentMilligramsPerLitre();
            err[k] = Math.abs(eff[eff.length - 1] - reference);
        }
        // BDF2: expected order 2 in time
        assertEquals(2.0, Math.log(err[0] / err[1]) / Math.log(2), 0.25);
        assertEquals(2.0, Math.log(err[1] / err[2]) / Math.log(2), 0.25);
    }

    static double[] filled(int n, double value) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, value);
        return a;
    }

    @Test
    void withoutDispersionEveryFaceIsUpwindAndTheFrontMovesAtOneOverR() {
        SoilLayer layer = Columns.sand(1, 0).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(2.5))).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
        NumericalFlushingSolver solver = new NumericalFlushingSolver(col,
                SolverSettings.builder().minimumCellsPerLayer(400).build());
        assertEquals(399, solver.upwindFaceCount());
        FlushingRunResult r = solver.run(FlushingRunRequest.upToPoreVolumes(10)
                .target(eluvia.transport.CleanupCriterion.EFFLUENT, 0.5).build());
        // plug flow: the clean front reaches the outlet after R pore volumes (REFERENCES.md, the
        // P -> infinity limit); upwind smears it symmetrically by about sqrt(dz L) around R
        assertEquals(2.5, r.outcome(eluvia.transport.CleanupCriterion.EFFLUENT).poreVolumes(), 0.02);
        assertTrue(Math.abs(r.massBalance().relativeError()) < 1e-8);
    }
}
