package eluvia.ui;

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
        title.setText("Eluvia: soil flushing and excavation design");
        title.setFont(org.eclipse.jface.resource.JFaceResources.getHeaderFont());
        Label body = new Label(parent, SWT.WRAP);
        body.setText("Open a project with File > Open Project... (Ctrl+O), or try File > Open Example Project "
                + "(an invented site with invented numbers).\n\n"
                + "For each flushing design Eluvia estimates the pore volumes of water needed to bring the zone "
                + "down to its cleanup level by each criterion (effluent leaving the layer, mean residual and "
                + "maximum residual in the layer), how long that takes and how much water must be captured and "
                + "treated.");
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false);
        gd.widthHint = 600;
        body.setLayoutData(gd);
    }
}
