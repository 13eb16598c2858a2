package eluvia.ui.internal.handlers;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.AboutToShow;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.commands.MCommand;
import org.eclipse.e4.ui.model.application.commands.MParameter;
import org.eclipse.e4.ui.model.application.descriptor.basic.MPartDescriptor;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.ui.model.application.ui.menu.MHandledMenuItem;
import org.eclipse.e4.ui.model.application.ui.menu.MMenuElement;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.emf.common.util.URI;

import jakarta.inject.Named;

/**
 * Window > Show View: one item for every view of the workbench (the result views, Problems,
 * Cautions, Start), in the shipped layout's order, each running the Show View command with the
 * view's part id. Views the shipped layout does not have but the window does are listed after
 * them; editors (parts made from a part descriptor) are not views and are left out.
 */
public final class ShowViewMenu {

    /** The Show View command's id in the application model. */
    public static final String COMMAND_ID = "eluvia.app.command.showView";

    @AboutToShow
    public void aboutToShow(List<MMenuElement> items, EModelService models, MApplication app, MWindow window,
            @Optional @Named(ShippedLayout.MODEL_URI_KEY) URI shippedModel) {
        MCommand command = null;
        for (MCommand c : app.getCommands()) {
            if (COMMAND_ID.equals(c.getElementId())) {
                command = c;
            }
        }
        if (command == null) {
            return;
        }
        for (MPart view : views(models, app, window, ShippedLayout.of(shippedModel))) {
            MHandledMenuItem item = models.createModelElement(MHandledMenuItem.class);
            item.setElementId("eluvia.ui.menuitem.showView." + view.getElementId());
            item.setLabel(EditMenuLabels.mnemonicSafe(view.getLabel() == null ? view.getElementId() : view.getLabel()));
            item.setTooltip(view.getTooltip());
            item.setCommand(command);
            MParameter p = models.createModelElement(MParameter.class);
            p.setElementId("eluvia.ui.parameter.showView." + view.getElementId());
            p.setName(ShowViewHandler.PART_ID);
            p.setValue(view.getElementId());
            item.getParameters().add(p);
            items.add(item);
        }
    }

    /** The views listed: the shipped layout's, then the window's others; never an editor. */
    static List<MPart> views(EModelService models, MApplication app, MWindow window, ShippedLayout shipped) {
        Map<String, MPart> byId = new LinkedHashMap<>();
        if (shipped != null) {
            for (MPart p : shipped.views()) {
                byId.putIfAbsent(p.getElementId(), p);
            }
        }
        List<String> editors = new ArrayList<>();
        for (MPartDescriptor d : app.getDescriptors()) {
            editors.add(d.getElementId());
        }
        for (MPart p : models.findElements(window, null, MPart.class)) {
            if (p.getElementId() != null && !editors.contains(p.getElementId())) {
                byId.putIfAbsent(p.getElementId(), p);
            }
        }
        return List.copyOf(byId.values());
    }
}
