package eluvia.zone;

/**
 * One contaminant's block estimate and the cleanup level it is held to, an input of
 * {@link ExceedanceZone#find}.
 *
 * @param contaminantName     the contaminant's name for results, not blank
 * @param estimate            the block estimate, mg/kg
 * @param cleanupLevelMgPerKg the cleanup level, mg/kg dry soil, greater than 0; a block is above
 *                            it when its estimate is strictly greater
 */
public record ContaminantEstimate(String contaminantName, BlockEstimate estimate, double cleanupLevelMgPerKg) {

    /** Checks every field; throws {@link ZoneInputException} naming the field and its range. */
    public ContaminantEstimate {
        ZoneInputException.requireNonNull("contaminantName", contaminantName);
        if (contaminantName.isBlank()) {
            throw new ZoneInputException("contaminantName", "\"" + contaminantName + "\"", "a name that is not blank");
        }
        ZoneInputException.requireNonNull("estimate of " + contaminantName, estimate);
        ZoneInputException.requirePositive("cleanupLevelMgPerKg of " + contaminantName, cleanupLevelMgPerKg);
    }
}
