package eluvia.ui.internal.editor;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;

/** The sampling page's CSV import of sampling locations and samples. */
final class SampleImport {

    private final Bindings bindings;

    SampleImport(Bindings bindings) {
        this.bindings = bindings;
    }

    /** Adds the Import button to a button bar. */
    Button button(Composite bar) {
        Button b = new Button(bar, SWT.PUSH);
        b.setText(Messages.Sampling_import);
        b.addListener(SWT.Selection, e -> MessageDialog.openInformation(bar.getShell(), Messages.Sampling_importTitle,
                Messages.Sampling_importUnavailable));
        return b;
    }

    Bindings bindings() {
        return bindings;
    }
}
