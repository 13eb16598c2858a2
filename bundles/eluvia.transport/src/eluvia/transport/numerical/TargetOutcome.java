package eluvia.transport.numerical;

import eluvia.transport.CleanupCriterion;

/**
 * Whether, and after how many pore volumes, one cleanup criterion fell to its target.
 *
 * <p>The crossing time is found by marching until the criterion drops below the target and then
 * interpolating, between the last three accepted steps, the logarithm of the criterion with a
 * quadratic in time (linear interpolation where a value is not positive). That interpolation
 * error is third order in the step, below the second-order error of the time stepping itself.
 *
 * @param criterion the criterion
 * @param targetFraction the target, fraction of the initial contamination (dimensionless)
 * @param reached true when the criterion was at or below the target at the end of the run
 * @param poreVolumes pore volumes (dimensionless) at the last downward crossing; NaN if not reached
 * @param days the same as time since the start, days; NaN if not reached
 * @param runPoreVolumes pore volumes the run covered
 * @param finalFraction the criterion's value at the end of the run (dimensionless)
 */
public record TargetOutcome(CleanupCriterion criterion, double targetFraction, boolean reached, double poreVolumes,
        double days, double runPoreVolumes, double finalFraction) {

    /** One sentence for a report, including the "not reachable" answer. */
    public String message() {
        if (reached) {
            return String.format(java.util.Locale.ROOT, "%s falls to %.4g of the initial concentration after %.4g pore volumes (%.4g days)",
                    criterion.description(), targetFraction, poreVolumes, days);
        }
        return String.format(java.util.Locale.ROOT,
                "%s does not fall to %.4g of the initial concentration within %.4g pore volumes (still %.4g at the end)",
                criterion.description(), targetFraction, runPoreVolumes, finalFraction);
    }
}
