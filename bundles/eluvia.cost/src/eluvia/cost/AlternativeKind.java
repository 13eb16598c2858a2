package eluvia.cost;

/** The kinds of remedial alternative the estimate compares. */
public enum AlternativeKind {
    /** In-situ flushing of the whole zone. */
    FLUSHING,
    /** Excavation and off-site disposal of the whole zone. */
    EXCAVATION,
    /** Excavate the hot spot, flush the rest. */
    HYBRID
}
