package eluvia.transport;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Method-of-lines reference for two-region flushing, kept in the test code: the same cell-centred
 * second-order discretisation as {@link LayerMethodOfLines} for the mobile concentration c1, with
 * beta R dc1/dT = -(flux divergence) - omega (c1 - c2) and (1 - beta) R dc2/dT = omega (c1 - c2)
 * in every cell, integrated with the Commons Math 3.6.1 DormandPrince853Integrator (relative
 * tolerance 1e-11, absolute 1e-13). Results per output time: effluent c1 at the outlet cell, the
 * mean of the total beta c1 + (1 - beta) c2 and its maximum over the cells; Richardson
 * extrapolation of N and 2N cells as in {@link LayerMethodOfLines}.
 */
final class TwoRegionMethodOfLines {
    private TwoRegionMethodOfLines() {
    }

    static double[][] solve(double peclet, double retardation, double beta, double omega, int cells,
            double... poreVolumes) {
        double h = 1.0 / cells;
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2 * cells;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                double fluxIn = 0;
                for (int i = 0; i < cells; i++) {
                    double c1 = y[i];
                    double c2 = y[cells + i];
                    double fluxOut = i == cells - 1 ? c1 : 0.5 * (c1 + y[i + 1]) - (y[i + 1] - c1) / (peclet * h);
                    double exchange = omega * (c1 - c2);
                    dy[i] = (-(fluxOut - fluxIn) / h - exchange) / (beta * retardation);
                    dy[cells + i] = exchange / ((1 - beta) * retardation);
                    fluxIn = fluxOut;
                }
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 1, 1e-13, 1e-11);
        double[] y = new double[2 * cells];
        java.util.Arrays.fill(y, 1);
        double t = 0;
        double[][] out = new double[poreVolumes.length][];
        for (int k = 0; k < poreVolumes.length; k++) {
            if (poreVolumes[k] > t) {
                integrator.integrate(ode, t, y, poreVolumes[k], y);
                t = poreVolumes[k];
            }
            double sum = 0;
            double max = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < cells; i++) {
                double total = beta * y[i] + (1 - beta) * y[cells + i];
                sum += total;
                max = Math.max(max, total);
            }
            out[k] = new double[] {y[cells - 1], sum * h, max};
        }
        return out;
    }

    /** Richardson extrapolate and error scale |f_2N - f_N| of effluent, mean, max per time. */
    static LayerMethodOfLines.Estimate[][] extrapolated(double peclet, double retardation, double beta, double omega,
            int cells, double... poreVolumes) {
        double[][] coarse = solve(peclet, retardation, beta, omega, cells, poreVolumes);
        double[][] fine = solve(peclet, retardation, beta, omega, 2 * cells, poreVolumes);
        LayerMethodOfLines.Estimate[][] out = new LayerMethodOfLines.Estimate[poreVolumes.length][3];
        for (int k = 0; k < poreVolumes.length; k++) {
            for (int c = 0; c < 3; c++) {
                out[k][c] = new LayerMethodOfLines.Estimate((4 * fine[k][c] - coarse[k][c]) / 3,
                        Math.abs(fine[k][c] - coarse[k][c]));
            }
        }
        return out;
    }
}
