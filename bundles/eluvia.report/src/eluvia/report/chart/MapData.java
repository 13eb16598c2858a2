package eluvia.report.chart;

import java.util.ArrayList;
import java.util.List;

/** Checks and the data table shared by {@link PlanView} and {@link SectionView}. */
final class MapData {

    private MapData() {
    }

    static List<ValuePoint> points(List<ValuePoint> points, boolean logValue, Axis valueAxis) {
        List<ValuePoint> copy = List.copyOf(ChartDataException.requireNonNull("points", points));
        if (logValue) {
            for (ValuePoint p : copy) {
                ChartDataException.positive("value of point \"" + p.name() + "\" (" + valueAxis.title() + ")", p.value(),
                        "plot non-detects at the detection limit, or use a linear colour scale");
            }
        }
        return copy;
    }

    static List<Outline> outlines(List<Outline> outlines, List<ValuePoint> points) {
        return outlines(outlines, points, false);
    }

    static List<Outline> outlines(List<Outline> outlines, List<ValuePoint> points, boolean cells) {
        List<Outline> copy = List.copyOf(ChartDataException.requireNonNull("outlines", outlines));
        if (copy.isEmpty() && points.isEmpty() && !cells) {
            throw new ChartDataException("points and outlines", "both empty", "at least one point or one outline", null);
        }
        return copy;
    }

    /**
     * Columns: kind ("point" or "outline"), name, vertex (index within its outline, empty for a point),
     * x (unit), y (unit), value (unit, empty for an outline vertex); then, with a grid, a row of kind
     * "cell" for each cell with a value, named by the grid, at the middle of the cell.
     */
    static DataTable table(List<ValuePoint> points, List<Outline> outlines, Axis x, Axis y, Axis value) {
        return table(points, outlines, null, x, y, value);
    }

    static DataTable table(List<ValuePoint> points, List<Outline> outlines, ValueGrid grid, Axis x, Axis y, Axis value) {
        List<List<String>> rows = new ArrayList<>();
        for (ValuePoint p : points) {
            rows.add(List.of("point", p.name(), "", DataTable.number(p.x()), DataTable.number(p.y()),
                    DataTable.number(p.value())));
        }
        for (Outline o : outlines) {
            double[] ox = o.x();
            double[] oy = o.y();
            for (int i = 0; i < ox.length; i++) {
                rows.add(List.of("outline", o.name(), Integer.toString(i), DataTable.number(ox[i]), DataTable.number(oy[i]),
                        ""));
            }
        }
        if (grid != null) {
            for (int j = 0; j < grid.countY(); j++) {
                for (int i = 0; i < grid.countX(); i++) {
                    double v = grid.valueAt(i, j);
                    if (!Double.isNaN(v)) {
                        rows.add(List.of("cell", grid.name(), "", DataTable.number(grid.centreX(i)),
                                DataTable.number(grid.centreY(j)), DataTable.number(v)));
                    }
                }
            }
        }
        return new DataTable(List.of("kind", "name", "vertex", x.title(), y.title(), value.title()), rows);
    }
}
