package eluvia.zone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Ordinary kriging against the kriging system built and solved independently in the test: the
 * semivariance (gamma) form of the system, from memory of the standard form (Isaaks and
 * Srivastava 1989, An Introduction to Applied Geostatistics, ch. 12), solved with Commons Math
 * 3.6.1 QRDecomposition (the bundle uses the covariance form and LUDecomposition).
 */
final class OrdinaryKrigingTest {

    private static final double FACTOR = 2.0;

    /** Five samples (easting, northing, depth, value), an invented check case. */
    private static final double[][] FIVE = { { 0, 0, 1, 3 }, { 10, 0, 1, 5 }, { 0, 10, 1, 4 }, { 10, 10, 2, 8 },
            { 5, 5, 3, 6 } };

    private static SampleSet samples(double[][] rows) {
        List<SoilSample> list = new ArrayList<>();
        for (double[] r : rows) {
            list.add(SoilSample.detected(r[0], r[1], r[2], r[2], r[3]));
        }
        return SampleSet.of(list, NonDetectRule.HALF_DETECTION_LIMIT, FACTOR);
    }

    private static double distance(double[] a, double e, double n, double d) {
        double dz = FACTOR * (a[2] - d);
        return Math.sqrt((a[0] - e) * (a[0] - e) + (a[1] - n) * (a[1] - n) + dz * dz);
    }

    /** Solves the gamma-form system; returns {estimate, variance, weights...}. */
    private static double[] referenceKriging(double[][] rows, DoubleUnaryOperator gamma, double e, double n, double d) {
        int m = rows.length;
        double[][] a = new double[m + 1][m + 1];
        double[] b = new double[m + 1];
        for (int r = 0; r < m; r++) {
            for (int c = 0; c < m; c++) {
                a[r][c] = gamma.applyAsDouble(distance(rows[r], rows[c][0], rows[c][1], rows[c][2]));
            }
            a[r][m] = 1;
            a[m][r] = 1;
            b[r] = gamma.applyAsDouble(distance(rows[r], e, n, d));
        }
        b[m] = 1;
        RealVector x = new QRDecomposition(new Array2DRowRealMatrix(a)).getSolver().solve(new ArrayRealVector(b));
        double estimate = 0;
        double variance = x.getEntry(m); // sigma^2 = sum w_i gamma_i0 + mu (gamma form)
        double[] result = new double[m + 2];
        for (int r = 0; r < m; r++) {
            estimate += x.getEntry(r) * rows[r][3];
            variance += x.getEntry(r) * b[r];
            result[r + 2] = x.getEntry(r);
        }
        result[0] = estimate;
        result[1] = variance;
        return result;
    }

    /** Spherical, written out in the test: gamma(0) = 0; c0 + c (1.5 h/a - 0.5 (h/a)^3) below a; c0 + c beyond. */
    private static DoubleUnaryOperator spherical(double nugget, double sill, double range) {
        return h -> h == 0 ? 0 : h >= range ? sill : nugget + (sill - nugget) * (1.5 * h / range - 0.5 * Math.pow(h / range, 3));
    }

    /** Exponential with practical range, written out in the test: c0 + c (1 - exp(-3 h / a)). */
    private static DoubleUnaryOperator exponential(double nugget, double sill, double range) {
        return h -> h == 0 ? 0 : nugget + (sill - nugget) * (1 - Math.exp(-3 * h / range));
    }

    private static void assertMatchesReference(VariogramModel model, DoubleUnaryOperator gamma, double e, double n,
            double d) {
        SampleSet set = samples(FIVE);
        KrigingPointEstimate estimate = new OrdinaryKriging(model, 16, Double.POSITIVE_INFINITY).estimateAt(set, e, n, d);
        double[] reference = referenceKriging(FIVE, gamma, e, n, d);
        double tolerance = 1e-10; // both are direct solves of a 6 x 6 well-conditioned system
        assertEquals(reference[0], estimate.concentrationMgPerKg(), tolerance * 8);
        assertEquals(reference[1], estimate.krigingVarianceMgPerKgSquared(), tolerance * model.sillMgPerKgSquared());
        int[] indices = estimate.sampleIndices();
        double[] weights = estimate.weightsDimensionless();
        double sum = 0;
        for (int m = 0; m < indices.length; m++) {
            assertEquals(reference[2 + indices[m]], weights[m], tolerance);
            sum += weights[m];
        }
        assertEquals(1.0, sum, tolerance); // unbiasedness condition
    }

    @Test
    void fiveSamples_sphericalWithNugget_matchesTheIndependentSystem() {
        assertMatchesReference(new VariogramModel(VariogramShape.SPHERICAL, 0.5, 4.0, 20.0), spherical(0.5, 4.0, 20.0),
                4, 3, 1.5);
    }

    @Test
    void fiveSamples_exponentialWithoutNugget_matchesTheIndependentSystem() {
        assertMatchesReference(new VariogramModel(VariogramShape.EXPONENTIAL, 0.0, 2.5, 15.0), exponential(0.0, 2.5, 15.0),
                7, 8, 2.2);
    }

    @Test
    void fourSamples_sphericalWithShortRange_matchesTheIndependentSystem() {
        double[][] four = { FIVE[0], FIVE[1], FIVE[2], FIVE[3] };
        SampleSet set = samples(four);
        VariogramModel model = new VariogramModel(VariogramShape.SPHERICAL, 0.0, 1.0, 12.0);
        KrigingPointEstimate estimate = new OrdinaryKriging(model, 4, Double.POSITIVE_INFINITY).estimateAt(set, 2, 9, 1);
        double[] reference = referenceKriging(four, spherical(0.0, 1.0, 12.0), 2, 9, 1);
        assertEquals(reference[0], estimate.concentrationMgPerKg(), 1e-10 * 8);
        assertEquals(reference[1], estimate.krigingVarianceMgPerKgSquared(), 1e-10);
    }

    @Test
    void exactAtSamplePoints_withAndWithoutNugget() {
        SampleSet set = samples(FIVE);
        for (VariogramModel model : List.of(new VariogramModel(VariogramShape.SPHERICAL, 0.0, 4.0, 20.0),
                new VariogramModel(VariogramShape.EXPONENTIAL, 0.0, 4.0, 20.0),
                new VariogramModel(VariogramShape.GAUSSIAN, 0.0, 4.0, 8.0),
                new VariogramModel(VariogramShape.SPHERICAL, 1.0, 4.0, 20.0))) {
            OrdinaryKriging kriging = new OrdinaryKriging(model, 16, Double.POSITIVE_INFINITY);
            for (double[] s : FIVE) {
                KrigingPointEstimate at = kriging.estimateAt(set, s[0], s[1], s[2]);
                // exact interpolator with gamma(0) = 0 (from memory, Isaaks and Srivastava 1989 ch. 12)
                assertEquals(s[3], at.concentrationMgPerKg(), 1e-9 * s[3], model.description());
                assertEquals(0.0, at.krigingVarianceMgPerKgSquared(), 1e-9 * model.sillMgPerKgSquared());
            }
        }
    }

    @Test
    void oneNeighbour_varianceIsTwiceTheSemivariance() {
        // hand: one sample, weight 1, mu = C(h) - C(0), so sigma^2 = C(0) - C(h) - mu = 2 gamma(h);
        // spherical nugget 1, sill 5, range 10 at h = 5: gamma = 3.75 (standard form), sigma^2 = 7.5
        SampleSet set = SampleSet.of(List.of(SoilSample.detected(0, 0, 1, 1, 9)), NonDetectRule.ZERO, 1.0);
        OrdinaryKriging kriging = new OrdinaryKriging(new VariogramModel(VariogramShape.SPHERICAL, 1, 5, 10), 16,
                Double.POSITIVE_INFINITY);
        KrigingPointEstimate at = kriging.estimateAt(set, 3, 4, 1);
        assertEquals(9.0, at.concentrationMgPerKg(), 1e-12);
        assertEquals(7.5, at.krigingVarianceMgPerKgSquared(), 1e-12);
        assertEquals(-3.75, at.lagrangeMultiplierMgPerKgSquared(), 1e-12); // hand: C(5) - C(0) = 1.25 - 5
        // beyond the range: 2 x sill
        assertEquals(10.0, kriging.estimateAt(set, 30, 40, 1).krigingVarianceMgPerKgSquared(), 1e-12);
    }

    @Test
    void blockEstimateEqualsPointEstimates_alsoWhereBlocksShareANeighbourSet() {
        Random random = new Random(5);
        List<SoilSample> list = new ArrayList<>();
        for (int s = 0; s < 60; s++) {
            double top = 6 * random.nextDouble();
            list.add(SoilSample.detected(40 * random.nextDouble(), 40 * random.nextDouble(), top, top + 0.5,
                    20 * random.nextDouble()));
        }
        SampleSet set = SampleSet.of(list, NonDetectRule.HALF_DETECTION_LIMIT, 5.0);
        BlockModel model = new BlockModel(0, 0, 0, 4, 4, 1, 10, 10, 6);
        OrdinaryKriging kriging = new OrdinaryKriging(new VariogramModel(VariogramShape.EXPONENTIAL, 2, 30, 25), 8, 40.0);
        BlockEstimate estimate = kriging.estimate(set, model);
        for (int b = 0; b < model.blockCount(); b++) {
            KrigingPointEstimate at = kriging.estimateAt(set, model.centreEastingMetres(model.columnOf(b)),
                    model.centreNorthingMetres(model.rowOf(b)), model.centreDepthMetres(model.layerOf(b)));
            // same system in a different row order: equal to rounding of a 9 x 9 solve
            assertEquals(at.concentrationMgPerKg(), estimate.concentrationMgPerKg(b), 1e-9 * 20);
            assertEquals(at.krigingVarianceMgPerKgSquared(), estimate.krigingVarianceMgPerKgSquared(b), 1e-9 * 30);
        }
        assertTrue(estimate.hasKrigingVariance());
        assertEquals(model.blockCount(), estimate.krigingVariancesMgPerKgSquared().orElseThrow().length);
        assertTrue(estimate.methodDescription().contains("exponential"), estimate.methodDescription());
    }

    @Test
    void noSampleInTheNeighbourhood_givesNoEstimate() {
        SampleSet set = samples(FIVE);
        OrdinaryKriging kriging = new OrdinaryKriging(new VariogramModel(VariogramShape.SPHERICAL, 0, 1, 10), 4, 2.0);
        KrigingPointEstimate far = kriging.estimateAt(set, 100, 100, 1);
        assertTrue(Double.isNaN(far.concentrationMgPerKg()));
        assertEquals(0, far.neighbourCount());
        BlockEstimate estimate = kriging.estimate(set, new BlockModel(90, 90, 0, 1, 1, 1, 2, 2, 2));
        assertEquals(8, estimate.unestimatedBlockCount());
        assertTrue(Double.isNaN(estimate.krigingVarianceMgPerKgSquared(0)));
    }

    private static void assertRejects(String field, String range, Executable executable) {
        ZoneInputException e = assertThrows(ZoneInputException.class, executable);
        assertTrue(e.getMessage().contains(field), e.getMessage());
        assertTrue(e.getMessage().contains(range), e.getMessage());
    }

    @Test
    void singularSystemSaysWhatToChange() {
        // two samples 1e-8 m apart under a Gaussian model without nugget: gamma / sill = 3e-20, which leaves
        // the normalised covariance exactly 1 in double precision: two equal rows, a singular system
        SampleSet set = SampleSet.of(List.of(SoilSample.detected(0, 0, 1, 1, 1), SoilSample.detected(1e-8, 0, 1, 1, 2)),
                NonDetectRule.ZERO, 1.0);
        OrdinaryKriging kriging = new OrdinaryKriging(new VariogramModel(VariogramShape.GAUSSIAN, 0, 1, 100), 16,
                Double.POSITIVE_INFINITY);
        assertRejects("variogram model", "add a small nugget", () -> kriging.estimateAt(set, 2, 2, 1));
        assertRejects("variogram model", "add a small nugget",
                () -> kriging.estimate(set, new BlockModel(0, 0, 0, 1, 1, 1, 2, 2, 2)));
    }

    @Test
    void badInputsNameTheField() {
        VariogramModel model = new VariogramModel(VariogramShape.SPHERICAL, 0, 1, 10);
        assertRejects("variogram model", "not null", () -> new OrdinaryKriging(null, 4, 10));
        assertRejects("kriging maxNeighbours", "1 to 200", () -> new OrdinaryKriging(model, 0, 10));
        assertRejects("kriging maxNeighbours", "1 to 200", () -> new OrdinaryKriging(model, 201, 10));
        assertRejects("kriging searchRadiusMetres", "greater than 0", () -> new OrdinaryKriging(model, 4, 0));
        assertRejects("kriging searchRadiusMetres", "greater than 0", () -> new OrdinaryKriging(model, 4, Double.NaN));
        OrdinaryKriging kriging = new OrdinaryKriging(model, 4, 10);
        SampleSet set = samples(FIVE);
        assertRejects("samples", "not null", () -> kriging.estimate(null, new BlockModel(0, 0, 0, 1, 1, 1, 1, 1, 1)));
        assertRejects("blockModel", "not null", () -> kriging.estimate(set, null));
        assertRejects("samples", "not null", () -> kriging.estimateAt(null, 0, 0, 0));
        assertRejects("eastingMetres", "finite", () -> kriging.estimateAt(set, Double.NaN, 0, 0));
        assertRejects("northingMetres", "finite", () -> kriging.estimateAt(set, 0, Double.POSITIVE_INFINITY, 0));
        assertRejects("depthMetres", "finite", () -> kriging.estimateAt(set, 0, 0, Double.NaN));
    }
}
