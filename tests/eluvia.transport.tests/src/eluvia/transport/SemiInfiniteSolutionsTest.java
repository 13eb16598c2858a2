package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

final class SemiInfiniteSolutionsTest {

    @Test
    void publishedCheckValuesAtPeclet10() {
        // REFERENCES.md [COMP]: v = 1 m/d, D = 0.1 m2/d, x = 1 m, t = 1 d, R = 1: first-type inlet 0.585289
        // (computed from the Ogata and Banks 1961 formula)
        assertEquals(0.585289, SemiInfiniteSolutions.firstTypeInletStepAt(1, 1, 1, 0.1, 1), 5e-7);
        // REFERENCES.md [COMP]: same inputs, flux inlet 0.493058 (Lindstrom et al. 1967)
        assertEquals(0.493058, SemiInfiniteSolutions.fluxInletStepAt(1, 1, 1, 0.1, 1), 5e-7);
        // REFERENCES.md [COMP]: t = 2 d with R = 2 gives the same two numbers
        assertEquals(0.585289, SemiInfiniteSolutions.firstTypeInletStepAt(1, 2, 1, 0.1, 2), 5e-7);
        assertEquals(0.493058, SemiInfiniteSolutions.fluxInletStepAt(1, 2, 1, 0.1, 2), 5e-7);
        // dimensionless form: X = 1, T = 1, P = 10
        assertEquals(0.585289, SemiInfiniteSolutions.firstTypeInletStep(1, 1, 10, 1), 5e-7);
        assertEquals(0.493058, SemiInfiniteSolutions.fluxInletStep(1, 1, 10, 1), 5e-7);
    }

    @Test
    void matchesThePublishedFormulasEvaluatedDirectly() {
        // Where nothing overflows, the published formulas (Ogata and Banks 1961; Lindstrom et al. 1967)
        // evaluated term by term with Commons Math 3.6.1 Erf.erfc must agree with the stable forms.
        for (double p : new double[] {0.3, 2, 10, 40}) {
            for (double x : new double[] {0, 0.2, 0.7, 1.3}) {
                for (double t : new double[] {0.05, 0.4, 1, 2.2}) {
                    double r = 1.7;
                    double a = 2 * Math.sqrt(r * t / p);
                    double ob = 0.5 * Erf.erfc((r * x - t) / a) + 0.5 * Math.exp(p * x) * Erf.erfc((r * x + t) / a);
                    double li = 0.5 * Erf.erfc((r * x - t) / a)
                            + Math.sqrt(p * t / (Math.PI * r)) * Math.exp(-Math.pow(r * x - t, 2) / (a * a))
                            - 0.5 * (1 + p * x + p * t / r) * Math.exp(p * x) * Erf.erfc((r * x + t) / a);
                    // direct evaluation loses about exp(P X) * 1e-16 to cancellation; allow for it
                    double tol = 1e-13 * Math.max(1, Math.exp(p * x) * (1 + p * x + p * t));
                    assertEquals(ob, SemiInfiniteSolutions.firstTypeInletStep(x, t, p, r), tol, "OB " + p + " " + x + " " + t);
                    assertEquals(li, SemiInfiniteSolutions.fluxInletStep(x, t, p, r), tol, "L " + p + " " + x + " " + t);
                }
            }
        }
    }

    @Test
    void fluxAveragedFluxInletEqualsFirstTypeInlet() {
        // Parker and van Genuchten (1984): c - (1/P) dc/dX of the flux-inlet solution is the
        // first-type-inlet solution. dc/dX by a central difference with step 1e-4 (error ~1e-8 * c''').
        double dx = 1e-4;
        for (double p : new double[] {1, 10, 200}) {
            for (double x : new double[] {0.3, 1, 1.5}) {
                double t = 1.1;
                double c = SemiInfiniteSolutions.fluxInletStep(x, t, p, 1);
                double slope = (SemiInfiniteSolutions.fluxInletStep(x + dx, t, p, 1)
                        - SemiInfiniteSolutions.fluxInletStep(x - dx, t, p, 1)) / (2 * dx);
                assertEquals(SemiInfiniteSolutions.firstTypeInletStep(x, t, p, 1), c - slope / p, 1e-6 * Math.max(1, p / 10),
                        "P = " + p + ", X = " + x);
            }
        }
    }

    @Test
    void largePecletStaysFiniteAndApproachesTheSharpFront() {
        for (double p : new double[] {1e3, 1e6, 1e10}) {
            for (double t = 0.1; t < 3; t += 0.1) {
                double ob = SemiInfiniteSolutions.firstTypeInletStep(1, t, p, 1);
                double li = SemiInfiniteSolutions.fluxInletStep(1, t, p, 1);
                assertTrue(ob >= 0 && ob <= 1 && li >= 0 && li <= 1, p + " " + t + ": " + ob + " " + li);
                // both are 1/2 erfc((1 - T)/(2 sqrt(T/P))) up to O(1/sqrt(P)) (the leading term of each formula)
                double front = 0.5 * Erf.erfc((1 - t) / (2 * Math.sqrt(t / p)));
                assertEquals(front, ob, 2 / Math.sqrt(p));
                assertEquals(front, li, 2 / Math.sqrt(p));
            }
        }
        // no dispersion: a sharp front at X = T/R (plug flow)
        assertEquals(1.0, SemiInfiniteSolutions.firstTypeInletStep(0.5, 1, Double.POSITIVE_INFINITY, 1), 0);
        assertEquals(0.0, SemiInfiniteSolutions.fluxInletStep(1.5, 1, Double.POSITIVE_INFINITY, 1), 0);
        assertEquals(1.0, SemiInfiniteSolutions.fluxInletStepAt(0.5, 1, 1, 0, 1), 0);
    }

    @Test
    void badInputsAreRefused() {
        assertEquals("relative depth x/L (-)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.fluxInletStep(-0.1, 1, 10, 1)).quantity());
        assertEquals("pore volumes (-)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.firstTypeInletStep(0.1, Double.NaN, 10, 1)).quantity());
        assertEquals("Peclet number (-)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.firstTypeInletStep(0.1, 1, 0, 1)).quantity());
        assertEquals("retardation factor (-)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.fluxInletStep(0.1, 1, 10, 0.9)).quantity());
        assertEquals("distance (m)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.fluxInletStepAt(-1, 1, 1, 0.1, 1)).quantity());
        assertEquals("time (days)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.firstTypeInletStepAt(1, -1, 1, 0.1, 1)).quantity());
        assertEquals("pore-water velocity (m/day)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.firstTypeInletStepAt(1, 1, 0, 0.1, 1)).quantity());
        assertEquals("dispersion coefficient (m2/day)", assertThrows(TransportInputException.class,
                () -> SemiInfiniteSolutions.fluxInletStepAt(1, 1, 1, -0.1, 1)).quantity());
    }
}
