package eluvia.design;

import java.util.Map;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.PoreVolumeResult;

/**
 * The pore volumes to the cleanup level by one flushing solution, for each of the three cleanup
 * criteria, or the reason the solution is not available for this contaminant (then there are no
 * numbers at all).
 *
 * @param method the solution
 * @param available whether it could be computed
 * @param unavailableReason why not, in plain words (empty when available)
 * @param description the model's own description with its published source
 * @param byCriterion one pore-volume search result per criterion (empty when not available); pore
 *        volumes are dimensionless
 */
public record MethodEstimate(FlushingMethod method, boolean available, String unavailableReason, String description,
        Map<CleanupCriterion, PoreVolumeResult> byCriterion) {

    /** Copies the map. */
    public MethodEstimate {
        byCriterion = Map.copyOf(byCriterion);
    }

    /** A result with numbers. */
    public static MethodEstimate of(FlushingMethod method, String description,
            Map<CleanupCriterion, PoreVolumeResult> byCriterion) {
        return new MethodEstimate(method, true, "", description, byCriterion);
    }

    /** A "not available" result: no numbers, only the reason. */
    public static MethodEstimate notAvailable(FlushingMethod method, String reason) {
        return new MethodEstimate(method, false, reason, method.label() + " (" + method.source() + ")", Map.of());
    }

    /** The result for one criterion, or null when the method is not available. */
    public PoreVolumeResult result(CleanupCriterion criterion) {
        return byCriterion.get(criterion);
    }
}
