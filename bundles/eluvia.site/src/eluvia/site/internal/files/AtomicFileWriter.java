package eluvia.site.internal.files;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.time.Instant;
import java.util.Set;

/**
 * Replaces a file atomically, keeping one backup: the new bytes go to a temporary file in the same
 * folder, are forced to the device, the old file is copied to the backup (through a temporary
 * file and a rename), and the temporary file is renamed over the target. At every moment the target
 * is the complete old or the complete new content. Uses the JDK only (a test runs it in a child JVM
 * that it kills while saving).
 */
public final class AtomicFileWriter {

    /** Ending of the temporary files a save writes next to the target. */
    public static final String TEMP_SUFFIX = ".saving";

    /** Temporary files of killed saves older than this are removed by the next save. */
    public static final Duration STALE_TEMPORARY_AGE = Duration.ofMinutes(10);

    private AtomicFileWriter() {
    }

    /**
     * @param file the target; its folder must exist
     * @param bytes the complete new content
     * @param backupSuffix appended to the file name for the backup of the previous content
     */
    public static void write(Path file, byte[] bytes, String backupSuffix) throws IOException {
        Path target = file.toAbsolutePath();
        Path folder = target.getParent();
        String fileName = target.getFileName().toString();
        removeStaleTemporaries(folder, fileName);
        Path temp = Files.createTempFile(folder, "." + fileName + ".", TEMP_SUFFIX);
        try {
            copyPermissions(target, temp);
            writeAndForce(temp, bytes);
            if (Files.isRegularFile(target)) {
                keepBackup(target, folder.resolve(fileName + backupSuffix), folder, fileName + backupSuffix);
            }
            moveAtomically(temp, target);
            forceFolder(folder);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /**
     * Removes temporary files that a save killed part-way left behind, once they are older than
     * {@link #STALE_TEMPORARY_AGE} (a save in progress elsewhere is never that old). Best effort.
     */
    private static void removeStaleTemporaries(Path folder, String fileName) {
        String prefix = "." + fileName + ".";
        FileTime cutoff = FileTime.from(Instant.now().minus(STALE_TEMPORARY_AGE));
        try (DirectoryStream<Path> stream = Files.newDirectoryStream(folder, p -> {
            String name = p.getFileName().toString();
            return name.startsWith(prefix) && name.endsWith(TEMP_SUFFIX);
        })) {
            for (Path stale : stream) {
                if (Files.getLastModifiedTime(stale).compareTo(cutoff) < 0) {
                    Files.deleteIfExists(stale);
                }
            }
        } catch (IOException e) {
            // Leftovers are harmless; the save itself goes on.
        }
    }

    /** Temporary files are private (rw-------); the saved file keeps the old one's permissions, or rw-r--r--. */
    private static void copyPermissions(Path target, Path temp) throws IOException {
        if (!Files.getFileStore(temp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> permissions = Files.isRegularFile(target)
                ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(temp, permissions);
    }

    private static void writeAndForce(Path path, byte[] bytes) throws IOException {
        try (FileChannel channel = FileChannel.open(path, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
            ByteBuffer buffer = ByteBuffer.wrap(bytes);
            while (buffer.hasRemaining()) {
                channel.write(buffer);
            }
            channel.force(true);
        }
    }

    private static void keepBackup(Path target, Path backup, Path folder, String backupName) throws IOException {
        // Copy (not move) so that the target exists at every moment; then rename into place.
        Path tempBackup = Files.createTempFile(folder, "." + backupName + ".", TEMP_SUFFIX);
        try {
            Files.copy(target, tempBackup, StandardCopyOption.REPLACE_EXISTING);
            try (FileChannel channel = FileChannel.open(tempBackup, StandardOpenOption.WRITE)) {
                channel.force(true);
            }
            moveAtomically(tempBackup, backup);
        } finally {
            Files.deleteIfExists(tempBackup);
        }
    }

    private static void moveAtomically(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            throw new IOException("the file system of " + to.getParent()
                    + " cannot replace a file atomically; save the project on a local disk", e);
        }
    }

    private static void forceFolder(Path folder) {
        // Makes the rename durable on POSIX file systems; not possible (nor needed) everywhere.
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // The rename itself has happened; only its durability across a power cut is weaker.
        }
    }
}
