package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import eluvia.transport.CleanupCriterion;

/**
 * The fast paths of the finite-layer solution against slow, obviously-right ones: Newton roots
 * against bisection, the closed-form integral of the outlet reflection against adaptive
 * quadrature, and the outlet value as the maximum against a profile search.
 */
final class FiniteLayerFastPathsTest {

    @ParameterizedTest(name = "P = {0}")
    @ValueSource(doubles = {1e-4, 0.3, 3, 48, 150, 1e4, 1e6})
    void newtonRootsMatchBisectionOfTheRootEquation(double peclet) {
        FiniteLayerSolution s = new FiniteLayerSolution(peclet);
        for (int m : new int[] {1, 2, 3, 7, 25, 100, 400}) {
            // REFERENCES.md: one root of b cot b - b^2/P + P/4 = 0 in each ((m-1) pi, m pi) (Brenner 1962);
            // the reference is plain bisection of cos b + (P/4 - b^2/P) sin(b)/b, which changes sign there
            double lo = (m - 1) * Math.PI;
            double hi = m * Math.PI;
            double fLo = rootFunction(lo, peclet);
            while (true) {
                double mid = lo + (hi - lo) / 2;
                if (mid <= lo || mid >= hi) {
                    break;
                }
                double fMid = rootFunction(mid, peclet);
                if (fMid == 0) {
                    lo = mid;
                    hi = mid;
                    break;
                }
                if ((fMid > 0) == (fLo > 0)) {
                    lo = mid;
                    fLo = fMid;
                } else {
                    hi = mid;
                }
            }
            double bisected = lo + (hi - lo) / 2;
            // both are limited by rounding in the root function: a few units of the last place of b
            // (common practice), more for the first root at small P where the function is flat near b = sqrt(P)
            assertEquals(bisected, s.root(m), 1e-13 * bisected, "root " + m + " at P = " + peclet);
        }
    }

    private static double rootFunction(double b, double p) {
        double sinc = b == 0 ? 1 : Math.sin(b) / b;
        return Math.cos(b) + (p / 4 - b * b / p) * sinc;
    }

    @Test
    void closedFormReflectionIntegralMatchesQuadrature() {
        // the reference: Commons Math 3.6.1 IterativeLegendreGaussIntegrator (16 points, relative 1e-13) of the
        // reflection term over the layer, on panels of geometrically growing width from the outlet
        // (the term lives in a boundary layer of width 2 tau / (P (1 + tau)) there)
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-300);
        int compared = 0;
        for (double p : new double[] {2, 20, 48, 150, 300, 1000}) {
            FiniteLayerSolution s = new FiniteLayerSolution(p);
            for (double fraction : new double[] {0.2, 0.5, 0.8, 0.95, 1.0}) {
                double tau = fraction * p / FiniteLayerSolution.IMAGE_FORM_PECLET_PER_TAU;
                double width = 2 * tau / (p * (1 + tau));
                double reference = 0;
                double hi = 1;
                for (double w = width; hi > 0; w *= 2) {
                    double lo = Math.max(0, hi - w);
                    final double t = tau;
                    reference += quad.integrate(1_000_000, x -> s.reflection(x, t), lo, hi);
                    hi = lo;
                }
                double mean = s.imageMean(tau);
                // the quadrature's relative 1e-13 of the integral, and what the solution needs is the mean
                // (integral below the mean), so compare relative to the mean
                assertEquals(reference, s.reflectionIntegral(tau), 1e-12 * mean + 1e-300, "P = " + p + ", tau = " + tau);
                if (reference > 1e-6 * mean) {
                    compared++;
                }
            }
        }
        assertTrue(compared >= 5, "cases with a reflection that matters: " + compared);
    }

    @Test
    void kFollowsItsAsymptoticSeriesAndIsContinuousAtTheSwitch() {
        // k(z) = j(z) + 3/(4 z^4) ~ 15/(8 z^6) - 105/(16 z^8) + 945/(32 z^10) (Abramowitz and Stegun 1964, 7.1.23)
        double z = 40;
        double z2 = z * z;
        assertEquals(15 / (8 * Math.pow(z2, 3)) - 105 / (16 * Math.pow(z2, 4)) + 945 / (32 * Math.pow(z2, 5)),
                FiniteLayerSolution.k(z), 10395 / (64 * Math.pow(z2, 6)));
        // the largest double below 8 uses the continued fraction, 8 the series: both good to about 1e-13 relative
        assertEquals(FiniteLayerSolution.k(Math.nextDown(8.0)), FiniteLayerSolution.k(8.0), 1e-13 * FiniteLayerSolution.k(8.0));
        // the continued fraction against Commons Math 3.6.1 erfc at z = 3.5, where j(z) + 3/(4 z^4) from it loses
        // only a factor of about 40 (k ~ 8e-4): agreement to 1e-11 relative
        double kFromErfc = ErrorFunctions.j(3.5) + 0.75 / Math.pow(3.5, 4);
        assertEquals(kFromErfc, FiniteLayerSolution.k(3.5), 1e-11 * kFromErfc);
    }

    @Test
    void maximumIsTheOutletValueAndAgreesWithAProfileSearch() {
        // maximum principle (FiniteLayerSolution class comment): the largest residual is at the outlet; the
        // profile search of ProfileMaximum (33 samples and Brent refinement, no assumption on the place) must agree
        for (double p : new double[] {0.05, 3, 15, 30, 150, 1000}) {
            FiniteLayerSolution s = new FiniteLayerSolution(p);
            FiniteLayerModel model = new FiniteLayerModel(2.6, p, 0);
            for (double tau : new double[] {0.02, 0.2, 0.7, 1, 1.3, 2.5, 6}) {
                double searched = s.searchedMaximum(tau);
                assertEquals(searched, s.maximum(tau), 1e-14 + 1e-12 * searched, "P = " + p + ", tau = " + tau);
                assertEquals(Math.min(1, searched), model.remainingFraction(CleanupCriterion.MAX_RESIDUAL, 2.6 * tau),
                        1e-14 + 1e-12 * searched, "model, P = " + p + ", tau = " + tau);
            }
        }
    }
}
