package eluvia.design.uncertainty;

/**
 * Where a simulation reports progress and learns that it should stop. Plain Java, so that the
 * workbench can adapt a progress monitor and the command line a console counter.
 *
 * <p>{@link MonteCarloRunner} calls both methods only on the thread that called
 * {@link MonteCarloRunner#run}, after each batch of runs and at least every 100 ms while the
 * workers are busy; an implementation need not be thread-safe.
 */
public interface ProgressSink {

    /** Reports nothing and never cancels. */
    ProgressSink NONE = new ProgressSink() {
        @Override
        public void worked(int done, int total) {
            // nothing to report to
        }

        @Override
        public boolean cancelled() {
            return false;
        }
    };

    /**
     * @param done  the model evaluations finished so far (Monte Carlo runs plus tornado cases)
     * @param total the model evaluations planned
     */
    void worked(int done, int total);

    /** Whether the user asked to stop; the simulation then returns a partial result marked cancelled. */
    boolean cancelled();
}
