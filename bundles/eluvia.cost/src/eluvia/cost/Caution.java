package eluvia.cost;

/**
 * A caution the design package must show beside a result: the tool estimates for planning and
 * defers to the rules where the site is and to the licensed engineer.
 *
 * @param code short stable identifier (for filtering and tests), e.g. {@code "protective-system"}
 * @param text the sentence(s) to show the engineer
 */
public record Caution(String code, String text) {
    /** Code of the caution for excavations deeper than 1.52 m (5 ft). */
    public static final String PROTECTIVE_SYSTEM = "protective-system";
    /** Code of the caution for excavations 6.1 m (20 ft) deep or more. */
    public static final String ENGINEERED_PROTECTIVE_SYSTEM = "engineered-protective-system";
    /** Code of the caution for a side slope steeper than the published maximum for the soil type. */
    public static final String SLOPE_STEEPER_THAN_TABLE = "slope-steeper-than-table";
    /** Code of the caution for flushing water that escapes capture. */
    public static final String UNCAPTURED_WATER = "uncaptured-water";
    /** Code of the caution for flushing in general (mobilised contaminants, permits). */
    public static final String FLUSHING_MOBILISES = "flushing-mobilises";
    /** Code of the caution for invented unit rates. */
    public static final String INVENTED_RATES = "invented-rates";

    /** Checks the fields. */
    public Caution {
        eluvia.cost.internal.Checks.text("caution code", code);
        eluvia.cost.internal.Checks.text("caution text", text);
    }
}
