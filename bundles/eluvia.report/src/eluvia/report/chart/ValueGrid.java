package eluvia.report.chart;

import java.util.Arrays;

/**
 * A regular grid of values in plan drawn as filled cells under the points and outlines of a
 * {@link PlanView}, coloured on the view's value scale: e.g. the columns of a block model, each
 * with its highest estimate over depth. Cells without a value (NaN) are not drawn. Coordinates in
 * the units of the view's axes, values in the unit of its value axis.
 *
 * <p>The cells are {@code cellWidth} by {@code cellHeight} from the south-west corner
 * ({@code originX}, {@code originY}); the last column and row may be cut short at {@code endX} and
 * {@code endY} (a grid made by grouping blocks whose number the group size does not divide). At
 * most {@link #MAX_CELLS_PER_SIDE} cells each way, so that drawing stays fast.
 *
 * @param name       what the cells are, for the legend and the CSV, e.g. "Block model: highest estimate in each column"
 * @param originX    x of the grid's west edge
 * @param originY    y of the grid's south edge
 * @param cellWidth  cell size along x, greater than 0
 * @param cellHeight cell size along y, greater than 0
 * @param countX     number of columns, 1 to {@value #MAX_CELLS_PER_SIDE}
 * @param countY     number of rows, 1 to {@value #MAX_CELLS_PER_SIDE}
 * @param endX       x of the grid's east edge: within the last column, after its west edge
 * @param endY       y of the grid's north edge: within the last row, after its south edge
 * @param values     one value per cell, row by row from the south-west ({@code i + countX j}), finite or
 *                   NaN for none; copied
 */
public record ValueGrid(String name, double originX, double originY, double cellWidth, double cellHeight, int countX,
        int countY, double endX, double endY, double[] values) {

    /** The most cells a grid may have along each side (dimensionless count). */
    public static final int MAX_CELLS_PER_SIDE = 200;

    public ValueGrid {
        ChartDataException.requireText("grid name", name);
        ChartDataException.finite("x of the west edge of grid \"" + name + "\"", originX);
        ChartDataException.finite("y of the south edge of grid \"" + name + "\"", originY);
        if (!(cellWidth > 0 && Double.isFinite(cellWidth)) || !(cellHeight > 0 && Double.isFinite(cellHeight))) {
            throw new ChartDataException("cell size of grid \"" + name + "\"", cellWidth + " x " + cellHeight,
                    "finite and greater than 0 each way", null);
        }
        if (countX < 1 || countX > MAX_CELLS_PER_SIDE || countY < 1 || countY > MAX_CELLS_PER_SIDE) {
            throw new ChartDataException("cell counts of grid \"" + name + "\"", countX + " x " + countY,
                    "1 to " + MAX_CELLS_PER_SIDE + " each way", "group the cells into larger ones");
        }
        checkEnd("east edge (x) of grid \"" + name + "\"", endX, originX, cellWidth, countX);
        checkEnd("north edge (y) of grid \"" + name + "\"", endY, originY, cellHeight, countY);
        ChartDataException.requireNonNull("values of grid \"" + name + "\"", values);
        if (values.length != countX * countY) {
            throw new ChartDataException("values of grid \"" + name + "\"", values.length + " values",
                    "exactly " + countX * countY + " (one per cell, " + countX + " x " + countY + ")", null);
        }
        for (int i = 0; i < values.length; i++) {
            if (Double.isInfinite(values[i])) {
                throw new ChartDataException("value of cell " + i + " of grid \"" + name + "\"",
                        Double.toString(values[i]), "a finite number, or NaN for no value", null);
            }
        }
        values = values.clone();
    }

    private static void checkEnd(String item, double end, double origin, double size, int count) {
        double full = origin + count * size;
        double slack = 1e-9 * Math.max(Math.abs(full), size);
        if (!(end > origin + (count - 1) * size && end <= full + slack)) {
            throw new ChartDataException(item, Double.toString(end), "after the start of the last cell ("
                    + (origin + (count - 1) * size) + ") and at most its end (" + full + ")", null);
        }
    }

    /** The values (a copy). */
    @Override
    public double[] values() {
        return values.clone();
    }

    /** The value of cell (i, j), NaN for none. */
    public double valueAt(int i, int j) {
        return values[i + countX * j];
    }

    double valueAt(int index) {
        return values[index];
    }

    /** The x of the middle of column {@code i} (of the part of the last column that is drawn). */
    public double centreX(int i) {
        double west = originX + i * cellWidth;
        return 0.5 * (west + Math.min(west + cellWidth, endX));
    }

    /** The y of the middle of row {@code j} (of the part of the last row that is drawn). */
    public double centreY(int j) {
        double south = originY + j * cellHeight;
        return 0.5 * (south + Math.min(south + cellHeight, endY));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ValueGrid g && g.name.equals(name) && g.originX == originX && g.originY == originY
                && g.cellWidth == cellWidth && g.cellHeight == cellHeight && g.countX == countX && g.countY == countY
                && g.endX == endX && g.endY == endY && Arrays.equals(g.values, values);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "ValueGrid[" + name + ", " + countX + " x " + countY + " cells]";
    }
}
