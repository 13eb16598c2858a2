package eluvia.site.internal.files;

import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;

/**
 * Checks a file's schema version and brings files of older versions up to
 * {@link ProjectFiles#CURRENT_SCHEMA_VERSION}, one step per version.
 */
public final class SchemaMigrations {

    private SchemaMigrations() {
    }

    /**
     * Returns the bytes of the file in the current schema.
     *
     * @throws ProjectFileException for a missing, malformed, unknown or newer version
     */
    public static byte[] migrate(byte[] bytes, HostileInputGuard.RootInfo root, String name)
            throws ProjectFileException {
        int version = version(root, name);
        if (version > ProjectFiles.CURRENT_SCHEMA_VERSION) {
            throw new ProjectFileException(name, root.line(), "the file was written by a newer version of Eluvia "
                    + "(schema version " + version + "; this version reads schema versions 1 to "
                    + ProjectFiles.CURRENT_SCHEMA_VERSION + "); open it with a newer Eluvia");
        }
        return bytes;
    }

    /** The schema version named on the root element. */
    public static int version(HostileInputGuard.RootInfo root, String name) throws ProjectFileException {
        String text = root.schemaVersionText();
        if (text == null) {
            throw new ProjectFileException(name, root.line(), "the project element has no schemaVersion attribute, "
                    + "which every project file has; the file is damaged or was not written by Eluvia");
        }
        int version;
        try {
            version = Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw new ProjectFileException(name, root.line(), "schemaVersion = '" + text
                    + "' is not a whole number; allowed 1 to " + ProjectFiles.CURRENT_SCHEMA_VERSION, e);
        }
        if (version < 1) {
            throw new ProjectFileException(name, root.line(), "schemaVersion = " + version
                    + " is not a schema version; allowed 1 to " + ProjectFiles.CURRENT_SCHEMA_VERSION);
        }
        return version;
    }
}
