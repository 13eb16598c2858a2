package eluvia.ui.internal.editor;

import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.layout.RowLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.ObjectTable;

/** A heading, Add and Remove buttons and an editable table for a list of model objects in a form. */
final class ListEditor {

    private ListEditor() {
    }

    /**
     * Builds the list editor across both columns of a form.
     *
     * @param factory makes the object Add appends
     * @param columns defines the table's columns
     */
    static <X extends EObject> ObjectTable<X> create(Composite form, Bindings bindings, String heading, EObject listOwner,
            EReference reference, Supplier<X> factory, Consumer<ObjectTable<X>> columns) {
        Forms.heading(form, heading, 2);
        Composite bar = new Composite(form, SWT.NONE);
        RowLayout row = new RowLayout(SWT.HORIZONTAL);
        row.marginLeft = 0;
        bar.setLayout(row);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        Button add = new Button(bar, SWT.PUSH);
        add.setText(Messages.Editor_add);
        Button remove = new Button(bar, SWT.PUSH);
        remove.setText(Messages.Editor_remove);
        Composite holder = new Composite(form, SWT.NONE);
        GridLayout hl = new GridLayout(1, false);
        hl.marginWidth = 0;
        holder.setLayout(hl);
        holder.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, false, 2, 1));
        @SuppressWarnings("unchecked")
        Supplier<List<X>> rows = () -> (List<X>) listOwner.eGet(reference);
        ObjectTable<X> t = new ObjectTable<>(holder, bindings, rows, 6);
        columns.accept(t);
        t.build();
        add.addListener(SWT.Selection, e -> {
            X created = factory.get();
            if (bindings.execute(AddCommand.create(bindings.document().domain(), listOwner, reference, created))) {
                t.refresh();
                t.select(created);
            }
        });
        remove.addListener(SWT.Selection, e -> {
            X chosen = t.selected();
            if (chosen != null) {
                bindings.execute(DeleteCommand.create(bindings.document().domain(), List.of(chosen)));
            }
        });
        return t;
    }
}
