package eluvia.design;

import java.util.List;

import eluvia.zone.BlockModel;
import eluvia.zone.ExceedanceZone;
import eluvia.zone.TreatmentZone;

/**
 * The soil above the cleanup level estimated from the project's samples (eluvia.zone): one block
 * model over the site (or over the samples' extent with a margin), every contaminant with samples
 * and a cleanup level estimated on it, the blocks above at least one cleanup level with their
 * volume, footprint and depth range, a proposed treatment zone, and the entered zones compared with
 * it.
 *
 * <p>A block counts whole when its centre estimate is strictly above the level (block-model
 * take-off); volumes are bank m3, areas m2, depths m below ground.
 *
 * @param available whether the analysis could be made
 * @param unavailableReason why not (no samples, no cleanup levels...), empty when available
 * @param blockModel the block model (null when not available)
 * @param blockModelBasis how its extent and block sizes were chosen
 * @param estimator the estimator used
 * @param contaminants per contaminant
 * @param exceedance the blocks above at least one cleanup level (null when not available)
 * @param proposedZone the proposed treatment zone: convex hull of the plan cells above the level,
 *        from the top of the shallowest to the bottom of the deepest such block; null when none is above
 * @param enteredZones each entered treatment zone against the estimate
 * @param notes bases and warnings
 */
public record ZoneAnalysis(boolean available, String unavailableReason, BlockModel blockModel, String blockModelBasis,
        ZoneEstimator estimator, List<ContaminantZone> contaminants, ExceedanceZone exceedance,
        TreatmentZone proposedZone, List<EnteredZoneComparison> enteredZones, List<String> notes) {

    /** Copies the lists. */
    public ZoneAnalysis {
        contaminants = List.copyOf(contaminants);
        enteredZones = List.copyOf(enteredZones);
        notes = List.copyOf(notes);
    }

    /** A "not available" analysis. */
    public static ZoneAnalysis notAvailable(String reason, ZoneEstimator estimator) {
        return new ZoneAnalysis(false, reason, null, "", estimator, List.of(), null, null, List.of(), List.of());
    }

    /** Volume above at least one cleanup level, bank m3 (NaN when not available). */
    public double volumeAboveLevelCubicMetres() {
        return exceedance == null ? Double.NaN : exceedance.volumeCubicMetres();
    }
}
