package eluvia.report.chart;

import java.util.ArrayList;
import java.util.List;

/**
 * The numbers a chart shows, as a table for a CSV file beside the picture: a header whose numeric
 * columns carry their units ("Depth below ground (m)") and rows of cell text. Numbers are written
 * with {@link Double#toString(double)}, which reads back to exactly the same double.
 *
 * @param headers the column headers (at least one)
 * @param rows    the rows, each with one cell per header
 */
public record DataTable(List<String> headers, List<List<String>> rows) {

    public DataTable {
        ChartDataException.requireNonNull("data table headers", headers);
        headers = List.copyOf(headers);
        if (headers.isEmpty()) {
            throw new ChartDataException("data table headers", "none", "at least one column", null);
        }
        List<List<String>> copy = new ArrayList<>(rows.size());
        for (int r = 0; r < rows.size(); r++) {
            List<String> row = rows.get(r);
            if (row.size() != headers.size()) {
                throw new ChartDataException("data table row " + (r + 1), row.size() + " cells",
                        "exactly " + headers.size() + " cells, one per header", null);
            }
            copy.add(List.copyOf(row));
        }
        rows = List.copyOf(copy);
    }

    /** The text of a number in a cell: {@link Double#toString(double)} (shortest text that reads back exactly). */
    public static String number(double value) {
        return Double.toString(value);
    }

    /**
     * The table as CSV (RFC 4180): comma-separated, CRLF line ends, fields quoted when they hold a
     * comma, a quote or a line break, quotes doubled inside quoted fields; header first.
     */
    public String toCsv() {
        StringBuilder b = new StringBuilder(64 + rows.size() * 32);
        line(b, headers);
        for (List<String> row : rows) {
            line(b, row);
        }
        return b.toString();
    }

    private static void line(StringBuilder b, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                b.append(',');
            }
            String c = cells.get(i);
            if (c.indexOf(',') >= 0 || c.indexOf('"') >= 0 || c.indexOf('\n') >= 0 || c.indexOf('\r') >= 0) {
                b.append('"').append(c.replace("\"", "\"\"")).append('"');
            } else {
                b.append(c);
            }
        }
        b.append("\r\n");
    }
}
