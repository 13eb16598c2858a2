package eluvia.design.uncertainty;

/** What became of one Monte Carlo run. */
public enum RunStatus {
    /** The model gave a finite value for every output. */
    COMPLETED,
    /** The model threw, or left out an output, or gave a value that is not finite. */
    FAILED,
    /** The simulation was cancelled before the run was evaluated. */
    NOT_EVALUATED
}
