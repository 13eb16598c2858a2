package eluvia.report.chart;

import java.util.ArrayList;
import java.util.List;

/** Checks and tables shared by the chart kinds made of {@link XySeries}. */
final class SeriesChecks {

    private SeriesChecks() {
    }

    static List<XySeries> nonEmpty(String item, List<XySeries> series) {
        ChartDataException.requireNonNull(item, series);
        List<XySeries> copy = List.copyOf(series);
        if (copy.isEmpty()) {
            throw new ChartDataException(item, "empty", "at least one series", null);
        }
        java.util.Set<String> names = new java.util.HashSet<>();
        for (XySeries s : copy) {
            if (!names.add(s.name())) {
                throw new ChartDataException("series name \"" + s.name() + "\" in " + item, "used twice",
                        "unique names (they are the legend entries)", null);
            }
        }
        return copy;
    }

    /** Series, x, y: one row per point. */
    static DataTable longTable(List<XySeries> series, Axis x, Axis y) {
        List<List<String>> rows = new ArrayList<>();
        for (XySeries s : series) {
            for (int i = 0; i < s.size(); i++) {
                rows.add(List.of(s.name(), DataTable.number(s.xAt(i)), DataTable.number(s.yAt(i))));
            }
        }
        return new DataTable(List.of("series", x.title(), y.title()), rows);
    }
}
