package eluvia.design.uncertainty;

import java.util.List;

/**
 * The result of a Monte Carlo simulation: everything the design package needs to state the
 * P10 / P50 / P90 of each output, draw its histogram and tornado, and list the rank correlations,
 * the probability that each alternative is the cheapest and the runs that failed.
 *
 * <p>A cancelled simulation returns its partial result with {@code cancelled} set: the statistics
 * then cover only the runs evaluated before cancellation (which runs those are depends on timing,
 * and a partial Latin hypercube is no longer stratified), so they are for information only.
 *
 * @param settings             the settings of the simulation
 * @param inputs               the study's inputs
 * @param outputs              the study's outputs
 * @param cancelled            whether the simulation was cancelled before every run was evaluated
 * @param evaluatedRunCount    the runs evaluated (completed plus failed)
 * @param completedRunCount    the runs that completed; the statistics are over these
 * @param failedRuns           the runs that failed, with the reason, in run order
 * @param inputSummaries       P10 / P50 / P90, mean and base value of each input, in the study's order
 * @param outputStatistics     the statistics of each output, in the study's order
 * @param tornados             the tornado of each output, in the study's order
 * @param rankCorrelations     Spearman rank correlation of each uncertain input with each output
 * @param cheapestAlternatives the probability that each alternative is cheapest, per comparison
 * @param runs                 every run's inputs, outputs and status
 */
public record UncertaintyResult(SimulationSettings settings, List<UncertainInput> inputs,
        List<OutputDefinition> outputs, boolean cancelled, int evaluatedRunCount, int completedRunCount,
        List<FailedRun> failedRuns, List<InputSummary> inputSummaries, List<OutputStatistics> outputStatistics,
        List<Tornado> tornados, RankCorrelationTable rankCorrelations, List<CheapestAlternative> cheapestAlternatives,
        RunTable runs) {

    /** Copies the lists. */
    public UncertaintyResult {
        inputs = List.copyOf(inputs);
        outputs = List.copyOf(outputs);
        failedRuns = List.copyOf(failedRuns);
        inputSummaries = List.copyOf(inputSummaries);
        outputStatistics = List.copyOf(outputStatistics);
        tornados = List.copyOf(tornados);
        cheapestAlternatives = List.copyOf(cheapestAlternatives);
    }

    /** The runs asked for. */
    public int requestedRunCount() {
        return settings.runCount();
    }

    /** The number of failed runs. */
    public int failedRunCount() {
        return failedRuns.size();
    }

    /** The statistics of the named output. */
    public OutputStatistics statistics(String outputName) {
        return outputStatistics.stream().filter(s -> s.name().equals(outputName)).findFirst()
                .orElseThrow(() -> unknown("output name", outputName, outputs.stream().map(OutputDefinition::name).toList()));
    }

    /** The tornado of the named output. */
    public Tornado tornado(String outputName) {
        return tornados.stream().filter(t -> t.outputName().equals(outputName)).findFirst()
                .orElseThrow(() -> unknown("output name", outputName, outputs.stream().map(OutputDefinition::name).toList()));
    }

    /** The summary of the named input. */
    public InputSummary inputSummary(String inputName) {
        return inputSummaries.stream().filter(s -> s.name().equals(inputName)).findFirst()
                .orElseThrow(() -> unknown("input name", inputName, inputs.stream().map(UncertainInput::name).toList()));
    }

    /** The probabilities of the comparison with that label. */
    public CheapestAlternative cheapest(String label) {
        return cheapestAlternatives.stream().filter(c -> c.label().equals(label)).findFirst()
                .orElseThrow(() -> unknown("label of a comparison of alternatives", label,
                        cheapestAlternatives.stream().map(CheapestAlternative::label).toList()));
    }

    private static UncertaintyInputException unknown(String quantity, String name, List<String> names) {
        return new UncertaintyInputException(quantity, name, "one of " + names);
    }
}
