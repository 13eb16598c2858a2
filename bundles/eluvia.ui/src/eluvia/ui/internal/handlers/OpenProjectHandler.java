package eluvia.ui.internal.handlers;

import java.nio.file.Path;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;

import eluvia.site.files.ProjectFiles;
import eluvia.ui.ProjectEditors;
import eluvia.ui.internal.Messages;

/** File > Open Project...: picks a {@code .eluvia} file and opens it in a project editor. */
public final class OpenProjectHandler {

    @Execute
    public void execute(Shell shell, EPartService parts, EModelService models, MApplication app) {
        FileDialog dialog = new FileDialog(shell, SWT.OPEN);
        dialog.setText(Messages.Open_title);
        dialog.setFilterExtensions(new String[] { "*." + ProjectFiles.EXTENSION, "*" });
        dialog.setFilterNames(new String[] { Messages.Open_filterName, Messages.Open_allFiles });
        String chosen = dialog.open();
        if (chosen != null) {
            ProjectEditors.open(Path.of(chosen), parts, models, app);
        }
    }
}
