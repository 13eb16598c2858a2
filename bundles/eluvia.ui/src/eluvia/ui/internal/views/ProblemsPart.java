package eluvia.ui.internal.views;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.document.OpenDocuments;
import jakarta.annotation.PostConstruct;

/** The Problems view: the validation problems of the active project. */
public final class ProblemsPart {

    private ProblemsView view;

    @PostConstruct
    public void create(Composite parent, OpenDocuments documents) {
        parent.setLayout(new FillLayout());
        view = new ProblemsView(parent, documents);
    }

    @Focus
    public void focus() {
        view.table().setFocus();
    }
}
