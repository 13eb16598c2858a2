package eluvia.design;

import eluvia.design.uncertainty.ProgressSink;
import eluvia.design.uncertainty.SamplingMethod;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySettings;

/**
 * The performance case of {@link UncertaintyAnalysis} over the whole design pipeline: an
 * <b>invented project</b> built in code (one 2 m sandy layer, one contaminant, one 400 m2 zone,
 * one equilibrium flushing design; not a real site, numbers chosen for timing only) with three
 * uncertain inputs (Darcy flux uniform, Koc lognormal, water content triangular).
 *
 * <p>The JMH benchmark in the release engineering module calls {@link #create(int)} once and
 * times {@link #run()}; unit tests never time it. Every run is a full pipeline run on a copy of
 * the project (validation, equilibrium flushing with the pore-volume search, the enlargement of
 * the zone by dispersion on {@link #ENLARGEMENT_CELLS_PER_AXIS} cells per axis at one delay).
 */
public final class UncertaintyAnalysisBenchmarkCase {
    /** Cells per axis of the enlargement grid in this case (the pipeline's default is 200). */
    public static final int ENLARGEMENT_CELLS_PER_AXIS = 40;

    private final Project project;
    private final DesignSettings designSettings;
    private final SimulationSettings settings;

    private UncertaintyAnalysisBenchmarkCase(Project project, DesignSettings designSettings,
            SimulationSettings settings) {
        this.project = project;
        this.designSettings = designSettings;
        this.settings = settings;
    }

    /**
     * The case with {@code runs} Latin hypercube runs on every available processor.
     *
     * @param runs the number of Monte Carlo runs, {@value SimulationSettings#MIN_RUNS} or more
     */
    public static UncertaintyAnalysisBenchmarkCase create(int runs) {
        return new UncertaintyAnalysisBenchmarkCase(project(), DesignSettings.builder()
                .enlargementCellsPerAxis(ENLARGEMENT_CELLS_PER_AXIS).delayYears(0, 5).build(),
                SimulationSettings.defaults().withRunCount(runs).withSamplingMethod(SamplingMethod.LATIN_HYPERCUBE));
    }

    /** Runs the analysis once. */
    public UncertaintyResults run() {
        return UncertaintyAnalysis.run(project, designSettings, settings, ProgressSink.NONE);
    }

    /** The invented project (a fresh copy each call). */
    public static Project project() {
        SiteFactory f = SiteFactory.eINSTANCE;
        Project p = f.createProject();
        p.setName("Benchmark case (invented)");
        p.setDescription("An invented project for timing the uncertainty analysis; not a real site.");
        Site s = f.createSite();
        s.setName("invented site");
        p.setSite(s);
        SoilLayer l = f.createSoilLayer();
        l.setName("invented sand");
        l.setTextureClass("sand");
        l.setTopDepthMetres(0);
        l.setBottomDepthMetres(2);
        l.setBulkDensityKgPerCubicMetre(1600);
        l.setPorosity(0.35);
        l.setWaterContent(0.3);
        l.setOrganicCarbonFraction(0.002);
        l.setSaturatedConductivityMetresPerDay(1);
        l.setDispersivityMetres(0.2);
        s.getLayers().add(l);
        Contaminant c = f.createContaminant();
        c.setName("invented solvent");
        c.setKocLitresPerKg(60);
        c.setDiffusionSquareMetresPerSecond(1e-9);
        p.getContaminants().add(c);
        CleanupLevel level = f.createCleanupLevel();
        level.setContaminant(c);
        level.setSoilLevelMilligramsPerKg(1);
        level.setBasis("invented");
        p.getCleanupLevels().add(level);
        TreatmentZone z = f.createTreatmentZone();
        z.setName("invented zone");
        z.setAreaSquareMetres(400);
        z.setTopDepthMetres(0);
        z.setBottomDepthMetres(2);
        SourceConcentration sc = f.createSourceConcentration();
        sc.setContaminant(c);
        sc.setSoilConcentrationMilligramsPerKg(100);
        z.getSourceConcentrations().add(sc);
        s.getZones().add(z);
        FlushingDesign d = f.createFlushingDesign();
        d.setName("invented flushing");
        d.setZone(z);
        d.setDarcyFluxMetresPerDay(0.05);
        d.setOperatingDaysPerWeek(7);
        d.setCaptureEfficiency(0.9);
        d.setCriterion(ComplianceCriterion.EFFLUENT);
        d.setMaxPoreVolumes(1000);
        p.getFlushingDesigns().add(d);
        UncertaintySettings u = f.createUncertaintySettings();
        u.setEnabled(true);
        u.getInputs().add(entry("flux", d, "darcyFluxMetresPerDay", InputDistributionKind.UNIFORM, 0.03, 0.05, 0.07));
        UncertainInput koc = entry("Koc", c, "kocLitresPerKg", InputDistributionKind.LOGNORMAL, 0, 0, 0);
        koc.setMedianInFeatureUnit(60);
        koc.setGeometricStandardDeviation(1.5);
        u.getInputs().add(koc);
        u.getInputs().add(entry("water content", l, "waterContent", InputDistributionKind.TRIANGULAR, 0.26, 0.3, 0.34));
        p.setUncertainty(u);
        return p;
    }

    private static UncertainInput entry(String name, org.eclipse.emf.ecore.EObject target, String feature,
            InputDistributionKind kind, double min, double mode, double max) {
        UncertainInput i = SiteFactory.eINSTANCE.createUncertainInput();
        i.setName(name);
        i.setTarget(target);
        i.setFeatureName(feature);
        i.setDistribution(kind);
        i.setMinimumInFeatureUnit(min);
        i.setModeInFeatureUnit(mode);
        i.setMaximumInFeatureUnit(max);
        return i;
    }
}
