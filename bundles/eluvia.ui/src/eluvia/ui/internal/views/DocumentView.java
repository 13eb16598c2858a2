package eluvia.ui.internal.views;

import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;

import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * A view's content that follows the active project document: it is told when another document
 * becomes active and when new results are published for the active one.
 */
abstract class DocumentView extends Composite {

    protected final OpenDocuments documents;
    private final OpenDocuments.Listener listener;

    DocumentView(Composite parent, OpenDocuments documents) {
        super(parent, SWT.NONE);
        this.documents = documents;
        listener = new OpenDocuments.Listener() {
            @Override
            public void activeChanged(ProjectDocument activeOrNull) {
                if (!isDisposed()) {
                    showDocument(activeOrNull);
                }
            }

            @Override
            public void resultsChanged(ProjectDocument document, ResultState state) {
                if (!isDisposed() && document == documents.active()) {
                    showResults(document, state);
                }
            }
        };
        documents.addListener(listener);
        addDisposeListener(e -> documents.removeListener(listener));
    }

    /** Call at the end of the subclass constructor: shows the current state. */
    protected final void start() {
        ProjectDocument active = documents.active();
        showDocument(active);
    }

    /** Another document is active (or none). The default shows its latest results. */
    protected void showDocument(ProjectDocument documentOrNull) {
        showResults(documentOrNull, documents.results(documentOrNull));
    }

    /**
     * Runs {@code redraw} on the UI thread whenever the user's unit system changes, until this view
     * is disposed (charts and notes are drawn again in the new units).
     */
    protected final void followUnitSystem(Runnable redraw) {
        IPropertyChangeListener l = e -> {
            if (!UiPreferences.UNIT_SYSTEM.equals(e.getProperty()) || isDisposed()) {
                return;
            }
            if (Display.getCurrent() == getDisplay()) {
                redraw.run();
            } else {
                getDisplay().asyncExec(() -> {
                    if (!isDisposed()) {
                        redraw.run();
                    }
                });
            }
        };
        IPreferenceStore store = UiPreferences.store();
        store.addPropertyChangeListener(l);
        addDisposeListener(e -> store.removePropertyChangeListener(l));
    }

    /** New results for the active document (document may be null: nothing open). */
    protected abstract void showResults(ProjectDocument documentOrNull, ResultState state);
}
