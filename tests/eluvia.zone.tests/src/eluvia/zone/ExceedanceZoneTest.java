package eluvia.zone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** The volume above the cleanup level for synthetic fields whose answer is a closed form. */
final class ExceedanceZoneTest {

    /** A field given by a formula of the block centre (easting, northing, depth), all in metres. */
    private interface Field {
        double mgPerKg(double e, double n, double d);
    }

    private static BlockEstimate evaluate(BlockModel model, Field field) {
        double[] values = new double[model.blockCount()];
        for (int b = 0; b < values.length; b++) {
            values[b] = field.mgPerKg(model.centreEastingMetres(model.columnOf(b)),
                    model.centreNorthingMetres(model.rowOf(b)), model.centreDepthMetres(model.layerOf(b)));
        }
        return BlockEstimate.ofValues(model, values, "formula evaluated at block centres (test field)");
    }

    @Test
    void linearInDepth_volumeIsAreaTimesTheDepthWhereTheLevelIsCrossed() {
        // C = 10 (1 - d / 5) mg/kg; C > 6 where d < 5 (1 - 6/10) = 2 m, a block face: exact for the blocks
        BlockModel model = new BlockModel(100, 50, 0, 2, 3, 0.5, 8, 6, 20);
        ExceedanceZone zone = ExceedanceZone.find(new ContaminantEstimate("test contaminant",
                evaluate(model, (e, n, d) -> 10 * (1 - d / 5)), 6.0));
        double area = 16.0 * 18.0; // hand: 8 x 2 m by 6 x 3 m
        assertEquals(area * 2.0, zone.volumeCubicMetres(), 1e-9); // closed form: area x 2 m = 576 m3
        assertEquals(8 * 6 * 4, zone.blockCount()); // hand: four 0.5 m layers above 2 m
        assertEquals(area, zone.footprintAreaSquareMetres(), 1e-9);
        assertEquals(48, zone.planCells().size());
        assertEquals(0.0, zone.topDepthMetres());
        assertEquals(2.0, zone.bottomDepthMetres(), 1e-12);
        FootprintPolygon polygon = zone.footprintPolygon();
        assertEquals(4, polygon.vertices().size()); // the hull of a full grid is its rectangle
        assertEquals(new PlanPoint(100, 50), polygon.vertices().get(0));
        assertEquals(new PlanPoint(116, 68), polygon.vertices().get(2));
        assertEquals(area, polygon.areaSquareMetres(), 1e-9);
        TreatmentZone treatment = zone.proposedTreatmentZone().orElseThrow();
        assertEquals(576.0, treatment.volumeCubicMetres(), 1e-9);
        assertEquals(2.0, treatment.thicknessMetres(), 1e-12);
        assertEquals(0, zone.unestimatedBlockCount());
        PlanCell cell = zone.planCells().get(0);
        assertEquals(101.0, cell.centreEastingMetres()); // hand: 100 + 2 / 2
        assertEquals(4, cell.blocksAbove());
        assertTrue(zone.description().contains("576.0 m3"), zone.description());
    }

    @Test
    void radialField_volumeLiesBetweenTheBallsShrunkAndGrownByHalfABlockDiagonal() {
        // C = 100 exp(-(r / 4)^2) with r from (6.125, 6.125, 6.125) m, a block centre; level at r = 5.1 m.
        // A block whose centre is inside the ball of radius R lies inside R + h sqrt(3)/2, and every point
        // within R - h sqrt(3)/2 lies in such a block: closed-form bounds 4/3 pi (R -+ delta)^3.
        double h = 0.25;
        double radius = 5.1;
        BlockModel model = new BlockModel(0, 0, 0, h, h, h, 50, 50, 50);
        double c0 = 6.125;
        Field field = (e, n, d) -> 100 * Math.exp(-((e - c0) * (e - c0) + (n - c0) * (n - c0) + (d - c0) * (d - c0)) / 16);
        double level = 100 * Math.exp(-radius * radius / 16);
        ExceedanceZone zone = ExceedanceZone.find(new ContaminantEstimate("test contaminant", evaluate(model, field), level));
        double delta = h * Math.sqrt(3) / 2;
        double volume = zone.volumeCubicMetres();
        assertTrue(volume > 4.0 / 3 * Math.PI * Math.pow(radius - delta, 3), "volume " + volume);
        assertTrue(volume < 4.0 / 3 * Math.PI * Math.pow(radius + delta, 3), "volume " + volume);
        // footprint: the columns whose centre lies within R in plan (the centre layer holds a block centre):
        // between the discs shrunk and grown by half a cell diagonal
        double planDelta = h / Math.sqrt(2);
        double area = zone.footprintAreaSquareMetres();
        assertTrue(area > Math.PI * Math.pow(radius - planDelta, 2), "area " + area);
        assertTrue(area < Math.PI * Math.pow(radius + planDelta, 2), "area " + area);
        // the hull contains the cells and lies inside the grown disc (a disc is convex)
        double hull = zone.footprintPolygon().areaSquareMetres();
        assertTrue(hull >= area, "hull " + hull);
        assertTrue(hull < Math.PI * Math.pow(radius + planDelta, 2), "hull " + hull);
        // hand: blocks above have centres deeper than 6.125 - 5.1 = 1.025 m, i.e. from 1.125 m (top face 1.0 m),
        // and shallower than 11.225 m, i.e. to 11.125 m (bottom face 11.25 m)
        assertEquals(1.0, zone.topDepthMetres(), 1e-12);
        assertEquals(11.25, zone.bottomDepthMetres(), 1e-12);
        TreatmentZone treatment = zone.proposedTreatmentZone().orElseThrow();
        assertEquals(hull * 10.25, treatment.volumeCubicMetres(), 1e-9 * hull * 10.25);
        assertTrue(treatment.volumeCubicMetres() > volume);
    }

    @Test
    void severalContaminants_unionOfTheirBlocks_andAnLShapedFootprint() {
        BlockModel model = new BlockModel(0, 0, 0, 1, 1, 1, 10, 10, 4);
        // A: C = easting; above 6.5 where the column centre i + 0.5 > 6.5: i = 7..9 (3 x 10 x 4 = 120 blocks)
        // B: C = northing; above 7.9 where j = 8, 9 (10 x 2 x 4 = 80 blocks); both: 3 x 2 x 4 = 24
        ExceedanceZone zone = ExceedanceZone.find(List.of(
                new ContaminantEstimate("A", evaluate(model, (e, n, d) -> e), 6.5),
                new ContaminantEstimate("B", evaluate(model, (e, n, d) -> n), 7.9)));
        assertEquals(120 + 80 - 24, zone.blockCount()); // hand: inclusion-exclusion
        assertEquals(176.0, zone.volumeCubicMetres(), 1e-12);
        assertEquals(120, zone.byContaminant().get(0).blockCount());
        assertEquals(80.0, zone.byContaminant().get(1).volumeCubicMetres(), 1e-12);
        assertEquals(9.5, zone.byContaminant().get(0).maxConcentrationMgPerKg()); // hand: the last column centre
        assertEquals(30 + 20 - 6, zone.planCells().size()); // hand: the L of cells
        // hand: the hull of the L [7,10] x [0,10] u [0,10] x [8,10] is the 10 x 10 square less the corner
        // triangle (0,0) (7,0) (0,8) of area 28: 72 m2, with vertices (7,0) (10,0) (10,10) (0,10) (0,8)
        assertEquals(72.0, zone.footprintPolygon().areaSquareMetres(), 1e-12);
        assertEquals(List.of(new PlanPoint(0, 8), new PlanPoint(7, 0), new PlanPoint(10, 0), new PlanPoint(10, 10),
                new PlanPoint(0, 10)), zone.footprintPolygon().vertices());
        assertTrue(zone.isAbove(model.blockIndex(9, 0, 3)));
        assertFalse(zone.isAbove(model.blockIndex(0, 0, 0)));
        assertEquals(176, zone.blockIndices().length);
        assertEquals(ExceedanceZone.FOOTPRINT_METHOD, zone.footprintPolygon().method());
    }

    @Test
    void unestimatedBlocksAreCountedUnlessAnotherContaminantPutsThemAbove() {
        BlockModel model = new BlockModel(0, 0, 0, 1, 1, 1, 4, 1, 1);
        BlockEstimate a = BlockEstimate.ofValues(model, new double[] { Double.NaN, Double.NaN, 5, 1 }, "test values");
        BlockEstimate b = BlockEstimate.ofValues(model, new double[] { 9, 0, 0, 0 }, "test values");
        ExceedanceZone zone = ExceedanceZone.find(List.of(new ContaminantEstimate("A", a, 2),
                new ContaminantEstimate("B", b, 2)));
        assertEquals(2, zone.blockCount()); // hand: block 0 by B, block 2 by A
        assertEquals(1, zone.unestimatedBlockCount()); // hand: block 1 has no A estimate and B is below
        assertEquals(2, zone.byContaminant().get(0).unestimatedBlockCount());
        assertTrue(zone.description().contains("1 blocks have no estimate"), zone.description());
    }

    @Test
    void nothingAbove_givesAnEmptyZone() {
        BlockModel model = new BlockModel(0, 0, 0, 1, 1, 1, 3, 3, 3);
        ExceedanceZone zone = ExceedanceZone.find(new ContaminantEstimate("A", evaluate(model, (e, n, d) -> 1), 1.0));
        assertTrue(zone.isEmpty()); // a value equal to the level is not above it
        assertEquals(0.0, zone.volumeCubicMetres());
        assertEquals(0.0, zone.footprintAreaSquareMetres());
        assertTrue(zone.footprintPolygon().vertices().isEmpty());
        assertTrue(Double.isNaN(zone.topDepthMetres()));
        assertTrue(zone.proposedTreatmentZone().isEmpty());
    }

    @Test
    void fromSamples_twoSymmetricSamplesSplitTheModelAtTheirBisector() {
        // closed form: with two samples mirrored about e = 5 m, any inverse-distance estimate exceeds the mean
        // of the two values, (10 + 0.1) / 2 = 5.05 mg/kg, exactly where the first sample is nearer, i.e. e < 5:
        // half the model
        SampleSet samples = SampleSet.of(List.of(SoilSample.detected(2.5, 5, 0.5, 1.5, 10),
                SoilSample.belowDetection(7.5, 5, 0.5, 1.5, 0.1)), NonDetectRule.DETECTION_LIMIT, 3.0);
        BlockModel model = new BlockModel(0, 0, 0, 1, 1, 0.5, 10, 10, 4);
        for (double power : new double[] { 1, 2, 3.5 }) {
            BlockEstimate estimate = new InverseDistanceWeighting(power, Double.POSITIVE_INFINITY, 16)
                    .estimate(samples, model);
            ExceedanceZone zone = ExceedanceZone.find(new ContaminantEstimate("test contaminant", estimate, 5.05));
            assertEquals(0.5 * 10 * 10 * 2, zone.volumeCubicMetres(), 1e-9, "power " + power); // half of 200 m3
            assertEquals(50.0, zone.footprintAreaSquareMetres(), 1e-9);
            assertEquals(50.0, zone.footprintPolygon().areaSquareMetres(), 1e-9);
        }
    }

    private static void assertRejects(String field, String range, Executable executable) {
        ZoneInputException e = assertThrows(ZoneInputException.class, executable);
        assertTrue(e.getMessage().contains(field), e.getMessage());
        assertTrue(e.getMessage().contains(range), e.getMessage());
    }

    @Test
    void badInputsNameTheField() {
        BlockModel model = new BlockModel(0, 0, 0, 1, 1, 1, 2, 2, 2);
        BlockModel other = new BlockModel(0, 0, 0, 1, 1, 1, 2, 2, 3);
        BlockEstimate estimate = evaluate(model, (e, n, d) -> e);
        assertRejects("number of contaminant estimates", "1 or more", () -> ExceedanceZone.find(List.of()));
        assertRejects("contaminant estimates", "not null", () -> ExceedanceZone.find((List<ContaminantEstimate>) null));
        assertRejects("block model of B", "the same block model", () -> ExceedanceZone.find(List.of(
                new ContaminantEstimate("A", estimate, 1), new ContaminantEstimate("B", evaluate(other, (e, n, d) -> e), 1))));
        assertRejects("contaminantName", "not already used", () -> ExceedanceZone.find(List.of(
                new ContaminantEstimate("A", estimate, 1), new ContaminantEstimate("A", estimate, 2))));
        assertRejects("cleanupLevelMgPerKg of A", "greater than 0", () -> new ContaminantEstimate("A", estimate, 0));
        assertRejects("cleanupLevelMgPerKg of A", "greater than 0",
                () -> new ContaminantEstimate("A", estimate, Double.NaN));
        assertRejects("contaminantName", "not blank", () -> new ContaminantEstimate(" ", estimate, 1));
        assertRejects("contaminantName", "not null", () -> new ContaminantEstimate(null, estimate, 1));
        assertRejects("estimate of A", "not null", () -> new ContaminantEstimate("A", null, 1));
        assertRejects("concentrationMgPerKg length", "equal to the block count 8",
                () -> BlockEstimate.ofValues(model, new double[7], "test"));
        assertRejects("concentrationMgPerKg[2]", "finite",
                () -> BlockEstimate.ofValues(model, new double[] { 0, 0, Double.POSITIVE_INFINITY, 0, 0, 0, 0, 0 }, "t"));
        ExceedanceZone zone = ExceedanceZone.find(new ContaminantEstimate("A", estimate, 1));
        assertRejects("block index", "0 to 7", () -> zone.isAbove(8));
    }
}
