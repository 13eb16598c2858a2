package eluvia.zone;

import java.util.List;

/**
 * A proposed footprint in plan: a simple polygon with its vertices counter-clockwise and its area.
 *
 * @param vertices          the vertices, counter-clockwise, not repeating the first
 * @param areaSquareMetres  the enclosed area, m2
 * @param method            how the polygon was drawn, for results
 */
public record FootprintPolygon(List<PlanPoint> vertices, double areaSquareMetres, String method) {

    /** Copies the vertex list. */
    public FootprintPolygon {
        vertices = List.copyOf(vertices);
    }
}
