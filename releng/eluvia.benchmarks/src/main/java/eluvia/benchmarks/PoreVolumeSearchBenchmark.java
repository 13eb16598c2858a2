package eluvia.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModels;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.LayerTransport;
import eluvia.transport.PoreVolumeSearch;

/**
 * Time per case of the analytic finite-layer pore-volume search: from the screening input, build
 * the layer's transport numbers and the finite-layer model, then search the pore volumes to a
 * target. {@value #CASES} invented cases (dispersivity 0.01 to 0.5 m, Kd 0 to 5 L/kg, targets
 * 0.1 to 1e-4, all three criteria) are cycled; the score is per case.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class PoreVolumeSearchBenchmark {
    static final int CASES = 64;

    private LayerFlushingInput[] inputs;
    private CleanupCriterion[] criteria;
    private double[] targets;

    @Setup
    public void setUp() {
        inputs = new LayerFlushingInput[CASES];
        criteria = new CleanupCriterion[CASES];
        targets = new double[CASES];
        double[] dispersivities = { 0.01, 0.05, 0.1, 0.5 };
        double[] kds = { 0, 0.3, 1.2, 5 };
        double[] targetFractions = { 0.1, 0.01, 1e-3, 1e-4 };
        for (int i = 0; i < CASES; i++) {
            inputs[i] = new LayerFlushingInput(1.5, 0.3, 0.4, 1600, kds[(i / 4) % 4], 0.05, dispersivities[i % 4], 1e-9,
                    0);
            criteria[i] = CleanupCriterion.values()[i % 3];
            targets[i] = targetFractions[(i / 16) % 4];
        }
    }

    @Benchmark
    @OperationsPerInvocation(CASES)
    public double search() {
        double sum = 0;
        for (int i = 0; i < CASES; i++) {
            sum += PoreVolumeSearch.solve(FlushingModels.finiteLayer(LayerTransport.of(inputs[i])), criteria[i], targets[i],
                    10_000).poreVolumes();
        }
        return sum;
    }
}
