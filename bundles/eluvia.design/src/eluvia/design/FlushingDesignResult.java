package eluvia.design;

import java.util.List;

import eluvia.cost.FlushingQuantities;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;

/**
 * The results of one flushing design (one alternative): per contaminant and criterion, and the
 * controlling figures for the design's own criterion.
 *
 * <p>The controlling contaminant is the one that needs the most pore volumes under the design's
 * criterion by the solution the design's solution method governs with ({@link ContaminantFlushing#governingMethod()});
 * duration and water volumes follow from it. Operating days convert to calendar days
 * by the design's operating days per week. Applied water passes through the zone and must be
 * captured; the captured share is applied water times the capture efficiency, the rest escapes
 * the capture system (shown so the engineer can judge the groundwater risk).
 *
 * @param designName name of the design
 * @param zoneName name of the treatment zone
 * @param zoneAreaSquareMetres infiltration area, m2
 * @param layer the treated column's combined properties
 * @param onePoreVolumeCubicMetres one pore volume of the zone, theta L A, m3
 * @param criterion the criterion the design is held to
 * @param contaminants per-contaminant results
 * @param controllingContaminant name of the contaminant that sets the duration, or null if none reaches its target
 * @param allReachable whether every contaminant reaches its target within the design's pore-volume limit
 * @param poreVolumes pore volumes needed under the design's criterion (controlling), NaN if not reachable
 * @param operatingDays days of pumping, d
 * @param calendarDays elapsed days at the design's operating days per week, d
 * @param waterAppliedCubicMetres flushing water applied, m3
 * @param waterCapturedCubicMetres water captured for treatment, m3
 * @param waterEscapingCubicMetres applied water the capture system misses, m3
 * @param operatingDaysPerWeek operating days per week, d/week
 * @param captureEfficiency fraction of applied water captured (dimensionless)
 * @param notes plain-language notes on the result (warnings, bases)
 * @param solutionMethod the design's solution method (EQUILIBRIUM, TWO_REGION or NUMERICAL)
 * @param quantities the flushing take-off (eluvia.cost.FlushingQuantities: water applied, captured,
 *        treated and escaping, durations, monitoring samples, amendment mass); null when the cleanup
 *        level is not reached (the notes say why)
 * @param pushDown per contaminant, how far below the treated column the flushing pushes soil above
 *        its cleanup level over the design's pore volumes (empty when the level is not reached)
 */
public record FlushingDesignResult(String designName, String zoneName, double zoneAreaSquareMetres,
        EffectiveLayer layer, double onePoreVolumeCubicMetres, CleanupCriterion criterion,
        List<ContaminantFlushing> contaminants, String controllingContaminant, boolean allReachable,
        double poreVolumes, double operatingDays, double calendarDays, double waterAppliedCubicMetres,
        double waterCapturedCubicMetres, double waterEscapingCubicMetres, double operatingDaysPerWeek,
        double captureEfficiency, List<String> notes, String solutionMethod, FlushingQuantities quantities,
        List<BelowLayerPush> pushDown) {

    /** Copies the lists. */
    public FlushingDesignResult {
        contaminants = List.copyOf(contaminants);
        notes = List.copyOf(notes);
        pushDown = List.copyOf(pushDown);
    }

    /** The controlling contaminant's estimate under the given criterion, or null. */
    public FlushingEstimate controllingEstimate(CleanupCriterion c) {
        return contaminants.stream().filter(x -> x.contaminantName().equals(controllingContaminant))
                .map(x -> x.estimate(c)).findFirst().orElse(null);
    }
}
