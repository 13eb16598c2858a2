package eluvia.transport.numerical;

/**
 * Receives progress reports from a long numerical run and may ask it to stop.
 *
 * <p>The solver calls {@link #advanced} from the thread that runs it, about two hundred times over
 * a run and once at the end, and asks {@link #cancelRequested()} after every time step; when that
 * answers true the run stops with a {@link FlushingCancelledException}. Implementations must be
 * cheap; a workbench job would forward to its progress monitor.
 */
public interface FlushingProgress {
    /** Reports nothing and never cancels. */
    FlushingProgress NONE = (done, limit) -> {
    };

    /**
     * The run has passed {@code poreVolumes} pore volumes of at most {@code maximumPoreVolumes}
     * (both dimensionless).
     */
    void advanced(double poreVolumes, double maximumPoreVolumes);

    /** True to stop the run as soon as possible (default: never). */
    default boolean cancelRequested() {
        return false;
    }
}
