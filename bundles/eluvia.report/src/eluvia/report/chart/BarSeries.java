package eluvia.report.chart;

import java.util.Arrays;

/**
 * One series of a {@link BarChart}: a value per category, e.g. the capital cost of each alternative.
 * Values are in the unit of the chart's value axis.
 *
 * @param name   the legend entry, e.g. "Capital"
 * @param values one finite value per category; copied
 */
public record BarSeries(String name, double[] values) {

    public BarSeries {
        ChartDataException.requireText("bar series name", name);
        values = ChartDataException.finiteCopy("values of bar series \"" + name + "\"", values);
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    double valueAt(int i) {
        return values[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof BarSeries s && s.name.equals(name) && Arrays.equals(s.values, values);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "BarSeries[" + name + ", " + Arrays.toString(values) + "]";
    }
}
