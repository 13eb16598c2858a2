package eluvia.transport.numerical;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;

/**
 * Pore volumes to target with Richardson extrapolation (Richardson 1911; Richardson and Gaunt
 * 1927): two runs with fixed steps, the second with every cell halved and half the step.
 *
 * <p>Central differences in space and BDF2 in time both have errors of second order, so the
 * pore volumes found behave as T(h) = T + a h<sup>2</sup> + higher terms when cell size and step
 * are refined together, and (4 T(h/2) - T(h)) / 3 removes the leading term. The difference of
 * the two runs divided by 3 estimates the error of the fine run. The extrapolation needs the
 * asymptotic range: the coarse run should already be within a few tenths of a percent (cell
 * Peclet number at most 2 everywhere, no upwind faces). Measured against the exact finite-layer
 * series (layer Peclet numbers 1 to 100, coarse steps of 0.01 pore volumes, 20 to 200 cells,
 * targets 0.01 and 1e-4): coarse errors of 3e-4 to 4e-3 (relative) became 1e-8 to 4e-5, for
 * about five times the cost of the coarse run.
 */
public final class ExtrapolatedTargetSearch {
    private ExtrapolatedTargetSearch() {
    }

    /**
     * @param column the column
     * @param settings grid settings of the coarse run; its step settings are replaced by fixed steps
     * @param stepPoreVolumes fixed step of the coarse run, pore volumes (dimensionless), greater than 0
     * @param criterion the criterion
     * @param targetFraction target fraction (dimensionless), between 0 and 1, both excluded
     * @param maxPoreVolumes run length, pore volumes (dimensionless)
     */
    public static ExtrapolatedTarget poreVolumesToTarget(FlushingColumn column, SolverSettings settings,
            double stepPoreVolumes, CleanupCriterion criterion, double targetFraction, double maxPoreVolumes) {
        if (settings == null) {
            throw new TransportInputException("solver settings", null, "settings (SolverSettings.defaults())");
        }
        TransportInputException.requirePositive("coarse time step (pore volumes)", stepPoreVolumes);
        FlushingRunRequest request = FlushingRunRequest.upToPoreVolumes(maxPoreVolumes).target(criterion, targetFraction)
                .build();
        SolverSettings coarse = settings.toBuilder().fixedStepPoreVolumes(stepPoreVolumes).build();
        SolverSettings fine = settings.toBuilder().fixedStepPoreVolumes(stepPoreVolumes / 2).build();
        NumericalFlushingSolver coarseSolver = new NumericalFlushingSolver(column, coarse, 1);
        NumericalFlushingSolver fineSolver = new NumericalFlushingSolver(column, fine, 2);
        FlushingRunResult a = coarseSolver.run(request);
        FlushingRunResult b = fineSolver.run(request);
        TargetOutcome oa = a.outcome(criterion);
        TargetOutcome ob = b.outcome(criterion);
        long cost = (long) a.cellCount() * a.acceptedSteps() + (long) b.cellCount() * b.acceptedSteps();
        return ExtrapolatedTarget.ofSecondOrder(criterion, targetFraction, oa.reached() && ob.reached(), oa.poreVolumes(),
                ob.poreVolumes(), cost);
    }
}
