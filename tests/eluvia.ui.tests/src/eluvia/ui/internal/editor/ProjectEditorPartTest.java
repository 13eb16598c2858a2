package eluvia.ui.internal.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.e4.core.contexts.ContextInjectionFactory;
import org.eclipse.e4.core.contexts.EclipseContextFactory;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.ui.model.application.ui.basic.MBasicFactory;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.SitePackage;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.document.Autosave;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.handlers.RedoHandler;
import eluvia.ui.internal.handlers.UndoHandler;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * The project editor part made by e4 dependency injection from an Eclipse context (as the
 * workbench makes it): it opens its file, registers the document, marks the part dirty, saves on
 * {@code @Persist}, serves the Undo and Redo handlers and forgets everything on close.
 */
final class ProjectEditorPartTest {

    @TempDir
    Path dir;

    private String home;

    @BeforeEach
    void privateHome() {
        home = System.getProperty("user.home");
        System.setProperty("user.home", dir.resolve("home").toString());
        UiPreferences.reset();
    }

    @AfterEach
    void restoreHome() {
        System.setProperty("user.home", home);
        UiPreferences.reset();
    }

    @Test
    void thePartOpensMarksDirtySavesAndUndoes() throws Exception {
        Path file = dir.resolve("example.eluvia");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            Files.copy(in, file);
        }
        try (Gui gui = Gui.open(1200, 800)) {
            OpenDocuments documents = new OpenDocuments();
            MPart part = MBasicFactory.INSTANCE.createPart();
            part.getPersistedState().put(ProjectEditorPart.FILE_KEY, file.toString());
            IEclipseContext context = EclipseContextFactory.create("test");
            Composite parent = new Composite(gui.shell, SWT.NONE);
            context.set(Composite.class, parent);
            context.set(MPart.class, part);
            context.set(OpenDocuments.class, documents);
            ProjectEditorPart editor = ContextInjectionFactory.make(ProjectEditorPart.class, context);
            gui.show();
            ProjectDocument d = editor.document();
            assertNotNull(d);
            assertSame(d, documents.active(), "the editor's document is the active one");
            assertEquals("example.eluvia", part.getLabel());
            assertEquals(file.toAbsolutePath().normalize(), UiPreferences.recentFiles().get(0), "a recent file");
            gui.waitUntil("the first results", () -> documents.results(d).status() != ResultState.Status.COMPUTING);

            UndoHandler undo = new UndoHandler();
            RedoHandler redo = new RedoHandler();
            assertFalse(undo.canExecute(documents));
            d.execute(SetCommand.create(d.domain(), d.project(), SitePackage.eINSTANCE.getProject_Name(), "Renamed"));
            assertTrue(part.isDirty(), "the part shows the dirty marker");
            assertTrue(undo.canExecute(documents));
            undo.execute(documents);
            assertFalse(part.isDirty());
            assertTrue(redo.canExecute(documents));
            redo.execute(documents);
            assertEquals("Renamed", d.project().getName());

            Autosave.write(d);
            assertTrue(Autosave.pending(file).isPresent());
            editor.save();
            assertFalse(part.isDirty());
            assertEquals("Renamed", ProjectFiles.load(file).getName());
            assertTrue(Autosave.pending(file).isEmpty(), "saving removes the autosave");

            // the workbench disposes the part's context when it closes the part: @PreDestroy runs
            context.dispose();
            assertEquals(null, documents.active(), "a closed editor's document is forgotten");
        }
    }
}
