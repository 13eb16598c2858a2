package eluvia.transport.internal;

import org.apache.commons.math3.special.Erf;

/**
 * Error-function helpers that keep full precision where products such as exp(a) erfc(z) would
 * overflow or cancel. All arguments and results are dimensionless.
 *
 * <p>The scaled complementary error function erfcx(z) = exp(z^2) erfc(z) comes from Commons Math
 * {@link Erf#erfc(double)} for z below {@value #ASYMPTOTIC_FROM} and from its asymptotic series
 * erfcx(z) = (1 / (z sqrt(pi))) sum_k (-1)^k (2k-1)!! / (2 z^2)^k above it (Abramowitz and Stegun
 * 1964, 7.1.23), where the series is summed until its terms fall below 1e-17 of the sum (at
 * z = 8 the smallest term is far below that, so the truncation error is negligible).
 */
public final class ErrorFunctions {
    /** Argument above which the asymptotic series is used. */
    static final double ASYMPTOTIC_FROM = 8.0;

    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private ErrorFunctions() {
    }

    /** erfc(z), delegated to Commons Math. */
    public static double erfc(double z) {
        return Erf.erfc(z);
    }

    /** The scaled complementary error function exp(z^2) erfc(z), for any finite z. */
    public static double erfcx(double z) {
        if (z < 0) {
            // erfc(-z) = 2 - erfc(z); exp(z^2) overflows for z below about -26.6, and so does the value.
            return 2 * Math.exp(z * z) - erfcx(-z);
        }
        if (z < ASYMPTOTIC_FROM) {
            return Math.exp(z * z) * Erf.erfc(z);
        }
        return asymptoticSum(z, 0) / (z * SQRT_PI);
    }

    /**
     * exp(a) erfc(z) without intermediate overflow: computed as exp(a - z^2) erfcx(z) where z is
     * positive.
     */
    public static double expTimesErfc(double a, double z) {
        if (z <= 0.5) {
            return Math.exp(a) * Erf.erfc(z);
        }
        return Math.exp(a - z * z) * erfcx(z);
    }

    /**
     * h(z) = 1 - sqrt(pi) z erfcx(z) for z &ge; 0, which falls like 1 / (2 z^2) for large z.
     * Formulas in which the leading terms of exp(-z^2)/(sqrt(pi) z) cancel are written with it.
     */
    public static double h(double z) {
        if (z < ASYMPTOTIC_FROM) {
            return 1 - SQRT_PI * z * erfcx(z);
        }
        return -asymptoticSum(z, 1);
    }

    /**
     * j(z) = h(z) - 1 / (2 z^2) for z &gt; 0, which falls like -3 / (4 z^4) for large z.
     */
    public static double j(double z) {
        if (z < ASYMPTOTIC_FROM) {
            return h(z) - 0.5 / (z * z);
        }
        return -asymptoticSum(z, 2);
    }

    /**
     * sum_{k &ge; from} (-1)^k (2k-1)!! / (2 z^2)^k, for z &ge; {@value #ASYMPTOTIC_FROM}. The
     * terms fall by the ratio (2k+1)/(2 z^2) &le; 1/2 for k up to 31, so 40 terms are more than
     * enough.
     */
    private static double asymptoticSum(double z, int from) {
        double x = 1 / (2 * z * z);
        double term = 1;
        for (int k = 1; k <= from; k++) {
            term *= -(2 * k - 1) * x;
        }
        double sum = 0;
        for (int k = from; k < from + 40; k++) {
            sum += term;
            double next = term * -(2 * k + 1) * x;
            if (Math.abs(next) < 1e-17 * Math.abs(sum)) {
                break;
            }
            term = next;
        }
        return sum;
    }
}
