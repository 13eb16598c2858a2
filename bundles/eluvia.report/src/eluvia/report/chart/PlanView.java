package eluvia.report.chart;

import java.util.List;

/**
 * A map: points coloured by value (soil samples by concentration) and outlines of zones, with equal
 * scaling of both axes so that distances and shapes are true. With {@code logValue} the colour
 * scale is logarithmic (concentrations spanning orders of magnitude).
 *
 * @param title        title, or "" for none
 * @param eastingAxis  horizontal axis, e.g. "Easting (m)"
 * @param northingAxis vertical axis, in the same unit as easting
 * @param valueAxis    what the colour shows, e.g. "Soil concentration (mg/kg)"
 * @param points       coloured points (may be empty when there are outlines)
 * @param outlines     zone outlines (may be empty when there are points)
 * @param logValue     whether the colour scale is logarithmic
 */
public record PlanView(String title, Axis eastingAxis, Axis northingAxis, Axis valueAxis, List<ValuePoint> points,
        List<Outline> outlines, boolean logValue) implements ChartSpec {

    public PlanView {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("easting axis", eastingAxis);
        ChartDataException.requireNonNull("northing axis", northingAxis);
        ChartDataException.requireNonNull("value axis", valueAxis);
        if (!eastingAxis.unit().equals(northingAxis.unit())) {
            throw new ChartDataException("units of the plan axes", eastingAxis.unit() + " and " + northingAxis.unit(),
                    "one unit for both (the plan is drawn to scale)", "convert the coordinates to one unit");
        }
        points = MapData.points(points, logValue, valueAxis);
        outlines = MapData.outlines(outlines, points);
    }

    /** See {@link MapData#table}: kind, name, vertex, easting, northing, value. */
    @Override
    public DataTable data() {
        return MapData.table(points, outlines, eastingAxis, northingAxis, valueAxis);
    }
}
