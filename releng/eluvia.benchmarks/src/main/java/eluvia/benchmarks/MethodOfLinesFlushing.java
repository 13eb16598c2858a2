package eluvia.benchmarks;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * The baseline of the speed comparison: flushing one linear equilibrium layer by the method of
 * lines, the same cell-centred finite volumes in space (central advection, flux inlet,
 * zero-gradient outlet) integrated in time by a general-purpose adaptive integrator, Commons
 * Math 3.6.1 {@link DormandPrince853Integrator}, whose event locator finds the time at which the
 * effluent falls to the target.
 *
 * <p>Units: depth in m, time in days, concentrations as fractions of the initial one.
 */
final class MethodOfLinesFlushing implements FirstOrderDifferentialEquations {
    private final int cells;
    private final double darcyFluxMetresPerDay;
    private final double capacity;
    private final double cellSizeMetres;
    private final double conductanceMetresPerDay;

    /**
     * @param thicknessMetres layer thickness
     * @param waterContent theta (dimensionless)
     * @param retardation R (dimensionless)
     * @param darcyFluxMetresPerDay q
     * @param dispersivityMetres alpha_L (no diffusion: theta D = alpha_L q)
     * @param cells number of cells
     */
    MethodOfLinesFlushing(double thicknessMetres, double waterContent, double retardation, double darcyFluxMetresPerDay,
            double dispersivityMetres, int cells) {
        this.cells = cells;
        this.darcyFluxMetresPerDay = darcyFluxMetresPerDay;
        this.capacity = waterContent * retardation;
        this.cellSizeMetres = thicknessMetres / cells;
        this.conductanceMetresPerDay = dispersivityMetres * darcyFluxMetresPerDay / cellSizeMetres;
    }

    @Override
    public int getDimension() {
        return cells;
    }

    @Override
    public void computeDerivatives(double t, double[] c, double[] dcdt) {
        double q = darcyFluxMetresPerDay;
        double g = conductanceMetresPerDay;
        double scale = 1 / (capacity * cellSizeMetres);
        double fluxIn = 0; // clean water through the flux inlet
        for (int i = 0; i < cells; i++) {
            double fluxOut = i + 1 < cells ? q * 0.5 * (c[i] + c[i + 1]) - g * (c[i + 1] - c[i]) : q * c[i];
            dcdt[i] = (fluxIn - fluxOut) * scale;
            fluxIn = fluxOut;
        }
    }

    /**
     * Days until the effluent (last cell) falls to {@code target}, starting from 1 everywhere.
     *
     * @param relativeTolerance the integrator's relative tolerance (absolute = 1e-3 of it)
     */
    double daysToEffluentTarget(double target, double maxDays, double relativeTolerance) {
        double[] c = new double[cells];
        java.util.Arrays.fill(c, 1.0);
        return daysUntil(this, c, y -> y[cells - 1], target, maxDays, relativeTolerance);
    }

    /**
     * Integrates {@code equations} from {@code start} by Commons Math 3.6.1
     * {@link DormandPrince853Integrator} (absolute tolerance 1e-3 of the relative one) until
     * {@code effluent} of the state falls to {@code target}, found by the integrator's event
     * locator; NaN when it does not within {@code maxDays}. Shared by the method-of-lines rows.
     */
    static double daysUntil(FirstOrderDifferentialEquations equations, double[] start,
            java.util.function.ToDoubleFunction<double[]> effluent, double target, double maxDays,
            double relativeTolerance) {
        double[] found = { Double.NaN };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-10, maxDays,
                relativeTolerance * 1e-3, relativeTolerance);
        integrator.addEventHandler(new EventHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                return effluent.applyAsDouble(y) - target;
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                found[0] = t;
                return Action.STOP;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        }, maxDays / 1000, 1e-9 * maxDays, 1000);
        double[] y = start.clone();
        integrator.integrate(equations, 0, y, maxDays, y);
        return found[0];
    }
}
