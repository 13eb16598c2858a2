package eluvia.design.uncertainty;

import java.util.List;
import java.util.Map;

/**
 * The performance case of the uncertainty engine: 10,000 Latin hypercube runs of a cheap
 * analytical flushing-versus-excavation model with seven uncertain inputs, one fixed input, one
 * rank-correlated pair and a comparison of two alternatives. The numbers are an <b>invented
 * scenario</b> for timing only (a 2,000 m2 sandy layer, invented unit rates in invented currency
 * units "CU"), not a real site.
 *
 * <p>The model: Kd = Koc foc (Karickhoff et al. 1979), retardation R = 1 + rho_b Kd / theta, pore
 * volumes by the well-mixed estimate T = -R ln(C_target / C0) (US EPA pump-and-treat guidance),
 * duration T theta L / q, water T theta L A; flushing cost = mobilisation + treatment of the water
 * + daily operation; excavation cost = mobilisation + loose volume (bank volume times 1 + swell)
 * times a haul-and-disposal rate.
 *
 * <p>The benchmark in the release engineering module calls {@link #create()} once and times
 * {@link #run()} (the goal is under 2 s on two cores); unit tests never time it.
 */
public final class UncertaintyBenchmarkCase {
    /** The number of runs of {@link #run()}. */
    public static final int RUNS = 10_000;
    /** The invented treated area, m2. */
    public static final double AREA_SQUARE_METRES = 2_000;

    static final String FLUX = "Darcy flux";
    static final String WATER_CONTENT = "volumetric water content";
    static final String BULK_DENSITY = "dry bulk density";
    static final String KOC = "organic carbon partition coefficient Koc";
    static final String FOC = "fraction of organic carbon foc";
    static final String THICKNESS = "layer thickness";
    static final String CLEANUP_RATIO = "cleanup level over initial concentration";
    static final String SWELL = "swell factor";
    static final String HAUL_RATE = "haul and disposal rate";

    static final String PORE_VOLUMES = "pore volumes to the cleanup level";
    static final String DURATION = "flushing duration";
    static final String WATER = "water to capture and treat";
    static final String FLUSHING_COST = "cost of flushing";
    static final String EXCAVATION_COST = "cost of excavation";
    /** The label of the comparison of the two alternatives. */
    public static final String COMPARISON = "flushing or excavation";

    private final UncertaintyStudy study;
    private final SimulationSettings settings;

    private UncertaintyBenchmarkCase(UncertaintyStudy study, SimulationSettings settings) {
        this.study = study;
        this.settings = settings;
    }

    /** The case with {@value #RUNS} Latin hypercube runs on every available processor. */
    public static UncertaintyBenchmarkCase create() {
        return new UncertaintyBenchmarkCase(study(), SimulationSettings.defaults().withRunCount(RUNS));
    }

    /** The invented study. */
    static UncertaintyStudy study() {
        return UncertaintyStudy.builder()
                .input(UncertainInput.lognormal(FLUX, "m/d", 0.05, 1.5))
                .input(UncertainInput.triangular(WATER_CONTENT, "1", 0.25, 0.30, 0.38))
                .input(UncertainInput.normal(BULK_DENSITY, "kg/L", 1.65, 0.08))
                .input(UncertainInput.lognormalFromMeanAndStandardDeviation(KOC, "L/kg", 80, 30))
                .input(UncertainInput.uniform(FOC, "1", 0.001, 0.004))
                .input(UncertainInput.triangular(THICKNESS, "m", 2.5, 3.0, 4.0))
                .input(UncertainInput.fixed(CLEANUP_RATIO, "1", 0.01))
                .input(UncertainInput.uniform(SWELL, "1", 0.15, 0.30))
                .input(UncertainInput.triangular(HAUL_RATE, "CU/m3", 70, 90, 140))
                .rankCorrelation(RankCorrelationMatrix.builder().pair(WATER_CONTENT, BULK_DENSITY, -0.6).build())
                .output(PORE_VOLUMES, "1")
                .output(DURATION, "d")
                .output(WATER, "m3")
                .output(FLUSHING_COST, "CU")
                .output(EXCAVATION_COST, "CU")
                .compareAlternatives(COMPARISON, List.of(FLUSHING_COST, EXCAVATION_COST))
                .model(UncertaintyBenchmarkCase::evaluate)
                .build();
    }

    static Map<String, Double> evaluate(InputValues inputs) {
        double fluxMetresPerDay = inputs.get(FLUX);
        double waterContent = inputs.get(WATER_CONTENT);
        double bulkDensityKgPerLitre = inputs.get(BULK_DENSITY);
        double kdLitresPerKg = inputs.get(KOC) * inputs.get(FOC);
        double thicknessMetres = inputs.get(THICKNESS);
        double retardation = 1 + bulkDensityKgPerLitre * kdLitresPerKg / waterContent;
        double poreVolumes = -retardation * Math.log(inputs.get(CLEANUP_RATIO));
        double durationDays = poreVolumes * waterContent * thicknessMetres / fluxMetresPerDay;
        double waterCubicMetres = poreVolumes * waterContent * thicknessMetres * AREA_SQUARE_METRES;
        double flushingCost = 150_000 + 25.0 * waterCubicMetres + 350.0 * durationDays;
        double looseCubicMetres = thicknessMetres * AREA_SQUARE_METRES * (1 + inputs.get(SWELL));
        double excavationCost = 40_000 + looseCubicMetres * inputs.get(HAUL_RATE);
        return Map.of(PORE_VOLUMES, poreVolumes, DURATION, durationDays, WATER, waterCubicMetres,
                FLUSHING_COST, flushingCost, EXCAVATION_COST, excavationCost);
    }

    /** The study. */
    public UncertaintyStudy uncertaintyStudy() {
        return study;
    }

    /** The settings ({@value #RUNS} Latin hypercube runs, default seed, every processor). */
    public SimulationSettings settings() {
        return settings;
    }

    /** Runs the simulation once. */
    public UncertaintyResult run() {
        return new MonteCarloRunner(settings).run(study);
    }
}
