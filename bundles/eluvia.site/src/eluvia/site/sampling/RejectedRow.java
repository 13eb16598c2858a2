package eluvia.site.sampling;

/**
 * A row of a sample file that was not imported, and why.
 *
 * @param line the 1-based line in the file where the row ends
 * @param reason what is wrong with it and how to fix it
 */
public record RejectedRow(long line, String reason) {

    /** As shown to the user, e.g. {@code line 7: top_depth_m = 'x' is not a number}. */
    public String message() {
        return "line " + line + ": " + reason;
    }
}
