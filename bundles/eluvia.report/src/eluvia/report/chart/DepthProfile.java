package eluvia.report.chart;

import java.util.List;

/**
 * Concentration against depth, depth increasing downward: each series is a profile with
 * concentration as x and depth below ground as y. Vertical markers show the cleanup level, horizontal
 * markers the layer boundaries. With {@code logConcentration} the concentration axis is logarithmic.
 *
 * @param title                title, or "" for none
 * @param concentrationAxis    the horizontal axis, e.g. "Soil concentration (mg/kg)"
 * @param depthAxis            the vertical axis, e.g. "Depth below ground (m)", drawn increasing downward
 * @param profiles             the profiles (x = concentration, y = depth), at least one
 * @param logConcentration     whether the concentration axis is logarithmic
 * @param concentrationMarkers vertical lines (may be empty)
 * @param depthMarkers         horizontal lines (may be empty)
 */
public record DepthProfile(String title, Axis concentrationAxis, Axis depthAxis, List<XySeries> profiles,
        boolean logConcentration, List<Marker> concentrationMarkers, List<Marker> depthMarkers) implements ChartSpec {

    public DepthProfile {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("concentration axis", concentrationAxis);
        ChartDataException.requireNonNull("depth axis", depthAxis);
        profiles = SeriesChecks.nonEmpty("profiles of depth profile", profiles);
        concentrationMarkers = List.copyOf(ChartDataException.requireNonNull("concentration markers", concentrationMarkers));
        depthMarkers = List.copyOf(ChartDataException.requireNonNull("depth markers", depthMarkers));
        if (logConcentration) {
            for (XySeries s : profiles) {
                for (int i = 0; i < s.size(); i++) {
                    ChartDataException.positive("concentration of profile \"" + s.name() + "\" [" + i + "] ("
                            + concentrationAxis.title() + ")", s.xAt(i), "leave out non-detects or plot them at the detection limit");
                }
            }
            for (Marker m : concentrationMarkers) {
                ChartDataException.positive("concentration marker \"" + m.label() + "\"", m.value(), null);
            }
        }
    }

    /** Columns: series, concentration (unit), depth (unit); one row per point. */
    @Override
    public DataTable data() {
        return SeriesChecks.longTable(profiles, concentrationAxis, depthAxis);
    }
}
