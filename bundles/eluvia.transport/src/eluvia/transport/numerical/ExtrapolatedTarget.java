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
}
