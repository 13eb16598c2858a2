package eluvia.design.uncertainty;

import java.util.List;

/**
 * Spearman rank correlation between each uncertain input and each output over the completed
 * Monte Carlo runs (Commons Math 3.6.1 {@code SpearmansCorrelation}, ties ranked by their
 * average); dimensionless, from -1 to 1. NaN where it is undefined: fewer than three completed
 * runs, or an output that does not vary. Fixed inputs are not listed.
 *
 * @param inputNames   the rows: the uncertain inputs, in the order of the study
 * @param outputNames  the columns: the outputs, in the order of the study
 * @param coefficients one row per input, one value per output
 */
public record RankCorrelationTable(List<String> inputNames, List<String> outputNames,
        List<List<Double>> coefficients) {
    /** Copies the lists. */
    public RankCorrelationTable {
        inputNames = List.copyOf(inputNames);
        outputNames = List.copyOf(outputNames);
        coefficients = coefficients.stream().map(List::copyOf).toList();
    }

    /** The rank correlation of an input with an output; dimensionless. */
    public double coefficient(String inputName, String outputName) {
        int row = inputNames.indexOf(inputName);
        if (row < 0) {
            throw new UncertaintyInputException("input name", inputName, "one of the uncertain inputs " + inputNames);
        }
        int column = outputNames.indexOf(outputName);
        if (column < 0) {
            throw new UncertaintyInputException("output name", outputName, "one of " + outputNames);
        }
        return coefficients.get(row).get(column);
    }
}
