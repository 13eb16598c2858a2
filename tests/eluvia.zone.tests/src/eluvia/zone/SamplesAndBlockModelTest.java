package eluvia.zone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Samples, the non-detect rule, the sample set and the block model: values and every bad-input path. */
final class SamplesAndBlockModelTest {

    private static void assertRejects(String field, String range, Executable executable) {
        ZoneInputException e = assertThrows(ZoneInputException.class, executable);
        assertTrue(e.getMessage().contains(field), e.getMessage());
        assertTrue(e.getMessage().contains(range), e.getMessage());
    }

    @Test
    void nonDetectRules() {
        assertEquals(0.25, NonDetectRule.HALF_DETECTION_LIMIT.substituteMgPerKg(0.5)); // hand: 0.5 / 2, common practice
        assertEquals(0.5, NonDetectRule.DETECTION_LIMIT.substituteMgPerKg(0.5)); // hand: the limit itself
        assertEquals(0.0, NonDetectRule.ZERO.substituteMgPerKg(0.5)); // hand: zero
        assertRejects("detectionLimitMgPerKg", "greater than 0", () -> NonDetectRule.ZERO.substituteMgPerKg(0));
    }

    @Test
    void sampleValuesAndMidpoint() {
        SoilSample nd = SoilSample.belowDetection(1, 2, 1.0, 2.0, 0.2);
        assertEquals(1.5, nd.midDepthMetres()); // hand: (1 + 2) / 2
        assertEquals(0.1, nd.valueMgPerKg(NonDetectRule.HALF_DETECTION_LIMIT), 1e-15); // hand: 0.2 / 2
        assertEquals(0.2, nd.valueMgPerKg(NonDetectRule.DETECTION_LIMIT));
        SoilSample hit = SoilSample.detected(1, 2, 3.0, 3.0, 7.5);
        assertEquals(7.5, hit.valueMgPerKg(NonDetectRule.ZERO)); // a detect keeps its value under every rule
        assertEquals(3.0, hit.midDepthMetres());
    }

    @Test
    void badSamplesNameTheField() {
        assertRejects("sample eastingMetres", "finite", () -> SoilSample.detected(Double.NaN, 0, 0, 1, 1));
        assertRejects("sample northingMetres", "finite", () -> SoilSample.detected(0, Double.POSITIVE_INFINITY, 0, 1, 1));
        assertRejects("sample topDepthMetres", "0 or greater", () -> SoilSample.detected(0, 0, -0.1, 1, 1));
        assertRejects("sample bottomDepthMetres", "at least topDepthMetres", () -> SoilSample.detected(0, 0, 2, 1, 1));
        assertRejects("sample concentrationMgPerKg", "0 or greater", () -> SoilSample.detected(0, 0, 0, 1, -1));
        assertRejects("sample concentrationMgPerKg", "0 or greater", () -> SoilSample.detected(0, 0, 0, 1, Double.NaN));
        assertRejects("sample detectionLimitMgPerKg", "greater than 0",
                () -> SoilSample.belowDetection(0, 0, 0, 1, 0));
        assertRejects("sample detectionLimitMgPerKg", "0 or greater",
                () -> new SoilSample(0, 0, 0, 1, 1, false, -1));
        assertRejects("sample concentrationMgPerKg", "0 or greater", () -> new SoilSample(0, 0, 0, 1, -2, true, 1));
        assertRejects("nonDetectRule", "not null", () -> SoilSample.detected(0, 0, 0, 1, 1).valueMgPerKg(null));
    }

    @Test
    void sampleSetMergesCoincidentSamplesAndCountsNonDetects() {
        List<SoilSample> samples = List.of(SoilSample.detected(0, 0, 0, 2, 4.0), SoilSample.detected(0, 0, 0.5, 1.5, 8.0),
                SoilSample.belowDetection(5, 0, 0, 2, 1.0), SoilSample.detected(5, 5, 1, 1, 3.0));
        SampleSet set = SampleSet.of(samples, NonDetectRule.HALF_DETECTION_LIMIT, 4.0);
        assertEquals(3, set.size()); // hand: the first two share the midpoint (0, 0, 1 m)
        assertEquals(1, set.mergedSampleCount());
        assertEquals(4, set.inputSampleCount());
        assertEquals(1, set.nonDetectCount());
        assertEquals(6.0, set.valueMgPerKg(0)); // hand: (4 + 8) / 2
        assertEquals(0.5, set.valueMgPerKg(1)); // hand: half of 1.0
        // hand: between (5, 0, 1) and (5, 5, 1): 5 m; between (0, 0, 1) and (5, 0, 1): 5 m
        assertEquals(5.0, set.scaledDistanceMetres(1, 2), 1e-12);
        // hand: to (0, 0, 1.5): vertical 0.5 m scaled by 4 -> 2 m
        assertEquals(2.0, set.scaledDistanceMetres(0, 0, 0, 1.5), 1e-12);
        // hand: population variance of {6, 0.5, 3}: mean 19/6, deviations 17/6, -16/6, -1/6,
        // sum of squares 546/36, divided by 3 -> 91/18
        assertEquals(91.0 / 18.0, set.valueVarianceMgPerKgSquared(), 1e-12);
        assertTrue(set.description().contains("half the detection limit"), set.description());
        assertEquals(SampleSet.DEFAULT_VERTICAL_DISTANCE_FACTOR,
                SampleSet.of(samples, NonDetectRule.ZERO).verticalDistanceFactor());
    }

    @Test
    void negativeZeroCoordinatesMergeWithZero() {
        SampleSet set = SampleSet.of(List.of(SoilSample.detected(-0.0, 0, 1, 1, 2), SoilSample.detected(0.0, -0.0, 1, 1, 4)),
                NonDetectRule.ZERO, 1.0);
        assertEquals(1, set.size()); // the same place: one point at the mean, 3 mg/kg
        assertEquals(3.0, set.valueMgPerKg(0));
    }

    @Test
    void badSampleSetsNameTheField() {
        List<SoilSample> one = List.of(SoilSample.detected(0, 0, 0, 1, 1));
        assertRejects("number of samples", "1 or more", () -> SampleSet.of(List.of(), NonDetectRule.ZERO));
        assertRejects("samples", "not null", () -> SampleSet.of(null, NonDetectRule.ZERO));
        assertRejects("nonDetectRule", "not null", () -> SampleSet.of(one, null));
        assertRejects("verticalDistanceFactor", "greater than 0", () -> SampleSet.of(one, NonDetectRule.ZERO, 0));
        assertRejects("verticalDistanceFactor", "at most 1000", () -> SampleSet.of(one, NonDetectRule.ZERO, 1001));
        assertRejects("verticalDistanceFactor", "greater than 0",
                () -> SampleSet.of(one, NonDetectRule.ZERO, Double.NaN));
        List<SoilSample> withNull = new ArrayList<>(one);
        withNull.add(null);
        assertRejects("sample 1", "not null", () -> SampleSet.of(withNull, NonDetectRule.ZERO));
    }

    @Test
    void blockModelGeometryAndIndexing() {
        BlockModel model = new BlockModel(100, 200, 0.5, 2, 4, 0.25, 3, 5, 7);
        assertEquals(105, model.blockCount()); // hand: 3 x 5 x 7
        assertEquals(15, model.planCellCount());
        assertEquals(2.0, model.blockVolumeCubicMetres()); // hand: 2 x 4 x 0.25
        assertEquals(8.0, model.blockPlanAreaSquareMetres());
        assertEquals(105.0, model.centreEastingMetres(2)); // hand: 100 + 2.5 x 2
        assertEquals(202.0, model.centreNorthingMetres(0)); // hand: 200 + 0.5 x 4
        assertEquals(0.625, model.centreDepthMetres(0)); // hand: 0.5 + 0.5 x 0.25
        assertEquals(1.0, model.topDepthMetres(2)); // hand: 0.5 + 2 x 0.25
        assertEquals(1.25, model.bottomDepthMetres(2));
        int b = model.blockIndex(2, 4, 6);
        assertEquals(2 + 3 * (4 + 5 * 6), b); // i + nx (j + ny k)
        assertEquals(2, model.columnOf(b));
        assertEquals(4, model.rowOf(b));
        assertEquals(6, model.layerOf(b));
        assertRejects("column index i", "0 to 2", () -> model.blockIndex(3, 0, 0));
        assertRejects("row index j", "0 to 4", () -> model.blockIndex(0, -1, 0));
        assertRejects("layer index k", "0 to 6", () -> model.blockIndex(0, 0, 7));
        assertRejects("block index", "0 to 104", () -> model.layerOf(105));
    }

    @Test
    void badBlockModelsNameTheField() {
        assertRejects("originEastingMetres", "finite", () -> new BlockModel(Double.NaN, 0, 0, 1, 1, 1, 1, 1, 1));
        assertRejects("originNorthingMetres", "finite", () -> new BlockModel(0, Double.NEGATIVE_INFINITY, 0, 1, 1, 1, 1, 1, 1));
        assertRejects("originDepthMetres", "0 or greater", () -> new BlockModel(0, 0, -1, 1, 1, 1, 1, 1, 1));
        assertRejects("blockEastingMetres", "greater than 0", () -> new BlockModel(0, 0, 0, 0, 1, 1, 1, 1, 1));
        assertRejects("blockNorthingMetres", "greater than 0", () -> new BlockModel(0, 0, 0, 1, -1, 1, 1, 1, 1));
        assertRejects("blockDepthMetres", "greater than 0", () -> new BlockModel(0, 0, 0, 1, 1, Double.NaN, 1, 1, 1));
        assertRejects("countEasting", "1 or greater", () -> new BlockModel(0, 0, 0, 1, 1, 1, 0, 1, 1));
        assertRejects("countNorthing", "1 or greater", () -> new BlockModel(0, 0, 0, 1, 1, 1, 1, 0, 1));
        assertRejects("countDepth", "1 or greater", () -> new BlockModel(0, 0, 0, 1, 1, 1, 1, 1, -3));
        assertRejects("block count", "at most 20000000", () -> new BlockModel(0, 0, 0, 1, 1, 1, 1000, 1000, 21));
    }
}
