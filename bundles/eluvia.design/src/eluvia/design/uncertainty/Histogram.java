package eluvia.design.uncertainty;

import java.util.Arrays;
import java.util.List;

/**
 * Equal-width histogram of one output over the completed runs, from the smallest to the largest
 * value: bin i covers [lower + i w, lower + (i + 1) w) with w = (upper - lower) / bins, the last
 * bin including the upper edge. Edges are in the output's unit. When every value is the same
 * (or there are none) there is one bin of zero width.
 *
 * @param lowerEdge the lower edge of the first bin (the smallest value), in the output's unit
 * @param upperEdge the upper edge of the last bin (the largest value), in the output's unit
 * @param counts    the number of runs in each bin
 */
public record Histogram(double lowerEdge, double upperEdge, List<Integer> counts) {
    /** Copies the counts. */
    public Histogram {
        counts = List.copyOf(counts);
    }

    /** The histogram of {@code values} with {@code bins} bins (one if the values do not spread). */
    static Histogram of(double[] values, double min, double max, int bins) {
        if (values.length == 0) {
            return new Histogram(Double.NaN, Double.NaN, List.of(0));
        }
        if (!(max > min)) {
            return new Histogram(min, max, List.of(values.length));
        }
        int[] counts = new int[bins];
        double width = (max - min) / bins;
        for (double value : values) {
            int bin = (int) ((value - min) / width);
            counts[Math.max(0, Math.min(bins - 1, bin))]++;
        }
        return new Histogram(min, max, Arrays.stream(counts).boxed().toList());
    }

    /** The number of bins. */
    public int binCount() {
        return counts.size();
    }

    /** The width of every bin, in the output's unit. */
    public double binWidth() {
        return (upperEdge - lowerEdge) / counts.size();
    }

    /** The lower edge of bin {@code bin} (from 0), in the output's unit. */
    public double binLowerEdge(int bin) {
        return lowerEdge + bin * binWidth();
    }

    /** The upper edge of bin {@code bin} (from 0), in the output's unit. */
    public double binUpperEdge(int bin) {
        return bin == counts.size() - 1 ? upperEdge : lowerEdge + (bin + 1) * binWidth();
    }

    /** The number of values in all bins. */
    public int totalCount() {
        return counts.stream().mapToInt(Integer::intValue).sum();
    }
}
