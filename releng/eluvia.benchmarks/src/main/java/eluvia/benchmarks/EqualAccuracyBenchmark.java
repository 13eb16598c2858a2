package eluvia.benchmarks;

import java.util.concurrent.TimeUnit;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.internal.FiniteLayerModel;
import eluvia.transport.numerical.ExtrapolatedTargetSearch;
import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.SolverSettings;
import eluvia.transport.numerical.SorptionIsotherm;

/**
 * The implicit solver against the method-of-lines baseline ({@link MethodOfLinesFlushing},
 * Commons Math 3.6.1 DormandPrince853Integrator) on the same case at equal accuracy: pore
 * volumes until the effluent falls to 1 % of the initial concentration, R = 2, in the invented
 * 1 m layer of {@link Cases}. For each case both methods use the cheapest settings found that
 * stay within the stated relative error of the exact finite-layer series (Brenner 1962, the
 * analytic part of the transport bundle); the setup computes both errors in the same run, prints
 * them and refuses to run if either exceeds the accuracy.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class EqualAccuracyBenchmark {
    private static final double RETARDATION = 2;
    private static final double TARGET = 0.01;
    private static final double MAX_PORE_VOLUMES = 1000;

    /**
     * Layer Peclet number and accuracy. The settings of each case are the cheapest found by
     * scanning cell counts with, for the implicit solver, fixed steps of 0.01 to 0.08 pore
     * volumes, adaptive tolerances 1e-3 to 1e-5 and Richardson extrapolation, and for the
     * baseline relative tolerances 1e-3 to 1e-5:
     * <ul>
     * <li>P10-1e-3: implicit 24 cells, fixed steps of 0.02 pore volumes; baseline 14 cells, rel. tol. 1e-3;</li>
     * <li>P1-1e-3: implicit 12 cells, fixed steps of 0.05; baseline 14 cells, rel. tol. 1e-4;</li>
     * <li>P10-3e-5: implicit Richardson-extrapolated, 16 and 32 cells, steps 0.04 and 0.02;
     * baseline 100 cells, rel. tol. 1e-4;</li>
     * <li>P1-3e-5: implicit Richardson-extrapolated, 8 and 16 cells, steps 0.08 and 0.04;
     * baseline 50 cells, rel. tol. 1e-3.</li>
     * </ul>
     */
    @Param({ "P10-1e-3", "P1-1e-3", "P10-3e-5", "P1-3e-5" })
    public String caseName;

    private double peclet;
    private int implicitCells;
    private double implicitStepPoreVolumes;
    private boolean extrapolate;
    private int baselineCells;
    private double baselineTolerance;
    private FlushingColumn column;
    private NumericalFlushingSolver solver;
    private SolverSettings settings;
    private FlushingRunRequest request;
    private MethodOfLinesFlushing baseline;
    private double daysPerPoreVolume;

    private void define(double pecletNumber, int cells, double step, boolean richardson, int molCells, double molTol) {
        peclet = pecletNumber;
        implicitCells = cells;
        implicitStepPoreVolumes = step;
        extrapolate = richardson;
        baselineCells = molCells;
        baselineTolerance = molTol;
    }

    @Setup
    public void setUp() {
        double accuracy;
        switch (caseName) {
            case "P10-1e-3" -> {
                define(10, 24, 0.02, false, 14, 1e-3);
                accuracy = 1e-3;
            }
            case "P1-1e-3" -> {
                define(1, 12, 0.05, false, 14, 1e-4);
                accuracy = 1e-3;
            }
            case "P10-3e-5" -> {
                define(10, 16, 0.04, true, 100, 1e-4);
                accuracy = 3e-5;
            }
            case "P1-3e-5" -> {
                define(1, 8, 0.08, true, 50, 1e-3);
                accuracy = 3e-5;
            }
            default -> throw new IllegalArgumentException(caseName);
        }
        column = Cases.column(Cases.layer(1 / peclet, SorptionIsotherm.linear(Cases.kdForRetardation(RETARDATION))), 1);
        SolverSettings.Builder b = SolverSettings.builder().minimumCellsPerLayer(implicitCells).maximumCellPeclet(2);
        settings = extrapolate ? b.build() : b.fixedStepPoreVolumes(implicitStepPoreVolumes).build();
        solver = new NumericalFlushingSolver(column, settings);
        request = FlushingRunRequest.upToPoreVolumes(MAX_PORE_VOLUMES).target(CleanupCriterion.EFFLUENT, TARGET).build();
        baseline = new MethodOfLinesFlushing(Cases.THICKNESS_METRES, Cases.WATER_CONTENT, RETARDATION,
                Cases.DARCY_FLUX_METRES_PER_DAY, 1 / peclet, baselineCells);
        daysPerPoreVolume = Cases.WATER_CONTENT * Cases.THICKNESS_METRES / Cases.DARCY_FLUX_METRES_PER_DAY;

        FiniteLayerModel exact = new FiniteLayerModel(RETARDATION, peclet, 0);
        double expected = new BrentSolver(1e-14, 1e-14).solve(10_000,
                t -> exact.remainingFraction(CleanupCriterion.EFFLUENT, t) - TARGET, 1e-3, MAX_PORE_VOLUMES);
        double implicitError = implicit() / expected - 1;
        double baselineError = methodOfLines() / expected - 1;
        System.out.printf("%n[accuracy %s] exact %.8f pore volumes; implicit relative error %.2e; "
                + "method of lines relative error %.2e; allowed %.1e%n", caseName, expected, implicitError, baselineError,
                accuracy);
        if (Math.abs(implicitError) > accuracy || Math.abs(baselineError) > accuracy) {
            throw new IllegalStateException("case " + caseName + " is not at the stated accuracy " + accuracy);
        }
    }

    @Benchmark
    public double implicit() {
        if (extrapolate) {
            return ExtrapolatedTargetSearch.poreVolumesToTarget(column, settings, implicitStepPoreVolumes,
                    CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes();
        }
        return solver.run(request).outcome(CleanupCriterion.EFFLUENT).poreVolumes();
    }

    @Benchmark
    public double methodOfLines() {
        return baseline.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPoreVolume, baselineTolerance)
                / daysPerPoreVolume;
    }
}
