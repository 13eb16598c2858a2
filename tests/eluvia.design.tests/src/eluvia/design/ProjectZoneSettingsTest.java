package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.site.model.Project;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.VariogramShapeKind;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;
import eluvia.site.validation.Problem;
import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;
import eluvia.zone.NonDetectRule;
import eluvia.zone.OrdinaryKriging;
import eluvia.zone.SampleSet;
import eluvia.zone.SoilSample;
import eluvia.zone.VariogramModel;
import eluvia.zone.VariogramShape;

/**
 * The zone-analysis settings of a project (eluvia.site ZoneAnalysisSettings) drive the pipeline's
 * zone analysis and enlargement, settings set for a run win over them, and bad ones are refused
 * naming the field. The project is the invented synthetic field of {@link TestProjects#sampledField}.
 */
final class ProjectZoneSettingsTest {

    /** Exponential variogram entered in the project: nugget 0.5, sill 150 (mg/kg)^2, range 9 m (invented). */
    private static ZoneAnalysisSettings krigingSettings(Project p) {
        ZoneAnalysisSettings z = SiteFactory.eINSTANCE.createZoneAnalysisSettings();
        z.setEstimator(ZoneEstimatorKind.ORDINARY_KRIGING);
        z.setVariogramModel(VariogramShapeKind.EXPONENTIAL);
        z.setVariogramNuggetMgPerKgSquared(0.5);
        z.setVariogramSillMgPerKgSquared(150);
        z.setVariogramRangeMetres(9);
        // blocks of 2.5 m x 2.5 m x 0.5 m: their centres are not sample points, so kriging really interpolates
        z.setBlockPlanSizeMetres(2.5);
        z.setBlockDepthMetres(0.5);
        z.setSearchRadiusMetres(30);
        z.setVerticalDistanceFactor(4);
        p.setZoneAnalysis(z);
        return z;
    }

    private static DesignSettings quick() {
        return DesignSettings.builder().pushDownBelowColumn(false).build();
    }

    @Test
    void krigingChosenInTheProjectGivesTheEstimateOfTheZoneBundleCalledDirectly() {
        Project p = TestProjects.sampledField(0.2);
        krigingSettings(p);

        DesignRun run = DesignPipeline.run(p, quick(), DesignProgress.NONE);
        ZoneAnalysis z = run.zoneAnalysis();

        // Independent path: the project's samples to eluvia.zone samples by hand, the block model of the
        // 20 m x 20 m boundary and the 3 m profile (8 x 8 x 6 blocks of 2.5 m x 2.5 m x 0.5 m, by hand), and
        // eluvia.zone OrdinaryKriging with the entered variogram and the default 16 neighbours over all blocks at once.
        List<SoilSample> samples = new ArrayList<>();
        for (SamplingLocation l : p.getSite().getSamplingLocations()) {
            for (Sample s : l.getSamples()) {
                samples.add(new SoilSample(l.getEastingMetres(), l.getNorthingMetres(), s.getTopDepthMetres(),
                        s.getBottomDepthMetres(), s.getConcentrationMilligramsPerKg(), false, Double.NaN));
            }
        }
        SampleSet set = SampleSet.of(samples, NonDetectRule.HALF_DETECTION_LIMIT, 4);
        BlockModel model = new BlockModel(0, 0, 0, 2.5, 2.5, 0.5, 8, 8, 6);
        VariogramModel variogram = new VariogramModel(VariogramShape.EXPONENTIAL, 0.5, 150, 9);
        BlockEstimate direct = new OrdinaryKriging(variogram, OrdinaryKriging.DEFAULT_MAX_NEIGHBOURS, 30).estimate(set, model);

        assertTrue(z.available(), z.unavailableReason());
        assertEquals(ZoneEstimator.ORDINARY_KRIGING, z.estimator());
        assertEquals(model.blockCount(), z.blockModel().blockCount());
        ContaminantZone c = z.contaminants().get(0);
        assertEquals(variogram, c.variogramUsed());
        double[] expected = direct.concentrationsMgPerKg();
        double[] actual = c.estimate().concentrationsMgPerKg();
        assertEquals(expected.length, actual.length);
        for (int b = 0; b < expected.length; b++) {
            // the same kriging system per block, solved layer by layer in the pipeline: equal to rounding
            assertEquals(expected[b], actual[b], 1e-9 * Math.max(1, Math.abs(expected[b])), "block " + b);
        }
        // the run states that the estimator and the variogram came from the project
        List<String> described = run.settings().describe();
        assertTrue(described.contains("zone estimator = ordinary kriging [from the project]"), described.toString());
        assertTrue(described.contains("variogram = " + variogram.description() + " [from the project]"), described.toString());
        assertTrue(run.notes().stream().anyMatch(n -> n.contains("vertical distance factor (dimensionless) = 4.00000 [from the project]")),
                run.notes().toString());
    }

    @Test
    void theProjectsDelaysAreTheDelaysOfTheEnlargement() {
        Project p = TestProjects.sampledField(0.2);
        ZoneAnalysisSettings z = SiteFactory.eINSTANCE.createZoneAnalysisSettings();
        z.getDelayYears().addAll(List.of(0.0, 0.5, 4.0, 7.5));
        p.setZoneAnalysis(z);

        DesignRun run = DesignPipeline.run(p, quick(), DesignProgress.NONE);

        ZoneEnlargement e = run.enlargements().get(0);
        assertTrue(e.available(), e.unavailableReason());
        assertArrayEquals(new double[] { 0.0, 0.5, 4.0, 7.5 },
                e.envelope().stream().mapToDouble(EnlargementPoint::delayYears).toArray());
        assertTrue(run.settings().fromProject("delayYears"));
        assertArrayEquals(new double[] { 0.0, 0.5, 4.0, 7.5 }, run.settings().delayYears());
    }

    @Test
    void settingsSetForTheRunWinOverTheProjects() {
        Project p = TestProjects.sampledField(0.2);
        krigingSettings(p).getDelayYears().addAll(List.of(0.0, 2.0));
        DesignSettings requested = DesignSettings.builder().pushDownBelowColumn(false)
                .zoneEstimator(ZoneEstimator.INVERSE_DISTANCE).delayYears(0, 3).build();

        DesignRun run = DesignPipeline.run(p, requested, DesignProgress.NONE);

        assertEquals(ZoneEstimator.INVERSE_DISTANCE, run.zoneAnalysis().estimator());
        assertArrayEquals(new double[] { 0, 3 },
                run.enlargements().get(0).envelope().stream().mapToDouble(EnlargementPoint::delayYears).toArray());
        // the values the run did not set still come from the project
        assertEquals(4.0, run.settings().verticalDistanceFactor());
        assertTrue(run.settings().fromProject("verticalDistanceFactor"));
        assertTrue(!run.settings().fromProject("zoneEstimator") && !run.settings().fromProject("delayYears"));
    }

    @Test
    void withoutProjectSettingsTheDefaultsApply() {
        Project p = TestProjects.sampledField(0.2);
        DesignSettings resolved = quick().resolvedFor(p);
        assertArrayEquals(DesignSettings.DEFAULT_DELAY_YEARS, resolved.delayYears());
        assertTrue(!resolved.fromProject("delayYears"));
        // an empty project delay list means the default delays, with automatic block sizes and radius for 0
        p.setZoneAnalysis(SiteFactory.eINSTANCE.createZoneAnalysisSettings());
        DesignSettings fromEmpty = quick().resolvedFor(p);
        assertArrayEquals(DesignSettings.DEFAULT_DELAY_YEARS, fromEmpty.delayYears());
        assertTrue(Double.isNaN(fromEmpty.blockPlanSizeMetres()) && Double.isNaN(fromEmpty.searchRadiusMetres()));
        assertEquals(null, fromEmpty.variogram());
    }

    private static Problem refusal(Project p, String field) {
        DesignInputException e = assertThrows(DesignInputException.class, () -> DesignPipeline.run(p, quick(), DesignProgress.NONE));
        return e.problems().stream().filter(q -> q.field().equals(field) && q.object() == p.getZoneAnalysis()).findFirst()
                .orElseThrow(() -> new AssertionError("no problem on " + field + ": " + e.problems()));
    }

    @Test
    void badProjectSettingsAreRefusedNamingTheField() {
        Project p = TestProjects.sampledField(0.2);
        ZoneAnalysisSettings z = krigingSettings(p);
        z.setVariogramSillMgPerKgSquared(0); // a range without a sill
        z.setVariogramNuggetMgPerKgSquared(0);
        assertEquals("0", refusal(p, "variogramSillMgPerKgSquared").value());

        z.setVariogramSillMgPerKgSquared(150);
        z.setVariogramNuggetMgPerKgSquared(200); // nugget above the sill
        assertEquals("200", refusal(p, "variogramNuggetMgPerKgSquared").value());

        z.setVariogramNuggetMgPerKgSquared(0.5);
        z.getDelayYears().addAll(List.of(5.0, 1.0)); // not increasing
        assertEquals("5 1", refusal(p, "delayYears").value());

        z.getDelayYears().clear();
        z.setTransverseDispersivityFraction(0);
        Problem transverse = refusal(p, "transverseDispersivityFraction");
        assertTrue(transverse.message().contains("(0, 1]"), transverse.message());

        z.setTransverseDispersivityFraction(0.1);
        // the inverse-distance power and the number of neighbours reach the estimators
        z.setInverseDistancePower(3);
        z.setMaximumNeighbours(24);
        DesignSettings resolved = DesignSettings.defaults().resolvedFor(p);
        assertEquals(3.0, resolved.inverseDistancePower(), 0.0);
        assertEquals(24, resolved.maximumNeighbours());
        assertTrue(resolved.describe().stream().anyMatch(l -> l.startsWith("inverse-distance power") && l.endsWith("[from the project]")),
                String.join("\n", resolved.describe()));
        // a value set for the run still wins over the project's
        assertEquals(2.0, DesignSettings.builder().inverseDistancePower(2).build().resolvedFor(p).inverseDistancePower(), 0.0);
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().inverseDistancePower(0).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().maximumNeighbours(0).build());
    }
}
