package eluvia.ui.internal.editor;

import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;

/** Layout helpers shared by the editor's pages, so that every page looks alike. */
final class Forms {

    private Forms() {
    }

    /** A two-column form (label, field) spanning its parent's columns. */
    static Composite form(Composite parent, int span) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.horizontalSpacing = 12;
        layout.verticalSpacing = 6;
        layout.marginWidth = 4;
        c.setLayout(layout);
        c.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, span, 1));
        return c;
    }

    /** A heading over a group of fields or a table. */
    static Label heading(Composite parent, String text, int span) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(text);
        l.setFont(JFaceResources.getBannerFont());
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false, span, 1);
        gd.verticalIndent = 8;
        l.setLayoutData(gd);
        return l;
    }

    /** A wrapped note in the form's text colour, spanning the given columns. */
    static Label note(Composite parent, String text, int span) {
        Label l = new Label(parent, SWT.WRAP);
        l.setText(text);
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false, span, 1);
        gd.widthHint = 420;
        l.setLayoutData(gd);
        return l;
    }

    /** A caution box: a wrapped text on a pale amber background. */
    static Composite caution(Composite parent, String text, Color background, int span) {
        Composite box = new Composite(parent, SWT.NONE);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 8;
        layout.marginHeight = 6;
        box.setLayout(layout);
        box.setBackground(background);
        box.setData("eluvia.role", "caution");
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false, span, 1);
        box.setLayoutData(gd);
        Label l = new Label(box, SWT.WRAP);
        l.setText("\u26a0 " + text);
        l.setBackground(background);
        GridData ld = new GridData(SWT.FILL, SWT.TOP, true, false);
        ld.widthHint = 420;
        l.setLayoutData(ld);
        return box;
    }

    /** A vertically and horizontally scrolled area whose content never gets squeezed below its preferred size. */
    static ScrolledComposite scrolled(Composite parent) {
        ScrolledComposite sc = new ScrolledComposite(parent, SWT.V_SCROLL | SWT.H_SCROLL);
        sc.setExpandHorizontal(true);
        sc.setExpandVertical(true);
        sc.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        return sc;
    }

    /** Sets a scrolled area's content and its minimum size from the content's preferred size. */
    static void fit(ScrolledComposite sc, Control content) {
        sc.setContent(content);
        sc.setMinSize(content.computeSize(SWT.DEFAULT, SWT.DEFAULT));
    }

    /** Recomputes a scrolled area's minimum size after its content changed. */
    static void refit(ScrolledComposite sc) {
        Control content = sc.getContent();
        if (content != null && !content.isDisposed()) {
            if (content instanceof Composite c) {
                c.layout(true, true);
            }
            sc.setMinSize(content.computeSize(SWT.DEFAULT, SWT.DEFAULT));
        }
    }
}
