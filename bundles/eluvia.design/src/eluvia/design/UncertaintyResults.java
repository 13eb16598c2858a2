package eluvia.design;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import eluvia.design.uncertainty.CheapestAlternative;
import eluvia.design.uncertainty.InputSummary;
import eluvia.design.uncertainty.RankCorrelationTable;
import eluvia.design.uncertainty.UncertaintyResult;

/**
 * The uncertainty of a project's headline figures ({@link UncertaintyAnalysis}): plain values for
 * the design package, the workbench and the command line.
 *
 * <p>Percentiles follow {@link eluvia.design.uncertainty.OutputStatistics#PERCENTILE_DEFINITION}
 * (P10 is the value not exceeded in 10 % of the completed runs). Statistics are over the completed
 * runs only; failed runs are counted by reason in {@link #failureCounts()} and listed with their
 * inputs in {@link UncertaintyResult#failedRuns()}. A cancelled analysis keeps what it evaluated,
 * with {@link #cancelled()} set: its figures are then for information only.
 *
 * @param projectName          the project
 * @param requestedRunCount    the Monte Carlo runs asked for
 * @param completedRunCount    the runs that gave every headline figure
 * @param failedRunCount       the runs that did not
 * @param cancelled            whether the analysis was stopped before every run was evaluated
 * @param inputs               each uncertain input: distribution, P10 / P50 / P90, mean and the
 *                             entered value used as the base of the tornado, in the input's unit
 * @param headlines            the headline figures, in pipeline order (flushing designs, zone
 *                             enlargements, excavations, alternatives)
 * @param cheapest             per currency, the probability that each priced alternative has the lowest
 *                             present value (dimensionless; only when two or more are priced)
 * @param rankCorrelations     Spearman rank correlation of each uncertain input with each headline
 *                             figure (dimensionless)
 * @param failureCounts        the failed runs counted by reason (the reason without the run's numbers),
 *                             most frequent first
 * @param simulation           everything the Monte Carlo engine produced (every run's inputs and outputs)
 */
public record UncertaintyResults(String projectName, int requestedRunCount, int completedRunCount, int failedRunCount,
        boolean cancelled, List<InputSummary> inputs, List<UncertaintyHeadline> headlines,
        List<CheapestAlternative> cheapest, RankCorrelationTable rankCorrelations, Map<String, Integer> failureCounts,
        UncertaintyResult simulation) {

    /** Copies the collections. */
    public UncertaintyResults {
        inputs = List.copyOf(inputs);
        headlines = List.copyOf(headlines);
        cheapest = List.copyOf(cheapest);
        failureCounts = Collections.unmodifiableMap(new LinkedHashMap<>(failureCounts));
    }

    /** The headline of that output name. */
    public UncertaintyHeadline headline(String outputName) {
        return headlines.stream().filter(h -> h.outputName().equals(outputName)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("output name '" + outputName + "' is not a headline of"
                        + " this analysis; the headlines are " + headlines.stream().map(UncertaintyHeadline::outputName).toList()));
    }

    /** The headline of that subject and quantity, e.g. ("flush A", "duration"). */
    public UncertaintyHeadline headline(String subjectName, String quantity) {
        return headlines.stream().filter(h -> h.subjectName().equals(subjectName) && h.quantity().equals(quantity))
                .findFirst().orElseThrow(() -> new IllegalArgumentException("no headline '" + quantity + "' of '"
                        + subjectName + "'; the headlines are "
                        + headlines.stream().map(UncertaintyHeadline::outputName).toList()));
    }
}
