package eluvia.transport.internal;

import org.apache.commons.math3.analysis.UnivariateFunction;

/**
 * Brent's zero finder (Brent 1973, "Algorithms for Minimization without Derivatives", chapter 4,
 * procedure zero; Dover reprint 2002) on a bracket whose end values the caller already has:
 * inverse quadratic interpolation, secant steps and bisection, never leaving the bracket. It is
 * the algorithm of Commons Math's {@code BrentSolver}, which however evaluates both ends and a
 * start value again; the pore-volume search knows them, so this saves three evaluations per
 * search. The tests check it against {@code BrentSolver}.
 */
public final class BracketedZero {

    private static final double EPSILON = Math.ulp(1.0);

    private BracketedZero() {
    }

    /**
     * A zero of f between a and b, where fa and fb (f at a and b) have opposite signs or one of
     * them is 0.
     *
     * @param relativeAccuracy relative accuracy on the abscissa (dimensionless)
     * @param maxEvaluations most evaluations of f
     * @param nonPositiveSide whether to return the end of the final bracket where f &le; 0 (then
     *        f there is never above 0), rather than the end where |f| is smaller
     * @return the zero, or NaN when maxEvaluations were not enough
     * @throws IllegalArgumentException when fa and fb have the same sign
     */
    public static double find(UnivariateFunction f, double a, double fa, double b, double fb, double relativeAccuracy,
            int maxEvaluations, boolean nonPositiveSide) {
        if (fa == 0) {
            return a;
        }
        if (fb == 0) {
            return b;
        }
        if ((fa > 0) == (fb > 0)) {
            throw new IllegalArgumentException("no sign change between " + a + " (" + fa + ") and " + b + " (" + fb + ")");
        }
        double c = a;
        double fc = fa;
        double d = b - a;
        double e = d;
        for (int evaluations = 0;;) {
            if (Math.abs(fc) < Math.abs(fb)) {
                a = b;
                b = c;
                c = a;
                fa = fb;
                fb = fc;
                fc = fa;
            }
            double tol = 2 * EPSILON * Math.abs(b) + relativeAccuracy * Math.abs(b) + Double.MIN_NORMAL;
            double m = 0.5 * (c - b);
            if (Math.abs(m) <= tol || fb == 0) {
                return nonPositiveSide && fb > 0 ? c : b;
            }
            if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
                d = m;
                e = d;
            } else {
                double s = fb / fa;
                double p;
                double q;
                if (a == c) {
                    p = 2 * m * s;
                    q = 1 - s;
                } else {
                    q = fa / fc;
                    double r = fb / fc;
                    p = s * (2 * m * q * (q - r) - (b - a) * (r - 1));
                    q = (q - 1) * (r - 1) * (s - 1);
                }
                if (p > 0) {
                    q = -q;
                } else {
                    p = -p;
                }
                if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * e * q)) {
                    e = d;
                    d = p / q;
                } else {
                    d = m;
                    e = d;
                }
            }
            a = b;
            fa = fb;
            b += Math.abs(d) > tol ? d : (m > 0 ? tol : -tol);
            if (++evaluations > maxEvaluations) {
                return Double.NaN;
            }
            fb = f.value(b);
            if ((fb > 0) == (fc > 0)) {
                c = a;
                fc = fa;
                d = b - a;
                e = d;
            }
        }
    }
}
