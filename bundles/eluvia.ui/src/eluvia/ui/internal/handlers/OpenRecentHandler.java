package eluvia.ui.internal.handlers;

import java.nio.file.Path;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.menu.MDirectMenuItem;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

import eluvia.ui.ProjectEditors;

/** Opens the file of an Open Recent menu item. */
public final class OpenRecentHandler {

    @CanExecute
    public boolean canExecute(MDirectMenuItem item) {
        return item.getTransientData().get(RecentFilesMenu.FILE) != null;
    }

    @Execute
    public void execute(MDirectMenuItem item, EPartService parts, EModelService models, MApplication app) {
        Object file = item.getTransientData().get(RecentFilesMenu.FILE);
        if (file != null) {
            ProjectEditors.open(Path.of(file.toString()), parts, models, app);
        }
    }
}
