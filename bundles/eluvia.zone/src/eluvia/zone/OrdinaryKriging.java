package eluvia.zone;

import eluvia.zone.internal.KdTree;

import java.util.Arrays;
import java.util.stream.IntStream;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * Ordinary (point) kriging of sample concentrations to block centres (Matheron 1963, Econ. Geol.
 * 58:1246; Journel and Huijbregts 1978, Mining Geostatistics; Isaaks and Srivastava 1989, An
 * Introduction to Applied Geostatistics, ch. 12).
 *
 * <p>At each block centre {@code x0} the at most {@code maxNeighbours} nearest samples within the
 * search radius (vertically scaled distances of {@link SampleSet}, m) get weights {@code w_i}
 * from the system, in covariance form {@code C(h) = sill - gamma(h)} of the chosen
 * {@link VariogramModel}:
 * <pre>
 *   sum_j w_j C(x_i, x_j) + mu = C(x_i, x0)   for every neighbour i
 *   sum_j w_j                  = 1
 * </pre>
 * solved by LU decomposition (Commons Math 3.6.1 {@code LUDecomposition}) after dividing the
 * covariances by the sill so that the singularity test does not depend on the concentration
 * unit. The estimate is {@code sum w_i z_i} and the kriging variance
 * {@code sigma^2 = C(0) - sum w_i C(x_i, x0) - mu}. With {@code gamma(0) = 0} the estimate
 * reproduces a sample's value at its own location, with or without a nugget (exact
 * interpolator). Negative weights can make an estimate slightly negative near steep gradients;
 * such values are returned as they are (they are below any cleanup level).
 *
 * <p>The estimate is for the point at the block centre; the point kriging variance is larger
 * than that of the block mean. Blocks in one row that share the same neighbour set reuse one
 * decomposition; rows are estimated in parallel with results independent of the thread count.
 */
public final class OrdinaryKriging {

    /** The default neighbourhood size, 16 samples (common practice). */
    public static final int DEFAULT_MAX_NEIGHBOURS = 16;

    /** The largest neighbourhood accepted (the system grows with its cube). */
    public static final int MAX_NEIGHBOURS = 200;

    private final VariogramModel variogram;
    private final int maxNeighbours;
    private final double searchRadiusMetres;

    /**
     * @param variogram          the variogram model chosen by the engineer
     * @param maxNeighbours      the largest number of samples per block, 1 to {@value #MAX_NEIGHBOURS}
     * @param searchRadiusMetres the largest scaled distance of a sample used, m, greater than 0
     *                           ({@code Double.POSITIVE_INFINITY} for no limit)
     */
    public OrdinaryKriging(VariogramModel variogram, int maxNeighbours, double searchRadiusMetres) {
        ZoneInputException.requireNonNull("variogram model", variogram);
        if (maxNeighbours < 1 || maxNeighbours > MAX_NEIGHBOURS) {
            throw new ZoneInputException("kriging maxNeighbours", maxNeighbours, "1 to " + MAX_NEIGHBOURS);
        }
        if (!(searchRadiusMetres > 0)) {
            throw new ZoneInputException("kriging searchRadiusMetres", searchRadiusMetres,
                    "greater than 0 (Infinity for no limit)");
        }
        this.variogram = variogram;
        this.maxNeighbours = maxNeighbours;
        this.searchRadiusMetres = searchRadiusMetres;
    }

    /** The variogram model. */
    public VariogramModel variogram() {
        return variogram;
    }

    /** The largest number of samples per block. */
    public int maxNeighbours() {
        return maxNeighbours;
    }

    /** The search radius, scaled m (infinite for no limit). */
    public double searchRadiusMetres() {
        return searchRadiusMetres;
    }

    /**
     * Estimates every block centre, with the kriging variance per block.
     *
     * @throws ZoneInputException when a kriging system is singular (typically a Gaussian model
     *                            without nugget); the message says what to change
     */
    public BlockEstimate estimate(SampleSet samples, BlockModel blockModel) {
        ZoneInputException.requireNonNull("samples", samples);
        ZoneInputException.requireNonNull("blockModel", blockModel);
        int nx = blockModel.countEasting();
        int ny = blockModel.countNorthing();
        int nz = blockModel.countDepth();
        double[] concentration = new double[blockModel.blockCount()];
        double[] variance = new double[blockModel.blockCount()];
        double f = samples.verticalDistanceFactor();
        IntStream.range(0, ny * nz).parallel().forEach(row -> {
            int j = row % ny;
            int k = row / ny;
            double n = blockModel.centreNorthingMetres(j);
            double depth = blockModel.centreDepthMetres(k);
            KdTree.Search search = samples.tree().newSearch(maxNeighbours);
            int[] previousSet = null;
            DecompositionSolver previousSolver = null;
            int base = nx * row;
            for (int i = 0; i < nx; i++) {
                double e = blockModel.centreEastingMetres(i);
                int found = search.find(e, n, f * depth, searchRadiusMetres);
                if (found == 0) {
                    concentration[base + i] = Double.NaN;
                    variance[base + i] = Double.NaN;
                    previousSet = null;
                    continue;
                }
                int[] set = search.sortedIndices();
                DecompositionSolver solver = Arrays.equals(set, previousSet) ? previousSolver
                        : decompose(samples, set, e, n, depth);
                double[] result = solve(samples, set, solver, e, n, depth, null);
                concentration[base + i] = result[0];
                variance[base + i] = result[1];
                previousSet = set;
                previousSolver = solver;
            }
        });
        return new BlockEstimate(blockModel, concentration, variance, description(samples), samples.nonDetectRule());
    }

    /** Kriges one location and returns the weights with the estimate. */
    public KrigingPointEstimate estimateAt(SampleSet samples, double eastingMetres, double northingMetres,
            double depthMetres) {
        ZoneInputException.requireNonNull("samples", samples);
        ZoneInputException.requireFinite("eastingMetres", eastingMetres);
        ZoneInputException.requireFinite("northingMetres", northingMetres);
        ZoneInputException.requireFinite("depthMetres", depthMetres);
        KdTree.Search search = samples.tree().newSearch(maxNeighbours);
        int found = search.find(eastingMetres, northingMetres, samples.verticalDistanceFactor() * depthMetres,
                searchRadiusMetres);
        if (found == 0) {
            return new KrigingPointEstimate(Double.NaN, Double.NaN, new int[0], new double[0], Double.NaN);
        }
        int[] nearestFirst = new int[found];
        for (int m = 0; m < found; m++) {
            nearestFirst[m] = search.index(m);
        }
        DecompositionSolver solver = decompose(samples, nearestFirst, eastingMetres, northingMetres, depthMetres);
        double[] weights = new double[found + 1];
        double[] result = solve(samples, nearestFirst, solver, eastingMetres, northingMetres, depthMetres, weights);
        return new KrigingPointEstimate(result[0], result[1], nearestFirst, Arrays.copyOf(weights, found),
                weights[found] * variogram.sillMgPerKgSquared());
    }

    private DecompositionSolver decompose(SampleSet samples, int[] set, double e, double n, double depth) {
        int m = set.length;
        double sill = variogram.sillMgPerKgSquared();
        double[][] a = new double[m + 1][m + 1];
        for (int r = 0; r < m; r++) {
            a[r][r] = 1.0;
            for (int c = r + 1; c < m; c++) {
                double cov = variogram.covarianceMgPerKgSquared(samples.scaledDistanceMetres(set[r], set[c])) / sill;
                a[r][c] = cov;
                a[c][r] = cov;
            }
            a[r][m] = 1.0;
            a[m][r] = 1.0;
        }
        DecompositionSolver solver = new LUDecomposition(new Array2DRowRealMatrix(a, false)).getSolver();
        if (!solver.isNonSingular()) {
            throw singular(samples, set, e, n, depth);
        }
        return solver;
    }

    private RealVector rightHandSide(SampleSet samples, int[] set, double e, double n, double depth) {
        int m = set.length;
        double sill = variogram.sillMgPerKgSquared();
        double[] b = new double[m + 1];
        for (int r = 0; r < m; r++) {
            b[r] = variogram.covarianceMgPerKgSquared(samples.scaledDistanceMetres(set[r], e, n, depth)) / sill;
        }
        b[m] = 1.0;
        return new ArrayRealVector(b, false);
    }

    /**
     * Returns {estimate mg/kg, variance (mg/kg)^2}; when {@code solution} is given it receives the
     * weights followed by the normalised Lagrange multiplier (mu / sill).
     */
    private double[] solve(SampleSet samples, int[] set, DecompositionSolver solver, double e, double n,
            double depth, double[] solution) {
        RealVector b = rightHandSide(samples, set, e, n, depth);
        RealVector x;
        try {
            x = solver.solve(b);
        } catch (SingularMatrixException ex) {
            throw singular(samples, set, e, n, depth);
        }
        int m = set.length;
        if (solution != null) {
            for (int r = 0; r <= m; r++) {
                solution[r] = x.getEntry(r);
            }
        }
        double estimate = 0;
        double weightedCovariance = 0;
        for (int r = 0; r < m; r++) {
            estimate += x.getEntry(r) * samples.valueMgPerKg(set[r]);
            weightedCovariance += x.getEntry(r) * b.getEntry(r);
        }
        // normalised: C(0)/sill = 1; a variance below zero can only come from rounding
        double normalisedVariance = 1.0 - weightedCovariance - x.getEntry(m);
        return new double[] { estimate, Math.max(0.0, normalisedVariance) * variogram.sillMgPerKgSquared() };
    }

    private ZoneInputException singular(SampleSet samples, int[] set, double e, double n, double depth) {
        return new ZoneInputException("variogram model", variogram.description(),
                "one whose kriging system can be solved: the system for the location (" + e + " m E, " + n + " m N, "
                        + depth + " m deep) with " + set.length
                        + " neighbours is singular; add a small nugget (about 1 % of the sill), use a spherical "
                        + "or exponential shape, or shorten the range");
    }

    private String description(SampleSet samples) {
        return "ordinary kriging, " + variogram.description() + ", up to " + maxNeighbours + " neighbours within "
                + (Double.isInfinite(searchRadiusMetres) ? "any distance" : searchRadiusMetres + " m (scaled)")
                + ", from " + samples.description();
    }
}
