package eluvia.ui.internal;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import jakarta.annotation.PostConstruct;

/** The Start page shown before any project is open: what the product does and how to begin. */
public final class WelcomePart {

    @PostConstruct
    public void createControls(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        Label title = new Label(parent, SWT.NONE);
        title.setText(Messages.Welcome_title);
        title.setFont(org.eclipse.jface.resource.JFaceResources.getHeaderFont());
        Label body = new Label(parent, SWT.WRAP);
        body.setText(Messages.Welcome_body);
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false);
        gd.widthHint = 600;
        body.setLayoutData(gd);
    }
}
