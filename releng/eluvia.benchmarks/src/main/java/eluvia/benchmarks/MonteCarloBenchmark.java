package eluvia.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import eluvia.design.UncertaintyAnalysisBenchmarkCase;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.MonteCarloRunner;
import eluvia.design.uncertainty.OutputStatistics;
import eluvia.design.uncertainty.UncertaintyBenchmarkCase;
import eluvia.design.uncertainty.UncertaintyResult;

/**
 * Time of a Monte Carlo study of {@value UncertaintyBenchmarkCase#RUNS} Latin hypercube runs of
 * the cheap analytical model of the design bundle ({@link UncertaintyBenchmarkCase}, an invented
 * case): on every available processor (the case's own settings) and, as the baseline, the same
 * study on one worker thread. The setup runs both once and refuses to run
 * (IllegalStateException) unless they give identical statistics of every output, which the
 * engine promises for one seed whatever the number of threads.
 *
 * <p>{@link #fullPipelinePerRun} gives context only: a study of {@value #PIPELINE_RUNS} runs of
 * the whole design pipeline ({@link UncertaintyAnalysisBenchmarkCase}, also invented); its time
 * divided by {@value #PIPELINE_RUNS} is the cost of one run.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class MonteCarloBenchmark {
    /** The runs of the full-pipeline context measurement. */
    static final int PIPELINE_RUNS = 40;

    /** The analytical study on all processors and on one thread. */
    @State(Scope.Benchmark)
    public static class Analytical {
        UncertaintyBenchmarkCase analyticalCase;
        MonteCarloRunner oneThread;

        @Setup
        public void setUp() {
            analyticalCase = UncertaintyBenchmarkCase.create();
            oneThread = new MonteCarloRunner(analyticalCase.settings().withThreadCount(1));
            UncertaintyResult parallel = analyticalCase.run();
            UncertaintyResult serial = oneThread.run(analyticalCase.uncertaintyStudy());
            if (parallel.completedRunCount() != UncertaintyBenchmarkCase.RUNS
                    || serial.completedRunCount() != UncertaintyBenchmarkCase.RUNS) {
                throw new IllegalStateException("completed runs: " + parallel.completedRunCount() + " on "
                        + analyticalCase.settings().threadCount() + " threads, " + serial.completedRunCount()
                        + " on 1 thread (expected " + UncertaintyBenchmarkCase.RUNS + " each)");
            }
            if (!parallel.outputStatistics().equals(serial.outputStatistics())) {
                throw new IllegalStateException("the study on " + analyticalCase.settings().threadCount()
                        + " threads and on 1 thread gave different statistics (" + parallel.outputStatistics()
                        + " against " + serial.outputStatistics() + "); the benchmark would compare different work");
            }
            OutputStatistics first = parallel.outputStatistics().get(0);
            System.out.println("MonteCarloBenchmark: " + UncertaintyBenchmarkCase.RUNS + " runs on "
                    + analyticalCase.settings().threadCount() + " threads and on 1 thread give identical statistics; "
                    + first.name() + " P10/P50/P90 = " + first.p10() + " / " + first.p50() + " / " + first.p90());
        }
    }

    /** The full-pipeline study (context). */
    @State(Scope.Benchmark)
    public static class Pipeline {
        UncertaintyAnalysisBenchmarkCase pipelineCase;

        @Setup
        public void setUp() {
            pipelineCase = UncertaintyAnalysisBenchmarkCase.create(PIPELINE_RUNS);
            UncertaintyResults results = pipelineCase.run();
            if (results.completedRunCount() != PIPELINE_RUNS) {
                throw new IllegalStateException("full pipeline: " + results.completedRunCount() + " of "
                        + PIPELINE_RUNS + " runs completed, failures " + results.failureCounts());
            }
        }
    }

    /** The study on every available processor (the case's settings). */
    @Benchmark
    public UncertaintyResult allProcessors(Analytical state) {
        return state.analyticalCase.run();
    }

    /** The baseline: the same study on one worker thread. */
    @Benchmark
    public UncertaintyResult oneThread(Analytical state) {
        return state.oneThread.run(state.analyticalCase.uncertaintyStudy());
    }

    /** Context: {@value #PIPELINE_RUNS} runs of the full design pipeline on every available processor. */
    @Benchmark
    public UncertaintyResults fullPipelinePerRun(Pipeline state) {
        return state.pipelineCase.run();
    }
}
