package eluvia.zone;

/**
 * The blocks above the cleanup level for one contaminant.
 *
 * @param contaminantName         the contaminant
 * @param cleanupLevelMgPerKg     its cleanup level, mg/kg
 * @param blockCount              the number of blocks whose estimate is strictly above the level
 * @param volumeCubicMetres       their volume (in place, bank), m3
 * @param maxConcentrationMgPerKg the largest block estimate, mg/kg (NaN when none is estimated)
 * @param unestimatedBlockCount   the number of blocks without an estimate for this contaminant
 * @param methodDescription       how the estimate was made
 */
public record ContaminantExceedance(String contaminantName, double cleanupLevelMgPerKg, int blockCount,
        double volumeCubicMetres, double maxConcentrationMgPerKg, int unestimatedBlockCount,
        String methodDescription) {
}
