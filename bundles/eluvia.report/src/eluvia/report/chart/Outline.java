package eluvia.report.chart;

import java.util.Arrays;

/**
 * A closed polygon drawn over a {@link PlanView} or a {@link SectionView}: a treatment zone, an
 * excavation outline, a site boundary. Vertices in the units of the view's axes; the last joins
 * the first. Its {@link Kind} sets how it is drawn.
 *
 * @param name the label drawn inside it (section) or beside its line in the legend (plan), e.g. "Zone A"
 * @param x    x of the vertices (at least 3), finite; copied
 * @param y    y of the vertices, as many as x; copied
 * @param kind what the outline is (sets the line style)
 */
public record Outline(String name, double[] x, double[] y, Kind kind) {

    /** What an outline is; each kind has a line style of its own. */
    public enum Kind {
        /** A zone as entered: solid accent line over a faint tint. */
        ZONE,
        /** The site boundary: thin muted line, no fill. */
        BOUNDARY,
        /** A zone proposed from the data (e.g. from a block model): dashed ink line, no fill. */
        PROPOSED,
        /** A zone grown from another (e.g. by dispersion after a delay): dashed ochre line, no fill. */
        ENLARGED
    }

    public Outline {
        ChartDataException.requireText("outline name", name);
        ChartDataException.requireNonNull("kind of outline \"" + name + "\"", kind);
        x = ChartDataException.finiteCopy("x of outline \"" + name + "\"", x);
        y = ChartDataException.finiteCopy("y of outline \"" + name + "\"", y);
        if (x.length != y.length || x.length < 3) {
            throw new ChartDataException("outline \"" + name + "\"", x.length + " x and " + y.length + " y values",
                    "as many y as x values, at least 3 vertices", null);
        }
    }

    /** A zone outline ({@link Kind#ZONE}). */
    public Outline(String name, double[] x, double[] y) {
        this(name, x, y, Kind.ZONE);
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    /** x0, y0, x1, y1, ... as drawing libraries take polygons. */
    double[] interleaved() {
        double[] xy = new double[2 * x.length];
        for (int i = 0; i < x.length; i++) {
            xy[2 * i] = x[i];
            xy[2 * i + 1] = y[i];
        }
        return xy;
    }

    /** The vertex mean, where the label goes. */
    double labelX() {
        return Arrays.stream(x).average().orElseThrow();
    }

    double labelY() {
        return Arrays.stream(y).average().orElseThrow();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Outline p && p.name.equals(name) && Arrays.equals(p.x, x) && Arrays.equals(p.y, y)
                && p.kind == kind;
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(x) + Arrays.hashCode(y);
    }

    @Override
    public String toString() {
        return "Outline[" + name + ", " + kind + ", " + x.length + " vertices]";
    }
}
