package eluvia.zone;

import java.util.ArrayList;
import java.util.List;

/**
 * The experimental (sample) variogram of a {@link SampleSet}: for lag classes of equal width,
 * the number of sample pairs and the semivariance {@code gamma(h) = sum (z_i - z_j)^2 / (2 N(h))}
 * (Matheron 1962, Traite de geostatistique appliquee; Isaaks and Srivastava 1989, An Introduction
 * to Applied Geostatistics, ch. 7). It is returned so that the engineer can look at it and choose a
 * {@link VariogramModel} (shape, nugget, sill, range); nothing is fitted automatically.
 *
 * <p>Lags are the vertically scaled distances of {@link SampleSet}, in metres; class {@code m}
 * (from 0) holds the pairs with lag in {@code (m w, (m + 1) w]}. Pairs at lag 0 cannot occur after
 * coincident samples are merged; pairs beyond the last class are left out. Every pair is counted
 * once (n (n - 1) / 2 pairs for n points), so this is for the tens to few thousands of samples a
 * site has.
 *
 * @param lagClasses                 the classes, nearest first
 * @param lagWidthMetres             the class width, scaled m
 * @param direction                  which pairs were used
 * @param sampleVarianceMgPerKgSquared the population variance of the values, (mg/kg)^2, a guide to the sill
 * @param basisDescription           the samples, non-detect rule and vertical scaling
 */
public record ExperimentalVariogram(List<LagClass> lagClasses, double lagWidthMetres, PairDirection direction,
        double sampleVarianceMgPerKgSquared, String basisDescription) {

    /** The largest number of lag classes accepted. */
    public static final int MAX_LAG_CLASSES = 1000;

    /** The largest number of estimation points accepted (all pairs are visited). */
    public static final int MAX_POINTS = 20_000;

    /** Copies the class list. */
    public ExperimentalVariogram {
        lagClasses = List.copyOf(lagClasses);
    }

    /** The omnidirectional experimental variogram. */
    public static ExperimentalVariogram compute(SampleSet samples, double lagWidthMetres, int lagCount) {
        return compute(samples, lagWidthMetres, lagCount, PairDirection.ANY);
    }

    /**
     * Computes the experimental variogram.
     *
     * @param samples        the prepared samples (at least 2 points)
     * @param lagWidthMetres the class width, scaled m, greater than 0
     * @param lagCount       the number of classes, 1 to {@value #MAX_LAG_CLASSES}
     * @param direction      which pairs to use
     */
    public static ExperimentalVariogram compute(SampleSet samples, double lagWidthMetres, int lagCount,
            PairDirection direction) {
        ZoneInputException.requireNonNull("samples", samples);
        ZoneInputException.requireNonNull("pair direction", direction);
        ZoneInputException.requirePositive("variogram lagWidthMetres", lagWidthMetres);
        if (lagCount < 1 || lagCount > MAX_LAG_CLASSES) {
            throw new ZoneInputException("variogram lagCount", lagCount, "1 to " + MAX_LAG_CLASSES);
        }
        int n = samples.size();
        if (n < 2) {
            throw new ZoneInputException("number of distinct sample locations", n,
                    "2 or more for a variogram (coincident samples count once)");
        }
        if (n > MAX_POINTS) {
            throw new ZoneInputException("number of distinct sample locations", n, "at most " + MAX_POINTS
                    + " for an experimental variogram");
        }
        long[] count = new long[lagCount];
        double[] sumLag = new double[lagCount];
        double[] sumSquaredDifference = new double[lagCount];
        double f = samples.verticalDistanceFactor();
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n; b++) {
                double de = samples.eastingMetres(a) - samples.eastingMetres(b);
                double dn = samples.northingMetres(a) - samples.northingMetres(b);
                double horizontal = Math.sqrt(de * de + dn * dn);
                double vertical = f * (samples.midDepthMetres(a) - samples.midDepthMetres(b));
                if (!direction.accepts(horizontal, vertical)) {
                    continue;
                }
                double lag = Math.sqrt(horizontal * horizontal + vertical * vertical);
                int m = (int) Math.ceil(lag / lagWidthMetres) - 1;
                if (m < 0 || m >= lagCount) {
                    continue;
                }
                double diff = samples.valueMgPerKg(a) - samples.valueMgPerKg(b);
                count[m]++;
                sumLag[m] += lag;
                sumSquaredDifference[m] += diff * diff;
            }
        }
        List<LagClass> classes = new ArrayList<>(lagCount);
        for (int m = 0; m < lagCount; m++) {
            boolean empty = count[m] == 0;
            classes.add(new LagClass(m * lagWidthMetres, (m + 1) * lagWidthMetres,
                    empty ? Double.NaN : sumLag[m] / count[m], count[m],
                    empty ? Double.NaN : sumSquaredDifference[m] / (2.0 * count[m])));
        }
        return new ExperimentalVariogram(classes, lagWidthMetres, direction, samples.valueVarianceMgPerKgSquared(),
                samples.description());
    }

    /** The total number of pairs in all classes. */
    public long pairCount() {
        return lagClasses.stream().mapToLong(LagClass::pairCount).sum();
    }
}
