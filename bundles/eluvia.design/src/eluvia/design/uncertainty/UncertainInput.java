package eluvia.design.uncertainty;

import java.util.Objects;

import org.apache.commons.math3.distribution.RealDistribution;

/**
 * One uncertain input of a model: a name, the unit its values are in, and its probability
 * distribution ({@link InputDistribution}: fixed, normal, lognormal, uniform or triangular, on
 * Apache Commons Math 3.6.1 distributions).
 *
 * <p>The lognormal distribution can be given either as median and geometric standard deviation
 * ({@link #lognormal}) or as arithmetic mean and standard deviation
 * ({@link #lognormalFromMeanAndStandardDeviation}); the second is converted exactly to the first
 * (see {@link InputDistribution.LogNormal}).
 *
 * <p>The quantiles {@link #p10()}, {@link #p50()} and {@link #p90()} are the inverse cumulative
 * distribution at 0.1, 0.5 and 0.9 (P10 is the value not exceeded with probability 0.1). The
 * tornado puts one input at its P10 and its P90 while the others stay at their base value, which
 * is the P50 unless {@link #withBaseValue(double)} sets another (e.g. the deterministic design
 * value). Instances are immutable and safe to share between threads.
 */
public final class UncertainInput {
    private final String name;
    private final String unit;
    private final InputDistribution distribution;
    private final double baseValue;
    private final boolean explicitBaseValue;
    private final RealDistribution realDistribution;

    private UncertainInput(String name, String unit, InputDistribution distribution, double baseValue,
            boolean explicitBaseValue) {
        this.name = name;
        this.unit = unit;
        this.distribution = distribution;
        this.realDistribution = distribution.toRealDistribution();
        this.explicitBaseValue = explicitBaseValue;
        this.baseValue = explicitBaseValue ? baseValue : realDistribution.inverseCumulativeProbability(0.5);
    }

    /**
     * An input with the given distribution.
     *
     * @param name         a unique, non-blank name within a study
     * @param unit         the unit of the input's values and of the distribution's parameters, e.g.
     *                     {@code "m/d"}; {@code "1"} for a dimensionless input
     * @param distribution the distribution
     */
    public static UncertainInput of(String name, String unit, InputDistribution distribution) {
        UncertaintyInputException.requireName("name of an uncertain input", name);
        if (unit == null || unit.isBlank()) {
            throw new UncertaintyInputException("unit of input '" + name + "'", unit == null ? null : "\"" + unit + "\"",
                    "a non-blank unit, e.g. \"m/d\"; write \"1\" for a dimensionless input");
        }
        UncertaintyInputException.requireNonNull("distribution of input '" + name + "'", distribution);
        return new UncertainInput(name, unit, distribution, Double.NaN, false);
    }

    /** An input without uncertainty; {@code value} in {@code unit}. */
    public static UncertainInput fixed(String name, String unit, double value) {
        return of(name, unit, checked(name, () -> new InputDistribution.Fixed(value)));
    }

    /** A normal input; {@code mean} and {@code standardDeviation} (greater than 0) in {@code unit}. */
    public static UncertainInput normal(String name, String unit, double mean, double standardDeviation) {
        return of(name, unit, checked(name, () -> new InputDistribution.Normal(mean, standardDeviation)));
    }

    /**
     * A lognormal input from its median (greater than 0, in {@code unit}) and geometric standard
     * deviation (dimensionless, greater than 1).
     */
    public static UncertainInput lognormal(String name, String unit, double median,
            double geometricStandardDeviation) {
        return of(name, unit, checked(name, () -> new InputDistribution.LogNormal(median, geometricStandardDeviation)));
    }

    /**
     * A lognormal input from its arithmetic mean and standard deviation (both greater than 0, in
     * {@code unit}), converted exactly to median and geometric standard deviation.
     */
    public static UncertainInput lognormalFromMeanAndStandardDeviation(String name, String unit, double mean,
            double standardDeviation) {
        return of(name, unit,
                checked(name, () -> InputDistribution.LogNormal.fromMeanAndStandardDeviation(mean, standardDeviation)));
    }

    /** A uniform input on [min, max] (max greater than min), in {@code unit}. */
    public static UncertainInput uniform(String name, String unit, double min, double max) {
        return of(name, unit, checked(name, () -> new InputDistribution.Uniform(min, max)));
    }

    /** A triangular input (min below max, mode from min to max), in {@code unit}. */
    public static UncertainInput triangular(String name, String unit, double min, double mode, double max) {
        return of(name, unit, checked(name, () -> new InputDistribution.Triangular(min, mode, max)));
    }

    private interface DistributionMaker {
        InputDistribution make();
    }

    /** Makes the distribution, naming the input in any message about its parameters. */
    private static InputDistribution checked(String name, DistributionMaker maker) {
        UncertaintyInputException.requireName("name of an uncertain input", name);
        try {
            return maker.make();
        } catch (UncertaintyInputException e) {
            throw e.in("input '" + name + "'");
        }
    }

    /**
     * The same input with another base value (the value it takes in the base case of the tornado
     * while another input moves); within the distribution's range, in the input's unit.
     */
    public UncertainInput withBaseValue(double value) {
        if (!Double.isFinite(value) || value < distribution.lowerBound() || value > distribution.upperBound()
                || (distribution instanceof InputDistribution.LogNormal && value <= 0)) {
            throw new UncertaintyInputException("base value of input '" + name + "'", value,
                    "a finite value within the range of its distribution, " + distribution.lowerBound()
                            + " to " + distribution.upperBound() + " " + unit);
        }
        return new UncertainInput(name, unit, distribution, value, true);
    }

    /** The name, unique within a study. */
    public String name() {
        return name;
    }

    /** The unit of the values and of the distribution's parameters; {@code "1"} if dimensionless. */
    public String unit() {
        return unit;
    }

    /** The distribution. */
    public InputDistribution distribution() {
        return distribution;
    }

    /** Whether the input has no uncertainty. */
    public boolean isFixed() {
        return distribution.isFixed();
    }

    /**
     * The quantile: the value not exceeded with the given probability (the inverse cumulative
     * distribution), in the input's unit.
     *
     * @param probability dimensionless, from 0 to 1
     */
    public double quantile(double probability) {
        if (!(probability >= 0 && probability <= 1)) {
            throw new UncertaintyInputException("probability for a quantile of input '" + name + "'",
                    probability, "from 0 to 1");
        }
        return realDistribution.inverseCumulativeProbability(probability);
    }

    /** The cumulative distribution at {@code value} (in the input's unit); dimensionless. */
    public double cumulativeProbability(double value) {
        return realDistribution.cumulativeProbability(value);
    }

    /** The 10th percentile (low value of the tornado), in the input's unit. */
    public double p10() {
        return quantile(0.1);
    }

    /** The median, in the input's unit. */
    public double p50() {
        return quantile(0.5);
    }

    /** The 90th percentile (high value of the tornado), in the input's unit. */
    public double p90() {
        return quantile(0.9);
    }

    /** The base value (the P50 unless set), in the input's unit. */
    public double baseValue() {
        return baseValue;
    }

    /** Whether the base value was set with {@link #withBaseValue(double)} rather than taken as the P50. */
    public boolean hasExplicitBaseValue() {
        return explicitBaseValue;
    }

    /** The mean of the distribution, in the input's unit. */
    public double mean() {
        return realDistribution.getNumericalMean();
    }

    /** The standard deviation of the distribution, in the input's unit. */
    public double standardDeviation() {
        return Math.sqrt(realDistribution.getNumericalVariance());
    }

    /** The input's value for a uniform number {@code u} in (0, 1): the sampling transform. */
    double valueAt(double u) {
        return realDistribution.inverseCumulativeProbability(u);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof UncertainInput that && name.equals(that.name) && unit.equals(that.unit)
                && distribution.equals(that.distribution) && explicitBaseValue == that.explicitBaseValue
                && Double.compare(baseValue, that.baseValue) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, unit, distribution, baseValue);
    }

    @Override
    public String toString() {
        return name + " [" + unit + "]: " + distribution.describe()
                + (explicitBaseValue ? ", base value " + baseValue : "");
    }
}
