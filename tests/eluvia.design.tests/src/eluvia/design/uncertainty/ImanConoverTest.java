package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Rank correlation induced by the Iman-Conover method, and the checks of the target matrix. */
final class ImanConoverTest {
    private static final int RUNS = 5_000;
    private static final double STANDARD_ERRORS = 4;

    private static final List<UncertainInput> INPUTS = List.of(
            UncertainInput.normal("flux", "m/d", 0.3, 0.05),
            UncertainInput.lognormal("Koc", "L/kg", 60, 2),
            UncertainInput.triangular("theta", "1", 0.25, 0.3, 0.4),
            UncertainInput.uniform("thickness", "m", 2, 4));

    /** A valid target (eigenvalues all positive, checked by the class itself). */
    private static final double[][] TARGET = {
            { 1, 0.7, -0.4, 0 },
            { 0.7, 1, -0.2, 0.3 },
            { -0.4, -0.2, 1, 0 },
            { 0, 0.3, 0, 1 } };

    private static RankCorrelationMatrix target() {
        return RankCorrelationMatrix.of(List.of("flux", "Koc", "theta", "thickness"), TARGET);
    }

    @ParameterizedTest
    @EnumSource(SamplingMethod.class)
    void sampleRankCorrelationMeetsTheTarget(SamplingMethod method) {
        double[][] columns = SampleGenerator.generate(INPUTS, target(), method, RUNS, 2024);
        for (int i = 0; i < 4; i++) {
            for (int j = i + 1; j < 4; j++) {
                double rho = TARGET[i][j];
                // the target, within four standard errors of a Spearman estimate (Fieller et al. 1957);
                // sample Spearman from Commons Math 3.6.1 SpearmansCorrelation
                assertEquals(rho, new SpearmansCorrelation().correlation(columns[i], columns[j]),
                        STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(rho, RUNS), method + " " + i + "," + j);
            }
        }
    }

    @Test
    void averageRankCorrelationOverRepeatedSamplesMeetsTheTargetClosely() {
        // 20 independent samples of 1,000 runs: the mean rank correlation must meet the target within
        // four standard errors of that mean, estimated in the test from the spread of the 20 values.
        // This is tight enough to tell the target 0.7 from (6 / pi) asin(0.7 / 2) = 0.683, which the
        // scores would give without the Pearson-Spearman adjustment.
        List<UncertainInput> inputs = List.of(UncertainInput.normal("a", "m", 0, 1), UncertainInput.lognormal("b", "m", 1, 2));
        RankCorrelationMatrix target = RankCorrelationMatrix.builder().pair("a", "b", 0.7).build();
        int repetitions = 20;
        double[] values = new double[repetitions];
        for (int seed = 0; seed < repetitions; seed++) {
            double[][] columns = SampleGenerator.generate(inputs, target, SamplingMethod.LATIN_HYPERCUBE, 1_000, seed);
            values[seed] = new SpearmansCorrelation().correlation(columns[0], columns[1]);
        }
        // the target, Iman and Conover (1982)
        assertEquals(0.7, SampleMoments.mean(values), STANDARD_ERRORS * SampleMoments.standardErrorOfMean(values));
        assertTrue(STANDARD_ERRORS * SampleMoments.standardErrorOfMean(values) < 0.7 - 6 / Math.PI * Math.asin(0.35));
    }

    @ParameterizedTest
    @EnumSource(SamplingMethod.class)
    void rearrangementKeepsEveryColumnsValues(SamplingMethod method) {
        double[][] independent = SampleGenerator.generate(INPUTS, null, method, RUNS, 77);
        double[][] correlated = SampleGenerator.generate(INPUTS, target(), method, RUNS, 77);
        for (int j = 0; j < INPUTS.size(); j++) {
            double[] a = independent[j].clone();
            double[] b = correlated[j].clone();
            Arrays.sort(a);
            Arrays.sort(b);
            // the same values in another order (Iman and Conover 1982: the marginals are untouched)
            assertArrayEquals(a, b, 0, INPUTS.get(j).name());
        }
    }

    @Test
    void pearsonCorrelationOfNormalInputsFollowsTheSpearmanRelation() {
        double rhoS = 0.6;
        List<UncertainInput> normals = List.of(UncertainInput.normal("a", "m", 10, 2),
                UncertainInput.normal("b", "m", -3, 0.5));
        double[][] columns = SampleGenerator.generate(normals, RankCorrelationMatrix.builder().pair("a", "b", rhoS).build(),
                SamplingMethod.LATIN_HYPERCUBE, RUNS, 5);
        // rho_P = 2 sin(pi rho_S / 6) for a bivariate normal (Pearson 1907, from memory); tolerance
        // four standard errors (1 - rho^2) / sqrt(n) of a Pearson estimate (common result)
        double rhoP = 2 * Math.sin(Math.PI * rhoS / 6);
        assertEquals(rhoP, SampleMoments.pearson(columns[0], columns[1]),
                STANDARD_ERRORS * (1 - rhoP * rhoP) / Math.sqrt(RUNS));
        assertEquals(rhoS, new SpearmansCorrelation().correlation(columns[0], columns[1]),
                STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(rhoS, RUNS));
    }

    @Test
    void inputsLeftOutOfTheMatrixStayIndependent() {
        List<UncertainInput> inputs = List.of(UncertainInput.normal("a", "m", 0, 1),
                UncertainInput.fixed("f", "m", 3), UncertainInput.normal("b", "m", 0, 1),
                UncertainInput.uniform("c", "m", 0, 1));
        double[][] columns = SampleGenerator.generate(inputs, RankCorrelationMatrix.builder().pair("a", "c", -0.8).build(),
                SamplingMethod.LATIN_HYPERCUBE, RUNS, 8);
        SpearmansCorrelation spearman = new SpearmansCorrelation();
        // target -0.8 and 0 for the others, within four standard errors (Fieller et al. 1957)
        assertEquals(-0.8, spearman.correlation(columns[0], columns[3]),
                STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(-0.8, RUNS));
        assertEquals(0, spearman.correlation(columns[0], columns[2]),
                STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(0, RUNS));
        assertEquals(0, spearman.correlation(columns[2], columns[3]),
                STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(0, RUNS));
        // the fixed input keeps its value
        assertTrue(Arrays.stream(columns[1]).allMatch(v -> v == 3));
    }

    @Test
    void builderFillsUnsetPairsWithZero() {
        RankCorrelationMatrix matrix = RankCorrelationMatrix.builder().pair("a", "b", 0.5).pair("c", "a", -0.3).build();
        assertEquals(List.of("a", "b", "c"), matrix.inputNames());
        // the values set, their mirror, 0 for the unset pair and 1 on the diagonal
        assertArrayEquals(new double[][] { { 1, 0.5, -0.3 }, { 0.5, 1, 0 }, { -0.3, 0, 1 } }, matrix.toArray());
        assertEquals(-0.3, matrix.coefficient("a", "c"), 0);
        assertEquals(1, matrix.coefficient("b", "b"), 0);
    }

    @Test
    void pearsonTargetOfTheScoresIsTwoSinPiRhoOverSix() {
        double[][] pearson = RankCorrelationMatrix.pearsonOfNormalScores(new double[][] { { 1, 0.5 }, { 0.5, 1 } });
        // 2 sin(pi / 12) = 0.5176380902050415 (Pearson 1907 relation, value computed by hand)
        assertEquals(0.5176380902050415, pearson[0][1], 1e-15);
        assertEquals(1, pearson[1][1], 0);
    }

    @Test
    void invalidMatricesAreRejectedWithTheReason() {
        List<String> two = List.of("a", "b");
        List<String> three = List.of("a", "b", "c");
        assertAll(
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 1, 0.5 }, { 0.4, 1 } }),
                        "rank correlation of 'a' with 'b' (dimensionless)", "symmetric"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 0.9, 0.5 }, { 0.5, 1 } }),
                        "rank correlation of 'a' with 'a' (diagonal, dimensionless)", "exactly 1"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 1, 1.5 }, { 1.5, 1 } }),
                        "rank correlation of 'a' with 'b' (dimensionless)", "from -1 to 1"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 1, Double.NaN }, { Double.NaN, 1 } }),
                        "rank correlation of 'a' with 'b' (dimensionless)", "from -1 to 1"),
                () -> rejects(() -> RankCorrelationMatrix.of(three,
                        new double[][] { { 1, 0.9, -0.9 }, { 0.9, 1, 0.9 }, { -0.9, 0.9, 1 } }),
                        "smallest eigenvalue of the rank correlation matrix of inputs [a, b, c]", "positive definite"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 1, 1 }, { 1, 1 } }),
                        "smallest eigenvalue of the rank correlation matrix of inputs [a, b]", "one input"),
                () -> rejects(() -> RankCorrelationMatrix.of(three, new double[][] { { 1, 0 }, { 0, 1 } }),
                        "number of rows of the rank correlation matrix", "exactly 3"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 1, 0 }, { 0 } }),
                        "number of columns in row 2 of the rank correlation matrix", "exactly 2"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, new double[][] { { 1, 0 }, null }),
                        "number of columns in row 2 of the rank correlation matrix", "exactly 2"),
                () -> rejects(() -> RankCorrelationMatrix.of(List.of("a", "a"), new double[][] { { 1, 0 }, { 0, 1 } }),
                        "input name in the rank correlation matrix", "once"),
                () -> rejects(() -> RankCorrelationMatrix.of(List.of("a", " "), new double[][] { { 1, 0 }, { 0, 1 } }),
                        "input name in the rank correlation matrix", "non-blank"),
                () -> rejects(() -> RankCorrelationMatrix.of(List.of("a"), new double[][] { { 1 } }),
                        "number of inputs in the rank correlation matrix", "2 or more"),
                () -> rejects(() -> RankCorrelationMatrix.of(null, TARGET),
                        "input names of the rank correlation matrix", "not null"),
                () -> rejects(() -> RankCorrelationMatrix.of(two, null), "rank correlation matrix", "not null"),
                () -> rejects(() -> RankCorrelationMatrix.builder().pair("a", "a", 0.5),
                        "second input of a rank correlation pair", "different"),
                () -> rejects(() -> RankCorrelationMatrix.builder().pair("a", "b", 0.5).pair("a", "b", 0.2),
                        "rank correlation pair", "once"),
                () -> rejects(() -> RankCorrelationMatrix.builder().pair("a", "b", -1.0).build(),
                        "smallest eigenvalue of the rank correlation matrix of inputs [a, b]", "positive definite"),
                () -> rejects(() -> target().coefficient("flux", "nothing"), "input name", "one of"));
    }

    @Test
    void tooFewRunsForTheCorrelatedInputsAreRejected() {
        // 4 uncertain inputs need more than 5 runs for the score correlation matrix to be positive definite
        rejects(() -> SampleGenerator.generate(INPUTS, target(), SamplingMethod.LATIN_HYPERCUBE, 5, 1),
                "number of Monte Carlo runs", "more than 5");
        assertEquals(6, SampleGenerator.generate(INPUTS, target(), SamplingMethod.LATIN_HYPERCUBE, 6, 1)[0].length);
    }

    private static void rejects(Executable executable, String quantity, String rangeWords) {
        UncertaintyInputException e = assertThrows(UncertaintyInputException.class, executable);
        assertEquals(quantity, e.quantity(), e.getMessage());
        assertTrue(e.allowedRange().contains(rangeWords), e.getMessage());
    }
}
