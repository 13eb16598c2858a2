package eluvia.cost;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Pit volumes against the prismoidal formula h/6 (A1 + 4 Am + A2) (exact for these pits, REFERENCES.md
 * [Excavation]), hand calculations and the frustum of a cone; corner coefficients against plane
 * geometry. The formulas are closed form, so the tolerance is a few units of double rounding.
 */
final class PitVolumeTest {
    private static final double RELATIVE = 1e-12;

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, RELATIVE * Math.max(1.0, Math.abs(expected)));
    }

    @Test
    void rectangleHandCalculation() {
        // Hand calculation, REFERENCES.md [Excavation] rectangle formula: L = 20, W = 10, h = 4, m = 1:
        // V = 4 [20*10 + 1*4*(20+10) + (4/3)*1*16] = 4 [200 + 120 + 64/3] = 4096/3 = 1365.333 m3.
        // Prismoidal check: bottom 20 x 10 = 200, middle 24 x 14 = 336, top 28 x 18 = 504;
        // 4/6 (200 + 4*336 + 504) = 4/6 * 2048 = 4096/3. Same.
        assertClose(4096.0 / 3.0, PitFootprint.rectangle(20, 10).pitVolumeCubicMetres(4, 1));
    }

    @ParameterizedTest
    @CsvSource({ "20,10,4,1", "5,5,1.5,0.75", "30,2,6,1.5", "12.5,7.25,3.3,0", "1,1,10,10" })
    void rectangleEqualsPrismoidalFormula(double l, double w, double h, double m) {
        // Prismoidal formula h/6 (A1 + 4 Am + A2) with the end and middle areas computed here
        // (REFERENCES.md [Excavation]: exact for the rectangular pit).
        double a1 = l * w;
        double am = (l + m * h) * (w + m * h);
        double a2 = (l + 2 * m * h) * (w + 2 * m * h);
        assertClose(h / 6 * (a1 + 4 * am + a2), PitFootprint.rectangle(l, w).pitVolumeCubicMetres(h, m));
    }

    @Test
    void averageEndAreaOverestimates() {
        // REFERENCES.md [Excavation]: the average-end-area formula overestimates the sloped pit.
        double l = 20;
        double w = 10;
        double h = 4;
        double m = 1;
        double averageEndArea = h * (l * w + (l + 2 * m * h) * (w + 2 * m * h)) / 2;
        assertTrue(averageEndArea > PitFootprint.rectangle(l, w).pitVolumeCubicMetres(h, m));
    }

    @Test
    void verticalSidesGiveThePrism() {
        // m = 0: V = A h (hand calculation 12 x 8 x 3 = 288 m3).
        assertClose(288.0, PitFootprint.rectangle(12, 8).pitVolumeCubicMetres(3, 0));
        assertClose(288.0, PitFootprint.roundedCorners(96, 40).pitVolumeCubicMetres(3, 0));
    }

    @Test
    void roundedDiscIsAFrustumOfACone() {
        // A disc of radius r with rounded corners widens to radius r + m h: the frustum of a cone,
        // V = pi h/3 (R1^2 + R1 R2 + R2^2) (solid geometry, independent of the pit formula).
        double r = 6;
        double h = 2.5;
        double m = 1.5;
        double r2 = r + m * h;
        double cone = Math.PI * h / 3 * (r * r + r * r2 + r2 * r2);
        assertClose(cone, PitFootprint.roundedCorners(Math.PI * r * r, 2 * Math.PI * r).pitVolumeCubicMetres(h, m));
    }

    @Test
    void roundedAndMitredRectangleDifferOnlyInTheCornerTerm() {
        // CornerConvention: mitred K = 4, rounded K = pi; the difference is (4 - pi) m^2 h^3 / 3.
        double l = 20;
        double w = 10;
        double h = 4;
        double m = 1;
        double mitred = PitFootprint.rectangle(l, w).pitVolumeCubicMetres(h, m);
        double rounded = PitFootprint.roundedCorners(l * w, 2 * (l + w)).pitVolumeCubicMetres(h, m);
        assertClose((4 - Math.PI) * m * m * h * h * h / 3, mitred - rounded);
        assertClose(mitred, PitFootprint.mitredCorners(l * w, 2 * (l + w), 4).pitVolumeCubicMetres(h, m));
    }

    @Test
    void rectangleAsPolygonHasCornerCoefficientFourAndTheSameVolume() {
        // tan(45 degrees) = 1 at each of four corners (plane geometry).
        OutlineFootprint p = PitFootprint.convexPolygon(new double[] { 0, 20, 20, 0 }, new double[] { 0, 0, 10, 10 });
        assertClose(200, p.areaSquareMetres());
        assertClose(60, p.perimeterMetres());
        assertClose(4, p.cornerCoefficient());
        assertClose(PitFootprint.rectangle(20, 10).pitVolumeCubicMetres(3.5, 0.75), p.pitVolumeCubicMetres(3.5, 0.75));
    }

    @Test
    void equilateralTriangleCornerCoefficient() {
        // Exterior angle 120 degrees at each corner: K = 3 tan(60 degrees) = 3 sqrt(3) (plane geometry).
        // Clockwise order on purpose: the direction must not matter.
        OutlineFootprint p = PitFootprint.convexPolygon(new double[] { 0, 0.5, 1 },
                new double[] { 0, Math.sqrt(3) / 2, 0 });
        assertClose(3 * Math.sqrt(3), p.cornerCoefficient());
        assertClose(Math.sqrt(3) / 4, p.areaSquareMetres());
    }

    @ParameterizedTest
    @CsvSource({ "2.0,1.0", "4.5,0.75", "1.0,1.5", "6.0,0.0" })
    void convexPolygonEqualsPrismoidalFormulaOnExplicitlyOffsetOutlines(double h, double m) {
        // An irregular convex pentagon (invented). The middle and top outlines are built here by moving
        // every side outward by m h/2 and m h and intersecting neighbouring sides (mitred corners);
        // their shoelace areas go into the prismoidal formula h/6 (A1 + 4 Am + A2), exact for a
        // quadratic A(z) (REFERENCES.md [Excavation]).
        double[] x = { 0, 14, 19, 11, -2 };
        double[] y = { 0, -1, 7, 13, 8 };
        double a1 = shoelace(x, y);
        double am = shoelace(offset(x, y, m * h / 2));
        double a2 = shoelace(offset(x, y, m * h));
        OutlineFootprint p = PitFootprint.convexPolygon(x, y);
        assertClose(a1, p.areaSquareMetres());
        assertClose(h / 6 * (a1 + 4 * am + a2), p.pitVolumeCubicMetres(h, m));
        // The offset outline by the formula A + P d + K d^2 matches the explicit one too.
        assertClose(a2, p.areaAtOffsetSquareMetres(m * h));
    }

    @Test
    void offsetPerimeterOfPolygonMatchesExplicitOutline() {
        // P(d) = P + 2 K d against the explicitly offset pentagon's perimeter.
        double[] x = { 0, 14, 19, 11, -2 };
        double[] y = { 0, -1, 7, 13, 8 };
        double[][] off = offset(x, y, 2.5);
        double perimeter = 0;
        for (int i = 0; i < x.length; i++) {
            int j = (i + 1) % x.length;
            perimeter += Math.hypot(off[0][j] - off[0][i], off[1][j] - off[1][i]);
        }
        assertClose(perimeter, PitFootprint.convexPolygon(x, y).offset(2.5).perimeterMetres());
    }

    @Test
    void badGeometryThrowsNamingTheQuantity() {
        RectangularFootprint r = PitFootprint.rectangle(10, 5);
        assertMessage(assertThrows(CostInputException.class, () -> r.pitVolumeCubicMetres(-1, 1)), "pit depthMetres");
        assertMessage(assertThrows(CostInputException.class, () -> r.pitVolumeCubicMetres(2, -0.5)), "side slope");
        assertMessage(assertThrows(CostInputException.class, () -> r.pitVolumeCubicMetres(2, 11)), "[0.0, 10.0]");
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.rectangle(0, 5)), "lengthMetres");
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.rectangle(5, Double.NaN)), "widthMetres");
        assertMessage(assertThrows(CostInputException.class, () -> r.offset(-0.1)), "offset distanceMetres");
        // A square of 100 m2 has the shortest perimeter of any rectangle, 40 m; 35 m is impossible.
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.mitredCorners(100, 35, 4)),
                "footprint perimeterMetres");
        // A disc of 100 m2 has perimeter 2 sqrt(pi 100) = 35.449 m; 35 m is impossible.
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.roundedCorners(100, 35)),
                "footprint perimeterMetres");
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.roundedCorners(-1, 35)),
                "footprint areaSquareMetres");
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.mitredCorners(100, 50, 3)),
                "corner coefficient");
        assertMessage(assertThrows(CostInputException.class,
                () -> new OutlineFootprint(100, 50, 4, CornerConvention.ROUNDED)), "rounded corners");
    }

    @Test
    void badPolygonsThrow() {
        // Non-convex (an L-shape): must be replaced by its convex hull.
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.convexPolygon(
                new double[] { 0, 10, 10, 5, 5, 0 }, new double[] { 0, 0, 5, 5, 10, 10 })), "convex");
        assertMessage(assertThrows(CostInputException.class,
                () -> PitFootprint.convexPolygon(new double[] { 0, 1 }, new double[] { 0, 1 })), "corner count");
        assertMessage(assertThrows(CostInputException.class,
                () -> PitFootprint.convexPolygon(new double[] { 0, 1, 1 }, new double[] { 0, 1 })), "yMetres.length");
        assertMessage(assertThrows(CostInputException.class,
                () -> PitFootprint.convexPolygon(new double[] { 0, 1, 1, 1 }, new double[] { 0, 0, 1, 1 })),
                "side 2 length");
        assertMessage(assertThrows(CostInputException.class,
                () -> PitFootprint.convexPolygon(new double[] { 0, 1, 2 }, new double[] { 0, 1, 2 })), "area");
        // A pentagram (self-crossing, turns twice).
        double[] sx = new double[5];
        double[] sy = new double[5];
        for (int i = 0; i < 5; i++) {
            sx[i] = Math.cos(Math.PI / 2 + i * 4 * Math.PI / 5);
            sy[i] = Math.sin(Math.PI / 2 + i * 4 * Math.PI / 5);
        }
        assertMessage(assertThrows(CostInputException.class, () -> PitFootprint.convexPolygon(sx, sy)),
                "turning angle");
    }

    static void assertMessage(CostInputException e, String part) {
        assertTrue(e.getMessage().contains(part), () -> "message '" + e.getMessage() + "' should contain '" + part + "'");
        assertTrue(e.getMessage().contains("allowed range"), e::getMessage);
    }

    private static double shoelace(double[] x, double[] y) {
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            int j = (i + 1) % x.length;
            s += x[i] * y[j] - x[j] * y[i];
        }
        return Math.abs(s) / 2;
    }

    private static double shoelace(double[][] xy) {
        return shoelace(xy[0], xy[1]);
    }

    /** Moves every side of a counter-clockwise convex polygon outward by d and intersects neighbours. */
    private static double[][] offset(double[] x, double[] y, double d) {
        int n = x.length;
        double[] nx = new double[n];
        double[] ny = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double len = Math.hypot(x[j] - x[i], y[j] - y[i]);
            nx[i] = (y[j] - y[i]) / len;
            ny[i] = -(x[j] - x[i]) / len;
            c[i] = nx[i] * x[i] + ny[i] * y[i] + d; // side i: nx x + ny y = c
        }
        double[][] out = new double[2][n];
        for (int i = 0; i < n; i++) {
            int p = (i + n - 1) % n;
            double det = nx[p] * ny[i] - ny[p] * nx[i];
            out[0][i] = (c[p] * ny[i] - ny[p] * c[i]) / det;
            out[1][i] = (nx[p] * c[i] - c[p] * nx[i]) / det;
        }
        return out;
    }
}
