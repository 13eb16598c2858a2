package eluvia.transport;

import java.util.OptionalDouble;

/**
 * A whole screening calculation for one layer and one cleanup criterion
 * ({@link FlushingScreening#estimate}).
 *
 * @param input the layer and its flushing conditions
 * @param transport the derived transport properties
 * @param criterion the cleanup criterion
 * @param modelName the machine word of the model used for {@code result}
 * @param targetFraction target over initial concentration, dimensionless
 * @param result the pore-volume search with that model
 * @param wellMixedPoreVolumes pore volumes (dimensionless) of the well-mixed estimate, not capped by the limit
 * @param plugFlowPoreVolumes pore volumes (dimensionless) of the plug-flow estimate, not capped by the limit
 * @param durationDays flushing time in days, T theta L / q; NaN if the target is not reachable
 * @param waterVolumeCubicMetres water to apply (and to capture and treat), T theta L A, m3; empty
 *        without an area, NaN inside when the target is not reachable
 * @param onePoreVolumeCubicMetresPerSquareMetre water held in the layer per unit area, theta L, m3/m2
 */
public record FlushingEstimate(LayerFlushingInput input, LayerTransport transport, CleanupCriterion criterion,
        String modelName, double targetFraction, PoreVolumeResult result, double wellMixedPoreVolumes,
        double plugFlowPoreVolumes, double durationDays, OptionalDouble waterVolumeCubicMetres,
        double onePoreVolumeCubicMetresPerSquareMetre) {
}
