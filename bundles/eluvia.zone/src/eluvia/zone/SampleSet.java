package eluvia.zone;

import eluvia.zone.internal.KdTree;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Soil samples of one contaminant made ready for estimation: each sample becomes a point at the
 * midpoint of its depth interval with one concentration, non-detects replaced by the caller's
 * {@link NonDetectRule}, and distances measured with a vertical scaling.
 *
 * <h2>Vertical scaling (anisotropy)</h2>
 * Soil samples are dense down a boring and sparse between borings, and concentrations usually
 * vary much faster with depth than across the site. Every distance used by the estimators, the
 * search radius and the variogram is therefore the scaled distance
 * {@code h = sqrt(dE^2 + dN^2 + (f dDepth)^2)} in metres, where {@code f} is the dimensionless
 * {@linkplain #verticalDistanceFactor() vertical distance factor}: a vertical separation of 1 m
 * counts like a horizontal one of {@code f} metres (geometric anisotropy with the horizontal plane
 * as the plane of greatest continuity; Isaaks and Srivastava 1989, An Introduction to Applied
 * Geostatistics, ch. 16). The factor is the ratio of horizontal to vertical range of correlation.
 * The default, {@value #DEFAULT_VERTICAL_DISTANCE_FACTOR}, is a stated judgement (from memory:
 * horizontal ranges of layered soils are commonly several to some tens of times the vertical
 * ones), not a published constant: set it from directional experimental variograms
 * ({@link ExperimentalVariogram}) where the data allow. A factor of 1 is isotropic.
 *
 * <h2>Coincident samples</h2>
 * Samples whose midpoints coincide exactly (field duplicates, or the same interval entered
 * twice) are merged into one point at their mean value, because two points at one place make
 * the kriging system singular; {@link #mergedSampleCount()} reports how many were folded in.
 */
public final class SampleSet {

    /** The default vertical distance factor (dimensionless): a stated judgement, see the class comment. */
    public static final double DEFAULT_VERTICAL_DISTANCE_FACTOR = 10.0;

    /** The largest vertical distance factor accepted (dimensionless). */
    public static final double MAX_VERTICAL_DISTANCE_FACTOR = 1000.0;

    private final double[] eastingMetres;
    private final double[] northingMetres;
    private final double[] midDepthMetres;
    private final double[] valueMgPerKg;
    private final double verticalDistanceFactor;
    private final NonDetectRule nonDetectRule;
    private final int inputSampleCount;
    private final int nonDetectCount;
    private final int mergedSampleCount;
    private final KdTree tree;

    private SampleSet(List<double[]> points, double verticalDistanceFactor, NonDetectRule rule, int inputCount,
            int nonDetectCount) {
        int n = points.size();
        eastingMetres = new double[n];
        northingMetres = new double[n];
        midDepthMetres = new double[n];
        valueMgPerKg = new double[n];
        double[] scaledDepth = new double[n];
        for (int p = 0; p < n; p++) {
            double[] point = points.get(p);
            eastingMetres[p] = point[0];
            northingMetres[p] = point[1];
            midDepthMetres[p] = point[2];
            valueMgPerKg[p] = point[3];
            scaledDepth[p] = verticalDistanceFactor * point[2];
        }
        this.verticalDistanceFactor = verticalDistanceFactor;
        this.nonDetectRule = rule;
        this.inputSampleCount = inputCount;
        this.nonDetectCount = nonDetectCount;
        this.mergedSampleCount = inputCount - n;
        this.tree = new KdTree(eastingMetres, northingMetres, scaledDepth);
    }

    /** Samples with the {@linkplain #DEFAULT_VERTICAL_DISTANCE_FACTOR default vertical distance factor}. */
    public static SampleSet of(List<SoilSample> samples, NonDetectRule nonDetectRule) {
        return of(samples, nonDetectRule, DEFAULT_VERTICAL_DISTANCE_FACTOR);
    }

    /**
     * Prepares samples for estimation.
     *
     * @param samples                the samples of one contaminant, at least one
     * @param nonDetectRule          how non-detects enter the estimation
     * @param verticalDistanceFactor dimensionless ratio of horizontal to vertical range, greater
     *                               than 0 and at most {@value #MAX_VERTICAL_DISTANCE_FACTOR}
     *                               (below 1 means more continuity down than across, unusual in soil)
     */
    public static SampleSet of(List<SoilSample> samples, NonDetectRule nonDetectRule, double verticalDistanceFactor) {
        ZoneInputException.requireNonNull("samples", samples);
        ZoneInputException.requireNonNull("nonDetectRule", nonDetectRule);
        if (samples.isEmpty()) {
            throw new ZoneInputException("number of samples", 0, "1 or more");
        }
        if (!(verticalDistanceFactor > 0 && verticalDistanceFactor <= MAX_VERTICAL_DISTANCE_FACTOR)) {
            throw new ZoneInputException("verticalDistanceFactor (dimensionless)", verticalDistanceFactor,
                    "greater than 0 and at most " + MAX_VERTICAL_DISTANCE_FACTOR
                            + " (1 is isotropic); it is the horizontal range divided by the vertical range");
        }
        Map<List<Double>, double[]> merged = new LinkedHashMap<>();
        int nonDetects = 0;
        for (int s = 0; s < samples.size(); s++) {
            SoilSample sample = samples.get(s);
            if (sample == null) {
                throw new ZoneInputException("sample " + s, null, "must be given (not null)");
            }
            if (sample.nonDetect()) {
                nonDetects++;
            }
            double value = sample.valueMgPerKg(nonDetectRule);
            // + 0.0 turns -0.0 into 0.0, which Double.equals would otherwise tell apart
            List<Double> key = List.of(sample.eastingMetres() + 0.0, sample.northingMetres() + 0.0,
                    sample.midDepthMetres() + 0.0);
            // point[4] counts the samples merged into the point, point[3] holds their running sum
            double[] point = merged.computeIfAbsent(key,
                    k -> new double[] { sample.eastingMetres(), sample.northingMetres(), sample.midDepthMetres(), 0, 0 });
            point[3] += value;
            point[4] += 1;
        }
        List<double[]> points = new ArrayList<>(merged.size());
        for (double[] point : merged.values()) {
            point[3] /= point[4];
            points.add(point);
        }
        return new SampleSet(points, verticalDistanceFactor, nonDetectRule, samples.size(), nonDetects);
    }

    /** The number of estimation points (samples after merging coincident ones). */
    public int size() {
        return valueMgPerKg.length;
    }

    /** Easting of point {@code p}, m. */
    public double eastingMetres(int p) {
        return eastingMetres[p];
    }

    /** Northing of point {@code p}, m. */
    public double northingMetres(int p) {
        return northingMetres[p];
    }

    /** Depth of point {@code p} (midpoint of its sample interval) below ground, m. */
    public double midDepthMetres(int p) {
        return midDepthMetres[p];
    }

    /** Concentration of point {@code p} used in the estimation, mg/kg (after the non-detect rule and merging). */
    public double valueMgPerKg(int p) {
        return valueMgPerKg[p];
    }

    /** The vertical distance factor (dimensionless), see the class comment. */
    public double verticalDistanceFactor() {
        return verticalDistanceFactor;
    }

    /** The rule applied to non-detects. */
    public NonDetectRule nonDetectRule() {
        return nonDetectRule;
    }

    /** The number of samples given, before merging. */
    public int inputSampleCount() {
        return inputSampleCount;
    }

    /** The number of non-detects among the samples given. */
    public int nonDetectCount() {
        return nonDetectCount;
    }

    /** The number of samples folded into another at the same midpoint. */
    public int mergedSampleCount() {
        return mergedSampleCount;
    }

    /** The scaled distance between points {@code a} and {@code b}, m (see the class comment). */
    public double scaledDistanceMetres(int a, int b) {
        return scaledDistanceMetres(a, eastingMetres[b], northingMetres[b], midDepthMetres[b]);
    }

    /** The scaled distance from point {@code p} to a location, m (see the class comment). */
    public double scaledDistanceMetres(int p, double eastingMetres, double northingMetres, double depthMetres) {
        double de = this.eastingMetres[p] - eastingMetres;
        double dn = this.northingMetres[p] - northingMetres;
        double dz = verticalDistanceFactor * (midDepthMetres[p] - depthMetres);
        return Math.sqrt(de * de + dn * dn + dz * dz);
    }

    /** The population variance of the point values, (mg/kg)^2: a first guide to a variogram's sill. */
    public double valueVarianceMgPerKgSquared() {
        double mean = 0;
        for (double v : valueMgPerKg) {
            mean += v;
        }
        mean /= valueMgPerKg.length;
        double sum = 0;
        for (double v : valueMgPerKg) {
            sum += (v - mean) * (v - mean);
        }
        return sum / valueMgPerKg.length;
    }

    /** One line for a results table: counts, the non-detect rule and the vertical scaling. */
    public String description() {
        return inputSampleCount + " samples (" + nonDetectCount + " non-detects set to " + nonDetectRule.description()
                + "; " + mergedSampleCount + " merged with a coincident sample), vertical distances scaled by "
                + verticalDistanceFactor;
    }

    /** The search tree over the scaled coordinates (easting, northing, f x depth). */
    KdTree tree() {
        return tree;
    }
}
