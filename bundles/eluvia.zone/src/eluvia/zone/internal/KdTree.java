package eluvia.zone.internal;

import java.util.Arrays;

/**
 * A static three-dimensional k-d tree for nearest-neighbour searches (Bentley 1975, Commun. ACM
 * 18:509; Friedman, Bentley, Finkel 1977, ACM Trans. Math. Softw. 3:209).
 *
 * <p>Built once over the estimation points by median splits on the axis of largest spread, with
 * small leaf buckets searched exhaustively. A search returns up to {@code k} points within a
 * radius, nearest first; equal distances are ordered by point index so that results are
 * deterministic. Coordinates are in one length unit (the caller's, here metres after vertical
 * scaling); distances are Euclidean.
 */
public final class KdTree {
    private static final int LEAF_SIZE = 8;

    private final int size;
    /** Coordinates in tree order: point at tree position p is original index order[p]. */
    private final double[] xs;
    private final double[] ys;
    private final double[] zs;
    private final int[] order;
    /** Split axis (0, 1, 2) of the node whose median sits at tree position p. */
    private final byte[] splitAxis;

    /**
     * Builds the tree; the arrays are copied.
     *
     * @throws IllegalArgumentException when the arrays differ in length, are empty or hold a
     *                                  non-finite coordinate
     */
    public KdTree(double[] x, double[] y, double[] z) {
        if (x.length != y.length || x.length != z.length) {
            throw new IllegalArgumentException("k-d tree coordinate arrays differ in length: " + x.length + ", "
                    + y.length + ", " + z.length + " (allowed: equal lengths)");
        }
        if (x.length == 0) {
            throw new IllegalArgumentException("k-d tree point count = 0 is outside the allowed range: 1 or more");
        }
        for (int p = 0; p < x.length; p++) {
            if (!Double.isFinite(x[p]) || !Double.isFinite(y[p]) || !Double.isFinite(z[p])) {
                throw new IllegalArgumentException("k-d tree point " + p + " = (" + x[p] + ", " + y[p] + ", " + z[p]
                        + ") is outside the allowed range: finite coordinates");
            }
        }
        size = x.length;
        int[] perm = new int[size];
        for (int p = 0; p < size; p++) {
            perm[p] = p;
        }
        double[][] coords = { x, y, z };
        splitAxis = new byte[size];
        build(coords, perm, 0, size);
        order = perm;
        xs = new double[size];
        ys = new double[size];
        zs = new double[size];
        for (int p = 0; p < size; p++) {
            xs[p] = x[perm[p]];
            ys[p] = y[perm[p]];
            zs[p] = z[perm[p]];
        }
    }

    /** The number of points in the tree. */
    public int size() {
        return size;
    }

    /** A reusable search for up to {@code maxNeighbours} points; one per thread. */
    public Search newSearch(int maxNeighbours) {
        if (maxNeighbours < 1) {
            throw new IllegalArgumentException("maxNeighbours = " + maxNeighbours
                    + " is outside the allowed range: 1 or more");
        }
        return new Search(Math.min(maxNeighbours, size));
    }

    private void build(double[][] coords, int[] perm, int lo, int hi) {
        if (hi - lo <= LEAF_SIZE) {
            return;
        }
        int axis = widestAxis(coords, perm, lo, hi);
        int mid = (lo + hi) >>> 1;
        select(coords[axis], perm, lo, hi - 1, mid);
        splitAxis[mid] = (byte) axis;
        build(coords, perm, lo, mid);
        build(coords, perm, mid + 1, hi);
    }

    private static int widestAxis(double[][] coords, int[] perm, int lo, int hi) {
        int best = 0;
        double bestSpread = -1;
        for (int a = 0; a < 3; a++) {
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (int p = lo; p < hi; p++) {
                double v = coords[a][perm[p]];
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
            if (max - min > bestSpread) {
                bestSpread = max - min;
                best = a;
            }
        }
        return best;
    }

    /** Quickselect: afterwards perm[kth] holds the kth value, smaller-or-equal left, larger-or-equal right. */
    private static void select(double[] values, int[] perm, int left, int right, int kth) {
        while (right > left) {
            double pivot = values[perm[(left + right) >>> 1]];
            int i = left;
            int j = right;
            while (i <= j) {
                while (values[perm[i]] < pivot) {
                    i++;
                }
                while (values[perm[j]] > pivot) {
                    j--;
                }
                if (i <= j) {
                    int t = perm[i];
                    perm[i] = perm[j];
                    perm[j] = t;
                    i++;
                    j--;
                }
            }
            if (kth <= j) {
                right = j;
            } else if (kth >= i) {
                left = i;
            } else {
                return;
            }
        }
    }

    /**
     * One search buffer. After {@link #find}, {@link #index(int)} and {@link #distanceSquared(int)}
     * give the neighbours, nearest first. Not thread-safe: use one per thread.
     */
    public final class Search {
        private final int capacity;
        private final int[] foundIndex;
        private final double[] foundDistanceSquared;
        private int count;
        private double radiusSquared;
        private double qx;
        private double qy;
        private double qz;

        private Search(int capacity) {
            this.capacity = capacity;
            this.foundIndex = new int[capacity];
            this.foundDistanceSquared = new double[capacity];
        }

        /**
         * Finds up to the configured number of points nearest to (x, y, z) within
         * {@code maxDistance} (inclusive; {@code Double.POSITIVE_INFINITY} for no limit).
         *
         * @return the number of points found
         */
        public int find(double x, double y, double z, double maxDistance) {
            qx = x;
            qy = y;
            qz = z;
            radiusSquared = maxDistance * maxDistance;
            count = 0;
            search(0, size);
            return count;
        }

        /** The original index of the n-th nearest point found (0 = nearest). */
        public int index(int n) {
            checkFound(n);
            return foundIndex[n];
        }

        /** The squared distance of the n-th nearest point found. */
        public double distanceSquared(int n) {
            checkFound(n);
            return foundDistanceSquared[n];
        }

        /** The number of points found by the last search. */
        public int count() {
            return count;
        }

        /** The original indices found by the last search, sorted ascending (for set comparisons). */
        public int[] sortedIndices() {
            int[] copy = Arrays.copyOf(foundIndex, count);
            Arrays.sort(copy);
            return copy;
        }

        private void checkFound(int n) {
            if (n < 0 || n >= count) {
                throw new IndexOutOfBoundsException("neighbour " + n + " of " + count);
            }
        }

        private void search(int lo, int hi) {
            if (hi - lo <= LEAF_SIZE) {
                for (int p = lo; p < hi; p++) {
                    offer(p);
                }
                return;
            }
            int mid = (lo + hi) >>> 1;
            offer(mid);
            int axis = splitAxis[mid];
            double diff = axis == 0 ? qx - xs[mid] : axis == 1 ? qy - ys[mid] : qz - zs[mid];
            if (diff < 0) {
                search(lo, mid);
                if (diff * diff <= bound()) {
                    search(mid + 1, hi);
                }
            } else {
                search(mid + 1, hi);
                if (diff * diff <= bound()) {
                    search(lo, mid);
                }
            }
        }

        private double bound() {
            return count < capacity ? radiusSquared : Math.min(radiusSquared, foundDistanceSquared[count - 1]);
        }

        private void offer(int p) {
            double dx = qx - xs[p];
            double dy = qy - ys[p];
            double dz = qz - zs[p];
            double d2 = dx * dx + dy * dy + dz * dz;
            if (d2 > radiusSquared) {
                return;
            }
            int idx = order[p];
            if (count == capacity && !before(d2, idx, foundDistanceSquared[count - 1], foundIndex[count - 1])) {
                return;
            }
            int pos = count == capacity ? count - 1 : count++;
            while (pos > 0 && before(d2, idx, foundDistanceSquared[pos - 1], foundIndex[pos - 1])) {
                foundDistanceSquared[pos] = foundDistanceSquared[pos - 1];
                foundIndex[pos] = foundIndex[pos - 1];
                pos--;
            }
            foundDistanceSquared[pos] = d2;
            foundIndex[pos] = idx;
        }

        private boolean before(double d2a, int ia, double d2b, int ib) {
            return d2a < d2b || (d2a == d2b && ia < ib);
        }
    }
}
