package eluvia.zone;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Inverse-distance weighting against hand calculations (shown beside each check). */
final class InverseDistanceWeightingTest {

    /** Relative accuracy: the sums are a handful of double operations. */
    private static final double TOLERANCE = 1e-12;

    /** A (0, 0, 1 m) = 10, B (4, 0, 1 m) = 20, C (0, 0, 3 m) = 30 mg/kg (midpoints of 0.5 m intervals). */
    private static SampleSet threeSamples(double verticalFactor) {
        return SampleSet.of(List.of(SoilSample.detected(0, 0, 0.75, 1.25, 10), SoilSample.detected(4, 0, 0.75, 1.25, 20),
                SoilSample.detected(0, 0, 2.75, 3.25, 30)), NonDetectRule.HALF_DETECTION_LIMIT, verticalFactor);
    }

    @Test
    void twoSamples_powerTwo() {
        SampleSet samples = SampleSet.of(List.of(SoilSample.detected(0, 0, 1, 1, 10), SoilSample.detected(6, 8, 1, 1, 40)),
                NonDetectRule.ZERO, 1.0);
        // hand: at (0, 5, 1 m) the distances are 5 and sqrt(36 + 9) = sqrt(45);
        // (10/25 + 40/45) / (1/25 + 1/45) = (450 + 1000) / 70 = 145/7
        assertEquals(145.0 / 7.0, InverseDistanceWeighting.withDefaults().estimateAtMgPerKg(samples, 0, 5, 1),
                TOLERANCE * 145.0 / 7.0);
    }

    @Test
    void threeSamples_withVerticalScaling() {
        InverseDistanceWeighting idw = new InverseDistanceWeighting(2, Double.POSITIVE_INFINITY, 16);
        // hand, factor 2, at (0, 3, 1 m): dA = 3, dB = sqrt(16 + 9) = 5, dC = sqrt(9 + (2 x 2)^2) = 5;
        // (10/9 + 20/25 + 30/25) / (1/9 + 2/25) = (28/9) / (43/225) = 700/43
        assertEquals(700.0 / 43.0, idw.estimateAtMgPerKg(threeSamples(2), 0, 3, 1), TOLERANCE * 700 / 43);
        // hand, factor 1: dC = sqrt(9 + 4) = sqrt(13); over 2925: (3250 + 2340 + 6750) / (325 + 117 + 225) = 12340/667
        assertEquals(12340.0 / 667.0, idw.estimateAtMgPerKg(threeSamples(1), 0, 3, 1), TOLERANCE * 12340 / 667);
    }

    @Test
    void powerOne() {
        InverseDistanceWeighting idw = new InverseDistanceWeighting(1, Double.POSITIVE_INFINITY, 16);
        // hand, factor 2, at (0, 3, 1 m): weights 1/3, 1/5, 1/5: (10/3 + 4 + 6) / (1/3 + 2/5) = (40/3) / (11/15) = 200/11
        assertEquals(200.0 / 11.0, idw.estimateAtMgPerKg(threeSamples(2), 0, 3, 1), TOLERANCE * 200 / 11);
    }

    @Test
    void maxNeighboursAndSearchRadius() {
        SampleSet samples = threeSamples(2);
        // hand: the two nearest are A (3 m) and the first of the tied B and C (5 m), i.e. B by input order:
        // (10/9 + 20/25) / (1/9 + 1/25) = (430/225) / (34/225) = 430/34
        assertEquals(430.0 / 34.0, new InverseDistanceWeighting(2, Double.POSITIVE_INFINITY, 2)
                .estimateAtMgPerKg(samples, 0, 3, 1), TOLERANCE * 430 / 34);
        // hand: within 4 m only A is found: its value
        assertEquals(10.0, new InverseDistanceWeighting(2, 4.0, 16).estimateAtMgPerKg(samples, 0, 3, 1));
        // hand: within 2 m nothing is found: no estimate
        assertTrue(Double.isNaN(new InverseDistanceWeighting(2, 2.0, 16).estimateAtMgPerKg(samples, 0, 3, 1)));
    }

    @Test
    void exactAtSamples() {
        SampleSet samples = threeSamples(2);
        InverseDistanceWeighting idw = InverseDistanceWeighting.withDefaults();
        assertEquals(10.0, idw.estimateAtMgPerKg(samples, 0, 0, 1)); // the limit of the formula at a sample
        assertEquals(20.0, idw.estimateAtMgPerKg(samples, 4, 0, 1));
        assertEquals(30.0, idw.estimateAtMgPerKg(samples, 0, 0, 3));
        // hand: power 20 at (0, 3, 1 m): relative weights 1, r, r with r = (3/5)^20, so (10 + 50 r) / (1 + 2 r),
        // within 30 r (about 1e-3) of the nearest sample's value
        double r = Math.pow(0.6, 20);
        double nearest = new InverseDistanceWeighting(20, Double.POSITIVE_INFINITY, 16).estimateAtMgPerKg(samples, 0, 3, 1);
        assertEquals((10 + 50 * r) / (1 + 2 * r), nearest, TOLERANCE * 10);
    }

    @Test
    void blockEstimateEqualsPointEstimatesAtBlockCentres_andUnestimatedBlocksAreCounted() {
        Random random = new Random(11);
        List<SoilSample> list = new ArrayList<>();
        for (int s = 0; s < 40; s++) {
            double top = 5 * random.nextDouble();
            list.add(SoilSample.detected(30 * random.nextDouble(), 20 * random.nextDouble(), top, top + 0.5,
                    100 * random.nextDouble()));
        }
        SampleSet samples = SampleSet.of(list, NonDetectRule.HALF_DETECTION_LIMIT);
        BlockModel model = new BlockModel(-20, -20, 0, 5, 5, 0.5, 14, 12, 12);
        InverseDistanceWeighting idw = new InverseDistanceWeighting(2.5, 30.0, 8);
        BlockEstimate estimate = idw.estimate(samples, model);
        int missing = 0;
        for (int b = 0; b < model.blockCount(); b++) {
            double expected = idw.estimateAtMgPerKg(samples, model.centreEastingMetres(model.columnOf(b)),
                    model.centreNorthingMetres(model.rowOf(b)), model.centreDepthMetres(model.layerOf(b)));
            assertEquals(expected, estimate.concentrationMgPerKg(b), 0.0); // same arithmetic, exactly
            if (Double.isNaN(expected)) {
                missing++;
            }
        }
        assertTrue(missing > 0, "the far corner of the model is beyond 30 m of every sample");
        assertEquals(missing, estimate.unestimatedBlockCount());
        assertEquals(model.blockCount() - missing, estimate.estimatedBlockCount());
        assertFalse(estimate.hasKrigingVariance());
        assertThrows(IllegalStateException.class, () -> estimate.krigingVarianceMgPerKgSquared(0));
        assertEquals(NonDetectRule.HALF_DETECTION_LIMIT, estimate.nonDetectRule().orElseThrow());
        assertTrue(estimate.methodDescription().contains("power 2.5"), estimate.methodDescription());
        // rows are estimated in parallel: a second run gives the same numbers
        assertArrayEquals(estimate.concentrationsMgPerKg(), idw.estimate(samples, model).concentrationsMgPerKg());
    }

    private static void assertRejects(String field, String range, Executable executable) {
        ZoneInputException e = assertThrows(ZoneInputException.class, executable);
        assertTrue(e.getMessage().contains(field), e.getMessage());
        assertTrue(e.getMessage().contains(range), e.getMessage());
    }

    @Test
    void badInputsNameTheField() {
        assertRejects("powerDimensionless", "greater than 0", () -> new InverseDistanceWeighting(0, 10, 4));
        assertRejects("powerDimensionless", "at most 20", () -> new InverseDistanceWeighting(21, 10, 4));
        assertRejects("powerDimensionless", "greater than 0", () -> new InverseDistanceWeighting(Double.NaN, 10, 4));
        assertRejects("searchRadiusMetres", "greater than 0", () -> new InverseDistanceWeighting(2, 0, 4));
        assertRejects("searchRadiusMetres", "greater than 0", () -> new InverseDistanceWeighting(2, Double.NaN, 4));
        assertRejects("maxNeighbours", "1 or greater", () -> new InverseDistanceWeighting(2, 10, 0));
        InverseDistanceWeighting idw = InverseDistanceWeighting.withDefaults();
        SampleSet samples = threeSamples(1);
        BlockModel model = new BlockModel(0, 0, 0, 1, 1, 1, 1, 1, 1);
        assertRejects("samples", "not null", () -> idw.estimate(null, model));
        assertRejects("blockModel", "not null", () -> idw.estimate(samples, null));
        assertRejects("eastingMetres", "finite", () -> idw.estimateAtMgPerKg(samples, Double.NaN, 0, 0));
        assertRejects("northingMetres", "finite", () -> idw.estimateAtMgPerKg(samples, 0, Double.NaN, 0));
        assertRejects("depthMetres", "finite", () -> idw.estimateAtMgPerKg(samples, 0, 0, Double.NaN));
        BlockEstimate estimate = idw.estimate(samples, model);
        assertRejects("block index", "0 to 0", () -> estimate.concentrationMgPerKg(1));
    }
}
