package eluvia.design.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** Convex hull of plan points (Andrew's monotone chain, Andrew 1979, Inf. Process. Lett. 9:216). */
public final class Polygons {

    private Polygons() {
    }

    /**
     * The convex hull of the points, counter-clockwise, without collinear points, as
     * {@code {x[], y[]}} in metres.
     */
    public static double[][] convexHull(double[] xMetres, double[] yMetres) {
        int n = xMetres.length;
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> xMetres[a] != xMetres[b] ? Double.compare(xMetres[a], xMetres[b])
                : Double.compare(yMetres[a], yMetres[b]));
        List<Integer> hull = new ArrayList<>();
        for (int pass = 0; pass < 2; pass++) {
            int start = hull.size();
            for (int k = 0; k < n; k++) {
                int p = pass == 0 ? order[k] : order[n - 1 - k];
                while (hull.size() >= start + 2 && cross(xMetres, yMetres, hull.get(hull.size() - 2),
                        hull.get(hull.size() - 1), p) <= 0) {
                    hull.remove(hull.size() - 1);
                }
                hull.add(p);
            }
            hull.remove(hull.size() - 1);
        }
        double[][] out = new double[2][hull.size()];
        for (int i = 0; i < hull.size(); i++) {
            out[0][i] = xMetres[hull.get(i)];
            out[1][i] = yMetres[hull.get(i)];
        }
        return out;
    }

    private static double cross(double[] x, double[] y, int o, int a, int b) {
        return (x[a] - x[o]) * (y[b] - y[o]) - (y[a] - y[o]) * (x[b] - x[o]);
    }
}
