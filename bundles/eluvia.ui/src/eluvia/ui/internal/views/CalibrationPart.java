package eluvia.ui.internal.views;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.document.OpenDocuments;
import jakarta.annotation.PostConstruct;

/** The Calibration view: column tests fitted by the transport bundle's fitter, accepted into the project. */
public final class CalibrationPart {

    private CalibrationView view;

    @PostConstruct
    public void create(Composite parent, OpenDocuments documents) {
        parent.setLayout(new FillLayout());
        view = new CalibrationView(parent, documents);
    }

    @Focus
    public void focus() {
        view.setFocus();
    }
}
