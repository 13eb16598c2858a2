package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Contaminant;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.Project;
import eluvia.site.model.SolutionMethod;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.PoreVolumeResult;

final class SolutionMethodTest {

    private static final DesignSettings FAST = DesignSettings.builder().pushDownBelowColumn(false).build();

    private static ContaminantFlushing first(Project p) {
        return DesignPipeline.run(p, FAST, DesignProgress.NONE).flushing().get(0).contaminants().get(0);
    }

    @Test
    void numericalAndFiniteLayerAgreeForOneHomogeneousLayer() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MAX_RESIDUAL);
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
        ContaminantFlushing c = first(p);
        assertEquals(FlushingMethod.NUMERICAL, c.governingMethod());
        MethodEstimate numerical = c.method(FlushingMethod.NUMERICAL).orElseThrow();
        assertTrue(numerical.available(), numerical.unavailableReason());
        for (CleanupCriterion k : CleanupCriterion.values()) {
            PoreVolumeResult exact = c.estimate(k).result();
            PoreVolumeResult fv = numerical.result(k);
            assertTrue(fv.reachable());
            // The finite-volume solver documents pore volumes to target within 2e-4 to 5.5e-4 (relative) of
            // the exact Brenner (1962) series for its defaults (SolverSettings); the design's settings (200
            // cells, step tolerance 1e-6) are finer still. 1e-3 leaves a margin of about two.
            assertEquals(exact.poreVolumes(), fv.poreVolumes(), 1e-3 * exact.poreVolumes(), k.word());
        }
        // the finite-volume bookkeeping closes to round-off (MassBalance documents it)
        assertTrue(c.numerical().massBalanceRelativeError() < 1e-9, "mass balance " + c.numerical().massBalanceRelativeError());
        assertEquals(1, c.numerical().layerCount());
        // the run's independent spectral-element check meets the same Brenner (1962) series to 1e-7
        SpectralCheck check = c.numerical().spectralCheck();
        assertTrue(check.available(), check.unavailableReason());
        for (CleanupCriterion k : CleanupCriterion.values()) {
            double exact = c.estimate(k).result().poreVolumes();
            assertEquals(exact, check.byCriterion().get(k).poreVolumes(), 1e-7 * exact, k.word());
        }
        assertTrue(numerical.description().contains("independent check by spectral elements"), numerical.description());
    }

    @Test
    void numericalRunsOverTheRealLayeredProfile() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        p.getSite().getLayers().get(0).setBottomDepthMetres(1);
        p.getSite().getLayers().add(TestProjects.layer("clay", 1, 2, 1700, 0.40, 0.35, 0.010, 0.05, 0.1));
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
        ContaminantFlushing c = first(p);
        assertEquals(2, c.numerical().layerCount());
        // a sanity bound, not an exact check: the well-mixed estimate is the P -> 0 limit, the slowest flush of
        // an equilibrium column (REFERENCES.md; that it bounds a layered column too is from memory)
        double pv = c.governingResult(CleanupCriterion.MEAN_RESIDUAL).poreVolumes();
        double wellMixed = c.method(FlushingMethod.WELL_MIXED).orElseThrow().result(CleanupCriterion.MEAN_RESIDUAL)
                .poreVolumes();
        assertTrue(pv < wellMixed, pv + " below the well-mixed " + wellMixed);
        assertTrue(c.numerical().massBalanceRelativeError() < 1e-9, "mass balance " + c.numerical().massBalanceRelativeError());
        // and the exact check no series gives for two layers: the spectral-element solution of the same
        // profile (a different discretisation, exact in time); the solver documents 2e-4 to 5.5e-4 at its
        // defaults and the design's grid is finer, so 1e-3
        SpectralCheck check = c.numerical().spectralCheck();
        assertTrue(check.available(), check.unavailableReason());
        MethodEstimate fv = c.method(FlushingMethod.NUMERICAL).orElseThrow();
        for (CleanupCriterion k : CleanupCriterion.values()) {
            double d = check.relativeDifference(k, fv.result(k));
            assertTrue(Math.abs(d) < 1e-3, k.word() + ": " + d);
        }
    }

    @Test
    void aCoarseNumericalRunIsFlaggedByItsSpectralCheck() {
        // the coarsest grid and loosest tolerance the validator allows (10 cells, 1e-2) on the layered profile:
        // the note appears exactly when a criterion differs from the check by more than 1 %
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        p.getSite().getLayers().get(0).setBottomDepthMetres(1);
        p.getSite().getLayers().add(TestProjects.layer("clay", 1, 2, 1700, 0.40, 0.35, 0.010, 0.05, 0.1));
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
        p.getFlushingDesigns().get(0).setNumericalCellCount(10);
        p.getFlushingDesigns().get(0).setNumericalRelativeTolerance(1e-2);
        DesignRun run = DesignPipeline.run(p, FAST, DesignProgress.NONE);
        ContaminantFlushing c = run.flushing().get(0).contaminants().get(0);
        MethodEstimate fv = c.method(FlushingMethod.NUMERICAL).orElseThrow();
        double largest = 0;
        for (CleanupCriterion k : CleanupCriterion.values()) {
            largest = Math.max(largest, Math.abs(c.numerical().spectralCheck().relativeDifference(k, fv.result(k))));
        }
        boolean noted = run.notes().stream().anyMatch(n -> n.contains("independent spectral-element check"));
        assertEquals(largest > SpectralCheck.NOTE_ABOVE_RELATIVE_DIFFERENCE, noted, "largest difference " + largest);
        assertTrue(largest > 1e-4, "a coarse run differs visibly from the exact-in-time check: " + largest);
    }

    @Test
    void twoRegionWithBetaOneIsTheEquilibriumSolution() {
        // beta = 1: every sorption site in equilibrium with the flowing water, the equilibrium model
        // (van Genuchten and Wierenga 1976; REFERENCES.md)
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        Contaminant benzene = p.getContaminants().get(0);
        benzene.setNonequilibrium(NonequilibriumEntry.DIMENSIONLESS);
        benzene.setBeta(1);
        benzene.setOmega(0.5);
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.TWO_REGION);
        ContaminantFlushing c = first(p);
        assertEquals(FlushingMethod.TWO_REGION, c.governingMethod());
        for (CleanupCriterion k : CleanupCriterion.values()) {
            // the two-region inversion is accurate to about 1e-10 of C0 (FlushingModels.twoRegion); the searches to 1e-9
            assertEquals(c.estimate(k).result().poreVolumes(), c.governingResult(k).poreVolumes(),
                    1e-6 * c.estimate(k).result().poreVolumes(), k.word());
        }
        assertNotNull(c.twoRegion());
        assertEquals(1.0, c.twoRegion().beta(), 0);
    }

    @Test
    void nonequilibriumTailsNeedMorePoreVolumesAndReportTheRebound() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MAX_RESIDUAL);
        Contaminant benzene = p.getContaminants().get(0);
        benzene.setNonequilibrium(NonequilibriumEntry.PHYSICAL);
        benzene.setMobileWaterFraction(0.7);
        benzene.setMobileSiteFraction(0.5);
        benzene.setMassTransferRatePerDay(0.01);
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.TWO_REGION);
        FlushingDesignResult r = DesignPipeline.run(p, FAST, DesignProgress.NONE).flushing().get(0);
        ContaminantFlushing c = r.contaminants().get(0);
        // tails make flushing take more pore volumes than the equilibrium estimate (REFERENCES.md, two-region)
        assertTrue(c.governingResult(CleanupCriterion.MAX_RESIDUAL).poreVolumes()
                > c.estimate(CleanupCriterion.MAX_RESIDUAL).result().poreVolumes());
        // beta by hand: (theta_m + f rho_b Kd)/(theta + rho_b Kd) (REFERENCES.md), rho_b Kd = 1.6 x 0.118
        double sorption = 1.6 * 0.118;
        assertEquals((0.7 * 0.3 + 0.5 * sorption) / (0.3 + sorption), c.twoRegion().beta(), 1e-12);
        // omega = alpha L / q = 0.01 x 2 / 0.05 (REFERENCES.md)
        assertEquals(0.4, c.twoRegion().omega(), 1e-12);
        assertNotNull(c.twoRegion().rebound());
        // the design's pore volumes come from the governing (two-region) solution
        assertEquals(c.governingResult(CleanupCriterion.MAX_RESIDUAL).poreVolumes(), r.poreVolumes(), 0);
        // equilibrium and well-mixed figures are always there for comparison
        assertTrue(c.method(FlushingMethod.EQUILIBRIUM).orElseThrow().available());
        assertTrue(c.method(FlushingMethod.WELL_MIXED).orElseThrow().available());
    }

    @Test
    void aMissingSolutionIsReportedAsNotAvailableWithoutNumbers() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        Contaminant benzene = p.getContaminants().get(0);
        benzene.setNonequilibrium(NonequilibriumEntry.DIMENSIONLESS);
        benzene.setBeta(0.5);
        benzene.setOmega(1);
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
        FlushingDesignResult r = DesignPipeline.run(p, FAST, DesignProgress.NONE).flushing().get(0);
        MethodEstimate numerical = r.contaminants().get(0).method(FlushingMethod.NUMERICAL).orElseThrow();
        assertFalse(numerical.available());
        assertTrue(numerical.byCriterion().isEmpty());
        assertNull(r.contaminants().get(0).governingResult(CleanupCriterion.EFFLUENT));
        assertTrue(Double.isNaN(r.poreVolumes()));
        assertNull(r.quantities());
        assertFalse(r.allReachable());
    }
}
