package eluvia.cost;

import java.util.Locale;

import eluvia.cost.internal.Checks;

/**
 * A convex pit bottom or zone outline given by area, perimeter and corner coefficient.
 *
 * <p>Offsetting it outward by d gives area A + P d + K d^2 and perimeter P + 2 K d with the same K;
 * its pit volume is V = A h + P m h^2 / 2 + K m^2 h^3 / 3 (see {@link PitFootprint} and
 * {@link CornerConvention}). Since every convex outline satisfies P^2 &gt;= 4 K A (the
 * isoperimetric inequality for K = pi, Lhuilier's inequality for polygons), a smaller perimeter is
 * rejected: no outline has it.
 *
 * @param areaSquareMetres  plan area A, m2, greater than 0
 * @param perimeterMetres   perimeter P, m, at least sqrt(4 K A)
 * @param cornerCoefficient K (dimensionless), pi for {@link CornerConvention#ROUNDED}, at least pi
 *                          for {@link CornerConvention#MITRED}
 * @param convention        how the sloped sides meet at the corners
 */
public record OutlineFootprint(double areaSquareMetres, double perimeterMetres, double cornerCoefficient,
        CornerConvention convention) implements PitFootprint {

    private static final double RELATIVE_TOLERANCE = 1e-9;

    /** Checks the fields. */
    public OutlineFootprint {
        Checks.positive("footprint areaSquareMetres", areaSquareMetres);
        Checks.positive("footprint perimeterMetres", perimeterMetres);
        Checks.notNull("corner convention", convention);
        if (convention == CornerConvention.ROUNDED) {
            Checks.closed("corner coefficient (dimensionless) for rounded corners", cornerCoefficient,
                    Math.PI, Math.PI, "rounded corners always have K = pi");
        } else if (!(cornerCoefficient >= Math.PI * (1 - RELATIVE_TOLERANCE)) || Double.isInfinite(cornerCoefficient)) {
            throw new CostInputException("corner coefficient (dimensionless) for mitred corners", cornerCoefficient,
                    "[pi, infinity)", "K is the sum of tan(half exterior angle) over the corners, 4 for a rectangle");
        }
        double minimumPerimeter = Math.sqrt(4.0 * cornerCoefficient * areaSquareMetres);
        if (perimeterMetres < minimumPerimeter * (1 - RELATIVE_TOLERANCE)) {
            throw new CostInputException("footprint perimeterMetres", perimeterMetres,
                    "[" + minimumPerimeter + ", infinity) for an area of " + areaSquareMetres + " m2",
                    "no convex outline of that area has a shorter perimeter; check area and perimeter units");
        }
    }

    @Override
    public OutlineFootprint offset(double distanceMetres) {
        double d = Checks.nonNegative("offset distanceMetres", distanceMetres);
        return new OutlineFootprint(areaSquareMetres + perimeterMetres * d + cornerCoefficient * d * d,
                perimeterMetres + 2.0 * cornerCoefficient * d, cornerCoefficient, convention);
    }

    @Override
    public double pitVolumeCubicMetres(double depthMetres, double sideSlopeHorizontalPerVertical) {
        double h = Checks.nonNegative("pit depthMetres", depthMetres);
        double m = SideSlopeTable.checkSlope("side slope (horizontal per vertical)", sideSlopeHorizontalPerVertical);
        return areaSquareMetres * h + perimeterMetres * m * h * h / 2.0
                + cornerCoefficient * m * m * h * h * h / 3.0;
    }

    @Override
    public String description() {
        return String.format(Locale.ROOT, "convex outline %.3f m2, perimeter %.3f m, %s corners (K = %.4f)",
                areaSquareMetres, perimeterMetres, convention.name().toLowerCase(Locale.ROOT), cornerCoefficient);
    }
}
