package eluvia.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

import eluvia.ui.internal.document.OpenDocuments;

/** File > Save: saves the active project. */
public final class SaveHandler {

    @CanExecute
    public boolean canExecute(EPartService parts, OpenDocuments documents) {
        MPart part = Editors.activeEditor(parts, documents);
        return part != null && part.isDirty();
    }

    @Execute
    public void execute(EPartService parts, OpenDocuments documents) {
        MPart part = Editors.activeEditor(parts, documents);
        if (part != null) {
            parts.savePart(part, false);
        }
    }
}
