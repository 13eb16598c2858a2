package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Project;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;

final class EnlargementTest {

    private static final double NET_INFILTRATION_METRES_PER_DAY = 0.1 / 365.25;

    /**
     * One layer 0-12 m (rho_b 1600 kg/m3, n 0.35, theta 0.3, foc 0.002, dispersivity 0.5 m), the
     * zone a 10 m x 6 m rectangle from 0.2 to 2.2 m deep at 100 mg/kg, cleanup level 5 mg/kg, Koc
     * 59 L/kg, D0 1e-9 m2/s. Built in the test.
     */
    private static Project project() {
        Project p = TestProjects.singleLayer(0.5, 5, ComplianceCriterion.EFFLUENT);
        SoilLayer l = p.getSite().getLayers().get(0);
        l.setBottomDepthMetres(12);
        TreatmentZone z = p.getSite().getZones().get(0);
        TestProjects.rectangle(z, 0, 0, 10, 6);
        z.setTopDepthMetres(0.2);
        z.setBottomDepthMetres(2.2);
        return p;
    }

    private static DesignSettings settings() {
        return DesignSettings.builder().pushDownBelowColumn(false).delayYears(0, 2, 10)
                .delayDarcyFluxMetresPerDay(NET_INFILTRATION_METRES_PER_DAY).build();
    }

    /** One Crank (1975, eq. 2.15) slab factor in the erf form of REFERENCES.md. */
    private static double slab(double a, double xi, double dispersion, double days, double r) {
        double s = 2 * Math.sqrt(dispersion * days / r);
        return 0.5 * (Erf.erf((a - xi) / s) + Erf.erf((a + xi) / s));
    }

    /**
     * Volume below ground where C/C0 of the Hunt (1978) product of three Crank slab factors
     * exceeds the threshold, by a brute-force count of cells on a fine grid (quadrant in plan by
     * symmetry; depth over the whole profile below ground): an independent numerical integration
     * written here from the formula, with Commons Math 3.6.1 Erf.
     */
    private static double bruteForceVolume(double ax, double ay, double az, double centreDepth, double dh, double dz,
            double r, double v, double days, double threshold) {
        int nx = 300;
        int nz = 2400;
        double spreadX = 2 * Math.sqrt(dh * days / r);
        double lx = ax + 6 * spreadX; // erfc(6) ~ 2e-17: nothing above any threshold beyond
        double ly = ay + 6 * spreadX;
        double centre = centreDepth + v * days / r;
        double spreadZ = 2 * Math.sqrt(dz * days / r);
        double deepest = centre + az + 6 * spreadZ;
        double hx = lx / nx;
        double hy = ly / nx;
        double hz = deepest / nz;
        double[] fx = new double[nx];
        double[] fy = new double[nx];
        double[] fz = new double[nz];
        for (int i = 0; i < nx; i++) {
            fx[i] = slab(ax, (i + 0.5) * hx, dh, days, r);
            fy[i] = slab(ay, (i + 0.5) * hy, dh, days, r);
        }
        for (int k = 0; k < nz; k++) {
            fz[k] = slab(az, (k + 0.5) * hz - centre, dz, days, r);
        }
        long count = 0;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < nx; j++) {
                double g = fx[i] * fy[j];
                for (int k = 0; k < nz; k++) {
                    if (g * fz[k] > threshold) {
                        count++;
                    }
                }
            }
        }
        return 4 * count * hx * hy * hz;
    }

    @Test
    void enlargedVolumeAgreesWithAnIndependentIntegrationOfTheCrankHuntSolution() {
        ZoneEnlargement e = DesignPipeline.run(project(), settings(), DesignProgress.NONE).enlargements().get(0);
        assertTrue(e.available(), e.unavailableReason());
        // source box: the 10 m x 6 m footprint, 2 m thick = 120 m3 (by hand)
        assertEquals(120.0, e.sourceVolumeCubicMetres(), 1e-9);
        // inputs by hand: R = 1 + 1.6 x (59 x 0.002) / 0.3; v = q / theta; Millington-Quirk tau = theta^(7/3)/n^2;
        // D = alpha v + tau D0 (REFERENCES.md), transverse alpha 0.1 x 0.5 m (common practice, the default)
        double r = 1 + 1.6 * 59 * 0.002 / 0.3;
        double v = NET_INFILTRATION_METRES_PER_DAY / 0.3;
        double tau = Math.pow(0.3, 7.0 / 3) / (0.35 * 0.35);
        double d0 = 1e-9 * 86_400;
        double dz = 0.5 * v + tau * d0;
        double dh = 0.05 * v + tau * d0;
        ContaminantSpreading s = e.contaminants().get(0);
        assertEquals(r, s.retardation(), 1e-12);
        assertEquals(dz, s.verticalDispersionSquareMetresPerDay(), 1e-15);
        assertEquals(dh, s.horizontalDispersionSquareMetresPerDay(), 1e-15);
        // delay 0: the source itself
        assertEquals(120.0, s.curve().get(0).volumeAboveLevelCubicMetres(), 1e-9);
        assertEquals(1.0, s.curve().get(0).ratio(), 1e-12);
        for (int k = 1; k < 3; k++) {
            EnlargementPoint p = s.curve().get(k);
            double days = p.delayYears() * 365.25;
            double expected = bruteForceVolume(5, 3, 1, 1.2, dh, dz, r, v, days, 5.0 / 100);
            // The independent count resolves the boundary to about one cell (surface x cell / 2, a relative
            // 1e-3 here) and the pipeline's 200-cell quadrant grid to the same order: 5e-3 leaves room for both.
            assertEquals(expected, p.volumeAboveLevelCubicMetres(), 5e-3 * expected, "delay " + p.delayYears());
            assertEquals(p.volumeAboveLevelCubicMetres() / 120.0, p.ratio(), 1e-12);
            assertTrue(p.volumeAboveLevelCubicMetres() > 120, "the zone grows");
        }
        // the envelope of a single contaminant is its curve
        assertEquals(s.curve().get(2).volumeAboveLevelCubicMetres(), e.envelope().get(2).volumeAboveLevelCubicMetres(),
                1e-12);
    }

    @Test
    void unboundedVolumeAgreesWithTheTransportBundlesQuadrature() {
        // Far from the ground surface the cut does nothing: the grid volume must equal the infinite-medium
        // measure of eluvia.transport SourceSpreading.extentAbove (Gauss-Legendre quadrature, documented
        // within 1e-6) - a second, independently coded integration of the same solution.
        Project p = project();
        TreatmentZone z = p.getSite().getZones().get(0);
        z.setTopDepthMetres(4);
        z.setBottomDepthMetres(6);
        ZoneEnlargement e = DesignPipeline.run(p, settings(), DesignProgress.NONE).enlargements().get(0);
        ContaminantSpreading s = e.contaminants().get(0);
        EnlargementPoint point = s.curve().get(2);
        eluvia.transport.SourceSpreading reference = new eluvia.transport.SourceSpreading(5, 3, 1,
                s.horizontalDispersionSquareMetresPerDay(), s.horizontalDispersionSquareMetresPerDay(),
                s.verticalDispersionSquareMetresPerDay(), s.retardation(), s.poreWaterVelocityMetresPerDay());
        double expected = reference.extentAbove(0.05, 10 * 365.25).measure();
        // the grid's error falls as (cell size)^1.5 and was 1.4e-4 at the default 200 cells (DesignSettings)
        assertEquals(expected, point.volumeAboveLevelCubicMetres(), 5e-4 * expected);
        assertEquals(point.unboundedVolumeCubicMetres(), point.volumeAboveLevelCubicMetres(), 1e-9 * expected);
    }
}
