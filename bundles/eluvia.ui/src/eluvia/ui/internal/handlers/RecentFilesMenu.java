package eluvia.ui.internal.handlers;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.e4.ui.di.AboutToShow;
import org.eclipse.e4.ui.model.application.ui.menu.MDirectMenuItem;
import org.eclipse.e4.ui.model.application.ui.menu.MMenuElement;
import org.eclipse.e4.ui.workbench.modeling.EModelService;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.preferences.UiPreferences;

/** File > Open Recent: the recently opened project files that still exist, newest first. */
public final class RecentFilesMenu {

    /** Transient-data key of a menu item's file. */
    public static final String FILE = "eluvia.ui.recentFile";

    @AboutToShow
    public void aboutToShow(List<MMenuElement> items, EModelService models) {
        int n = 0;
        for (Path p : UiPreferences.recentFiles()) {
            if (!Files.isRegularFile(p)) {
                continue;
            }
            n++;
            MDirectMenuItem item = models.createModelElement(MDirectMenuItem.class);
            item.setElementId("eluvia.ui.menuitem.recent." + n);
            item.setLabel((n < 10 ? "&" + n + " " : "") + p.getFileName() + "  \u2013  " + p.getParent());
            item.setTooltip(p.toString());
            item.setContributionURI("bundleclass://eluvia.ui/" + OpenRecentHandler.class.getName());
            item.getTransientData().put(FILE, p.toString());
            items.add(item);
        }
        if (n == 0) {
            MDirectMenuItem none = models.createModelElement(MDirectMenuItem.class);
            none.setElementId("eluvia.ui.menuitem.recent.none");
            none.setLabel(Messages.Recent_none);
            none.setEnabled(false);
            none.setContributionURI("bundleclass://eluvia.ui/" + OpenRecentHandler.class.getName());
            items.add(none);
        }
    }
}
