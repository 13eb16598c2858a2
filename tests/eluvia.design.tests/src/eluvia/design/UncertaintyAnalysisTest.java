package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.EObject;
import org.junit.jupiter.api.Test;

import eluvia.design.uncertainty.ProgressSink;
import eluvia.design.uncertainty.SamplingMethod;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.design.uncertainty.Tornado;
import eluvia.design.uncertainty.UncertaintyInputException;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySettings;

/**
 * The uncertainty analysis over the whole pipeline, on projects built in the test (test data: one
 * 2 m layer, theta 0.3, rho_b 1600 kg/m3, foc 0.002, Koc 59 L/kg, flux 0.05 m/d, 5 operating days
 * a week; {@link TestProjects#singleLayer}).
 *
 * <p>With n = 21 runs the R_7 percentiles fall exactly on order statistics (h = (n - 1) p + 1 =
 * 3, 11, 19 for P10, P50, P90; Hyndman and Fan 1996 definition 7), so a monotone transform of
 * one uncertain input maps the input's sample percentiles onto the output's exactly.
 */
final class UncertaintyAnalysisTest {

    private static final int RUNS = 21;
    /** Small grid and one delay keep each pipeline run cheap; the enlargement is not what these tests check. */
    private static final DesignSettings FAST = DesignSettings.builder().enlargementCellsPerAxis(20).delayYears(0, 1)
            .pushDownBelowColumn(false).build();

    private static SimulationSettings settings(int runs, int threads) {
        return new SimulationSettings(runs, SamplingMethod.LATIN_HYPERCUBE, 7L, threads, 0);
    }

    private static UncertainInput entry(String name, EObject target, String feature, InputDistributionKind kind) {
        UncertainInput i = SiteFactory.eINSTANCE.createUncertainInput();
        i.setName(name);
        i.setTarget(target);
        i.setFeatureName(feature);
        i.setDistribution(kind);
        return i;
    }

    private static UncertainInput uniform(String name, EObject target, String feature, double min, double max) {
        UncertainInput i = entry(name, target, feature, InputDistributionKind.UNIFORM);
        i.setMinimumInFeatureUnit(min);
        i.setMaximumInFeatureUnit(max);
        return i;
    }

    private static Project project() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        UncertaintySettings u = SiteFactory.eINSTANCE.createUncertaintySettings();
        u.setEnabled(true);
        p.setUncertainty(u);
        return p;
    }

    private static Project withInputs(Project p, UncertainInput... inputs) {
        p.getUncertainty().getInputs().addAll(Arrays.asList(inputs));
        return p;
    }

    /** The sample order statistic x(rank) (1-based) of an input over the completed runs. */
    private static double orderStatistic(UncertaintyResults r, String input, int rank) {
        double[] values = r.simulation().runs().completedInputValues(input).clone();
        Arrays.sort(values);
        return values[rank - 1];
    }

    private static double poreVolumesAt(Project p, double fluxMetresPerDay, double kocLitresPerKg) {
        Project copy = org.eclipse.emf.ecore.util.EcoreUtil.copy(p);
        copy.setUncertainty(null);
        copy.getFlushingDesigns().get(0).setDarcyFluxMetresPerDay(fluxMetresPerDay);
        copy.getContaminants().get(0).setKocLitresPerKg(kocLitresPerKg);
        return DesignPipeline.run(copy, FAST, DesignProgress.NONE).flushing().get(0).poreVolumes();
    }

    @Test
    void durationIsTheDurationAtTheFluxPercentileOnTheOtherSide() {
        Project p = project();
        withInputs(p, uniform("flux", p.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", 0.03, 0.07));

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(RUNS, 2), ProgressSink.NONE);

        assertEquals(RUNS, r.completedRunCount());
        UncertaintyHeadline duration = r.headline("flush A", UncertaintyAnalysis.DURATION);
        assertEquals("d", duration.unit());
        // duration = T theta L / q x 7 / 5 (REFERENCES.md: T = q t / (theta L); 5 operating days a week)
        // falls as q rises, so its P10 is the duration at the flux's P90 (order statistic 19 of 21)
        double q90 = orderStatistic(r, "flux", 19);
        double expectedP10 = poreVolumesAt(p, q90, 59) * 0.3 * 2 / q90 * 7 / 5;
        assertEquals(expectedP10, duration.statistics().p10(), 1e-9 * expectedP10);
        double q10 = orderStatistic(r, "flux", 3);
        double expectedP90 = poreVolumesAt(p, q10, 59) * 0.3 * 2 / q10 * 7 / 5;
        assertEquals(expectedP90, duration.statistics().p90(), 1e-9 * expectedP90);
        // the flux's sample P90 lies in its Latin hypercube stratum: within 1/21 in probability of the
        // uniform's 0.9 quantile 0.03 + 0.9 x 0.04 = 0.066 m/d
        assertEquals(0.066, q90, 0.04 / RUNS);
        // the base value is the deterministic design at the entered 0.05 m/d
        assertEquals(DesignPipeline.run(stripped(p), FAST, DesignProgress.NONE).flushing().get(0).calendarDays(),
                duration.baseValue(), 1e-9 * duration.baseValue());

        // pore volumes barely move: dispersion scales with v, only the small D0 tau term does not
        // (REFERENCES.md: D = alpha_L v + D0 tau, P = v L / D); here D0 tau / (alpha v) is about 0.1 %
        UncertaintyHeadline pv = r.headline("flush A", UncertaintyAnalysis.PORE_VOLUMES);
        assertTrue((pv.statistics().max() - pv.statistics().min()) < 0.01 * pv.statistics().p50(), pv.statistics().toString());
    }

    private static Project stripped(Project p) {
        Project copy = org.eclipse.emf.ecore.util.EcoreUtil.copy(p);
        copy.setUncertainty(null);
        return copy;
    }

    @Test
    void poreVolumesScaleWithTheRetardationFactor() {
        Project p = project();
        withInputs(p, uniform("Koc", p.getContaminants().get(0), "kocLitresPerKg", 30, 120));

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(RUNS, 2), ProgressSink.NONE);

        // REFERENCES.md: without decay every solution depends on T/R only, so the pore volumes needed
        // scale exactly with R = 1 + rho_b Koc foc / theta (rho_b 1.6 kg/L, foc 0.002, theta 0.3),
        // which rises with Koc: PV percentiles are PV(base) x R(Koc percentile) / R(base)
        double baseR = 1 + 1.6 * 59 * 0.002 / 0.3;
        double basePv = poreVolumesAt(p, 0.05, 59);
        UncertaintyHeadline pv = r.headline("flush A", UncertaintyAnalysis.PORE_VOLUMES);
        int[] ranks = { 3, 11, 19 };
        double[] percentiles = { pv.statistics().p10(), pv.statistics().p50(), pv.statistics().p90() };
        for (int i = 0; i < 3; i++) {
            double koc = orderStatistic(r, "Koc", ranks[i]);
            double expected = basePv * (1 + 1.6 * koc * 0.002 / 0.3) / baseR;
            // tolerance: the pore-volume search's relative accuracy 1e-10 (PoreVolumeSearch), with room for the series
            assertEquals(expected, percentiles[i], 1e-7 * expected, "rank " + ranks[i]);
        }
        // and Koc is the only input, so PV and Koc are perfectly rank-correlated (Spearman = 1)
        assertEquals(1.0, r.rankCorrelations().coefficient("Koc", pv.outputName()), 1e-12);
    }

    @Test
    void theSameSeedGivesTheSameResultsWithAnyNumberOfThreads() {
        Project p = project();
        withInputs(p, uniform("flux", p.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", 0.03, 0.07),
                uniform("Koc", p.getContaminants().get(0), "kocLitresPerKg", 40, 80));

        UncertaintyResults one = UncertaintyAnalysis.run(p, FAST, settings(10, 1), ProgressSink.NONE);
        UncertaintyResults two = UncertaintyAnalysis.run(p, FAST, settings(10, 2), ProgressSink.NONE);
        UncertaintyResults other = UncertaintyAnalysis.run(p, FAST, settings(10, 2).withSeed(8L), ProgressSink.NONE);

        String name = one.headline("flush A", UncertaintyAnalysis.DURATION).outputName();
        // reproducibility by construction of the engine (sample drawn in advance from the seed)
        assertTrue(Arrays.equals(one.simulation().runs().outputColumn(name), two.simulation().runs().outputColumn(name)));
        assertEquals(one.headlines().get(0).statistics(), two.headlines().get(0).statistics());
        assertFalse(Arrays.equals(one.simulation().runs().outputColumn(name), other.simulation().runs().outputColumn(name)));
    }

    @Test
    void cancellingStopsTheAnalysisWithAPartialResult() {
        Project p = project();
        withInputs(p, uniform("flux", p.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", 0.03, 0.07));
        int[] calls = { 0 };
        ProgressSink cancelAtOnce = new ProgressSink() {
            @Override
            public void worked(int done, int total) {
                calls[0]++;
            }

            @Override
            public boolean cancelled() {
                return true;
            }
        };

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(2_000, 2), cancelAtOnce);

        assertTrue(r.cancelled());
        assertTrue(r.completedRunCount() + r.failedRunCount() < 2_000, r.completedRunCount() + " runs completed");
    }

    @Test
    void runsThatFailValidationAreCountedWithTheirReason() {
        Project p = project();
        UncertainInput flux = entry("flux", p.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", InputDistributionKind.NORMAL);
        flux.setMeanInFeatureUnit(0.05);
        flux.setStandardDeviationInFeatureUnit(0.05);
        withInputs(p, flux);

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(40, 2), ProgressSink.NONE);

        // a Darcy flux of 0 or less fails validation (the validator's "greater than 0 m/d"): count them in the sample
        long nonPositive = Arrays.stream(r.simulation().runs().inputColumn("flux")).filter(q -> q <= 0).count();
        assertTrue(nonPositive > 0, "the normal N(0.05, 0.05) puts about 16 % of the draws at or below 0");
        assertEquals(nonPositive, r.failedRunCount());
        assertEquals(40 - nonPositive, r.completedRunCount());
        assertEquals(1, r.failureCounts().size(), r.failureCounts().toString());
        Map.Entry<String, Integer> reason = r.failureCounts().entrySet().iterator().next();
        assertTrue(reason.getKey().startsWith("validation: Flushing design 'flush A' field darcyFluxMetresPerDay"), reason.getKey());
        assertEquals((int) nonPositive, reason.getValue());
        assertTrue(r.simulation().failedRuns().get(0).reason().contains("greater than 0"), r.simulation().failedRuns().get(0).reason());
    }

    @Test
    void theTornadoPutsTheDominantInputFirst() {
        Project p = project();
        withInputs(p, uniform("Koc", p.getContaminants().get(0), "kocLitresPerKg", 58, 60),
                uniform("flux", p.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", 0.03, 0.07));

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(20, 2), ProgressSink.NONE);

        // duration ~ R / q: the flux spans a factor 2.3, R (Koc 58 to 60) about 1 %: the flux dominates
        Tornado t = r.headline("flush A", UncertaintyAnalysis.DURATION).tornado();
        assertEquals(List.of("flux", "Koc"), t.bars().stream().map(b -> b.inputName()).toList());
        assertTrue(t.bars().get(0).swing() > 10 * t.bars().get(1).swing());
    }

    @Test
    void pricedAlternativesGetCostsAndTheChanceOfBeingCheapest() {
        Project p = project();
        p.getPriceBooks().add(TestProjects.fullPriceBook());
        p.getFlushingDesigns().get(0).setPriceBook(p.getPriceBooks().get(0));
        p.getExcavationDesigns().add(TestProjects.excavation("dig A", p.getSite().getZones().get(0),
                eluvia.site.model.ExcavationSoilType.TYPE_C, 0.2));
        p.getExcavationDesigns().get(0).setPriceBook(p.getPriceBooks().get(0));
        withInputs(p, uniform("flux", p.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", 0.03, 0.07));

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(20, 2), ProgressSink.NONE);

        List<UncertaintyHeadline> values = r.headlines().stream()
                .filter(h -> h.quantity().equals(UncertaintyAnalysis.PRESENT_VALUE)).toList();
        assertTrue(values.size() >= 2, r.headlines().toString());
        assertEquals("EUR", values.get(0).unit());
        assertEquals(1, r.cheapest().size());
        // probabilities of a partition of the runs sum to 1 (common practice)
        assertEquals(1.0, r.cheapest().get(0).probabilities().stream().mapToDouble(Double::doubleValue).sum(), 1e-12);
        // excavation quantities do not depend on the flux: every run gives the base value
        UncertaintyHeadline bank = r.headline("dig A", UncertaintyAnalysis.CONTAMINATED_BANK_VOLUME);
        assertEquals(bank.baseValue(), bank.statistics().min(), 0);
        assertEquals(bank.baseValue(), bank.statistics().max(), 0);
    }

    @Test
    void theExampleProjectRunsWithItsOwnInputs() throws Exception {
        Project p = eluvia.site.files.ExampleProjects.loadRiversideDepot();
        // the example carries uncertain inputs but leaves the analysis off (each run of the example costs
        // about a second of processor time), so a plain design run of the example stays quick
        assertFalse(UncertaintyAnalysis.enabled(p));
        p.getUncertainty().setEnabled(true);
        assertTrue(UncertaintyAnalysis.enabled(p));

        UncertaintyResults r = UncertaintyAnalysis.run(p, FAST, settings(8, 2), ProgressSink.NONE);

        // Iman-Conover needs more runs than inputs plus one (5 inputs, one correlation)
        assertEquals(8, r.completedRunCount() + r.failedRunCount());
        assertEquals(5, r.inputs().size());
        assertEquals("m/d", r.inputs().get(2).unit());
        assertEquals("USD/m3", r.inputs().get(3).unit());
        assertEquals("mg/kg", r.inputs().get(4).unit());
    }

    @Test
    void badInputsAreRefusedWithTheQuantityNamed() {
        Project none = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        UncertaintyInputException noSettings = assertThrows(UncertaintyInputException.class,
                () -> UncertaintyAnalysis.run(none, FAST, settings(20, 1), ProgressSink.NONE));
        assertTrue(noSettings.getMessage().contains("uncertainty settings"), noSettings.getMessage());
        assertFalse(UncertaintyAnalysis.enabled(none));

        Project empty = project();
        UncertaintyInputException noInputs = assertThrows(UncertaintyInputException.class,
                () -> UncertaintyAnalysis.run(empty, FAST, settings(20, 1), ProgressSink.NONE));
        assertTrue(noInputs.getMessage().contains("number of uncertain inputs"), noInputs.getMessage());
        assertFalse(UncertaintyAnalysis.enabled(empty));

        Project invalid = project();
        withInputs(invalid, uniform("flux", invalid.getFlushingDesigns().get(0), "darcyFluxMetresPerDay", 0.07, 0.03));
        DesignInputException e = assertThrows(DesignInputException.class,
                () -> UncertaintyAnalysis.run(invalid, FAST, settings(20, 1), ProgressSink.NONE));
        assertTrue(e.getMessage().contains("maximumInFeatureUnit"), e.getMessage());

        assertThrows(UncertaintyInputException.class,
                () -> UncertaintyAnalysis.run(null, FAST, settings(20, 1), ProgressSink.NONE));
    }

    @Test
    void unitsComeFromTheFeatureNames() {
        // the model names every SI unit in the feature name (common practice of this project's model)
        SiteFactory f = SiteFactory.eINSTANCE;
        assertEquals("m/d", UncertaintyAnalysis.unitOf(f.createFlushingDesign(), "darcyFluxMetresPerDay"));
        assertEquals("L/kg", UncertaintyAnalysis.unitOf(f.createContaminant(), "kocLitresPerKg"));
        assertEquals("kg/m3", UncertaintyAnalysis.unitOf(f.createSoilLayer(), "bulkDensityKgPerCubicMetre"));
        assertEquals("m2/s", UncertaintyAnalysis.unitOf(f.createContaminant(), "diffusionSquareMetresPerSecond"));
        assertEquals("1", UncertaintyAnalysis.unitOf(f.createSoilLayer(), "porosity"));
    }

    @Test
    void theBenchmarkCaseRuns() {
        UncertaintyResults r = UncertaintyAnalysisBenchmarkCase.create(10).run();
        assertEquals(10, r.completedRunCount(), r.failureCounts().toString());
        assertEquals(3, r.inputs().size());
    }
}
