package eluvia.transport.numerical;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.PoreVolumeSearch;

/**
 * What a solution made of decaying modes answers once its eigenproblem is solved
 * ({@link ModalFlushingSolution}: finite volumes; {@link SpectralElementFlushingSolution}:
 * spectral elements): the effluent, the stored mass, the pore water at every cell or point, the
 * three criteria and the pore volumes to a target, all read from its {@link ModeSum}.
 */
abstract class ModalSolutionBase implements FlushingModel {

    /** The modes of the solution. */
    abstract ModeSum modes();

    /** Decay rates of the modes, 1/day, ascending (the slowest first). */
    public double[] modeRatesPerDay() {
        return modes().ratesPerDay();
    }

    /** Effluent concentration (mg/L) after {@code days} days. */
    public double effluentMilligramsPerLitre(double days) {
        return modes().effluentMilligramsPerLitre(days);
    }

    /** Solute stored in the column (mg per m2 of plan area) after {@code days} days. */
    public double storedMilligramsPerSquareMetre(double days) {
        return modes().storedMilligramsPerSquareMetre(days);
    }

    /** Pore-water concentration (mg/L) at every cell or point of the discretisation after {@code days} days, top first. */
    public double[] poreWaterMilligramsPerLitre(double days) {
        return modes().pointMilligramsPerLitre(days);
    }

    @Override
    public double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        return modes().remainingFraction(criterion, poreVolumes);
    }

    /**
     * From the slowest mode alone: a_1 exp(-lambda_1 t) = target, which the late-time tail
     * follows (for the maximum, the effluent's estimate).
     */
    @Override
    public double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        return modes().poreVolumeGuess(criterion, targetFraction);
    }

    /**
     * Pore volumes until {@code criterion} falls to {@code targetFraction} of the initial value
     * (clean inflow), by {@link PoreVolumeSearch} on this solution.
     */
    public PoreVolumeResult poreVolumesToTarget(CleanupCriterion criterion, double targetFraction, double maxPoreVolumes) {
        return PoreVolumeSearch.solve(this, criterion, targetFraction, maxPoreVolumes);
    }
}
