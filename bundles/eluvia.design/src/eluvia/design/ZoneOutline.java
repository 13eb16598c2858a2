package eluvia.design;

import java.util.Arrays;
import java.util.Optional;

import eluvia.cost.CostInputException;
import eluvia.cost.PitFootprint;
import eluvia.design.internal.Polygons;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;

/**
 * The plan outline of an entered treatment zone as the pipeline prices it, with its corners, so
 * that a plan can draw the same outline the take-offs measure: the zone's footprint polygon when it
 * is convex, else the polygon's convex hull (a pit with uniformly sloped sides must enclose it; the
 * choice of {@code ExcavationTakeOff.footprintOf}). {@link #grownBy} moves every side outward by a
 * distance, the corners along their bisectors (mitred corners): the outline the cost of delay
 * prices after a delay, whose area is A + P d + K d^2 with K the sum of tan(phi/2) over the
 * corners' exterior angles phi (eluvia.cost {@link PitFootprint#convexPolygon} and
 * {@link PitFootprint#offset}).
 *
 * <p>Corners counter-clockwise, eastings and northings in metres of the site's frame; the last
 * corner joins the first.
 *
 * @param eastingMetres  easting of each corner, m (copied)
 * @param northingMetres northing of each corner, m (copied)
 * @param grownMetres    how far the sides were moved outward from the zone's outline, m (0 for the outline itself)
 * @param basis          what the outline is, for captions
 * @param convexHull     whether the outline is the convex hull of a footprint that is not convex
 */
public record ZoneOutline(double[] eastingMetres, double[] northingMetres, double grownMetres, String basis,
        boolean convexHull) {

    /** Copies the arrays. */
    public ZoneOutline {
        eastingMetres = eastingMetres.clone();
        northingMetres = northingMetres.clone();
    }

    /**
     * The outline of an entered zone: its footprint polygon (counter-clockwise) when convex, else the
     * polygon's convex hull; empty when the zone has no footprint polygon (only an area: it cannot
     * be placed on the site). The excavation take-off prices this outline
     * ({@code ExcavationTakeOff.footprintOf}), so the choice is made here only.
     */
    public static Optional<ZoneOutline> of(TreatmentZone zone) {
        int n = zone.getFootprint().size();
        if (n < 3) {
            return Optional.empty();
        }
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            Vertex v = zone.getFootprint().get(i);
            x[i] = v.getEastingMetres();
            y[i] = v.getNorthingMetres();
        }
        try {
            PitFootprint.convexPolygon(x, y);
        } catch (CostInputException notConvex) {
            double[][] hull = Polygons.convexHull(x, y);
            return Optional.of(new ZoneOutline(hull[0], hull[1], 0, "the convex hull of the footprint polygon of zone "
                    + zone.getName(), true));
        }
        if (twiceSignedArea(x, y) < 0) {
            reverse(x);
            reverse(y);
        }
        return Optional.of(new ZoneOutline(x, y, 0, "the footprint polygon of zone " + zone.getName(), false));
    }

    /**
     * This outline with every side moved outward by {@code distanceMetres} and each corner along its
     * bisector (mitred), counter-clockwise.
     *
     * @param distanceMetres how far, m, 0 or more
     * @param basis          what the grown outline is, for captions
     * @throws IllegalArgumentException for a negative or non-finite distance
     */
    public ZoneOutline grownBy(double distanceMetres, String basis) {
        if (!(distanceMetres >= 0 && Double.isFinite(distanceMetres))) {
            throw new IllegalArgumentException("distance to grow the outline of " + this.basis + " (m) is "
                    + distanceMetres + "; allowed: a finite number, 0 or more");
        }
        int n = eastingMetres.length;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            int prev = (i + n - 1) % n;
            int next = (i + 1) % n;
            // outward unit normals of the sides into and out of corner i (counter-clockwise: to the right)
            double[] a = outwardNormal(eastingMetres[prev], northingMetres[prev], eastingMetres[i], northingMetres[i]);
            double[] b = outwardNormal(eastingMetres[i], northingMetres[i], eastingMetres[next], northingMetres[next]);
            // the corner moves to where both sides moved by d meet: d (a + b) / (1 + a.b)
            double k = distanceMetres / (1 + a[0] * b[0] + a[1] * b[1]);
            x[i] = eastingMetres[i] + k * (a[0] + b[0]);
            y[i] = northingMetres[i] + k * (a[1] + b[1]);
        }
        return new ZoneOutline(x, y, grownMetres + distanceMetres, basis, convexHull);
    }

    /** The enclosed area, m2 (shoelace formula). */
    public double areaSquareMetres() {
        return 0.5 * Math.abs(twiceSignedArea(eastingMetres, northingMetres));
    }

    @Override
    public double[] eastingMetres() {
        return eastingMetres.clone();
    }

    @Override
    public double[] northingMetres() {
        return northingMetres.clone();
    }

    private static double[] outwardNormal(double x0, double y0, double x1, double y1) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double len = Math.hypot(dx, dy);
        return new double[] { dy / len, -dx / len };
    }

    private static double twiceSignedArea(double[] x, double[] y) {
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            int j = (i + 1) % x.length;
            s += (x[i] - x[0]) * (y[j] - y[0]) - (x[j] - x[0]) * (y[i] - y[0]);
        }
        return s;
    }

    private static void reverse(double[] v) {
        for (int i = 0, j = v.length - 1; i < j; i++, j--) {
            double t = v[i];
            v[i] = v[j];
            v[j] = t;
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ZoneOutline z && Arrays.equals(z.eastingMetres, eastingMetres)
                && Arrays.equals(z.northingMetres, northingMetres) && z.grownMetres == grownMetres && z.basis.equals(basis) && z.convexHull == convexHull;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(eastingMetres) * 31 + Arrays.hashCode(northingMetres);
    }

    @Override
    public String toString() {
        return "ZoneOutline[" + basis + ", " + eastingMetres.length + " corners]";
    }
}
