package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

import eluvia.transport.internal.DeHoogInversion;

final class FlushingPushDownTest {

    private static LayerTransport transport(double r, double p) {
        return new LayerTransport(r, 1, 1, 0.1, p, 0);
    }

    @Test
    void closedFormAndExactTransformAgree() {
        // two independent forms: the erfc closed form (inlet term dropped) and the exact Laplace transform inverted by
        // de Hoog; where P >= 40 both are accurate (inlet term below exp(-P), inversion about 1e-10)
        for (double p : new double[] {40, 80}) {
            for (double tau : new double[] {0.3, 1, 2}) {
                for (double x : new double[] {1, 1.2, 1.8, 2.5}) {
                    double exact = DeHoogInversion.invert(s -> FlushingPushDown.exactTransform(s, x, p), tau);
                    assertEquals(exact, FlushingPushDown.closedForm(x, tau, p), 1e-9, "P " + p + " tau " + tau + " X " + x);
                }
            }
        }
    }

    @Test
    void matchesAMethodOfLinesColumn() {
        // Method of lines in the test: a column of 4 layer thicknesses, 1 in the top quarter (the layer), clean below,
        // flux inlet with clean water, cell-centred second-order finite volumes on N = 160 and 320 cells, Commons Math
        // 3.6.1 DormandPrince853Integrator; Richardson extrapolate, tolerance |f_2N - f_N| / 3 + 1e-7 (the outlet at
        // X = 4 is far below the slug at these times)
        double p = 10;
        double[] times = {0.5, 1.0, 1.6};
        double[] depths = {1.1, 1.5, 2.2};
        double[][] coarse = column(p, 160, times, depths);
        double[][] fine = column(p, 320, times, depths);
        LayerTransport t = transport(1, p);
        for (int i = 0; i < times.length; i++) {
            for (int j = 0; j < depths.length; j++) {
                double ref = (4 * fine[i][j] - coarse[i][j]) / 3;
                double tol = Math.abs(fine[i][j] - coarse[i][j]) / 3 + 1e-7;
                assertEquals(ref, FlushingPushDown.concentrationBelow(depths[j], times[i], t), tol,
                        "T " + times[i] + " X " + depths[j]);
            }
        }
    }

    @Test
    void sharpFrontPushesTheSlugDownByTheFlushedDepth() {
        // P -> infinity: the slug moves as a block, T/R layer thicknesses in T pore volumes (plug flow), so after T the
        // soil is above any target down to T/R * L below the base; the front width 2 sqrt(tau/P) bounds the difference
        LayerFlushingInput in = new LayerFlushingInput(2.0, 0.3, 0.4, 1600, 0.1, 0.1, 2.0 / 1e5, 0, 0);
        LayerTransport t = LayerTransport.of(in);
        FlushingPushDown.Result r = FlushingPushDown.estimate(in, 1.5, 0.01);
        double tau = 1.5 / t.retardation();
        assertEquals(tau * 2.0, r.belowLayerAtEndMetres(), 4 * 2 * Math.sqrt(tau / t.peclet()) * 2.0);
        assertEquals(r.belowLayerAtEndMetres(), r.deepestBelowLayerMetres(), 1e-6);
        assertTrue(r.peakBelowLayerAtEndFraction() > 0.99);
    }

    @Test
    void dilutedSlugStopsGoingDeeper() {
        // with strong dispersion (P = 2) and a high target the pushed zone is shallow and stops growing: the
        // deepest point over the period is reached before the end and is deeper than what is left at the end
        LayerFlushingInput in = new LayerFlushingInput(1.0, 0.3, 0.4, 1600, 0, 0.1, 0.5, 0, 0);
        FlushingPushDown.Result r = FlushingPushDown.estimate(in, 3, 0.3);
        assertTrue(r.deepestBelowLayerMetres() > 0, r.toString());
        assertTrue(r.poreVolumesAtDeepest() < 3, r.toString());
        assertTrue(r.belowLayerAtEndMetres() < r.deepestBelowLayerMetres(), r.toString());
    }

    @Test
    void badInputsAreRefused() {
        LayerFlushingInput in = new LayerFlushingInput(1.0, 0.3, 0.4, 1600, 0, 0.1, 0.1, 0, 0);
        assertEquals("pore volumes flushed (-)", assertThrows(TransportInputException.class,
                () -> FlushingPushDown.estimate(in, 0, 0.1)).quantity());
        assertEquals("target fraction", assertThrows(TransportInputException.class,
                () -> FlushingPushDown.estimate(in, 1, 1)).quantity());
        assertEquals("layer", assertThrows(TransportInputException.class,
                () -> FlushingPushDown.estimate(null, 1, 0.1)).quantity());
        assertEquals("relative depth x/L (-)", assertThrows(TransportInputException.class,
                () -> FlushingPushDown.concentrationBelow(0.5, 1, transport(1, 10))).quantity());
    }

    /** C/C0 at the given depths and times in a column of 4 layer thicknesses (method of lines, see above). */
    private static double[][] column(double peclet, int cells, double[] times, double[] depths) {
        double length = 4;
        double h = length / cells;
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return cells;
            }

            @Override
            public void computeDerivatives(double t, double[] c, double[] dc) {
                double in = 0;
                for (int i = 0; i < cells; i++) {
                    double out = i == cells - 1 ? c[i] : 0.5 * (c[i] + c[i + 1]) - (c[i + 1] - c[i]) / (peclet * h);
                    dc[i] = -(out - in) / h;
                    in = out;
                }
            }
        };
        double[] c = new double[cells];
        for (int i = 0; i < cells / 4; i++) {
            c[i] = 1;
        }
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 1, 1e-13, 1e-11);
        double[][] out = new double[times.length][depths.length];
        double t = 0;
        for (int k = 0; k < times.length; k++) {
            integrator.integrate(ode, t, c, times[k], c);
            t = times[k];
            for (int j = 0; j < depths.length; j++) {
                // linear interpolation between cell centres (second order)
                double pos = depths[j] / h - 0.5;
                int i = (int) Math.floor(pos);
                double w = pos - i;
                out[k][j] = (1 - w) * c[i] + w * c[i + 1];
            }
        }
        return out;
    }
}
