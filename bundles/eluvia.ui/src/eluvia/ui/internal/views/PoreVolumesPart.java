package eluvia.ui.internal.views;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.document.OpenDocuments;
import jakarta.annotation.PostConstruct;

/** The Pore volumes view: pore volumes to the cleanup level by criterion, with the well-mixed and plug-flow bounds. */
public final class PoreVolumesPart {

    private PoreVolumesView view;

    @PostConstruct
    public void create(Composite parent, OpenDocuments documents) {
        parent.setLayout(new FillLayout());
        view = new PoreVolumesView(parent, documents);
    }

    @Focus
    public void focus() {
        view.setFocus();
    }
}
