package eluvia.zone.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The lattice convex hull against hulls drawn by hand. */
final class ConvexHullTest {

    @Test
    void squareWithInteriorAndEdgePoints_givesTheFourCorners() {
        // hand: the hull of a 2 x 2 square's 9 lattice points is its 4 corners, counter-clockwise
        long[] xs = { 0, 1, 2, 0, 1, 2, 0, 1, 2 };
        long[] ys = { 0, 0, 0, 1, 1, 1, 2, 2, 2 };
        List<long[]> hull = ConvexHull.of(xs, ys);
        assertEquals(4, hull.size());
        assertArrayEquals(new long[] { 0, 0 }, hull.get(0));
        assertArrayEquals(new long[] { 2, 0 }, hull.get(1));
        assertArrayEquals(new long[] { 2, 2 }, hull.get(2));
        assertArrayEquals(new long[] { 0, 2 }, hull.get(3));
        assertEquals(8, ConvexHull.twiceSignedArea(hull)); // hand: area 4
    }

    @Test
    void lShape_isBridgedByTheDiagonal() {
        // hand: L of corners (0,0) (2,0) (2,1) (1,1) (1,2) (0,2): hull drops (1,1), area 4 - 1/2 = 3.5
        long[] xs = { 0, 2, 2, 1, 1, 0 };
        long[] ys = { 0, 0, 1, 1, 2, 2 };
        List<long[]> hull = ConvexHull.of(xs, ys);
        assertEquals(5, hull.size());
        assertEquals(7, ConvexHull.twiceSignedArea(hull));
    }

    @Test
    void degenerateInputs() {
        assertEquals(0, ConvexHull.of(new long[0], new long[0]).size());
        assertEquals(1, ConvexHull.of(new long[] { 3, 3 }, new long[] { 4, 4 }).size());
        assertEquals(2, ConvexHull.of(new long[] { 0, 1, 2 }, new long[] { 0, 1, 2 }).size()); // collinear
        assertThrows(IllegalArgumentException.class, () -> ConvexHull.of(new long[1], new long[2]));
    }
}
