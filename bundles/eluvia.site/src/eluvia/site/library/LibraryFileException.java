package eluvia.site.library;

/** A library file could not be read; the message names the file, the line and the problem. */
public class LibraryFileException extends Exception {
    private static final long serialVersionUID = 1L;

    private final int line;

    public LibraryFileException(String fileName, int line, String reason, Throwable cause) {
        super((line > 0 ? fileName + ", line " + line + ": " : fileName + ": ") + reason, cause);
        this.line = Math.max(0, line);
    }

    /** The 1-based line of the problem, or 0. */
    public int line() {
        return line;
    }
}
