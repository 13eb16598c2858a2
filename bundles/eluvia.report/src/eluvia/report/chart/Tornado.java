package eluvia.report.chart;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * One-at-a-time sensitivity: a horizontal bar per uncertain input from the base result to the
 * result at the input's low and high values, sorted with the widest swing on top.
 *
 * @param title      title, or "" for none
 * @param resultAxis the result, e.g. "Present value of cost (USD)"
 * @param baseResult the result with every input at base, in the result's unit
 * @param bars       the inputs (at least one), in any order
 */
public record Tornado(String title, Axis resultAxis, double baseResult, List<TornadoBar> bars) implements ChartSpec {

    public Tornado {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("result axis", resultAxis);
        ChartDataException.finite("base result (" + resultAxis.title() + ")", baseResult);
        bars = List.copyOf(ChartDataException.requireNonNull("tornado bars", bars));
        if (bars.isEmpty()) {
            throw new ChartDataException("tornado bars", "empty", "at least one input", null);
        }
    }

    /** The bars by decreasing swing (ties keep their given order): the order drawn from the top. */
    public List<TornadoBar> sortedBars() {
        List<TornadoBar> sorted = new ArrayList<>(bars);
        sorted.sort(Comparator.comparingDouble(TornadoBar::swing).reversed());
        return sorted;
    }

    /** Columns: input, low value, high value, result at low, result at high, base result (units of the result). */
    @Override
    public DataTable data() {
        List<List<String>> rows = new ArrayList<>();
        for (TornadoBar b : sortedBars()) {
            rows.add(List.of(b.input(), b.lowInputLabel(), b.highInputLabel(), DataTable.number(b.resultAtLow()),
                    DataTable.number(b.resultAtHigh()), DataTable.number(baseResult)));
        }
        String u = " (" + resultAxis.unit() + ")";
        return new DataTable(List.of("input", "low value", "high value", "result at low" + u, "result at high" + u,
                "base result" + u), rows);
    }
}
