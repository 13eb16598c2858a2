package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.transport.CleanupCriterion;

/** Isotherm forms, their limits, nonlinear flushing against the method of lines. */
final class SorptionTest {

    @Test
    void describesItsParametersToSixDigits() {
        // 0.1 + 0.0234 is 0.12340000000000001 in binary floating point; the report shows 0.1234
        assertEquals("linear, Kd = 0.1234 L/kg", SorptionIsotherm.linear(0.1 + 0.0234).describe());
        assertEquals("Freundlich, Kf = 2 (mg/kg)/(mg/L)^n, n = 0.7", SorptionIsotherm.freundlich(2, 0.7).describe());
        assertEquals("Langmuir, Smax = 50 mg/kg, K = 0.000025 L/mg", SorptionIsotherm.langmuir(50, 2.5e-5).describe());
    }

    @Test
    void isothermFormulas() {
        // exact formulas: S = Kd C; S = Kf C^n; S = Smax K C / (1 + K C)
        assertEquals(0.75, SorptionIsotherm.linear(0.5).sorbedMilligramsPerKilogram(1.5), 1e-15);
        assertEquals(2 * Math.pow(3, 0.7), SorptionIsotherm.freundlich(2, 0.7).sorbedMilligramsPerKilogram(3), 1e-14);
        assertEquals(0.7 * 2 * Math.pow(3, -0.3), SorptionIsotherm.freundlich(2, 0.7).slopeLitresPerKilogram(3), 1e-14);
        assertEquals(100 * 0.2 * 4 / (1 + 0.2 * 4), SorptionIsotherm.langmuir(100, 0.2).sorbedMilligramsPerKilogram(4),
                1e-12);
        assertEquals(100 * 0.2 / Math.pow(1 + 0.8, 2), SorptionIsotherm.langmuir(100, 0.2).slopeLitresPerKilogram(4),
                1e-12);
        assertEquals(Double.POSITIVE_INFINITY, SorptionIsotherm.freundlich(2, 0.7).slopeLitresPerKilogram(0));
        // odd extension for negative concentrations
        assertEquals(-2 * Math.pow(3, 0.7), SorptionIsotherm.freundlich(2, 0.7).sorbedMilligramsPerKilogram(-3), 1e-14);
    }

    @Test
    void soilToPoreWaterInversion() {
        SoilLayer layer = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.freundlich(5, 0.6)).build();
        double c = InitialCondition.poreWaterInEquilibrium(layer, 40);
        // exact relation: theta C / rho_b + Kf C^n = soil total
        assertEquals(40, 0.3 * c / 1.6 + 5 * Math.pow(c, 0.6), 1e-12);
        SoilLayer linear = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(2)).build();
        // linear: C = soil / (theta / rho_b + Kd)
        assertEquals(40 / (0.3 / 1.6 + 2), InitialCondition.poreWaterInEquilibrium(linear, 40), 1e-12);
    }

    private static FlushingRunResult run(SorptionIsotherm iso, double c0, SolverSettings settings, double poreVolumes) {
        SoilLayer layer = Columns.sand(1, 0.1).isotherm(iso).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(c0));
        return new NumericalFlushingSolver(col, settings)
                .run(FlushingRunRequest.upToPoreVolumes(poreVolumes).targetForAll(0.01).stopWhenTargetsReached(false)
                        .build());
    }

    @Test
    void freundlichWithExponentOneIsLinear() {
        SolverSettings fixed = SolverSettings.builder().fixedStepPoreVolumes(0.02).build();
        FlushingRunResult lin = run(SorptionIsotherm.linear(0.8), 5, fixed, 30);
        FlushingRunResult fr = run(SorptionIsotherm.freundlich(0.8, 1.0), 5, fixed, 30);
        assertTrue(fr.newtonIterations() > 0);
        // identical equations: differences only from the Newton tolerance 1e-9 (relative)
        assertArrayEquals(lin.effluentMilligramsPerLitre(), fr.effluentMilligramsPerLitre(), 1e-8 * 5);
        for (CleanupCriterion c : CleanupCriterion.values()) {
            assertEquals(lin.outcome(c).poreVolumes(), fr.outcome(c).poreVolumes(), 1e-7 * lin.outcome(c).poreVolumes());
        }
    }

    @Test
    void langmuirAtLowConcentrationIsLinearWithKdSmaxK() {
        // K C0 = 1e-4: S deviates from Smax K C by the factor 1 / (1 + K C), at most 1e-4
        double smax = 200;
        double k = 1e-4;
        FlushingRunResult lin = run(SorptionIsotherm.linear(smax * k), 1, SolverSettings.defaults(), 100);
        FlushingRunResult la = run(SorptionIsotherm.langmuir(smax, k), 1, SolverSettings.defaults(), 100);
        for (CleanupCriterion c : CleanupCriterion.values()) {
            double expected = lin.outcome(c).poreVolumes();
            // Langmuir limit Kd = Smax K (common practice); 1e-4 relative difference in sorption,
            // plus the step controller's choices: 1e-3 relative
            assertEquals(expected, la.outcome(c).poreVolumes(), 1e-3 * expected, c.word());
        }
    }

    @Test
    void freundlichFlushingMatchesTheMethodOfLines() {
        int cells = 20;
        double q = 0.1;
        SoilLayer layer = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.freundlich(0.6, 0.7)).build();
        FlushingColumn col = FlushingColumn.singleLayer(layer, q, 0, InitialCondition.poreWaterPerLayer(10));
        FlushingRunResult r = new NumericalFlushingSolver(col,
                SolverSettings.builder().minimumCellsPerLayer(cells).maximumCellPeclet(2).build())
                .run(FlushingRunRequest.upToPoreVolumes(200).target(CleanupCriterion.MEAN_RESIDUAL, 0.05)
                        .target(CleanupCriterion.EFFLUENT, 0.05).build());
        MethodOfLinesReference ref = new MethodOfLinesReference(List.of(layer), cells, q, 0);
        double[] y0 = ref.initialState(ConvergenceOrderTest.filled(cells, 10));
        for (CleanupCriterion c : List.of(CleanupCriterion.EFFLUENT, CleanupCriterion.MEAN_RESIDUAL)) {
            // computed in the test with Commons Math 3.6.1 DormandPrince853Integrator (rel. tol. 1e-9)
            double expected = col.poreVolumesAfterDays(
                    ref.daysToTarget(y0, c, 0.05, 10, col.daysForPoreVolumes(200), 1e-9));
            TargetOutcome o = r.outcome(c);
            assertTrue(o.reached(), o.message());
            // same grid, so only the time error of the default step tolerance remains: 0.2 %
            assertEquals(expected, o.poreVolumes(), 0.002 * expected, c.word());
        }
        assertTrue(Math.abs(r.massBalance().relativeError()) < 1e-8);
        // Freundlich n < 1 holds the last of the mass more strongly than its secant Kd at C0:
        // the retardation at C0 would be 1 + rho_b Kf C0^(n-1) / theta
        double secantR = 1 + 1.6 * 0.6 * Math.pow(10, -0.3) / 0.3;
        assertTrue(r.outcome(CleanupCriterion.MEAN_RESIDUAL).poreVolumes() > secantR * Math.log(20) * 0.5);
    }

    @Test
    void freundlichPlumeIntoCleanSoilKeepsItsBalance() {
        // a contaminated layer over a clean one, both Freundlich with n = 0.5: the plume enters
        // the clean soil as a sharp front (infinite slope of the isotherm at C = 0)
        SoilLayer top = Columns.sand(0.5, 0.05).isotherm(SorptionIsotherm.freundlich(2, 0.5)).build();
        SoilLayer bottom = Columns.sand(1.0, 0.05).isotherm(SorptionIsotherm.freundlich(2, 0.5))
                .mobileWaterFraction(0.8).massTransferRatePerDay(0.1).build();
        FlushingColumn col = new FlushingColumn(List.of(top, bottom), 0.1, 0, InitialCondition.soilPerLayer(50, 0));
        FlushingRunRequest request = FlushingRunRequest.upToPoreVolumes(10).target(CleanupCriterion.EFFLUENT, 0.01).build();
        FlushingRunResult r = new NumericalFlushingSolver(col, SolverSettings.defaults()).run(request);
        FlushingRunResult fine = new NumericalFlushingSolver(col, SolverSettings.builder().stepTolerance(1e-6).build())
                .run(request);
        assertTrue(Math.abs(r.massBalance().relativeError()) < 1e-8, r.massBalance().toString());
        // a slowdown fails here: 3289 steps (20 rejected) when written
        assertTrue(r.acceptedSteps() + r.rejectedSteps() < 5000, "steps " + r.acceptedSteps());
        double expected = fine.outcome(CleanupCriterion.EFFLUENT).poreVolumes();
        // the same solver with a tolerance 10 times stricter (self-convergence): 1e-3 relative
        assertEquals(expected, r.outcome(CleanupCriterion.EFFLUENT).poreVolumes(), 1e-3 * expected);
    }
}
