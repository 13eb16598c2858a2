package eluvia.design.uncertainty;

/**
 * One uncertain input as the design package lists it. Every value is in {@code unit}.
 *
 * @param name              the input's name
 * @param unit              its unit ({@code "1"} if dimensionless)
 * @param distribution      the distribution in words, e.g. {@code "uniform (minimum 1, maximum 3)"}
 * @param fixed             whether it has no uncertainty
 * @param mean              the distribution's mean
 * @param standardDeviation the distribution's standard deviation
 * @param p10               the 10th percentile (inverse cumulative distribution at 0.1)
 * @param p50               the median
 * @param p90               the 90th percentile
 * @param baseValue         the value in the base case of the tornado (the P50 unless set)
 */
public record InputSummary(String name, String unit, String distribution, boolean fixed, double mean,
        double standardDeviation, double p10, double p50, double p90, double baseValue) {

    /** The summary of {@code input}. */
    public static InputSummary of(UncertainInput input) {
        return new InputSummary(input.name(), input.unit(), input.distribution().describe(), input.isFixed(),
                input.mean(), input.standardDeviation(), input.p10(), input.p50(), input.p90(), input.baseValue());
    }
}
