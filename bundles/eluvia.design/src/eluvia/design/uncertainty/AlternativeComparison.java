package eluvia.design.uncertainty;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A set of outputs that are the costs of alternatives (e.g. flushing and excavation of the same
 * zone), for which the simulation reports the probability that each is the cheapest.
 *
 * @param label       a non-blank name of the comparison, e.g. {@code "remedy for zone A"}
 * @param outputNames two or more different outputs of the study, all in the same (currency) unit
 */
public record AlternativeComparison(String label, List<String> outputNames) {
    /** Checks the label and that the outputs are at least two and different. */
    public AlternativeComparison {
        UncertaintyInputException.requireName("label of a comparison of alternatives", label);
        UncertaintyInputException.requireNonNull("outputs of comparison '" + label + "'", outputNames);
        Set<String> seen = new HashSet<>();
        for (String name : outputNames) {
            UncertaintyInputException.requireName("output name in comparison '" + label + "'", name);
            if (!seen.add(name)) {
                throw new UncertaintyInputException("output name in comparison '" + label + "'", name,
                        "each output named once");
            }
        }
        if (outputNames.size() < 2) {
            throw new UncertaintyInputException("number of alternatives in comparison '" + label + "'",
                    outputNames.size(), "2 or more");
        }
        outputNames = List.copyOf(outputNames);
    }
}
