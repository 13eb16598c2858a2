package eluvia.ui.internal.handlers;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;

import eluvia.site.files.ProjectFiles;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;

/** File > Save As...: writes the active project to another file, which the editor then shows. */
public final class SaveAsHandler {

    @CanExecute
    public boolean canExecute(OpenDocuments documents) {
        return documents.active() != null;
    }

    @Execute
    public void execute(Shell shell, OpenDocuments documents) {
        ProjectDocument d = documents.active();
        if (d == null) {
            return;
        }
        FileDialog dialog = new FileDialog(shell, SWT.SAVE);
        dialog.setText(Messages.SaveAs_title);
        dialog.setFilterExtensions(new String[] { "*." + ProjectFiles.EXTENSION });
        dialog.setFilterNames(new String[] { Messages.Open_filterName });
        dialog.setFilterPath(d.file().getParent().toString());
        dialog.setFileName(d.file().getFileName().toString());
        dialog.setOverwrite(true);
        String chosen = dialog.open();
        if (chosen == null) {
            return;
        }
        Path target = Path.of(chosen.endsWith("." + ProjectFiles.EXTENSION) ? chosen : chosen + "." + ProjectFiles.EXTENSION);
        try {
            d.saveAs(target);
        } catch (IOException | RuntimeException e) {
            MessageDialog.openError(shell, Messages.Editor_saveFailedTitle, Messages.bind(Messages.Editor_saveFailed, target,
                    e.getMessage()));
        }
    }
}
