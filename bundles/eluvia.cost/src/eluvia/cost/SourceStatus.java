package eluvia.cost;

/** How far a built-in number can be trusted: published and checked, recalled, or convention. */
public enum SourceStatus {
    /** The number stands in the published source cited. */
    PUBLISHED("published"),
    /** Recalled from the source cited, not re-checked against it: verify before relying on it. */
    FROM_MEMORY("from memory, not verified against the source"),
    /** Common practice; no single source. */
    COMMON_PRACTICE("common practice"),
    /** Supplied by the user. */
    USER_INPUT("user input");

    private final String label;

    SourceStatus(String label) {
        this.label = label;
    }

    /** Plain label for reports. */
    public String label() {
        return label;
    }
}
