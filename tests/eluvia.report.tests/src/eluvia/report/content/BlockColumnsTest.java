package eluvia.report.content;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

import eluvia.report.chart.ChartDataException;
import eluvia.report.chart.ValueGrid;
import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;

/** Large block models are drawn in groups of whole columns, each showing the highest estimate it holds. */
final class BlockColumnsTest {

    /** Invented values on an invented model, some blocks without an estimate. */
    private static BlockEstimate estimate(BlockModel m, long seed) {
        Random r = new Random(seed);
        double[] c = new double[m.blockCount()];
        for (int b = 0; b < c.length; b++) {
            c[b] = r.nextInt(10) == 0 ? Double.NaN : Math.exp(4 * r.nextGaussian());
        }
        return BlockEstimate.ofValues(m, c, "invented for the test");
    }

    @Test
    void aModelWiderThanTheCapIsGroupedIntoWholeColumnsEachWithItsHighestBlock() {
        // 401 x 7 columns of 0.5 m x 2 m: groups of 3 along easting (ceil(401 / 200)), 134 cells, the last of 2 columns
        BlockModel m = new BlockModel(100, 200, 0, 0.5, 2, 0.25, 401, 7, 3);
        BlockEstimate e = estimate(m, 3);
        ValueGrid g = ResultFigures.blockColumns(e, FigureUnits.SI);
        assertEquals(134, g.countX());
        assertEquals(7, g.countY());
        assertEquals(1.5, g.cellWidth(), 0.0);
        assertEquals(2, g.cellHeight(), 0.0);
        assertEquals(100 + 401 * 0.5, g.endX(), 1e-12, "the grid ends where the model does");
        assertEquals(200 + 7 * 2, g.endY(), 1e-12);
        assertEquals(100 + 133 * 1.5 + 0.5 * 1.0, g.centreX(133), 1e-12, "the middle of the last, narrower cell");
        for (int cj = 0; cj < g.countY(); cj++) {
            for (int ci = 0; ci < g.countX(); ci++) {
                // brute force over the blocks of the group (the definition of the cell's value)
                double max = Double.NaN;
                for (int i = 3 * ci; i < Math.min(3 * ci + 3, 401); i++) {
                    for (int k = 0; k < 3; k++) {
                        double c = e.concentrationMgPerKg(m.blockIndex(i, cj, k));
                        if (!Double.isNaN(c) && (Double.isNaN(max) || c > max)) {
                            max = c;
                        }
                    }
                }
                assertEquals(max, g.valueAt(ci, cj), 0.0);
            }
        }
        assertTrue(g.name().contains("groups of 3 x 1"), g.name());
    }

    @Test
    void aModelWithinTheCapIsDrawnColumnByColumn() {
        BlockModel m = new BlockModel(0, 0, 0, 1, 1, 1, 200, 200, 2);
        ValueGrid g = ResultFigures.blockColumns(estimate(m, 5), FigureUnits.SI);
        assertEquals(200, g.countX());
        assertEquals(200, g.countY());
        assertEquals(1, g.cellWidth(), 0.0);
    }

    @Test
    void aGridRefusesMoreCellsThanTheCapAndValuesThatDoNotFit() {
        double[] v201 = new double[201];
        assertThrows(ChartDataException.class, () -> new ValueGrid("g", 0, 0, 1, 1, 201, 1, 201, 1, v201));
        assertThrows(ChartDataException.class, () -> new ValueGrid("g", 0, 0, 1, 1, 2, 1, 2, 1, new double[3]));
        // the east edge must fall within the last column
        assertThrows(ChartDataException.class, () -> new ValueGrid("g", 0, 0, 1, 1, 2, 1, 2.5, 1, new double[2]));
        assertThrows(ChartDataException.class, () -> new ValueGrid("g", 0, 0, 1, 1, 2, 1, 1, 1, new double[2]));
        assertThrows(ChartDataException.class, () -> new ValueGrid("g", 0, 0, 1, 1, 2, 1, 2, 1,
                new double[] { 1, Double.POSITIVE_INFINITY }));
    }
}
