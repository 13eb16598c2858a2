package eluvia.site.validation;

import java.util.Objects;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

/**
 * One validation finding: which object, which field, the value found, the range allowed and how
 * to fix it.
 *
 * @param severity how serious it is
 * @param object the model object at fault (for selection in editors); may be null for project-wide problems
 * @param objectLabel how the object is named to the user, e.g. {@code Layer 'Silty sand'}
 * @param field the model feature name, e.g. {@code porosity} (see {@link #feature()})
 * @param value the value found, as text ({@code (empty)} for a missing value)
 * @param allowedRange what is allowed, e.g. {@code (0, 1)} or {@code not empty}
 * @param fix what to do, in plain words; may be empty where the range says it all
 */
public record Problem(Severity severity, EObject object, String objectLabel, String field, String value,
        String allowedRange, String fix) {

    public Problem {
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(objectLabel, "objectLabel");
        Objects.requireNonNull(field, "field");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(allowedRange, "allowedRange");
        fix = fix == null ? "" : fix;
    }

    /**
     * The whole finding as one sentence, e.g.
     * {@code Layer 'Silty sand' field porosity = 1.2: allowed (0, 1); enter the total porosity as a fraction, e.g. 0.35}.
     */
    public String message() {
        return objectLabel + " field " + field + " = " + value + ": allowed " + allowedRange
                + (fix.isEmpty() ? "" : "; " + fix);
    }

    /** The model feature named by {@link #field()}, or null when the field is not a feature of the object. */
    public EStructuralFeature feature() {
        return object == null ? null : object.eClass().getEStructuralFeature(field);
    }

    @Override
    public String toString() {
        return severity + ": " + message();
    }
}
