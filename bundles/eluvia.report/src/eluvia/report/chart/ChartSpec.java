package eluvia.report.chart;

/**
 * What to draw, as plain data (no site model, no drawing library types): one of the chart kinds of
 * a design package. {@link Charts} turns a spec into a picture (PNG or any {@code Graphics2D},
 * such as a PDF page); {@link #data()} gives the numbers it shows, for the CSV beside the picture.
 * Every axis carries its unit.
 */
public sealed interface ChartSpec permits LineChart, DepthProfile, Histogram, Tornado, BarChart, PlanView, SectionView {

    /** The title drawn above the plot; empty for none (a document figure usually has a caption instead). */
    String title();

    /** The numbers the chart shows, with units in the headers. */
    DataTable data();
}
