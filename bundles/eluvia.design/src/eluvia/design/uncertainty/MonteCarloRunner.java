package eluvia.design.uncertainty;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;

import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;

/**
 * Runs a Monte Carlo simulation of an {@link UncertaintyStudy}: draws the sample (plain Monte
 * Carlo or Latin hypercube, with the Iman-Conover rank correlation if the study sets one),
 * evaluates the model for every run and for the tornado cases on a bounded pool of worker
 * threads, and gathers the statistics into an {@link UncertaintyResult}.
 *
 * <p><b>Reproducible:</b> the whole sample matrix is drawn before any evaluation from one
 * generator started from the seed, and results are gathered in run order, so the same seed
 * gives identical results with any number of threads (given a model that depends only on its
 * inputs).
 *
 * <p><b>Failures:</b> a run whose evaluation throws, leaves out an output or gives a non-finite
 * value is recorded as a {@link FailedRun} with the reason and does not stop the simulation; the
 * statistics are over the completed runs. An {@link Error} from the model stops the simulation
 * and is rethrown.
 *
 * <p><b>Progress and cancellation:</b> the {@link ProgressSink} is called on the caller's thread
 * whenever a batch of runs finishes and at least every {@value #POLL_MILLISECONDS} ms. When it
 * reports {@link ProgressSink#cancelled()} (or the calling thread is interrupted), the workers
 * stop before their next evaluation and the runner returns the <em>partial result marked
 * cancelled</em> (no exception); an interruption is then re-asserted on the calling thread.
 *
 * <p><b>Tornado:</b> besides the Monte Carlo runs the model is evaluated once with every input at
 * its base value and twice for each uncertain input, at its P10 and at its P90 with the others at
 * their base values: 1 + 2 k evaluations for k uncertain inputs.
 */
public final class MonteCarloRunner {
    /** The longest wait between two calls of the progress sink, ms. */
    public static final long POLL_MILLISECONDS = 100;

    private static final int MAX_BATCH_RUNS = 128;

    private final SimulationSettings settings;

    /** A runner with the given settings. */
    public MonteCarloRunner(SimulationSettings settings) {
        this.settings = UncertaintyInputException.requireNonNull("simulation settings", settings);
    }

    /** The settings. */
    public SimulationSettings settings() {
        return settings;
    }

    /** Runs the simulation without progress reports or cancellation. */
    public UncertaintyResult run(UncertaintyStudy study) {
        return run(study, ProgressSink.NONE);
    }

    /**
     * Runs the simulation.
     *
     * @param study    what to evaluate
     * @param progress where to report progress and learn of cancellation
     * @return the result; marked cancelled (and partial) if the sink cancelled it
     */
    public UncertaintyResult run(UncertaintyStudy study, ProgressSink progress) {
        UncertaintyInputException.requireNonNull("uncertainty study", study);
        UncertaintyInputException.requireNonNull("progress sink", progress);
        Simulation simulation = new Simulation(study, settings);
        simulation.evaluateAll(progress);
        return simulation.result();
    }

    /** The state of one simulation. */
    private static final class Simulation {
        private final UncertaintyStudy study;
        private final SimulationSettings settings;
        private final List<String> inputNames;
        private final Map<String, Integer> inputIndex;
        private final List<Integer> uncertain = new ArrayList<>();
        private final int runCount;
        private final double[][] inputColumns;
        private final double[][] outputColumns;
        private final RunStatus[] statuses;
        private final String[] reasons;
        private final double[][] caseInputs;
        private final double[][] caseOutputs;
        private final String[] caseFailures;
        private final AtomicBoolean stop = new AtomicBoolean();
        private final AtomicInteger done = new AtomicInteger();
        /** The first error (not exception) a model threw, kept as thrown: the pool would wrap a copy. */
        private final AtomicReference<Error> modelError = new AtomicReference<>();
        private int total;

        Simulation(UncertaintyStudy study, SimulationSettings settings) {
            this.study = study;
            this.settings = settings;
            this.inputNames = study.inputNames();
            this.inputIndex = InputValues.indexOf(inputNames);
            this.runCount = settings.runCount();
            List<UncertainInput> inputs = study.inputs();
            for (int j = 0; j < inputs.size(); j++) {
                if (!inputs.get(j).isFixed()) {
                    uncertain.add(j);
                }
            }
            this.inputColumns = SampleGenerator.generate(inputs, study.rankCorrelation().orElse(null),
                    settings.samplingMethod(), runCount, settings.seed());
            int outputCount = study.outputs().size();
            this.outputColumns = new double[outputCount][runCount];
            for (double[] column : outputColumns) {
                Arrays.fill(column, Double.NaN);
            }
            this.statuses = new RunStatus[runCount];
            Arrays.fill(statuses, RunStatus.NOT_EVALUATED);
            this.reasons = new String[runCount];
            int cases = 1 + 2 * uncertain.size();
            this.caseInputs = new double[cases][];
            double[] base = study.baseCase().asMap().values().stream().mapToDouble(Double::doubleValue).toArray();
            caseInputs[0] = base;
            for (int b = 0; b < uncertain.size(); b++) {
                int j = uncertain.get(b);
                caseInputs[1 + 2 * b] = base.clone();
                caseInputs[1 + 2 * b][j] = inputs.get(j).p10();
                caseInputs[2 + 2 * b] = base.clone();
                caseInputs[2 + 2 * b][j] = inputs.get(j).p90();
            }
            this.caseOutputs = new double[cases][outputCount];
            for (double[] row : caseOutputs) {
                Arrays.fill(row, Double.NaN);
            }
            this.caseFailures = new String[cases];
            Arrays.fill(caseFailures, "not evaluated: the simulation was cancelled");
        }

        void evaluateAll(ProgressSink progress) {
            total = runCount + caseInputs.length;
            if (progress.cancelled()) {
                stop.set(true);
                return;
            }
            int threads = settings.threadCount();
            int batch = Math.max(1, Math.min(MAX_BATCH_RUNS, runCount / (threads * 8)));
            ForkJoinPool pool = new ForkJoinPool(threads);
            boolean interrupted = false;
            Throwable failure = null;
            try {
                CompletionService<Void> service = new ExecutorCompletionService<>(pool);
                int submitted = 0;
                for (int c = 0; c < caseInputs.length; c++) {
                    int tornadoCase = c;
                    service.submit(() -> evaluateCase(tornadoCase), null);
                    submitted++;
                }
                for (int from = 0; from < runCount; from += batch) {
                    int first = from;
                    int end = Math.min(runCount, from + batch);
                    service.submit(() -> evaluateRuns(first, end), null);
                    submitted++;
                }
                int finished = 0;
                while (finished < submitted) {
                    Future<Void> future;
                    try {
                        future = service.poll(POLL_MILLISECONDS, TimeUnit.MILLISECONDS);
                    } catch (InterruptedException e) {
                        interrupted = true;
                        stop.set(true);
                        continue;
                    }
                    if (future != null) {
                        finished++;
                        try {
                            future.get();
                        } catch (ExecutionException e) {
                            stop.set(true);
                            if (failure == null) {
                                failure = e.getCause();
                            }
                        } catch (InterruptedException e) {
                            interrupted = true;
                            stop.set(true);
                        }
                    }
                    progress.worked(done.get(), total);
                    if (!stop.get() && progress.cancelled()) {
                        stop.set(true);
                    }
                }
            } finally {
                pool.shutdownNow();
                if (interrupted) {
                    Thread.currentThread().interrupt();
                }
            }
            if (modelError.get() != null) {
                throw modelError.get();
            }
            if (failure instanceof Error error) {
                throw error;
            }
            if (failure != null) {
                throw new IllegalStateException("The simulation stopped on an unexpected error: " + failure, failure);
            }
        }

        private void evaluateCase(int c) {
            if (stop.get()) {
                return;
            }
            double[] outputs = new double[outputColumns.length];
            String reason = evaluate(new InputValues(inputNames, inputIndex, caseInputs[c].clone()), outputs);
            if (reason == null) {
                caseOutputs[c] = outputs;
            }
            caseFailures[c] = reason;
            done.incrementAndGet();
        }

        private void evaluateRuns(int from, int end) {
            int inputCount = inputColumns.length;
            double[] outputs = new double[outputColumns.length];
            for (int i = from; i < end && !stop.get(); i++) {
                double[] row = new double[inputCount];
                for (int j = 0; j < inputCount; j++) {
                    row[j] = inputColumns[j][i];
                }
                String reason = evaluate(new InputValues(inputNames, inputIndex, row), outputs);
                if (reason == null) {
                    for (int o = 0; o < outputs.length; o++) {
                        outputColumns[o][i] = outputs[o];
                    }
                    statuses[i] = RunStatus.COMPLETED;
                } else {
                    statuses[i] = RunStatus.FAILED;
                    reasons[i] = reason;
                }
                done.incrementAndGet();
            }
        }

        /** Evaluates the model into {@code outputs}; returns null, or why the evaluation failed. */
        private String evaluate(InputValues values, double[] outputs) {
            Map<String, Double> result;
            try {
                result = study.model().evaluate(values);
            } catch (Exception e) {
                return e.getMessage() == null ? e.getClass().getSimpleName()
                        : e.getClass().getSimpleName() + ": " + e.getMessage();
            } catch (Error e) {
                modelError.compareAndSet(null, e);
                stop.set(true);
                return "stopped by " + e;
            }
            if (result == null) {
                return "the model returned no outputs (null)";
            }
            List<OutputDefinition> definitions = study.outputs();
            for (int o = 0; o < outputs.length; o++) {
                String name = definitions.get(o).name();
                Double value = result.get(name);
                if (value == null) {
                    return "the model gave no value for output '" + name + "'";
                }
                if (!Double.isFinite(value)) {
                    return "the model gave output '" + name + "' = " + value + ", not a finite number";
                }
                outputs[o] = value;
            }
            return null;
        }

        UncertaintyResult result() {
            List<OutputDefinition> outputs = study.outputs();
            RunTable table = new RunTable(inputNames, study.outputNames(), inputColumns, outputColumns, statuses);
            List<FailedRun> failedRuns = new ArrayList<>();
            int completed = 0;
            for (int i = 0; i < runCount; i++) {
                if (statuses[i] == RunStatus.FAILED) {
                    failedRuns.add(new FailedRun(i, table.inputs(i).asMap(), reasons[i]));
                } else if (statuses[i] == RunStatus.COMPLETED) {
                    completed++;
                }
            }
            double[][] completedOutputs = new double[outputs.size()][];
            List<OutputStatistics> statistics = new ArrayList<>();
            for (int o = 0; o < outputs.size(); o++) {
                completedOutputs[o] = table.completed(outputColumns[o]);
                statistics.add(OutputStatistics.of(outputs.get(o).name(), outputs.get(o).unit(), completedOutputs[o],
                        settings.binsFor(completedOutputs[o].length)));
            }
            return new UncertaintyResult(settings, study.inputs(), outputs, stop.get() && done.get() < total,
                    completed + failedRuns.size(), completed, failedRuns,
                    study.inputs().stream().map(InputSummary::of).toList(), statistics, tornados(),
                    rankCorrelations(table, completedOutputs), cheapest(completedOutputs, completed), table);
        }

        private List<Tornado> tornados() {
            List<OutputDefinition> outputs = study.outputs();
            List<Tornado> tornados = new ArrayList<>();
            for (int o = 0; o < outputs.size(); o++) {
                List<TornadoBar> bars = new ArrayList<>();
                for (int b = 0; b < uncertain.size(); b++) {
                    UncertainInput input = study.inputs().get(uncertain.get(b));
                    int low = 1 + 2 * b;
                    int high = 2 + 2 * b;
                    Optional<String> failure = Optional.ofNullable(caseFailures[low]).map(r -> "at the P10: " + r)
                            .or(() -> Optional.ofNullable(caseFailures[high]).map(r -> "at the P90: " + r));
                    bars.add(new TornadoBar(input.name(), input.unit(), caseInputs[low][uncertain.get(b)],
                            caseInputs[high][uncertain.get(b)], caseOutputs[low][o], caseOutputs[high][o], failure));
                }
                bars.sort(Comparator.comparingDouble((TornadoBar bar) -> Double.isNaN(bar.swing()) ? 1 : 0)
                        .thenComparing(Comparator.comparingDouble(TornadoBar::swing).reversed()));
                tornados.add(new Tornado(outputs.get(o).name(), outputs.get(o).unit(), caseOutputs[0][o],
                        Optional.ofNullable(caseFailures[0]), bars));
            }
            return tornados;
        }

        private RankCorrelationTable rankCorrelations(RunTable table, double[][] completedOutputs) {
            List<String> uncertainNames = uncertain.stream().map(inputNames::get).toList();
            int rows = completedOutputs.length == 0 ? 0 : completedOutputs[0].length;
            int k = uncertain.size();
            int m = completedOutputs.length;
            double[][] columns = new double[k + m][];
            for (int a = 0; a < k; a++) {
                columns[a] = table.completed(inputColumns[uncertain.get(a)]);
            }
            for (int o = 0; o < m; o++) {
                columns[k + o] = completedOutputs[o];
            }
            RealMatrix correlation = null;
            if (rows >= 3 && k > 0) {
                double[][] data = new double[rows][k + m];
                for (int c = 0; c < k + m; c++) {
                    for (int i = 0; i < rows; i++) {
                        data[i][c] = columns[c][i];
                    }
                }
                correlation = new SpearmansCorrelation().computeCorrelationMatrix(data);
            }
            List<List<Double>> coefficients = new ArrayList<>();
            for (int a = 0; a < k; a++) {
                List<Double> row = new ArrayList<>();
                for (int o = 0; o < m; o++) {
                    boolean defined = correlation != null && varies(columns[a]) && varies(columns[k + o]);
                    row.add(defined ? correlation.getEntry(a, k + o) : Double.NaN);
                }
                coefficients.add(row);
            }
            return new RankCorrelationTable(uncertainNames, study.outputNames(), coefficients);
        }

        private static boolean varies(double[] values) {
            for (double value : values) {
                if (value != values[0]) {
                    return true;
                }
            }
            return false;
        }

        private List<CheapestAlternative> cheapest(double[][] completedOutputs, int completed) {
            List<String> outputNames = study.outputNames();
            List<CheapestAlternative> result = new ArrayList<>();
            for (AlternativeComparison comparison : study.comparisons()) {
                int[] indices = comparison.outputNames().stream().mapToInt(outputNames::indexOf).toArray();
                double[] wins = new double[indices.length];
                for (int i = 0; i < completed; i++) {
                    double cheapest = Double.POSITIVE_INFINITY;
                    for (int index : indices) {
                        cheapest = Math.min(cheapest, completedOutputs[index][i]);
                    }
                    int ties = 0;
                    for (int index : indices) {
                        if (completedOutputs[index][i] == cheapest) {
                            ties++;
                        }
                    }
                    for (int a = 0; a < indices.length; a++) {
                        if (completedOutputs[indices[a]][i] == cheapest) {
                            wins[a] += 1.0 / ties;
                        }
                    }
                }
                List<Double> probabilities = new ArrayList<>();
                for (double win : wins) {
                    probabilities.add(completed == 0 ? Double.NaN : win / completed);
                }
                result.add(new CheapestAlternative(comparison.label(), comparison.outputNames(), probabilities,
                        completed));
            }
            return result;
        }
    }
}
