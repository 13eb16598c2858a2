package eluvia.zone.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Convex hull of points on an integer lattice by Andrew's monotone chain (Andrew 1979, Inf.
 * Process. Lett. 9:216). Integer coordinates keep every orientation test exact; collinear
 * points on the hull's edges are dropped.
 */
public final class ConvexHull {
    private ConvexHull() {
    }

    /**
     * The hull of the points {@code (xs[p], ys[p])}, counter-clockwise, starting from the point
     * with the smallest x (then smallest y). One or two distinct points give a degenerate hull of
     * that many vertices.
     *
     * @return the vertices as {x, y} pairs
     */
    public static List<long[]> of(long[] xs, long[] ys) {
        if (xs.length != ys.length) {
            throw new IllegalArgumentException("convex hull coordinate arrays differ in length: " + xs.length + ", "
                    + ys.length + " (allowed: equal lengths)");
        }
        int n = xs.length;
        long[][] points = new long[n][];
        for (int p = 0; p < n; p++) {
            points[p] = new long[] { xs[p], ys[p] };
        }
        Arrays.sort(points, (a, b) -> a[0] != b[0] ? Long.compare(a[0], b[0]) : Long.compare(a[1], b[1]));
        List<long[]> distinct = new ArrayList<>(n);
        for (long[] p : points) {
            if (distinct.isEmpty() || !Arrays.equals(distinct.get(distinct.size() - 1), p)) {
                distinct.add(p);
            }
        }
        if (distinct.size() <= 2) {
            return distinct;
        }
        long[][] hull = new long[2 * distinct.size()][];
        int h = 0;
        for (long[] p : distinct) {
            while (h >= 2 && cross(hull[h - 2], hull[h - 1], p) <= 0) {
                h--;
            }
            hull[h++] = p;
        }
        int lowerEnd = h + 1;
        for (int i = distinct.size() - 2; i >= 0; i--) {
            long[] p = distinct.get(i);
            while (h >= lowerEnd && cross(hull[h - 2], hull[h - 1], p) <= 0) {
                h--;
            }
            hull[h++] = p;
        }
        return new ArrayList<>(Arrays.asList(hull).subList(0, h - 1));
    }

    /** Twice the signed area of the polygon (counter-clockwise positive), exact. */
    public static long twiceSignedArea(List<long[]> polygon) {
        long sum = 0;
        int n = polygon.size();
        for (int p = 0; p < n; p++) {
            long[] a = polygon.get(p);
            long[] b = polygon.get((p + 1) % n);
            sum += a[0] * b[1] - b[0] * a[1];
        }
        return sum;
    }

    private static long cross(long[] o, long[] a, long[] b) {
        return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
    }
}
