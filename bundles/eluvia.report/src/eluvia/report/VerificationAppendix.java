package eluvia.report;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleSupplier;

import eluvia.cost.PresentValue;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModels;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.LayerTransport;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.PoreVolumeSearch;
import eluvia.transport.SemiInfiniteSolutions;
import eluvia.transport.TransportProperties;
import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.InitialCondition;
import eluvia.transport.numerical.ModalFlushingSolution;
import eluvia.transport.numerical.NumericalFlushingModel;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.SoilLayer;
import eluvia.transport.numerical.SolverSettings;
import eluvia.transport.numerical.SorptionIsotherm;
import eluvia.transport.numerical.SpectralElementFlushingSolution;

/**
 * The verification appendix of a design package: the solvers' verification cases are RUN each
 * time a package is written, and the computed values are set against reference values with their
 * sources, so that a reviewer sees that this build of the program reproduces the published and
 * independently computed numbers the results rest on.
 *
 * <p>Cases: the Ogata and Banks (1961) first-type and the Lindstrom et al. (1967) flux-inlet
 * semi-infinite solutions at P = 10, T = 1 and the same with t = 2 d, R = 2; the well-mixed (batch
 * flush) estimate T = -R ln(C/C0) (US EPA pump-and-treat guidance); the Millington and Quirk (1961)
 * tortuosity; the retardation factor with Kd = Koc foc (Karickhoff et al. 1979); the series
 * present-value factor P/A (US EPA/USACE 2000, EPA 540-R-00-002) from the cost bundle; the
 * finite-layer solution (Brenner 1962) in its plug-flow (P to infinity) and well-mixed (P to 0)
 * limits; the numerical finite-volume solver, its modal (exact-in-time) solution and the
 * spectral-element solution against the Brenner series for one layer; the numerical solver
 * against its modal solution (its time error alone); and, for two layers, which no series
 * describes, the numerical solver against the spectral-element solution (a different
 * discretisation, converged in its degree).
 * Reference values of the first cases are the check values of the project's REFERENCES.md, computed
 * from the published formulas; each case says so in its source.
 *
 * <p>Each case has an absolute tolerance in the unit of its value: one unit in the last digit of a
 * reference value printed to a fixed number of digits, or the stated accuracy of the method for
 * the limits and the numerical solver. A case passes when the computed value is finite and within
 * the tolerance of the reference; a case whose computation throws fails with the message.
 */
public final class VerificationAppendix {

    /**
     * One verification case.
     *
     * @param name what is computed, with its inputs, e.g. "Ogata-Banks C/C0, P = 10, T = 1, R = 1"
     * @param unit the unit of the value ("-" for a dimensionless one)
     * @param referenceValue the value to reproduce, in {@code unit}
     * @param source where the reference value comes from
     * @param tolerance the largest allowed |computed - reference|, in {@code unit}, greater than 0
     * @param toleranceBasis why the tolerance is what it is
     * @param computation runs the program's own code for the value, in {@code unit}
     */
    public record Case(String name, String unit, double referenceValue, String source, double tolerance,
            String toleranceBasis, DoubleSupplier computation) {

        /** Refuses a case that could not fail or has nothing to compute. */
        public Case {
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("verification case name is " + name + "; allowed: a non-blank name");
            }
            if (!Double.isFinite(referenceValue)) {
                throw new IllegalArgumentException("reference value of verification case '" + name + "' is "
                        + referenceValue + "; allowed: a finite number");
            }
            if (!(tolerance > 0) || Double.isInfinite(tolerance)) {
                throw new IllegalArgumentException("tolerance of verification case '" + name + "' is " + tolerance
                        + " " + unit + "; allowed: finite and greater than 0 (a check with no tolerance cannot be judged)");
            }
            if (computation == null) {
                throw new IllegalArgumentException("computation of verification case '" + name
                        + "' is missing (null); allowed: the code that computes the value");
            }
        }

        /** The same case with another reference value (to show what a failing case looks like). */
        public Case withReferenceValue(double value) {
            return new Case(name, unit, value, source, tolerance, toleranceBasis, computation);
        }

        /** The same case with another tolerance, in {@code unit}. */
        public Case withTolerance(double value) {
            return new Case(name, unit, referenceValue, source, value, toleranceBasis, computation);
        }
    }

    /**
     * The outcome of one case.
     *
     * @param verificationCase the case
     * @param computedValue what the program computed, in the case's unit (NaN when it failed to compute)
     * @param difference computed minus reference, in the case's unit (NaN when not computed)
     * @param passed whether |difference| is within the tolerance
     * @param error the message of the exception the computation threw, or "" when it did not
     */
    public record Row(Case verificationCase, double computedValue, double difference, boolean passed, String error) {
    }

    /**
     * The outcome of all cases.
     *
     * @param rows one per case, in the order run
     */
    public record Outcome(List<Row> rows) {

        /** Copies the list. */
        public Outcome {
            rows = List.copyOf(rows);
        }

        /** Whether every case passed (and there was at least one). */
        public boolean passed() {
            return !rows.isEmpty() && rows.stream().allMatch(Row::passed);
        }

        /** The cases that failed. */
        public List<Row> failures() {
            return rows.stream().filter(r -> !r.passed()).toList();
        }
    }

    private static final String DIMENSIONLESS = "-";
    private static final String CHECK_VALUES = "check value computed from ";

    private VerificationAppendix() {
    }

    /** Runs {@link #standardCases()}. */
    public static Outcome runStandard() {
        return run(standardCases());
    }

    /** Runs the cases and judges each against its tolerance. */
    public static Outcome run(List<Case> cases) {
        if (cases == null || cases.isEmpty()) {
            throw new IllegalArgumentException("verification cases are " + (cases == null ? "missing (null)" : "empty")
                    + "; allowed: at least one case");
        }
        List<Row> rows = new ArrayList<>(cases.size());
        for (Case c : cases) {
            double computed;
            try {
                computed = c.computation().getAsDouble();
            } catch (RuntimeException e) {
                rows.add(new Row(c, Double.NaN, Double.NaN, false, e.getClass().getSimpleName() + ": " + e.getMessage()));
                continue;
            }
            double difference = computed - c.referenceValue();
            boolean passed = Double.isFinite(computed) && Math.abs(difference) <= c.tolerance();
            rows.add(new Row(c, computed, difference, passed, Double.isFinite(computed) ? "" : "not a finite number"));
        }
        return new Outcome(rows);
    }

    /** The cases every design package runs, in the order they are tabulated. */
    public static List<Case> standardCases() {
        List<Case> cases = new ArrayList<>();
        String sixDigits = "one unit in the 6th decimal of the reference";
        String fourDigits = "one unit in the 4th decimal of the reference";
        String ob = CHECK_VALUES + "Ogata and Banks (1961), USGS Prof. Paper 411-A";
        String fl = CHECK_VALUES + "Lindstrom et al. (1967), Environ. Sci. Technol. 1:561";
        cases.add(new Case("Ogata-Banks first-type inlet C/C0, P = 10, T = 1, R = 1 (X = 1)", DIMENSIONLESS, 0.585289,
                ob, 1e-6, sixDigits, () -> SemiInfiniteSolutions.firstTypeInletStep(1, 1, 10, 1)));
        cases.add(new Case("Flux-inlet C/C0, P = 10, T = 1, R = 1 (X = 1)", DIMENSIONLESS, 0.493058, fl, 1e-6, sixDigits,
                () -> SemiInfiniteSolutions.fluxInletStep(1, 1, 10, 1)));
        cases.add(new Case("Ogata-Banks C/C0, x = 1 m, t = 2 d, v = 1 m/d, D = 0.1 m\u00b2/d, R = 2", DIMENSIONLESS,
                0.585289, ob, 1e-6, sixDigits, () -> SemiInfiniteSolutions.firstTypeInletStepAt(1, 2, 1, 0.1, 2)));
        cases.add(new Case("Flux-inlet C/C0, x = 1 m, t = 2 d, v = 1 m/d, D = 0.1 m\u00b2/d, R = 2", DIMENSIONLESS,
                0.493058, fl, 1e-6, sixDigits, () -> SemiInfiniteSolutions.fluxInletStepAt(1, 2, 1, 0.1, 2)));
        String batch = CHECK_VALUES + "T = -R ln(C/C0) (US EPA pump-and-treat guidance)";
        cases.add(new Case("Well-mixed pore volumes, R = 1, C/C0 = 0.01", DIMENSIONLESS, 4.6052, batch, 1e-4, fourDigits,
                () -> wellMixedPoreVolumes(1, 0.01)));
        cases.add(new Case("Well-mixed pore volumes, R = 2.5, C/C0 = 0.001", DIMENSIONLESS, 17.2694, batch, 1e-4,
                fourDigits, () -> wellMixedPoreVolumes(2.5, 0.001)));
        cases.add(new Case("Well-mixed pore volumes, R = 5, C/C0 = 0.05", DIMENSIONLESS, 14.9787, batch, 1e-4, fourDigits,
                () -> wellMixedPoreVolumes(5, 0.05)));
        String mq = CHECK_VALUES + "Millington and Quirk (1961), Trans. Faraday Soc. 57:1200";
        cases.add(new Case("Millington-Quirk tortuosity, \u03b8 = n = 0.40", DIMENSIONLESS, 0.7368, mq, 1e-4, fourDigits,
                () -> TransportProperties.millingtonQuirkTortuosity(0.40, 0.40)));
        cases.add(new Case("Millington-Quirk tortuosity, \u03b8 = 0.25, n = 0.40", DIMENSIONLESS, 0.2461, mq, 1e-4,
                fourDigits, () -> TransportProperties.millingtonQuirkTortuosity(0.25, 0.40)));
        cases.add(new Case("Retardation factor, \u03c1b = 1.6 kg/L, \u03b8 = 0.3, Koc = 59 L/kg, foc = 0.002",
                DIMENSIONLESS, 1.6293, CHECK_VALUES + "R = 1 + \u03c1b Koc foc / \u03b8 (Karickhoff et al. 1979)", 1e-4,
                fourDigits,
                () -> TransportProperties.retardation(1600, TransportProperties.kdFromKoc(59, 0.002), 0.3)));
        cases.add(new Case("Series present-value factor P/A, 7 % per year, 30 years", DIMENSIONLESS, 12.4090,
                CHECK_VALUES + "P/A = [(1 + i)^n - 1] / [i (1 + i)^n] (US EPA/USACE 2000, EPA 540-R-00-002)", 1e-4,
                fourDigits, () -> PresentValue.seriesFactor(7, 30)));
        cases.add(new Case("Finite layer, P = 100000, R = 2: pore volumes to a mean residual of 0.01", DIMENSIONLESS,
                0.99 * 2, "plug-flow limit P \u2192 \u221e: the mean residual is 1 - T/R, so T = 0.99 R",
                1e-3 * 1.98, "0.1 % of the reference: the front's spread at P = 100000 is far below it",
                () -> finiteLayerPoreVolumes(2, 1e5, CleanupCriterion.MEAN_RESIDUAL, 0.01)));
        cases.add(new Case("Finite layer, P = 0.0001, R = 2.5: pore volumes to an effluent of 0.001", DIMENSIONLESS,
                17.2694, "well-mixed limit P \u2192 0: T = -R ln(C/C0) (check value)", 1e-4 * 17.2694,
                "0.01 % of the reference: the departure from the limit is of order P",
                () -> finiteLayerPoreVolumes(2.5, 1e-4, CleanupCriterion.EFFLUENT, 0.001)));
        LayerFlushingInput layer = new LayerFlushingInput(2, 0.3, 0.4, 1600, 0.5, 0.05, 0.2, 1e-9, 0);
        double brenner = PoreVolumeSearch.solve(FlushingModels.finiteLayer(LayerTransport.of(layer)),
                CleanupCriterion.MEAN_RESIDUAL, 0.01, 100).poreVolumes();
        cases.add(new Case("Numerical solver (default settings), layer 2 m, \u03b8 0.3, n 0.4, \u03c1b 1600 kg/m\u00b3, "
                + "Kd 0.5 L/kg, q 0.05 m/d, \u03b1L 0.2 m: pore volumes to a mean residual of 0.01", DIMENSIONLESS,
                brenner, "Brenner (1962) finite-layer series for the same layer, summed to convergence by this program",
                1e-3 * brenner, "0.1 % of the reference: the solver's documented accuracy at its defaults is 2e-4 to 5.5e-4",
                () -> NumericalFlushingModel.of(layer, SolverSettings.defaults())
                        .poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL, 0.01, 100).poreVolumes()));
        FlushingColumn grid = NumericalFlushingModel.of(layer, SolverSettings.defaults()).column();
        cases.add(new Case("Modal solution (exact in time) on the numerical solver's default grid, same layer: "
                + "pore volumes to a mean residual of 0.01", DIMENSIONLESS, brenner,
                "Brenner (1962) finite-layer series for the same layer, summed to convergence by this program",
                1e-4 * brenner, "0.01 % of the reference: with no time error only the grid's second-order error remains",
                () -> ModalFlushingSolution.of(grid, SolverSettings.defaults())
                        .poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL, 0.01, 100).poreVolumes()));
        double modal = ModalFlushingSolution.of(grid, SolverSettings.defaults())
                .poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL, 0.01, 100).poreVolumes();
        cases.add(new Case("Numerical solver (default settings) against the modal solution of the same grid: "
                + "its time-stepping error alone, pore volumes to a mean residual of 0.01", DIMENSIONLESS, modal,
                "modal solution of the same finite-volume equations, exact in time (this program)", 5e-4 * modal,
                "0.05 % of the reference: adaptive BDF2 at its default step tolerance",
                () -> NumericalFlushingModel.of(layer, SolverSettings.defaults())
                        .poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL, 0.01, 100).poreVolumes()));
        cases.add(new Case("Spectral elements (degree " + SpectralElementFlushingSolution.DEFAULT_DEGREE
                + ", exact in time), same layer: pore volumes to a mean residual of 0.01", DIMENSIONLESS, brenner,
                "Brenner (1962) finite-layer series for the same layer, summed to convergence by this program",
                1e-7 * brenner, "1e-5 % of the reference: the error falls exponentially with the degree (Patera 1984)",
                () -> SpectralElementFlushingSolution.of(grid)
                        .poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL, 0.01, 100).poreVolumes()));
        FlushingColumn twoLayers = twoLayerColumn();
        double spectral = twoLayerSpectral(twoLayers, 12);
        double higher = twoLayerSpectral(twoLayers, 14);
        cases.add(new Case("Numerical solver (default settings), two layers: 1.2 m of the same soil (Kd 0.5 L/kg, \u03b1L 0.2 m) "
                + "over 0.8 m with "
                + "\u03b8 0.35, n 0.42, \u03c1b 1550 kg/m\u00b3, Kd 1.2 L/kg, \u03b1L 0.05 m, initially 1 and 3 mg/L: "
                + "pore volumes to a mean residual of 0.01", DIMENSIONLESS, spectral,
                String.format(java.util.Locale.ROOT, "spectral elements of degree 12, exact in time (this program; "
                        + "degree 14 differs by %.1e relative): no series describes two layers", higher / spectral - 1),
                1e-3 * spectral, "0.1 % of the reference: the solver's documented accuracy at its defaults",
                () -> new NumericalFlushingSolver(twoLayers, SolverSettings.defaults())
                        .run(FlushingRunRequest.upToPoreVolumes(100).target(CleanupCriterion.MEAN_RESIDUAL, 0.01).build())
                        .outcome(CleanupCriterion.MEAN_RESIDUAL).poreVolumes()));
        return cases;
    }

    /** The invented two-layer column of the layered case (not a real site), q = 0.05 m/d. */
    private static FlushingColumn twoLayerColumn() {
        SoilLayer upper = SoilLayer.builder().thicknessMetres(1.2).waterContent(0.3).porosity(0.4)
                .bulkDensityKilogramsPerCubicMetre(1600).isotherm(SorptionIsotherm.linear(0.5)).dispersivityMetres(0.2)
                .freeWaterDiffusionSquareMetresPerSecond(1e-9).build();
        SoilLayer lower = SoilLayer.builder().thicknessMetres(0.8).waterContent(0.35).porosity(0.42)
                .bulkDensityKilogramsPerCubicMetre(1550).isotherm(SorptionIsotherm.linear(1.2)).dispersivityMetres(0.05)
                .freeWaterDiffusionSquareMetresPerSecond(1e-9).build();
        return new FlushingColumn(List.of(upper, lower), 0.05, 0, InitialCondition.poreWaterPerLayer(1, 3));
    }

    private static double twoLayerSpectral(FlushingColumn column, int degree) {
        return reached(SpectralElementFlushingSolution.of(column, degree).poreVolumesToTarget(CleanupCriterion.MEAN_RESIDUAL,
                0.01, 100));
    }

    private static double wellMixedPoreVolumes(double retardation, double targetFraction) {
        LayerTransport t = new LayerTransport(retardation, 1, 0.5, 0.1, 10, 0);
        return reached(PoreVolumeSearch.solve(FlushingModels.wellMixed(t), CleanupCriterion.EFFLUENT, targetFraction, 1000));
    }

    private static double finiteLayerPoreVolumes(double retardation, double peclet, CleanupCriterion criterion,
            double targetFraction) {
        // v = 1 m/d and D = 1/P m2/d give P = v L / D for L = 1 m
        LayerTransport t = new LayerTransport(retardation, 1, 0.5, 1 / peclet, peclet, 0);
        return reached(PoreVolumeSearch.solve(FlushingModels.finiteLayer(t), criterion, targetFraction, 1000));
    }

    private static double reached(PoreVolumeResult r) {
        return r.reachable() ? r.poreVolumes() : Double.NaN;
    }
}
