package eluvia.report.chart;

/**
 * One bar of a {@link Histogram}: the samples with {@code lower <= value < upper} (the last bin
 * also holds its upper edge). Edges are in the unit of the histogram's value axis.
 *
 * @param lower lower edge
 * @param upper upper edge
 * @param count how many samples fall in it
 */
public record Bin(double lower, double upper, int count) {
}
