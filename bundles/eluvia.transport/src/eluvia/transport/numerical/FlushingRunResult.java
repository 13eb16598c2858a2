package eluvia.transport.numerical;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import eluvia.transport.CleanupCriterion;

/**
 * Everything one numerical run produced.
 *
 * <p>The histories hold one entry at the start and one per accepted time step: time in days, pore
 * volumes passed (dimensionless), the effluent (flux-averaged concentration leaving the bottom of
 * the profile, mg/L) and the mean and maximum residual fractions (dimensionless, see
 * {@link FlushingRunRequest}).
 */
public final class FlushingRunResult {
    private final double[] timesDays;
    private final double[] poreVolumes;
    private final double[] effluentMilligramsPerLitre;
    private final double[] meanResidualFraction;
    private final double[] maxResidualFraction;
    private final List<ResidualProfile> profiles;
    private final MassBalance massBalance;
    private final EnumMap<CleanupCriterion, TargetOutcome> outcomes;
    private final int acceptedSteps;
    private final int rejectedSteps;
    private final long newtonIterations;
    private final int cellCount;
    private final int upwindFaceCount;
    private final double initialPoreWaterMilligramsPerLitre;

    FlushingRunResult(double[] timesDays, double[] poreVolumes, double[] effluentMilligramsPerLitre,
            double[] meanResidualFraction, double[] maxResidualFraction, List<ResidualProfile> profiles,
            MassBalance massBalance, EnumMap<CleanupCriterion, TargetOutcome> outcomes, int acceptedSteps,
            int rejectedSteps, long newtonIterations, int cellCount, int upwindFaceCount,
            double initialPoreWaterMilligramsPerLitre) {
        this.timesDays = timesDays;
        this.poreVolumes = poreVolumes;
        this.effluentMilligramsPerLitre = effluentMilligramsPerLitre;
        this.meanResidualFraction = meanResidualFraction;
        this.maxResidualFraction = maxResidualFraction;
        this.profiles = Collections.unmodifiableList(profiles);
        this.massBalance = massBalance;
        this.outcomes = outcomes;
        this.acceptedSteps = acceptedSteps;
        this.rejectedSteps = rejectedSteps;
        this.newtonIterations = newtonIterations;
        this.cellCount = cellCount;
        this.upwindFaceCount = upwindFaceCount;
        this.initialPoreWaterMilligramsPerLitre = initialPoreWaterMilligramsPerLitre;
    }

    /** Times of the history entries, days (a copy). */
    public double[] timesDays() {
        return timesDays.clone();
    }

    /** Pore volumes of the history entries (dimensionless, a copy). */
    public double[] poreVolumes() {
        return poreVolumes.clone();
    }

    /** Effluent concentration history, mg/L (a copy). */
    public double[] effluentMilligramsPerLitre() {
        return effluentMilligramsPerLitre.clone();
    }

    /** Mean residual fraction history (dimensionless, a copy). */
    public double[] meanResidualFraction() {
        return meanResidualFraction.clone();
    }

    /** Maximum residual fraction history (dimensionless, a copy). */
    public double[] maxResidualFraction() {
        return maxResidualFraction.clone();
    }

    /** Number of history entries. */
    public int historySize() {
        return timesDays.length;
    }

    /** The residual profiles at the requested times, in time order. */
    public List<ResidualProfile> profiles() {
        return profiles;
    }

    /** The solute bookkeeping of the run. */
    public MassBalance massBalance() {
        return massBalance;
    }

    /** The outcome for each requested target (unmodifiable). */
    public Map<CleanupCriterion, TargetOutcome> outcomes() {
        return Collections.unmodifiableMap(outcomes);
    }

    /**
     * The outcome for one criterion.
     *
     * @throws IllegalArgumentException when no target was requested for it
     */
    public TargetOutcome outcome(CleanupCriterion criterion) {
        TargetOutcome o = outcomes.get(criterion);
        if (o == null) {
            throw new IllegalArgumentException("no target was requested for the " + criterion.word() + " criterion");
        }
        return o;
    }

    /** Pore volumes passed at the end of the run (dimensionless). */
    public double finalPoreVolumes() {
        return poreVolumes[poreVolumes.length - 1];
    }

    /** Mean residual fraction at the end of the run (dimensionless). */
    public double finalMeanResidualFraction() {
        return meanResidualFraction[meanResidualFraction.length - 1];
    }

    /** Maximum residual fraction at the end of the run (dimensionless). */
    public double finalMaxResidualFraction() {
        return maxResidualFraction[maxResidualFraction.length - 1];
    }

    /** Accepted time steps. */
    public int acceptedSteps() {
        return acceptedSteps;
    }

    /** Time steps rejected by the error test or a failed Newton iteration and retried smaller. */
    public int rejectedSteps() {
        return rejectedSteps;
    }

    /** Newton iterations over the run (0 for linear sorption, which needs none). */
    public long newtonIterations() {
        return newtonIterations;
    }

    /** Cells of the grid. */
    public int cellCount() {
        return cellCount;
    }

    /** Faces where the central scheme fell back to upwind (cell Peclet number above 2). */
    public int upwindFaceCount() {
        return upwindFaceCount;
    }

    /** Highest initial mobile pore-water concentration, mg/L: the reference of the effluent fraction. */
    public double initialPoreWaterMilligramsPerLitre() {
        return initialPoreWaterMilligramsPerLitre;
    }
}
