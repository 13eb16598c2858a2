package eluvia.transport.internal;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Exact equilibrium solution for flushing a finite layer: a layer 0 &le; X &le; 1 initially at
 * c = 1 (resident concentration over its initial value) is flushed with clean water through a
 * flux (third-type) inlet at X = 0, c - (1/P) dc/dX = 0, and has a zero-gradient outlet at X = 1.
 * The equation is dc/dtau = (1/P) d2c/dX2 - dc/dX with tau = T / R (pore volumes over the
 * retardation factor). All quantities are dimensionless; decay is applied by the caller.
 *
 * <p><b>Series (Brenner 1962).</b> With c = exp(P X / 2 - P tau / 4) u the problem becomes a
 * diffusion problem with Robin ends whose eigenfunctions are b cos(b X) + (P/2) sin(b X), b the
 * roots of b cot b - b^2/P + P/4 = 0, one in each ((m-1) pi, m pi). Expanding the initial value
 * (the initial-value form of van Genuchten and Alves 1982, c = 1 - A with A the step-input
 * solution) gives
 * <pre>
 *   c(X, tau) = sum_m 2 P b (b cos bX + P/2 sin bX) / ((b^2 + P^2/4)(b^2 + P^2/4 + P)) exp(P X/2 - P tau/4 - b^2 tau/P)
 *   effluent  = c(1, tau) = sum_m 2 b sin b / (b^2 + P^2/4 + P) exp(P/2 - P tau/4 - b^2 tau/P)
 *   mean      = integral of c over the layer = sum_m 2 P b sin b / ((b^2 + P^2/4)(b^2 + P^2/4 + P)) exp(P/2 - P tau/4 - b^2 tau/P)
 * </pre>
 * (at the zero-gradient outlet the flux-averaged and resident concentrations are equal, Parker
 * and van Genuchten 1984, so the effluent is c(1, tau)). The terms carry exp(P (2 - tau) / 4) and
 * alternate in sign: for large P and early times they cancel catastrophically.
 *
 * <p><b>Image form.</b> Expanding the exact Laplace transform in powers of exp(-sqrt(P^2 + 4 P s))
 * and keeping the first two terms gives the semi-infinite flux-inlet solution (Lindstrom et al.
 * 1967) plus one reflection from the outlet; this is the large-P form given by van Genuchten and
 * Alves (1982) for the third-type finite column. With u = 2 - X + tau and a = 2 sqrt(tau/P):
 * <pre>
 *   A = A_semi(X, tau) + sqrt(P tau/pi) [2 + P u / 2] exp(P - u^2/a^2) - P [u + tau/2 + P u^2/4] exp(P) erfc(u/a)
 * </pre>
 * The neglected terms are smaller than the kept ones by at least exp(-P) and exp(-P (2 - tau)^2
 * / (4 tau)); with P &ge; {@value #IMAGE_FORM_PECLET_PER_TAU} tau, the rule used here, they are
 * below exp(-48) (times powers of P). The series is used otherwise; then its cancellation factor
 * exp(P (2 - tau)/4) is at most exp(12) and b^2 tau / P grows fast enough that a few tens of
 * roots suffice. The mean of the image form is exact for the semi-infinite part,
 * 1 - integral(A_semi) = 1/2 (1 - tau) erfc((tau - 1)/a) + 1/2 (1 + tau) exp(P) erfc((1 + tau)/a),
 * and integrates the reflection term (which lives in a boundary layer of width about
 * 2 tau / P at the outlet) by Gauss-Legendre quadrature on panels of that width.
 *
 * <p>The profile maximum is found by {@link ProfileMaximum}; the maximum principle puts it at
 * the outlet for this problem (dc/dX satisfies the same equation, is 0 at the outlet and P c
 * &ge; 0 at the inlet), which the tests confirm.
 */
public final class FiniteLayerSolution {
    /** The image form is used when P &ge; this number times tau. */
    public static final double IMAGE_FORM_PECLET_PER_TAU = 48;

    /** Most roots the series may use before it gives up (never reached in its own range). */
    static final int MAX_ROOTS = 20000;

    private static final double SQRT_PI = Math.sqrt(Math.PI);
    private static final double LOG_SMALLEST = -745;

    private static final double[] GL_NODES = {
        -0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498,
        0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363 };
    private static final double[] GL_WEIGHTS = {
        0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620,
        0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763 };

    private final double peclet;
    private volatile double[] roots = new double[0];

    /** @param peclet P = v L / D, finite and greater than 0 */
    public FiniteLayerSolution(double peclet) {
        if (!(peclet > 0) || Double.isInfinite(peclet)) {
            throw new IllegalArgumentException("Peclet number = " + peclet + " must be finite and greater than 0");
        }
        this.peclet = peclet;
    }

    public double peclet() {
        return peclet;
    }

    /** Whether the image form (rather than the series) is used at this retarded time. */
    public boolean usesImageForm(double tau) {
        return peclet >= IMAGE_FORM_PECLET_PER_TAU * tau;
    }

    /** Remaining fraction at depth X (0..1) and retarded time tau &ge; 0. */
    public double profile(double depth, double tau) {
        if (tau == 0) {
            return 1;
        }
        return usesImageForm(tau) ? imageProfile(depth, tau) : seriesProfile(depth, tau);
    }

    /** Effluent (flux-averaged outlet) concentration over the initial one. */
    public double effluent(double tau) {
        if (tau == 0) {
            return 1;
        }
        return usesImageForm(tau) ? imageProfile(1, tau) : seriesEffluent(tau);
    }

    /** Mean over the layer of the remaining fraction (mass left over mass at start). */
    public double mean(double tau) {
        if (tau == 0) {
            return 1;
        }
        return usesImageForm(tau) ? imageMean(tau) : seriesMean(tau);
    }

    /** Largest remaining fraction anywhere in the layer, found by a profile search. */
    public double maximum(double tau) {
        if (tau == 0) {
            return 1;
        }
        return ProfileMaximum.of(x -> profile(x, tau)).value();
    }

    // ---------------------------------------------------------------- series

    /** The Brenner series for the profile, whatever tau is (slow or inaccurate outside its range). */
    public double seriesProfile(double depth, double tau) {
        double p = peclet;
        double quarter = p * p / 4;
        return sumSeries(tau, p * depth / 2, 2, b -> {
            double s = b * b + quarter;
            return 2 * p * b * (b * Math.cos(b * depth) + p / 2 * Math.sin(b * depth)) / (s * (s + p));
        });
    }

    /** The Brenner series for the effluent. */
    public double seriesEffluent(double tau) {
        double p = peclet;
        double quarter = p * p / 4;
        return sumSeries(tau, p / 2, Math.max(1, 1 / Math.sqrt(p)),
                b -> 2 * b * Math.sin(b) / (b * b + quarter + p));
    }

    /** The Brenner series for the mean over the layer. */
    public double seriesMean(double tau) {
        double p = peclet;
        double quarter = p * p / 4;
        return sumSeries(tau, p / 2, 2, b -> {
            double s = b * b + quarter;
            return 2 * p * b * Math.sin(b) / (s * (s + p));
        });
    }

    /**
     * Sums coefficient(b_m) exp(shift - P tau/4 - b_m^2 tau/P) until the bound
     * amplitude exp(...) on the next terms is below 1e-17 of the sum (the exponent falls with m,
     * so the bound does too).
     */
    private double sumSeries(double tau, double shift, double amplitude, DoubleUnaryOperator coefficient) {
        double p = peclet;
        double base = shift - p * tau / 4;
        double sum = 0;
        for (int m = 1; m <= MAX_ROOTS; m++) {
            double b = root(m);
            double exponent = base - b * b * tau / p;
            double envelope = amplitude * Math.exp(exponent);
            if (exponent < LOG_SMALLEST || (m > 1 && envelope < 1e-17 * Math.abs(sum))) {
                return sum;
            }
            sum += coefficient.applyAsDouble(b) * Math.exp(exponent);
        }
        throw new IllegalStateException("Brenner series did not converge in " + MAX_ROOTS
                + " terms at Peclet number " + p + ", retarded time " + tau);
    }

    /** The m-th root (m &ge; 1) of b cot b - b^2/P + P/4 = 0, in ((m-1) pi, m pi). */
    public double root(int m) {
        double[] r = roots;
        if (m <= r.length) {
            return r[m - 1];
        }
        return growRoots(m)[m - 1];
    }

    private synchronized double[] growRoots(int m) {
        double[] r = roots;
        if (m <= r.length) {
            return r;
        }
        int n = Math.max(m, Math.max(32, 2 * r.length));
        double[] grown = java.util.Arrays.copyOf(r, n);
        BrentSolver solver = new BrentSolver(1e-16, 1e-300, 0);
        double p = peclet;
        // cos b + (P/4 - b^2/P) sin(b)/b: the root equation times sin(b)/P, finite at b = 0
        // and of opposite signs at (m-1) pi and m pi.
        org.apache.commons.math3.analysis.UnivariateFunction f = b -> {
            double sinc = b == 0 ? 1 : Math.sin(b) / b;
            return Math.cos(b) + (p / 4 - b * b / p) * sinc;
        };
        for (int k = r.length; k < n; k++) {
            double lo = k * Math.PI;
            double hi = (k + 1) * Math.PI;
            grown[k] = solver.solve(200, f, lo, hi);
        }
        roots = grown;
        return grown;
    }

    // ---------------------------------------------------------------- image form

    /** Remaining fraction from the image form (semi-infinite solution plus one outlet reflection). */
    public double imageProfile(double depth, double tau) {
        if (tau == 0) {
            return 1;
        }
        return SemiInfiniteForms.fluxInletRemaining(depth, tau, peclet) - reflection(depth, tau);
    }

    /** Mean over the layer from the image form. */
    public double imageMean(double tau) {
        if (tau == 0) {
            return 1;
        }
        double p = peclet;
        double a = 2 * Math.sqrt(tau / p);
        double y = (tau - 1) / a;
        double yPlus = (1 + tau) / a;
        double semi;
        if (y <= 0) {
            // 1/2 (1 - tau) erfc((tau - 1)/a) + 1/2 (1 + tau) exp(P) erfc((1 + tau)/a), both terms >= 0;
            // exp(P - yPlus^2) = exp(-y^2).
            semi = 0.5 * (1 - tau) * ErrorFunctions.erfc(y)
                    + 0.5 * (1 + tau) * Math.exp(-y * y) * ErrorFunctions.erfcx(yPlus);
        } else {
            // the same, with the leading asymptotic terms cancelled: a/(2 sqrt(pi)) exp(-y^2) [h(y) - h(yPlus)]
            semi = a / (2 * SQRT_PI) * Math.exp(-y * y) * (ErrorFunctions.h(y) - ErrorFunctions.h(yPlus));
        }
        return semi - reflectionIntegral(tau);
    }

    /**
     * The reflection term of A (see the class comment), written so that its leading asymptotic
     * terms cancel analytically: sqrt(P tau/pi) exp(-Delta) [(P u/2) j(z) + (2 + tau/u) h(z)] with
     * z = u/a and Delta = z^2 - P = P ((2 - X - tau)^2 + 4 tau (1 - X)) / (4 tau).
     */
    double reflection(double depth, double tau) {
        double p = peclet;
        double a = 2 * Math.sqrt(tau / p);
        double u = 2 - depth + tau;
        double z = u / a;
        double d = 2 - depth - tau;
        double bigDelta = p * (d * d + 4 * tau * (1 - depth)) / (4 * tau);
        if (bigDelta > -LOG_SMALLEST) {
            return 0;
        }
        double bracket = p * u / 2 * ErrorFunctions.j(z) + (2 + tau / u) * ErrorFunctions.h(z);
        return Math.sqrt(p * tau) / SQRT_PI * Math.exp(-bigDelta) * bracket;
    }

    /** Integral over the layer of the reflection term, by 8-point Gauss-Legendre panels from the outlet. */
    double reflectionIntegral(double tau) {
        double width = 2 * tau / (peclet * (1 + tau));
        int panels = (int) Math.min(40, Math.ceil(1 / width));
        width = Math.min(width, 1.0 / panels);
        double sum = 0;
        for (int i = 0; i < panels; i++) {
            double hi = 1 - i * width;
            double lo = i == panels - 1 && panels * width >= 1 ? 0 : hi - width;
            double mid = (hi + lo) / 2;
            double half = (hi - lo) / 2;
            double panel = 0;
            for (int k = 0; k < GL_NODES.length; k++) {
                panel += GL_WEIGHTS[k] * reflection(mid + half * GL_NODES[k], tau);
            }
            sum += half * panel;
        }
        return sum;
    }
}
