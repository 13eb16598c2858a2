package eluvia.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.workbench.IWorkbench;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

/** File > Exit: asks to save dirty editors, then closes the workbench. */
public final class QuitHandler {

    @Execute
    public void execute(IWorkbench workbench, EPartService parts) {
        if (parts.saveAll(true)) {
            workbench.close();
        }
    }
}
