package eluvia.report.chart;

import java.util.ArrayList;
import java.util.List;

/**
 * Several series against one x axis, e.g. residual fraction C/C0 against pore volumes flushed for
 * each contaminant, with vertical markers at the design pore volumes and a horizontal marker at the
 * cleanup target. With {@code logY} the y axis is logarithmic (then every y value must be above 0).
 *
 * @param title    title above the plot, or "" for none
 * @param xAxis    the x axis (label and unit)
 * @param yAxis    the y axis (label and unit)
 * @param series   the series (at least one)
 * @param logY     whether the y axis is logarithmic
 * @param xMarkers vertical lines at x values (may be empty)
 * @param yMarkers horizontal lines at y values (may be empty)
 */
public record LineChart(String title, Axis xAxis, Axis yAxis, List<XySeries> series, boolean logY, List<Marker> xMarkers,
        List<Marker> yMarkers) implements ChartSpec {

    public LineChart {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("x axis", xAxis);
        ChartDataException.requireNonNull("y axis", yAxis);
        series = SeriesChecks.nonEmpty("series of line chart", series);
        xMarkers = List.copyOf(ChartDataException.requireNonNull("x markers", xMarkers));
        yMarkers = List.copyOf(ChartDataException.requireNonNull("y markers", yMarkers));
        if (logY) {
            for (XySeries s : series) {
                for (int i = 0; i < s.size(); i++) {
                    ChartDataException.positive("y of series \"" + s.name() + "\" [" + i + "] (" + yAxis.title() + ")",
                            s.yAt(i), "leave out points at or below 0, or use a linear y axis");
                }
            }
            for (Marker m : yMarkers) {
                ChartDataException.positive("y marker \"" + m.label() + "\"", m.value(), null);
            }
        }
    }

    /** A line chart without title or markers. */
    public static LineChart of(Axis xAxis, Axis yAxis, boolean logY, XySeries... series) {
        return new LineChart("", xAxis, yAxis, List.of(series), logY, List.of(), List.of());
    }

    /** The same chart with these vertical markers. */
    public LineChart withXMarkers(Marker... markers) {
        return new LineChart(title, xAxis, yAxis, series, logY, List.of(markers), yMarkers);
    }

    /** The same chart with these horizontal markers. */
    public LineChart withYMarkers(Marker... markers) {
        return new LineChart(title, xAxis, yAxis, series, logY, xMarkers, List.of(markers));
    }

    /** Columns: series, x (unit), y (unit); one row per point. */
    @Override
    public DataTable data() {
        return SeriesChecks.longTable(series, xAxis, yAxis);
    }
}
