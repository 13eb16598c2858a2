package eluvia.ui.internal.handlers;

import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.editor.ProjectEditorPart;

/** Finds the project editor that commands act on: the one of the active document. */
final class Editors {

    private Editors() {
    }

    /** The part of the active document's editor, or null. */
    static MPart activeEditor(EPartService parts, OpenDocuments documents) {
        ProjectDocument active = documents.active();
        if (active == null) {
            return null;
        }
        for (MPart p : parts.getParts()) {
            if (p.getObject() instanceof ProjectEditorPart e && e.document() == active) {
                return p;
            }
        }
        return null;
    }
}
