package eluvia.transport.numerical;

/**
 * Thrown when a {@link FlushingProgress} asked a running solve to stop.
 */
public final class FlushingCancelledException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final double poreVolumesReached;

    FlushingCancelledException(double poreVolumesReached) {
        super("flushing run cancelled after " + poreVolumesReached + " pore volumes");
        this.poreVolumesReached = poreVolumesReached;
    }

    /** Pore volumes (dimensionless) passed when the run stopped. */
    public double poreVolumesReached() {
        return poreVolumesReached;
    }
}
