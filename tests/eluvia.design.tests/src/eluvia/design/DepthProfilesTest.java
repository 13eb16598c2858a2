package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Project;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;
import eluvia.transport.FlushingModels;

/**
 * Residual profiles against depth of a flushing design: the start, the mass balance against the
 * finite-layer solution and the pipeline's criteria, the maximum principle, times and bad inputs.
 * The projects are built in the test (invented values, not a shipped example).
 */
final class DepthProfilesTest {

    private static DepthProfileSet profilesOf(Project p) {
        FlushingDesignResult r = DesignPipeline.flush(p, p.getFlushingDesigns().get(0));
        return DepthProfiles.ofControlling(p, r);
    }

    @Test
    void atTimeZeroTheProfileIsTheInitialConcentrationEverywhere() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        DepthProfileSet s = profilesOf(p);
        assertTrue(s.available(), s.unavailableReason());
        DepthProfileSet.Profile first = s.profiles().get(0);
        assertEquals(0, first.shareOfDesign());
        assertEquals(0, first.poreVolumes());
        for (double c : first.soilMilligramsPerKg()) {
            // TestProjects.singleLayer: the source concentration is 100 mg/kg over the whole zone
            assertEquals(100, c, 1e-9);
        }
        assertEquals(100, s.initialSoilMilligramsPerKg());
        assertEquals(1, s.cleanupLevelMilligramsPerKg());
        assertEquals(DepthProfiles.DEFAULT_SHARES.size(), s.profiles().size());
    }

    @Test
    void depthAverageOfEachProfileIsTheFiniteLayerMeanResidualAndTheDesignTargetAtTheEnd() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        FlushingDesignResult r = DesignPipeline.flush(p, p.getFlushingDesigns().get(0));
        DepthProfileSet s = DepthProfiles.ofControlling(p, r);
        ContaminantFlushing row = r.contaminants().get(0);
        FlushingModel brenner = FlushingModels.finiteLayer(row.estimate(CleanupCriterion.MEAN_RESIDUAL).transport());
        for (DepthProfileSet.Profile prof : s.profiles()) {
            // one homogeneous layer on a uniform grid: the mass left over the mass at the start is the
            // plain mean of the cell concentrations over the initial one (REFERENCES.md definitions)
            double mean = Arrays.stream(prof.soilMilligramsPerKg()).average().orElseThrow() / 100;
            assertEquals(prof.meanResidualFraction(), mean, 1e-9 * Math.max(mean, 1e-3));
            // computed from the finite-layer series solution (Brenner 1962) through the transport bundle;
            // the tolerance is the grid error of 200 cells (about 1e-3 of the initial mass), far above
            // the step tolerance of 1e-6
            double expected = brenner.remainingFraction(CleanupCriterion.MEAN_RESIDUAL, prof.poreVolumes());
            assertEquals(expected, mean, 2e-3 * Math.max(expected, 0.01), "at " + prof.poreVolumes() + " PV");
        }
        DepthProfileSet.Profile end = s.profiles().get(s.profiles().size() - 1);
        assertEquals(r.poreVolumes(), end.poreVolumes(), 1e-9 * r.poreVolumes());
        // the design is held to the mean residual: at its pore volumes the mean is its target, 1/100
        assertEquals(row.targetFraction(), end.meanResidualFraction(), 2e-3 * row.targetFraction());
    }

    @Test
    void maximumOverDepthIsAtTheOutletAndIsTheMaximumResidualCriterion() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MAX_RESIDUAL);
        FlushingDesignResult r = DesignPipeline.flush(p, p.getFlushingDesigns().get(0));
        DepthProfileSet s = DepthProfiles.ofControlling(p, r);
        for (DepthProfileSet.Profile prof : s.profiles()) {
            if (prof.poreVolumes() == 0) {
                continue;
            }
            double[] c = prof.soilMilligramsPerKg();
            int argMax = 0;
            for (int i = 1; i < c.length; i++) {
                if (c[i] > c[argMax]) {
                    argMax = i;
                }
            }
            // maximum principle: flushed from the top with clean water, the highest residual is at the outlet
            assertEquals(c.length - 1, argMax, "at " + prof.poreVolumes() + " PV");
            assertEquals(prof.maxResidualFraction(), c[argMax] / 100, 1e-12);
        }
        DepthProfileSet.Profile end = s.profiles().get(s.profiles().size() - 1);
        double target = r.contaminants().get(0).targetFraction();
        // the design is held to the maximum residual by the finite-layer solution (Brenner 1962): at its
        // pore volumes the largest soil concentration is the target, within the grid error
        assertEquals(target, end.maxResidualFraction(), 3e-3 * target);
    }

    @Test
    void depthsSpanTheColumnAndTimesFollowFromThePoreVolumeDefinition() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        DepthProfileSet s = profilesOf(p);
        assertEquals(0, s.topDepthMetres());
        assertEquals(2, s.bottomDepthMetres());
        assertEquals(List.of(2.0), s.layerBaseDepthsMetres());
        for (DepthProfileSet.Profile prof : s.profiles()) {
            double[] z = prof.depthBelowGroundMetres();
            // 200 cells of 0.01 m (the design's default cell count over 2 m): centres 0.005 to 1.995 m
            assertEquals(200, z.length);
            assertEquals(0.005, z[0], 1e-12);
            assertEquals(1.995, z[z.length - 1], 1e-12);
            assertEquals(prof.shareOfDesign() * s.designPoreVolumes(), prof.poreVolumes(), 1e-9 * s.designPoreVolumes());
            // T = q t / (theta L) (REFERENCES.md symbols): t = T theta L / q with theta 0.3, L 2 m, q 0.05 m/d
            double days = prof.poreVolumes() * 0.3 * 2 / 0.05;
            assertEquals(days, prof.operatingDays(), 1e-9 * Math.max(days, 1));
            // 5 operating days a week (TestProjects.singleLayer)
            assertEquals(days * 7 / 5, prof.calendarDays(), 1e-9 * Math.max(days, 1));
        }
        assertTrue(s.massBalance().relativeError() < 1e-9, "mass balance " + s.massBalance().relativeError());
        assertTrue(s.basis().contains("finite-volume"), s.basis());
    }

    @Test
    void layeredColumnKeepsTheMassDefinitionWithBulkDensityPerLayer() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        p.getSite().getLayers().get(0).setBottomDepthMetres(1);
        p.getSite().getLayers().add(TestProjects.layer("silty sand", 1, 2, 1750, 0.38, 0.33, 0.006, 0.5, 0.2));
        FlushingDesignResult r = DesignPipeline.flush(p, p.getFlushingDesigns().get(0));
        DepthProfileSet s = DepthProfiles.ofControlling(p, r);
        assertEquals(List.of(1.0, 2.0), s.layerBaseDepthsMetres());
        for (DepthProfileSet.Profile prof : s.profiles()) {
            double[] z = prof.depthBelowGroundMetres();
            double[] c = prof.soilMilligramsPerKg();
            double left = 0;
            double start = 0;
            // equal cells of 0.01 m in both layers: mass per cell = rho_b x C x dz (definition of mg/kg of dry soil)
            for (int i = 0; i < c.length; i++) {
                double rho = z[i] < 1 ? 1600 : 1750;
                left += rho * c[i];
                start += rho * 100;
            }
            assertEquals(prof.meanResidualFraction(), left / start, 1e-9 * Math.max(left / start, 1e-3));
        }
    }

    @Test
    void aDesignThatDoesNotReachItsLevelHasNoProfilesAndSaysWhy() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        p.getFlushingDesigns().get(0).setMaxPoreVolumes(1);
        DepthProfileSet s = profilesOf(p);
        assertFalse(s.available());
        assertTrue(s.profiles().isEmpty());
        assertTrue(s.unavailableReason().contains("pore volumes"), s.unavailableReason());
    }

    @Test
    void badInputsNameTheQuantity() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        FlushingDesignResult r = DesignPipeline.flush(p, p.getFlushingDesigns().get(0));
        String name = r.controllingContaminant();
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DepthProfiles.ofControlling(null, r))
                .getMessage().contains("project"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DepthProfiles.ofControlling(p, null))
                .getMessage().contains("result"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> DepthProfiles.of(p, r, "toluene", DepthProfiles.DEFAULT_SHARES)).getMessage().contains("toluene"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DepthProfiles.of(p, r, name, List.of()))
                .getMessage().contains("shares"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DepthProfiles.of(p, r, name, null))
                .getMessage().contains("shares"));
        for (double bad : new double[] { -0.1, 1.5, Double.NaN }) {
            String m = assertThrows(IllegalArgumentException.class, () -> DepthProfiles.of(p, r, name, List.of(0.5, bad)))
                    .getMessage();
            assertTrue(m.contains("share") && m.contains("0 to 1"), m);
        }
        Project other = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        other.getFlushingDesigns().get(0).setName("another design");
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DepthProfiles.ofControlling(other, r))
                .getMessage().contains("flush A"));
    }

    @Test
    void chosenSharesComeBackInOrder() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        FlushingDesignResult r = DesignPipeline.flush(p, p.getFlushingDesigns().get(0));
        DepthProfileSet s = DepthProfiles.of(p, r, r.controllingContaminant(), List.of(0.75, 0.1));
        assertEquals(2, s.profiles().size());
        assertEquals(0.1, s.profiles().get(0).shareOfDesign());
        assertEquals(0.75, s.profiles().get(1).shareOfDesign());
        // flushing only removes mass: the later profile holds less (mass balance with clean inflow)
        assertTrue(s.profiles().get(1).meanResidualFraction() < s.profiles().get(0).meanResidualFraction());
    }
}
