package eluvia.site.files;

/**
 * A project file could not be read: it is malformed, hostile, of an unknown schema version or not
 * a project file at all.
 *
 * <p>The message is meant for the engineer, unchanged: it names the file, the line where the
 * problem was found (when there is one) and what is wrong, never a stack trace. The cause, when
 * there is one, is kept for logs only.
 */
public class ProjectFileException extends Exception {
    private static final long serialVersionUID = 1L;

    private final String fileName;
    private final int line;
    private final String reason;

    /**
     * @param fileName the name of the file as shown to the user
     * @param line the 1-based line of the problem, or 0 when it is not tied to a line
     * @param reason what is wrong and, where it helps, what to do
     * @param cause the underlying exception, or null
     */
    public ProjectFileException(String fileName, int line, String reason, Throwable cause) {
        super(format(fileName, line, reason), cause);
        this.fileName = fileName;
        this.line = Math.max(0, line);
        this.reason = reason;
    }

    public ProjectFileException(String fileName, int line, String reason) {
        this(fileName, line, reason, null);
    }

    private static String format(String fileName, int line, String reason) {
        return line > 0 ? fileName + ", line " + line + ": " + reason : fileName + ": " + reason;
    }

    /** The 1-based line where the problem was found, or 0 when it is not tied to a line. */
    public int line() {
        return line;
    }

    /** The name of the file as given for messages. */
    public String fileName() {
        return fileName;
    }

    /** What is wrong, without the file name and line. */
    public String reason() {
        return reason;
    }
}
