package eluvia.ui;

import java.nio.file.Path;

import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;

import eluvia.ui.internal.editor.ProjectEditorPart;

/**
 * Opens project files in the workbench's project editors, reusing an editor already open on the
 * same file. The editors' part descriptor is {@code eluvia.ui.partdescriptor.projectEditor}; they
 * go into the part stack {@link #EDITOR_STACK_ID} of the application model.
 */
public final class ProjectEditors {

    /** Id of the part stack that holds the project editors. */
    public static final String EDITOR_STACK_ID = "eluvia.app.partstack.editors";

    private ProjectEditors() {
    }

    /**
     * Opens a project file, or activates the editor already showing it.
     *
     * @param file the {@code .eluvia} file
     * @return the editor's part
     */
    public static MPart open(Path file, EPartService parts, EModelService models, MApplication app) {
        String path = file.toAbsolutePath().normalize().toString();
        for (MPart p : parts.getParts()) {
            if (path.equals(p.getPersistedState().get(ProjectEditorPart.FILE_KEY))) {
                parts.showPart(p, PartState.ACTIVATE);
                return p;
            }
        }
        MPart part = parts.createPart(ProjectEditorPart.DESCRIPTOR_ID);
        part.getPersistedState().put(ProjectEditorPart.FILE_KEY, path);
        part.setLabel(file.getFileName().toString());
        MPartStack stack = (MPartStack) models.find(EDITOR_STACK_ID, app);
        stack.getChildren().add(part);
        parts.showPart(part, PartState.ACTIVATE);
        return part;
    }
}
