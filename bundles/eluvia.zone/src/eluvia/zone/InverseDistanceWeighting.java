package eluvia.zone;

import eluvia.zone.internal.KdTree;

import java.util.stream.IntStream;

/**
 * Inverse-distance weighting of sample concentrations to block centres (Shepard 1968, Proc. 23rd
 * ACM National Conference, 517; the local form with a search neighbourhood as in Isaaks and
 * Srivastava 1989, An Introduction to Applied Geostatistics, ch. 11).
 *
 * <p>The estimate at a block centre is {@code sum(w_i z_i) / sum(w_i)} with {@code w_i = 1 / h_i^p}
 * over the at most {@code maxNeighbours} nearest samples within {@code searchRadiusMetres}, where
 * {@code h_i} is the vertically scaled distance of {@link SampleSet} in metres and {@code p} the
 * dimensionless power. A block centre within 1e-9 m of a sample takes that sample's value (the
 * limit of the formula). A block with no sample in the neighbourhood gets no estimate (NaN).
 * Neighbours are found with a k-d tree, so a model of a million blocks from a few hundred samples
 * takes about a second; blocks are estimated in parallel, with results independent of the
 * number of threads.
 */
public final class InverseDistanceWeighting {

    /** The usual power, 2 (common practice). */
    public static final double DEFAULT_POWER = 2.0;

    /** The default neighbourhood size, 16 samples (common practice). */
    public static final int DEFAULT_MAX_NEIGHBOURS = 16;

    /** The largest power accepted (dimensionless); higher powers are nearest-neighbour assignment in effect. */
    public static final double MAX_POWER = 20.0;

    /** Scaled distances below this are treated as "at the sample", m. */
    static final double COINCIDENT_METRES = 1e-9;

    private final double powerDimensionless;
    private final double searchRadiusMetres;
    private final int maxNeighbours;

    /**
     * @param powerDimensionless the power p of the inverse distance, greater than 0 and at most
     *                           {@value #MAX_POWER} ({@value #DEFAULT_POWER} is usual)
     * @param searchRadiusMetres the largest scaled distance of a sample used, m, greater than 0
     *                           ({@code Double.POSITIVE_INFINITY} for no limit)
     * @param maxNeighbours      the largest number of samples used per block, 1 or more
     */
    public InverseDistanceWeighting(double powerDimensionless, double searchRadiusMetres, int maxNeighbours) {
        if (!(powerDimensionless > 0 && powerDimensionless <= MAX_POWER)) {
            throw new ZoneInputException("inverse-distance powerDimensionless", powerDimensionless,
                    "greater than 0 and at most " + MAX_POWER + " (2 is usual)");
        }
        if (!(searchRadiusMetres > 0)) {
            throw new ZoneInputException("inverse-distance searchRadiusMetres", searchRadiusMetres,
                    "greater than 0 (Infinity for no limit)");
        }
        ZoneInputException.requireAtLeast("inverse-distance maxNeighbours", maxNeighbours, 1);
        this.powerDimensionless = powerDimensionless;
        this.searchRadiusMetres = searchRadiusMetres;
        this.maxNeighbours = maxNeighbours;
    }

    /** Power {@value #DEFAULT_POWER}, no search radius, {@value #DEFAULT_MAX_NEIGHBOURS} neighbours. */
    public static InverseDistanceWeighting withDefaults() {
        return new InverseDistanceWeighting(DEFAULT_POWER, Double.POSITIVE_INFINITY, DEFAULT_MAX_NEIGHBOURS);
    }

    /** The power p (dimensionless). */
    public double powerDimensionless() {
        return powerDimensionless;
    }

    /** The search radius, m (scaled distance; infinite for no limit). */
    public double searchRadiusMetres() {
        return searchRadiusMetres;
    }

    /** The largest number of samples used per block. */
    public int maxNeighbours() {
        return maxNeighbours;
    }

    /** Estimates every block centre of {@code blockModel} from {@code samples}. */
    public BlockEstimate estimate(SampleSet samples, BlockModel blockModel) {
        ZoneInputException.requireNonNull("samples", samples);
        ZoneInputException.requireNonNull("blockModel", blockModel);
        int nx = blockModel.countEasting();
        int ny = blockModel.countNorthing();
        int nz = blockModel.countDepth();
        double[] result = new double[blockModel.blockCount()];
        double f = samples.verticalDistanceFactor();
        KdTree tree = samples.tree();
        IntStream.range(0, ny * nz).parallel().forEach(row -> {
            int j = row % ny;
            int k = row / ny;
            double n = blockModel.centreNorthingMetres(j);
            double zScaled = f * blockModel.centreDepthMetres(k);
            KdTree.Search search = tree.newSearch(maxNeighbours);
            int base = nx * row;
            for (int i = 0; i < nx; i++) {
                result[base + i] = weigh(samples, search, blockModel.centreEastingMetres(i), n, zScaled);
            }
        });
        return new BlockEstimate(blockModel, result, null, description(samples), samples.nonDetectRule());
    }

    /**
     * Estimates the concentration at one location, mg/kg (NaN when no sample is in the
     * neighbourhood).
     */
    public double estimateAtMgPerKg(SampleSet samples, double eastingMetres, double northingMetres, double depthMetres) {
        ZoneInputException.requireNonNull("samples", samples);
        ZoneInputException.requireFinite("eastingMetres", eastingMetres);
        ZoneInputException.requireFinite("northingMetres", northingMetres);
        ZoneInputException.requireFinite("depthMetres", depthMetres);
        return weigh(samples, samples.tree().newSearch(maxNeighbours), eastingMetres, northingMetres,
                samples.verticalDistanceFactor() * depthMetres);
    }

    private double weigh(SampleSet samples, KdTree.Search search, double e, double n, double zScaled) {
        int found = search.find(e, n, zScaled, searchRadiusMetres);
        if (found == 0) {
            return Double.NaN;
        }
        if (search.distanceSquared(0) < COINCIDENT_METRES * COINCIDENT_METRES) {
            return samples.valueMgPerKg(search.index(0));
        }
        // weights relative to the nearest sample's (at most 1), so no power can underflow them all
        double nearestD2 = search.distanceSquared(0);
        double weightSum = 0;
        double weightedSum = 0;
        double halfPower = 0.5 * powerDimensionless;
        boolean squared = powerDimensionless == 2.0;
        for (int m = 0; m < found; m++) {
            double ratio = nearestD2 / search.distanceSquared(m);
            double w = squared ? ratio : Math.pow(ratio, halfPower);
            weightSum += w;
            weightedSum += w * samples.valueMgPerKg(search.index(m));
        }
        return weightedSum / weightSum;
    }

    private String description(SampleSet samples) {
        return "inverse-distance weighting, power " + powerDimensionless + ", up to " + maxNeighbours
                + " neighbours within " + (Double.isInfinite(searchRadiusMetres) ? "any distance"
                        : searchRadiusMetres + " m (scaled)")
                + ", from " + samples.description();
    }
}
