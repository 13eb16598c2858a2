package eluvia.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;

import eluvia.ui.internal.document.OpenDocuments;

/** Edit > Undo: undoes the last edit of the active project. */
public final class UndoHandler {

    @CanExecute
    public boolean canExecute(OpenDocuments documents) {
        return documents.active() != null && documents.active().canUndo();
    }

    @Execute
    public void execute(OpenDocuments documents) {
        if (documents.active() != null) {
            documents.active().undo();
        }
    }
}
