package eluvia.design.uncertainty;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;

/**
 * Draws the sample matrix of a simulation in advance, from one generator, in a fixed order: so
 * the same seed gives the same matrix and the evaluation order (and the number of threads)
 * cannot change any result.
 */
final class SampleGenerator {
    /**
     * Uniform numbers are kept within [2^-53, 1 - 2^-53], so an unbounded distribution's
     * quantile stays finite (about 8.2 standard deviations from the mean of a normal input).
     */
    static final double SMALLEST_PROBABILITY = 0x1.0p-53;

    private SampleGenerator() {
    }

    /**
     * The sample, column by column (one column of {@code runCount} values per input, in the unit
     * of that input).
     */
    static double[][] generate(List<UncertainInput> inputs, RankCorrelationMatrix rankCorrelation,
            SamplingMethod method, int runCount, long seed) {
        RandomGenerator random = new Well19937c(seed);
        double[][] columns = new double[inputs.size()][runCount];
        List<Integer> uncertain = new ArrayList<>();
        for (int j = 0; j < inputs.size(); j++) {
            UncertainInput input = inputs.get(j);
            double[] column = columns[j];
            if (input.isFixed()) {
                Arrays.fill(column, input.baseValue());
                continue;
            }
            uncertain.add(j);
            int[] strata = method == SamplingMethod.LATIN_HYPERCUBE ? permutation(runCount, random) : null;
            for (int i = 0; i < runCount; i++) {
                double u = strata == null ? random.nextDouble() : (strata[i] + random.nextDouble()) / runCount;
                column[i] = input.valueAt(Math.min(1 - SMALLEST_PROBABILITY, Math.max(SMALLEST_PROBABILITY, u)));
            }
        }
        if (rankCorrelation != null) {
            correlate(inputs, rankCorrelation, uncertain, columns, random);
        }
        return columns;
    }

    private static void correlate(List<UncertainInput> inputs, RankCorrelationMatrix rankCorrelation,
            List<Integer> uncertain, double[][] columns, RandomGenerator random) {
        int k = uncertain.size();
        int runCount = columns[0].length;
        if (runCount <= k + 1) {
            throw new UncertaintyInputException("number of Monte Carlo runs", runCount,
                    "more than " + (k + 1) + " (the number of uncertain inputs plus 1) when a rank correlation is set");
        }
        double[][] spearman = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                String first = inputs.get(uncertain.get(a)).name();
                String second = inputs.get(uncertain.get(b)).name();
                boolean bothNamed = rankCorrelation.inputNames().contains(first)
                        && rankCorrelation.inputNames().contains(second);
                spearman[a][b] = a == b ? 1 : bothNamed ? rankCorrelation.coefficient(first, second) : 0;
            }
        }
        double[][] sub = new double[k][];
        for (int a = 0; a < k; a++) {
            sub[a] = columns[uncertain.get(a)];
        }
        ImanConover.rearrange(sub, RankCorrelationMatrix.pearsonOfNormalScores(spearman), random);
    }

    /** A uniformly random permutation of 0 .. n-1 (Fisher-Yates, Durstenfeld's form). */
    static int[] permutation(int n, RandomGenerator random) {
        int[] values = new int[n];
        for (int i = 0; i < n; i++) {
            values[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int swap = values[i];
            values[i] = values[j];
            values[j] = swap;
        }
        return values;
    }
}
