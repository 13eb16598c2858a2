package eluvia.design.internal;

import eluvia.design.DesignCancelledException;
import eluvia.design.DesignProgress;

/**
 * Turns the pipeline's stages into one fraction done for a {@link DesignProgress}: the run is
 * divided into weighted units of work (a numerical solve weighs more than an analytical search),
 * and a long stage reports its own fraction within its units.
 */
public final class RunProgress {
    private final DesignProgress sink;
    private final double totalUnits;
    private double doneUnits;
    private String stage = "start";

    /**
     * @param sink where progress goes
     * @param totalUnits the weight of the whole run (any positive scale)
     */
    public RunProgress(DesignProgress sink, double totalUnits) {
        this.sink = sink == null ? DesignProgress.NONE : sink;
        this.totalUnits = Math.max(totalUnits, 1e-9);
    }

    /** Starts a stage: reports it and stops the run when cancellation was asked for. */
    public void begin(String stageName) {
        stage = stageName;
        report(0);
    }

    /** Reports {@code fraction} (0 to 1) of a stage of {@code units} done, and checks for cancellation. */
    public void within(double units, double fraction) {
        report(units * Math.max(0, Math.min(1, fraction)));
    }

    /** Ends a stage of {@code units}. */
    public void end(double units) {
        doneUnits += units;
        report(0);
    }

    /** Whether cancellation was asked for (without stopping). */
    public boolean cancelRequested() {
        return sink.cancelRequested();
    }

    /** Stops the run when cancellation was asked for. */
    public void checkCancelled() {
        if (sink.cancelRequested()) {
            throw new DesignCancelledException(stage);
        }
    }

    /** The stage now running. */
    public String stage() {
        return stage;
    }

    private void report(double extraUnits) {
        sink.advanced(stage, Math.min(1.0, (doneUnits + extraUnits) / totalUnits));
        checkCancelled();
    }
}
