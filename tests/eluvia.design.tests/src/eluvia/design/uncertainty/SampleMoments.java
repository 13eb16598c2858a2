package eluvia.design.uncertainty;

/** Sample moments and their standard errors, written out plainly for the tests. */
final class SampleMoments {
    private SampleMoments() {
    }

    static double mean(double[] values) {
        double sum = 0;
        for (double value : values) {
            sum += value;
        }
        return sum / values.length;
    }

    /** The sample variance, divisor n - 1. */
    static double variance(double[] values) {
        double mean = mean(values);
        double sum = 0;
        for (double value : values) {
            sum += (value - mean) * (value - mean);
        }
        return sum / (values.length - 1);
    }

    /** The fourth central moment, divisor n. */
    static double fourthCentralMoment(double[] values) {
        double mean = mean(values);
        double sum = 0;
        for (double value : values) {
            double d = value - mean;
            sum += d * d * d * d;
        }
        return sum / values.length;
    }

    /** Standard error of the sample mean, s / sqrt(n). */
    static double standardErrorOfMean(double[] values) {
        return Math.sqrt(variance(values) / values.length);
    }

    /**
     * Standard error of the sample variance, sqrt((m4 - s^4) / n), with m4 the sample's fourth
     * central moment (large-sample variance of the sample variance, common result).
     */
    static double standardErrorOfVariance(double[] values) {
        double s2 = variance(values);
        return Math.sqrt((fourthCentralMoment(values) - s2 * s2) / values.length);
    }

    /** Pearson correlation, written out. */
    static double pearson(double[] x, double[] y) {
        double mx = mean(x);
        double my = mean(y);
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }
        return sxy / Math.sqrt(sxx * syy);
    }

    /**
     * Standard error of a Spearman correlation rho over n pairs, (1 - rho^2) sqrt(1.06 / (n - 3))
     * (Fieller, Hartley and Pearson 1957, Biometrika 44:470, through the Fisher z transform;
     * from memory).
     */
    static double standardErrorOfSpearman(double rho, int n) {
        return (1 - rho * rho) * Math.sqrt(1.06 / (n - 3));
    }
}
