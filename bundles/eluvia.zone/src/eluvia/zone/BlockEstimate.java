package eluvia.zone;

import java.util.Arrays;
import java.util.Optional;

/**
 * Concentrations of one contaminant estimated at every block centre of a {@link BlockModel},
 * with the kriging variance per block when the method gives one, and a statement of how the
 * values were obtained (method, settings, samples, non-detect rule).
 *
 * <p>A block with no sample within the search neighbourhood has no estimate: its concentration
 * is NaN and it is counted in {@link #unestimatedBlockCount()}; such blocks are never counted as
 * above a cleanup level, so a result with unestimated blocks says so. Concentrations are in mg/kg
 * of dry soil, kriging variances in (mg/kg)^2.
 */
public final class BlockEstimate {
    private final BlockModel blockModel;
    private final double[] concentrationMgPerKg;
    private final double[] krigingVarianceMgPerKgSquared;
    private final String methodDescription;
    private final NonDetectRule nonDetectRule;
    private final int unestimatedBlockCount;

    BlockEstimate(BlockModel blockModel, double[] concentrationMgPerKg, double[] krigingVarianceMgPerKgSquared,
            String methodDescription, NonDetectRule nonDetectRule) {
        this.blockModel = blockModel;
        this.concentrationMgPerKg = concentrationMgPerKg;
        this.krigingVarianceMgPerKgSquared = krigingVarianceMgPerKgSquared;
        this.methodDescription = methodDescription;
        this.nonDetectRule = nonDetectRule;
        int missing = 0;
        for (double c : concentrationMgPerKg) {
            if (Double.isNaN(c)) {
                missing++;
            }
        }
        this.unestimatedBlockCount = missing;
    }

    /**
     * An estimate made elsewhere (for example a concentration field evaluated from a formula, or
     * another estimator), to be used in {@link ExceedanceZone}. The array is copied.
     *
     * @param blockModel           the block model the values belong to
     * @param concentrationMgPerKg one value per block in linear block order, mg/kg; NaN for a block
     *                             without an estimate, otherwise finite
     * @param methodDescription    how the values were obtained, for the results
     */
    public static BlockEstimate ofValues(BlockModel blockModel, double[] concentrationMgPerKg, String methodDescription) {
        ZoneInputException.requireNonNull("blockModel", blockModel);
        ZoneInputException.requireNonNull("concentrationMgPerKg", concentrationMgPerKg);
        ZoneInputException.requireNonNull("methodDescription", methodDescription);
        if (concentrationMgPerKg.length != blockModel.blockCount()) {
            throw new ZoneInputException("concentrationMgPerKg length", concentrationMgPerKg.length,
                    "equal to the block count " + blockModel.blockCount());
        }
        for (int b = 0; b < concentrationMgPerKg.length; b++) {
            if (Double.isInfinite(concentrationMgPerKg[b])) {
                throw new ZoneInputException("concentrationMgPerKg[" + b + "]", concentrationMgPerKg[b],
                        "finite, or NaN for a block without an estimate");
            }
        }
        return new BlockEstimate(blockModel, concentrationMgPerKg.clone(), null, methodDescription, null);
    }

    /** The block model the values belong to. */
    public BlockModel blockModel() {
        return blockModel;
    }

    /** The estimated concentration at the centre of a block, mg/kg (NaN when not estimated). */
    public double concentrationMgPerKg(int blockIndex) {
        return concentrationMgPerKg[checkIndex(blockIndex)];
    }

    /** A copy of all block concentrations in linear block order, mg/kg. */
    public double[] concentrationsMgPerKg() {
        return concentrationMgPerKg.clone();
    }

    /** True when the method gives a kriging variance per block. */
    public boolean hasKrigingVariance() {
        return krigingVarianceMgPerKgSquared != null;
    }

    /**
     * The kriging variance at the centre of a block, (mg/kg)^2 (NaN when not estimated).
     *
     * @throws IllegalStateException when the method gives no variance (see {@link #hasKrigingVariance()})
     */
    public double krigingVarianceMgPerKgSquared(int blockIndex) {
        if (krigingVarianceMgPerKgSquared == null) {
            throw new IllegalStateException("no kriging variance: the estimate was made by " + methodDescription);
        }
        return krigingVarianceMgPerKgSquared[checkIndex(blockIndex)];
    }

    /** A copy of all kriging variances in linear block order, (mg/kg)^2, when the method gives them. */
    public Optional<double[]> krigingVariancesMgPerKgSquared() {
        return Optional.ofNullable(krigingVarianceMgPerKgSquared).map(double[]::clone);
    }

    /** How the values were obtained: method, settings and samples. */
    public String methodDescription() {
        return methodDescription;
    }

    /** The non-detect rule of the samples, when the values come from samples. */
    public Optional<NonDetectRule> nonDetectRule() {
        return Optional.ofNullable(nonDetectRule);
    }

    /** The number of blocks without an estimate (no sample in the search neighbourhood). */
    public int unestimatedBlockCount() {
        return unestimatedBlockCount;
    }

    /** The number of blocks with an estimate. */
    public int estimatedBlockCount() {
        return concentrationMgPerKg.length - unestimatedBlockCount;
    }

    /** The largest estimated block concentration, mg/kg (NaN when no block is estimated). */
    public double maxConcentrationMgPerKg() {
        return Arrays.stream(concentrationMgPerKg).filter(c -> !Double.isNaN(c)).max().orElse(Double.NaN);
    }

    private int checkIndex(int blockIndex) {
        if (blockIndex < 0 || blockIndex >= concentrationMgPerKg.length) {
            throw new ZoneInputException("block index", blockIndex, "0 to " + (concentrationMgPerKg.length - 1));
        }
        return blockIndex;
    }
}
