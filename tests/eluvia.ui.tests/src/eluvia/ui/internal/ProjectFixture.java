package eluvia.ui.internal;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;

import eluvia.site.files.ExampleProjects;
import eluvia.site.library.PropertyLibrary;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.document.DesignComputation;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.editor.ProjectEditorComposite;
import eluvia.ui.internal.views.FlushingResultsView;
import eluvia.ui.internal.views.ProblemsView;

/**
 * The shipped (invented) example open the way the workbench opens it: a document registered with
 * {@link OpenDocuments}, its editor content, a design computation publishing results, and the
 * Flushing results and Problems views beside it.
 */
public final class ProjectFixture implements AutoCloseable {

    public final Gui gui;
    public final OpenDocuments documents = new OpenDocuments();
    public final ProjectDocument document;
    public final ProjectEditorComposite editor;
    public final DesignComputation computation;
    public final FlushingResultsView results;
    public final ProblemsView problems;
    private long published;
    private final String home;

    private ProjectFixture(Path file, UnitSystem units) throws Exception {
        // the views read the user's preferences: give the test a home of its own (SI, no recent files)
        home = System.getProperty("user.home");
        System.setProperty("user.home", file.resolveSibling("home").toString());
        eluvia.ui.internal.preferences.UiPreferences.reset();
        gui = Gui.open(1280, 860);
        document = ProjectDocument.open(file);
        SashForm sash = new SashForm(gui.shell, SWT.HORIZONTAL);
        editor = new ProjectEditorComposite(sash, document, units, PropertyLibrary.shipped());
        SashForm right = new SashForm(sash, SWT.VERTICAL);
        results = new FlushingResultsView(right, documents);
        problems = new ProblemsView(right, documents);
        sash.setWeights(55, 45);
        documents.register(document, editor);
        computation = new DesignComputation(document, gui.display, s -> {
            documents.publish(document, s);
            published++;
        });
        computation.start();
        gui.show();
    }

    /** Copies the example into a folder and opens it. */
    public static ProjectFixture example(Path folder, UnitSystem units) throws Exception {
        Path file = folder.resolve("example.eluvia");
        if (!Files.exists(file)) {
            try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
                Files.copy(in, file);
            }
        }
        return new ProjectFixture(file, units);
    }

    /** Waits until the latest computation has delivered its outcome. */
    public ResultState awaitResults() {
        gui.idle(DesignComputation.DEBOUNCE_MILLISECONDS + 50);
        gui.waitUntil("the design results", () -> !computation.busy()
                && documents.results(document).status() != ResultState.Status.COMPUTING);
        return documents.results(document);
    }

    /** How many states were published so far. */
    public long publishedCount() {
        return published;
    }

    @Override
    public void close() {
        computation.dispose();
        documents.unregister(document);
        gui.close();
        document.dispose();
        System.setProperty("user.home", home);
        eluvia.ui.internal.preferences.UiPreferences.reset();
    }
}
