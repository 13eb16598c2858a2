package eluvia.design;

/**
 * The zone above the cleanup level after one delay (no remedy, spreading by dispersion).
 *
 * @param delayYears years before the remedy starts
 * @param volumeAboveLevelCubicMetres volume of soil above the cleanup level below the ground
 *        surface, m3 (grid integration of the spreading solution, see {@link ZoneEnlargement})
 * @param unboundedVolumeCubicMetres the same volume of the infinite-medium solution, above ground
 *        included, m3 (the same grid without the cut at the ground surface)
 * @param ratio volume above the level over the source volume (dimensionless)
 * @param peakFraction highest concentration over the initial one (dimensionless)
 * @param footprintAreaSquareMetres plan area of the zone above the level, m2
 * @param planGrowthMetres how far the zone has grown beyond the source in plan, m (the larger of
 *        the growths along easting and northing through the centre)
 * @param topDepthMetres depth of the top of the zone, m below ground (0 at most at the surface)
 * @param bottomDepthMetres depth of its bottom, m below ground
 */
public record EnlargementPoint(double delayYears, double volumeAboveLevelCubicMetres, double unboundedVolumeCubicMetres,
        double ratio, double peakFraction, double footprintAreaSquareMetres, double planGrowthMetres,
        double topDepthMetres, double bottomDepthMetres) {
}
