package eluvia.design;

import java.util.Map;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;

/**
 * Flushing results of one contaminant in one design: pore volumes, duration and water volume for
 * each of the three cleanup criteria.
 *
 * @param contaminantName the contaminant
 * @param initialSoilMilligramsPerKg representative initial soil concentration in the zone, mg/kg
 * @param cleanupLevelMilligramsPerKg soil cleanup level, mg/kg
 * @param targetFraction cleanup level over initial concentration (dimensionless)
 * @param kdLitresPerKg the distribution coefficient used, L/kg
 * @param kdBasis where Kd came from ("entered" or "Koc x foc = ...")
 * @param decayPerDay first-order decay rate used, 1/d (0 = none)
 * @param estimates one estimate per criterion
 */
public record ContaminantFlushing(String contaminantName, double initialSoilMilligramsPerKg,
        double cleanupLevelMilligramsPerKg, double targetFraction, double kdLitresPerKg, String kdBasis,
        double decayPerDay, Map<CleanupCriterion, FlushingEstimate> estimates) {

    /** The estimate for one criterion. */
    public FlushingEstimate estimate(CleanupCriterion criterion) {
        return estimates.get(criterion);
    }
}
