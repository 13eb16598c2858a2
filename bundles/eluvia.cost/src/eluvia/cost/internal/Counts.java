package eluvia.cost.internal;

/**
 * Rounding of real counts (truckloads, samples, whole years) up to whole numbers.
 *
 * <p>A count such as 120 m3 / 12 m3 per load is computed in floating point and can come out as
 * 10.000000000000002; a plain {@link Math#ceil} would then order an eleventh truck. Values within a
 * relative 1e-9 of a whole number are taken as that whole number before rounding up; 1e-9 is far
 * above the rounding error of the few operations behind any count here and far below any real
 * fraction of a load.
 */
public final class Counts {
    /** Relative distance to a whole number below which a value is taken as that whole number. */
    public static final double WHOLE_NUMBER_TOLERANCE = 1e-9;

    private Counts() {
    }

    /** The smallest whole number not less than {@code value} (after the tolerance above); 0 for 0. */
    public static long roundUp(double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("count must be finite and not negative: " + value);
        }
        double nearest = Math.rint(value);
        if (Math.abs(value - nearest) <= WHOLE_NUMBER_TOLERANCE * Math.max(1.0, value)) {
            return (long) nearest;
        }
        return (long) Math.ceil(value);
    }
}
