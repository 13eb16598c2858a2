package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.internal.files.AtomicFileWriter;
import eluvia.site.model.Project;
import eluvia.site.tests.TestProjects;

/**
 * Kills a process in the middle of saving, again and again: the project file must always load and
 * hold one of the two contents saved, never a mixture or nothing; the backup likewise.
 */
final class KilledSaveTest {

    private static final int KILLS = 6;
    private static final long SEED = 20261201L;

    @TempDir
    Path folder;

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void theFileAlwaysLoadsAfterTheSaverIsKilled() throws Exception {
        Project a = TestProjects.example();
        Project b = TestProjects.everyFeatureSet();
        byte[] bytesA = ProjectFiles.toBytes(a);
        byte[] bytesB = ProjectFiles.toBytes(b);
        Path fileA = Files.write(folder.resolve("a.content"), bytesA);
        Path fileB = Files.write(folder.resolve("b.content"), bytesB);
        Path classes = copyChildClasses(folder.resolve("child-classes"));
        Path target = folder.resolve("killed.eluvia");
        Random random = new Random(SEED);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();

        for (int kill = 0; kill < KILLS; kill++) {
            Process child = new ProcessBuilder(java, "-Xshare:auto", "-cp", classes.toString(),
                    SaveLoopChild.class.getName(), target.toString(), fileA.toString(), fileB.toString())
                    .redirectErrorStream(true).start();
            try (BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
                String first = out.readLine();
                assertEquals("saving", first, "the child did not start saving");
                Thread.sleep(20 + random.nextInt(200));
                child.destroyForcibly();
                assertTrue(child.waitFor(30, TimeUnit.SECONDS), "the child did not die");
            }

            byte[] now = Files.readAllBytes(target);
            assertTrue(Arrays.equals(bytesA, now) || Arrays.equals(bytesB, now),
                    "after kill " + kill + " the file holds neither saved content (" + now.length + " bytes)");
            assertNotNull(ProjectFiles.load(target));
            byte[] backup = Files.readAllBytes(folder.resolve("killed.eluvia" + ProjectFiles.BACKUP_SUFFIX));
            assertTrue(Arrays.equals(bytesA, backup) || Arrays.equals(bytesB, backup), "the backup is damaged");
            assertNotNull(ProjectFiles.load(folder.resolve("killed.eluvia" + ProjectFiles.BACKUP_SUFFIX)));
        }
        // A later save still works (temporary files of the killed saves are removed once stale, see AtomicSaveTest).
        ProjectFiles.save(a, target);
        assertArrayEquals(bytesA, Files.readAllBytes(target));
    }

    /** Copies the two classes the child needs, read as resources, so this works in and out of OSGi. */
    private static Path copyChildClasses(Path root) throws Exception {
        for (Class<?> type : List.of(SaveLoopChild.class, AtomicFileWriter.class)) {
            String resource = type.getName().replace('.', '/') + ".class";
            Path file = root.resolve(resource);
            Files.createDirectories(file.getParent());
            try (InputStream in = type.getClassLoader().getResourceAsStream(resource)) {
                assertNotNull(in, resource);
                Files.copy(in, file);
            }
        }
        return root;
    }
}
