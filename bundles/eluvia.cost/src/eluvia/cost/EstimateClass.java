package eluvia.cost;

/**
 * Cost estimate classes 5 to 1 of AACE International Recommended Practice 18R-97 (cost estimate
 * classification for the process industries), by maturity of project definition.
 *
 * <p>Each class has a typical accuracy range whose ends themselves vary with the technology, the
 * reference data and the estimator: the low end lies between {@link #lowPercentNarrow()} and
 * {@link #lowPercentWide()}, the high end between {@link #highPercentNarrow()} and
 * {@link #highPercentWide()}. <b>All numbers here are {@link SourceStatus#FROM_MEMORY}</b> (the
 * recommended practice was not at hand); check them against the current revision before quoting.
 * Class 4 ("study or feasibility") corresponds to a feasibility-study estimate; its wide end,
 * -30 % / +50 %, agrees with the published feasibility-study range of EPA 540-R-00-002
 * ({@link AccuracyRange#FEASIBILITY_STUDY}).
 */
public enum EstimateClass {
    /** Class 5: concept screening, 0-2 % of project definition. */
    CLASS_5(5, 0, 2, "concept screening", -20, -50, 30, 100),
    /** Class 4: study or feasibility, 1-15 % of project definition. */
    CLASS_4(4, 1, 15, "study or feasibility", -15, -30, 20, 50),
    /** Class 3: budget authorisation or control, 10-40 % of project definition. */
    CLASS_3(3, 10, 40, "budget authorization or control", -10, -20, 10, 30),
    /** Class 2: control or bid/tender, 30-75 % of project definition. */
    CLASS_2(2, 30, 75, "control or bid/tender", -5, -15, 5, 20),
    /** Class 1: check estimate or bid/tender, 65-100 % of project definition. */
    CLASS_1(1, 65, 100, "check estimate or bid/tender", -3, -10, 3, 15);

    /** Where the numbers come from. */
    public static final String SOURCE = "AACE International Recommended Practice 18R-97";

    private final int number;
    private final double maturityLowPercent;
    private final double maturityHighPercent;
    private final String endUsage;
    private final double lowNarrow;
    private final double lowWide;
    private final double highNarrow;
    private final double highWide;

    EstimateClass(int number, double maturityLow, double maturityHigh, String endUsage, double lowNarrow,
            double lowWide, double highNarrow, double highWide) {
        this.number = number;
        this.maturityLowPercent = maturityLow;
        this.maturityHighPercent = maturityHigh;
        this.endUsage = endUsage;
        this.lowNarrow = lowNarrow;
        this.lowWide = lowWide;
        this.highNarrow = highNarrow;
        this.highWide = highWide;
    }

    /** The class number, 5 (least defined) to 1. */
    public int number() {
        return number;
    }

    /** Lower end of the typical maturity of project definition, % of complete definition. */
    public double maturityLowPercent() {
        return maturityLowPercent;
    }

    /** Upper end of the typical maturity of project definition, % of complete definition. */
    public double maturityHighPercent() {
        return maturityHighPercent;
    }

    /** Typical end usage, e.g. {@code "study or feasibility"}. */
    public String endUsage() {
        return endUsage;
    }

    /** Low end of the accuracy range at its narrowest, % (negative). */
    public double lowPercentNarrow() {
        return lowNarrow;
    }

    /** Low end of the accuracy range at its widest, % (negative). */
    public double lowPercentWide() {
        return lowWide;
    }

    /** High end of the accuracy range at its narrowest, %. */
    public double highPercentNarrow() {
        return highNarrow;
    }

    /** High end of the accuracy range at its widest, %. */
    public double highPercentWide() {
        return highWide;
    }

    /** The narrowest typical range of this class (from memory). */
    public AccuracyRange narrowestRange() {
        return new AccuracyRange(lowNarrow, highNarrow, SOURCE + ", Class " + number + ", narrowest typical range",
                SourceStatus.FROM_MEMORY);
    }

    /** The widest typical range of this class (from memory). */
    public AccuracyRange widestRange() {
        return new AccuracyRange(lowWide, highWide, SOURCE + ", Class " + number + ", widest typical range",
                SourceStatus.FROM_MEMORY);
    }

    /** The class of a feasibility-study estimate: {@link #CLASS_4}. */
    public static EstimateClass forFeasibilityStudy() {
        return CLASS_4;
    }
}
