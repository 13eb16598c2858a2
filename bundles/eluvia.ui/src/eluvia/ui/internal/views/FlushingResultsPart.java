package eluvia.ui.internal.views;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.document.OpenDocuments;
import jakarta.annotation.PostConstruct;

/** The Flushing results view: pore volumes, durations and water of the active project's designs. */
public final class FlushingResultsPart {

    private FlushingResultsView view;

    @PostConstruct
    public void create(Composite parent, OpenDocuments documents) {
        parent.setLayout(new FillLayout());
        view = new FlushingResultsView(parent, documents);
    }

    @Focus
    public void focus() {
        view.setFocus();
    }
}
