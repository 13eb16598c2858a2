package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * The expected accuracy range of an estimate: the actual cost is expected between
 * estimate x (1 + low/100) and estimate x (1 + high/100).
 *
 * @param lowPercent  lower bound, % (in (-100, 0]), e.g. -30
 * @param highPercent upper bound, % (in [0, 1000]), e.g. +50
 * @param source      where the range comes from
 * @param status      whether it is published, recalled, common practice or a user choice
 */
public record AccuracyRange(double lowPercent, double highPercent, String source, SourceStatus status) {

    /**
     * The feasibility-study range -30 % / +50 % of US EPA / USACE (2000), A Guide to Developing and
     * Documenting Cost Estimates During the Feasibility Study, EPA 540-R-00-002 [published].
     */
    public static final AccuracyRange FEASIBILITY_STUDY = new AccuracyRange(-30, 50,
            "US EPA/USACE (2000) EPA 540-R-00-002: feasibility-study estimate accuracy", SourceStatus.PUBLISHED);

    /** Checks the fields. */
    public AccuracyRange {
        Checks.openClosed("accuracy lowPercent", lowPercent, -100.0, 0.0, "the lower bound is a negative per cent, e.g. -30");
        Checks.closed("accuracy highPercent", highPercent, 0.0, 1000.0, "the upper bound is a positive per cent, e.g. 50");
        Checks.text("accuracy range source", source);
        Checks.notNull("accuracy range status", status);
    }

    /** A range the user chose. */
    public static AccuracyRange userRange(double lowPercent, double highPercent, String reason) {
        return new AccuracyRange(lowPercent, highPercent, reason, SourceStatus.USER_INPUT);
    }

    /** The low end for an estimate of {@code value}. */
    public Money low(Money value) {
        return value.times(1.0 + lowPercent / 100.0);
    }

    /** The high end for an estimate of {@code value}. */
    public Money high(Money value) {
        return value.times(1.0 + highPercent / 100.0);
    }
}
