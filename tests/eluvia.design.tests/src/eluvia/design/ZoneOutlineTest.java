package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import eluvia.cost.PitFootprint;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.TreatmentZone;

/** The outline of an entered zone as the take-offs measure it, and that outline grown outward. */
final class ZoneOutlineTest {

    private static TreatmentZone zone(double... eastingNorthing) {
        TreatmentZone z = SiteFactory.eINSTANCE.createTreatmentZone();
        z.setName("Z");
        for (int i = 0; i < eastingNorthing.length; i += 2) {
            z.getFootprint().add(TestProjects.vertex(eastingNorthing[i], eastingNorthing[i + 1]));
        }
        return z;
    }

    @Test
    void aClockwiseRectangleComesBackCounterClockwiseAndGrowsBySidesMovedOutward() {
        ZoneOutline o = ZoneOutline.of(zone(0, 0, 0, 10, 20, 10, 20, 0)).orElseThrow();
        assertArrayEquals(new double[] { 20, 20, 0, 0 }, o.eastingMetres(), 0.0);
        assertArrayEquals(new double[] { 0, 10, 10, 0 }, o.northingMetres(), 0.0);
        ZoneOutline g = o.grownBy(1.5, "grown");
        // a rectangle W x H with its sides moved out by d is (W + 2d) x (H + 2d) with the same corners (formula)
        assertArrayEquals(new double[] { 21.5, 21.5, -1.5, -1.5 }, g.eastingMetres(), 1e-12);
        assertArrayEquals(new double[] { -1.5, 11.5, 11.5, -1.5 }, g.northingMetres(), 1e-12);
        assertEquals(23 * 13, g.areaSquareMetres(), 1e-9);
        assertEquals(1.5, g.grownMetres(), 0.0);
    }

    @Test
    void aTriangleGrowsToTheAreaThePitFormulaGives() {
        double[] xy = { 0, 0, 12, 0, 3, 7 };
        ZoneOutline g = ZoneOutline.of(zone(xy)).orElseThrow().grownBy(2.0, "grown");
        // A + P d + K d^2 with K = sum of tan(phi/2) over the exterior angles (eluvia.cost PitFootprint, mitred corners)
        double expected = PitFootprint.convexPolygon(new double[] { 0, 12, 3 }, new double[] { 0, 0, 7 }).offset(2.0)
                .areaSquareMetres();
        assertEquals(expected, g.areaSquareMetres(), 1e-9 * expected);
        // every grown corner lies on the bisector at d / cos(phi/2) from its corner; at (0, 0) the interior angle is
        // atan2(7, 3), so the corner moves d / sin(angle / 2) along the bisector (formula)
        double angle = Math.atan2(7, 3);
        double shift = 2.0 / Math.sin(angle / 2);
        assertEquals(shift, Math.hypot(g.eastingMetres()[0], g.northingMetres()[0]), 1e-12);
    }

    @Test
    void aNonConvexFootprintIsTakenAsItsConvexHullAndAnAreaOnlyZoneHasNoOutline() {
        // an L-shape: the notch corner (5, 5) is not on the hull
        ZoneOutline o = ZoneOutline.of(zone(0, 0, 10, 0, 10, 5, 5, 5, 5, 10, 0, 10)).orElseThrow();
        // hull by hand: the 10 m square less the triangle cut off between (10, 5), (5, 10) and (10, 10) (geometry)
        assertEquals(5, o.eastingMetres().length);
        assertEquals(100 - 0.5 * 5 * 5, o.areaSquareMetres(), 1e-9);
        assertTrue(o.basis().contains("convex hull"), o.basis());
        TreatmentZone areaOnly = zone();
        areaOnly.setAreaSquareMetres(100);
        assertTrue(ZoneOutline.of(areaOnly).isEmpty());
        assertThrows(IllegalArgumentException.class, () -> o.grownBy(-1, "x"));
        assertThrows(IllegalArgumentException.class, () -> o.grownBy(Double.NaN, "x"));
    }
}
