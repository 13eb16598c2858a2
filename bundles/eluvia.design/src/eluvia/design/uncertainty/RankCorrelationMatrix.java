package eluvia.design.uncertainty;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * The target rank (Spearman) correlation between uncertain inputs, imposed on the sample by the
 * method of Iman and Conover (1982, Commun. Statist. Simul. Comput. 11:311). Entries are
 * dimensionless, from -1 to 1. Inputs of a study that the matrix does not name are independent
 * of the others.
 *
 * <p>The matrix must be a valid correlation matrix: symmetric, with a unit diagonal and positive
 * definite (which also rules out coefficients of exactly -1 or 1: describe perfectly correlated
 * quantities with one input). The engine sets the Pearson correlation of the normal scores it
 * rearranges to 2 sin(pi rho_S / 6), the Pearson correlation of a bivariate normal pair whose
 * Spearman correlation is rho_S (Pearson 1907, quoted from memory), so that the sample's rank
 * correlation meets the target and not the slightly smaller value the scores' Pearson target
 * would give.
 */
public final class RankCorrelationMatrix {
    /** Tolerance of the symmetry and unit-diagonal checks, absolute, dimensionless. */
    public static final double ENTRY_TOLERANCE = 1e-12;
    /** The smallest eigenvalue accepted as positive definite, dimensionless. */
    public static final double MIN_EIGENVALUE = 1e-10;

    private final List<String> inputNames;
    private final double[][] spearman;

    private RankCorrelationMatrix(List<String> inputNames, double[][] spearman) {
        this.inputNames = inputNames;
        this.spearman = spearman;
    }

    /**
     * The matrix over the named inputs.
     *
     * @param inputNames the inputs, in the order of the rows and columns; unique, at least two
     * @param spearman   the target Spearman correlations, dimensionless; symmetric, unit diagonal,
     *                   positive definite
     */
    public static RankCorrelationMatrix of(List<String> inputNames, double[][] spearman) {
        UncertaintyInputException.requireNonNull("input names of the rank correlation matrix", inputNames);
        UncertaintyInputException.requireNonNull("rank correlation matrix", spearman);
        List<String> names = new ArrayList<>(inputNames.size());
        Set<String> seen = new HashSet<>();
        for (String name : inputNames) {
            UncertaintyInputException.requireName("input name in the rank correlation matrix", name);
            if (!seen.add(name)) {
                throw new UncertaintyInputException("input name in the rank correlation matrix", name,
                        "each input named once");
            }
            names.add(name);
        }
        if (names.size() < 2) {
            throw new UncertaintyInputException("number of inputs in the rank correlation matrix", names.size(),
                    "2 or more (a single input has no correlation to set)");
        }
        int k = names.size();
        if (spearman.length != k) {
            throw new UncertaintyInputException("number of rows of the rank correlation matrix", spearman.length,
                    "exactly " + k + ", one per input named " + names);
        }
        double[][] copy = new double[k][];
        for (int i = 0; i < k; i++) {
            if (spearman[i] == null || spearman[i].length != k) {
                throw new UncertaintyInputException("number of columns in row " + (i + 1)
                        + " of the rank correlation matrix", spearman[i] == null ? null : spearman[i].length,
                        "exactly " + k + ", one per input named " + names);
            }
            copy[i] = spearman[i].clone();
        }
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                double value = copy[i][j];
                String entry = "rank correlation of '" + names.get(i) + "' with '" + names.get(j) + "'";
                if (!(value >= -1 && value <= 1)) {
                    throw new UncertaintyInputException(entry + " (dimensionless)", value, "from -1 to 1");
                }
                if (i == j && Math.abs(value - 1) > ENTRY_TOLERANCE) {
                    throw new UncertaintyInputException(entry + " (diagonal, dimensionless)", value,
                            "exactly 1 (every input is perfectly correlated with itself)");
                }
                if (j > i && Math.abs(value - copy[j][i]) > ENTRY_TOLERANCE) {
                    throw new UncertaintyInputException(entry + " (dimensionless)", value,
                            "equal to the rank correlation of '" + names.get(j) + "' with '" + names.get(i)
                                    + "', " + copy[j][i] + " (the matrix must be symmetric)");
                }
            }
        }
        requirePositiveDefinite(names, copy, "rank correlation matrix");
        requirePositiveDefinite(names, pearsonOfNormalScores(copy),
                "Pearson correlation matrix 2 sin(pi rho/6) of the normal scores of the rank correlation matrix");
        return new RankCorrelationMatrix(List.copyOf(names), copy);
    }

    private static void requirePositiveDefinite(List<String> names, double[][] matrix, String what) {
        double[] eigenvalues = new EigenDecomposition(new Array2DRowRealMatrix(matrix, false)).getRealEigenvalues();
        double smallest = Arrays.stream(eigenvalues).min().orElseThrow();
        if (!(smallest > MIN_EIGENVALUE)) {
            throw new UncertaintyInputException("smallest eigenvalue of the " + what + " of inputs " + names,
                    smallest, "greater than " + MIN_EIGENVALUE
                            + " (a correlation matrix must be positive definite): the coefficients contradict"
                            + " each other or one is -1 or 1; lower the largest magnitudes, or describe"
                            + " perfectly correlated quantities with one input");
        }
    }

    static double[][] pearsonOfNormalScores(double[][] spearman) {
        int k = spearman.length;
        double[][] pearson = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                pearson[i][j] = i == j ? 1 : 2 * Math.sin(Math.PI * spearman[i][j] / 6);
            }
        }
        return pearson;
    }

    /** A builder that starts from independent inputs and sets one pair at a time. */
    public static Builder builder() {
        return new Builder();
    }

    /** Collects pairs of inputs with their target rank correlation; unset pairs are 0. */
    public static final class Builder {
        private final Map<String, Map<String, Double>> pairs = new LinkedHashMap<>();
        private final List<String> names = new ArrayList<>();

        private Builder() {
        }

        /**
         * Sets the target rank correlation of two different inputs.
         *
         * @param first          an input name
         * @param second         another input name
         * @param rankCorrelation dimensionless, greater than -1 and less than 1
         */
        public Builder pair(String first, String second, double rankCorrelation) {
            UncertaintyInputException.requireName("input name in the rank correlation matrix", first);
            UncertaintyInputException.requireName("input name in the rank correlation matrix", second);
            if (first.equals(second)) {
                throw new UncertaintyInputException("second input of a rank correlation pair", second,
                        "a different input from the first (an input's correlation with itself is 1)");
            }
            if (pairs.getOrDefault(first, Map.of()).containsKey(second)) {
                throw new UncertaintyInputException("rank correlation pair", first + " / " + second,
                        "each pair set once");
            }
            for (String name : List.of(first, second)) {
                if (!names.contains(name)) {
                    names.add(name);
                }
            }
            pairs.computeIfAbsent(first, n -> new LinkedHashMap<>()).put(second, rankCorrelation);
            pairs.computeIfAbsent(second, n -> new LinkedHashMap<>()).put(first, rankCorrelation);
            return this;
        }

        /** The checked matrix over every input named in a pair, in the order first named. */
        public RankCorrelationMatrix build() {
            int k = names.size();
            double[][] matrix = new double[k][k];
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    matrix[i][j] = i == j ? 1 : pairs.getOrDefault(names.get(i), Map.of()).getOrDefault(names.get(j), 0.0);
                }
            }
            return of(names, matrix);
        }
    }

    /** The inputs the matrix names, in the order of its rows. */
    public List<String> inputNames() {
        return inputNames;
    }

    /** The target rank correlation of two named inputs (1 for an input with itself); dimensionless. */
    public double coefficient(String first, String second) {
        return spearman[indexOf(first)][indexOf(second)];
    }

    private int indexOf(String name) {
        int index = inputNames.indexOf(name);
        if (index < 0) {
            throw new UncertaintyInputException("input name", name, "one of " + inputNames);
        }
        return index;
    }

    /** The matrix, rows and columns in the order of {@link #inputNames()} (a copy). */
    public double[][] toArray() {
        double[][] copy = new double[spearman.length][];
        for (int i = 0; i < spearman.length; i++) {
            copy[i] = spearman[i].clone();
        }
        return copy;
    }

    @Override
    public String toString() {
        return "rank correlation of " + inputNames + ": " + Arrays.deepToString(spearman);
    }
}
