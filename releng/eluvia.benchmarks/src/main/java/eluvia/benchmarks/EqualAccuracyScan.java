package eluvia.benchmarks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleSupplier;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

import eluvia.transport.CleanupCriterion;
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
 * Chooses the settings of {@link EqualAccuracyBenchmark}: for each case and method, the cheapest
 * setting that is robustly within the accuracy. A setting counts only when it AND its
 * refinement in the method's own accuracy control are both within the accuracy of the exact
 * finite-layer series (Brenner 1962): for the method of lines the integrator tolerance divided
 * by 10; for the implicit solver half the fixed step, or the adaptive tolerance divided by 10;
 * for the modal solution, which has no time control, the next finer grid of the scan; for the
 * spectral elements (no time control either) the next degree. This
 * keeps a lucky cancellation of space and time errors (seen for the method of lines at 14
 * cells, tolerance 1e-3, P = 10: 6e-5 with the tolerance, 1.7e-3 with a tenth of it) from
 * passing as accuracy. Times here are quick single-thread loops for ranking only; the reported
 * numbers come from JMH. Run: {@code java -cp eluvia-benchmarks.jar eluvia.benchmarks.EqualAccuracyScan}.
 */
public final class EqualAccuracyScan {
    private static final double RETARDATION = 2;
    private static final double TARGET = 0.01;
    private static final double MAX_PORE_VOLUMES = 1000;

    private record Candidate(String method, String settings, double error, double refinedError, double micros) {
    }

    /** Cell counts scanned; for the modal solution the next one is the refinement. */
    static final int[] GRIDS = { 6, 7, 8, 10, 12, 14, 16, 18, 20, 24, 28, 32, 40, 48, 56, 64, 80, 100, 128, 160, 200 };

    private EqualAccuracyScan() {
    }

    /** The scan's next cell count after {@code n} (the modal solution's refinement). */
    static int nextGrid(int n) {
        for (int g : GRIDS) {
            if (g > n) {
                return g;
            }
        }
        return 2 * n;
    }

    public static void main(String[] args) {
        double[][] cases = { { 10, 1e-3 }, { 1, 1e-3 }, { 10, 3e-5 }, { 1, 3e-5 } };
        for (double[] c : cases) {
            scan(c[0], c[1]);
        }
    }

    private static double exact(double peclet) {
        FiniteLayerModel exact = new FiniteLayerModel(RETARDATION, peclet, 0);
        return new BrentSolver(1e-14, 1e-14).solve(10_000,
                t -> exact.remainingFraction(CleanupCriterion.EFFLUENT, t) - TARGET, 1e-3, MAX_PORE_VOLUMES);
    }

    private static double micros(DoubleSupplier run) {
        run.getAsDouble();
        long start = System.nanoTime();
        int reps = 0;
        while (System.nanoTime() - start < 30_000_000L || reps < 3) {
            run.getAsDouble();
            reps++;
        }
        double first = (System.nanoTime() - start) / 1e3 / reps;
        start = System.nanoTime();
        for (int i = 0; i < reps; i++) {
            run.getAsDouble();
        }
        return Math.min(first, (System.nanoTime() - start) / 1e3 / reps);
    }

    private static void scan(double peclet, double accuracy) {
        double expected = exact(peclet);
        FlushingColumn column = Cases.column(Cases.layer(1 / peclet, SorptionIsotherm.linear(Cases.kdForRetardation(RETARDATION))), 1);
        double daysPerPv = Cases.WATER_CONTENT * Cases.THICKNESS_METRES / Cases.DARCY_FLUX_METRES_PER_DAY;
        List<Candidate> found = new ArrayList<>();
        int[] grids = GRIDS;
        // method of lines
        double[] tolerances = { 1e-2, 1e-3, 1e-4, 1e-5 };
        for (int n : grids) {
            MethodOfLinesFlushing mol = new MethodOfLinesFlushing(Cases.THICKNESS_METRES, Cases.WATER_CONTENT,
                    RETARDATION, Cases.DARCY_FLUX_METRES_PER_DAY, 1 / peclet, n);
            boolean any = false;
            for (double tol : tolerances) {
                double e = mol.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPv, tol) / daysPerPv / expected - 1;
                double r = mol.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPv, tol / 10) / daysPerPv / expected - 1;
                if (Math.abs(e) <= accuracy && Math.abs(r) <= accuracy) {
                    double t = micros(() -> mol.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPv, tol));
                    found.add(new Candidate("method of lines", n + " cells, rel. tol. " + tol, e, r, t));
                    any = true;
                    break;
                }
            }
            if (any && found.stream().filter(x -> x.method().equals("method of lines")).count() >= 3) {
                break; // finer grids only cost more
            }
        }
        // implicit solver, fixed steps and Richardson
        double[] steps = { 0.005, 0.01, 0.02, 0.04, 0.08, 0.16 };
        FlushingRunRequest request = FlushingRunRequest.upToPoreVolumes(MAX_PORE_VOLUMES).target(CleanupCriterion.EFFLUENT, TARGET).build();
        for (int n : grids) {
            if (n / peclet < 0.5 && n < 8) {
                continue;
            }
            SolverSettings grid = SolverSettings.builder().minimumCellsPerLayer(n).maximumCellPeclet(2).build();
            for (double h : steps) {
                NumericalFlushingSolver s1 = new NumericalFlushingSolver(column, grid.toBuilder().fixedStepPoreVolumes(h).build());
                NumericalFlushingSolver s2 = new NumericalFlushingSolver(column, grid.toBuilder().fixedStepPoreVolumes(h / 2).build());
                double e = s1.run(request).outcome(CleanupCriterion.EFFLUENT).poreVolumes() / expected - 1;
                double r = s2.run(request).outcome(CleanupCriterion.EFFLUENT).poreVolumes() / expected - 1;
                if (Math.abs(e) <= accuracy && Math.abs(r) <= accuracy) {
                    double t = micros(() -> s1.run(request).outcome(CleanupCriterion.EFFLUENT).poreVolumes());
                    found.add(new Candidate("implicit", n + " cells, fixed steps " + h, e, r, t));
                }
                double x = ExtrapolatedTargetSearch.poreVolumesToTarget(column, grid, h, CleanupCriterion.EFFLUENT, TARGET,
                        MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
                double xr = ExtrapolatedTargetSearch.poreVolumesToTarget(column, grid, h / 2, CleanupCriterion.EFFLUENT,
                        TARGET, MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
                if (Math.abs(x) <= accuracy && Math.abs(xr) <= accuracy) {
                    double t = micros(() -> ExtrapolatedTargetSearch.poreVolumesToTarget(column, grid, h,
                            CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes());
                    found.add(new Candidate("implicit", "Richardson " + n + " and " + 2 * n + " cells, steps " + h + " and "
                            + h / 2, x, xr, t));
                }
            }
        }
        // modal solution, plain and Richardson (refinement: the next grid of the scan)
        for (int k = 0; k + 1 < grids.length; k++) {
            int n = grids[k];
            int next = grids[k + 1];
            SolverSettings grid = SolverSettings.builder().minimumCellsPerLayer(n).maximumCellPeclet(2).build();
            SolverSettings finer = SolverSettings.builder().minimumCellsPerLayer(next).maximumCellPeclet(2).build();
            if (!ModalFlushingSolution.applies(column, grid)) {
                continue;
            }
            double e = ModalFlushingSolution.of(column, grid).poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET,
                    MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
            double r = ModalFlushingSolution.of(column, finer).poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET,
                    MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
            if (Math.abs(e) <= accuracy && Math.abs(r) <= accuracy) {
                double t = micros(() -> ModalFlushingSolution.of(column, grid)
                        .poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes());
                found.add(new Candidate("modal", n + " cells", e, r, t));
            }
            double x = ModalFlushingSolution.extrapolatedPoreVolumesToTarget(column, grid, CleanupCriterion.EFFLUENT, TARGET,
                    MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
            double xr = ModalFlushingSolution.extrapolatedPoreVolumesToTarget(column, finer, CleanupCriterion.EFFLUENT,
                    TARGET, MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
            if (Math.abs(x) <= accuracy && Math.abs(xr) <= accuracy) {
                double t = micros(() -> ModalFlushingSolution.extrapolatedPoreVolumesToTarget(column, grid,
                        CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes());
                found.add(new Candidate("modal", "Richardson " + n + " and " + 2 * n + " cells", x, xr, t));
            }
        }
        // spectral elements (refinement: the next degree)
        for (int p = SpectralElementFlushingSolution.MINIMUM_DEGREE; p < 16; p++) {
            int degree = p;
            double e = SpectralElementFlushingSolution.of(column, degree).poreVolumesToTarget(CleanupCriterion.EFFLUENT,
                    TARGET, MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
            double r = SpectralElementFlushingSolution.of(column, degree + 1).poreVolumesToTarget(CleanupCriterion.EFFLUENT,
                    TARGET, MAX_PORE_VOLUMES).poreVolumes() / expected - 1;
            if (Math.abs(e) <= accuracy && Math.abs(r) <= accuracy) {
                double t = micros(() -> SpectralElementFlushingSolution.of(column, degree)
                        .poreVolumesToTarget(CleanupCriterion.EFFLUENT, TARGET, MAX_PORE_VOLUMES).poreVolumes());
                found.add(new Candidate("spectral", "degree " + degree, e, r, t));
            }
            // context: the method of lines on the same spectral-element equations
            MethodOfLinesSpectral lines = new MethodOfLinesSpectral(Cases.THICKNESS_METRES, Cases.WATER_CONTENT,
                    RETARDATION, Cases.DARCY_FLUX_METRES_PER_DAY, 1 / peclet, degree);
            for (double tol : tolerances) {
                double le = lines.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPv, tol) / daysPerPv / expected - 1;
                double lr = lines.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPv, tol / 10) / daysPerPv / expected
                        - 1;
                if (Math.abs(le) <= accuracy && Math.abs(lr) <= accuracy) {
                    double t = micros(() -> lines.daysToEffluentTarget(TARGET, MAX_PORE_VOLUMES * daysPerPv, tol));
                    found.add(new Candidate("lines on spectral", "degree " + degree + ", rel. tol. " + tol, le, lr, t));
                    break;
                }
            }
        }
        System.out.printf(Locale.ROOT, "%n== P = %g, accuracy %.0e (exact %.8f pore volumes)%n", peclet, accuracy, expected);
        for (String method : new String[] { "method of lines", "implicit", "modal", "spectral", "lines on spectral" }) {
            found.stream().filter(c -> c.method().equals(method)).sorted(Comparator.comparingDouble(Candidate::micros))
                    .limit(3).forEach(c -> System.out.printf(Locale.ROOT, "%-16s %-48s error %+.2e refined %+.2e  %9.1f us%n",
                            c.method(), c.settings(), c.error(), c.refinedError(), c.micros()));
        }
    }
}
