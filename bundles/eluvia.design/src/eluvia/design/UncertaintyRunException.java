package eluvia.design;

/**
 * Why one Monte Carlo run of the design pipeline gave no usable headline figures: the sampled
 * values failed validation, a flushing design did not reach its cleanup level, an alternative
 * could not be priced, or the pipeline stopped. {@link UncertaintyAnalysis} throws it from inside
 * a run; the Monte Carlo engine records it as a failed run with this message, and
 * {@link UncertaintyResults#failureCounts()} counts the runs by {@link #category()}.
 *
 * <p>The message is the category, {@value #SEPARATOR}, and the detail with the run's numbers.
 */
public final class UncertaintyRunException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Separates the category from the detail in the message. */
    public static final String SEPARATOR = " -- ";

    private final String category;

    /**
     * @param category what went wrong, without the run's numbers (runs are counted by it), e.g.
     *                 {@code "validation: Flushing design 'A' field darcyFluxMetresPerDay"}
     * @param detail   the full explanation with the values of this run
     * @param cause    the exception that stopped the pipeline, or null
     */
    public UncertaintyRunException(String category, String detail, Throwable cause) {
        super(category + SEPARATOR + detail, cause);
        this.category = category;
    }

    /** What went wrong, without the run's numbers. */
    public String category() {
        return category;
    }

    /**
     * The category of a failed run's reason as the Monte Carlo engine records it (the exception's
     * simple name, a colon and its message); the whole reason when it is not one of ours.
     */
    static String categoryOf(String reason) {
        String prefix = UncertaintyRunException.class.getSimpleName() + ": ";
        if (reason != null && reason.startsWith(prefix)) {
            int end = reason.indexOf(SEPARATOR, prefix.length());
            if (end > 0) {
                return reason.substring(prefix.length(), end);
            }
        }
        return reason == null ? "unknown" : reason;
    }
}
