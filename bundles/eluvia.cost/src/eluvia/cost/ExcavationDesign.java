package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * The geometry of an excavation around one contaminated zone.
 *
 * <p>The zone is a prism: {@code zoneFootprint} in plan, from {@code zoneTopDepthMetres} to
 * {@code zoneBottomDepthMetres} below the ground surface. The overdig allowance is added to the
 * sides and the bottom of the zone: the pit bottom is the zone outline offset outward by the overdig,
 * at depth {@code zoneBottomDepthMetres + overdigMetres}, and its sides rise to the surface at
 * {@code sideSlopeHorizontalPerVertical}. Depths are positive downward from the ground surface, m.
 *
 * @param zoneFootprint                   plan outline of the contaminated zone
 * @param zoneTopDepthMetres              depth of the zone top, m, 0 or more (0 = zone starts at the surface)
 * @param zoneBottomDepthMetres           depth of the zone bottom, m, greater than the top
 * @param overdigMetres                   allowance added to the zone sides and bottom, m, 0 or more
 * @param soilClass                       soil class of the pit sides (for the protective-system cautions)
 * @param sideSlopeHorizontalPerVertical  side slope, horizontal per vertical (dimensionless), in [0, 10]
 */
public record ExcavationDesign(PitFootprint zoneFootprint, double zoneTopDepthMetres, double zoneBottomDepthMetres,
        double overdigMetres, SoilSlopeClass soilClass, double sideSlopeHorizontalPerVertical) {

    /** Checks the fields. */
    public ExcavationDesign {
        Checks.notNull("zone footprint", zoneFootprint);
        Checks.nonNegative("zoneTopDepthMetres", zoneTopDepthMetres);
        Checks.nonNegative("zoneBottomDepthMetres", zoneBottomDepthMetres);
        if (!(zoneBottomDepthMetres > zoneTopDepthMetres)) {
            throw new CostInputException("zoneBottomDepthMetres", zoneBottomDepthMetres,
                    "(" + zoneTopDepthMetres + ", infinity): deeper than zoneTopDepthMetres",
                    "depths are measured downward from the ground surface");
        }
        Checks.nonNegative("overdigMetres", overdigMetres);
        Checks.notNull("soil class", soilClass);
        SideSlopeTable.checkSlope("sideSlopeHorizontalPerVertical", sideSlopeHorizontalPerVertical);
    }

    /** A design whose side slope is the one {@code slopes} gives for {@code soilClass}. */
    public static ExcavationDesign withTableSlope(PitFootprint zoneFootprint, double zoneTopDepthMetres,
            double zoneBottomDepthMetres, double overdigMetres, SoilSlopeClass soilClass, SideSlopeTable slopes) {
        Checks.notNull("side slope table", slopes);
        return new ExcavationDesign(zoneFootprint, zoneTopDepthMetres, zoneBottomDepthMetres, overdigMetres,
                soilClass, slopes.slopeHorizontalPerVertical(soilClass));
    }

    /** Depth of the pit bottom, m: zone bottom plus overdig. */
    public double pitDepthMetres() {
        return zoneBottomDepthMetres + overdigMetres;
    }
}
