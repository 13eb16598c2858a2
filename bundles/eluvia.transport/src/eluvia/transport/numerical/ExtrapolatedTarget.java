package eluvia.transport.numerical;

import eluvia.transport.CleanupCriterion;

/**
 * Pore volumes to target improved by Richardson extrapolation ({@link ExtrapolatedTargetSearch}).
 *
 * @param criterion the criterion
 * @param targetFraction the target, fraction of the initial contamination (dimensionless)
 * @param reached true when both runs reached the target
 * @param poreVolumes extrapolated pore volumes (dimensionless), (4 fine - coarse) / 3; NaN if not reached
 * @param coarsePoreVolumes result of the coarse run (dimensionless)
 * @param finePoreVolumes result of the run with half the cell size and half the step (dimensionless)
 * @param errorEstimatePoreVolumes |fine - coarse| / 3: the estimated error of the fine run, and a
 *        cautious bound for the extrapolated value (dimensionless)
 * @param cellSteps cell-steps both runs took together (a cost measure)
 */
public record ExtrapolatedTarget(CleanupCriterion criterion, double targetFraction, boolean reached,
        double poreVolumes, double coarsePoreVolumes, double finePoreVolumes, double errorEstimatePoreVolumes,
        long cellSteps) {

    /**
     * Richardson extrapolation of two results of a method of second order, the fine one with half
     * the cell size (and half the step, when there are steps): (4 fine - coarse) / 3, with
     * |fine - coarse| / 3 as the error estimate of the fine result; not reached when either run
     * did not reach the target.
     */
    static ExtrapolatedTarget ofSecondOrder(CleanupCriterion criterion, double targetFraction, boolean reached,
            double coarsePoreVolumes, double finePoreVolumes, long cellSteps) {
        if (!reached) {
            return new ExtrapolatedTarget(criterion, targetFraction, false, Double.NaN, coarsePoreVolumes,
                    finePoreVolumes, Double.NaN, cellSteps);
        }
        return new ExtrapolatedTarget(criterion, targetFraction, true, (4 * finePoreVolumes - coarsePoreVolumes) / 3,
                coarsePoreVolumes, finePoreVolumes, Math.abs(finePoreVolumes - coarsePoreVolumes) / 3, cellSteps);
    }
}
