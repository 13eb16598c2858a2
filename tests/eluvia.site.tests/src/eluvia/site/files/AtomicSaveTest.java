package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.internal.files.AtomicFileWriter;
import eluvia.site.model.Project;
import eluvia.site.tests.TestProjects;

/** Saving replaces the file atomically and keeps one backup. */
final class AtomicSaveTest {

    @TempDir
    Path folder;

    @Test
    void theSecondSaveKeepsTheFirstAsBackup() throws Exception {
        Path file = folder.resolve("site." + ProjectFiles.EXTENSION);
        Project project = TestProjects.example();
        ProjectFiles.save(project, file);
        byte[] first = Files.readAllBytes(file);
        project.setName("renamed");

        ProjectFiles.save(project, file);

        Path backup = folder.resolve("site.eluvia" + ProjectFiles.BACKUP_SUFFIX);
        assertArrayEquals(first, Files.readAllBytes(backup));
        assertEquals("renamed", ProjectFiles.load(file).getName());
        assertEquals(List.of("site.eluvia", "site.eluvia.bak"), names(), "no temporary files may be left");
    }

    @Test
    void onlyOneBackupIsKept() throws Exception {
        Path file = folder.resolve("site." + ProjectFiles.EXTENSION);
        Project project = TestProjects.example();
        for (int i = 0; i < 4; i++) {
            project.setName("save " + i);
            ProjectFiles.save(project, file);
        }

        assertEquals("save 2", ProjectFiles.load(folder.resolve("site.eluvia.bak")).getName());
        assertEquals(List.of("site.eluvia", "site.eluvia.bak"), names());
    }

    @Test
    void temporaryFilesOfKilledSavesAreRemovedOnceStale() throws Exception {
        Path file = folder.resolve("site.eluvia");
        Path stale = Files.writeString(folder.resolve(".site.eluvia.12345" + AtomicFileWriter.TEMP_SUFFIX), "half a file");
        Path staleBackup = Files.writeString(folder.resolve(".site.eluvia.bak.678" + AtomicFileWriter.TEMP_SUFFIX), "half a backup");
        Path fresh = Files.writeString(folder.resolve(".site.eluvia.999" + AtomicFileWriter.TEMP_SUFFIX), "a save in progress");
        Path otherFile = Files.writeString(folder.resolve(".other.eluvia.1" + AtomicFileWriter.TEMP_SUFFIX), "not ours");
        FileTime old = FileTime.from(Instant.now().minus(AtomicFileWriter.STALE_TEMPORARY_AGE).minusSeconds(60));
        for (Path p : List.of(stale, staleBackup, otherFile)) {
            Files.setLastModifiedTime(p, old);
        }

        ProjectFiles.save(TestProjects.example(), file);

        assertEquals(List.of(".other.eluvia.1.saving", ".site.eluvia.999.saving", "site.eluvia"), names());
    }

    @Test
    void aNewFileHasNoBackup() throws Exception {
        ProjectFiles.save(TestProjects.example(), folder.resolve("new.eluvia"));

        assertEquals(List.of("new.eluvia"), names());
    }

    @Test
    void permissionsOfTheExistingFileAreKept() throws Exception {
        Assumptions.assumeTrue(Files.getFileStore(folder).supportsFileAttributeView(PosixFileAttributeView.class),
                "POSIX permissions only");
        Path file = folder.resolve("perm.eluvia");
        ProjectFiles.save(TestProjects.example(), file);
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-rw----"));

        ProjectFiles.save(TestProjects.example(), file);

        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
    }

    @Test
    void savingDoesNotTakeTheProjectOutOfItsResource() throws Exception {
        Resource resource = new ResourceSetImpl().createResource(URI.createURI("memory:/edited.eluvia"));
        if (resource == null) {
            resource = new XMIResourceFactoryImpl().createResource(URI.createURI("memory:/edited.eluvia"));
        }
        Project project = TestProjects.example();
        resource.getContents().add(project);

        ProjectFiles.save(project, folder.resolve("in-resource.eluvia"));

        assertSame(resource, project.eResource());
    }

    @Test
    void aReferenceOutsideTheProjectIsRefusedBeforeWriting() {
        Project project = TestProjects.example();
        Project other = TestProjects.example();
        project.getFlushingDesigns().get(0).setZone(other.getSite().getZones().get(0));

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ProjectFiles.save(project, folder.resolve("foreign.eluvia")));

        assertTrue(e.getMessage().contains("field zone"), e.getMessage());
        assertTrue(e.getMessage().contains("not part of project"), e.getMessage());
        assertFalse(Files.exists(folder.resolve("foreign.eluvia")));
    }

    @Test
    void aMissingFolderIsAnIoException() {
        assertThrows(IOException.class,
                () -> ProjectFiles.save(TestProjects.example(), folder.resolve("no/such/folder/x.eluvia")));
        assertThrows(NullPointerException.class, () -> ProjectFiles.save(null, folder.resolve("x.eluvia")));
        assertThrows(NullPointerException.class, () -> ProjectFiles.save(TestProjects.example(), null));
    }

    private List<String> names() throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList());
        }
    }
}
