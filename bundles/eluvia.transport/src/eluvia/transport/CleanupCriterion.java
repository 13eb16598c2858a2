package eluvia.transport;

/**
 * The statistic a flushing design is held to when it is judged clean.
 *
 * <p>All three are fractions of the initial concentration (dimensionless). With linear
 * sorption the soil (total) concentration is proportional to the pore-water concentration, so
 * the same fraction applies to mg/kg in soil and mg/L in pore water.
 */
public enum CleanupCriterion {
    /** Flux-averaged concentration of the water leaving the bottom of the treated layer. */
    EFFLUENT("effluent", "effluent leaving the layer"),
    /** Depth-averaged residual concentration in the layer (the mass left over the mass at start). */
    MEAN_RESIDUAL("mean", "mean residual in the layer"),
    /** Highest residual concentration anywhere in the layer: the strictest of the three. */
    MAX_RESIDUAL("max", "maximum residual in the layer");

    private final String word;
    private final String description;

    CleanupCriterion(String word, String description) {
        this.word = word;
        this.description = description;
    }

    /** The short word used on the command line and in results files: effluent, mean, max. */
    public String word() {
        return word;
    }

    /** A plain-language description for reports. */
    public String description() {
        return description;
    }

    /**
     * Looks a criterion up by its short word.
     *
     * @throws TransportInputException naming the allowed words when there is no such criterion
     */
    public static CleanupCriterion ofWord(String word) {
        for (CleanupCriterion c : values()) {
            if (c.word.equalsIgnoreCase(word)) {
                return c;
            }
        }
        throw new TransportInputException("criterion", word, "one of effluent, mean, max");
    }
}
