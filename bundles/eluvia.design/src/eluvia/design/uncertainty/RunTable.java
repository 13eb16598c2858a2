package eluvia.design.uncertainty;

import java.util.List;
import java.util.Map;

/**
 * Every Monte Carlo run of a simulation: the input values drawn, the outputs obtained and the
 * status, for scatter plots and for tracing a figure back to its runs. Input values are in the
 * units of their inputs, output values in the units of their outputs; an output is NaN for a run
 * that failed or was not evaluated. Immutable: every accessor returns a copy.
 */
public final class RunTable {
    private final List<String> inputNames;
    private final List<String> outputNames;
    private final Map<String, Integer> inputIndex;
    private final Map<String, Integer> outputIndex;
    private final double[][] inputColumns;
    private final double[][] outputColumns;
    private final RunStatus[] statuses;

    RunTable(List<String> inputNames, List<String> outputNames, double[][] inputColumns, double[][] outputColumns,
            RunStatus[] statuses) {
        this.inputNames = List.copyOf(inputNames);
        this.outputNames = List.copyOf(outputNames);
        this.inputIndex = InputValues.indexOf(inputNames);
        this.outputIndex = InputValues.indexOf(outputNames);
        this.inputColumns = inputColumns;
        this.outputColumns = outputColumns;
        this.statuses = statuses;
    }

    /** The number of runs planned. */
    public int runCount() {
        return statuses.length;
    }

    /** The input names, in the order of the study. */
    public List<String> inputNames() {
        return inputNames;
    }

    /** The output names, in the order of the study. */
    public List<String> outputNames() {
        return outputNames;
    }

    /** What became of run {@code run} (from 0). */
    public RunStatus status(int run) {
        return statuses[run];
    }

    /** The named input's value in every run, in the input's unit. */
    public double[] inputColumn(String inputName) {
        return inputColumns[index(inputIndex, "input name", inputName, inputNames)].clone();
    }

    /** The named output in every run (NaN where it failed or was not evaluated), in the output's unit. */
    public double[] outputColumn(String outputName) {
        return outputColumns[index(outputIndex, "output name", outputName, outputNames)].clone();
    }

    /** The named input's values in the completed runs only, in run order. */
    public double[] completedInputValues(String inputName) {
        return completed(inputColumns[index(inputIndex, "input name", inputName, inputNames)]);
    }

    /** The named output's values in the completed runs only, in run order. */
    public double[] completedOutputValues(String outputName) {
        return completed(outputColumns[index(outputIndex, "output name", outputName, outputNames)]);
    }

    /** The input values of run {@code run}. */
    public InputValues inputs(int run) {
        double[] values = new double[inputNames.size()];
        for (int j = 0; j < values.length; j++) {
            values[j] = inputColumns[j][run];
        }
        return new InputValues(inputNames, inputIndex, values);
    }

    double[] completed(double[] column) {
        int count = 0;
        for (RunStatus status : statuses) {
            if (status == RunStatus.COMPLETED) {
                count++;
            }
        }
        double[] values = new double[count];
        int next = 0;
        for (int i = 0; i < statuses.length; i++) {
            if (statuses[i] == RunStatus.COMPLETED) {
                values[next++] = column[i];
            }
        }
        return values;
    }

    private static int index(Map<String, Integer> index, String quantity, String name, List<String> names) {
        Integer found = index.get(name);
        if (found == null) {
            throw new UncertaintyInputException(quantity, name, "one of " + names);
        }
        return found;
    }
}
