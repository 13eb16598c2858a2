package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.layout.RowLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.ObjectTable;

/**
 * A page with a table of objects (several rows) above a form with the details of the selected
 * one. Add and Remove go through the command stack; Remove uses EMF.Edit's delete command, which
 * also clears every reference to the removed object.
 *
 * @param <T> the row type
 */
abstract class MasterDetailPage<T extends EObject> extends EditorPage {

    private ObjectTable<T> table;
    private ScrolledComposite detailsArea;
    private Composite details;
    private T shown;
    private boolean rebuildPending;
    private final List<ObjectTable<?>> nestedTables = new ArrayList<>();

    MasterDetailPage(Bindings bindings) {
        super(bindings);
    }

    /** The object holding the list. */
    abstract EObject owner();

    /** The containment reference of the list. */
    abstract EReference list();

    /** The rows. */
    abstract List<T> rows();

    /** Defines the table's columns (read-only summary columns or editable ones). */
    abstract void columns(ObjectTable<T> table);

    /** A new row to add, with its initial values. */
    abstract T newRow();

    /** Builds the details form of a row into a two-column composite. */
    abstract void details(Composite form, T row);

    /** Called by details forms for a nested table, so that navigation reaches its rows. */
    protected <X extends EObject> ObjectTable<X> nested(ObjectTable<X> nestedTable) {
        nestedTables.add(nestedTable);
        return nestedTable;
    }

    /**
     * A heading, Add and Remove buttons and an editable table for a list inside the shown row
     * (e.g. the samples of a location); navigation reaches its rows.
     *
     * @param factory makes the object Add appends
     * @param columns defines the table's columns
     */
    protected <X extends EObject> ObjectTable<X> nestedList(Composite form, String heading, EObject listOwner,
            EReference reference, java.util.function.Supplier<X> factory,
            java.util.function.Consumer<ObjectTable<X>> columns) {
        return nested(ListEditor.create(form, bindings, heading, listOwner, reference, factory, columns));
    }

    /** Extra buttons beside Add and Remove (none by default). */
    void extraButtons(Composite bar) {
    }

    /** The selected row, or null. */
    protected T selected() {
        return table == null ? null : table.selected();
    }

    @Override
    void create(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));

        Composite top = new Composite(sash, SWT.NONE);
        GridLayout topLayout = new GridLayout(1, false);
        topLayout.marginWidth = 0;
        top.setLayout(topLayout);
        Composite bar = new Composite(top, SWT.NONE);
        RowLayout row = new RowLayout(SWT.HORIZONTAL);
        row.marginLeft = 0;
        bar.setLayout(row);
        Button add = new Button(bar, SWT.PUSH);
        add.setText(Messages.Editor_add);
        Button remove = new Button(bar, SWT.PUSH);
        remove.setText(Messages.Editor_remove);
        extraButtons(bar);
        table = new ObjectTable<>(top, bindings, this::rows, 5);
        columns(table);
        table.build();

        Composite bottom = new Composite(sash, SWT.NONE);
        GridLayout bottomLayout = new GridLayout(1, false);
        bottomLayout.marginWidth = 0;
        bottom.setLayout(bottomLayout);
        detailsArea = Forms.scrolled(bottom);
        sash.setWeights(30, 70);

        add.addListener(SWT.Selection, e -> {
            T created = newRow();
            Command c = AddCommand.create(bindings.document().domain(), owner(), list(), created);
            if (bindings.execute(c)) {
                table.refresh();
                table.select(created);
                showDetails(created);
            }
        });
        remove.addListener(SWT.Selection, e -> {
            T chosen = table.selected();
            if (chosen != null) {
                bindings.execute(DeleteCommand.create(bindings.document().domain(), List.of(chosen)));
            }
        });
        table.viewer().addSelectionChangedListener(e -> showDetails(table.selected()));

        ProjectDocument.Listener structural = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, Notification n) {
                int t = n.getEventType();
                if (t == Notification.ADD || t == Notification.ADD_MANY || t == Notification.REMOVE
                        || t == Notification.REMOVE_MANY || t == Notification.MOVE) {
                    scheduleRebuild();
                }
            }
        };
        bindings.document().addListener(structural);
        parent.addDisposeListener(e -> bindings.document().removeListener(structural));

        List<T> rows = rows();
        if (!rows.isEmpty()) {
            table.select(rows.get(0));
        }
        showDetails(rows.isEmpty() ? null : rows.get(0));
    }

    private void scheduleRebuild() {
        if (rebuildPending || detailsArea.isDisposed()) {
            return;
        }
        rebuildPending = true;
        detailsArea.getDisplay().asyncExec(() -> {
            rebuildPending = false;
            if (detailsArea.isDisposed()) {
                return;
            }
            table.refresh();
            T keep = shown != null && rows().contains(shown) ? shown : null;
            if (keep == null && !rows().isEmpty()) {
                keep = rows().get(0);
                table.select(keep);
            }
            rebuild(keep);
        });
    }

    private void showDetails(T row) {
        if (row == shown && details != null && !details.isDisposed()) {
            return;
        }
        rebuild(row);
    }

    private void rebuild(T row) {
        shown = row;
        nestedTables.clear();
        if (details != null && !details.isDisposed()) {
            details.dispose();
        }
        details = new Composite(detailsArea, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.horizontalSpacing = 12;
        layout.verticalSpacing = 6;
        details.setLayout(layout);
        if (row == null) {
            Label l = new Label(details, SWT.WRAP);
            l.setText(Messages.Editor_nothingSelected);
        } else {
            details(details, row);
        }
        Forms.fit(detailsArea, details);
        bindings.messages().prune();
    }

    @Override
    boolean reveal(EObject object, EStructuralFeature feature) {
        T row = null;
        for (T r : rows()) {
            if (within(object, r)) {
                row = r;
                break;
            }
        }
        if (row == null) {
            if (object == owner() && feature == list()) {
                table.table().setFocus();
                return true;
            }
            return false;
        }
        table.select(row);
        showDetails(row);
        Control c = feature == null ? null : bindings.controlFor(object, feature);
        if (c != null) {
            detailsArea.showControl(c);
            c.setFocus();
            if (c instanceof org.eclipse.swt.widgets.Text t) {
                t.selectAll();
            }
            return true;
        }
        for (ObjectTable<?> nestedTable : nestedTables) {
            if (revealNested(nestedTable, object, feature)) {
                detailsArea.showControl(nestedTable.table());
                return true;
            }
        }
        if (object == row && feature != null && table.shows(feature)) {
            return table.reveal(row, feature);
        }
        table.table().setFocus();
        return true;
    }

    @SuppressWarnings("unchecked")
    private static <X extends EObject> boolean revealNested(ObjectTable<X> t, EObject object, EStructuralFeature feature) {
        try {
            return t.reveal((X) object, feature);
        } catch (ClassCastException e) {
            return false;
        }
    }
}
