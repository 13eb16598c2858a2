package eluvia.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.FlushingRunResult;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.SolverSettings;
import eluvia.transport.numerical.SorptionIsotherm;

/**
 * Throughput of the implicit solver in cell-steps per second (cells times accepted time steps),
 * reported by JMH as the secondary result "cellSteps". Case: the invented 1 m layer of
 * {@link Cases}, layer Peclet number 10, 1000 cells, flushed from 10 mg/L for 5 pore volumes.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class SolverThroughputBenchmark {
    private static final int CELLS = 1000;

    /** Counts cell-steps; JMH divides by the measured time. */
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    @State(Scope.Thread)
    public static class Work {
        public long cellSteps;

        @Setup(Level.Iteration)
        public void reset() {
            cellSteps = 0;
        }
    }

    private NumericalFlushingSolver linearFixed;
    private NumericalFlushingSolver linearAdaptive;
    private NumericalFlushingSolver freundlichAdaptive;
    private NumericalFlushingSolver langmuirAdaptive;
    private FlushingRunRequest request;

    @Setup
    public void setUp() {
        SolverSettings fixed = SolverSettings.builder().minimumCellsPerLayer(CELLS).fixedStepPoreVolumes(0.005).build();
        SolverSettings adaptive = SolverSettings.builder().minimumCellsPerLayer(CELLS).build();
        linearFixed = new NumericalFlushingSolver(
                Cases.column(Cases.layer(0.1, SorptionIsotherm.linear(Cases.kdForRetardation(2))), 10), fixed);
        linearAdaptive = new NumericalFlushingSolver(
                Cases.column(Cases.layer(0.1, SorptionIsotherm.linear(Cases.kdForRetardation(2))), 10), adaptive);
        // Freundlich Kf = 0.6 (mg/kg)/(mg/L)^0.7, n = 0.7; Langmuir Smax = 50 mg/kg, K = 0.05 L/mg
        freundlichAdaptive = new NumericalFlushingSolver(
                Cases.column(Cases.layer(0.1, SorptionIsotherm.freundlich(0.6, 0.7)), 10), adaptive);
        langmuirAdaptive = new NumericalFlushingSolver(
                Cases.column(Cases.layer(0.1, SorptionIsotherm.langmuir(50, 0.05)), 10), adaptive);
        request = FlushingRunRequest.upToPoreVolumes(5).build();
    }

    private FlushingRunResult count(FlushingRunResult r, Work w) {
        w.cellSteps += (long) r.cellCount() * r.acceptedSteps();
        return r;
    }

    @Benchmark
    public FlushingRunResult linearFixedSteps(Work w) {
        return count(linearFixed.run(request), w);
    }

    @Benchmark
    public FlushingRunResult linearAdaptiveSteps(Work w) {
        return count(linearAdaptive.run(request), w);
    }

    @Benchmark
    public FlushingRunResult freundlichAdaptiveSteps(Work w) {
        return count(freundlichAdaptive.run(request), w);
    }

    @Benchmark
    public FlushingRunResult langmuirAdaptiveSteps(Work w) {
        return count(langmuirAdaptive.run(request), w);
    }
}
