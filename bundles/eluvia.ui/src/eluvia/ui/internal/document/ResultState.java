package eluvia.ui.internal.document;

import java.util.List;

import eluvia.design.DesignRun;
import eluvia.site.validation.Problem;

/**
 * What the result views show for a document: the latest run of the design pipeline, or why there
 * is none. Results come only from {@link eluvia.design.DesignPipeline}; the workbench computes
 * nothing itself.
 *
 * @param status where the computation stands
 * @param run the run, for {@link Status#READY} (and the previous run while {@link Status#COMPUTING}, or null)
 * @param errors the validation errors that stop the pipeline, for {@link Status#INPUT_ERRORS}
 * @param failure the message of an unexpected failure, for {@link Status#FAILED}
 * @param generation increases with every computation started for the document
 */
public record ResultState(Status status, DesignRun run, List<Problem> errors, String failure, long generation) {

    /** Where a computation stands. */
    public enum Status {
        /** A run is in progress (the previous results, if any, are still shown). */
        COMPUTING,
        /** The run finished: {@link ResultState#run()} holds it. */
        READY,
        /** The inputs have errors; nothing was computed. */
        INPUT_ERRORS,
        /** The pipeline failed unexpectedly or was cancelled. */
        FAILED
    }

    public ResultState {
        errors = errors == null ? List.of() : List.copyOf(errors);
        failure = failure == null ? "" : failure;
    }

    /** Nothing computed yet. */
    public static ResultState none() {
        return new ResultState(Status.COMPUTING, null, List.of(), "", 0);
    }
}
