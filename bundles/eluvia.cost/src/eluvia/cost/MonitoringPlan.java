package eluvia.cost;

import eluvia.cost.internal.Checks;
import eluvia.cost.internal.Counts;

/**
 * How often the effluent (or soil) is sampled during flushing: so many samples per calendar week,
 * or so many samples at the end of every N pore volumes.
 */
public sealed interface MonitoringPlan permits MonitoringPlan.PerWeek, MonitoringPlan.PerPoreVolumes {

    /** Number of samples over a flushing run of this length and this many pore volumes. */
    long sampleCount(double calendarDays, double poreVolumes);

    /** Plain description for the trace. */
    String description();

    /** {@code samplesPerWeek} samples every calendar week (fractions allowed: 0.5 = fortnightly). */
    static PerWeek perWeek(double samplesPerWeek) {
        return new PerWeek(samplesPerWeek);
    }

    /** {@code samplesPerEvent} samples at the end of every {@code poreVolumesBetweenEvents} pore volumes. */
    static PerPoreVolumes perPoreVolumes(int samplesPerEvent, double poreVolumesBetweenEvents) {
        return new PerPoreVolumes(samplesPerEvent, poreVolumesBetweenEvents);
    }

    /**
     * Sampling by calendar time: samples = samples per week x calendar days / 7, rounded up.
     *
     * @param samplesPerWeek samples per calendar week, greater than 0
     */
    record PerWeek(double samplesPerWeek) implements MonitoringPlan {
        /** Checks the field. */
        public PerWeek {
            Checks.positive("samplesPerWeek", samplesPerWeek);
        }

        @Override
        public long sampleCount(double calendarDays, double poreVolumes) {
            Checks.nonNegative("calendarDays", calendarDays);
            return Counts.roundUp(samplesPerWeek * calendarDays / 7.0);
        }

        @Override
        public String description() {
            return samplesPerWeek + " samples per calendar week, total rounded up";
        }
    }

    /**
     * Sampling by pore volumes flushed: one event at the end of every {@code poreVolumesBetweenEvents}
     * (the last, partial interval counted as one event), {@code samplesPerEvent} samples each.
     *
     * @param samplesPerEvent          samples per event, 1 or more
     * @param poreVolumesBetweenEvents pore volumes between events (dimensionless), greater than 0
     */
    record PerPoreVolumes(int samplesPerEvent, double poreVolumesBetweenEvents) implements MonitoringPlan {
        /** Checks the fields. */
        public PerPoreVolumes {
            if (samplesPerEvent < 1) {
                throw new CostInputException("samplesPerEvent", samplesPerEvent, "[1, infinity)");
            }
            Checks.positive("poreVolumesBetweenEvents (dimensionless)", poreVolumesBetweenEvents);
        }

        @Override
        public long sampleCount(double calendarDays, double poreVolumes) {
            Checks.nonNegative("poreVolumes (dimensionless)", poreVolumes);
            return samplesPerEvent * Counts.roundUp(poreVolumes / poreVolumesBetweenEvents);
        }

        @Override
        public String description() {
            return samplesPerEvent + " samples every " + poreVolumesBetweenEvents
                    + " pore volumes, last partial interval counted as one event";
        }
    }
}
