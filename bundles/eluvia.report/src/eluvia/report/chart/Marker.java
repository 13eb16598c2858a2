package eluvia.report.chart;

/**
 * A reference line across a chart at one value of an axis: the design pore volumes, the cleanup
 * level, a layer boundary, a percentile. The value is in the unit of the axis it marks.
 *
 * @param value where the line is, in the unit of its axis
 * @param label a short label drawn beside the line
 */
public record Marker(double value, String label) {

    public Marker {
        ChartDataException.finite("value of marker \"" + label + "\"", value);
        ChartDataException.requireText("marker label", label);
    }
}
