package eluvia.ui;

import java.util.Locale;
import java.util.function.DoubleConsumer;
import java.util.function.DoublePredicate;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

/**
 * Labelled number fields with their unit in the label. A value that does not parse or is outside
 * its allowed range is kept in the field as typed, marked, and explained in a message naming the
 * field and the allowed range; only a good value reaches the model.
 */
public final class Fields {

    private Fields() {
    }

    /** Receives the message of a bad value, or null when the field is good again. */
    public interface MessageSink {
        void message(Text field, String messageOrNull);
    }

    /**
     * Adds a label and a number field to a two-column grid.
     *
     * @param label the label with its unit, e.g. "Darcy flux (m/d)"
     * @param allowed the allowed range in words, e.g. "greater than 0"
     */
    public static Text number(Composite parent, String label, double value, DoublePredicate valid, String allowed,
            DoubleConsumer apply, MessageSink sink) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(label);
        Text t = new Text(parent, SWT.BORDER | SWT.RIGHT);
        t.setText(format(value));
        t.setToolTipText("Allowed: " + allowed);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = 110;
        t.setLayoutData(gd);
        Color bad = new Color(255, 228, 225);
        t.addModifyListener(e -> {
            String text = t.getText().trim();
            double v;
            try {
                v = Double.parseDouble(text);
            } catch (NumberFormatException ex) {
                t.setBackground(bad);
                sink.message(t, label + ": '" + text + "' is not a number; allowed: " + allowed);
                return;
            }
            if (!valid.test(v)) {
                t.setBackground(bad);
                sink.message(t, label + ": " + text + " is outside the allowed range; allowed: " + allowed);
                return;
            }
            t.setBackground(null);
            sink.message(t, null);
            apply.accept(v);
        });
        return t;
    }

    /** A number as a user would type it: up to six significant figures, no grouping. */
    public static String format(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.6g", v);
        if (s.contains("e")) {
            return s;
        }
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }
}
