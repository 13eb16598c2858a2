package eluvia.report.chart;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;

/**
 * Vertical bars by category, e.g. cost by alternative broken down into capital, operation and
 * periodic costs: stacked (one bar per category, the series on top of each other) or grouped
 * (one bar per series side by side).
 *
 * @param title         title, or "" for none
 * @param valueAxis     the value, e.g. "Present value (USD)"
 * @param categoryLabel what the categories are, e.g. "Alternative"
 * @param categories    the category names, unique (at least one)
 * @param series        the series (at least one), each with one value per category
 * @param stacked       stacked if true, grouped if false
 */
public record BarChart(String title, Axis valueAxis, String categoryLabel, List<String> categories, List<BarSeries> series,
        boolean stacked) implements ChartSpec {

    public BarChart {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("value axis", valueAxis);
        ChartDataException.requireText("category label", categoryLabel);
        categories = List.copyOf(ChartDataException.requireNonNull("categories", categories));
        if (categories.isEmpty()) {
            throw new ChartDataException("categories of bar chart", "empty", "at least one category", null);
        }
        if (new HashSet<>(categories).size() != categories.size()) {
            throw new ChartDataException("categories of bar chart", categories.toString(), "unique names", null);
        }
        series = List.copyOf(ChartDataException.requireNonNull("bar series", series));
        if (series.isEmpty()) {
            throw new ChartDataException("series of bar chart", "empty", "at least one series", null);
        }
        if (series.stream().map(BarSeries::name).distinct().count() != series.size()) {
            throw new ChartDataException("series names of bar chart", series.stream().map(BarSeries::name).toList().toString(),
                    "unique names (they are the legend entries)", null);
        }
        for (BarSeries s : series) {
            if (s.values().length != categories.size()) {
                throw new ChartDataException("values of bar series \"" + s.name() + "\"", s.values().length + " values",
                        "exactly " + categories.size() + ", one per category " + categories, null);
            }
        }
    }

    /** Columns: category, series, value (unit); one row per bar segment. */
    @Override
    public DataTable data() {
        List<List<String>> rows = new ArrayList<>();
        for (int c = 0; c < categories.size(); c++) {
            for (BarSeries s : series) {
                rows.add(List.of(categories.get(c), s.name(), DataTable.number(s.valueAt(c))));
            }
        }
        return new DataTable(List.of(categoryLabel, "series", valueAxis.title()), rows);
    }
}
