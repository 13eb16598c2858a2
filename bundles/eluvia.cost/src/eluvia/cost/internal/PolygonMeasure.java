package eluvia.cost.internal;

import eluvia.cost.CornerConvention;
import eluvia.cost.CostInputException;
import eluvia.cost.OutlineFootprint;

/**
 * Area, perimeter and mitred corner coefficient of a convex polygon given by its corners.
 *
 * <p>Area by the shoelace formula; K = sum of tan(phi_i / 2) over the corners, phi_i the exterior
 * angle (the turn from one side to the next): moving every side outward by d moves each corner
 * along its bisector and adds d^2 tan(phi_i / 2) to the area beyond the P d strips.
 */
public final class PolygonMeasure {
    /** Angles within this many radians of 0 count as straight (collinear corners are allowed). */
    private static final double ANGLE_TOLERANCE_RADIANS = 1e-12;

    private PolygonMeasure() {
    }

    /** The footprint of the convex polygon with these corners (metres, in order). */
    public static OutlineFootprint footprint(double[] xMetres, double[] yMetres) {
        Checks.notNull("polygon xMetres", xMetres);
        Checks.notNull("polygon yMetres", yMetres);
        if (xMetres.length != yMetres.length) {
            throw new CostInputException("polygon yMetres.length", yMetres.length,
                    "equal to xMetres.length = " + xMetres.length);
        }
        int n = xMetres.length;
        if (n < 3) {
            throw new CostInputException("polygon corner count", n, "[3, infinity)");
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(xMetres[i]) || !Double.isFinite(yMetres[i])) {
                throw new CostInputException("polygon corner " + i + " (xMetres, yMetres)",
                        "(" + xMetres[i] + ", " + yMetres[i] + ")", "finite coordinates");
            }
        }
        double twiceSignedArea = 0;
        double perimeter = 0;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            twiceSignedArea += xMetres[i] * yMetres[j] - xMetres[j] * yMetres[i];
            double side = Math.hypot(xMetres[j] - xMetres[i], yMetres[j] - yMetres[i]);
            if (!(side > 0)) {
                throw new CostInputException("polygon side " + i + " length (m)", side, "(0, infinity)",
                        "remove the repeated corner " + j);
            }
            perimeter += side;
        }
        double orientation = Math.signum(twiceSignedArea);
        if (orientation == 0) {
            throw new CostInputException("polygon areaSquareMetres", 0.0, "(0, infinity)");
        }
        double cornerCoefficient = 0;
        double turning = 0;
        for (int i = 0; i < n; i++) {
            int prev = (i + n - 1) % n;
            int next = (i + 1) % n;
            double ax = xMetres[i] - xMetres[prev];
            double ay = yMetres[i] - yMetres[prev];
            double bx = xMetres[next] - xMetres[i];
            double by = yMetres[next] - yMetres[i];
            double phi = orientation * Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
            if (phi < -ANGLE_TOLERANCE_RADIANS) {
                throw new CostInputException("polygon corner " + i + " exterior angle (radians)", phi,
                        "[0, pi): the polygon must be convex",
                        "use the convex hull of the zone outline");
            }
            if (phi >= Math.PI - ANGLE_TOLERANCE_RADIANS) {
                throw new CostInputException("polygon corner " + i + " exterior angle (radians)", phi,
                        "[0, pi): the outline doubles back on itself");
            }
            turning += phi;
            cornerCoefficient += Math.tan(Math.max(0.0, phi) / 2.0);
        }
        if (Math.abs(turning - 2.0 * Math.PI) > 1e-9) {
            throw new CostInputException("polygon total turning angle (radians)", turning,
                    "2 pi: the outline must go round once without crossing itself");
        }
        return new OutlineFootprint(Math.abs(twiceSignedArea) / 2.0, perimeter, cornerCoefficient,
                CornerConvention.MITRED);
    }
}
