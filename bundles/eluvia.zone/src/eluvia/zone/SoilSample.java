package eluvia.zone;

/**
 * One soil sample: where it was taken (easting, northing, depth interval) and what the
 * laboratory reported for one contaminant.
 *
 * <p>Depths are measured downwards from the ground surface, which is taken as level over the
 * model area. The sample stands for the midpoint of its depth interval in the estimation. A
 * non-detect carries its detection limit; its {@code concentrationMgPerKg} is ignored and the
 * caller's {@link NonDetectRule} decides the value used.
 *
 * @param eastingMetres         easting of the boring, m (any local grid), finite
 * @param northingMetres        northing of the boring, m, finite
 * @param topDepthMetres        depth of the top of the sampled interval below ground, m, 0 or more
 * @param bottomDepthMetres     depth of the bottom of the interval, m, at least {@code topDepthMetres}
 *                              (equal for a point sample)
 * @param concentrationMgPerKg  reported concentration, mg/kg dry soil, 0 or more (ignored for a
 *                              non-detect, where NaN is also accepted)
 * @param nonDetect             true when the laboratory reported "below the detection limit"
 * @param detectionLimitMgPerKg detection (reporting) limit, mg/kg: greater than 0 for a non-detect;
 *                              for a detect 0 or more, or NaN when not known (not used)
 */
public record SoilSample(double eastingMetres, double northingMetres, double topDepthMetres,
        double bottomDepthMetres, double concentrationMgPerKg, boolean nonDetect,
        double detectionLimitMgPerKg) {

    /** Checks every field; throws {@link ZoneInputException} naming the field and its range. */
    public SoilSample {
        ZoneInputException.requireFinite("sample eastingMetres", eastingMetres);
        ZoneInputException.requireFinite("sample northingMetres", northingMetres);
        ZoneInputException.requireNonNegative("sample topDepthMetres", topDepthMetres);
        ZoneInputException.requireNonNegative("sample bottomDepthMetres", bottomDepthMetres);
        if (bottomDepthMetres < topDepthMetres) {
            throw new ZoneInputException("sample bottomDepthMetres", bottomDepthMetres,
                    "at least topDepthMetres = " + topDepthMetres + " (depths are measured downwards)");
        }
        if (nonDetect) {
            if (!(detectionLimitMgPerKg > 0) || Double.isInfinite(detectionLimitMgPerKg)) {
                throw new ZoneInputException("sample detectionLimitMgPerKg", detectionLimitMgPerKg,
                        "greater than 0 and finite for a non-detect (give the laboratory's reporting limit)");
            }
            if (!Double.isNaN(concentrationMgPerKg)) {
                ZoneInputException.requireNonNegative("sample concentrationMgPerKg", concentrationMgPerKg);
            }
        } else {
            ZoneInputException.requireNonNegative("sample concentrationMgPerKg", concentrationMgPerKg);
            if (!Double.isNaN(detectionLimitMgPerKg)) {
                ZoneInputException.requireNonNegative("sample detectionLimitMgPerKg", detectionLimitMgPerKg);
            }
        }
    }

    /** A detected sample over a depth interval (detection limit not known). */
    public static SoilSample detected(double eastingMetres, double northingMetres, double topDepthMetres,
            double bottomDepthMetres, double concentrationMgPerKg) {
        return new SoilSample(eastingMetres, northingMetres, topDepthMetres, bottomDepthMetres,
                concentrationMgPerKg, false, Double.NaN);
    }

    /** A non-detect over a depth interval with its detection limit. */
    public static SoilSample belowDetection(double eastingMetres, double northingMetres, double topDepthMetres,
            double bottomDepthMetres, double detectionLimitMgPerKg) {
        return new SoilSample(eastingMetres, northingMetres, topDepthMetres, bottomDepthMetres, Double.NaN,
                true, detectionLimitMgPerKg);
    }

    /** Depth of the midpoint of the sampled interval below ground, m. */
    public double midDepthMetres() {
        return 0.5 * (topDepthMetres + bottomDepthMetres);
    }

    /** The concentration used in the estimation under {@code rule}, mg/kg. */
    public double valueMgPerKg(NonDetectRule rule) {
        ZoneInputException.requireNonNull("nonDetectRule", rule);
        return nonDetect ? rule.substituteMgPerKg(detectionLimitMgPerKg) : concentrationMgPerKg;
    }
}
