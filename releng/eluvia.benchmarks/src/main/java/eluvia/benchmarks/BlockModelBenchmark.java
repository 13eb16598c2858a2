package eluvia.benchmarks;

import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;
import eluvia.zone.BlockModelBenchmarkCase;
import eluvia.zone.InverseDistanceWeighting;
import eluvia.zone.SampleSet;

/**
 * Time to estimate a block model of 10^6 blocks from 300 samples by inverse-distance weighting
 * (power 2, 16 nearest samples, no search radius): the zone bundle's estimator with its k-d tree
 * neighbour search ({@link BlockModelBenchmarkCase#runInverseDistance()}, the invented case of the
 * zone bundle), against a baseline that finds the 16 nearest samples of every block by computing
 * the distance to all 300 samples ({@link #allPairsEstimate}).
 *
 * <p>Both run the same parallel loop over rows of blocks on the common fork-join pool, so the
 * ratio of the two times is the gain of the tree search alone. The setup computes both estimates
 * once and refuses to run (IllegalStateException) unless every block value agrees to 1e-9
 * relative.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class BlockModelBenchmark {
    /** The agreement demanded of the two estimates (dimensionless, relative). */
    static final double RELATIVE_AGREEMENT = 1e-9;

    private BlockModelBenchmarkCase zoneCase;
    private InverseDistanceWeighting idw;

    @Setup
    public void setUp() {
        zoneCase = BlockModelBenchmarkCase.create();
        idw = InverseDistanceWeighting.withDefaults();
        double[] tree = zoneCase.runInverseDistance().concentrationsMgPerKg();
        double[] allPairs = allPairsEstimate(zoneCase.sampleSet(), zoneCase.blockModel(), idw);
        if (tree.length != allPairs.length) {
            throw new IllegalStateException("block counts differ: k-d tree " + tree.length + ", all pairs " + allPairs.length);
        }
        double worstRelative = 0;
        for (int b = 0; b < tree.length; b++) {
            double scale = Math.max(Math.abs(tree[b]), Math.abs(allPairs[b]));
            double relative = scale == 0 ? 0 : Math.abs(tree[b] - allPairs[b]) / scale;
            if (!(relative <= RELATIVE_AGREEMENT)) {
                throw new IllegalStateException("block " + b + ": k-d tree estimate " + tree[b]
                        + " mg/kg and all-pairs estimate " + allPairs[b] + " mg/kg differ by " + relative
                        + " relative (allowed: at most " + RELATIVE_AGREEMENT + "); the benchmark would compare"
                        + " different estimates");
            }
            worstRelative = Math.max(worstRelative, relative);
        }
        System.out.println("BlockModelBenchmark: " + tree.length + " blocks from " + zoneCase.sampleSet().size()
                + " samples; largest relative difference k-d tree vs all pairs = " + worstRelative
                + " (allowed " + RELATIVE_AGREEMENT + "); common pool parallelism "
                + java.util.concurrent.ForkJoinPool.getCommonPoolParallelism());
    }

    /** The zone bundle's estimator (k-d tree neighbour search). */
    @Benchmark
    public BlockEstimate kdTree() {
        return zoneCase.runInverseDistance();
    }

    /** The baseline: the same estimate with an all-pairs neighbour search. */
    @Benchmark
    public double[] allPairs() {
        return allPairsEstimate(zoneCase.sampleSet(), zoneCase.blockModel(), idw);
    }

    /**
     * Inverse-distance weighting (Shepard 1968) with the neighbours found by trying every sample:
     * for each block centre, the distances to all samples in the vertically scaled coordinates of
     * {@link SampleSet} (easting, northing, factor times depth; metres), the {@code maxNeighbours}
     * nearest kept by insertion (ties by sample index, as the zone bundle does), then
     * {@code sum(w z) / sum(w)} with {@code w = 1 / h^p}. Values in mg/kg, NaN where no sample lies
     * within the search radius.
     */
    static double[] allPairsEstimate(SampleSet samples, BlockModel model, InverseDistanceWeighting settings) {
        int sampleCount = samples.size();
        double f = samples.verticalDistanceFactor();
        double[] xMetres = new double[sampleCount];
        double[] yMetres = new double[sampleCount];
        double[] zScaledMetres = new double[sampleCount];
        double[] valueMgPerKg = new double[sampleCount];
        for (int p = 0; p < sampleCount; p++) {
            xMetres[p] = samples.eastingMetres(p);
            yMetres[p] = samples.northingMetres(p);
            zScaledMetres[p] = f * samples.midDepthMetres(p);
            valueMgPerKg[p] = samples.valueMgPerKg(p);
        }
        int k = Math.min(settings.maxNeighbours(), sampleCount);
        double radiusSquaredMetres2 = settings.searchRadiusMetres() * settings.searchRadiusMetres();
        double power = settings.powerDimensionless();
        int nx = model.countEasting();
        int ny = model.countNorthing();
        int nz = model.countDepth();
        double[] result = new double[model.blockCount()];
        IntStream.range(0, ny * nz).parallel().forEach(row -> {
            int j = row % ny;
            int layer = row / ny;
            double yQuery = model.centreNorthingMetres(j);
            double zQuery = f * model.centreDepthMetres(layer);
            int[] nearIndex = new int[k];
            double[] nearD2 = new double[k];
            for (int i = 0; i < nx; i++) {
                double xQuery = model.centreEastingMetres(i);
                int count = 0;
                for (int p = 0; p < sampleCount; p++) {
                    double dx = xQuery - xMetres[p];
                    double dy = yQuery - yMetres[p];
                    double dz = zQuery - zScaledMetres[p];
                    double d2 = dx * dx + dy * dy + dz * dz;
                    if (d2 > radiusSquaredMetres2 || (count == k && !(d2 < nearD2[k - 1]))) {
                        continue; // samples come in index order, so an equal distance never displaces
                    }
                    int pos = count == k ? k - 1 : count++;
                    while (pos > 0 && d2 < nearD2[pos - 1]) {
                        nearD2[pos] = nearD2[pos - 1];
                        nearIndex[pos] = nearIndex[pos - 1];
                        pos--;
                    }
                    nearD2[pos] = d2;
                    nearIndex[pos] = p;
                }
                result[nx * row + i] = weigh(count, nearIndex, nearD2, valueMgPerKg, power);
            }
        });
        return result;
    }

    private static double weigh(int count, int[] nearIndex, double[] nearD2, double[] valueMgPerKg, double power) {
        if (count == 0) {
            return Double.NaN;
        }
        if (nearD2[0] < 1e-18) { // within 1e-9 m of a sample: the sample's value, the limit of the formula
            return valueMgPerKg[nearIndex[0]];
        }
        double weightSum = 0;
        double weightedSum = 0;
        for (int m = 0; m < count; m++) {
            // weights relative to the nearest sample's, as the zone bundle does (same value of the estimate)
            double ratio = nearD2[0] / nearD2[m];
            double w = power == 2.0 ? ratio : Math.pow(ratio, 0.5 * power);
            weightSum += w;
            weightedSum += w * valueMgPerKg[nearIndex[m]];
        }
        return weightedSum / weightSum;
    }
}
