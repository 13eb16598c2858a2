package eluvia.zone;

/**
 * The value a non-detect sample ("below the detection limit") takes in the estimation, chosen by
 * the caller and reported with every result.
 *
 * <p>Substituting half the detection limit is common practice in site characterisation; the
 * detection limit itself is the conservative choice (it enlarges the zone above a cleanup level
 * near the limit), zero the least conservative one. Concentrations and detection limits are in
 * mg/kg of dry soil.
 */
public enum NonDetectRule {
    /** A non-detect counts as one half of its detection limit (common practice). */
    HALF_DETECTION_LIMIT("half the detection limit (common practice)"),
    /** A non-detect counts as its detection limit (conservative). */
    DETECTION_LIMIT("the detection limit (conservative)"),
    /** A non-detect counts as zero (least conservative). */
    ZERO("zero (least conservative)");

    private final String description;

    NonDetectRule(String description) {
        this.description = description;
    }

    /**
     * The concentration a non-detect takes under this rule.
     *
     * @param detectionLimitMgPerKg the sample's detection limit, mg/kg, greater than 0
     * @return the substituted concentration, mg/kg
     */
    public double substituteMgPerKg(double detectionLimitMgPerKg) {
        ZoneInputException.requirePositive("detectionLimitMgPerKg", detectionLimitMgPerKg);
        switch (this) {
            case HALF_DETECTION_LIMIT:
                return 0.5 * detectionLimitMgPerKg;
            case DETECTION_LIMIT:
                return detectionLimitMgPerKg;
            default:
                return 0.0;
        }
    }

    /** A sentence fragment for results: "non-detects set to " + description(). */
    public String description() {
        return description;
    }
}
