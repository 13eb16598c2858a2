package eluvia.ui.internal.handlers;

import java.util.List;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.model.application.ui.MElementContainer;
import org.eclipse.e4.ui.model.application.ui.MUIElement;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.emf.common.util.URI;

import jakarta.inject.Named;

/**
 * Window > Show View > (a view): brings a view back and activates it. The command's parameter
 * {@link #PART_ID} names the view's part.
 *
 * <p>A view closed with its tab's close button stays in the model, not rendered
 * ({@code toBeRendered = false}); it is rendered again in its place. A view taken out of the model
 * altogether is put back as the shipped layout has it ({@link ShippedLayout}), in its stack.
 */
public final class ShowViewHandler {

    /** The command parameter naming the part to show (its element id). */
    public static final String PART_ID = "eluvia.ui.commandparameter.partId";

    @CanExecute
    public boolean canExecute(@Optional @Named(PART_ID) String partId) {
        return partId != null && !partId.isBlank();
    }

    @Execute
    public void execute(@Named(PART_ID) String partId, EPartService parts, EModelService models, MWindow window,
            @Optional @Named(ShippedLayout.MODEL_URI_KEY) URI shippedModel) {
        show(partId, parts, models, window, ShippedLayout.of(shippedModel));
    }

    /**
     * Shows and activates the part with this id in the window.
     *
     * @return the part shown, or null when neither the model nor the shipped layout has it
     */
    static MPart show(String partId, EPartService parts, EModelService models, MWindow window, ShippedLayout shipped) {
        MPart part = parts.findPart(partId);
        if (part == null) {
            MPart original = shipped == null ? null : shipped.view(partId);
            if (original == null) {
                return null;
            }
            part = ShippedLayout.copy(original);
            MElementContainer<MUIElement> home = home(original, models, window);
            if (home != null) {
                home.getChildren().add(indexIn(home, original), part);
            }
        }
        // its stack (and sashes) may have been hidden with the last view in it
        for (MUIElement e = part; e != null && !(e instanceof MWindow); e = e.getParent()) {
            e.setToBeRendered(true);
            e.setVisible(true);
        }
        return parts.showPart(part, PartState.ACTIVATE);
    }

    /** The live container whose id is that of the shipped part's container, or null. */
    @SuppressWarnings("unchecked")
    static MElementContainer<MUIElement> home(MUIElement original, EModelService models, MWindow window) {
        MElementContainer<?> parent = original.getParent();
        if (parent == null || parent.getElementId() == null) {
            return null;
        }
        MUIElement live = models.find(parent.getElementId(), window);
        return live instanceof MElementContainer<?> c ? (MElementContainer<MUIElement>) c : null;
    }

    /** Where in the live container a shipped element goes: after the live ones that precede it in the shipped layout. */
    static int indexIn(MElementContainer<MUIElement> home, MUIElement original) {
        List<?> shippedSiblings = original.getParent().getChildren();
        int index = 0;
        for (Object sibling : shippedSiblings.subList(0, shippedSiblings.indexOf(original))) {
            String id = ((MUIElement) sibling).getElementId();
            for (int i = 0; i < home.getChildren().size(); i++) {
                if (id != null && id.equals(home.getChildren().get(i).getElementId())) {
                    index = Math.max(index, i + 1);
                }
            }
        }
        return Math.min(index, home.getChildren().size());
    }
}
