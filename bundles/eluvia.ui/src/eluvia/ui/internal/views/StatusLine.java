package eluvia.ui.internal.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ResultState;

/** The first line of a result view: what it shows and whether results are being computed. */
final class StatusLine extends Composite {

    private final Label text;
    private final ProgressBar busy;

    StatusLine(Composite parent) {
        super(parent, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.marginWidth = 0;
        layout.marginHeight = 0;
        setLayout(layout);
        setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        text = new Label(this, SWT.WRAP);
        GridData td = new GridData(SWT.FILL, SWT.CENTER, true, false);
        td.widthHint = 300;
        text.setLayoutData(td);
        busy = new ProgressBar(this, SWT.INDETERMINATE | SWT.HORIZONTAL);
        GridData bd = new GridData(SWT.END, SWT.CENTER, false, false);
        bd.widthHint = 120;
        busy.setLayoutData(bd);
        busy.setVisible(false);
    }

    /** Shows the state of a computation; returns true when there is a run to show. */
    boolean show(ResultState state, boolean hasDocument) {
        busy.setVisible(hasDocument && state.status() == ResultState.Status.COMPUTING);
        if (!hasDocument) {
            text.setText(Messages.Results_noProject);
            return false;
        }
        switch (state.status()) {
        case COMPUTING -> text.setText(state.run() == null ? Messages.Results_computing : Messages.Results_recomputing);
        case READY -> text.setText(Messages.Results_ready);
        case INPUT_ERRORS -> text.setText(Messages.bind(Messages.Results_inputErrors, state.errors().size()));
        case FAILED -> text.setText(Messages.bind(Messages.Results_failed, state.failure()));
        default -> text.setText("");
        }
        getParent().layout(true, true);
        return state.run() != null && (state.status() == ResultState.Status.READY
                || state.status() == ResultState.Status.COMPUTING);
    }

    /** The status text (tests). */
    String text() {
        return text.getText();
    }
}
