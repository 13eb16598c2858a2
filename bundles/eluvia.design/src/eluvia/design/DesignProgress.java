package eluvia.design;

/**
 * Receives progress from a pipeline run and may ask it to stop. No workbench classes: a workbench
 * job forwards {@link #advanced} to its progress monitor and {@link #cancelRequested()} to the
 * monitor's cancel flag; the command line passes {@link #NONE}.
 *
 * <p>The pipeline calls {@link #advanced} from the thread that runs it, at every stage and inside
 * the long stages (the numerical flushing solver about two hundred times per run, kriging once per
 * block layer), and asks {@link #cancelRequested()} as often; when that answers true the run stops
 * with a {@link DesignCancelledException}. Implementations must be cheap.
 */
public interface DesignProgress {

    /** Reports nothing and never cancels. */
    DesignProgress NONE = (stage, fractionDone) -> {
    };

    /**
     * The run is in {@code stage} (plain words, e.g. "numerical flushing solver, design 'A',
     * benzene") and {@code fractionDone} (dimensionless, 0 to 1) of the whole run is done.
     */
    void advanced(String stage, double fractionDone);

    /** True to stop the run as soon as possible (default: never). */
    default boolean cancelRequested() {
        return false;
    }
}
