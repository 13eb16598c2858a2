package eluvia.ui.internal;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import eluvia.design.Cautions;
import jakarta.annotation.PostConstruct;

/** The Cautions view: the cautions that apply to every result, always at hand. */
public final class CautionsPart {

    @PostConstruct
    public void createControls(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        for (String c : Cautions.all()) {
            Label l = new Label(parent, SWT.WRAP);
            l.setText("\u26a0 " + c);
            GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false);
            gd.widthHint = 250;
            l.setLayoutData(gd);
        }
    }
}
