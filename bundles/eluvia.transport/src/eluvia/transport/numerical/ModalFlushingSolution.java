package eluvia.transport.numerical;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.TransportInputException;
import eluvia.transport.internal.SymmetricTridiagonalEigen;

/**
 * The finite-volume equations of {@link NumericalFlushingSolver} solved exactly in time, for a
 * column whose layers all have linear equilibrium sorption (any number of layers, first-order
 * decay, clean or contaminated inflow): no time steps, so no time-stepping error, and the
 * effluent, mean and maximum residual at any pore volume from one decomposition.
 *
 * <p><b>Method.</b> In space the grid and operator are the implicit solver's own (same cells,
 * conductances, advection scheme, flux inlet and zero-gradient outlet), so both solve the same
 * semi-discrete system C dc/dt = -K c + b (C the storage theta + rho_b Kd per cell, K the
 * tridiagonal transport and decay operator, b the inflow). Its solution is c(t) = c_s +
 * exp(-C^-1 K t) (c0 - c_s) with the steady state K c_s = b. Every face couples its two cells
 * both ways (dispersive conductance above the advective share of the downstream cell), so the
 * diagonal scaling s_(i+1) = s_i sqrt(K_(i,i+1) C_(i+1) / (K_(i+1,i) C_i)) makes S C^-1 K S^-1
 * symmetric (the similarity of a tridiagonal matrix with off-diagonal products of one sign,
 * Wilkinson 1965, The Algebraic Eigenvalue Problem, chapter 5). Its eigenvalues lambda_k (decay
 * rates of the modes, 1/day) and the projections the three criteria need are found by the
 * implicit QL method ({@link SymmetricTridiagonalEigen}); each criterion is then a sum of
 * exponentials, a_k exp(-lambda_k t), the discrete counterpart of the series of Brenner (1962).
 *
 * <p><b>Range.</b> The scaling grows or shrinks by the same factor over each face, about
 * exp(P/2) over a layer of Peclet number P; early-time values lose digits in proportion (as
 * the Brenner series does). Columns whose scale spread exceeds {@value #MAXIMUM_SCALE_SPREAD}
 * (P above about 35 in one layer), and columns with a face coupled one way only (pure upwind
 * advection without dispersion), are refused with a message; the implicit solver handles them.
 * Nonlinear and two-region columns are refused too.
 *
 * <p><b>Use.</b> Immutable and thread-safe; the rows of the eigenvector matrix for the maximum
 * residual are computed at first use.
 */
public final class ModalFlushingSolution extends ModalSolutionBase {
    /** Largest ratio of the symmetrising scale factors accepted (rounding of early-time values grows with it). */
    public static final double MAXIMUM_SCALE_SPREAD = 1e8;

    /** Litres per cubic metre: converts (mg/L) times m to mg/m2. */
    private static final double LITRES_PER_CUBIC_METRE = 1000.0;

    private final FlushingColumn column;
    private final SolverSettings settings;
    private final int n;
    /** The modes and the three criteria read from them. */
    private final ModeSum modes;

    private ModalFlushingSolution(FlushingColumn column, SolverSettings settings,
            NumericalFlushingSolver.SemiDiscreteSystem sys) {
        this.column = column;
        this.settings = settings;
        this.n = sys.n();
        double[] cap = sys.capM();
        double[] lo = sys.lo();
        double[] up = sys.up();
        double[] scale = symmetrisingScale(sys);
        double[] diag = new double[n];
        double[] off = new double[Math.max(0, n - 1)];
        for (int i = 0; i < n; i++) {
            diag[i] = (sys.dg()[i] + sys.decM()[i]) / cap[i];
            if (i + 1 < n) {
                off[i] = -Math.sqrt((up[i] / cap[i]) * (lo[i + 1] / cap[i + 1]));
            }
        }
        double[] symmetricDiagonal = diag.clone();

        double[] steady = steadyState(sys);
        double[] y0 = new double[n];
        double mass0 = 0;
        double maxSoil0 = 0;
        double massSteady = 0;
        double[] massWeights = new double[n];
        double[] soilPerWater = new double[n];
        for (int i = 0; i < n; i++) {
            y0[i] = scale[i] * (sys.initialC()[i] - steady[i]);
            double perCell = cap[i] * sys.dz()[i] * LITRES_PER_CUBIC_METRE;
            massWeights[i] = perCell / scale[i];
            mass0 += perCell * sys.initialC()[i];
            massSteady += perCell * steady[i];
            soilPerWater[i] = cap[i] / sys.rhoB()[i];
            maxSoil0 = Math.max(maxSoil0, soilPerWater[i] * sys.initialC()[i]);
        }
        double[] outlet = new double[n];
        outlet[n - 1] = 1;
        double[][] projections = { outlet, y0, massWeights };
        SymmetricTridiagonalEigen.decompose(diag, off, projections);
        int[] order = ModeSum.ascendingOrder(diag);
        double[] rates = new double[n];
        double[] effluentCoefficients = new double[n];
        double[] massCoefficients = new double[n];
        double[] amplitudes = new double[n];
        for (int k = 0; k < n; k++) {
            int j = order[k];
            rates[k] = diag[j];
            amplitudes[k] = y0[j];
            effluentCoefficients[k] = outlet[j] * y0[j] / scale[n - 1];
            massCoefficients[k] = massWeights[j] * y0[j];
        }
        modes = new ModeSum(rates, effluentCoefficients, massCoefficients, steady[n - 1], massSteady,
                sys.initialMaxC(), mass0, maxSoil0, steady, soilPerWater, column.daysForPoreVolumes(1),
                () -> cellCoefficients(symmetricDiagonal, off, order, amplitudes, scale));
    }

    /** Rows of V over the cell scale times the amplitudes: c_i(t) = c_s,i + sum_k row_i[k] exp(-lambda_k t). */
    private static double[][] cellCoefficients(double[] symmetricDiagonal, double[] symmetricOffDiagonal, int[] order,
            double[] amplitudes, double[] scale) {
        int n = symmetricDiagonal.length;
        double[][] rows = new double[n][n];
        for (int i = 0; i < n; i++) {
            rows[i][i] = 1;
        }
        SymmetricTridiagonalEigen.decompose(symmetricDiagonal.clone(), symmetricOffDiagonal, rows);
        double[][] cc = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                cc[i][k] = rows[i][order[k]] * amplitudes[k] / scale[i];
            }
        }
        return cc;
    }

    /**
     * The diagonal scaling that symmetrises C^-1 K (centred on 1 in the logarithm), found as
     * logarithms first so that a wide spread is refused before it overflows.
     *
     * @throws TransportInputException for a face coupled one way only or a spread above
     *         {@value #MAXIMUM_SCALE_SPREAD}
     */
    private static double[] symmetrisingScale(NumericalFlushingSolver.SemiDiscreteSystem sys) {
        int n = sys.n();
        double[] cap = sys.capM();
        double[] lo = sys.lo();
        double[] up = sys.up();
        double[] logScale = new double[n];
        double logMin = 0;
        double logMax = 0;
        for (int i = 0; i + 1 < n; i++) {
            double right = up[i] / cap[i]; // T(i, i+1)
            double left = lo[i + 1] / cap[i + 1]; // T(i+1, i)
            if (!(right < 0 && left < 0)) {
                throw new TransportInputException("coupling of cells " + (i + 1) + " and " + (i + 2),
                        "one way only (advection without enough dispersion)",
                        "both ways for the modal solution: use the implicit solver (NumericalFlushingSolver)");
            }
            logScale[i + 1] = logScale[i] + 0.5 * (Math.log(-right) - Math.log(-left));
            logMin = Math.min(logMin, logScale[i + 1]);
            logMax = Math.max(logMax, logScale[i + 1]);
        }
        if (logMax - logMin > Math.log(MAXIMUM_SCALE_SPREAD)) {
            throw new TransportInputException("spread of the modal scale factors (dimensionless)",
                    Math.exp(logMax - logMin), "at most " + MAXIMUM_SCALE_SPREAD
                            + " (about P = 35 in a layer); use the implicit solver (NumericalFlushingSolver)");
        }
        double[] scale = new double[n];
        double mid = 0.5 * (logMax + logMin);
        for (int i = 0; i < n; i++) {
            scale[i] = Math.exp(logScale[i] - mid);
        }
        return scale;
    }

    /**
     * Whether the modal solution can take this column with these settings (see the class
     * comment); builds the grid and checks it, without the decomposition.
     */
    public static boolean applies(FlushingColumn column, SolverSettings settings) {
        try {
            symmetrisingScale(linearSystem(new NumericalFlushingSolver(column, settings)));
            return true;
        } catch (TransportInputException e) {
            return false;
        }
    }

    private static NumericalFlushingSolver.SemiDiscreteSystem linearSystem(NumericalFlushingSolver grid) {
        NumericalFlushingSolver.SemiDiscreteSystem sys = grid.linearEquilibriumSystem();
        if (sys == null) {
            throw new TransportInputException("sorption of the column", "nonlinear or two-region",
                    "linear equilibrium in every layer for the modal solution; use the implicit solver (NumericalFlushingSolver)");
        }
        return sys;
    }

    /**
     * @throws TransportInputException for a nonlinear or two-region column, a face coupled one
     *         way only, or a scale spread above {@value #MAXIMUM_SCALE_SPREAD}, naming which
     */
    public static ModalFlushingSolution of(FlushingColumn column, SolverSettings settings) {
        return of(column, settings, 1);
    }

    /** As {@link #of(FlushingColumn, SolverSettings)} with every cell split into {@code refinement} cells. */
    static ModalFlushingSolution of(FlushingColumn column, SolverSettings settings, int refinement) {
        return new ModalFlushingSolution(column, settings,
                linearSystem(new NumericalFlushingSolver(column, settings, refinement)));
    }

    /** Steady state K c = b by the Thomas algorithm (zero when the inflow is clean). */
    private static double[] steadyState(NumericalFlushingSolver.SemiDiscreteSystem sys) {
        int n = sys.n();
        double[] c = new double[n];
        if (sys.inflowSource() == 0) {
            return c;
        }
        double[] diag = new double[n];
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            diag[i] = sys.dg()[i] + sys.decM()[i];
        }
        rhs[0] = sys.inflowSource();
        for (int i = 1; i < n; i++) {
            double w = sys.lo()[i] / diag[i - 1];
            diag[i] -= w * sys.up()[i - 1];
            rhs[i] -= w * rhs[i - 1];
        }
        c[n - 1] = rhs[n - 1] / diag[n - 1];
        for (int i = n - 2; i >= 0; i--) {
            c[i] = (rhs[i] - sys.up()[i] * c[i + 1]) / diag[i];
        }
        return c;
    }

    /** The column. */
    public FlushingColumn column() {
        return column;
    }

    /** Cells of the grid (the implicit solver's for the same settings). */
    public int cellCount() {
        return n;
    }

    @Override
    public String name() {
        return "modal";
    }

    @Override
    ModeSum modes() {
        return modes;
    }

    @Override
    public String description() {
        return "finite volumes solved exactly in time by their modes (" + n + " cells, " + column.layers().size()
                + " layer(s), linear equilibrium sorption)";
    }

    /**
     * Pore volumes to target with Richardson extrapolation in space (Richardson 1911): the modal
     * solution has no time error, so with the grid of {@code settings} and the grid with every
     * cell halved the pore volumes behave as T + a dz^2 + higher terms (central scheme, no upwind
     * faces) and (4 T(dz/2) - T(dz)) / 3 removes the leading term; |fine - coarse| / 3 estimates
     * the error of the fine grid. The cost measure of the result is the sum of the squared cell
     * counts (the decompositions' work is of that order).
     */
    public static ExtrapolatedTarget extrapolatedPoreVolumesToTarget(FlushingColumn column, SolverSettings settings,
            CleanupCriterion criterion, double targetFraction, double maxPoreVolumes) {
        ModalFlushingSolution coarse = of(column, settings, 1);
        ModalFlushingSolution fine = of(column, settings, 2);
        PoreVolumeResult a = coarse.poreVolumesToTarget(criterion, targetFraction, maxPoreVolumes);
        PoreVolumeResult b = fine.poreVolumesToTarget(criterion, targetFraction, maxPoreVolumes);
        long cost = (long) coarse.n * coarse.n + (long) fine.n * fine.n;
        return ExtrapolatedTarget.ofSecondOrder(criterion, targetFraction, a.reachable() && b.reachable(), a.poreVolumes(),
                b.poreVolumes(), cost);
    }

    /** The settings the grid was made with. */
    public SolverSettings settings() {
        return settings;
    }
}
