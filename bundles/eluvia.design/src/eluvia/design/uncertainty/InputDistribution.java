package eluvia.design.uncertainty;

import java.math.BigDecimal;
import java.math.MathContext;

import org.apache.commons.math3.distribution.ConstantRealDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.RealDistribution;
import org.apache.commons.math3.distribution.TriangularDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;

/**
 * The probability distribution of one uncertain input. Every location and scale parameter
 * (value, mean, standard deviation, median, minimum, mode, maximum) is in the unit of the
 * {@link UncertainInput} the distribution belongs to; the geometric standard deviation of the
 * lognormal distribution is dimensionless.
 *
 * <p>Each kind is a record that checks its parameters when it is made and maps onto an Apache
 * Commons Math 3.6.1 distribution ({@link #toRealDistribution()}), which supplies the cumulative
 * distribution function, its inverse (the quantiles used for sampling and for the P10 / P50 / P90
 * of the tornado) and the closed-form mean and variance.
 */
public sealed interface InputDistribution
        permits InputDistribution.Fixed, InputDistribution.Normal, InputDistribution.LogNormal,
        InputDistribution.Uniform, InputDistribution.Triangular {

    /**
     * The Commons Math 3.6.1 distribution with these parameters, without a random generator
     * attached (the engine draws its own uniforms and uses the inverse cumulative distribution).
     */
    RealDistribution toRealDistribution();

    /** Whether the input has no uncertainty (a single value). */
    boolean isFixed();

    /** The lowest value the input can take, in the input's unit (may be minus infinity). */
    double lowerBound();

    /** The highest value the input can take, in the input's unit (may be plus infinity). */
    double upperBound();

    /** A short description for reports, e.g. {@code "normal (mean 0.3, standard deviation 0.05)"}. */
    String describe();

    /** A value without uncertainty. */
    record Fixed(double value) implements InputDistribution {
        /** @param value the value, in the input's unit; finite */
        public Fixed {
            UncertaintyInputException.requireFinite("fixed value", value);
        }

        @Override
        public RealDistribution toRealDistribution() {
            return new ConstantRealDistribution(value);
        }

        @Override
        public boolean isFixed() {
            return true;
        }

        @Override
        public double lowerBound() {
            return value;
        }

        @Override
        public double upperBound() {
            return value;
        }

        @Override
        public String describe() {
            return "fixed " + format(value);
        }
    }

    /** The normal (Gaussian) distribution. */
    record Normal(double mean, double standardDeviation) implements InputDistribution {
        /**
         * @param mean              the mean, in the input's unit; finite
         * @param standardDeviation the standard deviation, in the input's unit; greater than 0
         */
        public Normal {
            UncertaintyInputException.requireFinite("mean", mean);
            if (!(standardDeviation > 0) || Double.isInfinite(standardDeviation)) {
                throw new UncertaintyInputException("standard deviation", standardDeviation,
                        "greater than 0 and finite (for a value without uncertainty use a fixed input)");
            }
        }

        @Override
        public RealDistribution toRealDistribution() {
            return new NormalDistribution(null, mean, standardDeviation);
        }

        @Override
        public boolean isFixed() {
            return false;
        }

        @Override
        public double lowerBound() {
            return Double.NEGATIVE_INFINITY;
        }

        @Override
        public double upperBound() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public String describe() {
            return "normal (mean " + format(mean) + ", standard deviation " + format(standardDeviation) + ")";
        }
    }

    /**
     * The lognormal distribution: ln X is normal with mean ln(median) and standard deviation
     * ln(geometric standard deviation). It is stored as median and geometric standard deviation;
     * {@link #fromMeanAndStandardDeviation(double, double)} converts an arithmetic mean m and
     * standard deviation s exactly: sigma^2 = ln(1 + s^2/m^2), median = m / sqrt(1 + s^2/m^2),
     * geometric standard deviation = exp(sigma) (from the moments of the lognormal distribution,
     * E[X] = median exp(sigma^2 / 2) and Var[X] = E[X]^2 (exp(sigma^2) - 1), a common result).
     */
    record LogNormal(double median, double geometricStandardDeviation) implements InputDistribution {
        /**
         * @param median                    the median, in the input's unit; greater than 0
         * @param geometricStandardDeviation exp of the standard deviation of ln X; dimensionless,
         *                                   greater than 1
         */
        public LogNormal {
            if (!(median > 0) || Double.isInfinite(median)) {
                throw new UncertaintyInputException("median", median,
                        "greater than 0 and finite (a lognormal quantity is positive)");
            }
            if (!(geometricStandardDeviation > 1) || Double.isInfinite(geometricStandardDeviation)) {
                throw new UncertaintyInputException("geometric standard deviation (dimensionless)",
                        geometricStandardDeviation,
                        "greater than 1 and finite (1 means no uncertainty: use a fixed input)");
            }
        }

        /**
         * The lognormal distribution with the given arithmetic mean and standard deviation.
         *
         * @param mean              the arithmetic mean, in the input's unit; greater than 0
         * @param standardDeviation the arithmetic standard deviation, in the input's unit; greater than 0
         */
        public static LogNormal fromMeanAndStandardDeviation(double mean, double standardDeviation) {
            if (!(mean > 0) || Double.isInfinite(mean)) {
                throw new UncertaintyInputException("mean", mean,
                        "greater than 0 and finite (a lognormal quantity is positive)");
            }
            if (!(standardDeviation > 0) || Double.isInfinite(standardDeviation)) {
                throw new UncertaintyInputException("standard deviation", standardDeviation,
                        "greater than 0 and finite (for a value without uncertainty use a fixed input)");
            }
            double cv = standardDeviation / mean;
            double onePlusCvSquared = 1 + cv * cv;
            double sigma = Math.sqrt(Math.log1p(cv * cv));
            return new LogNormal(mean / Math.sqrt(onePlusCvSquared), Math.exp(sigma));
        }

        /** ln(median): the mean of ln X (Commons Math's "scale"), ln of a value in the input's unit. */
        public double logMedian() {
            return Math.log(median);
        }

        /** ln(geometric standard deviation): the standard deviation of ln X (Commons Math's "shape"); dimensionless. */
        public double logStandardDeviation() {
            return Math.log(geometricStandardDeviation);
        }

        /** The arithmetic mean, median exp(sigma^2 / 2), in the input's unit. */
        public double mean() {
            double sigma = logStandardDeviation();
            return median * Math.exp(0.5 * sigma * sigma);
        }

        /** The arithmetic standard deviation, mean sqrt(exp(sigma^2) - 1), in the input's unit. */
        public double standardDeviation() {
            double sigma = logStandardDeviation();
            return mean() * Math.sqrt(Math.expm1(sigma * sigma));
        }

        @Override
        public RealDistribution toRealDistribution() {
            return new ExactQuantileLogNormal(logMedian(), logStandardDeviation());
        }

        @Override
        public boolean isFixed() {
            return false;
        }

        @Override
        public double lowerBound() {
            return 0;
        }

        @Override
        public double upperBound() {
            return Double.POSITIVE_INFINITY;
        }

        @Override
        public String describe() {
            return "lognormal (median " + format(median) + ", geometric standard deviation "
                    + format(geometricStandardDeviation) + "; mean " + format(mean())
                    + ", standard deviation " + format(standardDeviation()) + ")";
        }
    }

    /** The uniform distribution on [min, max]. */
    record Uniform(double min, double max) implements InputDistribution {
        /**
         * @param min the lower end, in the input's unit; finite
         * @param max the upper end, in the input's unit; finite and greater than min
         */
        public Uniform {
            UncertaintyInputException.requireFinite("minimum", min);
            UncertaintyInputException.requireFinite("maximum", max);
            if (!(max > min)) {
                throw new UncertaintyInputException("maximum", max, "greater than the minimum " + min
                        + " (for a value without uncertainty use a fixed input)");
            }
        }

        @Override
        public RealDistribution toRealDistribution() {
            return new UniformRealDistribution(null, min, max);
        }

        @Override
        public boolean isFixed() {
            return false;
        }

        @Override
        public double lowerBound() {
            return min;
        }

        @Override
        public double upperBound() {
            return max;
        }

        @Override
        public String describe() {
            return "uniform (minimum " + format(min) + ", maximum " + format(max) + ")";
        }
    }

    /** The triangular distribution with lower end min, peak at mode and upper end max. */
    record Triangular(double min, double mode, double max) implements InputDistribution {
        /**
         * @param min  the lower end, in the input's unit; finite
         * @param mode the most likely value, in the input's unit; from min to max
         * @param max  the upper end, in the input's unit; finite and greater than min
         */
        public Triangular {
            UncertaintyInputException.requireFinite("minimum", min);
            UncertaintyInputException.requireFinite("mode", mode);
            UncertaintyInputException.requireFinite("maximum", max);
            if (!(max > min)) {
                throw new UncertaintyInputException("maximum", max, "greater than the minimum " + min
                        + " (for a value without uncertainty use a fixed input)");
            }
            if (mode < min || mode > max) {
                throw new UncertaintyInputException("mode", mode, "from the minimum " + min
                        + " to the maximum " + max);
            }
        }

        @Override
        public RealDistribution toRealDistribution() {
            return new TriangularDistribution(null, min, mode, max);
        }

        @Override
        public boolean isFixed() {
            return false;
        }

        @Override
        public double lowerBound() {
            return min;
        }

        @Override
        public double upperBound() {
            return max;
        }

        @Override
        public String describe() {
            return "triangular (minimum " + format(min) + ", mode " + format(mode) + ", maximum "
                    + format(max) + ")";
        }
    }

    /** Six significant digits without trailing zeros, for descriptions. */
    private static String format(double value) {
        if (value == 0 || !Double.isFinite(value)) {
            return Double.toString(value);
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros();
        int exponent = rounded.precision() - rounded.scale() - 1;
        return exponent < -4 || exponent > 9 ? rounded.toString() : rounded.toPlainString();
    }
}
