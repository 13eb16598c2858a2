package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The two forms of the finite-layer solution against each other and the root equation. */
final class FiniteLayerSolutionTest {

    @Test
    void rootsLieInTheirIntervalsAndSolveTheEquation() {
        for (double p : new double[] {1e-3, 1, 10, 1000}) {
            FiniteLayerSolution s = new FiniteLayerSolution(p);
            for (int m = 1; m <= 60; m++) {
                double b = s.root(m);
                // REFERENCES.md: one root of b cot b - b^2/P + P/4 = 0 in each ((m-1) pi, m pi) (Brenner 1962)
                assertTrue(b > (m - 1) * Math.PI && b < m * Math.PI, "root " + m + " at P = " + p + ": " + b);
                // the equation multiplied by sin b (finite everywhere), relative to the size of its terms
                double residual = b * Math.cos(b) - (b * b / p - p / 4) * Math.sin(b);
                double scale = b + (b * b / p + p / 4);
                assertEquals(0, residual / scale, 1e-13, "root " + m + " at P = " + p);
            }
        }
    }

    @Test
    void seriesAndImageFormAgreeOnBothSidesOfTheSwitch() {
        // Where both are accurate (series cancellation below exp(10), image neglect below exp(-38)),
        // the two independent forms must agree: a check of each against the other on both sides.
        for (double p : new double[] {2, 20, 48, 100, 300}) {
            FiniteLayerSolution s = new FiniteLayerSolution(p);
            double atSwitch = p / FiniteLayerSolution.IMAGE_FORM_PECLET_PER_TAU;
            for (double factor : new double[] {0.8, 0.9, 0.99, 1.01, 1.1, 1.25}) {
                double tau = factor * atSwitch;
                assertEquals(factor <= 1, s.usesImageForm(tau));
                compare(s.seriesEffluent(tau), s.imageProfile(1, tau), "effluent", p, tau);
                compare(s.seriesMean(tau), s.imageMean(tau), "mean", p, tau);
                for (double x : new double[] {0, 0.25, 0.5, 0.9, 1}) {
                    compare(s.seriesProfile(x, tau), s.imageProfile(x, tau), "profile at " + x, p, tau);
                }
            }
        }
    }

    @Test
    void earlyTimesAtLowPecletUseTheImageFormAndAgreeWithALongSeries() {
        FiniteLayerSolution s = new FiniteLayerSolution(0.5);
        double tau = 0.002;
        assertTrue(s.usesImageForm(tau));
        // the series still converges here (cancellation factor exp(P/2) is harmless) but needs hundreds of roots
        compare(s.seriesEffluent(tau), s.effluent(tau), "effluent", 0.5, tau);
        compare(s.seriesMean(tau), s.mean(tau), "mean", 0.5, tau);
        compare(s.seriesProfile(0.01, tau), s.profile(0.01, tau), "profile", 0.5, tau);
    }

    @Test
    void maximumIsAtTheOutletAndTheProfileRisesWithDepth() {
        // maximum principle for dc/dX (see FiniteLayerSolution): the profile never falls with depth,
        // so the maximum residual equals the outlet (effluent) value; the search must find it.
        for (double p : new double[] {0.5, 10, 200}) {
            FiniteLayerSolution s = new FiniteLayerSolution(p);
            for (double tau : new double[] {0.05, 0.3, 0.9, 1.5, 3}) {
                double previous = -1;
                for (int i = 0; i <= 100; i++) {
                    double c = s.profile(i / 100.0, tau);
                    assertTrue(c >= previous - 1e-14, "P = " + p + ", tau = " + tau + ", X = " + i / 100.0);
                    previous = c;
                }
                ProfileMaximum m = ProfileMaximum.of(x -> s.profile(x, tau));
                assertEquals(s.effluent(tau), m.value(), 1e-14 + 1e-12 * m.value());
                // where the profile is flat (ahead of the front) any depth of the plateau is a maximum
                assertEquals(m.value(), s.profile(m.depth(), tau), 0);
            }
        }
    }

    @Test
    void profileSearchFindsAnInteriorMaximum() {
        // a profile with its maximum inside the layer (a Gaussian at X = 0.3712, an exact test function)
        ProfileMaximum m = ProfileMaximum.of(x -> Math.exp(-Math.pow((x - 0.3712) / 0.01, 2)));
        assertEquals(0.3712, m.depth(), 1e-6);
        assertEquals(1.0, m.value(), 1e-10);
    }

    @Test
    void errorFunctionHelpersMatchCommonsMath() {
        // erfcx against exp(z^2) erfc(z) from Commons Math 3.6.1 where that does not overflow; its erfc
        // (regularized gamma continued fraction, epsilon 1e-15) is good to a few 1e-14 at z = 25
        for (double z : new double[] {-3, -0.5, 0, 0.3, 2, 7.9, 8.1, 12, 25}) {
            double direct = Math.exp(z * z) * org.apache.commons.math3.special.Erf.erfc(z);
            assertEquals(direct, ErrorFunctions.erfcx(z), 1e-13 * direct, "erfcx " + z);
        }
        // h(z) = 1 - sqrt(pi) z erfcx(z) ~ 1/(2 z^2) - 3/(4 z^4) + 15/(8 z^6) (Abramowitz and Stegun 7.1.23)
        double z = 40;
        assertEquals(1 / (2 * z * z) - 3 / (4 * Math.pow(z, 4)) + 15 / (8 * Math.pow(z, 6)), ErrorFunctions.h(z),
                110 / Math.pow(z, 8));
        // continuity of h and j across the switch to the asymptotic series
        // (the largest double below 8 uses Commons Math, 8 itself the asymptotic series)
        assertEquals(ErrorFunctions.h(Math.nextDown(8.0)), ErrorFunctions.h(8.0), 1e-14);
        assertEquals(ErrorFunctions.j(Math.nextDown(8.0)), ErrorFunctions.j(8.0), 1e-14);
        assertFalse(Double.isNaN(ErrorFunctions.expTimesErfc(700, 30)));
    }

    private static void compare(double a, double b, String what, double p, double tau) {
        assertEquals(a, b, 1e-10 * Math.max(Math.abs(a), Math.abs(b)) + 1e-12, what + ", P = " + p + ", tau = " + tau);
    }
}
