package eluvia.transport.numerical;

import java.util.List;

import eluvia.transport.TransportInputException;
import eluvia.transport.internal.GaussLobattoLegendre;
import eluvia.transport.internal.HouseholderTridiagonalisation;
import eluvia.transport.internal.SymmetricTridiagonalEigen;

/**
 * Flushing of a layered column with linear equilibrium sorption, solved by spectral elements in
 * depth (Patera 1984) and exactly in time: a few high-degree polynomials per layer instead of many
 * finite-volume cells, and the effluent, mean and maximum residual at any pore volume from one
 * symmetric eigenproblem. Its accuracy improves exponentially with the degree (at layer Peclet
 * number 10, degree 4 already gives the pore volumes to 1e-5), which makes it both the fast
 * path for such columns and an independent check of {@link NumericalFlushingSolver} and
 * {@link ModalFlushingSolution} on layered profiles, which the series of Brenner (1962) cannot
 * describe.
 *
 * <p><b>Equations.</b> Per layer, R theta dc/dt = d/dz(theta D dc/dz) - q dc/dz - k c, with A =
 * theta D = alpha_L q + theta tau D0 (m2/day), R theta = theta + rho_b Kd, k = theta mu_w + rho_b Kd
 * mu_s (1/day); a flux inlet q c_in = q c - A dc/dz at the top, zero gradient at the bottom, and
 * concentration and total flux continuous between layers. With phi(z) = integral of q / (2A) and
 * c = exp(phi) u the weak form becomes symmetric (the weight exp(-2 phi) that makes the
 * advection-dispersion operator self-adjoint, as in the Sturm-Liouville form of Brenner's problem):
 * <pre>
 *   integral(R theta u_t w) = -integral(A u' w' + (q^2 / (4A) + k) u w) - (q/2) u(0) w(0) - (q/2) u(L) w(L)
 *                             + q c_in exp(-phi(0)) w(0)
 * </pre>
 * for every test function w. In each element u is a polynomial of the chosen degree through its
 * Gauss-Lobatto-Legendre points, integrals by the same points (so the storage matrix M is
 * diagonal); the stiffness K is then symmetric positive definite. The solution is u(t) = u_s +
 * M^-1/2 exp(-B t) M^1/2 (u0 - u_s) with B = M^-1/2 K M^-1/2 and K u_s = b; B's eigenvalues
 * (decay rates of the modes, 1/day) and the projections the criteria need come from Householder
 * reduction to tridiagonal form and the implicit QL method.
 *
 * <p><b>Elements.</b> Each layer gets ceil(P / {@value #MAXIMUM_ELEMENT_PECLET}) elements (at
 * least one), P = q h / A its Peclet number; a point on a layer boundary belongs to both layers
 * (its initial pore water is the storage-weighted mean of the two, which keeps the initial mass
 * exact; its soil concentration is the larger of the two sides').
 *
 * <p><b>Range.</b> exp(phi) grows by exp(P/2) over a layer, so early-time values lose digits as
 * that factor grows (as in the Brenner series): columns whose spread exceeds
 * {@value #MAXIMUM_SCALE_SPREAD} (a total P above about 35) are refused, as are nonlinear,
 * two-region and dispersion-free layers and a per-cell initial condition; the implicit solver
 * takes them. The maximum residual is read at the points.
 *
 * <p><b>Use.</b> Immutable and thread-safe.
 */
public final class SpectralElementFlushingSolution extends ModalSolutionBase {
    /** Degree of the element polynomials when none is given. */
    public static final int DEFAULT_DEGREE = 8;
    /** Lowest degree accepted (every element then has a point inside). */
    public static final int MINIMUM_DEGREE = 2;
    /** Highest degree accepted. */
    public static final int MAXIMUM_DEGREE = GaussLobattoLegendre.MAXIMUM_DEGREE;
    /** Largest Peclet number of one element (the number of elements of a layer follows from it). */
    public static final double MAXIMUM_ELEMENT_PECLET = 10;
    /** Largest ratio of exp(phi) over the column accepted (early-time rounding grows with it; the modal solution's limit). */
    public static final double MAXIMUM_SCALE_SPREAD = ModalFlushingSolution.MAXIMUM_SCALE_SPREAD;
    /** Most points accepted (the eigenproblem is dense). */
    public static final int MAXIMUM_POINTS = 400;

    /** Litres per cubic metre: converts (mg/L) times m to mg/m2. */
    private static final double LITRES_PER_CUBIC_METRE = 1000.0;

    private final FlushingColumn column;
    private final int degree;
    private final int elements;
    private final int n;
    private final double[] depthMetres;
    private final ModeSum modes;

    private SpectralElementFlushingSolution(FlushingColumn column, int degree) {
        if (column == null) {
            throw new TransportInputException("flushing column", null, "a column");
        }
        if (degree < MINIMUM_DEGREE || degree > MAXIMUM_DEGREE) {
            throw new TransportInputException("degree of the spectral elements (dimensionless)", degree,
                    MINIMUM_DEGREE + " to " + MAXIMUM_DEGREE + " (" + DEFAULT_DEGREE + " by default)");
        }
        if (column.initialCondition().kind() == InitialCondition.Kind.PORE_WATER_PER_CELL) {
            throw new TransportInputException("initial condition", "per cell",
                    "per layer (pore water or soil) for the spectral elements; use the implicit solver for a per-cell profile");
        }
        this.column = column;
        this.degree = degree;
        List<SoilLayer> layers = column.layers();
        int layerCount = layers.size();
        double q = column.darcyFluxMetresPerDay();
        double[] dispersion = new double[layerCount];
        double[] capacity = new double[layerCount];
        double[] decay = new double[layerCount];
        double[] rho = new double[layerCount];
        double[] initialWater = new double[layerCount];
        int[] elementsOfLayer = new int[layerCount];
        int elementCount = 0;
        double halfPeclet = 0;
        for (int l = 0; l < layerCount; l++) {
            SoilLayer layer = layers.get(l);
            String which = "layer " + (l + 1);
            if (layer.isTwoRegion()) {
                throw new TransportInputException("sorption of " + which, "two-region",
                        "linear equilibrium in every layer for the spectral elements; use the implicit solver (NumericalFlushingSolver)");
            }
            if (!(layer.isotherm() instanceof SorptionIsotherm.Linear linear)) {
                throw new TransportInputException("sorption of " + which, layer.isotherm().describe(),
                        "linear equilibrium in every layer for the spectral elements; use the implicit solver (NumericalFlushingSolver)");
            }
            dispersion[l] = layer.dispersionTermSquareMetresPerDay(q);
            if (!(dispersion[l] > 0)) {
                throw new TransportInputException("dispersion term of " + which + " (m2/day)", dispersion[l],
                        "above 0 (a dispersivity or a diffusion coefficient) for the spectral elements; use the implicit solver");
            }
            double kd = linear.kdLitresPerKilogram();
            rho[l] = layer.bulkDensityKilogramsPerCubicMetre() / LITRES_PER_CUBIC_METRE;
            capacity[l] = layer.waterContent() + rho[l] * kd;
            decay[l] = layer.decayInWaterPerDay() * layer.waterContent() + layer.decayOnSolidsPerDay() * rho[l] * kd;
            InitialCondition ic = column.initialCondition();
            initialWater[l] = ic.kind() == InitialCondition.Kind.SOIL_PER_LAYER
                    ? InitialCondition.poreWaterInEquilibrium(layer, ic.value(l))
                    : ic.value(l);
            double peclet = q * layer.thicknessMetres() / dispersion[l];
            elementsOfLayer[l] = Math.max(1, (int) Math.ceil(peclet / MAXIMUM_ELEMENT_PECLET));
            elementCount += elementsOfLayer[l];
            halfPeclet += 0.5 * peclet;
        }
        if (halfPeclet > Math.log(MAXIMUM_SCALE_SPREAD)) {
            throw new TransportInputException("spread of the spectral-element scale exp(P/2) (dimensionless)",
                    Math.exp(halfPeclet), "at most " + MAXIMUM_SCALE_SPREAD
                            + " (a total Peclet number of about 35); use the implicit solver (NumericalFlushingSolver)");
        }
        long points = (long) elementCount * degree + 1;
        if (points > MAXIMUM_POINTS) {
            throw new TransportInputException("number of spectral-element points", points,
                    "at most " + MAXIMUM_POINTS + " (lower the degree or merge layers)");
        }
        elements = elementCount;
        n = (int) points;

        // assembly: storage M (diagonal), stiffness K (symmetric), point depth and phi, initial mass per point
        GaussLobattoLegendre gll = GaussLobattoLegendre.of(degree);
        double[] storage = new double[n];
        double[][] stiffness = new double[n][n];
        depthMetres = new double[n];
        double[] phi = new double[n];
        double[] initialMassPerPoint = new double[n];
        double[] soilPerWater = new double[n];
        int offset = 0;
        double top = 0;
        double phiTop = 0;
        double initialMaxWater = 0;
        double initialMaxSoil = 0;
        for (int l = 0; l < layerCount; l++) {
            SoilLayer layer = layers.get(l);
            double a = dispersion[l];
            double h = layer.thicknessMetres() / elementsOfLayer[l];
            double jacobian = 0.5 * h;
            double reaction = q * q / (4 * a) + decay[l];
            double gradient = q / (2 * a);
            for (int e = 0; e < elementsOfLayer[l]; e++, offset += degree) {
                for (int i = 0; i <= degree; i++) {
                    int g = offset + i;
                    double weight = gll.weight(i) * jacobian;
                    double within = e * h + (gll.point(i) + 1) * jacobian;
                    storage[g] += weight * capacity[l];
                    stiffness[g][g] += weight * reaction;
                    initialMassPerPoint[g] += weight * capacity[l] * initialWater[l];
                    soilPerWater[g] = Math.max(soilPerWater[g], capacity[l] / rho[l]);
                    depthMetres[g] = top + within;
                    phi[g] = phiTop + gradient * within;
                    for (int j = 0; j <= degree; j++) {
                        stiffness[g][offset + j] += a / jacobian * gll.stiffness(i, j);
                    }
                }
            }
            initialMaxWater = Math.max(initialMaxWater, initialWater[l]);
            initialMaxSoil = Math.max(initialMaxSoil, capacity[l] * initialWater[l] / rho[l]);
            top += layer.thicknessMetres();
            phiTop += gradient * layer.thicknessMetres();
        }
        stiffness[0][0] += 0.5 * q;
        stiffness[n - 1][n - 1] += 0.5 * q;
        // centre phi so that exp(+-phi) stays within the square root of the spread
        double mid = 0.5 * phiTop;
        double[] up = new double[n]; // exp(phi), c = up * u
        for (int g = 0; g < n; g++) {
            up[g] = Math.exp(phi[g] - mid);
        }

        double[] steadyU = steadyState(stiffness, q * column.inflowMilligramsPerLitre() / up[0]);
        double[] steady = new double[n];
        double[] y0 = new double[n];
        double[] massWeights = new double[n];
        double[] rootStorage = new double[n];
        double initialMass = 0;
        double steadyMass = 0;
        for (int g = 0; g < n; g++) {
            rootStorage[g] = Math.sqrt(storage[g]);
            steady[g] = up[g] * steadyU[g];
            double c0 = initialMassPerPoint[g] / storage[g];
            y0[g] = rootStorage[g] * (c0 - steady[g]) / up[g];
            massWeights[g] = LITRES_PER_CUBIC_METRE * rootStorage[g] * up[g];
            initialMass += LITRES_PER_CUBIC_METRE * initialMassPerPoint[g];
            steadyMass += LITRES_PER_CUBIC_METRE * storage[g] * steady[g];
        }
        double[][] symmetric = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                symmetric[i][j] = stiffness[i][j] / (rootStorage[i] * rootStorage[j]);
            }
        }
        double[] outlet = new double[n];
        outlet[n - 1] = 1;
        double[][] projections = { outlet, y0, massWeights };
        double[] diagonal = new double[n];
        double[] off = new double[n - 1];
        HouseholderTridiagonalisation.reduce(copy(symmetric), diagonal, off, projections);
        double[] tridiagonal = diagonal.clone();
        double[] tridiagonalOff = off.clone();
        SymmetricTridiagonalEigen.decompose(diagonal, off, projections); // diagonal becomes the rates, 1/day
        int[] order = ModeSum.ascendingOrder(diagonal);
        double[] sortedRates = new double[n];
        double[] effluentCoefficients = new double[n];
        double[] massCoefficients = new double[n];
        double[] amplitudes = new double[n];
        for (int k = 0; k < n; k++) {
            int j = order[k];
            sortedRates[k] = diagonal[j];
            amplitudes[k] = y0[j];
            effluentCoefficients[k] = up[n - 1] / rootStorage[n - 1] * outlet[j] * y0[j];
            massCoefficients[k] = massWeights[j] * y0[j];
        }
        modes = new ModeSum(sortedRates, effluentCoefficients, massCoefficients, steady[n - 1], steadyMass,
                initialMaxWater, initialMass, initialMaxSoil, steady, soilPerWater, column.daysForPoreVolumes(1),
                () -> pointCoefficients(symmetric, tridiagonal, tridiagonalOff, order, amplitudes, up, rootStorage));
    }

    /** The column solved with {@value #DEFAULT_DEGREE}-degree elements. */
    public static SpectralElementFlushingSolution of(FlushingColumn column) {
        return of(column, DEFAULT_DEGREE);
    }

    /**
     * The column solved with elements of the given degree.
     *
     * @throws TransportInputException for a degree outside {@value #MINIMUM_DEGREE} to
     *         {@value #MAXIMUM_DEGREE}, a nonlinear, two-region or dispersion-free layer, a
     *         per-cell initial condition, a scale spread above {@value #MAXIMUM_SCALE_SPREAD} or
     *         more than {@value #MAXIMUM_POINTS} points, naming which
     */
    public static SpectralElementFlushingSolution of(FlushingColumn column, int degree) {
        return new SpectralElementFlushingSolution(column, degree);
    }

    private static double[][] copy(double[][] a) {
        double[][] out = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i].clone();
        }
        return out;
    }

    /** K u = b for b = (inflow term, 0, ..., 0), by Cholesky factorisation (K is symmetric positive definite); zero for clean inflow. */
    private static double[] steadyState(double[][] k, double inflowTerm) {
        int n = k.length;
        double[] u = new double[n];
        if (inflowTerm == 0) {
            return u;
        }
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j <= i; j++) {
                double s = k[i][j];
                for (int m = 0; m < j; m++) {
                    s -= c[i][m] * c[j][m];
                }
                c[i][j] = i == j ? Math.sqrt(s) : s / c[j][j];
            }
        }
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double s = i == 0 ? inflowTerm : 0;
            for (int m = 0; m < i; m++) {
                s -= c[i][m] * y[m];
            }
            y[i] = s / c[i][i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = y[i];
            for (int m = i + 1; m < n; m++) {
                s -= c[m][i] * u[m];
            }
            u[i] = s / c[i][i];
        }
        return u;
    }

    /** c_g(t) = c_s,g + sum_k row_g[k] exp(-lambda_k t), rows from the eigenvectors projected on the unit vectors. */
    private static double[][] pointCoefficients(double[][] symmetric, double[] tridiagonal, double[] tridiagonalOff,
            int[] order, double[] amplitudes, double[] up, double[] rootStorage) {
        int n = tridiagonal.length;
        double[][] rows = new double[n][n];
        for (int i = 0; i < n; i++) {
            rows[i][i] = 1;
        }
        HouseholderTridiagonalisation.reduce(copy(symmetric), new double[n], new double[n - 1], rows);
        SymmetricTridiagonalEigen.decompose(tridiagonal.clone(), tridiagonalOff, rows);
        double[][] cc = new double[n][n];
        for (int g = 0; g < n; g++) {
            double factor = up[g] / rootStorage[g];
            for (int k = 0; k < n; k++) {
                cc[g][k] = factor * rows[g][order[k]] * amplitudes[k];
            }
        }
        return cc;
    }

    /** The column. */
    public FlushingColumn column() {
        return column;
    }

    /** Degree of the element polynomials. */
    public int degree() {
        return degree;
    }

    /** Number of elements over all layers. */
    public int elementCount() {
        return elements;
    }

    /** Number of points (unknowns): elements times degree, plus one. */
    public int pointCount() {
        return n;
    }

    /** Depth of every point below the top of the column, m, ascending. */
    public double[] pointDepthsMetres() {
        return depthMetres.clone();
    }

    @Override
    public String name() {
        return "spectral-element";
    }

    @Override
    ModeSum modes() {
        return modes;
    }

    @Override
    public String description() {
        return "spectral elements of degree " + degree + " (Patera 1984; " + n + " points, " + elements
                + " element(s) in " + column.layers().size()
                + " layer(s), linear equilibrium sorption), solved exactly in time by their modes";
    }

}
