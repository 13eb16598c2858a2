package eluvia.transport;

import eluvia.transport.internal.SemiInfiniteForms;

/**
 * Semi-infinite step-input solutions of the one-dimensional advection-dispersion equation with
 * linear equilibrium sorption: R dC/dt = D d2C/dx2 - v dC/dx, C(x, 0) = 0, a step of C0 at the
 * inlet from t = 0. Both return the resident concentration C/C0 (dimensionless).
 *
 * <ul>
 * <li>First-type (concentration) inlet C(0, t) = C0: Ogata and Banks (1961), USGS Prof. Paper 411-A,
 * C/C0 = 1/2 erfc[(R x - v t)/(2 sqrt(D R t))] + 1/2 exp(v x / D) erfc[(R x + v t)/(2 sqrt(D R t))].
 * It is also the flux-averaged concentration of the flux-inlet problem (Parker and van Genuchten 1984).</li>
 * <li>Flux (third-type) inlet v C0 = v C - D dC/dx at x = 0: Lindstrom, Haque, Freed and Boersma
 * (1967), Environ. Sci. Technol. 1:561.</li>
 * </ul>
 *
 * <p>The dimensionless forms take X = x/L, pore volumes T = v t / L and the Peclet number
 * P = v L / D for any reference length L (P may be positive infinity: a sharp front at X = T/R).
 */
public final class SemiInfiniteSolutions {
    private SemiInfiniteSolutions() {
    }

    /**
     * Ogata-Banks first-type inlet, dimensionless.
     *
     * @param relativeDepth X = x / L, 0 or more
     * @param poreVolumes T = v t / L, 0 or more
     * @param peclet P = v L / D, greater than 0 (positive infinity allowed)
     * @param retardation R, 1 or more
     */
    public static double firstTypeInletStep(double relativeDepth, double poreVolumes, double peclet,
            double retardation) {
        check(relativeDepth, poreVolumes, peclet, retardation);
        double tau = poreVolumes / retardation;
        if (Double.isInfinite(peclet)) {
            return sharpFront(relativeDepth, tau, 1);
        }
        return SemiInfiniteForms.firstTypeInletStep(relativeDepth, tau, peclet);
    }

    /**
     * Lindstrom flux inlet, resident concentration, dimensionless.
     *
     * @param relativeDepth X = x / L, 0 or more
     * @param poreVolumes T = v t / L, 0 or more
     * @param peclet P = v L / D, greater than 0 (positive infinity allowed)
     * @param retardation R, 1 or more
     */
    public static double fluxInletStep(double relativeDepth, double poreVolumes, double peclet, double retardation) {
        check(relativeDepth, poreVolumes, peclet, retardation);
        double tau = poreVolumes / retardation;
        if (Double.isInfinite(peclet)) {
            return sharpFront(relativeDepth, tau, 0);
        }
        return SemiInfiniteForms.fluxInletStep(relativeDepth, tau, peclet);
    }

    /**
     * Ogata-Banks first-type inlet in physical units.
     *
     * @param distanceMetres depth below the inlet x, m, 0 or more
     * @param timeDays time since the step t, days, 0 or more
     * @param velocityMetresPerDay pore-water velocity v, m/day, greater than 0
     * @param dispersionSquareMetresPerDay dispersion coefficient D, m2/day, 0 or more
     * @param retardation R, 1 or more
     */
    public static double firstTypeInletStepAt(double distanceMetres, double timeDays, double velocityMetresPerDay,
            double dispersionSquareMetresPerDay, double retardation) {
        double[] d = dimensionless(distanceMetres, timeDays, velocityMetresPerDay, dispersionSquareMetresPerDay);
        return firstTypeInletStep(d[0], d[1], d[2], retardation);
    }

    /**
     * Lindstrom flux inlet in physical units (resident concentration).
     *
     * @param distanceMetres depth below the inlet x, m, 0 or more
     * @param timeDays time since the step t, days, 0 or more
     * @param velocityMetresPerDay pore-water velocity v, m/day, greater than 0
     * @param dispersionSquareMetresPerDay dispersion coefficient D, m2/day, 0 or more
     * @param retardation R, 1 or more
     */
    public static double fluxInletStepAt(double distanceMetres, double timeDays, double velocityMetresPerDay,
            double dispersionSquareMetresPerDay, double retardation) {
        double[] d = dimensionless(distanceMetres, timeDays, velocityMetresPerDay, dispersionSquareMetresPerDay);
        return fluxInletStep(d[0], d[1], d[2], retardation);
    }

    /** X, T, P with the reference length L = 1 m. */
    private static double[] dimensionless(double distanceMetres, double timeDays, double velocityMetresPerDay,
            double dispersionSquareMetresPerDay) {
        TransportInputException.requireNonNegative("distance (m)", distanceMetres);
        TransportInputException.requireNonNegative("time (days)", timeDays);
        TransportInputException.requirePositive("pore-water velocity (m/day)", velocityMetresPerDay);
        TransportInputException.requireNonNegative("dispersion coefficient (m2/day)", dispersionSquareMetresPerDay);
        double referenceMetres = 1;
        double peclet = dispersionSquareMetresPerDay == 0 ? Double.POSITIVE_INFINITY
                : velocityMetresPerDay * referenceMetres / dispersionSquareMetresPerDay;
        return new double[] {distanceMetres / referenceMetres, velocityMetresPerDay * timeDays / referenceMetres,
            peclet};
    }

    private static void check(double relativeDepth, double poreVolumes, double peclet, double retardation) {
        TransportInputException.requireNonNegative("relative depth x/L (-)", relativeDepth);
        TransportInputException.requireNonNegative("pore volumes (-)", poreVolumes);
        if (!(peclet > 0)) {
            throw new TransportInputException("Peclet number (-)", peclet, "greater than 0 (infinite without dispersion)");
        }
        if (!(retardation >= 1) || Double.isInfinite(retardation)) {
            throw new TransportInputException("retardation factor (-)", retardation, "1 or more and finite");
        }
    }

    /**
     * Without dispersion: 1 behind the front (X &lt; tau), 0 ahead of it, 1/2 on it; at the inlet
     * at T = 0 the value the inlet condition imposes ({@code atInletAtStart}).
     */
    private static double sharpFront(double depth, double tau, double atInletAtStart) {
        if (depth < tau) {
            return 1;
        }
        if (depth == tau) {
            return depth == 0 ? atInletAtStart : 0.5;
        }
        return 0;
    }
}
