package eluvia.cost;

/**
 * The plan outline of a pit bottom (or of a contaminated zone): a rectangle, or any convex outline
 * given by its area, perimeter and corner coefficient.
 *
 * <p>For a convex outline offset outward by a distance d the area is
 * A(d) = A + P d + K d^2 and the perimeter P(d) = P + 2 K d, with K the dimensionless corner
 * coefficient of {@link CornerConvention} (4 for a rectangle, pi for rounded corners). A pit of
 * depth h and side slope m (horizontal per vertical) on this bottom then has the exact volume
 * V = A h + P m h^2 / 2 + K m^2 h^3 / 3 (integral of A(m z) over the depth; the prismoidal formula
 * h/6 (A1 + 4 Am + A2) gives the same). A non-convex zone outline (e.g. the stair-step outline of
 * a block model) is not covered by this formula: pass the area and perimeter of its convex hull,
 * which a pit with uniformly sloped sides has to enclose anyway.
 *
 * <p>Lengths in metres, areas in square metres, volumes in cubic metres.
 */
public sealed interface PitFootprint permits RectangularFootprint, OutlineFootprint {

    /** Plan area, m2. */
    double areaSquareMetres();

    /** Perimeter, m. */
    double perimeterMetres();

    /** Corner coefficient K in A(d) = A + P d + K d^2 (dimensionless, at least pi). */
    double cornerCoefficient();

    /** The outline offset outward by {@code distanceMetres} (0 or more), same corner convention. */
    PitFootprint offset(double distanceMetres);

    /**
     * Bank volume, m3, of a pit with this bottom, {@code depthMetres} deep, sides at
     * {@code sideSlopeHorizontalPerVertical} (dimensionless, 0 = vertical).
     */
    double pitVolumeCubicMetres(double depthMetres, double sideSlopeHorizontalPerVertical);

    /** Short plain description with dimensions, for the trace, e.g. {@code "rectangle 20 m x 10 m"}. */
    String description();

    /** Area, m2, of the outline offset outward by {@code distanceMetres}: A + P d + K d^2. */
    default double areaAtOffsetSquareMetres(double distanceMetres) {
        return offset(distanceMetres).areaSquareMetres();
    }

    /** A rectangle {@code lengthMetres} by {@code widthMetres} (sharp, mitred corners). */
    static RectangularFootprint rectangle(double lengthMetres, double widthMetres) {
        return new RectangularFootprint(lengthMetres, widthMetres);
    }

    /**
     * A convex outline of the given area and perimeter whose pit corners are rounded
     * ({@link CornerConvention#ROUNDED}, K = pi): the smallest pit on any convex outline of that
     * area and perimeter.
     */
    static OutlineFootprint roundedCorners(double areaSquareMetres, double perimeterMetres) {
        return new OutlineFootprint(areaSquareMetres, perimeterMetres, Math.PI, CornerConvention.ROUNDED);
    }

    /**
     * A convex outline of the given area and perimeter with sharp (mitred) pit corners of the given
     * corner coefficient (sum of tan(half exterior angle) over the corners; 4 for four right-angled
     * corners).
     */
    static OutlineFootprint mitredCorners(double areaSquareMetres, double perimeterMetres, double cornerCoefficient) {
        return new OutlineFootprint(areaSquareMetres, perimeterMetres, cornerCoefficient, CornerConvention.MITRED);
    }

    /**
     * A convex polygon given by its corner coordinates in metres (in order, either direction, not
     * repeating the first corner), with sharp (mitred) pit corners. Area by the shoelace formula,
     * K = sum over the corners of tan(phi/2), phi the exterior angle.
     */
    static OutlineFootprint convexPolygon(double[] xMetres, double[] yMetres) {
        return eluvia.cost.internal.PolygonMeasure.footprint(xMetres, yMetres);
    }
}
