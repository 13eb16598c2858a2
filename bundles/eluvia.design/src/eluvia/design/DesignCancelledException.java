package eluvia.design;

/**
 * Thrown when a {@link DesignProgress} asked a running pipeline to stop. Nothing of the run is
 * returned: a cancelled run has no results.
 */
public final class DesignCancelledException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String stage;

    /** @param stage the stage that was running when the run stopped */
    public DesignCancelledException(String stage) {
        super("the design run was cancelled during: " + stage);
        this.stage = stage;
    }

    /** The stage that was running when the run stopped. */
    public String stage() {
        return stage;
    }
}
