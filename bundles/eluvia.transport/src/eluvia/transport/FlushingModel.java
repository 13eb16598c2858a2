package eluvia.transport;

/**
 * A solution for flushing a contaminated layer with clean water: the remaining fraction of the
 * initial concentration (dimensionless, in [0, 1]) after a number of pore volumes, for a
 * cleanup criterion. Pore volumes T = q t / (theta L) are dimensionless.
 *
 * <p>Implementations are immutable and safe to share between threads. Obtain them from
 * {@link FlushingModels}.
 */
public interface FlushingModel {
    /** A stable machine word, e.g. "finite-layer", "well-mixed", "plug-flow", "two-region". */
    String name();

    /** Plain words and the published source, for reports. */
    String description();

    /**
     * Remaining fraction of the initial concentration (dimensionless, 0..1) after
     * {@code poreVolumes} pore volumes of clean water.
     *
     * @throws TransportInputException if poreVolumes is negative or not finite
     */
    double remainingFraction(CleanupCriterion criterion, double poreVolumes);

    /**
     * A first guess of the pore volumes (dimensionless, greater than 0) at which the criterion
     * falls to {@code targetFraction}, only used to start the bracket of {@link PoreVolumeSearch}.
     * The default, 1, suits a model that knows no better.
     */
    default double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        return 1;
    }
}
