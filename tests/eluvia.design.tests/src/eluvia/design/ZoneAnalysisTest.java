package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import eluvia.cost.AlternativeKind;
import eluvia.cost.ExcavationQuantities;
import eluvia.cost.FlushingQuantities;
import eluvia.site.model.Project;

final class ZoneAnalysisTest {

    /** Blocks of 2 m x 2 m x 0.5 m whose centres are the sample points of {@link TestProjects#sampledField}. */
    private static DesignSettings onSampleGrid(ZoneEstimator estimator) {
        return DesignSettings.builder().zoneEstimator(estimator).blockPlanSizeMetres(2).blockDepthMetres(0.5)
                .pushDownBelowColumn(false).build();
    }

    @Test
    void volumeAboveTheLevelOfASyntheticFieldIsTheBoxByInverseDistance() {
        Project p = TestProjects.sampledField(0.2);
        ZoneAnalysis z = DesignPipeline.run(p, onSampleGrid(ZoneEstimator.INVERSE_DISTANCE), DesignProgress.NONE)
                .zoneAnalysis();
        assertTrue(z.available(), z.unavailableReason());
        // 10 x 10 x 6 blocks over the 20 m x 20 m boundary and the 3 m profile (by hand)
        assertEquals(600, z.blockModel().blockCount());
        // Every block centre is a sample point, where inverse-distance weighting returns the sample's value
        // (Shepard 1968: the limit of the formula at a sample), so the blocks above 1 mg/kg are exactly the
        // box 6-12 m x 4-10 m x 0.5-2.0 m of the synthetic field: 3 x 3 x 3 blocks of 2 m3 = 54 m3 (by hand).
        assertEquals(54.0, z.volumeAboveLevelCubicMetres(), 1e-9);
        assertEquals(36.0, z.exceedance().footprintAreaSquareMetres(), 1e-9);
        assertEquals(0.5, z.exceedance().topDepthMetres(), 1e-12);
        assertEquals(2.0, z.exceedance().bottomDepthMetres(), 1e-12);
        // proposed zone: hull of the 3 x 3 cells = the 6 m x 6 m square, 1.5 m thick: 54 m3 (by hand)
        assertEquals(54.0, z.proposedZone().volumeCubicMetres(), 1e-9);
        // the entered zone is that box: it holds all of the estimated volume, and is as large as it
        EnteredZoneComparison c = z.enteredZones().get(0);
        assertEquals(1.0, c.fractionInside(), 1e-12);
        assertEquals(54.0, c.enteredVolumeCubicMetres(), 1e-9);
        assertEquals(0.0, c.estimatedOutsideCubicMetres(), 1e-9);
    }

    @Test
    void krigingIsAnExactInterpolatorToo() {
        // Ordinary kriging reproduces a sample's value at its location (gamma(0) = 0; Isaaks and Srivastava
        // 1989, ch. 12), so the same 54 m3 box follows (by hand, as above).
        Project p = TestProjects.sampledField(0.2);
        ZoneAnalysis z = DesignPipeline.run(p, onSampleGrid(ZoneEstimator.ORDINARY_KRIGING), DesignProgress.NONE)
                .zoneAnalysis();
        assertEquals(54.0, z.volumeAboveLevelCubicMetres(), 1e-9);
        assertNotNull(z.contaminants().get(0).variogramUsed());
        assertTrue(z.contaminants().get(0).variogramBasis().contains("not fitted"));
        assertNotNull(z.contaminants().get(0).experimentalVariogram());
    }

    @Test
    void blocksBeyondTheAutomaticSearchRadiusHaveNoEstimate() {
        // the boundary reaches 20 m east of the sampled square; sampling locations 2 m apart, so the automatic
        // radius is 2 m: the 10 columns of blocks whose centres lie 4 m or more east of the last samples
        // (x = 23 ... 39 m, 9 of them, or 10 if x = 21 m falls just outside) get no estimate, 6 layers each
        Project p = TestProjects.sampledField(0.2);
        TestProjects.boundary(p.getSite(), 40, 20);
        ZoneAnalysis z = DesignPipeline.run(p, onSampleGrid(ZoneEstimator.INVERSE_DISTANCE), DesignProgress.NONE)
                .zoneAnalysis();
        assertEquals(1200, z.blockModel().blockCount()); // 20 x 10 x 6 blocks (by hand)
        int unestimated = z.exceedance().unestimatedBlockCount();
        assertTrue(unestimated == 9 * 10 * 6 || unestimated == 10 * 10 * 6, "unestimated blocks " + unestimated);
        assertEquals(54.0, z.volumeAboveLevelCubicMetres(), 1e-9); // the box, as above
        assertTrue(z.notes().stream().anyMatch(n -> n.startsWith("Search radius 2.000 m")), z.notes().toString());
    }

    @Test
    void withoutSamplesTheAnalysisSaysItIsNotAvailable() {
        Project p = TestProjects.singleLayer(0.2, 1, eluvia.site.model.ComplianceCriterion.EFFLUENT);
        DesignRun run = DesignPipeline.run(p, DesignSettings.builder().pushDownBelowColumn(false).build(),
                DesignProgress.NONE);
        assertFalse(run.zoneAnalysis().available());
        assertTrue(run.zoneAnalysis().unavailableReason().contains("samples"), run.zoneAnalysis().unavailableReason());
        assertTrue(Double.isNaN(run.zoneAnalysis().volumeAboveLevelCubicMetres()));
        // and the hybrid cannot find a hot spot
        AlternativeResult hybrid = run.alternatives().stream().filter(a -> a.kind() == AlternativeKind.HYBRID)
                .findFirst().orElseThrow();
        assertFalse(hybrid.available());
        assertTrue(hybrid.estimate() == null && hybrid.quantities() == null);
    }

    @Test
    void hybridDigsTheHotSpotAndFlushesTheRestOfTheZone() {
        // dispersivity 200 m over the 1.5 m column: P far below 1, the well-mixed limit of the finite layer
        Project p = TestProjects.sampledField(200);
        DesignRun run = DesignPipeline.run(p, onSampleGrid(ZoneEstimator.INVERSE_DISTANCE), DesignProgress.NONE);
        AlternativeResult hybrid = run.alternatives().stream().filter(a -> a.kind() == AlternativeKind.HYBRID)
                .findFirst().orElseThrow();
        assertTrue(hybrid.available(), hybrid.unavailableReason());
        // hot spot: blocks above 10 x 1 mg/kg = the 50 mg/kg part, 1 x 1 cells of 2 m x 2 m from 0.5 to 1.5 m:
        // a 2 m x 2 m x 1 m prism in place (by hand)
        assertEquals(4.0, hybrid.quantities().get(ExcavationQuantities.ZONE_VOLUME).amount(), 1e-9);
        // the rest of the 36 m2 zone, 32 m2, is flushed over the 1.5 m column (0.5 to 2.0 m, theta 0.3):
        // one pore volume 0.3 x 1.5 x 32 = 14.4 m3 (by hand); the rest starts at min(50, 10 x 1) = 10 mg/kg,
        // target 1/10, and at P << 1 takes the well-mixed T = -R ln(0.1) (US EPA pump-and-treat guidance;
        // REFERENCES.md), R = 1 + 1.6 x 59 x 0.002 / 0.3 = 1.6293 (REFERENCES.md [COMP]); the applied water is
        // T x 14.4 m3. The finite-layer solution approaches that limit within 1 % at this P (see the
        // well-mixed test of DesignPipelineTest).
        double expectedPv = -1.6293 * Math.log(0.1);
        double applied = hybrid.quantities().get(FlushingQuantities.APPLIED_WATER).amount();
        assertEquals(expectedPv * 14.4, applied, 0.01 * expectedPv * 14.4);
        assertTrue(hybrid.quantities().get(FlushingQuantities.APPLIED_WATER).source().contains("14.400 m3 per pore volume"),
                hybrid.quantities().get(FlushingQuantities.APPLIED_WATER).source());
    }
}
