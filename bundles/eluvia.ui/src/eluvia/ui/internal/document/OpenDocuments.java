package eluvia.ui.internal.document;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.e4.core.di.annotations.Creatable;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

import jakarta.inject.Singleton;

/**
 * The open project documents of the workbench and which of them is active (the one whose editor
 * was used last). Views follow the active document: they show its problems and its results. Each
 * editor registers its document with a {@link Navigator} so that a view can bring an object into
 * view; result producers publish here what the views show.
 *
 * <p>One instance per workbench (an injectable singleton); used on the UI thread only.
 */
@Creatable
@Singleton
public final class OpenDocuments {

    /** Observers of the open documents. */
    public interface Listener {
        /** Another document became active, or none is (null). */
        default void activeChanged(ProjectDocument activeOrNull) {
        }

        /** New results were published for a document. */
        default void resultsChanged(ProjectDocument document, ResultState state) {
        }
    }

    private final Map<ProjectDocument, Navigator> navigators = new LinkedHashMap<>();
    private final Map<ProjectDocument, ResultState> results = new LinkedHashMap<>();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private ProjectDocument active;

    /** Registers a document with the editor that shows it, and makes it active. */
    public void register(ProjectDocument document, Navigator navigator) {
        navigators.put(document, navigator);
        activate(document);
    }

    /** Forgets a closed document; another one becomes active if any is left. */
    public void unregister(ProjectDocument document) {
        navigators.remove(document);
        results.remove(document);
        if (active == document) {
            // the last one opened of those left becomes active; none left is news too (views clear)
            List<ProjectDocument> left = new ArrayList<>(navigators.keySet());
            active = left.isEmpty() ? null : left.get(left.size() - 1);
            for (Listener l : listeners) {
                l.activeChanged(active);
            }
        }
    }

    /** Makes a document the active one (its editor was activated). */
    public void activate(ProjectDocument document) {
        if (document == active) {
            return;
        }
        active = document;
        for (Listener l : listeners) {
            l.activeChanged(document);
        }
    }

    /** The active document, or null when no project is open. */
    public ProjectDocument active() {
        return active;
    }

    /** Every open document, in the order they were opened. */
    public List<ProjectDocument> documents() {
        return List.copyOf(navigators.keySet());
    }

    /**
     * Shows an object of a document in its editor and focuses the field.
     *
     * @return false when the document is not open or its editor has no place for the object
     */
    public boolean reveal(ProjectDocument document, EObject object, EStructuralFeature feature) {
        Navigator n = navigators.get(document);
        if (n == null) {
            return false;
        }
        activate(document);
        return n.reveal(object, feature);
    }

    /** Publishes the results of a document to the views. */
    public void publish(ProjectDocument document, ResultState state) {
        if (!navigators.containsKey(document)) {
            return;
        }
        results.put(document, state);
        navigators.get(document).resultsChanged(state);
        for (Listener l : listeners) {
            l.resultsChanged(document, state);
        }
    }

    /** The latest results of a document. */
    public ResultState results(ProjectDocument document) {
        ResultState s = document == null ? null : results.get(document);
        return s == null ? ResultState.none() : s;
    }

    public void addListener(Listener listener) {
        listeners.add(listener);
    }

    public void removeListener(Listener listener) {
        listeners.remove(listener);
    }
}
