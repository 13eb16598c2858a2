package eluvia.ui.internal.views;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.document.OpenDocuments;
import jakarta.annotation.PostConstruct;

/** The Uncertainty view: Monte Carlo over chosen inputs of the active project, histograms and tornado. */
public final class UncertaintyPart {

    private UncertaintyView view;

    @PostConstruct
    public void create(Composite parent, OpenDocuments documents) {
        parent.setLayout(new FillLayout());
        view = new UncertaintyView(parent, documents);
    }

    @Focus
    public void focus() {
        view.setFocus();
    }
}
