package eluvia.zone.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Random;
import java.util.stream.IntStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The k-d tree against an all-pairs brute-force search on seeded random data. */
final class KdTreeTest {

    /** Brute force: every point's squared distance, sorted by (distance, index), cut at k and radius. */
    private static int[] bruteForce(double[] x, double[] y, double[] z, double qx, double qy, double qz, int k,
            double radius) {
        double[] d2 = new double[x.length];
        for (int p = 0; p < x.length; p++) {
            d2[p] = (x[p] - qx) * (x[p] - qx) + (y[p] - qy) * (y[p] - qy) + (z[p] - qz) * (z[p] - qz);
        }
        return IntStream.range(0, x.length).boxed()
                .filter(p -> d2[p] <= radius * radius)
                .sorted(Comparator.<Integer>comparingDouble(p -> d2[p]).thenComparingInt(p -> p))
                .limit(k).mapToInt(Integer::intValue).toArray();
    }

    private static int[] found(KdTree.Search search, int count) {
        int[] result = new int[count];
        for (int m = 0; m < count; m++) {
            result[m] = search.index(m);
        }
        return result;
    }

    @ParameterizedTest
    @CsvSource({ "1, 300, 1, Infinity", "2, 300, 16, Infinity", "3, 300, 16, 12.0", "4, 1000, 50, Infinity",
            "5, 7, 16, Infinity", "6, 300, 300, 25.0", "7, 2, 1, 0.5" })
    void nearestNeighboursMatchBruteForce(long seed, int points, int k, double radius) {
        Random random = new Random(seed);
        double[] x = new double[points];
        double[] y = new double[points];
        double[] z = new double[points];
        for (int p = 0; p < points; p++) {
            x[p] = 100 * random.nextDouble();
            y[p] = 100 * random.nextDouble();
            z[p] = 30 * random.nextDouble();
        }
        KdTree tree = new KdTree(x, y, z);
        KdTree.Search search = tree.newSearch(k);
        for (int q = 0; q < 500; q++) {
            double qx = -10 + 120 * random.nextDouble();
            double qy = -10 + 120 * random.nextDouble();
            double qz = -5 + 40 * random.nextDouble();
            int[] expected = bruteForce(x, y, z, qx, qy, qz, k, radius); // all-pairs search in the test
            int count = search.find(qx, qy, qz, radius);
            assertArrayEquals(expected, found(search, count), "query " + q + " seed " + seed);
        }
    }

    @Test
    void ties_areOrderedByIndex_onALatticeWithManyEqualDistances() {
        // a 5 x 5 x 5 lattice queried at lattice points: many exactly equal distances
        double[] x = new double[125];
        double[] y = new double[125];
        double[] z = new double[125];
        for (int p = 0; p < 125; p++) {
            x[p] = p % 5;
            y[p] = (p / 5) % 5;
            z[p] = p / 25;
        }
        KdTree tree = new KdTree(x, y, z);
        KdTree.Search search = tree.newSearch(7);
        for (int p = 0; p < 125; p++) {
            int count = search.find(x[p], y[p], z[p], Double.POSITIVE_INFINITY);
            assertArrayEquals(bruteForce(x, y, z, x[p], y[p], z[p], 7, Double.POSITIVE_INFINITY), found(search, count));
            assertEquals(p, search.index(0)); // the query point itself, at distance 0
            assertEquals(0.0, search.distanceSquared(0));
        }
    }

    @Test
    void duplicatePointsAreAllFound() {
        double[] x = new double[40];
        double[] y = new double[40];
        double[] z = new double[40];
        Arrays.fill(x, 3.0);
        KdTree tree = new KdTree(x, y, z);
        KdTree.Search search = tree.newSearch(40);
        assertEquals(40, search.find(3.0, 0.0, 0.0, 0.0));
        assertArrayEquals(IntStream.range(0, 40).toArray(), search.sortedIndices());
    }

    @Test
    void radiusIsInclusive_andEmptyWhenNothingIsNear() {
        KdTree tree = new KdTree(new double[] { 0, 3 }, new double[] { 0, 4 }, new double[] { 0, 0 });
        KdTree.Search search = tree.newSearch(5);
        assertEquals(2, search.find(0, 0, 0, 5.0)); // 3-4-5 triangle: the second point is at exactly 5
        assertEquals(1, search.find(0, 0, 0, 4.999));
        assertEquals(0, search.find(100, 100, 100, 1.0));
        assertTrue(search.sortedIndices().length == 0);
    }

    @Test
    void badInputsAreRejectedWithTheirRange() {
        IllegalArgumentException empty = assertThrows(IllegalArgumentException.class,
                () -> new KdTree(new double[0], new double[0], new double[0]));
        assertTrue(empty.getMessage().contains("1 or more"), empty.getMessage());
        IllegalArgumentException lengths = assertThrows(IllegalArgumentException.class,
                () -> new KdTree(new double[2], new double[1], new double[2]));
        assertTrue(lengths.getMessage().contains("equal lengths"), lengths.getMessage());
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
                () -> new KdTree(new double[] { Double.NaN }, new double[1], new double[1]));
        assertTrue(nan.getMessage().contains("finite"), nan.getMessage());
        KdTree tree = new KdTree(new double[1], new double[1], new double[1]);
        IllegalArgumentException k = assertThrows(IllegalArgumentException.class, () -> tree.newSearch(0));
        assertTrue(k.getMessage().contains("maxNeighbours = 0"), k.getMessage());
        KdTree.Search search = tree.newSearch(1);
        search.find(0, 0, 0, 1);
        assertThrows(IndexOutOfBoundsException.class, () -> search.index(1));
    }
}
