package eluvia.ui.internal.fields;

import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.impl.AdapterImpl;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.jface.fieldassist.ControlDecoration;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import eluvia.site.edit.command.SiteEditingDomain;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;

/**
 * Form fields bound to model features. Every change goes through the document's command stack
 * (so it can be undone); every change of the model (undo, redo, another field) shows in the field.
 * Numbers are shown and typed in the units of the chosen unit system and stored in SI.
 *
 * <p>A number that does not parse or is outside its allowed range stays in the field as typed,
 * marked (background and decoration), and is explained in the editor's message line naming the
 * field and the allowed range; it does not reach the model.
 *
 * <p>Successive keystrokes in one field make one undoable edit: while the field keeps the focus,
 * a new value replaces the field's previous command instead of adding another.
 *
 * <p>Forms are two-column grids: label, field.
 */
public final class Bindings {

    /** Key under which a bound control keeps its label text (tests and navigation). */
    public static final String LABEL_KEY = "eluvia.label";

    private final ProjectDocument document;
    private final UnitDisplay units;
    private final FieldMessages messages;
    private final Map<EObject, Map<EStructuralFeature, Control>> registry = new IdentityHashMap<>();
    private final Color badBackground;

    public Bindings(ProjectDocument document, UnitDisplay units, FieldMessages messages, Color badBackground) {
        this.document = Objects.requireNonNull(document, "document");
        this.units = Objects.requireNonNull(units, "units");
        this.messages = Objects.requireNonNull(messages, "messages");
        this.badBackground = badBackground;
    }

    public UnitDisplay units() {
        return units;
    }

    public ProjectDocument document() {
        return document;
    }

    public FieldMessages messages() {
        return messages;
    }

    /** The control bound to a feature of an object, or null when none is showing. */
    public Control controlFor(EObject owner, EStructuralFeature feature) {
        Map<EStructuralFeature, Control> m = registry.get(owner);
        Control c = m == null ? null : m.get(feature);
        return c == null || c.isDisposed() ? null : c;
    }

    /** Records a control as the place of a feature, for navigation from the Problems view. */
    public void register(EObject owner, EStructuralFeature feature, Control control) {
        registry.computeIfAbsent(owner, k -> new HashMap<>()).put(feature, control);
        control.addDisposeListener(e -> {
            Map<EStructuralFeature, Control> m = registry.get(owner);
            if (m != null && m.get(feature) == control) {
                m.remove(feature);
                if (m.isEmpty()) {
                    registry.remove(owner);
                }
            }
        });
    }

    /** A label and a number field for a double attribute. */
    public Text number(Composite parent, EObject owner, EAttribute attribute, NumberSpec spec) {
        String label = spec.label(units);
        label(parent, label);
        Text text = new Text(parent, SWT.BORDER | SWT.RIGHT);
        text.setData(LABEL_KEY, label);
        GridData gd = new GridData(SWT.BEGINNING, SWT.CENTER, false, false);
        gd.widthHint = charsWide(text, 16);
        text.setLayoutData(gd);
        String allowed = spec.allowed(units);
        text.setToolTipText(Messages.bind(Messages.Fields_allowedTooltip, allowed));
        ControlDecoration decoration = new ControlDecoration(text, SWT.LEFT | SWT.CENTER);
        decoration.setImage(Marks.bad(text.getDisplay()));
        decoration.hide();
        FieldState state = new FieldState();
        Runnable show = () -> {
            state.updating = true;
            text.setText(display(attribute, owner.eGet(attribute), spec, units));
            state.updating = false;
            markGood(text, decoration);
        };
        show.run();
        text.addModifyListener(e -> {
            if (state.updating) {
                return;
            }
            String typed = text.getText().trim();
            double shown = Numbers.parse(typed);
            if (Double.isNaN(shown)) {
                markBad(text, decoration, Messages.bind(Messages.Fields_notANumber,
                        new Object[] { label, typed, allowed }));
                return;
            }
            double stored = units.toStorage(shown, spec.dimension());
            if (!spec.range().test(stored)) {
                markBad(text, decoration, Messages.bind(Messages.Fields_outOfRange,
                        new Object[] { label, typed, allowed }));
                return;
            }
            Object value = modelValue(attribute, stored);
            if (value == null) {
                markBad(text, decoration, Messages.bind(Messages.Fields_notWhole, label, typed));
                return;
            }
            markGood(text, decoration);
            double current = ((Number) owner.eGet(attribute)).doubleValue();
            if (!Numbers.same(stored, current)) {
                apply(state, owner, attribute, value, label);
            }
        });
        follow(text, owner, attribute, state, () -> {
            double current = ((Number) owner.eGet(attribute)).doubleValue();
            double typed = Numbers.parse(text.getText());
            if (Double.isNaN(typed) || !Numbers.same(units.toStorage(typed, spec.dimension()), current)
                    || text.getBackground().equals(badBackground)) {
                show.run();
            }
        });
        text.addListener(SWT.FocusOut, e -> state.session = null);
        register(owner, attribute, text);
        return text;
    }

    /**
     * A label and a text field for a many-valued double attribute: the numbers separated by spaces
     * (or commas). Every number must parse and lie in the spec's range, and the list must increase
     * strictly when {@code increasing}; otherwise the text stays as typed, marked and explained, and
     * the model keeps its list. An empty field stores an empty list.
     */
    public Text numberList(Composite parent, EObject owner, EAttribute attribute, NumberSpec spec, boolean increasing) {
        if (!attribute.isMany()) {
            throw new IllegalArgumentException("numberList needs a many-valued attribute; " + attribute.getName()
                    + " holds one value (use number(...) for it)");
        }
        String label = spec.label(units);
        label(parent, label);
        Text text = new Text(parent, SWT.BORDER | SWT.SINGLE);
        text.setData(LABEL_KEY, label);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = charsWide(text, 40);
        text.setLayoutData(gd);
        String allowed = spec.allowed(units) + (increasing ? Messages.Fields_listIncreasing : "");
        text.setToolTipText(Messages.bind(Messages.Fields_listTooltip, allowed));
        ControlDecoration decoration = new ControlDecoration(text, SWT.LEFT | SWT.CENTER);
        decoration.setImage(Marks.bad(text.getDisplay()));
        decoration.hide();
        FieldState state = new FieldState();
        Runnable show = () -> {
            state.updating = true;
            text.setText(displayList((List<?>) owner.eGet(attribute), spec, units));
            state.updating = false;
            markGood(text, decoration);
        };
        show.run();
        text.addModifyListener(e -> {
            if (state.updating) {
                return;
            }
            String typed = text.getText().trim();
            List<Double> stored = new java.util.ArrayList<>();
            for (String part : typed.isEmpty() ? new String[0] : typed.split("[\\s,;]+")) {
                double shown = Numbers.parse(part);
                if (Double.isNaN(shown)) {
                    markBad(text, decoration, Messages.bind(Messages.Fields_notANumber, new Object[] { label, part, allowed }));
                    return;
                }
                double v = units.toStorage(shown, spec.dimension());
                if (!spec.range().test(v)) {
                    markBad(text, decoration, Messages.bind(Messages.Fields_outOfRange, new Object[] { label, part, allowed }));
                    return;
                }
                if (increasing && !stored.isEmpty() && !(v > stored.get(stored.size() - 1))) {
                    markBad(text, decoration, Messages.bind(Messages.Fields_listNotIncreasing, new Object[] { label, part, allowed }));
                    return;
                }
                stored.add(v);
            }
            markGood(text, decoration);
            if (!sameList(stored, (List<?>) owner.eGet(attribute))) {
                apply(state, owner, attribute, stored, label);
            }
        });
        follow(text, owner, attribute, state, () -> {
            if (text.getBackground().equals(badBackground)
                    || !text.getText().trim().equals(displayList((List<?>) owner.eGet(attribute), spec, units))) {
                show.run();
            }
        });
        text.addListener(SWT.FocusOut, e -> state.session = null);
        register(owner, attribute, text);
        return text;
    }

    /** A list of stored numbers as shown: each to six significant figures in the units shown, separated by spaces. */
    static String displayList(List<?> values, NumberSpec spec, UnitDisplay units) {
        StringBuilder b = new StringBuilder();
        for (Object v : values) {
            if (b.length() > 0) {
                b.append(' ');
            }
            b.append(Numbers.format(units.toDisplay(((Number) v).doubleValue(), spec.dimension())));
        }
        return b.toString();
    }

    private static boolean sameList(List<Double> typed, List<?> current) {
        if (typed.size() != current.size()) {
            return false;
        }
        for (int i = 0; i < typed.size(); i++) {
            if (!Numbers.same(typed.get(i), ((Number) current.get(i)).doubleValue())) {
                return false;
            }
        }
        return true;
    }

    /** A label and a text field for a string attribute. */
    public Text text(Composite parent, EObject owner, EAttribute attribute, String label, boolean multiLine) {
        Label l = label(parent, label);
        Text text = new Text(parent, SWT.BORDER | (multiLine ? SWT.MULTI | SWT.WRAP | SWT.V_SCROLL : SWT.SINGLE));
        text.setData(LABEL_KEY, label);
        GridData gd = new GridData(SWT.FILL, multiLine ? SWT.FILL : SWT.CENTER, true, false);
        gd.widthHint = charsWide(text, 40);
        if (multiLine) {
            gd.heightHint = text.getLineHeight() * 3;
            l.setLayoutData(new GridData(SWT.BEGINNING, SWT.TOP, false, false));
        }
        text.setLayoutData(gd);
        FieldState state = new FieldState();
        Runnable show = () -> {
            state.updating = true;
            Object v = owner.eGet(attribute);
            text.setText(v == null ? "" : v.toString());
            state.updating = false;
        };
        show.run();
        text.addModifyListener(e -> {
            if (!state.updating && !Objects.equals(text.getText(), nullToEmpty(owner.eGet(attribute)))) {
                apply(state, owner, attribute, text.getText(), label);
            }
        });
        follow(text, owner, attribute, state, () -> {
            if (!Objects.equals(text.getText(), nullToEmpty(owner.eGet(attribute)))) {
                show.run();
            }
        });
        text.addListener(SWT.FocusOut, e -> state.session = null);
        register(owner, attribute, text);
        return text;
    }

    /** A check box for a boolean attribute (the label is the box's own text). */
    public Button check(Composite parent, EObject owner, EAttribute attribute, String label) {
        new Label(parent, SWT.NONE);
        Button b = new Button(parent, SWT.CHECK);
        b.setText(label);
        b.setData(LABEL_KEY, label);
        FieldState state = new FieldState();
        b.setSelection(Boolean.TRUE.equals(owner.eGet(attribute)));
        b.addListener(SWT.Selection, e -> {
            if (b.getSelection() != Boolean.TRUE.equals(owner.eGet(attribute))) {
                state.session = null;
                apply(state, owner, attribute, b.getSelection(), label);
            }
        });
        follow(b, owner, attribute, state, () -> b.setSelection(Boolean.TRUE.equals(owner.eGet(attribute))));
        register(owner, attribute, b);
        return b;
    }

    /**
     * A read-only drop-down for an enumeration or a reference.
     *
     * @param choices the values offered (a null entry offers "none")
     * @param labeler the text of each value
     */
    public <T> Combo choice(Composite parent, EObject owner, EStructuralFeature feature, String label, List<T> choices,
            Function<T, String> labeler) {
        label(parent, label);
        Combo combo = new Combo(parent, SWT.READ_ONLY | SWT.DROP_DOWN);
        combo.setData(LABEL_KEY, label);
        for (T c : choices) {
            combo.add(c == null ? Messages.Fields_none : labeler.apply(c));
        }
        combo.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false));
        FieldState state = new FieldState();
        Runnable show = () -> {
            state.updating = true;
            int i = choices.indexOf(owner.eGet(feature));
            if (i >= 0) {
                combo.select(i);
            } else {
                combo.deselectAll();
            }
            state.updating = false;
        };
        show.run();
        combo.addListener(SWT.Selection, e -> {
            int i = combo.getSelectionIndex();
            if (!state.updating && i >= 0 && choices.get(i) != owner.eGet(feature)) {
                state.session = null;
                apply(state, owner, feature, choices.get(i), label);
            }
        });
        follow(combo, owner, feature, state, show);
        register(owner, feature, combo);
        return combo;
    }

    /** A label in the first column of a form. */
    public Label label(Composite parent, String text) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(text);
        l.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false));
        return l;
    }

    /** Runs a command through the document's stack. */
    public boolean execute(Command command) {
        return document.execute(command);
    }

    /**
     * The undoable command that sets a feature, labelled with the field it was typed in (what
     * Edit > Undo names), e.g. "Set Darcy flux (m/d)".
     *
     * @param fieldLabel the field's label as shown, with its unit
     */
    public Command set(EObject owner, EStructuralFeature feature, Object value, String fieldLabel) {
        return SiteEditingDomain.labelled(Messages.bind(Messages.Edit_setField, fieldLabel),
                SetCommand.create(document.domain(), owner, feature, value));
    }

    private void apply(FieldState state, EObject owner, EStructuralFeature feature, Object value, String fieldLabel) {
        state.applying = true;
        try {
            if (state.session != null && document.commandStack().getUndoCommand() == state.session) {
                document.undo();
            }
            Command c = set(owner, feature, value, fieldLabel);
            state.session = document.execute(c) ? c : null;
        } finally {
            state.applying = false;
        }
    }

    private void follow(Control control, EObject owner, EStructuralFeature feature, FieldState state, Runnable refresh) {
        AdapterImpl adapter = new AdapterImpl() {
            @Override
            public void notifyChanged(Notification n) {
                if (n.getFeature() == feature && !n.isTouch() && !state.applying && !control.isDisposed()) {
                    refresh.run();
                }
            }
        };
        owner.eAdapters().add(adapter);
        control.addDisposeListener(e -> owner.eAdapters().remove(adapter));
    }

    private void markBad(Text text, ControlDecoration decoration, String message) {
        text.setBackground(badBackground);
        decoration.setDescriptionText(message);
        decoration.show();
        messages.set(text, message);
    }

    private void markGood(Text text, ControlDecoration decoration) {
        text.setBackground(null);
        decoration.hide();
        messages.set(text, null);
    }

    /**
     * A number attribute's value as shown: whole numbers of integer attributes exactly (a seed or a
     * count must not be rounded), others to six significant figures in the units shown.
     */
    static String display(EAttribute attribute, Object value, NumberSpec spec, UnitDisplay units) {
        Class<?> type = attribute.getEAttributeType().getInstanceClass();
        if (type == int.class || type == Integer.class || type == long.class || type == Long.class) {
            return Long.toString(((Number) value).longValue());
        }
        return Numbers.format(units.toDisplay(((Number) value).doubleValue(), spec.dimension()));
    }

    /**
     * The model value for a number in storage units: a Double, or an Integer for an integer
     * attribute (null when the number is not whole).
     */
    static Object modelValue(EAttribute attribute, double stored) {
        Class<?> type = attribute.getEAttributeType().getInstanceClass();
        if (type == int.class || type == Integer.class) {
            if (stored != Math.rint(stored) || Math.abs(stored) > Integer.MAX_VALUE) {
                return null;
            }
            return (int) stored;
        }
        if (type == long.class || type == Long.class) {
            if (stored != Math.rint(stored) || Math.abs(stored) > 9.007199254740992E15) {
                return null;
            }
            return (long) stored;
        }
        return stored;
    }

    private static String nullToEmpty(Object v) {
        return v == null ? "" : v.toString();
    }

    /** Width in pixels of n average characters of the control's font. */
    public static int charsWide(Control control, int n) {
        GC gc = new GC(control);
        try {
            return (int) Math.ceil(gc.getFontMetrics().getAverageCharacterWidth() * n) + 8;
        } finally {
            gc.dispose();
        }
    }

    /** Per-field state: feedback guards and the command of the current typing session. */
    private static final class FieldState {
        boolean updating;
        boolean applying;
        Command session;
    }
}
