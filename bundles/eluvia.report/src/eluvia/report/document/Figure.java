package eluvia.report.document;

import java.util.regex.Pattern;

import eluvia.report.chart.ChartSpec;

/**
 * A chart with its caption. Its {@code id} names the files written for it beside the HTML
 * ({@code <id>.png} for the picture, {@code <id>.csv} for the data the chart shows, with units in
 * the header), so it must be a safe file name and unique in its document.
 *
 * @param id      lower-case letters, digits and hyphens, starting with a letter or digit, at most 64
 *                characters, e.g. "residual-fraction"
 * @param chart   what to draw (plain data; see {@link ChartSpec})
 * @param caption what the figure shows and where its numbers come from
 */
public record Figure(String id, ChartSpec chart, String caption) implements Block {

    private static final Pattern ID = Pattern.compile("[a-z0-9][a-z0-9-]{0,63}");

    public Figure {
        if (id == null || !ID.matcher(id).matches()) {
            throw new ReportContentException("figure id", id == null ? "missing (null)" : "\"" + id + "\"",
                    "1 to 64 lower-case letters, digits and hyphens, starting with a letter or digit",
                    "the id becomes the file names <id>.png and <id>.csv");
        }
        ReportContentException.requireNonNull("chart of figure \"" + id + "\"", chart);
        ReportContentException.requireText("caption of figure \"" + id + "\"", caption);
    }
}
