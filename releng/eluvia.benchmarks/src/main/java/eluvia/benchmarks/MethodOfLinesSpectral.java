package eluvia.benchmarks;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

import eluvia.transport.internal.GaussLobattoLegendre;

/**
 * A context row of the speed comparison, not the baseline: the method of lines on the
 * spectral-element semi-discretisation of {@code SpectralElementFlushingSolution} (one layer,
 * one element of the given degree, its symmetric form dy/dt = -B y with y = M^1/2 exp(-phi) c;
 * written again here from the equations in that class's comment), integrated by the same
 * general-purpose adaptive integrator as the baseline, Commons Math 3.6.1
 * {@code DormandPrince853Integrator}, with its event locator for the crossing. It shows how much
 * of the speed-up comes from the spatial discretisation and how much from solving exactly in time.
 *
 * <p>Units: depth in m, time in days, concentrations as fractions of the initial one.
 */
final class MethodOfLinesSpectral implements FirstOrderDifferentialEquations {
    private final int n;
    private final double[][] b;
    private final double[] y0;
    private final double outletFactor;

    /**
     * @param thicknessMetres layer thickness
     * @param waterContent theta (dimensionless)
     * @param retardation R (dimensionless)
     * @param darcyFluxMetresPerDay q
     * @param dispersivityMetres alpha_L (no diffusion: theta D = alpha_L q)
     * @param degree degree of the single element
     */
    MethodOfLinesSpectral(double thicknessMetres, double waterContent, double retardation, double darcyFluxMetresPerDay,
            double dispersivityMetres, int degree) {
        GaussLobattoLegendre gll = GaussLobattoLegendre.of(degree);
        n = degree + 1;
        double q = darcyFluxMetresPerDay;
        double a = dispersivityMetres * q;
        double capacity = waterContent * retardation;
        double jacobian = 0.5 * thicknessMetres;
        double[] storage = new double[n];
        double[][] k = new double[n][n];
        double[] phi = new double[n];
        double halfSpread = 0.5 * q * thicknessMetres / (2 * a);
        for (int i = 0; i < n; i++) {
            double w = gll.weight(i) * jacobian;
            storage[i] = w * capacity;
            k[i][i] += w * q * q / (4 * a);
            phi[i] = q / (2 * a) * (gll.point(i) + 1) * jacobian - halfSpread;
            for (int j = 0; j < n; j++) {
                k[i][j] += a / jacobian * gll.stiffness(i, j);
            }
        }
        k[0][0] += 0.5 * q;
        k[n - 1][n - 1] += 0.5 * q;
        b = new double[n][n];
        y0 = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                b[i][j] = k[i][j] / Math.sqrt(storage[i] * storage[j]);
            }
            y0[i] = Math.sqrt(storage[i]) * Math.exp(-phi[i]);
        }
        outletFactor = Math.exp(phi[n - 1]) / Math.sqrt(storage[n - 1]);
    }

    @Override
    public int getDimension() {
        return n;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] dydt) {
        for (int i = 0; i < n; i++) {
            double[] row = b[i];
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += row[j] * y[j];
            }
            dydt[i] = -s;
        }
    }

    /**
     * Days until the effluent falls to {@code target}, starting from 1 everywhere.
     *
     * @param relativeTolerance the integrator's relative tolerance (absolute = 1e-3 of it)
     */
    double daysToEffluentTarget(double target, double maxDays, double relativeTolerance) {
        return MethodOfLinesFlushing.daysUntil(this, y0, y -> outletFactor * y[n - 1], target, maxDays, relativeTolerance);
    }
}
