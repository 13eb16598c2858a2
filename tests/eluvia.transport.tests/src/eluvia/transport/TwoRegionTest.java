package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

final class TwoRegionTest {
    private static final CleanupCriterion[] CRITERIA = {CleanupCriterion.EFFLUENT, CleanupCriterion.MEAN_RESIDUAL,
        CleanupCriterion.MAX_RESIDUAL };

    private static LayerTransport transport(double r, double p, double k) {
        return new LayerTransport(r, 1, 1, 0.1, p, k);
    }

    @ParameterizedTest(name = "P = {0}, R = {1}, beta = {2}, omega = {3}")
    @CsvSource({"10, 2, 0.4, 0.5, 64", "10, 3, 0.7, 3, 64", "30, 1.5, 0.5, 0.2, 100"})
    void matchesMethodOfLines(double peclet, double r, double beta, double omega, int cells) {
        FlushingModel model = FlushingModels.twoRegion(transport(r, peclet, 0), beta, omega);
        double[] t = {0.3 * r, r, 2 * r, 4 * r};
        LayerMethodOfLines.Estimate[][] ref = TwoRegionMethodOfLines.extrapolated(peclet, r, beta, omega, cells, t);
        for (int i = 0; i < t.length; i++) {
            for (int c = 0; c < 3; c++) {
                LayerMethodOfLines.Estimate e = ref[i][c];
                assertTrue(e.errorScale() < 1e-3, "grid too coarse: " + e.errorScale());
                // computed in the test by the method of lines with Commons Math 3.6.1 DormandPrince853Integrator;
                // tolerance: error estimate of the 2N solution (second order) plus 2e-8 for the integrator
                assertEquals(e.value(), model.remainingFraction(CRITERIA[c], t[i]), e.errorScale() / 3 + 2e-8,
                        CRITERIA[c] + " at T = " + t[i]);
            }
        }
    }

    @Test
    void betaOneIsTheEquilibriumSeries() {
        // beta = 1 removes the immobile region: the Laplace solution inverted by de Hoog must give the
        // Brenner series (an exact, independent form) to the inversion accuracy (about 1e-10)
        for (double p : new double[] {1, 10, 40}) {
            FlushingModel two = FlushingModels.twoRegion(transport(2, p, 0), 1, 0);
            FlushingModel eq = FlushingModels.finiteLayer(transport(2, p, 0));
            for (double t : new double[] {0.2, 1, 2, 4, 8}) {
                for (CleanupCriterion c : CRITERIA) {
                    assertEquals(eq.remainingFraction(c, t), two.remainingFraction(c, t), 1e-10, c + " P = " + p + " T = " + t);
                }
            }
        }
    }

    @Test
    void noExchangeLeavesTheImmobileRegionUntouched() {
        // omega = 0: the mobile region is an equilibrium layer with retardation beta R (same P), the immobile
        // region keeps its initial value, so the total mean is beta M_eq + (1 - beta) (exact, from the equations)
        double r = 2.5;
        double beta = 0.6;
        FlushingModel two = FlushingModels.twoRegion(transport(r, 8, 0), beta, 0);
        FlushingModel mobileOnly = FlushingModels.finiteLayer(transport(beta * r, 8, 0));
        for (double t : new double[] {0.5, 1.5, 3, 6}) {
            assertEquals(mobileOnly.remainingFraction(CleanupCriterion.EFFLUENT, t),
                    two.remainingFraction(CleanupCriterion.EFFLUENT, t), 1e-10);
            assertEquals(beta * mobileOnly.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, t) + (1 - beta),
                    two.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, t), 1e-10);
        }
        // the soil can never fall below 1 - beta: not reachable, with the number that was reached
        PoreVolumeResult res = PoreVolumeSearch.solve(two, CleanupCriterion.MEAN_RESIDUAL, 0.1, 100);
        assertFalse(res.reachable());
        assertEquals(1 - beta, res.remainingAtLimit(), 1e-9);
    }

    @Test
    void fastExchangeApproachesEquilibrium() {
        // omega -> infinity: local equilibrium with the full R (van Genuchten and Wierenga 1976); the gap
        // must shrink as omega grows and be small at omega = 1e4
        double previous = Double.POSITIVE_INFINITY;
        FlushingModel eq = FlushingModels.finiteLayer(transport(2, 10, 0));
        for (double omega : new double[] {10, 100, 1e4}) {
            FlushingModel two = FlushingModels.twoRegion(transport(2, 10, 0), 0.5, omega);
            double gap = 0;
            for (double t : new double[] {1, 2, 3, 5}) {
                gap = Math.max(gap, Math.abs(eq.remainingFraction(CleanupCriterion.EFFLUENT, t)
                        - two.remainingFraction(CleanupCriterion.EFFLUENT, t)));
            }
            assertTrue(gap < previous, "omega = " + omega + ": " + gap);
            previous = gap;
        }
        assertTrue(previous < 1e-3, "gap at omega = 1e4: " + previous);
    }

    @Test
    void meanIsOneMinusTheIntegratedEffluent() {
        // global mass balance: R dM/dT = -effluent, integral by Commons Math 3.6.1 IterativeLegendreGaussIntegrator
        double r = 2;
        FlushingModel two = FlushingModels.twoRegion(transport(r, 12, 0), 0.45, 0.8);
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(8, 1e-10, 1e-12);
        for (double t : new double[] {1, 3, 9}) {
            double integral = quad.integrate(100_000, x -> two.remainingFraction(CleanupCriterion.EFFLUENT, x), 0, t);
            assertEquals(1 - integral / r, two.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, t), 1e-9, "T = " + t);
        }
    }

    @Test
    void tailsNeedMorePoreVolumesThanEquilibriumAndEveryCriterionIsFound() {
        double r = 2;
        FlushingModel eq = FlushingModels.finiteLayer(transport(r, 10, 0));
        FlushingModel two = FlushingModels.twoRegion(transport(r, 10, 0), 0.4, 0.3);
        for (CleanupCriterion c : CRITERIA) {
            PoreVolumeResult a = PoreVolumeSearch.solve(eq, c, 0.01, 1e4);
            PoreVolumeResult b = PoreVolumeSearch.solve(two, c, 0.01, 1e4);
            assertTrue(b.reachable());
            // common practice (DESIGN.md): nonequilibrium tails make flushing take more pore volumes
            assertTrue(b.poreVolumes() > a.poreVolumes(), c + ": " + b.poreVolumes() + " vs " + a.poreVolumes());
            double below = two.remainingFraction(c, b.poreVolumes() * (1 + 1e-8));
            double above = two.remainingFraction(c, b.poreVolumes() * (1 - 1e-8));
            assertTrue(below <= 0.01 + 1e-10 && above >= 0.01 - 1e-10, c + ": " + above + " " + below);
        }
    }

    @Test
    void reboundAfterTheEffluentMeetsTheTarget() {
        LayerTransport t = transport(3, 20, 0);
        ReboundEstimate rb = ReboundEstimate.afterEffluentMeetsTarget(t, new TwoRegionParameters(0.4, 0.5), 0.01, 1e4);
        assertTrue(rb.effluentResult().reachable());
        FlushingModel two = FlushingModels.twoRegion(t, 0.4, 0.5);
        double te = rb.effluentResult().poreVolumes();
        // the rebound mean is the soil mean at that time (local mass balance), the maximum the soil maximum
        assertEquals(two.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, te), rb.reboundMeanFraction(), 1e-12);
        assertEquals(two.remainingFraction(CleanupCriterion.MAX_RESIDUAL, te), rb.reboundMaxFraction(), 1e-12);
        // the immobile region still holds contaminant: after rebound the outlet water is above the target
        assertTrue(rb.reboundAtOutletFraction() > 0.01, rb.describe());
        assertTrue(rb.waterMeetsButSoilDoesNot(), rb.describe());
        // in equilibrium (beta = 1) there is nothing to rebound from: the outlet stays at the target
        ReboundEstimate none = ReboundEstimate.afterEffluentMeetsTarget(t, new TwoRegionParameters(1, 0), 0.01, 1e4);
        assertEquals(0.01, none.reboundAtOutletFraction(), 1e-9);
        assertFalse(none.waterMeetsButSoilDoesNot(), none.describe());
    }

    @Test
    void physicalAndChemicalParametersFollowThePublishedDefinitions() {
        LayerFlushingInput in = new LayerFlushingInput(2, 0.30, 0.40, 1500, 0.4, 0.1, 0.1, 0, 0);
        // REFERENCES.md (van Genuchten and Wierenga 1976): beta = (theta_m + f rho_b Kd)/(theta + rho_b Kd),
        // omega = alpha L / q; evaluated independently here with rho_b = 1.5 kg/L
        TwoRegionParameters ph = TwoRegionParameters.physical(in, 0.6, 0.5, 0.02);
        assertEquals((0.18 + 0.5 * 1.5 * 0.4) / (0.30 + 1.5 * 0.4), ph.beta(), 1e-15);
        assertEquals(0.02 * 2 / 0.1, ph.omega(), 1e-15);
        // REFERENCES.md (Nkedi-Kizza et al. 1984): beta = (1 + F rho_b Kd/theta)/R, omega = k (1 - beta) R L / v
        TwoRegionParameters ch = TwoRegionParameters.chemical(in, 0.3, 0.05);
        double r = 1 + 1.5 * 0.4 / 0.30;
        double beta = (1 + 0.3 * 1.5 * 0.4 / 0.30) / r;
        assertEquals(beta, ch.beta(), 1e-15);
        assertEquals(0.05 * (1 - beta) * r * 2 / (0.1 / 0.30), ch.omega(), 1e-14);
    }

    @Test
    void badInputsAreRefused() {
        LayerFlushingInput in = new LayerFlushingInput(2, 0.30, 0.40, 1500, 0.4, 0.1, 0.1, 0, 0);
        assertEquals("beta (-)", assertThrows(TransportInputException.class, () -> new TwoRegionParameters(0, 1)).quantity());
        assertEquals("beta (-)", assertThrows(TransportInputException.class, () -> new TwoRegionParameters(1.2, 1)).quantity());
        assertEquals("omega (-)", assertThrows(TransportInputException.class, () -> new TwoRegionParameters(0.5, -1)).quantity());
        assertEquals("omega (-)", assertThrows(TransportInputException.class,
                () -> new TwoRegionParameters(0.5, Double.NaN)).quantity());
        assertEquals("mobile water fraction theta_m/theta (-)", assertThrows(TransportInputException.class,
                () -> TwoRegionParameters.physical(in, 0, 0.5, 0.1)).quantity());
        assertEquals("mobile sorption-site fraction f (-)", assertThrows(TransportInputException.class,
                () -> TwoRegionParameters.physical(in, 0.5, 1.5, 0.1)).quantity());
        assertEquals("mass-transfer coefficient alpha (1/day)", assertThrows(TransportInputException.class,
                () -> TwoRegionParameters.physical(in, 0.5, 0.5, -0.1)).quantity());
        assertEquals("equilibrium site fraction F (-)", assertThrows(TransportInputException.class,
                () -> TwoRegionParameters.chemical(in, -0.1, 0.1)).quantity());
        assertEquals("kinetic rate k (1/day)", assertThrows(TransportInputException.class,
                () -> TwoRegionParameters.chemical(in, 0.5, Double.NaN)).quantity());
        assertEquals("Peclet number (-)", assertThrows(TransportInputException.class,
                () -> FlushingModels.twoRegion(transport(2, Double.POSITIVE_INFINITY, 0), 0.5, 1)).quantity());
        assertEquals("target fraction", assertThrows(TransportInputException.class,
                () -> ReboundEstimate.afterEffluentMeetsTarget(transport(2, 10, 0), new TwoRegionParameters(0.5, 1), 0, 10))
                .quantity());
    }
}
