package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

final class SourceSpreadingTest {
    private static final double INF = Double.POSITIVE_INFINITY;

    /** Crank (1975) slab factor evaluated directly in the test. */
    private static double crank(double a, double s, double xi) {
        return 0.5 * (Erf.erf((a - xi) / s) + Erf.erf((a + xi) / s));
    }

    /** Half-width where the factor falls to g, by bisection on the direct formula (independent of the bundle). */
    private static double bisect(double a, double s, double g) {
        if (crank(a, s, 0) <= g) {
            return 0;
        }
        double lo = 0;
        double hi = a + 20 * s;
        for (int i = 0; i < 56; i++) {
            double mid = (lo + hi) / 2;
            if (crank(a, s, mid) > g) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2;
    }

    @Test
    void oneDimensionalLengthMatchesTheDirectRootAndTheGaussianLimit() {
        // 1-D in z: a = 0.5 m, D = 0.01 m2/d, R = 2, v = 0.1 m/d, t = 100 d: s = 2 sqrt(D t / R)
        SourceSpreading sp = new SourceSpreading(INF, INF, 0.5, 0, 0, 0.01, 2, 0.1);
        double s = 2 * Math.sqrt(0.01 * 100 / 2);
        SpreadingResult r = sp.extentAbove(0.1, 100);
        assertEquals(1, r.dimensions());
        // Crank (1975) eq. 2.15 solved for the threshold by bisection in the test
        assertEquals(2 * bisect(0.5, s, 0.1), r.measure(), 1e-9);
        assertEquals(Erf.erf(0.5 / s), r.peakFraction(), 1e-15); // peak at the centre: erf(a / s)
        assertEquals(0.1 * 100 / 2, r.centreShiftZMetres(), 1e-15); // v t / R
        // Gaussian limit a << s: C/C0 = (2 a / (s sqrt(pi))) exp(-xi^2 / s^2) (1 + O(a^2/s^2)), so the length is
        // 2 s sqrt(ln(peak / threshold)) in closed form
        SourceSpreading thin = new SourceSpreading(INF, INF, 0.001, 0, 0, 0.05, 1, 0);
        double st = 2 * Math.sqrt(0.05 * 200);
        double peak = 2 * 0.001 / (st * Math.sqrt(Math.PI));
        double len = thin.extentAbove(peak / 10, 200).measure();
        assertEquals(2 * st * Math.sqrt(Math.log(10)), len, 1e-6 * len);
    }

    @Test
    void massOfTheSlugIsConserved() {
        // integral of C/C0 over z = 2 a at any time (Crank 1975): by Commons Math IterativeLegendreGaussIntegrator
        SourceSpreading sp = new SourceSpreading(INF, INF, 0.4, 0, 0, 0.02, 1.5, 0.05);
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-14);
        for (double t : new double[] {1, 30, 400}) {
            double shift = sp.centreShiftMetres(t);
            double m = quad.integrate(1_000_000, z -> sp.concentration(0, 0, z, t), shift - 20, shift + 20);
            assertEquals(0.8, m, 1e-9, "t = " + t);
        }
    }

    @Test
    void twoDimensionalAreaMatchesAnIndependentRowIntegration() {
        // x and z spread; y uniform. Reference: midpoint rule over 4000 rows in x, each with the z half-width by
        // bisection on the direct formula (error O(h^1.5) at the edge of the region: about 1e-6 relative here)
        double ax = 2;
        double az = 0.6;
        double dx = 0.02;
        double dz = 0.005;
        double r = 1.4;
        double t = 60;
        SourceSpreading sp = new SourceSpreading(ax, INF, az, dx, 0, dz, r, 0.02);
        double sx = 2 * Math.sqrt(dx * t / r);
        double sz = 2 * Math.sqrt(dz * t / r);
        for (double threshold : new double[] {0.05, 0.3, 0.7}) {
            double xmax = bisect(ax, sx, threshold / crank(az, sz, 0));
            int rows = 4000;
            double h = xmax / rows;
            double quarter = 0;
            for (int i = 0; i < rows; i++) {
                double x = (i + 0.5) * h;
                quarter += h * bisect(az, sz, threshold / crank(ax, sx, x));
            }
            SpreadingResult res = sp.extentAbove(threshold, t);
            assertEquals(2, res.dimensions());
            assertEquals(4 * quarter, res.measure(), 2e-5 * res.measure(), "threshold " + threshold);
            assertEquals(xmax, res.halfExtentXMetres(), 1e-9);
        }
    }

    @Test
    void threeDimensionalVolumeReducesToTheAreaForANonSpreadingDirection() {
        // with no dispersion in y the y factor is the indicator of |y| < a_y, so the volume is exactly 2 a_y times the
        // area of the x-z problem (separable product, Hunt 1978)
        SourceSpreading flat = new SourceSpreading(1.5, 0.8, 0.5, 0.01, 0, 0.004, 1.2, 0);
        SourceSpreading area = new SourceSpreading(1.5, INF, 0.5, 0.01, 0, 0.004, 1.2, 0);
        SpreadingResult v = flat.extentAbove(0.2, 50);
        assertEquals(3, v.dimensions());
        assertEquals(2 * 0.8 * area.extentAbove(0.2, 50).measure(), v.measure(), 1e-6 * v.measure());
    }

    @Test
    void threeDimensionalVolumeMatchesAnIndependentGridIntegration() {
        // reference: midpoint rule over 120 x 120 (x, y) columns in the positive quadrant with the z half-width by
        // bisection on the direct formula; compared with 300 x 300 and 600 x 600 grids its error is 8e-6 relative
        double[] a = {1.0, 0.7, 0.4};
        double[] d = {0.01, 0.01, 0.003};
        double r = 1.5;
        double t = 40;
        SourceSpreading sp = new SourceSpreading(a[0], a[1], a[2], d[0], d[1], d[2], r, 0);
        double[] s = new double[3];
        for (int i = 0; i < 3; i++) {
            s[i] = 2 * Math.sqrt(d[i] * t / r);
        }
        double threshold = 0.25;
        double xmax = bisect(a[0], s[0], threshold / (crank(a[1], s[1], 0) * crank(a[2], s[2], 0)));
        double ymax = bisect(a[1], s[1], threshold / (crank(a[0], s[0], 0) * crank(a[2], s[2], 0)));
        int n = 120;
        double hx = xmax / n;
        double hy = ymax / n;
        double octant = 0;
        for (int i = 0; i < n; i++) {
            double fx = crank(a[0], s[0], (i + 0.5) * hx);
            for (int j = 0; j < n; j++) {
                double fy = crank(a[1], s[1], (j + 0.5) * hy);
                octant += hx * hy * bisect(a[2], s[2], threshold / (fx * fy));
            }
        }
        double v = sp.extentAbove(threshold, t).measure();
        assertEquals(8 * octant, v, 3e-5 * v);
    }

    @Test
    void belowThePeakThereIsNoZoneAndTheZoneGrowsThenShrinks() {
        SourceSpreading sp = new SourceSpreading(INF, INF, 0.3, 0, 0, 0.01, 1, 0);
        // peak erf(a/s) falls below 0.5 once s > a / erfinv(0.5): then nothing is above 0.5
        double tLate = Math.pow(0.3 / Erf.erfInv(0.5) / 2, 2) / 0.01 * 1.01;
        assertEquals(0.0, sp.extentAbove(0.5, tLate).measure(), 0);
        // a low threshold: the zone first grows beyond the source, then shrinks as the slug dilutes
        double early = sp.extentAbove(0.05, 1).growthFactor();
        double middle = sp.extentAbove(0.05, 20).growthFactor();
        double late = sp.extentAbove(0.05, 2000).growthFactor();
        assertTrue(early > 1 && middle > early && late < middle, early + " " + middle + " " + late);
    }

    @Test
    void badInputsAreRefused() {
        assertEquals("source half-width in x (m)", assertThrows(TransportInputException.class,
                () -> new SourceSpreading(0, 1, 1, 0.1, 0.1, 0.1, 1, 0)).quantity());
        assertEquals("number of finite half-widths", assertThrows(TransportInputException.class,
                () -> new SourceSpreading(INF, INF, INF, 0.1, 0.1, 0.1, 1, 0)).quantity());
        assertEquals("dispersion coefficient in z (m2/day)", assertThrows(TransportInputException.class,
                () -> new SourceSpreading(1, 1, 1, 0.1, 0.1, -0.1, 1, 0)).quantity());
        assertEquals("retardation factor (-)", assertThrows(TransportInputException.class,
                () -> new SourceSpreading(1, 1, 1, 0.1, 0.1, 0.1, 0.5, 0)).quantity());
        assertEquals("pore-water velocity along z (m/day)", assertThrows(TransportInputException.class,
                () -> new SourceSpreading(1, 1, 1, 0.1, 0.1, 0.1, 1, Double.NaN)).quantity());
        SourceSpreading sp = new SourceSpreading(1, 1, 1, 0.1, 0.1, 0.1, 1, 0);
        assertEquals("threshold fraction C/C0", assertThrows(TransportInputException.class,
                () -> sp.extentAbove(1, 10)).quantity());
        assertEquals("time (days)", assertThrows(TransportInputException.class,
                () -> sp.extentAbove(0.5, -1)).quantity());
        assertEquals("time (days)", assertThrows(TransportInputException.class,
                () -> sp.concentration(0, 0, 0, Double.NaN)).quantity());
    }
}
