package eluvia.report.chart;

import java.util.List;

/**
 * A vertical section: points coloured by value at (distance along the section, depth), outlines of
 * zones, depth increasing downward and horizontal markers at layer boundaries. The vertical scale is
 * the horizontal one times {@code verticalExaggeration} (1 = true scale; sections of shallow zones
 * are often drawn at 2 to 10).
 *
 * @param title                title, or "" for none
 * @param distanceAxis         horizontal axis, e.g. "Distance along section A-A' (m)"
 * @param depthAxis            vertical axis, e.g. "Depth below ground (m)", same unit as distance
 * @param valueAxis            what the colour shows
 * @param points               coloured points (may be empty when there are outlines)
 * @param outlines             zone outlines (may be empty when there are points)
 * @param logValue             whether the colour scale is logarithmic
 * @param verticalExaggeration vertical scale / horizontal scale, dimensionless, 0.1 to 100
 * @param depthMarkers         horizontal lines, e.g. layer boundaries (may be empty)
 */
public record SectionView(String title, Axis distanceAxis, Axis depthAxis, Axis valueAxis, List<ValuePoint> points,
        List<Outline> outlines, boolean logValue, double verticalExaggeration, List<Marker> depthMarkers)
        implements ChartSpec {

    public SectionView {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("distance axis", distanceAxis);
        ChartDataException.requireNonNull("depth axis", depthAxis);
        ChartDataException.requireNonNull("value axis", valueAxis);
        if (!distanceAxis.unit().equals(depthAxis.unit())) {
            throw new ChartDataException("units of the section axes", distanceAxis.unit() + " and " + depthAxis.unit(),
                    "one unit for both (the section is drawn to a stated scale)", "convert to one unit");
        }
        if (!(verticalExaggeration >= 0.1 && verticalExaggeration <= 100)) {
            throw new ChartDataException("vertical exaggeration (dimensionless)", Double.toString(verticalExaggeration),
                    "0.1 to 100", "1 draws the section to true scale");
        }
        points = MapData.points(points, logValue, valueAxis);
        outlines = MapData.outlines(outlines, points);
        depthMarkers = List.copyOf(ChartDataException.requireNonNull("depth markers", depthMarkers));
    }

    /** See {@link MapData#table}: kind, name, vertex, distance, depth, value. */
    @Override
    public DataTable data() {
        return MapData.table(points, outlines, distanceAxis, depthAxis, valueAxis);
    }
}
