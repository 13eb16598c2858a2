package eluvia.design;

/**
 * A treatment zone the user entered, set against the zone estimated from the samples.
 *
 * @param zoneName the entered zone
 * @param enteredVolumeCubicMetres its bank volume, effective area x thickness, m3
 * @param estimatedInsideCubicMetres volume of blocks above a cleanup level whose centres lie
 *        inside the entered zone (footprint polygon and depth interval), m3; NaN when the zone has
 *        no footprint polygon (it cannot be placed on the site)
 * @param estimatedOutsideCubicMetres volume of such blocks outside it, m3 (NaN as above)
 * @param fractionInside the share of the estimated volume above the level that the entered zone
 *        holds (dimensionless, NaN as above or when nothing is above the level)
 * @param assessment plain words: what the comparison shows
 */
public record EnteredZoneComparison(String zoneName, double enteredVolumeCubicMetres, double estimatedInsideCubicMetres,
        double estimatedOutsideCubicMetres, double fractionInside, String assessment) {
}
