package eluvia.site.internal.files;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Replaces a file atomically, keeping one backup: the new bytes go to a temporary file in the same
 * folder, are forced to the device, the old file is copied to the backup (through a temporary
 * file and a rename), and the temporary file is renamed over the target. At every moment the target
 * is the complete old or the complete new content. Uses the JDK only (a test runs it in a child JVM
 * that it kills while saving).
 */
public final class AtomicFileWriter {

    private static final String TEMP_SUFFIX = ".saving";

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
