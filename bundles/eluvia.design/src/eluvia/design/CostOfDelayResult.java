package eluvia.design;

import java.util.List;

import eluvia.cost.CostOfDelay;

/**
 * Present value against years of delay for one alternative: while nothing is done the zone
 * enlarges by dispersion ({@link ZoneEnlargement}), so a later start means larger quantities
 * (eluvia.cost CostOfDelay prices the take-off of the enlarged zone after each delay with the
 * alternative's own recipe).
 *
 * @param alternativeName the alternative
 * @param zoneName the zone whose enlargement drives it
 * @param available whether it could be computed
 * @param unavailableReason why not (empty when available)
 * @param costOfDelay the points, one per delay (null when not available)
 * @param basis how the enlarged zone was turned into quantities
 */
public record CostOfDelayResult(String alternativeName, String zoneName, boolean available, String unavailableReason,
        CostOfDelay costOfDelay, String basis) {

    /** A "not available" result. */
    public static CostOfDelayResult notAvailable(String alternativeName, String zoneName, String reason) {
        return new CostOfDelayResult(alternativeName, zoneName, false, reason, null, "");
    }

    /** The delays evaluated, years. */
    public List<CostOfDelay.Point> points() {
        return costOfDelay == null ? List.of() : costOfDelay.points();
    }
}
