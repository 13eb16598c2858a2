package eluvia.ui.internal.handlers;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Shell;

import eluvia.site.files.ExampleProjects;
import eluvia.ui.ProjectEditors;
import eluvia.ui.internal.Messages;

/**
 * File > Open Example Project: copies the shipped (invented) example into
 * {@code ~/Eluvia examples/} unless a copy is already there, and opens it.
 */
public final class OpenExampleHandler {

    /** Folder the example is copied to. */
    public static Path exampleFolder() {
        return Path.of(System.getProperty("user.home"), "Eluvia examples");
    }

    /**
     * Copies the shipped example into a folder unless a file of that name is already there (so a
     * user's edits to an earlier copy are never overwritten), and returns its path.
     */
    public static Path copyExample(Path folder) throws IOException {
        Files.createDirectories(folder);
        Path target = folder.resolve(ExampleProjects.RIVERSIDE_DEPOT);
        if (!Files.exists(target)) {
            try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
                Files.copy(in, target);
            }
        }
        return target;
    }

    @Execute
    public void execute(Shell shell, EPartService parts, EModelService models, MApplication app) {
        try {
            Path file = copyExample(exampleFolder());
            ProjectEditors.open(file, parts, models, app);
        } catch (IOException e) {
            MessageDialog.openError(shell, Messages.Example_title, Messages.bind(Messages.Example_copyFailed, exampleFolder(),
                    e.getMessage()));
        }
    }
}
