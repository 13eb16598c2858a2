package eluvia.report.chart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The spread of a sampled result (e.g. Monte Carlo realisations of the duration) as bars of equal
 * width from the smallest to the largest sample, with marker lines such as P10, P50 and P90 (the
 * caller computes the percentiles, so the chart shows the same numbers as the text).
 *
 * @param title     title, or "" for none
 * @param valueAxis the sampled quantity, e.g. "Duration (d)"
 * @param samples   the samples, finite (at least one); copied
 * @param binCount  number of bars, 1 to 200
 * @param markers   vertical lines at values of the quantity (may be empty)
 */
public record Histogram(String title, Axis valueAxis, double[] samples, int binCount, List<Marker> markers)
        implements ChartSpec {

    /** The most bars a histogram may have. */
    public static final int MAX_BINS = 200;

    /** The label of the count axis. */
    public static final String COUNT_LABEL = "Number of samples";

    public Histogram {
        title = ChartDataException.optionalTitle(title);
        ChartDataException.requireNonNull("value axis", valueAxis);
        samples = ChartDataException.finiteCopy("samples of " + valueAxis.title(), samples);
        if (samples.length == 0) {
            throw new ChartDataException("samples of " + valueAxis.title(), "empty", "at least one sample", null);
        }
        if (binCount < 1 || binCount > MAX_BINS) {
            throw new ChartDataException("number of histogram bins", Integer.toString(binCount), "1 to " + MAX_BINS,
                    "about the square root of the number of samples is usual");
        }
        markers = List.copyOf(ChartDataException.requireNonNull("histogram markers", markers));
    }

    /** The samples (a copy). */
    @Override
    public double[] samples() {
        return samples.clone();
    }

    /**
     * The bars: {@code binCount} bins of equal width from the smallest to the largest sample. When
     * every sample is the same value v, one bin from v - w/2 to v + w/2 with w = max(|v| 1e-3, 1e-9).
     */
    public List<Bin> bins() {
        double min = Arrays.stream(samples).min().orElseThrow();
        double max = Arrays.stream(samples).max().orElseThrow();
        if (min == max) {
            double w = Math.max(Math.abs(min) * 1e-3, 1e-9);
            return List.of(new Bin(min - w / 2, min + w / 2, samples.length));
        }
        double width = (max - min) / binCount;
        double[] edges = new double[binCount + 1];
        for (int i = 0; i < binCount; i++) {
            edges[i] = min + i * width;
        }
        edges[binCount] = max;
        int[] counts = new int[binCount];
        for (double v : samples) {
            int i = Math.min(Math.max((int) Math.floor((v - min) / width), 0), binCount - 1);
            // the division may round across an edge: settle on the bin whose edges hold the value
            while (i > 0 && v < edges[i]) {
                i--;
            }
            while (i < binCount - 1 && v >= edges[i + 1]) {
                i++;
            }
            counts[i]++;
        }
        List<Bin> bins = new ArrayList<>(binCount);
        for (int i = 0; i < binCount; i++) {
            bins.add(new Bin(edges[i], edges[i + 1], counts[i]));
        }
        return bins;
    }

    /** Columns: bin lower edge (unit), bin upper edge (unit), number of samples (-). */
    @Override
    public DataTable data() {
        List<List<String>> rows = new ArrayList<>();
        for (Bin b : bins()) {
            rows.add(List.of(DataTable.number(b.lower()), DataTable.number(b.upper()), Integer.toString(b.count())));
        }
        return new DataTable(List.of("bin lower edge: " + valueAxis.title(), "bin upper edge: " + valueAxis.title(),
                COUNT_LABEL + " (" + Axis.DIMENSIONLESS + ")"), rows);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Histogram h && h.title.equals(title) && h.valueAxis.equals(valueAxis)
                && Arrays.equals(h.samples, samples) && h.binCount == binCount && h.markers.equals(markers);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(samples) * 31 + valueAxis.hashCode() + binCount;
    }

    @Override
    public String toString() {
        return "Histogram[" + valueAxis.title() + ", " + samples.length + " samples, " + binCount + " bins]";
    }
}
