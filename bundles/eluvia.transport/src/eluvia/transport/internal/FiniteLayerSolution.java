package eluvia.transport.internal;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

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
 * and for the reflection term, whose integral over the layer is elementary in erf and exp:
 * with z = u/a an antiderivative in u is
 * <pre>
 *   G(u) = sqrt(P tau/pi) (u + P u^2/6 + 2 tau/3) exp(P - z^2) - (tau + P u^2/2 + P tau u/2 + P^2 u^3/12) exp(P) erfc(z)
 * </pre>
 * and the layer integral is G(2 + tau) - G(1 + tau). Its leading asymptotic terms cancel; they
 * are removed analytically with k(z) = j(z) + 3/(4 z^4) (see {@link #reflectionIntegral}).
 * The earlier Gauss-Legendre quadrature of the reflection term is kept as
 * {@link #reflectionIntegralByQuadrature} for the tests.
 *
 * <p>Roots: the m-th root is b = (m-1) pi + theta with theta = arccot((b^2 - P^2/4) / (P b)) in
 * (0, pi); it is found by Newton's method on that fixed-point form, kept inside ((m-1) pi, m pi)
 * by bisection steps, and the roots and the per-root coefficients of the effluent and mean series
 * are cached.
 *
 * <p>Maximum: the maximum principle puts the largest residual at the outlet for this problem
 * (dc/dX satisfies the same equation, is 0 at the outlet and P c &ge; 0 at the inlet), so
 * {@link #maximum} is the outlet value; {@link #searchedMaximum} finds it by a profile search
 * ({@link ProfileMaximum}) without that assumption, and the tests check the two agree.
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

    /** Argument of k(z) from which the continued fraction is used. */
    static final double CONTINUED_FRACTION_FROM = 3;
    /** Terms of the continued fraction of erfcx. */
    static final int CONTINUED_FRACTION_TERMS = 40;

    /** Roots computed at first use (more are added as a series needs them). */
    private static final int FIRST_ROOTS = 4;

    private final double peclet;
    private volatile Roots roots = new Roots(new double[0], new double[0], new double[0], new double[0]);

    /**
     * The roots b_m, b_m^2 / P, and the effluent and mean coefficients of each root (immutable; a
     * longer set replaces the whole object, so readers never see a half-built one).
     */
    private record Roots(double[] b, double[] decay, double[] effluent, double[] mean) {
        int size() {
            return b.length;
        }
    }

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

    /**
     * Largest remaining fraction anywhere in the layer: the outlet value, by the maximum principle
     * (class comment); {@link #searchedMaximum} checks it.
     */
    public double maximum(double tau) {
        return effluent(tau);
    }

    /** Largest remaining fraction anywhere in the layer, found by a profile search without assuming where it is. */
    public double searchedMaximum(double tau) {
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

    /** The Brenner series for the effluent (coefficients 2 b sin b / (b^2 + P^2/4 + P), cached per root). */
    public double seriesEffluent(double tau) {
        return sumCached(tau, Math.max(1, 1 / Math.sqrt(peclet)), true);
    }

    /** The Brenner series for the mean over the layer (coefficients cached per root). */
    public double seriesMean(double tau) {
        return sumCached(tau, 2, false);
    }

    /** {@link #sumSeries} for the outlet (shift P/2) with the coefficients cached per root. */
    private double sumCached(double tau, double amplitude, boolean effluent) {
        double p = peclet;
        double base = p / 2 - p * tau / 4;
        Roots r = roots;
        double sum = 0;
        for (int m = 1; m <= MAX_ROOTS; m++) {
            if (m > r.size()) {
                r = growRoots(m);
            }
            double exponent = base - r.decay[m - 1] * tau;
            double e = Math.exp(exponent);
            if (exponent < LOG_SMALLEST || (m > 1 && amplitude * e < 1e-17 * Math.abs(sum))) {
                return sum;
            }
            sum += (effluent ? r.effluent[m - 1] : r.mean[m - 1]) * e;
        }
        throw new IllegalStateException("Brenner series did not converge in " + MAX_ROOTS
                + " terms at Peclet number " + p + ", retarded time " + tau);
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
        Roots r = roots;
        if (m <= r.size()) {
            return r.b[m - 1];
        }
        return growRoots(m).b[m - 1];
    }

    private synchronized Roots growRoots(int m) {
        Roots r = roots;
        if (m <= r.size()) {
            return r;
        }
        int n = Math.max(m, Math.max(FIRST_ROOTS, 2 * r.size()));
        double p = peclet;
        double quarter = p * p / 4;
        double[] b = Arrays.copyOf(r.b, n);
        double[] decay = Arrays.copyOf(r.decay, n);
        double[] effluent = Arrays.copyOf(r.effluent, n);
        double[] mean = Arrays.copyOf(r.mean, n);
        for (int k = r.size(); k < n; k++) {
            double x = newtonRoot(k + 1, p);
            double s = x * x + quarter;
            double sin = Math.sin(x);
            b[k] = x;
            decay[k] = x * x / p;
            effluent[k] = 2 * x * sin / (s + p);
            mean[k] = 2 * p * x * sin / (s * (s + p));
        }
        Roots grown = new Roots(b, decay, effluent, mean);
        roots = grown;
        return grown;
    }

    /**
     * The m-th root by Newton's method on g(b) = b - (m-1) pi - atan2(1, q(b)), q(b) = b/P - P/(4 b):
     * g rises (g' = 1 + q'/(1 + q^2) &ge; 1, q' = 1/P + P/(4 b^2)) from -pi or less at (m-1) pi to
     * 0 or more at m pi; a step that leaves the bracket is replaced by bisection. It stops when the
     * Newton step is within 4 units in the last place of b (quadratic convergence has then reached
     * rounding; typically after 3 to 5 steps).
     */
    static double newtonRoot(int m, double p) {
        double start = (m - 1) * Math.PI;
        double lo = start;
        double hi = m * Math.PI;
        double mid = start + Math.PI / 2;
        double x = start + Math.atan2(1, mid / p - p / (4 * mid));
        for (int i = 0; i < 100; i++) {
            double q = x / p - p / (4 * x);
            double g = x - start - Math.atan2(1, q);
            if (g == 0) {
                return x;
            }
            if (g < 0) {
                lo = x;
            } else {
                hi = x;
            }
            double slope = 1 + (1 / p + p / (4 * x * x)) / (1 + q * q);
            double step = g / slope;
            if (Math.abs(step) <= 4 * Math.ulp(x)) {
                // converged to rounding: a step this small cannot be told from the noise of g
                return x - step;
            }
            double next = x - step;
            if (!(next > lo && next < hi)) {
                next = lo + (hi - lo) / 2;
            }
            if (next == lo || next == hi) {
                return next;
            }
            x = next;
        }
        return x;
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

    /**
     * Integral over the layer of the reflection term, G(2 + tau) - G(1 + tau) with the
     * antiderivative G of the class comment. With S = sqrt(P tau/pi), erfcx(z) = (1 - h(z)) /
     * (sqrt(pi) z), h(z) = 1/(2 z^2) + j(z) and j(z) = -3/(4 z^4) + k(z), the bracket of
     * exp(P - z^2) is S [-8 tau^2/(P^2 u^3) - 12 tau^3/(P^2 u^4) - 24 tau^3/(P^3 u^5)
     * + k(z) (2 tau/(P u) + u + tau + P u^2/6)], whose terms are all of the size of the result.
     */
    double reflectionIntegral(double tau) {
        return antiderivative(0, tau) - antiderivative(1, tau);
    }

    /**
     * exp(P) G(u) at depth X (u = 2 - X + tau) for the reflection integral, with Delta = z^2 - P
     * formed as in {@link #reflection} without cancellation.
     */
    private double antiderivative(double depth, double tau) {
        double p = peclet;
        double u = 2 - depth + tau;
        double gap = 2 - depth - tau;
        double bigDelta = p * (gap * gap + 4 * tau * (1 - depth)) / (4 * tau);
        if (bigDelta > -LOG_SMALLEST) {
            return 0;
        }
        double z = u / (2 * Math.sqrt(tau / p));
        double pu = p * u;
        double t2 = tau * tau;
        double bracket = -8 * t2 / (pu * pu * u) - 12 * t2 * tau / (pu * pu * u * u)
                - 24 * t2 * tau / (pu * pu * pu * u * u)
                + k(z) * (2 * tau / pu + u + tau + pu * u / 6);
        return Math.sqrt(p * tau) / SQRT_PI * Math.exp(-bigDelta) * bracket;
    }

    /**
     * k(z) = j(z) + 3/(4 z^4), which falls like 15/(8 z^6). From z = 8 on: the asymptotic series
     * sum_{n &ge; 3} -(-1)^n (2n-1)!!/(2 z^2)^n (Abramowitz and Stegun 1964, 7.1.23). From
     * {@value #CONTINUED_FRACTION_FROM} to 8: h(z) = K/(z + K) from the continued fraction
     * sqrt(pi) erfcx(z) = 1/(z + K), K = (1/2)/(z + 1/(z + (3/2)/(z + 2/(z + ...)))) (Abramowitz
     * and Stegun 1964, 7.1.4), {@value #CONTINUED_FRACTION_TERMS} terms, so h keeps its relative
     * precision and only the two subtractions lose digits (a factor of about z^4/4). Below that:
     * {@link ErrorFunctions#j} (not reached by the image form, where z &ge; sqrt(12)).
     */
    static double k(double z) {
        double z2 = z * z;
        if (z < CONTINUED_FRACTION_FROM) {
            return ErrorFunctions.j(z) + 0.75 / (z2 * z2);
        }
        if (z < 8) {
            double tail = 0;
            for (int n = CONTINUED_FRACTION_TERMS; n >= 1; n--) {
                tail = 0.5 * n / (z + tail);
            }
            double h = tail / (z + tail);
            return h - 0.5 / z2 + 0.75 / (z2 * z2);
        }
        double x = 1 / (2 * z * z);
        double term = 15 * x * x * x;
        double sum = 0;
        for (int n = 3; n < 43; n++) {
            sum += term;
            double next = -term * (2 * n + 1) * x;
            if (Math.abs(next) < 1e-17 * Math.abs(sum)) {
                break;
            }
            term = next;
        }
        return sum;
    }

    /** Integral over the layer of the reflection term, by 8-point Gauss-Legendre panels from the outlet. */
    double reflectionIntegralByQuadrature(double tau) {
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
