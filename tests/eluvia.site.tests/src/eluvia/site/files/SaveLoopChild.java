package eluvia.site.files;

import java.nio.file.Files;
import java.nio.file.Path;

import eluvia.site.internal.files.AtomicFileWriter;

/**
 * Run in a child JVM by {@link KilledSaveTest}: saves two project contents alternately to one file,
 * as fast as it can, until it is killed. Uses only the JDK and {@link AtomicFileWriter} (the code
 * path {@link ProjectFiles#save} takes after serialising), so its class path is two class files.
 * Arguments: target file, content A, content B; prints "saving" once the loop has started.
 */
public final class SaveLoopChild {

    private SaveLoopChild() {
    }

    public static void main(String[] args) throws Exception {
        Path target = Path.of(args[0]);
        byte[][] contents = {Files.readAllBytes(Path.of(args[1])), Files.readAllBytes(Path.of(args[2]))};
        for (long i = 0;; i++) {
            AtomicFileWriter.write(target, contents[(int) (i % 2)], ProjectFiles.BACKUP_SUFFIX);
            if (i == 1) {
                System.out.println("saving");
                System.out.flush();
            }
        }
    }
}
