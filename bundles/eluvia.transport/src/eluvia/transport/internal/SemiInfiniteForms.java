package eluvia.transport.internal;

/**
 * Semi-infinite step-input solutions of the dimensionless advection-dispersion equation
 * dc/dtau = (1/P) d2c/dX2 - dc/dX, written in the retarded time tau = T / R so that the
 * retardation factor drops out. X = x / L (dimensionless depth), P = v L / D (Peclet number).
 *
 * <ul>
 * <li>First-type inlet (Ogata and Banks 1961): c = 1/2 erfc((X - tau)/a) + 1/2 exp(P X) erfc((X + tau)/a)</li>
 * <li>Flux (third-type) inlet, resident concentration (Lindstrom et al. 1967):
 * c = 1/2 erfc((X - tau)/a) + sqrt(P tau / pi) exp(-(X - tau)^2/a^2) - 1/2 (1 + P X + P tau) exp(P X) erfc((X + tau)/a)</li>
 * </ul>
 * with a = 2 sqrt(tau / P). The exponentially large factors are folded into scaled error
 * functions ({@link ErrorFunctions}); in the flux-inlet form the leading asymptotic terms of the
 * second and third terms, which cancel, are removed analytically with h(z) = 1 - sqrt(pi) z erfcx(z):
 * their sum is sqrt(P tau / pi) exp(-(X - tau)^2/a^2) [h(z) - (1 - h(z)) / (P (X + tau))],
 * z = (X + tau)/a. Both solutions are checked in the tests against the published check values.
 */
public final class SemiInfiniteForms {
    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private SemiInfiniteForms() {
    }

    /** Ogata-Banks first-type inlet step response at X &ge; 0, tau &ge; 0, 0 &lt; P &lt; infinity. */
    public static double firstTypeInletStep(double depth, double tau, double peclet) {
        if (tau == 0) {
            return depth == 0 ? 1 : 0;
        }
        double a = 2 * Math.sqrt(tau / peclet);
        double z = (depth + tau) / a;
        double delta = (depth - tau) / a;
        // exp(P X) erfc(z) = exp(P X - z^2) erfcx(z) and P X - z^2 = -(X - tau)^2 / a^2.
        double reflected = z > 0.5 ? Math.exp(-delta * delta) * ErrorFunctions.erfcx(z)
                : Math.exp(peclet * depth) * ErrorFunctions.erfc(z);
        return 0.5 * ErrorFunctions.erfc(delta) + 0.5 * reflected;
    }

    /** Lindstrom flux-inlet step response (resident concentration), c in the class comment. */
    public static double fluxInletStep(double depth, double tau, double peclet) {
        if (tau == 0) {
            return 0;
        }
        double a = 2 * Math.sqrt(tau / peclet);
        return 0.5 * ErrorFunctions.erfc((depth - tau) / a) + fluxInletCorrection(depth, tau, peclet);
    }

    /**
     * 1 minus the flux-inlet step response: the fraction remaining in a semi-infinite profile
     * initially at 1 and flushed with clean water through a flux inlet, computed without
     * forming 1 - c so that small remainders keep their relative precision.
     */
    public static double fluxInletRemaining(double depth, double tau, double peclet) {
        if (tau == 0) {
            return 1;
        }
        double a = 2 * Math.sqrt(tau / peclet);
        return 0.5 * ErrorFunctions.erfc((tau - depth) / a) - fluxInletCorrection(depth, tau, peclet);
    }

    /** The second plus third terms of the Lindstrom solution, in the cancellation-free form. */
    static double fluxInletCorrection(double depth, double tau, double peclet) {
        double a = 2 * Math.sqrt(tau / peclet);
        double sum = depth + tau;
        double z = sum / a;
        double delta = (depth - tau) / a;
        double gauss = Math.exp(-delta * delta);
        double h = ErrorFunctions.h(z);
        return Math.sqrt(peclet * tau) / SQRT_PI * gauss * (h - (1 - h) / (peclet * sum));
    }
}
