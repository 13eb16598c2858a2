package eluvia.transport;

/**
 * The region above a threshold of a spreading source ({@link SourceSpreading#extentAbove}).
 *
 * @param dimensions 1, 2 or 3: the number of directions that spread
 * @param timeDays the time, days
 * @param thresholdFraction the C/C0 threshold, dimensionless
 * @param peakFraction the largest C/C0 at that time, dimensionless
 * @param measure length (m), area (m2) or volume (m3) above the threshold, by {@code dimensions}; 0 when the peak is below it
 * @param initialMeasure the same measure of the initial source, m, m2 or m3
 * @param halfExtentXMetres half-extent along x through the centre where C/C0 meets the threshold, m (0 if not spread in x)
 * @param halfExtentYMetres the same along y, m
 * @param halfExtentZMetres the same along z, m
 * @param centreShiftZMetres displacement of the centre along z, v t / R, m
 */
public record SpreadingResult(int dimensions, double timeDays, double thresholdFraction, double peakFraction,
        double measure, double initialMeasure, double halfExtentXMetres, double halfExtentYMetres,
        double halfExtentZMetres, double centreShiftZMetres) {

    /** The measure above the threshold over that of the initial source (dimensionless): above 1 the zone has grown. */
    public double growthFactor() {
        return measure / initialMeasure;
    }
}
