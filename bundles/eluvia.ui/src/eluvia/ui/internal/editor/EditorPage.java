package eluvia.ui.internal.editor;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.swt.widgets.Composite;

import eluvia.site.model.Project;
import eluvia.ui.internal.fields.Bindings;

/** One page (tab) of the project editor. */
abstract class EditorPage {

    protected final Bindings bindings;
    protected final Project project;

    EditorPage(Bindings bindings) {
        this.bindings = bindings;
        this.project = bindings.document().project();
    }

    /** The tab's title. */
    abstract String title();

    /** Builds the page's controls into an empty composite. */
    abstract void create(Composite parent);

    /**
     * Shows an object of this page and focuses its field.
     *
     * @return false when the object does not belong on this page
     */
    abstract boolean reveal(EObject object, EStructuralFeature feature);

    /** New results were published for the document (the default ignores them). */
    void resultsChanged() {
    }

    /** Whether {@code object} is {@code root} or inside it. */
    static boolean within(EObject object, EObject root) {
        for (EObject o = object; o != null; o = o.eContainer()) {
            if (o == root) {
                return true;
            }
        }
        return false;
    }
}
