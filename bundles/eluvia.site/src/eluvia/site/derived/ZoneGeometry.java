package eluvia.site.derived;

import java.util.List;

import eluvia.site.model.Site;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;

/**
 * Plan area, volume and pore volume of a treatment zone, and point-in-polygon tests in the site's
 * local frame (eastings and northings in metres).
 *
 * <p>Area of a simple polygon by the shoelace (surveyor's) formula, A = |sum(x_i y_(i+1) - x_(i+1) y_i)| / 2.
 * Pore volume = sum over the layers the zone spans of area x (overlap thickness) x water content:
 * the water-filled pore space that one pore volume of flushing displaces (T = q t / (theta L)).
 */
public final class ZoneGeometry {

    private ZoneGeometry() {
    }

    /** Shoelace area in m2 of a polygon given by its vertices (either orientation); 0 for fewer than 3 vertices. */
    public static double polygonAreaSquareMetres(List<? extends Vertex> vertices) {
        int n = vertices.size();
        if (n < 3) {
            return 0.0;
        }
        // Coordinates relative to the first vertex: the cross products stay small for sites far from the origin.
        double x0 = vertices.get(0).getEastingMetres();
        double y0 = vertices.get(0).getNorthingMetres();
        double twiceArea = 0.0;
        for (int i = 0; i < n; i++) {
            Vertex a = vertices.get(i);
            Vertex b = vertices.get((i + 1) % n);
            twiceArea += (a.getEastingMetres() - x0) * (b.getNorthingMetres() - y0)
                    - (b.getEastingMetres() - x0) * (a.getNorthingMetres() - y0);
        }
        return Math.abs(twiceArea) / 2.0;
    }

    /** The zone's plan area in m2: of its footprint polygon when it has 3 or more vertices, else areaSquareMetres. */
    public static double effectiveAreaSquareMetres(TreatmentZone zone) {
        return zone.getFootprint().size() >= 3 ? polygonAreaSquareMetres(zone.getFootprint()) : zone.getAreaSquareMetres();
    }

    /** Bank volume in m3: effective area x (bottom depth - top depth). */
    public static double volumeCubicMetres(TreatmentZone zone) {
        return effectiveAreaSquareMetres(zone) * (zone.getBottomDepthMetres() - zone.getTopDepthMetres());
    }

    /**
     * Water-filled pore volume in m3: sum over the layers of the zone's site of area x thickness of the
     * layer within the zone x water content. Depths of the zone outside every layer add nothing (the
     * validator reports such zones). 0 when the zone is not in a site.
     */
    public static double poreVolumeCubicMetres(TreatmentZone zone) {
        if (!(zone.eContainer() instanceof Site site)) {
            return 0.0;
        }
        double area = effectiveAreaSquareMetres(zone);
        double sum = 0.0;
        for (SoilLayer layer : site.getLayers()) {
            double overlap = Math.min(layer.getBottomDepthMetres(), zone.getBottomDepthMetres())
                    - Math.max(layer.getTopDepthMetres(), zone.getTopDepthMetres());
            if (overlap > 0) {
                sum += area * overlap * layer.getWaterContent();
            }
        }
        return sum;
    }

    /**
     * True when the point lies inside the polygon or on its boundary (ray casting, with points on an
     * edge counted inside).
     */
    public static boolean contains(List<? extends Vertex> polygon, double eastingMetres, double northingMetres) {
        int n = polygon.size();
        if (n < 3) {
            return false;
        }
        boolean inside = false;
        for (int i = 0, j = n - 1; i < n; j = i++) {
            double xi = polygon.get(i).getEastingMetres();
            double yi = polygon.get(i).getNorthingMetres();
            double xj = polygon.get(j).getEastingMetres();
            double yj = polygon.get(j).getNorthingMetres();
            if (onSegment(xi, yi, xj, yj, eastingMetres, northingMetres)) {
                return true;
            }
            if ((yi > northingMetres) != (yj > northingMetres)
                    && eastingMetres < (xj - xi) * (northingMetres - yi) / (yj - yi) + xi) {
                inside = !inside;
            }
        }
        return inside;
    }

    private static boolean onSegment(double x1, double y1, double x2, double y2, double x, double y) {
        double cross = (x2 - x1) * (y - y1) - (y2 - y1) * (x - x1);
        double scale = Math.max(1.0, Math.abs(x2 - x1) + Math.abs(y2 - y1));
        if (Math.abs(cross) > 1e-9 * scale * scale) {
            return false;
        }
        return x >= Math.min(x1, x2) - 1e-9 && x <= Math.max(x1, x2) + 1e-9
                && y >= Math.min(y1, y2) - 1e-9 && y <= Math.max(y1, y2) + 1e-9;
    }
}
