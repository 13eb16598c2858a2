package eluvia.zone;

/**
 * The shape of a variogram model as a function of the scaled lag {@code h} divided by the range
 * {@code a} (both in metres, so the ratio is dimensionless). Each shape rises from 0 at the
 * origin towards 1; the standard forms of Isaaks and Srivastava (1989, An Introduction to Applied
 * Geostatistics, ch. 16) and Journel and Huijbregts (1978, Mining Geostatistics), with the
 * practical range (95 % of the sill) for the two shapes that reach their sill only
 * asymptotically.
 */
public enum VariogramShape {
    /** {@code 1.5 (h/a) - 0.5 (h/a)^3} for {@code h < a}, 1 beyond: reaches the sill at the range. */
    SPHERICAL("spherical"),
    /** {@code 1 - exp(-3 h / a)}: 95 % of the sill at the (practical) range. */
    EXPONENTIAL("exponential"),
    /** {@code 1 - exp(-3 (h / a)^2)}: 95 % of the sill at the (practical) range; smooth at the origin. */
    GAUSSIAN("Gaussian");

    private final String label;

    VariogramShape(String label) {
        this.label = label;
    }

    /**
     * The shape value, dimensionless, between 0 and 1.
     *
     * @param lagOverRange the scaled lag divided by the range, dimensionless, 0 or more
     */
    public double value(double lagOverRange) {
        if (!(lagOverRange >= 0)) {
            throw new ZoneInputException("lag / range (dimensionless)", lagOverRange, "0 or greater");
        }
        switch (this) {
            case SPHERICAL:
                return lagOverRange >= 1 ? 1.0 : lagOverRange * (1.5 - 0.5 * lagOverRange * lagOverRange);
            case EXPONENTIAL:
                return -Math.expm1(-3.0 * lagOverRange);
            default:
                return -Math.expm1(-3.0 * lagOverRange * lagOverRange);
        }
    }

    /** The name for results ("spherical", "exponential", "Gaussian"). */
    public String label() {
        return label;
    }
}
