package eluvia.design.uncertainty;

import java.util.List;

/**
 * For a set of outputs that are costs of alternatives, the probability that each is the cheapest:
 * the fraction of completed runs in which it is the smallest, a run in which t alternatives tie
 * for the smallest counting 1/t for each. The probabilities are dimensionless and sum to 1 (NaN
 * when no run completed).
 *
 * @param label         the comparison's label
 * @param outputNames   the alternatives' cost outputs
 * @param probabilities the probability that each is the cheapest, in the same order
 * @param runCount      the number of completed runs counted
 */
public record CheapestAlternative(String label, List<String> outputNames, List<Double> probabilities, int runCount) {
    /** Copies the lists. */
    public CheapestAlternative {
        outputNames = List.copyOf(outputNames);
        probabilities = List.copyOf(probabilities);
    }

    /** The probability that the named alternative is the cheapest; dimensionless. */
    public double probability(String outputName) {
        int index = outputNames.indexOf(outputName);
        if (index < 0) {
            throw new UncertaintyInputException("output name in comparison '" + label + "'", outputName,
                    "one of " + outputNames);
        }
        return probabilities.get(index);
    }
}
