package eluvia.design;

import java.time.Instant;
import java.util.List;

import eluvia.site.validation.Problem;

/**
 * Everything one run of the design pipeline produced, for the report writer, the workbench and the
 * command line alike.
 *
 * @param projectName name of the project
 * @param startedAt when the run started
 * @param problems validation warnings (a run with errors does not get this far)
 * @param flushing one result per flushing design
 * @param cautions the cautions that apply to these results
 */
public record DesignRun(String projectName, Instant startedAt, List<Problem> problems,
        List<FlushingDesignResult> flushing, List<String> cautions) {
}
