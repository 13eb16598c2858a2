package eluvia.design;

import eluvia.zone.BlockEstimate;
import eluvia.zone.ContaminantExceedance;
import eluvia.zone.ExperimentalVariogram;
import eluvia.zone.VariogramModel;

/**
 * One contaminant's part of the zone analysis: its samples, its block estimate and the blocks
 * above its cleanup level.
 *
 * @param contaminantName the contaminant
 * @param cleanupLevelMilligramsPerKg its soil cleanup level, mg/kg
 * @param sampleCount samples of the contaminant in the project
 * @param nonDetectCount of which non-detects
 * @param maxSampleMilligramsPerKg the highest sample value used (after the non-detect rule), mg/kg
 * @param estimate the block estimate (concentrations at block centres, mg/kg)
 * @param exceedance the blocks above the cleanup level (volume in bank m3)
 * @param experimentalVariogram the experimental variogram of the samples, shown so the engineer can
 *        choose a variogram model; null with fewer than two distinct sample locations
 * @param variogramUsed the variogram model kriging used; null for inverse-distance weighting
 * @param variogramBasis how the variogram model was chosen (empty for inverse-distance weighting)
 */
public record ContaminantZone(String contaminantName, double cleanupLevelMilligramsPerKg, int sampleCount,
        int nonDetectCount, double maxSampleMilligramsPerKg, BlockEstimate estimate, ContaminantExceedance exceedance,
        ExperimentalVariogram experimentalVariogram, VariogramModel variogramUsed, String variogramBasis) {
}
