package eluvia.ui.internal.views;

import java.util.List;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;

import eluvia.site.validation.Problem;
import eluvia.site.validation.Severity;
import eluvia.site.validation.SiteValidator;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;

/**
 * The Problems view's content: every validation problem of the active project, errors first,
 * each naming the object, the field, the value, the allowed range and the fix. Validation runs as
 * the user types, {@link #DEBOUNCE_MILLISECONDS} after the last change. A double click (or Enter)
 * shows the object in the editor and puts the cursor in the field.
 */
public final class ProblemsView extends DocumentView {

    /** Quiet time after the last edit before validating again, milliseconds. */
    public static final int DEBOUNCE_MILLISECONDS = 250;

    private final Label summary;
    private final TableViewer viewer;
    private final Runnable validate = this::validateNow;
    private final ProjectDocument.Listener modelListener;
    private ProjectDocument document;
    private List<Problem> problems = List.of();

    public ProblemsView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 0;
        setLayout(layout);
        summary = new Label(this, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        viewer = new TableViewer(this, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL | SWT.SINGLE);
        Table table = viewer.getTable();
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        column(Messages.Problems_severity, 80, p -> p.severity() == Severity.ERROR ? Messages.Problems_error
                : Messages.Problems_warning, p -> p.severity() == Severity.ERROR
                        ? getDisplay().getSystemImage(SWT.ICON_ERROR) : getDisplay().getSystemImage(SWT.ICON_WARNING));
        column(Messages.Problems_object, 180, Problem::objectLabel, null);
        column(Messages.Problems_field, 150, this::fieldName, null);
        column(Messages.Problems_value, 80, Problem::value, null);
        column(Messages.Problems_allowed, 180, Problem::allowedRange, null);
        column(Messages.Problems_fix, 320, Problem::fix, null);
        viewer.addDoubleClickListener(e -> goToSelected());
        table.addListener(SWT.DefaultSelection, e -> goToSelected());
        modelListener = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, Notification n) {
                schedule();
            }
        };
        addDisposeListener(e -> {
            if (document != null) {
                document.removeListener(modelListener);
            }
        });
        start();
    }

    private interface Text {
        String of(Problem p);
    }

    private interface Icon {
        Image of(Problem p);
    }

    private void column(String header, int width, Text text, Icon icon) {
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
        c.getColumn().setText(header);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.of((Problem) element);
            }

            @Override
            public Image getImage(Object element) {
                return icon == null ? null : icon.of((Problem) element);
            }

            @Override
            public String getToolTipText(Object element) {
                return ((Problem) element).message();
            }
        });
    }

    /** The field's name as the editor shows it (from the EMF.Edit item provider), else the feature name. */
    String fieldName(Problem p) {
        if (document != null && p.object() != null && p.feature() != null) {
            Object source = document.adapterFactory().adapt(p.object(), IItemPropertySource.class);
            if (source instanceof IItemPropertySource s) {
                IItemPropertyDescriptor d = s.getPropertyDescriptor(p.object(), p.feature());
                if (d != null && d.getDisplayName(p.object()) != null) {
                    return d.getDisplayName(p.object());
                }
            }
        }
        return p.field();
    }

    @Override
    protected void showDocument(ProjectDocument documentOrNull) {
        if (document != null) {
            document.removeListener(modelListener);
        }
        document = documentOrNull;
        if (document != null) {
            document.addListener(modelListener);
        }
        validateNow();
    }

    @Override
    protected void showResults(ProjectDocument documentOrNull, ResultState state) {
        // the Problems view validates the live model itself; results do not change it
    }

    private void schedule() {
        if (isDisposed()) {
            return;
        }
        getDisplay().timerExec(-1, validate);
        getDisplay().timerExec(DEBOUNCE_MILLISECONDS, validate);
    }

    /** Validates the active project now and shows the problems, errors first. */
    public void validateNow() {
        if (isDisposed()) {
            return;
        }
        getDisplay().timerExec(-1, validate);
        if (document == null) {
            problems = List.of();
            summary.setText(Messages.Problems_noProject);
        } else {
            List<Problem> all = SiteValidator.validate(document.project());
            problems = all.stream().sorted((a, b) -> a.severity().compareTo(b.severity())).toList();
            long errors = problems.stream().filter(p -> p.severity() == Severity.ERROR).count();
            long warnings = problems.size() - errors;
            summary.setText(problems.isEmpty() ? Messages.Problems_none
                    : Messages.bind(Messages.Problems_summary, errors, warnings));
        }
        viewer.setInput(problems);
        layout(true, true);
    }

    /** The problems shown, errors first. */
    public List<Problem> problems() {
        return problems;
    }

    /** The table (tests). */
    public Table table() {
        return viewer.getTable();
    }

    /** Shows the problem at a row in the editor. */
    public boolean goTo(int row) {
        if (document == null || row < 0 || row >= problems.size()) {
            return false;
        }
        Problem p = problems.get(row);
        return documents.reveal(document, p.object(), p.feature());
    }

    private void goToSelected() {
        goTo(viewer.getTable().getSelectionIndex());
    }
}
