package eluvia.transport;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.Erf;

import eluvia.transport.internal.DeHoogInversion;
import eluvia.transport.internal.SemiInfiniteForms;

/**
 * How far below the treated layer the flushed contaminant pushes soil above the cleanup level
 * while the layer is flushed.
 *
 * <p>Statement: the soil below the layer has the same water content, sorption (R), dispersivity
 * and flux as the layer and is clean at the start, and the flushed water drains through it (it is
 * not captured at the base of the layer). The profile is then that of a semi-infinite column
 * from the top of the layer, flux inlet with clean water, initially at C0 over the layer
 * (0 &lt; X &lt; 1, X = depth / L) and clean below. By superposition of step solutions it is, below
 * the layer (X &gt; 1), with tau = T / R, a = 2 sqrt(tau / P):
 * <pre>
 *   C/C0 = 1/2 erfc((X - 1 - tau)/a) - A_L(X, tau) + (inlet term)
 * </pre>
 * where A_L is the Lindstrom et al. (1967) flux-inlet step solution. The inlet term's Laplace
 * transform is -r1^2 exp(-q) exp(r1 (X - 1)) / (s q r2) (r = (P -/+ q)/2, q = sqrt(P^2 + 4 P s)); it
 * is below exp(-P) and is dropped for P &ge; {@value #CLOSED_FORM_PECLET}; below that the exact
 * transform (1/s) [r2/q - P exp(r1)/r2 - r1^2 exp(-q)/(q r2)] exp(r1 (X - 1)) is inverted by
 * de Hoog, Knight and Stokes (1982). Decay multiplies by exp(-k T). Soil and pore water are in
 * equilibrium, so the same fraction applies to both; a prediction for the soil concentration in
 * mg/kg uses the layer's initial soil concentration.
 *
 * <p>The deepest point above the target is searched at {@value #TIME_SAMPLES} equally spaced
 * times up to the end of flushing and refined around the deepest one; at each time the profile
 * is scanned downward on a grid of a / 4 (at most {@value #MAX_DEPTH_SAMPLES} steps) and the last
 * crossing is found by Brent's method (Commons Math {@link BrentSolver}). The refinement in time is
 * a golden-section search of 30 steps between the neighbours of the deepest sample.
 */
public final class FlushingPushDown {
    /** Peclet number from which the inlet term is dropped (it is then below exp(-40) of C0). */
    public static final double CLOSED_FORM_PECLET = 40;
    static final int TIME_SAMPLES = 20;
    static final int MAX_DEPTH_SAMPLES = 4000;

    /**
     * The result.
     *
     * @param targetFraction cleanup level over the initial concentration, dimensionless
     * @param poreVolumesFlushed flushing duration in pore volumes of the layer, dimensionless
     * @param deepestBelowLayerMetres greatest depth below the base of the layer at which C/C0 exceeded the
     *        target at any time during flushing, m (0 if never)
     * @param poreVolumesAtDeepest when that depth was reached, pore volumes
     * @param belowLayerAtEndMetres depth below the base still above the target at the end of flushing, m
     * @param peakBelowLayerAtEndFraction largest C/C0 below the base at the end, dimensionless
     */
    public record Result(double targetFraction, double poreVolumesFlushed, double deepestBelowLayerMetres,
            double poreVolumesAtDeepest, double belowLayerAtEndMetres, double peakBelowLayerAtEndFraction) {
    }

    private FlushingPushDown() {
    }

    /**
     * @param in the flushed layer (the soil below is assumed to be like it)
     * @param poreVolumesFlushed pore volumes of clean water applied, greater than 0
     * @param targetFraction cleanup level over the initial concentration, between 0 and 1 (both excluded)
     */
    public static Result estimate(LayerFlushingInput in, double poreVolumesFlushed, double targetFraction) {
        if (in == null) {
            throw new TransportInputException("layer", null, "a LayerFlushingInput");
        }
        TransportInputException.requirePositive("pore volumes flushed (-)", poreVolumesFlushed);
        if (!(targetFraction > 0 && targetFraction < 1)) {
            throw new TransportInputException("target fraction", targetFraction, "between 0 and 1, both excluded");
        }
        LayerTransport t = LayerTransport.of(in);
        double l = in.thicknessMetres();
        double bestT = 0;
        double best = 0;
        double step = poreVolumesFlushed / TIME_SAMPLES;
        for (int i = 1; i <= TIME_SAMPLES; i++) {
            double depth = deepestAbove(t, i * step, targetFraction);
            if (depth > best) {
                best = depth;
                bestT = i * step;
            }
        }
        if (best > 0 && bestT < poreVolumesFlushed) {
            // refine between the neighbours of the best sample by golden-section search
            double lo = bestT - step;
            double hi = Math.min(poreVolumesFlushed, bestT + step);
            double g = (Math.sqrt(5) - 1) / 2;
            for (int k = 0; k < 30; k++) {
                double m1 = hi - g * (hi - lo);
                double m2 = lo + g * (hi - lo);
                if (deepestAbove(t, m1, targetFraction) > deepestAbove(t, m2, targetFraction)) {
                    hi = m2;
                } else {
                    lo = m1;
                }
            }
            double mid = (lo + hi) / 2;
            double d = deepestAbove(t, mid, targetFraction);
            if (d > best) {
                best = d;
                bestT = mid;
            }
        }
        double atEnd = deepestAbove(t, poreVolumesFlushed, targetFraction);
        double peak = peakBelow(t, poreVolumesFlushed);
        return new Result(targetFraction, poreVolumesFlushed, best * l, bestT, atEnd * l, peak);
    }

    /**
     * C/C0 below the layer (X &ge; 1, in layer thicknesses from the top of the layer) after T pore
     * volumes, for retardation R, Peclet number P (finite) and decay per pore volume k.
     */
    public static double concentrationBelow(double relativeDepth, double poreVolumes, LayerTransport t) {
        if (!(relativeDepth >= 1) || Double.isInfinite(relativeDepth)) {
            throw new TransportInputException("relative depth x/L (-)", relativeDepth, "1 or more (below the layer), finite");
        }
        TransportInputException.requireNonNegative("pore volumes (-)", poreVolumes);
        return profile(t, poreVolumes).value(relativeDepth);
    }

    /** The profile below the layer at one time; the transform parts that do not depend on depth are kept. */
    private interface Profile {
        double value(double relativeDepth);
    }

    private static Profile profile(LayerTransport t, double poreVolumes) {
        double decay = Math.exp(-t.decayPerPoreVolume() * poreVolumes);
        if (poreVolumes == 0) {
            return x -> x == 1 ? 0.5 : 0;
        }
        double tau = poreVolumes / t.retardation();
        double p = t.peclet();
        if (Double.isInfinite(p)) {
            return x -> (x > tau && x < 1 + tau ? 1 : 0) * decay;
        }
        if (p >= CLOSED_FORM_PECLET) {
            return x -> Math.max(0, Math.min(1, closedForm(x, tau, p))) * decay;
        }
        Complex[] s = DeHoogInversion.abscissae(tau);
        Complex[] r1 = new Complex[s.length];
        Complex[] front = new Complex[s.length];
        for (int k = 0; k < s.length; k++) {
            Complex q = s[k].multiply(4 * p).add(p * p).sqrt();
            r1[k] = q.negate().add(p).divide(2);
            front[k] = exactTransform(s[k], 1, p);
        }
        return x -> {
            Complex[] v = new Complex[s.length];
            for (int k = 0; k < s.length; k++) {
                v[k] = front[k].multiply(r1[k].multiply(x - 1).exp());
            }
            return Math.max(0, Math.min(1, DeHoogInversion.fromValues(v, tau))) * decay;
        };
    }

    /** The closed form without the inlet term (package-private for the tests). */
    static double closedForm(double depth, double tau, double peclet) {
        double a = 2 * Math.sqrt(tau / peclet);
        return 0.5 * Erf.erfc((depth - 1 - tau) / a) - SemiInfiniteForms.fluxInletStep(depth, tau, peclet);
    }

    /** The exact transform in tau (package-private for the tests). */
    static Complex exactTransform(Complex s, double depth, double peclet) {
        Complex q = s.multiply(4 * peclet).add(peclet * peclet).sqrt();
        Complex r1 = q.negate().add(peclet).divide(2);
        Complex r2 = q.add(peclet).divide(2);
        Complex bracket = r2.divide(q).subtract(r1.exp().multiply(peclet).divide(r2))
                .subtract(r1.multiply(r1).multiply(q.negate().exp()).divide(q.multiply(r2)));
        return bracket.divide(s).multiply(r1.multiply(depth - 1).exp());
    }

    /** Deepest X - 1 &gt; 0 with C/C0 above the target at this time (0 if none). */
    private static double deepestAbove(LayerTransport t, double poreVolumes, double target) {
        Profile profile = profile(t, poreVolumes);
        double[] grid = grid(t, poreVolumes);
        double lastAbove = Double.NaN;
        for (double x = 1; x <= grid[1]; x += grid[0]) {
            if (profile.value(x) > target) {
                lastAbove = x;
            }
        }
        if (Double.isNaN(lastAbove)) {
            return 0;
        }
        double lo = lastAbove;
        double hi = lastAbove + grid[0];
        if (profile.value(hi) > target) {
            return hi - 1;
        }
        double root = new BrentSolver(1e-12, 1e-12).solve(200, x -> profile.value(x) - target, lo, hi);
        return root - 1;
    }

    private static double peakBelow(LayerTransport t, double poreVolumes) {
        Profile profile = profile(t, poreVolumes);
        double[] grid = grid(t, poreVolumes);
        double peak = 0;
        for (double x = 1; x <= grid[1]; x += grid[0]) {
            peak = Math.max(peak, profile.value(x));
        }
        return peak;
    }

    /**
     * Depth step and deepest depth (layer thicknesses) of the scan: a / 4 (or finer, at most
     * {@value #MAX_DEPTH_SAMPLES} steps), down to 1 + tau + 6 a, beyond which C/C0 is below
     * erfc(6)/2 (about 1e-17).
     */
    private static double[] grid(LayerTransport t, double poreVolumes) {
        double tau = poreVolumes / t.retardation();
        double p = Double.isInfinite(t.peclet()) ? 1e12 : t.peclet();
        double a = 2 * Math.sqrt(tau / p);
        double end = 1 + tau + 6 * a;
        double h = Math.max(a / 4, (end - 1) / MAX_DEPTH_SAMPLES);
        return new double[] {h, end + h};
    }
}
