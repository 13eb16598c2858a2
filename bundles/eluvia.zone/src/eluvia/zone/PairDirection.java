package eluvia.zone;

/**
 * Which sample pairs enter an experimental variogram, by the dip of the (vertically scaled)
 * separation vector below the horizontal plane, with the usual angular tolerance of 22.5 degrees
 * (common practice). Comparing the near-horizontal and near-vertical variograms computed with a
 * vertical distance factor of 1 shows the ratio of ranges, which is the factor to use.
 */
public enum PairDirection {
    /** Every pair (omnidirectional). */
    ANY("all directions"),
    /** Pairs whose separation dips at most 22.5 degrees from horizontal. */
    NEAR_HORIZONTAL("near-horizontal pairs (dip up to 22.5 degrees)"),
    /** Pairs whose separation dips at least 67.5 degrees from horizontal. */
    NEAR_VERTICAL("near-vertical pairs (dip 67.5 degrees or more)");

    /** The angular tolerance, degrees. */
    public static final double TOLERANCE_DEGREES = 22.5;

    private final String description;

    PairDirection(String description) {
        this.description = description;
    }

    /**
     * Whether a pair with the given separation belongs to this direction class.
     *
     * @param horizontalMetres    the horizontal separation, m, 0 or more
     * @param scaledVerticalMetres the vertical separation times the vertical distance factor, m
     */
    public boolean accepts(double horizontalMetres, double scaledVerticalMetres) {
        double dipDegrees = Math.toDegrees(Math.atan2(Math.abs(scaledVerticalMetres), horizontalMetres));
        switch (this) {
            case NEAR_HORIZONTAL:
                return dipDegrees <= TOLERANCE_DEGREES;
            case NEAR_VERTICAL:
                return dipDegrees >= 90.0 - TOLERANCE_DEGREES;
            default:
                return true;
        }
    }

    /** Words for results. */
    public String description() {
        return description;
    }
}
