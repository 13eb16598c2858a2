package eluvia.zone;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * The performance case for the zone estimators: a block model of one million blocks
 * (100 x 100 x 100 blocks of 1 m x 1 m x 0.1 m, a 100 m x 100 m site to 10 m depth) and 300 soil
 * samples (30 borings, ten 1 m intervals each). The concentrations are an <b>invented scenario</b>
 * for timing only, not a real site: a smooth plume (peak 50 mg/kg at 3 m depth near the site
 * centre, lateral spread 20 m, vertical 2 m) times log-normal scatter, with results below
 * 0.05 mg/kg reported as non-detects at that limit.
 *
 * <p>The benchmark in the release engineering module calls {@link #create()} once and then times
 * {@link #runInverseDistance()} (the target is under 2 s on two cores) and
 * {@link #runOrdinaryKriging()}; unit tests never time it.
 */
public final class BlockModelBenchmarkCase {

    /** The seed of {@link #create()}. */
    public static final long DEFAULT_SEED = 20_261_201L;

    /** The invented detection limit, mg/kg. */
    public static final double DETECTION_LIMIT_MG_PER_KG = 0.05;

    private final BlockModel blockModel;
    private final List<SoilSample> samples;
    private final SampleSet sampleSet;

    private BlockModelBenchmarkCase(BlockModel blockModel, List<SoilSample> samples) {
        this.blockModel = blockModel;
        this.samples = List.copyOf(samples);
        this.sampleSet = SampleSet.of(samples, NonDetectRule.HALF_DETECTION_LIMIT);
    }

    /** Builds the case with {@link #DEFAULT_SEED}. */
    public static BlockModelBenchmarkCase create() {
        return create(DEFAULT_SEED);
    }

    /** Builds the case; the same seed gives the same samples. */
    public static BlockModelBenchmarkCase create(long seed) {
        BlockModel model = new BlockModel(0, 0, 0, 1.0, 1.0, 0.1, 100, 100, 100);
        Random random = new Random(seed);
        List<SoilSample> samples = new ArrayList<>(300);
        for (int boring = 0; boring < 30; boring++) {
            double e = 100 * random.nextDouble();
            double n = 100 * random.nextDouble();
            double lateralSquared = (e - 50) * (e - 50) + (n - 50) * (n - 50);
            for (int interval = 0; interval < 10; interval++) {
                double mid = interval + 0.5;
                double plume = 50.0 * Math.exp(-lateralSquared / (2 * 20.0 * 20.0))
                        * Math.exp(-(mid - 3.0) * (mid - 3.0) / (2 * 2.0 * 2.0));
                double c = plume * Math.exp(0.5 * random.nextGaussian());
                samples.add(c < DETECTION_LIMIT_MG_PER_KG
                        ? SoilSample.belowDetection(e, n, interval, interval + 1.0, DETECTION_LIMIT_MG_PER_KG)
                        : SoilSample.detected(e, n, interval, interval + 1.0, c));
            }
        }
        return new BlockModelBenchmarkCase(model, samples);
    }

    /** The block model (10^6 blocks). */
    public BlockModel blockModel() {
        return blockModel;
    }

    /** The 300 invented samples. */
    public List<SoilSample> samples() {
        return samples;
    }

    /** The samples prepared with half the detection limit for non-detects and the default vertical factor. */
    public SampleSet sampleSet() {
        return sampleSet;
    }

    /** Inverse-distance weighting with the defaults (power 2, 16 neighbours, no radius). */
    public BlockEstimate runInverseDistance() {
        return InverseDistanceWeighting.withDefaults().estimate(sampleSet, blockModel);
    }

    /** Ordinary kriging, spherical model (nugget 10 %, sill = sample variance, range 40 m scaled), 16 neighbours. */
    public BlockEstimate runOrdinaryKriging() {
        double sill = sampleSet.valueVarianceMgPerKgSquared();
        VariogramModel model = new VariogramModel(VariogramShape.SPHERICAL, 0.1 * sill, sill, 40.0);
        return new OrdinaryKriging(model, OrdinaryKriging.DEFAULT_MAX_NEIGHBOURS, Double.POSITIVE_INFINITY)
                .estimate(sampleSet, blockModel);
    }

    /** The zone above an invented cleanup level from an estimate of this case. */
    public ExceedanceZone zoneAbove(BlockEstimate estimate, double cleanupLevelMgPerKg) {
        return ExceedanceZone.find(new ContaminantEstimate("invented contaminant", estimate, cleanupLevelMgPerKg));
    }
}
