package eluvia.report.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The numbers behind each chart kind and the CSV they are written to. */
final class ChartDataTest {

    static Stream<ChartSpec> everyKind() {
        return ChartFixtures.all().stream();
    }

    /** Parses CSV with Commons CSV 1.14.1 (RFC 4180), an independent reader of what we write. */
    private static List<List<String>> parse(String csv) throws IOException {
        List<List<String>> rows = new ArrayList<>();
        try (CSVParser p = CSVFormat.RFC4180.parse(new StringReader(csv))) {
            for (CSVRecord r : p) {
                rows.add(r.toList());
            }
        }
        return rows;
    }

    @ParameterizedTest
    @MethodSource("everyKind")
    void csvReadsBackToTheSameTable(ChartSpec chart) throws IOException {
        DataTable data = chart.data();
        List<List<String>> rows = parse(data.toCsv());
        assertEquals(data.headers(), rows.get(0));
        assertEquals(data.rows(), rows.subList(1, rows.size()));
        for (String header : data.headers().subList(data.headers().size() - 1, data.headers().size())) {
            assertTrue(header.endsWith(")"), "the last column is a quantity with its unit: " + header);
        }
    }

    @Test
    void lineChartCsvHoldsEveryPointExactly() throws IOException {
        LineChart c = ChartFixtures.residualFraction();
        List<List<String>> rows = parse(c.data().toCsv());
        assertEquals(List.of("series", "Pore volumes flushed (-)", "Residual fraction C/C0 (-)"), rows.get(0));
        int row = 1;
        for (XySeries s : c.series()) {
            double[] x = s.x();
            double[] y = s.y();
            for (int i = 0; i < x.length; i++, row++) {
                assertEquals(s.name(), rows.get(row).get(0));
                // Double.toString is the shortest text that reads back to the same double (Java SE 19+ spec; true of 17 too)
                assertEquals(x[i], Double.parseDouble(rows.get(row).get(1)));
                assertEquals(y[i], Double.parseDouble(rows.get(row).get(2)));
            }
        }
        assertEquals(rows.size(), row);
    }

    @Test
    void csvQuotesCommasQuotesAndLineBreaks() {
        DataTable t = new DataTable(List.of("name", "value (m)"), List.of(List.of("a, \"b\"", "1.0"), List.of("two\nlines", "2.0")));
        // RFC 4180 section 2: fields with commas, quotes or line breaks are quoted, quotes doubled; CRLF ends records
        assertEquals("name,value (m)\r\n\"a, \"\"b\"\"\",1.0\r\n\"two\nlines\",2.0\r\n", t.toCsv());
    }

    @Test
    void histogramBinsSplitTheRangeEvenly() {
        Histogram h = new Histogram("", new Axis("Duration", "d"), new double[] { 0, 1, 2, 3, 4, 5, 6, 7, 8, 9 }, 5,
                List.of());
        // by hand: width 9 / 5 = 1.8; [0,1.8) holds 0,1; [1.8,3.6) 2,3; [3.6,5.4) 4,5; [5.4,7.2) 6,7; [7.2,9] 8,9
        List<Bin> bins = h.bins();
        assertEquals(5, bins.size());
        double[] lower = { 0, 1.8, 3.6, 5.4, 7.2 };
        for (int i = 0; i < 5; i++) {
            assertEquals(lower[i], bins.get(i).lower(), 1e-12);
            assertEquals(2, bins.get(i).count());
        }
        assertEquals(9.0, bins.get(4).upper());
    }

    @Test
    void histogramCountsEverySampleOnce() {
        Histogram h = ChartFixtures.histogram();
        double[] samples = h.samples();
        int total = 0;
        List<Bin> bins = h.bins();
        for (Bin b : bins) {
            int inside = 0;
            boolean last = b == bins.get(bins.size() - 1);
            for (double v : samples) {
                if (v >= b.lower() && (v < b.upper() || last && v == b.upper())) {
                    inside++;
                }
            }
            // recount by the bin's own edges, independently of the binning arithmetic
            assertEquals(inside, b.count());
            total += b.count();
        }
        assertEquals(samples.length, total);
    }

    @Test
    void histogramOfEqualSamplesIsOneBar() {
        List<Bin> bins = new Histogram("", new Axis("Duration", "d"), new double[] { 5, 5, 5 }, 10, List.of()).bins();
        assertEquals(1, bins.size());
        assertEquals(3, bins.get(0).count());
        assertTrue(bins.get(0).lower() < 5 && bins.get(0).upper() > 5);
    }

    @Test
    void tornadoPutsTheWidestSwingOnTop() {
        List<String> order = ChartFixtures.tornado().sortedBars().stream().map(TornadoBar::input).toList();
        // swings by hand: Large 0.7e6, Middle 0.3e6, Small 0.05e6
        assertEquals(List.of("Large", "Middle", "Small"), order);
    }

    @Test
    void arraysAreCopiedInAndOut() {
        double[] x = { 1, 2 };
        double[] y = { 3, 4 };
        XySeries s = new XySeries("s", x, y);
        x[0] = 99;
        s.x()[1] = 99;
        assertArrayEquals(new double[] { 1, 2 }, s.x());
    }

    @Test
    void badChartDataIsRefusedWithTheItemNamed() {
        double[] ok = { 1, 2 };
        ChartDataException e = assertThrows(ChartDataException.class,
                () -> new XySeries("s", new double[] { 1, Double.NaN }, ok));
        assertTrue(e.getMessage().contains("x of series \"s\" [1]"), e.getMessage());
        assertThrows(ChartDataException.class, () -> new XySeries("s", ok, new double[] { 1 }));
        assertThrows(ChartDataException.class, () -> new XySeries("s", new double[0], new double[0]));
        assertThrows(ChartDataException.class, () -> new XySeries(" ", ok, ok));
        e = assertThrows(ChartDataException.class, () -> LineChart.of(Axis.dimensionless("PV"),
                Axis.dimensionless("C/C0"), true, new XySeries("s", ok, new double[] { 1, 0 })));
        assertTrue(e.getMessage().contains("logarithmic"), e.getMessage());
        assertThrows(ChartDataException.class, () -> LineChart.of(Axis.dimensionless("PV"), Axis.dimensionless("C/C0"),
                false, new XySeries("same", ok, ok), new XySeries("same", ok, ok)));
        assertThrows(ChartDataException.class, () -> LineChart.of(Axis.dimensionless("PV"), Axis.dimensionless("C/C0"),
                false));
        assertThrows(ChartDataException.class, () -> new Axis("Depth", " "));
        assertThrows(ChartDataException.class, () -> new Marker(Double.POSITIVE_INFINITY, "m"));
        assertThrows(ChartDataException.class, () -> new Histogram("", new Axis("D", "d"), new double[0], 5, List.of()));
        assertThrows(ChartDataException.class, () -> new Histogram("", new Axis("D", "d"), ok, 0, List.of()));
        assertThrows(ChartDataException.class,
                () -> new Histogram("", new Axis("D", "d"), ok, Histogram.MAX_BINS + 1, List.of()));
        assertThrows(ChartDataException.class, () -> new Tornado("", new Axis("PV", "USD"), 1, List.of()));
        assertThrows(ChartDataException.class, () -> new TornadoBar("x", "1", "2", Double.NaN, 1));
        assertThrows(ChartDataException.class, () -> new BarChart("", new Axis("PV", "USD"), "Alternative",
                List.of("a", "b"), List.of(new BarSeries("s", new double[] { 1 })), true));
        assertThrows(ChartDataException.class, () -> new BarChart("", new Axis("PV", "USD"), "Alternative",
                List.of("a", "a"), List.of(new BarSeries("s", ok)), true));
        assertThrows(ChartDataException.class, () -> new Outline("z", new double[] { 0, 1 }, new double[] { 0, 1 }));
        assertThrows(ChartDataException.class, () -> new ValuePoint("p", 0, 0, Double.NaN));
    }

    @Test
    void mapsAreDrawnInOneUnitAndWithinAStatedExaggeration() {
        List<ValuePoint> p = List.of(new ValuePoint("p", 0, 0, 1));
        ChartDataException e = assertThrows(ChartDataException.class, () -> new PlanView("", new Axis("Easting", "m"),
                new Axis("Northing", "ft"), new Axis("C", "mg/kg"), p, List.of(), false));
        assertTrue(e.getMessage().contains("m and ft"), e.getMessage());
        for (double bad : new double[] { 0.05, 101, Double.NaN }) {
            assertThrows(ChartDataException.class, () -> new SectionView("", new Axis("Distance", "m"),
                    new Axis("Depth", "m"), new Axis("C", "mg/kg"), p, List.of(), false, bad, List.of()));
        }
        assertThrows(ChartDataException.class, () -> new PlanView("", new Axis("Easting", "m"), new Axis("Northing", "m"),
                new Axis("C", "mg/kg"), List.of(), List.of(), false));
        assertThrows(ChartDataException.class, () -> new PlanView("", new Axis("Easting", "m"), new Axis("Northing", "m"),
                new Axis("C", "mg/kg"), List.of(new ValuePoint("p", 0, 0, 0)), List.of(), true));
    }

    @Test
    void paletteScaleRunsFromPaleToDark() {
        java.awt.Color pale = Palette.sequential(0);
        java.awt.Color dark = Palette.sequential(1);
        assertEquals(pale, Palette.sequential(-3));
        assertEquals(dark, Palette.sequential(7));
        assertTrue(pale.getRed() + pale.getGreen() + pale.getBlue() > 3 * 200);
        assertTrue(dark.getRed() + dark.getGreen() + dark.getBlue() < 3 * 100);
        assertEquals("#1b666e", Palette.hex(Palette.ACCENT));
        assertEquals(Palette.series(0), Palette.series(Palette.SERIES.size()));
    }

    @Test
    void powersOfTenArePrintedAsPlainNumbers() {
        PowerOfTenFormat f = new PowerOfTenFormat();
        // 10^x worked out by hand
        assertEquals("1", f.format(0.0));
        assertEquals("0.01", f.format(-2.0));
        assertEquals("1000", f.format(3.0));
        assertEquals("1E-6", f.format(-6.0));
        assertEquals("1E7", f.format(7.0));
        assertEquals("3.16", f.format(0.5));
    }
}
