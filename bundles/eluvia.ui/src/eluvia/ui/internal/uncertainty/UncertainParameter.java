package eluvia.ui.internal.uncertainty;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;

import eluvia.design.uncertainty.UncertainInput;
import eluvia.ui.internal.Messages;

/**
 * One project input the user lets vary in an uncertainty study: the model object and attribute it
 * stands for, and its distribution with up to three parameters in the attribute's storage unit
 * (SI, as stored in the project). The distributions are those of eluvia.design.uncertainty
 * (Apache Commons Math 3.6.1).
 */
public final class UncertainParameter {

    /** The distribution kinds offered, with what their parameters mean. */
    public enum Kind {
        /** Not varied: the project's value. */
        FIXED,
        /** Uniform on [a, b]. */
        UNIFORM,
        /** Triangular with minimum a, mode b, maximum c. */
        TRIANGULAR,
        /** Normal with mean a and standard deviation b. */
        NORMAL,
        /** Lognormal with median a and geometric standard deviation b (dimensionless, above 1). */
        LOGNORMAL;

        /** The words of the kind and its parameters. */
        public String label() {
            return switch (this) {
            case FIXED -> Messages.Uncertainty_fixed;
            case UNIFORM -> Messages.Uncertainty_uniform;
            case TRIANGULAR -> Messages.Uncertainty_triangular;
            case NORMAL -> Messages.Uncertainty_normal;
            case LOGNORMAL -> Messages.Uncertainty_lognormal;
            };
        }

        /** How many parameters the kind has. */
        public int parameterCount() {
            return switch (this) {
            case FIXED -> 0;
            case UNIFORM, NORMAL, LOGNORMAL -> 2;
            case TRIANGULAR -> 3;
            };
        }
    }

    private final String name;
    private final String unit;
    private final EObject target;
    private final EAttribute attribute;
    private Kind kind;
    private final double[] values = new double[3];

    /**
     * @param name the input's name in the study, unique, e.g. "Koc of Benzene"
     * @param unit its unit as stored, e.g. "L/kg"; "-" for dimensionless
     */
    public UncertainParameter(String name, String unit, EObject target, EAttribute attribute, Kind kind, double a,
            double b, double c) {
        this.name = name;
        this.unit = unit;
        this.target = target;
        this.attribute = attribute;
        this.kind = kind;
        values[0] = a;
        values[1] = b;
        values[2] = c;
    }

    public String name() {
        return name;
    }

    public String unit() {
        return unit;
    }

    public EObject target() {
        return target;
    }

    public EAttribute attribute() {
        return attribute;
    }

    public Kind kind() {
        return kind;
    }

    public void setKind(Kind newKind) {
        kind = newKind;
    }

    /** Parameter i (0 to 2) of the distribution, in the storage unit (the geometric SD is dimensionless). */
    public double value(int i) {
        return values[i];
    }

    public void setValue(int i, double v) {
        values[i] = v;
    }

    /** The project's current value of the attribute, in its storage unit. */
    public double projectValue() {
        return ((Number) target.eGet(attribute)).doubleValue();
    }

    /**
     * The engine's input for this parameter.
     *
     * @throws eluvia.design.uncertainty.UncertaintyInputException naming the input and the bad parameter
     */
    public UncertainInput toInput() {
        return switch (kind) {
        case FIXED -> UncertainInput.fixed(name, unit, projectValue());
        case UNIFORM -> UncertainInput.uniform(name, unit, values[0], values[1]);
        case TRIANGULAR -> UncertainInput.triangular(name, unit, values[0], values[1], values[2]);
        case NORMAL -> UncertainInput.normal(name, unit, values[0], values[1]);
        case LOGNORMAL -> UncertainInput.lognormal(name, unit, values[0], values[1]);
        };
    }
}
