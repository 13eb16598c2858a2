package eluvia.report.chart;

import java.util.List;

/**
 * A map: points coloured by value (soil samples by concentration), optionally over a grid of
 * coloured cells (the columns of a block model) and outlines of zones, with equal scaling of both
 * axes so that distances and shapes are true. With {@code logValue} the colour scale is
 * logarithmic (concentrations spanning orders of magnitude). With a {@code valueMarker} (a
 * cleanup level) the colour scale changes at the marker: cool greys below it, warm colours from
 * sand to wine above it, so that cells and points above the level stand out.
 *
 * <p>The points, the cells and the outlines are named in a legend under the map; the colour scale
 * with its unit stands beside it.
 *
 * @param title        title, or "" for none
 * @param eastingAxis  horizontal axis, e.g. "Easting (m)"
 * @param northingAxis vertical axis, in the same unit as easting
 * @param valueAxis    what the colour shows, e.g. "Soil concentration (mg/kg)"
 * @param points       coloured points (may be empty when there are outlines or cells)
 * @param outlines     outlines (may be empty when there are points or cells)
 * @param logValue     whether the colour scale is logarithmic
 * @param pointsLabel  the legend entry of the points, e.g. "Sampling location (highest sample)"
 * @param grid         coloured cells under the points, or null for none
 * @param valueMarker  the value at which the colour scale changes (e.g. the cleanup level), in the
 *                     value axis's unit, or null for one sequential scale
 */
public record PlanView(String title, Axis eastingAxis, Axis northingAxis, Axis valueAxis, List<ValuePoint> points,
        List<Outline> outlines, boolean logValue, String pointsLabel, ValueGrid grid, Marker valueMarker)
        implements ChartSpec {

    public PlanView {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("easting axis", eastingAxis);
        ChartDataException.requireNonNull("northing axis", northingAxis);
        ChartDataException.requireNonNull("value axis", valueAxis);
        ChartDataException.requireText("legend entry of the points", pointsLabel);
        if (!eastingAxis.unit().equals(northingAxis.unit())) {
            throw new ChartDataException("units of the plan axes", eastingAxis.unit() + " and " + northingAxis.unit(),
                    "one unit for both (the plan is drawn to scale)", "convert the coordinates to one unit");
        }
        points = MapData.points(points, logValue, valueAxis);
        outlines = MapData.outlines(outlines, points, grid != null);
        if (valueMarker != null && logValue) {
            ChartDataException.positive("value marker \"" + valueMarker.label() + "\" (" + valueAxis.title() + ")",
                    valueMarker.value(), "use a linear colour scale, or leave the marker out");
        }
    }

    /** Points and outlines only, the points named by the value axis's label. */
    public PlanView(String title, Axis eastingAxis, Axis northingAxis, Axis valueAxis, List<ValuePoint> points,
            List<Outline> outlines, boolean logValue) {
        this(title, eastingAxis, northingAxis, valueAxis, points, outlines, logValue, valueAxis.label(), null, null);
    }

    /**
     * See {@link MapData#table}: kind, name, vertex, easting, northing, value; a row per point, per
     * outline vertex and per cell with a value (at the middle of the cell).
     */
    @Override
    public DataTable data() {
        return MapData.table(points, outlines, grid, eastingAxis, northingAxis, valueAxis);
    }
}
