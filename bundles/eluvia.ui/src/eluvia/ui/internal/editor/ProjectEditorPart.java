package eluvia.ui.editor;

import java.nio.file.Path;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.Persist;
import org.eclipse.e4.ui.model.application.ui.MDirtyable;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;
import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;

/**
 * The project editor: one per open {@code .eluvia} file. The file's path is in the part's
 * persisted state under {@link #FILE_KEY}.
 */
public final class ProjectEditorPart {

    /** Id of the part descriptor in the application model. */
    public static final String DESCRIPTOR_ID = "eluvia.ui.partdescriptor.projectEditor";
    /** Persisted-state key holding the absolute path of the project file. */
    public static final String FILE_KEY = "eluvia.ui.file";

    @Inject
    private MDirtyable dirty;

    private Project project;
    private Path file;
    private ProjectEditorComposite content;

    @PostConstruct
    public void createControls(Composite parent, MPart part) {
        parent.setLayout(new FillLayout());
        file = Path.of(part.getPersistedState().get(FILE_KEY));
        try {
            project = ProjectFiles.load(file);
        } catch (ProjectFileException e) {
            Label l = new Label(parent, SWT.WRAP);
            l.setText("Cannot open " + file + ":\n" + e.getMessage());
            return;
        }
        part.setLabel(file.getFileName().toString());
        part.setTooltip(file.toString());
        content = new ProjectEditorComposite(parent, project, () -> dirty.setDirty(true));
    }

    @Focus
    public void focus() {
        if (content != null) {
            content.setFocus();
        }
    }

    @Persist
    public void save() {
        if (project == null) {
            return;
        }
        try {
            ProjectFiles.save(project, file);
            dirty.setDirty(false);
        } catch (java.io.IOException e) {
            MessageDialog.openError(content.getShell(), "Save failed",
                    "Could not save " + file + ": " + e.getMessage() + "\nYour edits are still in the editor; try Save again or choose another folder.");
        }
    }
}
