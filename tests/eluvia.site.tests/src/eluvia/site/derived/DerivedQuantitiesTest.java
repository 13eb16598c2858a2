package eluvia.site.derived;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.site.model.DispersivityRule;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;
import eluvia.site.tests.TestProjects;

/** Zone area, volume and pore volume; dispersivity rules. */
final class DerivedQuantitiesTest {

    private static List<Vertex> polygon(double... xy) {
        List<Vertex> vertices = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            Vertex v = SiteFactory.eINSTANCE.createVertex();
            v.setEastingMetres(xy[i]);
            v.setNorthingMetres(xy[i + 1]);
            vertices.add(v);
        }
        return vertices;
    }

    @Test
    void shoelaceAreaOfKnownShapes() {
        // Rectangle 20 m x 22.5 m = 450 m2; right triangle with legs 3 m and 4 m = 6 m2 (exact, by hand).
        assertEquals(450.0, ZoneGeometry.polygonAreaSquareMetres(polygon(10, 10, 30, 10, 30, 32.5, 10, 32.5)), 1e-12);
        assertEquals(6.0, ZoneGeometry.polygonAreaSquareMetres(polygon(0, 0, 3, 0, 0, 4)), 1e-12);
        // L shape: a 10 x 10 square less a 5 x 5 corner = 75 m2 (decomposition by hand), either orientation.
        List<Vertex> l = polygon(0, 0, 10, 0, 10, 5, 5, 5, 5, 10, 0, 10);
        assertEquals(75.0, ZoneGeometry.polygonAreaSquareMetres(l), 1e-12);
        Collections.reverse(l);
        assertEquals(75.0, ZoneGeometry.polygonAreaSquareMetres(l), 1e-12);
        // Far from the origin (a national grid): still 75 m2 to 1e-6 m2.
        assertEquals(75.0, ZoneGeometry.polygonAreaSquareMetres(polygon(500000, 4000000, 500010, 4000000, 500010, 4000005,
                500005, 4000005, 500005, 4000010, 500000, 4000010)), 1e-6);
        assertEquals(0.0, ZoneGeometry.polygonAreaSquareMetres(polygon(0, 0, 1, 1)), 0.0);
    }

    @Test
    void pointInPolygon() {
        List<Vertex> l = polygon(0, 0, 10, 0, 10, 5, 5, 5, 5, 10, 0, 10);
        assertTrue(ZoneGeometry.contains(l, 2, 2));
        assertTrue(ZoneGeometry.contains(l, 2, 8));
        assertFalse(ZoneGeometry.contains(l, 8, 8), "inside the cut-out corner of the L");
        assertFalse(ZoneGeometry.contains(l, -1, 5));
        assertTrue(ZoneGeometry.contains(l, 10, 2), "on an edge counts inside");
        assertTrue(ZoneGeometry.contains(l, 5, 5), "on a vertex counts inside");
        assertFalse(ZoneGeometry.contains(polygon(0, 0, 1, 1), 0.5, 0.5));
    }

    @Test
    void zoneAreaVolumeAndPoreVolumeOfTheExample() {
        Project project = TestProjects.example();
        TreatmentZone zone = project.getSite().getZones().get(0);

        // Footprint 20 m x 22.5 m = 450 m2; 0 to 3 m deep: 1350 m3; pore volume = 450 x (1.5 x 0.30 + 1.5 x 0.32) = 418.5 m3 (by hand).
        assertEquals(450.0, zone.getEffectiveAreaSquareMetres(), 1e-9);
        assertEquals(1350.0, zone.getVolumeCubicMetres(), 1e-9);
        assertEquals(418.5, zone.getPoreVolumeCubicMetres(), 1e-9);

        zone.getFootprint().clear();
        zone.setAreaSquareMetres(100);
        assertEquals(100.0, zone.getEffectiveAreaSquareMetres(), 0.0, "without a footprint the entered area is used");
        zone.setTopDepthMetres(1.0);
        zone.setBottomDepthMetres(3.5);
        // 100 x (0.5 x 0.30 + 1.5 x 0.32 + 0.5 x 0.32) = 79 m3 (by hand).
        assertEquals(79.0, zone.getPoreVolumeCubicMetres(), 1e-9);
        assertEquals(0.0, ZoneGeometry.poreVolumeCubicMetres(SiteFactory.eINSTANCE.createTreatmentZone()), 0.0);
    }

    @Test
    void dispersivityRules() {
        // Common practice: alpha_L = 0.1 L.
        assertEquals(0.25, Dispersivities.tenthOfScaleMetres(2.5), 1e-15);
        // Xu and Eckstein (1995): at L = 10 m, log10 L = 1, so alpha_L = 0.83 m exactly.
        assertEquals(0.83, Dispersivities.xuEckstein1995Metres(10.0), 1e-15);
        // At L = 100 m: 0.83 x 2^2.414 = 4.4234844 m (evaluated independently with CPython 3).
        assertEquals(4.4234844, Dispersivities.xuEckstein1995Metres(100.0), 1e-7);
        assertThrows(IllegalArgumentException.class, () -> Dispersivities.xuEckstein1995Metres(1.0));
        assertThrows(IllegalArgumentException.class, () -> Dispersivities.xuEckstein1995Metres(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Dispersivities.tenthOfScaleMetres(0.0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Dispersivities.xuEckstein1995Metres(0.5));
        assertTrue(e.getMessage().contains("0.5 m") && e.getMessage().contains("0.1 L"), e.getMessage());
    }

    @Test
    void layersUseTheirRule() {
        Project project = TestProjects.example();
        List<SoilLayer> layers = project.getSite().getLayers();

        assertEquals(0.15, layers.get(0).getEffectiveDispersivityMetres(), 0.0, "entered");
        // 0.1 x the 1.5 m thickness.
        assertEquals(0.15, layers.get(1).getEffectiveDispersivityMetres(), 1e-15);
        // 0.83 (log10 3)^2.414 = 0.1390874 (evaluated independently with CPython 3 math.log10 and **).
        assertEquals(0.1390874, layers.get(2).getEffectiveDispersivityMetres(), 1e-7);
        assertTrue(Dispersivities.describe(layers.get(2)).contains("Xu and Eckstein 1995"));
        assertTrue(Dispersivities.describe(layers.get(1)).contains("0.1 L (common practice"));
        assertTrue(Dispersivities.describe(layers.get(0)).startsWith("dispersivity entered"));

        layers.get(2).setDispersivityScaleMetres(0);
        assertTrue(Double.isNaN(layers.get(2).getEffectiveDispersivityMetres()), "1 m thickness: the rule does not apply");
        layers.get(2).setDispersivityRule(DispersivityRule.ENTERED);
        assertEquals(0.1, layers.get(2).getEffectiveDispersivityMetres(), 0.0);
    }
}
