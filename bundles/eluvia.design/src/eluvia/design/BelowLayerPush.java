package eluvia.design;

import eluvia.transport.FlushingPushDown;

/**
 * How far below the treated column flushing pushes one contaminant above its cleanup level while
 * the design runs (eluvia.transport FlushingPushDown: the soil below taken like the combined layer
 * and clean, the flushed water draining through it).
 *
 * @param contaminantName the contaminant
 * @param available whether it could be computed
 * @param unavailableReason why not (empty when available)
 * @param result depths below the base of the treated column, m (null when not available)
 */
public record BelowLayerPush(String contaminantName, boolean available, String unavailableReason,
        FlushingPushDown.Result result) {
}
