package eluvia.design.uncertainty;

import org.apache.commons.math3.stat.descriptive.moment.Mean;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.apache.commons.math3.stat.descriptive.rank.Percentile.EstimationType;

/**
 * The distribution of one output over the completed Monte Carlo runs. Every value is in
 * {@code unit}; all are NaN when no run completed.
 *
 * <p>Percentiles follow {@link #PERCENTILE_DEFINITION}; the standard deviation is the sample
 * standard deviation (divisor n - 1).
 *
 * @param name              the output's name
 * @param unit              its unit
 * @param sampleCount       the number of completed runs the statistics are over
 * @param mean              the sample mean
 * @param standardDeviation the sample standard deviation
 * @param p10               the 10th percentile
 * @param p50               the median
 * @param p90               the 90th percentile
 * @param min               the smallest value
 * @param max               the largest value
 * @param histogram         the histogram from min to max
 */
public record OutputStatistics(String name, String unit, int sampleCount, double mean, double standardDeviation,
        double p10, double p50, double p90, double min, double max, Histogram histogram) {

    /**
     * How percentiles are estimated: Commons Math 3.6.1 {@code Percentile} with
     * {@code EstimationType.R_7}, i.e. for probability p and n sorted values x(1) .. x(n), the
     * position h = (n - 1) p + 1 and linear interpolation between x(floor h) and x(floor h + 1)
     * (definition 7 of Hyndman and Fan 1996, The American Statistician 50:361; the default of R and
     * of the spreadsheet function PERCENTILE.INC).
     */
    public static final String PERCENTILE_DEFINITION = "Hyndman-Fan definition 7 (Commons Math Percentile R_7):"
            + " h = (n - 1) p + 1, linear interpolation between the order statistics around h";

    /** The estimation type of {@link #PERCENTILE_DEFINITION}. */
    static final EstimationType ESTIMATION_TYPE = EstimationType.R_7;

    static OutputStatistics of(String name, String unit, double[] values, int bins) {
        if (values.length == 0) {
            return new OutputStatistics(name, unit, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, Histogram.of(values, Double.NaN, Double.NaN, bins));
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double value : values) {
            min = Math.min(min, value);
            max = Math.max(max, value);
        }
        Percentile percentile = new Percentile().withEstimationType(ESTIMATION_TYPE);
        percentile.setData(values);
        double standardDeviation = values.length > 1 ? new StandardDeviation(true).evaluate(values) : Double.NaN;
        return new OutputStatistics(name, unit, values.length, new Mean().evaluate(values), standardDeviation,
                percentile.evaluate(10), percentile.evaluate(50), percentile.evaluate(90), min, max,
                Histogram.of(values, min, max, bins));
    }
}
