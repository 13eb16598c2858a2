package eluvia.ui.internal.fields;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import java.util.function.Supplier;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.CheckboxCellEditor;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.ColumnViewerEditor;
import org.eclipse.jface.viewers.ColumnViewerEditorActivationStrategy;
import org.eclipse.jface.viewers.ComboBoxCellEditor;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.TableViewerEditor;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;

/**
 * A table of model objects, one row each, with optional in-place editing of cells. Edits go
 * through the document's command stack; a number that does not parse or is out of range is
 * refused and explained in the editor's message line (naming the column, the row and the allowed
 * range). The table refreshes itself after every model change.
 *
 * @param <T> the row type
 */
public final class ObjectTable<T extends EObject> {

    private final Bindings bindings;
    private final Supplier<List<T>> rows;
    private final TableViewer viewer;
    private final List<Column<T>> columns = new ArrayList<>();
    private final ProjectDocument.Listener listener;
    private boolean refreshPending;

    /** One column: its header and how a row shows in it; {@code feature} is set for editable columns. */
    private record Column<T>(String header, Function<T, String> text, EStructuralFeature feature) {
    }

    /**
     * @param rows the rows to show, asked again at every refresh
     * @param heightRows the preferred height in rows
     */
    public ObjectTable(Composite parent, Bindings bindings, Supplier<List<T>> rows, int heightRows) {
        this.bindings = bindings;
        this.rows = rows;
        viewer = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        Table table = viewer.getTable();
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        GridData gd = new GridData(SWT.FILL, SWT.FILL, true, true);
        gd.heightHint = table.getItemHeight() * heightRows + table.getHeaderHeight();
        gd.widthHint = 200;
        table.setLayoutData(gd);
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        ColumnViewerEditorActivationStrategy activation = new ColumnViewerEditorActivationStrategy(viewer);
        TableViewerEditor.create(viewer, activation, ColumnViewerEditor.TABBING_HORIZONTAL
                | ColumnViewerEditor.TABBING_MOVE_TO_ROW_NEIGHBOR | ColumnViewerEditor.KEYBOARD_ACTIVATION);
        listener = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, Notification n) {
                scheduleRefresh();
            }
        };
        bindings.document().addListener(listener);
        table.addDisposeListener(e -> bindings.document().removeListener(listener));
    }

    /** A read-only column. */
    public ObjectTable<T> column(String header, Function<T, String> text) {
        addColumn(new Column<>(header, text, null), null);
        return this;
    }

    /** An editable number column for a double attribute; the header is the spec's label with unit. */
    public ObjectTable<T> number(EAttribute attribute, NumberSpec spec) {
        UnitDisplay units = bindings.units();
        String header = spec.label(units);
        Function<T, String> text = t -> Bindings.display(attribute, t.eGet(attribute), spec, units);
        Column<T> column = new Column<>(header, text, attribute);
        addColumn(column, new EditingSupport(viewer) {
            private final TextCellEditor editor = new TextCellEditor(viewer.getTable(), SWT.RIGHT);

            @Override
            protected CellEditor getCellEditor(Object element) {
                return editor;
            }

            @Override
            protected boolean canEdit(Object element) {
                return true;
            }

            @Override
            protected Object getValue(Object element) {
                return text.apply(cast(element));
            }

            @Override
            protected void setValue(Object element, Object value) {
                T row = cast(element);
                String typed = Objects.toString(value, "").trim();
                double shown = Numbers.parse(typed);
                String allowed = spec.allowed(units);
                String where = Messages.bind(Messages.Fields_tableCell, header, rowNumber(row));
                if (Double.isNaN(shown)) {
                    bindings.messages().set(ObjectTable.this, Messages.bind(Messages.Fields_notANumber,
                            new Object[] { where, typed, allowed }));
                    return;
                }
                double stored = units.toStorage(shown, spec.dimension());
                if (!spec.range().test(stored)) {
                    bindings.messages().set(ObjectTable.this, Messages.bind(Messages.Fields_outOfRange,
                            new Object[] { where, typed, allowed }));
                    return;
                }
                Object modelValue = Bindings.modelValue(attribute, stored);
                if (modelValue == null) {
                    bindings.messages().set(ObjectTable.this, Messages.bind(Messages.Fields_notWhole, where, typed));
                    return;
                }
                bindings.messages().set(ObjectTable.this, null);
                if (!Numbers.same(stored, ((Number) row.eGet(attribute)).doubleValue())) {
                    bindings.execute(bindings.set(row, attribute, modelValue, where));
                }
            }
        });
        return this;
    }

    /** An editable text column for a string attribute. */
    public ObjectTable<T> text(EAttribute attribute, String header) {
        Function<T, String> text = t -> Objects.toString(t.eGet(attribute), "");
        addColumn(new Column<>(header, text, attribute), new EditingSupport(viewer) {
            private final TextCellEditor editor = new TextCellEditor(viewer.getTable());

            @Override
            protected CellEditor getCellEditor(Object element) {
                return editor;
            }

            @Override
            protected boolean canEdit(Object element) {
                return true;
            }

            @Override
            protected Object getValue(Object element) {
                return text.apply(cast(element));
            }

            @Override
            protected void setValue(Object element, Object value) {
                T row = cast(element);
                String v = Objects.toString(value, "");
                if (!v.equals(Objects.toString(row.eGet(attribute), ""))) {
                    bindings.execute(bindings.set(row, attribute, v, Messages.bind(Messages.Fields_tableCell, header, rowNumber(row))));
                }
            }
        });
        return this;
    }

    /** An editable yes/no column for a boolean attribute. */
    public ObjectTable<T> check(EAttribute attribute, String header) {
        Function<T, String> text = t -> Boolean.TRUE.equals(t.eGet(attribute)) ? Messages.Fields_yes : Messages.Fields_no;
        addColumn(new Column<>(header, text, attribute), new EditingSupport(viewer) {
            private final CheckboxCellEditor editor = new CheckboxCellEditor(viewer.getTable());

            @Override
            protected CellEditor getCellEditor(Object element) {
                return editor;
            }

            @Override
            protected boolean canEdit(Object element) {
                return true;
            }

            @Override
            protected Object getValue(Object element) {
                return Boolean.TRUE.equals(cast(element).eGet(attribute));
            }

            @Override
            protected void setValue(Object element, Object value) {
                T row = cast(element);
                if (!Objects.equals(value, row.eGet(attribute))) {
                    bindings.execute(bindings.set(row, attribute, value, Messages.bind(Messages.Fields_tableCell, header, rowNumber(row))));
                }
            }
        });
        return this;
    }

    /** An editable drop-down column for an enumeration or a reference. */
    public <V> ObjectTable<T> choice(EStructuralFeature feature, String header, Supplier<List<V>> choices,
            Function<V, String> labeler) {
        Function<T, String> text = t -> {
            @SuppressWarnings("unchecked")
            V v = (V) t.eGet(feature);
            return v == null ? Messages.Fields_none : labeler.apply(v);
        };
        addColumn(new Column<>(header, text, feature), new EditingSupport(viewer) {
            private final ComboBoxCellEditor editor = new ComboBoxCellEditor(viewer.getTable(), new String[0], SWT.READ_ONLY);
            private List<V> offered = List.of();

            @Override
            protected CellEditor getCellEditor(Object element) {
                offered = choices.get();
                editor.setItems(offered.stream().map(v -> v == null ? Messages.Fields_none : labeler.apply(v))
                        .toArray(String[]::new));
                return editor;
            }

            @Override
            protected boolean canEdit(Object element) {
                return true;
            }

            @Override
            protected Object getValue(Object element) {
                return Math.max(0, offered.indexOf(cast(element).eGet(feature)));
            }

            @Override
            protected void setValue(Object element, Object value) {
                int i = value instanceof Integer n ? n : -1;
                T row = cast(element);
                if (i >= 0 && i < offered.size() && offered.get(i) != row.eGet(feature)) {
                    bindings.execute(bindings.set(row, feature, offered.get(i), Messages.bind(Messages.Fields_tableCell, header, rowNumber(row))));
                }
            }
        });
        return this;
    }

    /** Shows the rows and sizes the columns; call after the columns are defined. */
    public ObjectTable<T> build() {
        viewer.setInput(rows.get());
        packColumns();
        return this;
    }

    /** Shows the current rows again. */
    public void refresh() {
        if (viewer.getTable().isDisposed()) {
            return;
        }
        List<T> now = rows.get();
        if (!now.equals(viewer.getInput())) {
            viewer.setInput(now);
        } else {
            viewer.refresh();
        }
    }

    public TableViewer viewer() {
        return viewer;
    }

    public Table table() {
        return viewer.getTable();
    }

    /** The selected row, or null. */
    public T selected() {
        IStructuredSelection s = viewer.getStructuredSelection();
        return s.isEmpty() ? null : cast(s.getFirstElement());
    }

    /** Selects a row (null clears the selection). */
    public void select(T row) {
        viewer.setSelection(row == null ? StructuredSelection.EMPTY : new StructuredSelection(row), true);
    }

    /** Selects a row and, when the feature has an editable column, opens its cell editor. */
    public boolean reveal(T row, EStructuralFeature feature) {
        if (!rows.get().contains(row)) {
            return false;
        }
        select(row);
        viewer.getTable().setFocus();
        for (int i = 0; i < columns.size(); i++) {
            if (feature != null && columns.get(i).feature() == feature) {
                viewer.editElement(row, i);
                break;
            }
        }
        return true;
    }

    /** Whether a feature has a column in this table. */
    public boolean shows(EStructuralFeature feature) {
        return columns.stream().anyMatch(c -> c.feature() == feature);
    }

    private void addColumn(Column<T> column, EditingSupport editing) {
        columns.add(column);
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
        c.getColumn().setText(column.header());
        c.getColumn().setMoveable(false);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return column.text().apply(cast(element));
            }
        });
        if (editing != null) {
            c.setEditingSupport(editing);
        }
    }

    private void packColumns() {
        for (TableColumn c : viewer.getTable().getColumns()) {
            c.pack();
            c.setWidth(Math.max(c.getWidth() + 12, 60));
        }
    }

    private int rowNumber(T row) {
        return rows.get().indexOf(row) + 1;
    }

    private void scheduleRefresh() {
        if (refreshPending || viewer.getTable().isDisposed()) {
            return;
        }
        refreshPending = true;
        viewer.getTable().getDisplay().asyncExec(() -> {
            refreshPending = false;
            refresh();
        });
    }

    @SuppressWarnings("unchecked")
    private T cast(Object o) {
        return (T) o;
    }
}
