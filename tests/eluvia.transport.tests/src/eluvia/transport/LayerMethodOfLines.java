package eluvia.transport;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Slow, obviously-right reference for the finite-layer flushing problem, kept in the test code:
 * the dimensionless equation R dc/dT = (1/P) d2c/dX2 - dc/dX - k R c on 0 &le; X &le; 1 is
 * discretised on N equal cells (cell-centred finite volumes, central differences, second order
 * in the cell width h = 1/N), with the exact flux inlet (total flux of clean water 0 through
 * X = 0) and a zero-gradient outlet (dispersive flux 0, advective flux c_N through X = 1), and
 * integrated in pore volumes T with the Commons Math 3.6.1 DormandPrince853Integrator (adaptive,
 * relative tolerance 1e-11, absolute 1e-13). Initial value c = 1 in every cell.
 *
 * <p>Results: effluent = outlet value (c_N, within O(h^2) of c(1) because dc/dX = 0 there),
 * mean = h sum c_i, maximum = largest cell value or the outlet value. {@link #extrapolated}
 * combines N and 2N cells by Richardson extrapolation, (4 f_2N - f_N)/3, and reports
 * |f_2N - f_N| as the error scale that a test tolerance follows from (it is about three times the
 * error of the 2N result for a second-order scheme, and much larger than that of the extrapolate).
 */
final class LayerMethodOfLines {
    /** Values at one output time. */
    record Snapshot(double effluent, double mean, double maximum, double[] cells) {
    }

    /** An extrapolated value and its error scale. */
    record Estimate(double value, double errorScale) {
    }

    private LayerMethodOfLines() {
    }

    /** Solves on {@code cells} cells and returns a snapshot at each of the (increasing) pore volumes. */
    static Snapshot[] solve(double peclet, double retardation, double decayPerPoreVolume, int cells,
            double... poreVolumes) {
        double h = 1.0 / cells;
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return cells;
            }

            @Override
            public void computeDerivatives(double t, double[] c, double[] dc) {
                double fluxIn = 0; // clean water through a flux inlet
                for (int i = 0; i < cells; i++) {
                    double fluxOut = i == cells - 1 ? c[i]
                            : 0.5 * (c[i] + c[i + 1]) - (c[i + 1] - c[i]) / (peclet * h);
                    dc[i] = -(fluxOut - fluxIn) / (h * retardation) - decayPerPoreVolume * c[i];
                    fluxIn = fluxOut;
                }
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 1, 1e-13, 1e-11);
        double[] c = new double[cells];
        java.util.Arrays.fill(c, 1);
        double t = 0;
        Snapshot[] out = new Snapshot[poreVolumes.length];
        for (int k = 0; k < poreVolumes.length; k++) {
            if (poreVolumes[k] > t) {
                integrator.integrate(ode, t, c, poreVolumes[k], c);
                t = poreVolumes[k];
            }
            double sum = 0;
            double max = c[cells - 1];
            for (double v : c) {
                sum += v;
                max = Math.max(max, v);
            }
            out[k] = new Snapshot(c[cells - 1], sum * h, max, c.clone());
        }
        return out;
    }

    /** Richardson extrapolation of N and 2N cells for effluent, mean and maximum, per output time. */
    static Estimate[][] extrapolated(double peclet, double retardation, double decayPerPoreVolume, int cells,
            double... poreVolumes) {
        Snapshot[] coarse = solve(peclet, retardation, decayPerPoreVolume, cells, poreVolumes);
        Snapshot[] fine = solve(peclet, retardation, decayPerPoreVolume, 2 * cells, poreVolumes);
        Estimate[][] out = new Estimate[poreVolumes.length][];
        for (int k = 0; k < poreVolumes.length; k++) {
            out[k] = new Estimate[] {
                estimate(coarse[k].effluent(), fine[k].effluent()),
                estimate(coarse[k].mean(), fine[k].mean()),
                estimate(coarse[k].maximum(), fine[k].maximum()) };
        }
        return out;
    }

    private static Estimate estimate(double coarse, double fine) {
        return new Estimate((4 * fine - coarse) / 3, Math.abs(fine - coarse));
    }
}
