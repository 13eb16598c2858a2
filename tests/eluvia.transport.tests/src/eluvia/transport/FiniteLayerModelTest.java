package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

final class FiniteLayerModelTest {

    private static FlushingModel finite(double r, double p, double k) {
        return FlushingModels.finiteLayer(new LayerTransport(r, 1, 1, 0.1, p, k));
    }

    @ParameterizedTest(name = "P = {0}")
    @ValueSource(doubles = {0.7, 10, 200})
    void meanResidualIsOneMinusTheIntegratedEffluent(double peclet) {
        // mass balance of the layer: R dM/dT = -effluent (clean inflow), so M(T) = 1 - (1/R) integral_0^T effluent.
        // The integral by Commons Math 3.6.1 IterativeLegendreGaussIntegrator (relative 1e-12, absolute 1e-14).
        double r = 1.8;
        FlushingModel model = finite(r, peclet, 0);
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-14);
        for (double t : new double[] {0.2, 0.9, 1.6, 2.4, 4.5}) {
            // split at the front arrival T = R so that the panels see the steep part
            double integral = 0;
            double lo = 0;
            for (double hi : new double[] {Math.min(t, 0.8 * r), Math.min(t, 1.2 * r), t}) {
                if (hi > lo) {
                    integral += quad.integrate(100_000, x -> model.remainingFraction(CleanupCriterion.EFFLUENT, x), lo, hi);
                    lo = hi;
                }
            }
            assertEquals(1 - integral / r, model.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, t), 1e-10,
                    "T = " + t);
        }
    }

    @ParameterizedTest(name = "P = {0}")
    @ValueSource(doubles = {0.3, 4, 40, 500})
    void poreVolumesScaleExactlyWithRetardation(double peclet) {
        // REFERENCES.md: without decay every solution depends on T/R only, so the pore volumes scale with R
        for (CleanupCriterion c : CleanupCriterion.values()) {
            for (double target : new double[] {0.3, 0.01, 1e-4}) {
                double one = PoreVolumeSearch.solve(finite(1, peclet, 0), c, target, 1e4).poreVolumes();
                double r = 3.7;
                double scaled = PoreVolumeSearch.solve(finite(r, peclet, 0), c, target, 1e4).poreVolumes();
                assertEquals(r * one, scaled, 3e-9 * scaled, c + " to " + target);
            }
        }
    }

    @Test
    void largePecletTendsToPlugFlow() {
        // REFERENCES.md: P -> infinity gives T -> R (plug flow). To leading order in 1/sqrt(P) the effluent is
        // 1/2 erfc((tau - 1) / (2 sqrt(tau / P))) (the first term of either semi-infinite solution), so the
        // effluent meets C/C0 = c at tau - 1 = 2 s sqrt(tau / P), s = erfcinv(2c) (Commons Math 3.6.1 Erf.erfcInv).
        double r = 2.2;
        double c = 0.01;
        double s = Erf.erfcInv(2 * c);
        double previousGap = Double.POSITIVE_INFINITY;
        for (double p : new double[] {1e3, 1e5, 1e7}) {
            double t = PoreVolumeSearch.solve(finite(r, p, 0), CleanupCriterion.EFFLUENT, c, 100).poreVolumes();
            double g = s / Math.sqrt(p); // tau - 1 = 2 g sqrt(tau) -> sqrt(tau) = g + sqrt(g^2 + 1)
            double tauLeading = Math.pow(g + Math.sqrt(g * g + 1), 2);
            // the next order is O(1/P) against the O(1/sqrt(P)) shift: allow 10 / sqrt(P) of that shift
            assertEquals(r * tauLeading, t, r * (tauLeading - 1) * 10 / Math.sqrt(p), "P = " + p);
            double gap = t / r - 1;
            assertTrue(gap > 0 && gap < previousGap, "P = " + p + ": " + gap);
            previousGap = gap;
        }
        // with D = 0 exactly the model is plug flow: R pore volumes for every effluent target
        assertEquals(r, PoreVolumeSearch.solve(finite(r, Double.POSITIVE_INFINITY, 0), CleanupCriterion.EFFLUENT, c, 100)
                .poreVolumes(), 1e-9 * r);
    }

    @ParameterizedTest(name = "P = {0}")
    @ValueSource(doubles = {1e-4, 1e-3})
    void smallPecletTendsToTheWellMixedEstimate(double peclet) {
        // REFERENCES.md: the batch-flush estimate T = -R ln(C/C0) is the P -> 0 limit of the finite layer.
        // The first decay rate is 1 + P/6 + O(P^2) (from b1^2 = P (1 + P/4)/(1 + P/3) + ...) and the amplitude
        // 1 + O(P): a relative difference of a few P is the expected size of the deviation.
        double r = 2;
        for (CleanupCriterion c : CleanupCriterion.values()) {
            for (double target : new double[] {0.1, 1e-3}) {
                double t = PoreVolumeSearch.solve(finite(r, peclet, 0), c, target, 1e4).poreVolumes();
                double wellMixed = -r * Math.log(target);
                assertEquals(wellMixed, t, 2 * peclet * wellMixed, c + " to " + target);
            }
        }
    }

    @ParameterizedTest(name = "P = {0}, target = {1}")
    @CsvSource({"0.5, 0.01", "8, 0.01", "8, 1e-6", "120, 0.001", "3000, 0.05"})
    void everyCriterionIsFoundAndOrdered(double peclet, double target) {
        FlushingModel model = finite(1.4, peclet, 0);
        PoreVolumeResult eff = PoreVolumeSearch.solve(model, CleanupCriterion.EFFLUENT, target, 1e4);
        PoreVolumeResult mean = PoreVolumeSearch.solve(model, CleanupCriterion.MEAN_RESIDUAL, target, 1e4);
        PoreVolumeResult max = PoreVolumeSearch.solve(model, CleanupCriterion.MAX_RESIDUAL, target, 1e4);
        for (PoreVolumeResult res : new PoreVolumeResult[] {eff, mean, max}) {
            assertTrue(res.reachable());
            // the crossing really is a crossing (to the configured 1e-9 relative accuracy)
            double below = model.remainingFraction(res.criterion(), res.poreVolumes() * (1 + 2e-9));
            double above = model.remainingFraction(res.criterion(), res.poreVolumes() * (1 - 2e-9));
            assertTrue(below <= target && above >= target, res.criterion() + ": " + above + " " + below);
            assertTrue(res.evaluations() < 120, "evaluations " + res.evaluations());
        }
        // common practice: the mean is met first; the maximum is at the outlet, so it equals the effluent
        assertTrue(mean.poreVolumes() < eff.poreVolumes());
        assertEquals(eff.poreVolumes(), max.poreVolumes(), 1e-8 * eff.poreVolumes());
    }

    @Test
    void decayMultipliesByExpMinusKT() {
        // van Genuchten and Alves (1982): with decay in both phases C = exp(-mu t) C(no decay); the
        // independent check with decay is the method of lines (FiniteLayerAgainstMethodOfLinesTest)
        FlushingModel plain = finite(1.5, 10, 0);
        FlushingModel decaying = finite(1.5, 10, 0.2);
        for (double t : new double[] {0.3, 1.2, 3}) {
            for (CleanupCriterion c : CleanupCriterion.values()) {
                assertEquals(plain.remainingFraction(c, t) * Math.exp(-0.2 * t), decaying.remainingFraction(c, t), 1e-15);
            }
        }
    }

    @Test
    void unreachableTargetIsReportedWithTheRemainder() {
        FlushingModel model = finite(4, 10, 0);
        PoreVolumeResult res = PoreVolumeSearch.solve(model, CleanupCriterion.EFFLUENT, 1e-6, 5);
        assertTrue(!res.reachable() && Double.isNaN(res.poreVolumes()));
        assertEquals(model.remainingFraction(CleanupCriterion.EFFLUENT, 5), res.remainingAtLimit(), 0);
        assertTrue(res.describe().contains("within 5 pore volumes"), res.describe());
    }
}
