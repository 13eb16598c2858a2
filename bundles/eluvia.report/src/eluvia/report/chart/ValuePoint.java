package eluvia.report.chart;

/**
 * A located value for a {@link PlanView} or a {@link SectionView}: a soil sample's concentration at
 * (easting, northing) or at (distance along the section, depth). Coordinates are in the units of the
 * view's axes, the value in the unit of its value axis.
 *
 * @param name  an identifier, e.g. the sample id (written to the CSV, not drawn)
 * @param x     easting, or distance along the section
 * @param y     northing, or depth below ground
 * @param value the value that sets the colour
 */
public record ValuePoint(String name, double x, double y, double value) {

    public ValuePoint {
        ChartDataException.requireText("point name", name);
        ChartDataException.finite("x of point \"" + name + "\"", x);
        ChartDataException.finite("y of point \"" + name + "\"", y);
        ChartDataException.finite("value of point \"" + name + "\"", value);
    }
}
