package eluvia.transport.numerical;

import java.util.Arrays;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;

/**
 * What one numerical run is to compute: how far to flush, the cleanup targets to find, and the
 * times at which residual soil profiles are wanted.
 *
 * <p>Targets are fractions of the initial contamination (dimensionless), as {@link CleanupCriterion}
 * defines them: the effluent against the highest initial pore-water concentration, the mean
 * residual as the mass left over the mass at the start, the maximum residual as the highest soil
 * concentration now over the highest at the start.
 */
public final class FlushingRunRequest {
    /** Largest run length accepted, pore volumes. */
    public static final double MAXIMUM_PORE_VOLUMES = 1e6;

    private final double maximumPoreVolumes;
    private final EnumMap<CleanupCriterion, Double> targets;
    private final double[] profileTimesDays;
    private final boolean stopWhenTargetsReached;
    private final FlushingProgress progress;

    private FlushingRunRequest(Builder b) {
        if (!(b.maximumPoreVolumes > 0 && b.maximumPoreVolumes <= MAXIMUM_PORE_VOLUMES)) {
            throw new TransportInputException("run length (pore volumes)", b.maximumPoreVolumes,
                    "greater than 0 and at most " + MAXIMUM_PORE_VOLUMES);
        }
        maximumPoreVolumes = b.maximumPoreVolumes;
        targets = new EnumMap<>(b.targets);
        double[] times = b.profileTimesDays.clone();
        Arrays.sort(times);
        profileTimesDays = times;
        stopWhenTargetsReached = b.stopWhenTargetsReached;
        progress = b.progress;
    }

    /** A builder for a run of at most {@code maximumPoreVolumes} pore volumes. */
    public static Builder upToPoreVolumes(double maximumPoreVolumes) {
        return new Builder(maximumPoreVolumes);
    }

    /** Run length, pore volumes (dimensionless). */
    public double maximumPoreVolumes() {
        return maximumPoreVolumes;
    }

    /** Target fraction per criterion (unmodifiable). */
    public Map<CleanupCriterion, Double> targets() {
        return Collections.unmodifiableMap(targets);
    }

    /** Times at which residual profiles are recorded, days, ascending (a copy). */
    public double[] profileTimesDays() {
        return profileTimesDays.clone();
    }

    double[] profileTimesDaysShared() {
        return profileTimesDays;
    }

    /**
     * True: stop as soon as every target is met, each having fallen to it during the run (one that
     * starts below its target, like the effluent of a column with a clean bottom layer, keeps the
     * run going since it may still rise); false: run the full length. The pore volumes reported are
     * those of the last fall to the target, so a criterion that rises again and falls later is
     * reported at its final crossing within the run.
     */
    public boolean stopWhenTargetsReached() {
        return stopWhenTargetsReached;
    }

    /** The progress receiver. */
    public FlushingProgress progress() {
        return progress;
    }

    /** Builder; each method checks its argument. */
    public static final class Builder {
        private final double maximumPoreVolumes;
        private final EnumMap<CleanupCriterion, Double> targets = new EnumMap<>(CleanupCriterion.class);
        private double[] profileTimesDays = new double[0];
        private boolean stopWhenTargetsReached = true;
        private FlushingProgress progress = FlushingProgress.NONE;

        private Builder(double maximumPoreVolumes) {
            this.maximumPoreVolumes = maximumPoreVolumes;
        }

        /**
         * Finds the pore volumes at which {@code criterion} falls to {@code fraction} of the
         * initial contamination.
         *
         * @param fraction target fraction (dimensionless), between 0 and 1, both excluded
         */
        public Builder target(CleanupCriterion criterion, double fraction) {
            if (criterion == null) {
                throw new TransportInputException("cleanup criterion", null, "one of effluent, mean, max");
            }
            TransportInputException.requireOpenInterval("target fraction of the initial concentration for "
                    + criterion.word() + " (dimensionless)", fraction, 0, 1);
            targets.put(criterion, fraction);
            return this;
        }

        /** The same target fraction for all three criteria. */
        public Builder targetForAll(double fraction) {
            for (CleanupCriterion c : CleanupCriterion.values()) {
                target(c, fraction);
            }
            return this;
        }

        /** Records residual soil profiles at these times, days (each 0 or greater). */
        public Builder profilesAtDays(double... days) {
            for (int i = 0; i < days.length; i++) {
                TransportInputException.requireNonNegative("profile time [" + i + "] (days)", days[i]);
            }
            profileTimesDays = days.clone();
            return this;
        }

        /** Whether to stop once all targets are met (default true). */
        public Builder stopWhenTargetsReached(boolean value) {
            stopWhenTargetsReached = value;
            return this;
        }

        /** The progress receiver (default {@link FlushingProgress#NONE}). */
        public Builder progress(FlushingProgress value) {
            progress = Objects.requireNonNull(value, "progress");
            return this;
        }

        /** Makes the request. */
        public FlushingRunRequest build() {
            return new FlushingRunRequest(this);
        }
    }
}
