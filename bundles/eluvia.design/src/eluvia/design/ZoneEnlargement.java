package eluvia.design;

import java.util.List;

/**
 * Enlargement of an entered treatment zone by dispersion while the remedy waits: for every
 * contaminant above its level in the zone, the zone above its cleanup level after each delay, and
 * the envelope of all contaminants (the zone that a delayed remedy must treat).
 *
 * <p>Method: the zone is taken as a box (its plan area as a rectangle of the footprint's
 * bounding-box proportions, its depth interval) at the source concentration in clean soil,
 * spreading by the product of Crank (1975, eq. 2.15) slab solutions in three directions (Hunt
 * 1978), moving down with the net infiltration (eluvia.transport SourceSpreading). The volume above
 * the cleanup level below the ground surface is integrated on a grid: the quadrant of the plan
 * extent in cells of equal size (midpoint rule, {@link DesignSettings#enlargementCellsPerAxis()}
 * per axis), and in each column the depth interval above the level from the depth factor tabulated
 * at 4096 points over the half-extent and inverted by linear interpolation, cut at the ground
 * surface (the solution factorises into one factor per direction, so each column needs no
 * evaluation of its own). Decay is ignored (the zone is not shrunk by it: the conservative side).
 *
 * @param zoneName the entered zone
 * @param available whether it could be computed
 * @param unavailableReason why not (empty when available)
 * @param sourceVolumeCubicMetres the zone's bank volume, m3
 * @param sourceBasis how the zone was turned into a box
 * @param contaminants per contaminant
 * @param envelope per delay, the largest extent over the contaminants
 * @param notes bases and warnings
 */
public record ZoneEnlargement(String zoneName, boolean available, String unavailableReason,
        double sourceVolumeCubicMetres, String sourceBasis, List<ContaminantSpreading> contaminants,
        List<EnlargementPoint> envelope, List<String> notes) {

    /** How the enlargement is computed, for results. */
    public static final String METHOD = "box source at the source concentration spreading by dispersion: product of "
            + "Crank (1975) slab solutions in three directions (Hunt 1978), moving down with the net infiltration; "
            + "volume above the cleanup level below ground integrated on a grid; decay ignored";

    /** Copies the lists. */
    public ZoneEnlargement {
        contaminants = List.copyOf(contaminants);
        envelope = List.copyOf(envelope);
        notes = List.copyOf(notes);
    }

    /** A "not available" result. */
    public static ZoneEnlargement notAvailable(String zoneName, String reason) {
        return new ZoneEnlargement(zoneName, false, reason, Double.NaN, "", List.of(), List.of(), List.of());
    }
}
