package eluvia.report.document;

import java.util.ArrayList;
import java.util.List;

/**
 * A table: a header row of {@link Column}s (heading, unit, alignment), body rows of cell text
 * and an optional caption. Cells are text already formatted by the caller (the number of
 * significant figures is a matter of the result, not of the renderer); each row has exactly one
 * cell per column. Long tables split across pages with the header repeated.
 *
 * @param columns the columns (at least one)
 * @param rows    the body rows (may be empty), each with one cell per column; a cell may be empty
 * @param caption what the table shows, or null for none
 */
public record Table(List<Column> columns, List<List<String>> rows, String caption) implements Block {

    public Table {
        ReportContentException.requireNonNull("columns of a table", columns);
        columns = List.copyOf(columns);
        if (columns.isEmpty()) {
            throw new ReportContentException("table columns", "none", "at least one column", null);
        }
        ReportContentException.requireNonNull("rows of a table", rows);
        List<List<String>> copy = new ArrayList<>(rows.size());
        for (int r = 0; r < rows.size(); r++) {
            List<String> row = rows.get(r);
            ReportContentException.requireNonNull("table row " + (r + 1), row);
            if (row.size() != columns.size()) {
                throw new ReportContentException("table row " + (r + 1) + " (" + row + ")", row.size() + " cells",
                        "exactly " + columns.size() + " cells, one per column", "use an empty string for a blank cell");
            }
            for (int c = 0; c < row.size(); c++) {
                if (row.get(c) == null) {
                    throw new ReportContentException("cell " + (c + 1) + " of table row " + (r + 1), "missing (null)",
                            "text (may be empty)", null);
                }
            }
            copy.add(List.copyOf(row));
        }
        rows = List.copyOf(copy);
        ReportContentException.optionalText("table caption", caption);
    }

    /** Starts a table with these columns. */
    public static Builder with(Column... columns) {
        return new Builder(List.of(columns));
    }

    /** Collects rows for a {@link Table}. */
    public static final class Builder {
        private final List<Column> columns;
        private final List<List<String>> rows = new ArrayList<>();
        private String caption;

        private Builder(List<Column> columns) {
            this.columns = columns;
        }

        /** Adds a body row, one cell per column. */
        public Builder row(String... cells) {
            rows.add(List.of(cells));
            return this;
        }

        /** Sets the caption. */
        public Builder caption(String text) {
            this.caption = text;
            return this;
        }

        public Table build() {
            return new Table(columns, rows, caption);
        }
    }
}
