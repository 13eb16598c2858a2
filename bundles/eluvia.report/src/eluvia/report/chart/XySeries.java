package eluvia.report.chart;

import java.util.Arrays;

/**
 * A named series of (x, y) points; the units are those of the chart's axes. The arrays are copied
 * in and out, so a series cannot change after it is made.
 *
 * @param name the name shown in the legend
 * @param x    the x values, finite
 * @param y    the y values, finite, as many as x (at least one point)
 */
public record XySeries(String name, double[] x, double[] y) {

    public XySeries {
        ChartDataException.requireText("series name", name);
        x = ChartDataException.finiteCopy("x of series \"" + name + "\"", x);
        y = ChartDataException.finiteCopy("y of series \"" + name + "\"", y);
        if (x.length != y.length || x.length == 0) {
            throw new ChartDataException("series \"" + name + "\"", x.length + " x values and " + y.length + " y values",
                    "as many y values as x values, at least one", null);
        }
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    /** The number of points. */
    public int size() {
        return x.length;
    }

    double xAt(int i) {
        return x[i];
    }

    double yAt(int i) {
        return y[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof XySeries s && s.name.equals(name) && Arrays.equals(s.x, x) && Arrays.equals(s.y, y);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(x) * 17 + Arrays.hashCode(y);
    }

    @Override
    public String toString() {
        return "XySeries[" + name + ", " + x.length + " points]";
    }
}
