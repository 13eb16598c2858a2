package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The runner: statistics of models with closed-form answers, reproducibility across thread
 * counts, failed runs, progress and cancellation.
 */
final class MonteCarloRunnerTest {
    private static final double STANDARD_ERRORS = 4;

    private static final double A = 3;
    private static final double B = -2;
    private static final double MEAN_1 = 10;
    private static final double SD_1 = 2;
    private static final double MEAN_2 = 5;
    private static final double SD_2 = 1.5;

    private static UncertaintyStudy linearStudy(RankCorrelationMatrix correlation) {
        return UncertaintyStudy.builder()
                .input(UncertainInput.normal("x1", "m", MEAN_1, SD_1))
                .input(UncertainInput.normal("x2", "m", MEAN_2, SD_2))
                .input(UncertainInput.fixed("c", "m", 7))
                .output("y", "m")
                .rankCorrelation(correlation)
                .model(in -> Map.of("y", A * in.get("x1") + B * in.get("x2") + in.get("c")))
                .build();
    }

    private static SimulationSettings settings(int runs, SamplingMethod method) {
        return new SimulationSettings(runs, method, 99, 2, 0);
    }

    @ParameterizedTest
    @EnumSource(SamplingMethod.class)
    void linearModelOfIndependentNormalsHasTheClosedFormMeanAndSd(SamplingMethod method) {
        int runs = 4_000;
        OutputStatistics y = new MonteCarloRunner(settings(runs, method)).run(linearStudy(null)).statistics("y");
        // exact: E[y] = a mu1 + b mu2 + c, sd = sqrt(a^2 s1^2 + b^2 s2^2); tolerances four standard
        // errors of the plain Monte Carlo estimates, sd / sqrt(n) and sd / sqrt(2 (n - 1)) for a normal y
        double sd = Math.sqrt(A * A * SD_1 * SD_1 + B * B * SD_2 * SD_2);
        assertEquals(A * MEAN_1 + B * MEAN_2 + 7, y.mean(), STANDARD_ERRORS * sd / Math.sqrt(runs));
        assertEquals(sd, y.standardDeviation(), STANDARD_ERRORS * sd / Math.sqrt(2.0 * (runs - 1)));
        assertEquals(runs, y.sampleCount());
        assertEquals("m", y.unit());
    }

    @ParameterizedTest
    @EnumSource(SamplingMethod.class)
    void linearModelOfRankCorrelatedNormalsHasTheClosedFormSd(SamplingMethod method) {
        int runs = 4_000;
        double rhoS = 0.6;
        UncertaintyResult result = new MonteCarloRunner(settings(runs, method))
                .run(linearStudy(RankCorrelationMatrix.builder().pair("x1", "x2", rhoS).build()));
        // rho_P = 2 sin(pi rho_S / 6) for normals (Pearson 1907, from memory);
        // sd = sqrt(a^2 s1^2 + b^2 s2^2 + 2 a b rho_P s1 s2) (variance of a linear combination, exact)
        double rhoP = 2 * Math.sin(Math.PI * rhoS / 6);
        double sd = Math.sqrt(A * A * SD_1 * SD_1 + B * B * SD_2 * SD_2 + 2 * A * B * rhoP * SD_1 * SD_2);
        OutputStatistics y = result.statistics("y");
        assertEquals(sd, y.standardDeviation(), STANDARD_ERRORS * sd / Math.sqrt(2.0 * (runs - 1)));
        assertEquals(A * MEAN_1 + B * MEAN_2 + 7, y.mean(), STANDARD_ERRORS * sd / Math.sqrt(runs));
        // and the sd without the correlation lies well outside that tolerance, so the check can fail
        double sdIndependent = Math.sqrt(A * A * SD_1 * SD_1 + B * B * SD_2 * SD_2);
        assertTrue(Math.abs(sdIndependent - y.standardDeviation()) > 10 * sd / Math.sqrt(2.0 * (runs - 1)));
    }

    @Test
    void percentilesOfAUniformInputPassedThrough() {
        int runs = 1_000;
        double min = 2;
        double max = 7;
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "m", min, max))
                .output("y", "m").model(in -> Map.of("y", in.get("x"))).build();
        OutputStatistics lhs = new MonteCarloRunner(settings(runs, SamplingMethod.LATIN_HYPERCUBE)).run(study)
                .statistics("y");
        // hand: Pp = min + p (max - min); with one Latin hypercube point in each 1/n stratum the R_7
        // percentile lies within (max - min) / n of it
        double stratum = (max - min) / runs;
        assertAll(
                () -> assertEquals(min + 0.1 * (max - min), lhs.p10(), stratum),
                () -> assertEquals(min + 0.5 * (max - min), lhs.p50(), stratum),
                () -> assertEquals(min + 0.9 * (max - min), lhs.p90(), stratum),
                () -> assertEquals(min, lhs.min(), stratum),
                () -> assertEquals(max, lhs.max(), stratum),
                () -> assertTrue(lhs.min() >= min && lhs.max() <= max));
        OutputStatistics plain = new MonteCarloRunner(settings(runs, SamplingMethod.PLAIN_MONTE_CARLO)).run(study)
                .statistics("y");
        for (double p : new double[] { 0.1, 0.5, 0.9 }) {
            // standard error of a sample quantile sqrt(p (1 - p) / n) / f(x_p), f = 1 / (max - min) (common result)
            double tolerance = STANDARD_ERRORS * Math.sqrt(p * (1 - p) / runs) * (max - min);
            double estimate = p == 0.1 ? plain.p10() : p == 0.5 ? plain.p50() : plain.p90();
            assertEquals(min + p * (max - min), estimate, tolerance, "P" + (int) (100 * p));
        }
    }

    @Test
    void percentilesFollowTheNamedDefinition() {
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 1))
                .output("y", "1").model(in -> Map.of("y", in.get("x"))).build();
        UncertaintyResult result = new MonteCarloRunner(settings(37, SamplingMethod.PLAIN_MONTE_CARLO)).run(study);
        double[] sorted = result.runs().completedOutputValues("y");
        java.util.Arrays.sort(sorted);
        // Hyndman and Fan (1996) definition 7 written out: h = (n - 1) p (from 0), interpolate
        double h = (sorted.length - 1) * 0.9;
        int lo = (int) Math.floor(h);
        double expected = sorted[lo] + (h - lo) * (sorted[lo + 1] - sorted[lo]);
        assertEquals(expected, result.statistics("y").p90(), 1e-15);
        assertEquals(sorted[18], result.statistics("y").p50(), 0);
    }

    @Test
    void histogramCountsEveryCompletedRunInItsBin() {
        int runs = 1_000;
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.triangular("x", "m", 0, 1, 4))
                .output("y", "m2").model(in -> Map.of("y", in.get("x") * in.get("x"))).build();
        UncertaintyResult result = new MonteCarloRunner(settings(runs, SamplingMethod.LATIN_HYPERCUBE)).run(study);
        Histogram histogram = result.statistics("y").histogram();
        double[] values = result.runs().completedOutputValues("y");
        // Sturges (1926): ceil(log2 1000) + 1 = 11 bins
        assertEquals(11, histogram.binCount());
        assertEquals(runs, histogram.totalCount());
        assertEquals(result.statistics("y").min(), histogram.lowerEdge(), 0);
        assertEquals(result.statistics("y").max(), histogram.upperEdge(), 0);
        for (int bin = 0; bin < histogram.binCount(); bin++) {
            double lower = histogram.binLowerEdge(bin);
            double upper = histogram.binUpperEdge(bin);
            boolean last = bin == histogram.binCount() - 1;
            long count = java.util.Arrays.stream(values).filter(v -> v >= lower && (last ? v <= upper : v < upper))
                    .count();
            // recounted in the test from the bin edges
            assertEquals(count, (long) histogram.counts().get(bin), "bin " + bin);
        }
        UncertaintyResult fixedBins = new MonteCarloRunner(settings(runs, SamplingMethod.LATIN_HYPERCUBE)
                .withHistogramBinCount(25)).run(study);
        assertEquals(25, fixedBins.statistics("y").histogram().binCount());
    }

    @Test
    void constantOutputHasOneBinAndNoRankCorrelation() {
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "m", 0, 1))
                .output("constant", "m").model(in -> Map.of("constant", 4.0)).build();
        UncertaintyResult result = new MonteCarloRunner(settings(200, SamplingMethod.LATIN_HYPERCUBE)).run(study);
        OutputStatistics s = result.statistics("constant");
        // the constant itself, zero spread
        assertEquals(4.0, s.p10(), 0);
        assertEquals(4.0, s.p90(), 0);
        assertEquals(0.0, s.standardDeviation(), 0);
        assertEquals(List.of(200), s.histogram().counts());
        assertEquals(0.0, s.histogram().binWidth(), 0);
        assertTrue(Double.isNaN(result.rankCorrelations().coefficient("x", "constant")));
    }

    @Test
    void rankCorrelationsOfInputsWithOutputs() {
        int runs = 4_000;
        UncertaintyStudy study = UncertaintyStudy.builder()
                .input(UncertainInput.normal("x1", "m", MEAN_1, SD_1))
                .input(UncertainInput.normal("x2", "m", MEAN_2, SD_2))
                .input(UncertainInput.uniform("unused", "m", 0, 1))
                .input(UncertainInput.fixed("c", "m", 1))
                .output("y", "m").output("exp x1", "1")
                .model(in -> Map.of("y", A * in.get("x1") + B * in.get("x2"), "exp x1", Math.exp(in.get("x1"))))
                .build();
        RankCorrelationTable table = new MonteCarloRunner(settings(runs, SamplingMethod.LATIN_HYPERCUBE)).run(study)
                .rankCorrelations();
        double sdY = Math.sqrt(A * A * SD_1 * SD_1 + B * B * SD_2 * SD_2);
        double pearson1 = A * SD_1 / sdY;
        double pearson2 = B * SD_2 / sdY;
        // Spearman of a bivariate normal pair (6 / pi) asin(rho_P / 2) (Pearson 1907, from memory),
        // rho_P = a s1 / sd_y (exact for a linear combination); four standard errors (Fieller et al. 1957)
        double spearman1 = 6 / Math.PI * Math.asin(pearson1 / 2);
        double spearman2 = 6 / Math.PI * Math.asin(pearson2 / 2);
        assertAll(
                () -> assertEquals(List.of("x1", "x2", "unused"), table.inputNames()),
                () -> assertEquals(spearman1, table.coefficient("x1", "y"),
                        STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(spearman1, runs)),
                () -> assertEquals(spearman2, table.coefficient("x2", "y"),
                        STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(spearman2, runs)),
                () -> assertEquals(0, table.coefficient("unused", "y"),
                        STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(0, runs)),
                // a monotone function of the input has the same ranks: exactly 1
                () -> assertEquals(1.0, table.coefficient("x1", "exp x1"), 1e-12),
                () -> assertThrows(UncertaintyInputException.class, () -> table.coefficient("c", "y")),
                () -> assertThrows(UncertaintyInputException.class, () -> table.coefficient("x1", "z")));
    }

    @Test
    void theSameSeedGivesIdenticalResultsWithAnyNumberOfThreads() {
        UncertaintyStudy study = UncertaintyStudy.builder()
                .input(UncertainInput.normal("x1", "m", 1, 0.3))
                .input(UncertainInput.lognormal("x2", "m", 2, 1.5))
                .input(UncertainInput.triangular("x3", "m", 0, 1, 2))
                .rankCorrelation(RankCorrelationMatrix.builder().pair("x1", "x2", 0.5).pair("x2", "x3", -0.3).build())
                .output("sum", "m").output("other", "m")
                .compareAlternatives("cheaper", List.of("sum", "other"))
                .model(in -> {
                    if (in.get("x3") > 1.8) {
                        throw new IllegalArgumentException("x3 too large");
                    }
                    return Map.of("sum", in.get("x1") + in.get("x2") + in.get("x3"), "other", 2 * in.get("x2") * in.get("x1"));
                })
                .build();
        SimulationSettings base = new SimulationSettings(3_000, SamplingMethod.LATIN_HYPERCUBE, 123, 1, 0);
        UncertaintyResult one = new MonteCarloRunner(base).run(study);
        for (int threads : new int[] { 2, 3, 8 }) {
            UncertaintyResult many = new MonteCarloRunner(base.withThreadCount(threads)).run(study);
            assertArrayEquals(one.runs().outputColumn("sum"), many.runs().outputColumn("sum"), 0);
            assertArrayEquals(one.runs().outputColumn("other"), many.runs().outputColumn("other"), 0);
            assertArrayEquals(one.runs().inputColumn("x2"), many.runs().inputColumn("x2"), 0);
            assertEquals(one.outputStatistics(), many.outputStatistics());
            assertEquals(one.failedRuns(), many.failedRuns());
            assertEquals(one.tornados(), many.tornados());
            assertEquals(one.rankCorrelations(), many.rankCorrelations());
            assertEquals(one.cheapestAlternatives(), many.cheapestAlternatives());
        }
        UncertaintyResult otherSeed = new MonteCarloRunner(base.withSeed(124)).run(study);
        assertNotEquals(one.statistics("sum").mean(), otherSeed.statistics("sum").mean());
    }

    @Test
    void failingRunsAreRecordedWithTheReasonAndCounted() {
        int runs = 1_000;
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 1))
                .input(UncertainInput.normal("z", "1", 0, 1))
                .output("y", "1")
                .model(in -> {
                    if (in.get("x") > 0.8) {
                        throw new IllegalStateException("no convergence at x = " + in.get("x"));
                    }
                    return Map.of("y", in.get("x"));
                })
                .build();
        UncertaintyResult result = new MonteCarloRunner(settings(runs, SamplingMethod.LATIN_HYPERCUBE)).run(study);
        double[] x = result.runs().inputColumn("x");
        long above = java.util.Arrays.stream(x).filter(v -> v > 0.8).count();
        // counted from the sample in the test; Latin hypercube puts exactly 200 of 1,000 strata above 0.8
        assertEquals(above, result.failedRunCount());
        assertEquals(200, above, 1);
        assertEquals(runs - above, result.completedRunCount());
        assertEquals(runs, result.evaluatedRunCount());
        assertFalse(result.cancelled());
        FailedRun first = result.failedRuns().get(0);
        assertTrue(first.reason().startsWith("IllegalStateException: no convergence at x = "), first.reason());
        assertEquals(x[first.runIndex()], first.inputValues().get("x"), 0);
        assertEquals(List.of("x", "z"), List.copyOf(first.inputValues().keySet()));
        assertSame(RunStatus.FAILED, result.runs().status(first.runIndex()));
        assertTrue(Double.isNaN(result.runs().outputColumn("y")[first.runIndex()]));
        assertTrue(result.statistics("y").max() <= 0.8);
        assertEquals(runs - above, result.statistics("y").sampleCount());
    }

    @Test
    void missingNullAndNonFiniteOutputsAreFailures() {
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 3))
                .output("y", "1").output("w", "1")
                .model(in -> {
                    double x = in.get("x");
                    if (x < 1) {
                        return Map.of("y", x);
                    }
                    if (x < 2) {
                        return Map.of("y", x, "w", Double.NaN);
                    }
                    return null;
                })
                .build();
        UncertaintyResult result = new MonteCarloRunner(settings(300, SamplingMethod.LATIN_HYPERCUBE)).run(study);
        assertEquals(300, result.failedRunCount());
        assertEquals(0, result.completedRunCount());
        List<String> reasons = result.failedRuns().stream().map(FailedRun::reason).distinct().sorted().toList();
        assertEquals(List.of("the model gave no value for output 'w'", "the model gave output 'w' = NaN, not a finite number",
                "the model returned no outputs (null)"), reasons);
        assertTrue(Double.isNaN(result.statistics("y").mean()));
        assertEquals(0, result.statistics("y").sampleCount());
        assertTrue(Double.isNaN(result.rankCorrelations().coefficient("x", "y")));
    }

    @Test
    void anErrorFromTheModelStopsTheSimulation() {
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 1))
                .output("y", "1").model(in -> {
                    throw new AssertionError("broken model");
                }).build();
        AssertionError error = assertThrows(AssertionError.class,
                () -> new MonteCarloRunner(settings(100, SamplingMethod.LATIN_HYPERCUBE)).run(study));
        assertEquals("broken model", error.getMessage());
    }

    @Test
    void progressCountsEveryEvaluationUpToTheTotal() {
        List<int[]> calls = new ArrayList<>();
        ProgressSink sink = new ProgressSink() {
            @Override
            public void worked(int done, int total) {
                calls.add(new int[] { done, total });
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        };
        int runs = 2_000;
        UncertaintyResult result = new MonteCarloRunner(settings(runs, SamplingMethod.LATIN_HYPERCUBE))
                .run(linearStudy(null), sink);
        // runs plus 1 + 2 k tornado cases for k = 2 uncertain inputs
        int total = runs + 5;
        assertFalse(calls.isEmpty());
        int previous = 0;
        for (int[] call : calls) {
            assertEquals(total, call[1]);
            assertTrue(call[0] >= previous && call[0] <= total);
            previous = call[0];
        }
        assertEquals(total, calls.get(calls.size() - 1)[0]);
        assertFalse(result.cancelled());
    }

    @Test
    void cancellationStopsEarlyAndReturnsAPartialResult() {
        AtomicInteger evaluations = new AtomicInteger();
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 1))
                .output("y", "1").model(in -> {
                    evaluations.incrementAndGet();
                    return Map.of("y", in.get("x"));
                }).build();
        int[] atCancel = { -1 };
        int[] afterStop = { -1 };
        ProgressSink cancelAtOnce = new ProgressSink() {
            private boolean reported;

            @Override
            public void worked(int done, int total) {
                if (atCancel[0] >= 0 && afterStop[0] < 0) {
                    // the runner sets its stop flag as soon as cancelled() has answered true, so every
                    // call after that answer comes after the flag is set
                    afterStop[0] = evaluations.get();
                }
                reported = true;
            }

            @Override
            public boolean cancelled() {
                if (reported && atCancel[0] < 0) {
                    atCancel[0] = evaluations.get();
                }
                return reported;
            }
        };
        int runs = 1_000_000;
        int threads = 2;
        UncertaintyResult result = new MonteCarloRunner(new SimulationSettings(runs, SamplingMethod.PLAIN_MONTE_CARLO, 1,
                threads, 0)).run(study, cancelAtOnce);
        assertTrue(result.cancelled());
        // the workers stop before their next evaluation once the stop flag is set (class contract): after
        // that at most one evaluation per worker thread was already under way. How many ran before it
        // depends on how soon the calling thread got a core (it can lose it between reading the sink's
        // answer and setting the flag), so only the bound after the flag is checked
        assertTrue(atCancel[0] >= 0, "the cancel was never asked");
        assertTrue(afterStop[0] >= atCancel[0], "no progress report after the cancel");
        assertTrue(evaluations.get() <= afterStop[0] + threads,
                evaluations.get() + " evaluations, " + afterStop[0] + " when the stop flag was surely set");
        assertTrue(evaluations.get() < runs, evaluations.get() + " evaluations");
        assertEquals(evaluations.get(), result.evaluatedRunCount() + countTornadoEvaluations(result));
        int completed = 0;
        for (int i = 0; i < runs; i++) {
            if (result.runs().status(i) == RunStatus.COMPLETED) {
                completed++;
            }
        }
        assertEquals(completed, result.completedRunCount());
        assertEquals(completed, result.statistics("y").sampleCount());
    }

    private static int countTornadoEvaluations(UncertaintyResult result) {
        Tornado tornado = result.tornados().get(0);
        int count = tornado.baseFailure().isEmpty() ? 1 : 0;
        for (TornadoBar bar : tornado.bars()) {
            count += Double.isNaN(bar.outputAtLowInput()) ? 0 : 1;
            count += Double.isNaN(bar.outputAtHighInput()) ? 0 : 1;
        }
        return count;
    }

    @Test
    void cancellationBeforeTheStartEvaluatesNothing() {
        AtomicInteger evaluations = new AtomicInteger();
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 1))
                .output("y", "1").model(in -> {
                    evaluations.incrementAndGet();
                    return Map.of("y", in.get("x"));
                }).build();
        ProgressSink cancelled = new ProgressSink() {
            @Override
            public void worked(int done, int total) {
                // not expected
            }

            @Override
            public boolean cancelled() {
                return true;
            }
        };
        UncertaintyResult result = new MonteCarloRunner(settings(500, SamplingMethod.LATIN_HYPERCUBE)).run(study, cancelled);
        assertTrue(result.cancelled());
        assertEquals(0, evaluations.get());
        assertEquals(0, result.evaluatedRunCount());
        assertSame(RunStatus.NOT_EVALUATED, result.runs().status(0));
        assertTrue(Double.isNaN(result.statistics("y").p50()));
        assertTrue(Double.isNaN(result.tornado("y").baseOutputValue()));
        assertEquals("not evaluated: the simulation was cancelled", result.tornado("y").baseFailure().orElseThrow());
    }

    @Test
    void interruptingTheCallerCancels() {
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.uniform("x", "1", 0, 1))
                .output("y", "1").model(in -> Map.of("y", in.get("x"))).build();
        Thread.currentThread().interrupt();
        UncertaintyResult result;
        try {
            result = new MonteCarloRunner(settings(1_000_000, SamplingMethod.PLAIN_MONTE_CARLO)).run(study);
        } finally {
            assertTrue(Thread.interrupted(), "the interruption is re-asserted (and cleared here)");
        }
        assertTrue(result.cancelled());
        assertTrue(result.evaluatedRunCount() < 1_000_000);
    }

    @Test
    void resultLookupsRejectUnknownNames() {
        UncertaintyResult result = new MonteCarloRunner(settings(50, SamplingMethod.LATIN_HYPERCUBE)).run(linearStudy(null));
        assertAll(
                () -> assertEquals(50, result.requestedRunCount()),
                () -> assertEquals(3, result.inputSummaries().size()),
                () -> assertEquals(MEAN_1, result.inputSummary("x1").p50(), 1e-12),
                () -> assertThrows(UncertaintyInputException.class, () -> result.statistics("nothing")),
                () -> assertThrows(UncertaintyInputException.class, () -> result.tornado("nothing")),
                () -> assertThrows(UncertaintyInputException.class, () -> result.inputSummary("nothing")),
                () -> assertThrows(UncertaintyInputException.class, () -> result.cheapest("nothing")),
                () -> assertThrows(UncertaintyInputException.class, () -> result.runs().inputColumn("nothing")),
                () -> assertThrows(UncertaintyInputException.class, () -> result.runs().outputColumn("nothing")),
                () -> assertThrows(UncertaintyInputException.class,
                        () -> new MonteCarloRunner(settings(50, SamplingMethod.LATIN_HYPERCUBE)).run(null)),
                () -> assertThrows(UncertaintyInputException.class,
                        () -> new MonteCarloRunner(settings(50, SamplingMethod.LATIN_HYPERCUBE)).run(linearStudy(null), null)),
                () -> assertThrows(UncertaintyInputException.class, () -> new MonteCarloRunner(null)));
    }
}
