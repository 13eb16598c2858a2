package eluvia.ui.internal.document;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Optional;

import eluvia.site.files.ProjectFiles;

/**
 * Crash recovery: a dirty project is written now and then to a side file beside it,
 * {@code <name>.eluvia.autosave}. Saving or closing without saving removes the side file; one that
 * is still there when the project is next opened, and is newer than the project file, holds edits
 * that a crash kept from being saved, and is offered for recovery.
 */
public final class Autosave {

    /** Appended to the project file's name for its autosave side file. */
    public static final String SUFFIX = ".autosave";

    private Autosave() {
    }

    /** The side file of a project file. */
    public static Path fileFor(Path projectFile) {
        Path abs = projectFile.toAbsolutePath().normalize();
        return abs.resolveSibling(abs.getFileName() + SUFFIX);
    }

    /**
     * Writes a dirty document's project to its side file (atomically, through {@link ProjectFiles}).
     *
     * @return true when something was written
     */
    public static boolean write(ProjectDocument document) throws IOException {
        if (!document.isDirty()) {
            return false;
        }
        Path side = fileFor(document.file());
        ProjectFiles.save(document.project(), side);
        Files.deleteIfExists(side.resolveSibling(side.getFileName() + ProjectFiles.BACKUP_SUFFIX));
        return true;
    }

    /**
     * The side file of a project file when it holds unsaved edits to recover: it exists and is not
     * older than the project file (or the project file is gone).
     */
    public static Optional<Path> pending(Path projectFile) {
        Path side = fileFor(projectFile);
        if (!Files.isRegularFile(side)) {
            return Optional.empty();
        }
        try {
            if (!Files.exists(projectFile)) {
                return Optional.of(side);
            }
            FileTime sideTime = Files.getLastModifiedTime(side);
            FileTime fileTime = Files.getLastModifiedTime(projectFile);
            return sideTime.compareTo(fileTime) >= 0 ? Optional.of(side) : Optional.empty();
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    /** Removes the side file of a project file, if any; failures are ignored (the file is then offered again). */
    public static void discard(Path projectFile) {
        try {
            Path side = fileFor(projectFile);
            Files.deleteIfExists(side);
            Files.deleteIfExists(side.resolveSibling(side.getFileName() + ProjectFiles.BACKUP_SUFFIX));
        } catch (IOException e) {
            // a side file that cannot be removed is offered again on the next open, which is safe
        }
    }
}
