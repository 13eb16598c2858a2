package eluvia.ui.internal.editor;

import java.lang.reflect.Field;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.Contaminant;
import eluvia.site.model.PriceBook;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;
import eluvia.ui.internal.Messages;

/** How model values are named on screen. */
public final class Labels {

    private Labels() {
    }

    /**
     * The label of an enumeration literal: the message {@code Enum_<Type>_<LITERAL>}, or the
     * literal's own name when there is none.
     */
    public static String of(Enumerator literal) {
        if (literal == null) {
            return Messages.Fields_none;
        }
        String key = "Enum_" + literal.getClass().getSimpleName() + "_" + literal.getName();
        try {
            Field f = Messages.class.getField(key);
            Object v = f.get(null);
            if (v instanceof String s && !s.startsWith("NLS missing")) {
                return s;
            }
        } catch (ReflectiveOperationException e) {
            // no label for this literal: show its name
        }
        return literal.getLiteral();
    }

    /** The literals of an enumeration in declaration order. */
    static <E extends Enumerator> List<E> values(List<E> literals) {
        return List.copyOf(literals);
    }

    public static String name(Object o) {
        String n;
        if (o instanceof SoilLayer l) {
            n = l.getName();
        } else if (o instanceof Contaminant c) {
            n = c.getName();
        } else if (o instanceof TreatmentZone z) {
            n = z.getName();
        } else if (o instanceof PriceBook b) {
            n = b.getName();
        } else if (o instanceof CleanupLevel c) {
            n = c.getContaminant() == null ? null : c.getContaminant().getName();
        } else {
            n = o == null ? null : o.toString();
        }
        return n == null || n.isBlank() ? Messages.Fields_unnamed : n;
    }
}
