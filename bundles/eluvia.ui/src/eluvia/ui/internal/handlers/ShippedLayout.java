package eluvia.ui.internal.handlers;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.MElementContainer;
import org.eclipse.e4.ui.model.application.ui.MUIElement;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/**
 * The workbench window as the application model ships it: the views it lays out and where, read
 * from the model file the workbench started from (never the user's saved layout). Show View uses
 * it to list every view and to put back a view that was taken out of the model; Reset Layout to
 * restore the shipped layout.
 */
final class ShippedLayout {

    /**
     * Context key under which the workbench keeps the URI of the application model it started
     * from ({@code E4Workbench.INITIAL_WORKBENCH_MODEL_URI}, named here to keep clear of the
     * platform's internal package).
     */
    static final String MODEL_URI_KEY = "initialWorkbenchModelURI";

    private static final Map<URI, ShippedLayout> LOADED = new ConcurrentHashMap<>();

    private final MWindow window;

    private ShippedLayout(MWindow window) {
        this.window = window;
    }

    /**
     * The shipped layout of the application model at {@code uri} (read once), or null when there
     * is no such model or it has no window.
     */
    static ShippedLayout of(URI uri) {
        if (uri == null) {
            return null;
        }
        return LOADED.computeIfAbsent(uri, u -> {
            ResourceSet set = new ResourceSetImpl();
            set.getResourceFactoryRegistry().getExtensionToFactoryMap().put(Resource.Factory.Registry.DEFAULT_EXTENSION,
                    new XMIResourceFactoryImpl());
            try {
                Resource r = set.getResource(u, true);
                if (!r.getContents().isEmpty() && r.getContents().get(0) instanceof MApplication app
                        && !app.getChildren().isEmpty()) {
                    return new ShippedLayout(app.getChildren().get(0));
                }
            } catch (RuntimeException unreadable) {
                // no shipped layout to go back to: Show View lists the views in the model as it is
            }
            return null;
        });
    }

    /** Every view (part) of the shipped window, in layout order. */
    List<MPart> views() {
        List<MPart> out = new ArrayList<>();
        for (EObject o : (Iterable<EObject>) () -> EcoreUtil.getAllContents(((EObject) window).eContents())) {
            if (o instanceof MPart p && p.getElementId() != null) {
                out.add(p);
            }
        }
        return out;
    }

    /** The shipped view with this id, or null. */
    MPart view(String partId) {
        for (MPart p : views()) {
            if (p.getElementId().equals(partId)) {
                return p;
            }
        }
        return null;
    }

    /** Every element of the shipped window's layout with an id, parents before their children. */
    List<MUIElement> elements() {
        List<MUIElement> out = new ArrayList<>();
        for (MUIElement child : window.getChildren()) {
            collect(child, out);
        }
        return out;
    }

    private static void collect(MUIElement e, List<MUIElement> out) {
        if (e.getElementId() != null) {
            out.add(e);
        }
        if (e instanceof MElementContainer<?> c) {
            for (Object child : c.getChildren()) {
                collect((MUIElement) child, out);
            }
        }
    }

    /** A fresh copy of a shipped view, to put into the live model. */
    static MPart copy(MPart shipped) {
        return (MPart) EcoreUtil.copy((EObject) shipped);
    }
}
