package eluvia.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.window.Window;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.widgets.Shell;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.wizards.ExportWizard;

/** File > Export Design Package...: the export wizard for the active project. */
public final class ExportHandler {

    @CanExecute
    public boolean canExecute(OpenDocuments documents) {
        return documents.active() != null;
    }

    @Execute
    public void execute(Shell shell, OpenDocuments documents) {
        if (documents.active() == null) {
            return;
        }
        ExportWizard wizard = new ExportWizard(documents.active(), documents.results(documents.active()).run());
        if (new WizardDialog(shell, wizard).open() == Window.OK && wizard.written() != null) {
            var files = wizard.written().files();
            String where = files.isEmpty() ? "" : files.get(0).getParent().toString();
            if (wizard.written().verificationPassed()) {
                MessageDialog.openInformation(shell, Messages.Export_title, Messages.bind(Messages.Export_done, files.size(),
                        where));
            } else {
                MessageDialog.openWarning(shell, Messages.Export_title, Messages.bind(Messages.Export_doneVerificationFailed,
                        files.size(), where));
            }
        }
    }
}
