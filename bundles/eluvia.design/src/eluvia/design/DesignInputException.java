package eluvia.design;

import java.util.List;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.EObject;

import eluvia.site.validation.Problem;
import eluvia.site.validation.Severity;

/**
 * The project (or the run's settings) has errors that stop the pipeline. Carries every problem
 * found, each naming the object, the field, the value, the allowed range and the fix.
 */
public class DesignInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    public DesignInputException(List<Problem> problems) {
        super(problems.stream().map(Problem::message).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    /**
     * One error.
     *
     * @param object the model object at fault, or null (for the run's settings)
     * @param objectLabel how the object is named to the user, e.g. {@code Excavation design 'Dig'}
     * @param field the field, e.g. {@code overdigMetres}
     * @param value the value found
     * @param allowedRange what is allowed
     * @param fix what to do (may be empty)
     */
    public static DesignInputException of(EObject object, String objectLabel, String field, Object value,
            String allowedRange, String fix) {
        return new DesignInputException(List.of(new Problem(Severity.ERROR, object, objectLabel, field,
                String.valueOf(value), allowedRange, fix)));
    }

    /** The problems, one per field. */
    public List<Problem> problems() {
        return problems;
    }
}
