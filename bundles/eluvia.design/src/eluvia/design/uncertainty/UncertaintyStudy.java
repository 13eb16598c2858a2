package eluvia.design.uncertainty;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * What a Monte Carlo simulation evaluates: the uncertain inputs, the outputs the model gives
 * (each with its unit), the model, an optional target rank correlation between inputs, and the
 * sets of outputs that are costs of alternatives. Immutable once built; made with
 * {@link #builder()}.
 */
public final class UncertaintyStudy {
    private final List<UncertainInput> inputs;
    private final List<OutputDefinition> outputs;
    private final UncertaintyModel model;
    private final RankCorrelationMatrix rankCorrelation;
    private final List<AlternativeComparison> comparisons;

    private UncertaintyStudy(Builder builder) {
        this.inputs = List.copyOf(builder.inputs);
        this.outputs = List.copyOf(builder.outputs);
        this.model = builder.model;
        this.rankCorrelation = builder.rankCorrelation;
        this.comparisons = List.copyOf(builder.comparisons);
    }

    /** A new, empty builder. */
    public static Builder builder() {
        return new Builder();
    }

    /** Collects the parts of a study; {@link #build()} checks that they fit together. */
    public static final class Builder {
        private final List<UncertainInput> inputs = new ArrayList<>();
        private final List<OutputDefinition> outputs = new ArrayList<>();
        private final List<AlternativeComparison> comparisons = new ArrayList<>();
        private UncertaintyModel model;
        private RankCorrelationMatrix rankCorrelation;

        private Builder() {
        }

        /** Adds an input. */
        public Builder input(UncertainInput input) {
            inputs.add(UncertaintyInputException.requireNonNull("uncertain input", input));
            return this;
        }

        /** Adds inputs. */
        public Builder inputs(List<UncertainInput> more) {
            UncertaintyInputException.requireNonNull("uncertain inputs", more).forEach(this::input);
            return this;
        }

        /** Declares an output with its unit ({@code "1"} if dimensionless). */
        public Builder output(String name, String unit) {
            outputs.add(new OutputDefinition(name, unit));
            return this;
        }

        /** Declares an output. */
        public Builder output(OutputDefinition output) {
            outputs.add(UncertaintyInputException.requireNonNull("output", output));
            return this;
        }

        /** Sets the model. */
        public Builder model(UncertaintyModel newModel) {
            this.model = newModel;
            return this;
        }

        /** Sets the target rank correlation between inputs (none: independent inputs). */
        public Builder rankCorrelation(RankCorrelationMatrix matrix) {
            this.rankCorrelation = matrix;
            return this;
        }

        /** Adds a set of outputs that are costs of alternatives. */
        public Builder compareAlternatives(String label, List<String> costOutputNames) {
            comparisons.add(new AlternativeComparison(label, costOutputNames));
            return this;
        }

        /**
         * Checks that names are unique, every name used refers to a declared input or output,
         * correlated inputs are uncertain and the alternatives of a comparison share one unit.
         */
        public UncertaintyStudy build() {
            if (inputs.isEmpty()) {
                throw new UncertaintyInputException("number of uncertain inputs", 0, "1 or more");
            }
            if (outputs.isEmpty()) {
                throw new UncertaintyInputException("number of outputs", 0, "1 or more");
            }
            UncertaintyInputException.requireNonNull("model of the uncertainty study", model);
            Map<String, UncertainInput> inputByName = new HashMap<>();
            for (UncertainInput input : inputs) {
                if (inputByName.put(input.name(), input) != null) {
                    throw new UncertaintyInputException("input name", input.name(), "each input named once");
                }
            }
            Map<String, OutputDefinition> outputByName = new HashMap<>();
            for (OutputDefinition output : outputs) {
                if (outputByName.put(output.name(), output) != null) {
                    throw new UncertaintyInputException("output name", output.name(), "each output named once");
                }
            }
            if (rankCorrelation != null) {
                for (String name : rankCorrelation.inputNames()) {
                    UncertainInput input = inputByName.get(name);
                    if (input == null) {
                        throw new UncertaintyInputException("input name in the rank correlation matrix", name,
                                "one of the study's inputs " + inputByName.keySet());
                    }
                    if (input.isFixed()) {
                        throw new UncertaintyInputException("input in the rank correlation matrix", name,
                                "an uncertain input: '" + name + "' is fixed, and a fixed value has no"
                                        + " correlation; remove it from the matrix");
                    }
                }
            }
            Set<String> labels = new HashSet<>();
            for (AlternativeComparison comparison : comparisons) {
                if (!labels.add(comparison.label())) {
                    throw new UncertaintyInputException("label of a comparison of alternatives", comparison.label(),
                            "each label used once");
                }
                String unit = null;
                for (String name : comparison.outputNames()) {
                    OutputDefinition output = outputByName.get(name);
                    if (output == null) {
                        throw new UncertaintyInputException("output name in comparison '" + comparison.label() + "'",
                                name, "one of the study's outputs " + outputByName.keySet());
                    }
                    if (unit == null) {
                        unit = output.unit();
                    } else if (!unit.equals(output.unit())) {
                        throw new UncertaintyInputException("unit of output '" + name + "' in comparison '"
                                + comparison.label() + "'", output.unit(),
                                "the unit of the other alternatives, " + unit
                                        + " (costs must be compared in one currency)");
                    }
                }
            }
            return new UncertaintyStudy(this);
        }
    }

    /** The inputs, in the order given. */
    public List<UncertainInput> inputs() {
        return inputs;
    }

    /** The outputs, in the order declared. */
    public List<OutputDefinition> outputs() {
        return outputs;
    }

    /** The model. */
    public UncertaintyModel model() {
        return model;
    }

    /** The target rank correlation, if any. */
    public Optional<RankCorrelationMatrix> rankCorrelation() {
        return Optional.ofNullable(rankCorrelation);
    }

    /** The sets of outputs that are costs of alternatives. */
    public List<AlternativeComparison> comparisons() {
        return comparisons;
    }

    /** The names of the inputs, in order. */
    public List<String> inputNames() {
        return inputs.stream().map(UncertainInput::name).toList();
    }

    /** The names of the outputs, in order. */
    public List<String> outputNames() {
        return outputs.stream().map(OutputDefinition::name).toList();
    }

    /** The input values of the base case: every input at its base value. */
    public InputValues baseCase() {
        double[] values = new double[inputs.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = inputs.get(i).baseValue();
        }
        List<String> names = inputNames();
        return new InputValues(names, InputValues.indexOf(names), values);
    }
}
