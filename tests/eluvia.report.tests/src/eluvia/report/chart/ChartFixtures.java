package eluvia.report.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** One chart of every kind, with invented numbers (an invented scenario, not a site). */
final class ChartFixtures {

    private ChartFixtures() {
    }

    static LineChart residualFraction() {
        int n = 61;
        double[] pv = new double[n];
        double[] fast = new double[n];
        double[] slow = new double[n];
        for (int i = 0; i < n; i++) {
            pv[i] = 0.5 * i;
            fast[i] = Math.exp(-pv[i] / 1.6);
            slow[i] = 0.8 * Math.exp(-pv[i] / 4.2) + 0.2 * Math.exp(-pv[i] / 12);
        }
        return LineChart.of(Axis.dimensionless("Pore volumes flushed"), Axis.dimensionless("Residual fraction C/C0"), true,
                new XySeries("Invented solute, fast", pv, fast), new XySeries("Invented solute, \"slow\", tailing", pv, slow))
                .withXMarkers(new Marker(7.4, "design")).withYMarkers(new Marker(0.01, "cleanup target"));
    }

    static DepthProfile profile() {
        return new DepthProfile("", new Axis("Soil concentration", "mg/kg"), new Axis("Depth below ground", "m"),
                List.of(new XySeries("Boring 1", new double[] { 0.4, 12, 85, 40, 3 }, new double[] { 0.5, 1, 2, 3, 4 })),
                true, List.of(new Marker(5, "cleanup level")), List.of(new Marker(1.2, "layer boundary")));
    }

    static Histogram histogram() {
        Random r = new Random(11);
        double[] s = new double[500];
        for (int i = 0; i < s.length; i++) {
            s[i] = 180 * Math.exp(0.3 * r.nextGaussian());
        }
        return new Histogram("Invented durations", new Axis("Duration", "d"), s, 25,
                List.of(new Marker(140, "P10"), new Marker(180, "P50"), new Marker(240, "P90")));
    }

    static Tornado tornado() {
        return new Tornado("", new Axis("Present value of cost", "USD"), 1.0e6,
                List.of(new TornadoBar("Small", "1", "2", 0.98e6, 1.03e6), new TornadoBar("Large", "1", "2", 0.7e6, 1.4e6),
                        new TornadoBar("Middle", "1", "2", 1.2e6, 0.9e6)));
    }

    static BarChart bars(boolean stacked) {
        return new BarChart("", new Axis("Present value", "USD"), "Alternative", List.of("Flushing", "Excavation"),
                List.of(new BarSeries("Capital", new double[] { 6.2e5, 1.45e6 }),
                        new BarSeries("Operation", new double[] { 5.4e5, 3e4 })), stacked);
    }

    static PlanView plan() {
        List<ValuePoint> pts = new ArrayList<>();
        Random r = new Random(5);
        for (int i = 0; i < 30; i++) {
            pts.add(new ValuePoint("S-" + i, 100 * r.nextDouble(), 20 * r.nextDouble(), 0.5 + 100 * r.nextDouble()));
        }
        return new PlanView("", new Axis("Easting", "m"), new Axis("Northing", "m"), new Axis("Soil concentration", "mg/kg"),
                pts, List.of(new Outline("Zone A", new double[] { 20, 60, 60, 20 }, new double[] { 5, 5, 15, 15 })), true);
    }

    /**
     * An invented plan over a 40 x 20 grid of cells whose values rise from the west (0.01) to the
     * east (100) across a level of 1, with a zone, a proposed and a grown outline.
     */
    static PlanView planWithCells() {
        int nx = 40;
        int ny = 20;
        double[] v = new double[nx * ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                v[i + nx * j] = j == ny - 1 && i < 3 ? Double.NaN : Math.pow(10, -2 + 4.0 * i / (nx - 1));
            }
        }
        ValueGrid grid = new ValueGrid("Invented cells", 0, 0, 2.5, 2.5, nx, ny, 100, 50, v);
        List<ValuePoint> pts = List.of(new ValuePoint("A", 10, 10, 0.05), new ValuePoint("B", 80, 30, 40));
        List<Outline> outlines = List.of(
                new Outline("Boundary", new double[] { 0, 100, 100, 0 }, new double[] { 0, 0, 50, 50 }, Outline.Kind.BOUNDARY),
                new Outline("Zone", new double[] { 60, 80, 80, 60 }, new double[] { 20, 20, 35, 35 }),
                new Outline("Proposed", new double[] { 52, 98, 98, 52 }, new double[] { 2, 2, 48, 48 }, Outline.Kind.PROPOSED),
                new Outline("Zone grown", new double[] { 58, 82, 82, 58 }, new double[] { 18, 18, 37, 37 },
                        Outline.Kind.ENLARGED));
        return new PlanView("", new Axis("Easting", "m"), new Axis("Northing", "m"), new Axis("Invented value", "mg/kg"),
                pts, outlines, true, "Invented points", grid, new Marker(1, "level 1"));
    }

    static SectionView section(double exaggeration) {
        List<ValuePoint> pts = List.of(new ValuePoint("P-1", 5, 0.5, 3), new ValuePoint("P-2", 25, 2.5, 90),
                new ValuePoint("P-3", 45, 4.0, 10));
        return new SectionView("", new Axis("Distance along section", "m"), new Axis("Depth below ground", "m"),
                new Axis("Soil concentration", "mg/kg"), pts,
                List.of(new Outline("Zone", new double[] { 15, 35, 35, 15 }, new double[] { 1, 1, 3.5, 3.5 })), false,
                exaggeration, List.of(new Marker(1.2, "fill / sand")));
    }

    static List<ChartSpec> all() {
        return List.of(residualFraction(), profile(), histogram(), tornado(), bars(true), bars(false), plan(), planWithCells(),
                section(4));
    }
}
