package eluvia.ui.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

import jakarta.inject.Named;
import org.eclipse.e4.ui.services.IServiceConstants;

/** File > Save: saves the active project editor. */
public final class SaveHandler {

    @CanExecute
    public boolean canExecute(@Named(IServiceConstants.ACTIVE_PART) @org.eclipse.e4.core.di.annotations.Optional MPart part) {
        return part != null && part.isDirty();
    }

    @Execute
    public void execute(EPartService parts, @Named(IServiceConstants.ACTIVE_PART) MPart part) {
        parts.savePart(part, false);
    }
}
