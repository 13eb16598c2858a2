package eluvia.design;

import java.util.List;
import java.util.stream.Collectors;

import eluvia.site.validation.Problem;

/**
 * The project has errors that stop the pipeline. Carries every problem found, each naming the
 * object, the field, the allowed range and the fix.
 */
public class DesignInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    public DesignInputException(List<Problem> problems) {
        super(problems.stream().map(Problem::message).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    /** The problems, one per field. */
    public List<Problem> problems() {
        return problems;
    }
}
