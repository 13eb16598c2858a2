package eluvia.benchmarks;

import java.util.Locale;
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
import eluvia.transport.FlushingModels;
import eluvia.transport.LayerTransport;
import eluvia.transport.PoreVolumeSearch;
import eluvia.transport.internal.FiniteLayerModel;
import eluvia.transport.numerical.ExtrapolatedTargetSearch;
import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.ModalFlushingSolution;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.SolverSettings;
import eluvia.transport.numerical.SorptionIsotherm;
import eluvia.transport.numerical.SpectralElementFlushingSolution;

/**
 * The transport bundle's numerical solvers against the method-of-lines baseline
 * ({@link MethodOfLinesFlushing}, Commons Math 3.6.1 DormandPrince853Integrator) on the same
 * case at equal accuracy: pore volumes until the effluent falls to 1 % of the initial
 * concentration, R = 2, in the invented 1 m layer of {@link Cases}.
 *
 * <p>Each parameter names a case (layer Peclet number and accuracy), a method and its
 * settings, the cheapest robust ones found by {@link EqualAccuracyScan}:
 * <ul>
 * <li>{@code mol N TOL}: method of lines, N cells, integrator relative tolerance TOL;</li>
 * <li>{@code bdf2 N H}: implicit solver, N cells, fixed steps of H pore volumes;</li>
 * <li>{@code bdf2x N H}: implicit solver with Richardson extrapolation, N and 2N cells, steps H and H/2;</li>
 * <li>{@code modal N}: modal solution (exact in time), N cells;</li>
 * <li>{@code modalx N}: modal solution with Richardson extrapolation in space, N and 2N cells;</li>
 * <li>{@code sem P}: spectral elements of degree P, exact in time;</li>
 * <li>{@code molsem P TOL}: for context, the method of lines on the same spectral-element
 * equations ({@link MethodOfLinesSpectral}), integrator relative tolerance TOL;</li>
 * <li>{@code series 0}: for context, the analytic path the product takes for an equilibrium layer
 * (finite-layer series and pore-volume search, from the layer's transport numbers; relative
 * accuracy 1e-10, so far beyond the accuracy of the case; no grid).</li>
 * </ul>
 * The setup computes the error of the setting and of its refinement (the scan's rule) against
 * the exact finite-layer series (Brenner 1962) in the same run, prints both and refuses to run
 * when either exceeds the accuracy.
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

    @Param({ "P10-1e-3 mol 18 1e-3", "P10-1e-3 bdf2 40 0.04", "P10-1e-3 bdf2x 10 0.16", "P10-1e-3 modal 18",
        "P10-1e-3 modalx 8", "P10-1e-3 sem 4", "P10-1e-3 molsem 4 1e-4", "P10-1e-3 series 0",
        "P1-1e-3 mol 12 1e-2", "P1-1e-3 bdf2 28 0.08", "P1-1e-3 bdf2 16 0.08", "P1-1e-3 modal 12", "P1-1e-3 modalx 6",
        "P1-1e-3 sem 2", "P1-1e-3 molsem 2 1e-4",
        "P10-3e-5 mol 128 1e-4", "P10-3e-5 bdf2x 18 0.04", "P10-3e-5 modalx 12", "P10-3e-5 sem 4",
        "P10-3e-5 molsem 4 1e-5",
        "P1-3e-5 mol 56 1e-2", "P1-3e-5 bdf2x 10 0.16", "P1-3e-5 bdf2x 6 0.16", "P1-3e-5 modalx 6", "P1-3e-5 sem 3",
        "P1-3e-5 molsem 5 1e-5" })
    public String setting;

    private String method;
    private int cells;
    private double control;
    private FlushingColumn column;
    private SolverSettings grid;
    private NumericalFlushingSolver solver;
    private FlushingRunRequest request;
    private MethodOfLinesFlushing baseline;
    private MethodOfLinesSpectral spectralLines;
    private double daysPerPoreVolume;
    private double peclet;
    private double dispersionSquareMetresPerDay;

    @Setup
    public void setUp() {
        String[] parts = setting.split(" ");
        String[] caseParts = parts[0].substring(1).split("-", 2);
        peclet = Double.parseDouble(caseParts[0]);
        double accuracy = Double.parseDouble(caseParts[1]);
        method = parts[1];
        cells = Integer.parseInt(parts[2]);
        control = parts.length > 3 ? Double.parseDouble(parts[3]) : Double.NaN;
        column = Cases.column(Cases.layer(1 / peclet, SorptionIsotherm.linear(Cases.kdForRetardation(RETARDATION))), 1);
        grid = SolverSettings.builder().minimumCellsPerLayer(Math.max(1, cells)).maximumCellPeclet(2).build();
        request = FlushingRunRequest.upToPoreVolumes(MAX_PORE_VOLUMES).target(CleanupCriterion.EFFLUENT, TARGET).build();
        dispersionSquareMetresPerDay = Cases.DARCY_FLUX_METRES_PER_DAY / Cases.WATER_CONTENT / peclet;
        daysPerPoreVolume = Cases.WATER_CONTENT * Cases.THICKNESS_METRES / Cases.DARCY_FLUX_METRES_PER_DAY;
        baseline = new MethodOfLinesFlushing(Cases.THICKNESS_METRES, Cases.WATER_CONTENT, RETARDATION,
                Cases.DARCY_FLUX_METRES_PER_DAY, 1 / peclet, Math.max(1, cells));
        if (method.equals("molsem")) {
            spectralLines = new MethodOfLinesSpectral(Cases.THICKNESS_METRES, Cases.WATER_CONTENT, RETARDATION,
                    Cases.DARCY_FLUX_METRES_PER_DAY, 1 / peclet, cells);
        }
        if (method.equals("bdf2")) {
            solver = new NumericalFlushingSolver(column, grid.toBuilder().fixedStepPoreVolumes(control).build());
        }

        FiniteLayerModel exact = new FiniteLayerModel(RETARDATION, peclet, 0);
        double expected = new BrentSolver(1e-14, 1e-14).solve(10_000,
                t -> exact.remainingFraction(CleanupCriterion.EFFLUENT, t) - TARGET, 1e-3, MAX_PORE_VOLUMES);
        double error = solve() / expected - 1;
        double refined = refined() / expected - 1;
        System.out.printf(Locale.ROOT, "%n[%s] exact %.8f pore volumes; relative error %+.2e, refined %+.2e; allowed %.1e%n",
                setting, expected, error, refined, accuracy);
        if (Math.abs(error) > accuracy || Math.abs(refined) > accuracy) {
            throw new IllegalStateException("setting " + setting + " is not robustly at the accuracy " + accuracy);
        }
    }

    /** The same method with its accuracy control refined (the scan's rule). */
    private double refined() {
        switch (method) {
            case "mol":
                return baseline.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPoreVolume, control / 10)
                        / daysPerPoreVolume;
            case "bdf2":
                return new NumericalFlushingSolver(column, grid.toBuilder().fixedStepPoreVolumes(control / 2).build())
                        .run(request).outcome(CleanupCriterion.EFFLUENT).poreVolumes();
            case "bdf2x":
                return ExtrapolatedTargetSearch.poreVolumesToTarget(column, grid, control / 2, CleanupCriterion.EFFLUENT,
                        TARGET, MAX_PORE_VOLUMES).poreVolumes();
            case "series":
                return series();
            case "molsem":
                return spectralLines.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPoreVolume, control / 10)
                        / daysPerPoreVolume;
            case "sem":
                return SpectralElementFlushingSolution.of(column, cells + 1)
                        .poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes();
            case "modal":
            case "modalx": {
                SolverSettings finer = SolverSettings.builder().minimumCellsPerLayer(EqualAccuracyScan.nextGrid(cells))
                        .maximumCellPeclet(2).build();
                return method.equals("modal")
                        ? ModalFlushingSolution.of(column, finer)
                                .poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes()
                        : ModalFlushingSolution.extrapolatedPoreVolumesToTarget(column, finer, CleanupCriterion.EFFLUENT,
                                TARGET, MAX_PORE_VOLUMES).poreVolumes();
            }
            default:
                throw new IllegalArgumentException(setting);
        }
    }

    /** The finite-layer series from the case's numbers: R, v = q / theta, D = v alpha_L (no diffusion), P = v L / D, no decay. */
    private double series() {
        return PoreVolumeSearch.solve(FlushingModels.finiteLayer(new LayerTransport(RETARDATION,
                Cases.DARCY_FLUX_METRES_PER_DAY / Cases.WATER_CONTENT, 1, dispersionSquareMetresPerDay,
                peclet, 0)), CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes();
    }

    @Benchmark
    public double solve() {
        switch (method) {
            case "mol":
                return baseline.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPoreVolume, control)
                        / daysPerPoreVolume;
            case "bdf2":
                return solver.run(request).outcome(CleanupCriterion.EFFLUENT).poreVolumes();
            case "bdf2x":
                return ExtrapolatedTargetSearch.poreVolumesToTarget(column, grid, control, CleanupCriterion.EFFLUENT,
                        TARGET, MAX_PORE_VOLUMES).poreVolumes();
            case "series":
                return series();
            case "molsem":
                return spectralLines.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPoreVolume, control)
                        / daysPerPoreVolume;
            case "sem":
                return SpectralElementFlushingSolution.of(column, cells)
                        .poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes();
            case "modal":
                return ModalFlushingSolution.of(column, grid)
                        .poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes();
            case "modalx":
                return ModalFlushingSolution.extrapolatedPoreVolumesToTarget(column, grid, CleanupCriterion.EFFLUENT,
                        TARGET, MAX_PORE_VOLUMES).poreVolumes();
            default:
                throw new IllegalArgumentException(setting);
        }
    }
}
