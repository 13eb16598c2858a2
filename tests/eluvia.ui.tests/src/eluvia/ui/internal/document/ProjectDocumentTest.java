package eluvia.ui.internal.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SitePackage;

/** The document: edits through the command stack, undo and redo, dirty state, save, save as, autosave and recovery. */
final class ProjectDocumentTest {

    private static final SitePackage P = SitePackage.eINSTANCE;

    @TempDir
    Path dir;

    private Path example() throws Exception {
        Path file = dir.resolve("example.eluvia");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            Files.copy(in, file);
        }
        return file;
    }

    @Test
    void editsSayWhatTheyChangeForTheUndoAndRedoItems() throws Exception {
        ProjectDocument d = ProjectDocument.open(example());
        FlushingDesign design = d.project().getFlushingDesigns().get(0);
        assertEquals("", d.undoLabel(), "nothing to undo");
        d.execute(SetCommand.create(d.domain(), design, P.getFlushingDesign_DarcyFluxMetresPerDay(), 0.5));
        // the item providers' property name (eluvia.site.edit plugin.properties)
        assertEquals("Set Darcy Flux Metres Per Day", d.undoLabel());
        d.undo();
        assertEquals("", d.undoLabel());
        assertEquals("Set Darcy Flux Metres Per Day", d.redoLabel());
        d.dispose();
    }

    @Test
    void closingTheLastDocumentTellsTheViewsThatNoneIsActive() throws Exception {
        OpenDocuments documents = new OpenDocuments();
        ProjectDocument d = ProjectDocument.open(example());
        List<ProjectDocument> told = new java.util.ArrayList<>();
        documents.addListener(new OpenDocuments.Listener() {
            @Override
            public void activeChanged(ProjectDocument activeOrNull) {
                told.add(activeOrNull);
            }
        });
        documents.register(d, (object, feature) -> false);
        documents.unregister(d);
        assertNull(documents.active());
        assertEquals(java.util.Arrays.asList(d, null), told, "active, then none");
        d.dispose();
    }

    @Test
    void anEditIsUndoneAndRedoneAndMarksTheDocumentDirtyUntilSaved() throws Exception {
        ProjectDocument d = ProjectDocument.open(example());
        FlushingDesign design = d.project().getFlushingDesigns().get(0);
        double before = design.getDarcyFluxMetresPerDay();
        int[] dirtyEvents = { 0 };
        d.addListener(new ProjectDocument.Listener() {
            @Override
            public void dirtyChanged(ProjectDocument doc) {
                dirtyEvents[0]++;
            }
        });
        assertFalse(d.isDirty());
        assertFalse(d.canUndo());

        assertTrue(d.execute(SetCommand.create(d.domain(), design, P.getFlushingDesign_DarcyFluxMetresPerDay(), 0.5)));
        assertEquals(0.5, design.getDarcyFluxMetresPerDay());
        assertTrue(d.isDirty());
        assertTrue(d.canUndo());
        assertTrue(dirtyEvents[0] > 0);

        d.undo();
        assertEquals(before, design.getDarcyFluxMetresPerDay());
        assertFalse(d.isDirty(), "back at the save point");
        assertTrue(d.canRedo());
        d.redo();
        assertEquals(0.5, design.getDarcyFluxMetresPerDay());

        d.save();
        assertFalse(d.isDirty());
        Project reread = ProjectFiles.load(d.file());
        assertEquals(0.5, reread.getFlushingDesigns().get(0).getDarcyFluxMetresPerDay());
        d.undo();
        assertTrue(d.isDirty(), "undoing past the save point leaves unsaved changes");
    }

    @Test
    void deletingAContaminantClearsEveryReferenceToItAndUndoRestoresThem() throws Exception {
        ProjectDocument d = ProjectDocument.open(example());
        Contaminant c = d.project().getContaminants().get(0);
        long references = d.project().getCleanupLevels().stream().filter(l -> l.getContaminant() == c).count();
        assertTrue(references > 0, "the example has a cleanup level for its first contaminant");
        d.execute(DeleteCommand.create(d.domain(), List.of(c)));
        assertFalse(d.project().getContaminants().contains(c));
        assertTrue(d.project().getCleanupLevels().stream().noneMatch(l -> l.getContaminant() == c));
        d.undo();
        assertEquals(references, d.project().getCleanupLevels().stream().filter(l -> l.getContaminant() == c).count());
    }

    @Test
    void saveAsMovesTheDocumentToTheNewFile() throws Exception {
        ProjectDocument d = ProjectDocument.open(example());
        int[] moved = { 0 };
        d.addListener(new ProjectDocument.Listener() {
            @Override
            public void fileChanged(ProjectDocument doc) {
                moved[0]++;
            }
        });
        d.execute(SetCommand.create(d.domain(), d.project(), P.getProject_Name(), "Renamed"));
        Path other = dir.resolve("sub").resolve("other.eluvia");
        Files.createDirectories(other.getParent());
        d.saveAs(other);
        assertEquals(other.toAbsolutePath().normalize(), d.file());
        assertEquals(1, moved[0]);
        assertFalse(d.isDirty());
        assertEquals("Renamed", ProjectFiles.load(other).getName());
        assertEquals("Riverside Depot (invented example)", ProjectFiles.load(dir.resolve("example.eluvia")).getName(),
                "the original file is untouched");
    }

    @Test
    void anAutosaveOfUnsavedEditsIsOfferedAndRecoveredAsUnsaved() throws Exception {
        Path file = example();
        ProjectDocument d = ProjectDocument.open(file);
        assertFalse(Autosave.write(d), "nothing to autosave while clean");
        assertTrue(Autosave.pending(file).isEmpty());
        d.execute(SetCommand.create(d.domain(), d.project(), P.getProject_Name(), "Edited before a crash"));
        assertTrue(Autosave.write(d));
        Path side = Autosave.fileFor(file);
        assertTrue(Files.isRegularFile(side));
        assertFalse(Files.exists(side.resolveSibling(side.getFileName() + ProjectFiles.BACKUP_SUFFIX)),
                "the autosave keeps no backup of itself");
        assertEquals(side, Autosave.pending(file).orElseThrow());

        // the crash: the document is gone, the file still holds the old content
        ProjectDocument recovered = ProjectDocument.recover(file, side);
        assertEquals("Edited before a crash", recovered.project().getName());
        assertTrue(recovered.isDirty(), "recovered edits are unsaved");
        assertEquals(file.toAbsolutePath().normalize(), recovered.file());
        recovered.save();
        assertFalse(recovered.isDirty());
        assertTrue(Autosave.pending(file).isEmpty(), "saving removes the autosave");
        assertEquals("Edited before a crash", ProjectFiles.load(file).getName());
    }

    @Test
    void anAutosaveOlderThanTheFileIsNotOffered() throws Exception {
        Path file = example();
        ProjectDocument d = ProjectDocument.open(file);
        d.execute(SetCommand.create(d.domain(), d.project(), P.getProject_Name(), "Old edit"));
        Autosave.write(d);
        Files.setLastModifiedTime(Autosave.fileFor(file), FileTime.fromMillis(Files.getLastModifiedTime(file).toMillis() - 60_000));
        assertTrue(Autosave.pending(file).isEmpty());
        Autosave.discard(file);
        assertFalse(Files.exists(Autosave.fileFor(file)));
    }

    @Test
    void aDamagedFileIsReportedNotOpened() throws Exception {
        Path bad = dir.resolve("bad.eluvia");
        Files.writeString(bad, "<not a project");
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectDocument.open(bad));
        assertTrue(e.getMessage().contains("bad.eluvia"), e.getMessage());
    }

    @Test
    void aSnapshotIsADeepSelfContainedCopy() throws Exception {
        ProjectDocument d = ProjectDocument.open(example());
        Project copy = d.snapshot();
        assertEquals(d.project().getName(), copy.getName());
        FlushingDesign design = copy.getFlushingDesigns().get(0);
        assertTrue(copy.getSite().getZones().contains(design.getZone()), "references point into the copy");
        design.setDarcyFluxMetresPerDay(9);
        assertFalse(d.project().getFlushingDesigns().get(0).getDarcyFluxMetresPerDay() == 9);
        assertNull(copy.eResource(), "the copy is in no resource");
    }
}
