package eluvia.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.model.application.ui.MElementContainer;
import org.eclipse.e4.ui.model.application.ui.MUIElement;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.emf.common.util.URI;

import jakarta.inject.Named;

/**
 * Window > Reset Layout: the window's views and sashes as the application model ships them
 * ({@link ShippedLayout}): every shipped view shown again (or hidden, as shipped), each in its
 * stack, and the sash weights of the shipped layout. Open editors stay open where they are.
 *
 * <p>Views cannot be dragged to another stack in this workbench (it has no drag-and-drop add-on),
 * so a view is never moved; one taken out of the model is put back in its shipped stack.
 */
public final class ResetLayoutHandler {

    @CanExecute
    public boolean canExecute(@Optional @Named(ShippedLayout.MODEL_URI_KEY) URI shippedModel) {
        return ShippedLayout.of(shippedModel) != null;
    }

    @Execute
    public void execute(EModelService models, MWindow window,
            @Optional @Named(ShippedLayout.MODEL_URI_KEY) URI shippedModel) {
        ShippedLayout shipped = ShippedLayout.of(shippedModel);
        if (shipped != null) {
            reset(shipped, models, window);
        }
    }

    static void reset(ShippedLayout shipped, EModelService models, MWindow window) {
        for (MUIElement original : shipped.elements()) {
            MUIElement live = models.find(original.getElementId(), window);
            if (live == null && original instanceof MPart view) {
                MElementContainer<MUIElement> home = ShowViewHandler.home(view, models, window);
                if (home == null) {
                    continue;
                }
                live = ShippedLayout.copy(view);
                home.getChildren().add(ShowViewHandler.indexIn(home, view), live);
            }
            if (live == null) {
                continue;
            }
            live.setContainerData(original.getContainerData());
            live.setVisible(original.isVisible());
            live.setToBeRendered(original.isToBeRendered());
        }
        // a stack whose selected view was closed shows its first view again
        for (MPartStack stack : models.findElements(window, null, MPartStack.class)) {
            MUIElement selected = stack.getSelectedElement();
            if (selected == null || !selected.isToBeRendered()) {
                for (var child : stack.getChildren()) {
                    if (child.isToBeRendered() && child.isVisible()) {
                        stack.setSelectedElement(child);
                        break;
                    }
                }
            }
        }
    }
}
