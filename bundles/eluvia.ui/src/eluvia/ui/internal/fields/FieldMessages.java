package eluvia.ui.internal.fields;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;

/**
 * The message line of an editor: one line per field that holds a bad value (kept as typed), each
 * naming the field and the allowed range, plus the last refused table edit.
 */
public final class FieldMessages {

    private final Map<Object, String> messages = new LinkedHashMap<>();
    private final Label label;

    public FieldMessages(Composite parent) {
        label = new Label(parent, SWT.WRAP);
        label.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false);
        gd.widthHint = 300;
        label.setLayoutData(gd);
        label.setData("eluvia.role", "field-messages");
    }

    /** Sets or (with null) clears the message of a field or other source. */
    public void set(Object source, String messageOrNull) {
        if (messageOrNull == null) {
            if (messages.remove(source) == null) {
                return;
            }
        } else {
            messages.put(source, messageOrNull);
        }
        show();
    }

    /** Forgets the messages of disposed controls. */
    public void prune() {
        messages.keySet().removeIf(k -> k instanceof Control c && c.isDisposed());
        show();
    }

    /** The messages shown, oldest first. */
    public List<String> messages() {
        return new ArrayList<>(messages.values());
    }

    /** The line itself. */
    public Label label() {
        return label;
    }

    private void show() {
        if (label.isDisposed()) {
            return;
        }
        String text = String.join("\n", messages.values());
        label.setText(text);
        Object layout = label.getLayoutData();
        if (layout instanceof GridData gd) {
            gd.exclude = text.isEmpty();
            label.setVisible(!text.isEmpty());
        }
        label.getParent().layout(true, true);
    }
}
