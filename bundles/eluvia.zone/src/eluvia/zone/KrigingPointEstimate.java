package eluvia.zone;

/**
 * The ordinary kriging estimate at one location with the weights that made it, for inspection
 * and for checking a design by hand.
 */
public final class KrigingPointEstimate {
    private final double concentrationMgPerKg;
    private final double krigingVarianceMgPerKgSquared;
    private final int[] sampleIndices;
    private final double[] weights;
    private final double lagrangeMultiplierMgPerKgSquared;

    KrigingPointEstimate(double concentrationMgPerKg, double krigingVarianceMgPerKgSquared, int[] sampleIndices,
            double[] weights, double lagrangeMultiplierMgPerKgSquared) {
        this.concentrationMgPerKg = concentrationMgPerKg;
        this.krigingVarianceMgPerKgSquared = krigingVarianceMgPerKgSquared;
        this.sampleIndices = sampleIndices;
        this.weights = weights;
        this.lagrangeMultiplierMgPerKgSquared = lagrangeMultiplierMgPerKgSquared;
    }

    /** The estimate, mg/kg (NaN when no sample is in the neighbourhood). */
    public double concentrationMgPerKg() {
        return concentrationMgPerKg;
    }

    /** The ordinary kriging variance, (mg/kg)^2 (NaN when no sample is in the neighbourhood). */
    public double krigingVarianceMgPerKgSquared() {
        return krigingVarianceMgPerKgSquared;
    }

    /** The number of samples used. */
    public int neighbourCount() {
        return sampleIndices.length;
    }

    /** The {@link SampleSet} indices of the samples used, nearest first. */
    public int[] sampleIndices() {
        return sampleIndices.clone();
    }

    /** The kriging weights (dimensionless, summing to 1), in the order of {@link #sampleIndices()}. */
    public double[] weightsDimensionless() {
        return weights.clone();
    }

    /**
     * The Lagrange multiplier {@code mu} of the unbiasedness condition, (mg/kg)^2, in the
     * covariance form {@code sum_j w_j C_ij + mu = C_i0}.
     */
    public double lagrangeMultiplierMgPerKgSquared() {
        return lagrangeMultiplierMgPerKgSquared;
    }
}
