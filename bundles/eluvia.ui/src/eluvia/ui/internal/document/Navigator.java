package eluvia.ui.internal.document;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

/** An editor that can show a model object and put the keyboard focus on one of its fields. */
public interface Navigator {

    /**
     * Brings the object into view (its page, its row) and focuses the field of the feature.
     *
     * @param feature the field to focus; null to show the object only
     * @return false when the editor has no place for the object
     */
    boolean reveal(EObject object, EStructuralFeature feature);

    /** New results were published for the editor's document (pages that show results follow them). */
    default void resultsChanged(ResultState state) {
    }
}
