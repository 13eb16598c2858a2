package eluvia.ui.internal.handlers;

import java.nio.file.Path;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.jface.window.Window;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.widgets.Shell;

import eluvia.ui.ProjectEditors;
import eluvia.ui.internal.wizards.NewProjectWizard;

/** File > New Project...: runs the New Project wizard and opens the project it creates. */
public final class NewProjectHandler {

    @Execute
    public void execute(Shell shell, EPartService parts, EModelService models, MApplication app) {
        NewProjectWizard wizard = new NewProjectWizard(Path.of(System.getProperty("user.home"), "Eluvia projects"));
        if (new WizardDialog(shell, wizard).open() == Window.OK && wizard.created() != null) {
            ProjectEditors.open(wizard.created(), parts, models, app);
        }
    }
}
