package eluvia.transport.internal;

import java.util.function.Function;

import org.apache.commons.math3.complex.Complex;

/**
 * Numerical inversion of a Laplace transform by the method of de Hoog, Knight and Stokes (1982),
 * SIAM J. Sci. Stat. Comput. 3:357: the Fourier-series (Bromwich contour) form with the series
 * turned into a continued fraction by the quotient-difference algorithm and the tail accelerated.
 * The steps follow the published algorithm; variable names follow the paper.
 *
 * <p>Settings: {@code 2M + 1} transform evaluations with M = {@value #M}, half-period
 * T = {@value #PERIOD_FACTOR} t, and the abscissa gamma = -ln(eps) / (2 T) with eps =
 * {@value #EPS}, for transforms whose singularities lie in Re s &le; 0. For the smooth
 * concentration histories of this bundle the absolute error is about 1e-10 (checked in the
 * tests against the exact Brenner series and a method-of-lines solve).
 */
public final class DeHoogInversion {
    /** Half the number of terms. */
    static final int M = 24;
    /** Period over time of the Fourier series. */
    static final double PERIOD_FACTOR = 2;
    /** Target discretisation error that sets the abscissa. */
    static final double EPS = 1e-12;

    private DeHoogInversion() {
    }

    /** The 2M + 1 transform arguments for time t &gt; 0. */
    public static Complex[] abscissae(double t) {
        double period = PERIOD_FACTOR * t;
        double gamma = -Math.log(EPS) / (2 * period);
        Complex[] s = new Complex[2 * M + 1];
        for (int k = 0; k <= 2 * M; k++) {
            s[k] = new Complex(gamma, Math.PI * k / period);
        }
        return s;
    }

    /** Inverts F at time t &gt; 0. */
    public static double invert(Function<Complex, Complex> transform, double t) {
        Complex[] s = abscissae(t);
        Complex[] a = new Complex[s.length];
        for (int k = 0; k < s.length; k++) {
            a[k] = transform.apply(s[k]);
        }
        return fromValues(a, t);
    }

    /** Inverts at time t from the transform values at {@link #abscissae(double)} (same t). */
    public static double fromValues(Complex[] values, double t) {
        double period = PERIOD_FACTOR * t;
        double gamma = -Math.log(EPS) / (2 * period);
        int n = 2 * M + 1;
        double[] ar = new double[n];
        double[] ai = new double[n];
        for (int k = 0; k < n; k++) {
            ar[k] = values[k].getReal();
            ai[k] = values[k].getImaginary();
        }
        ar[0] /= 2;
        ai[0] /= 2;
        // quotient-difference table: e[r][i], q[r][i] (complex, split into real and imaginary parts)
        double[][] er = new double[M + 1][n];
        double[][] ei = new double[M + 1][n];
        double[][] qr = new double[M + 1][n];
        double[][] qi = new double[M + 1][n];
        for (int i = 0; i < n - 1; i++) {
            double[] z = div(ar[i + 1], ai[i + 1], ar[i], ai[i]);
            qr[1][i] = z[0];
            qi[1][i] = z[1];
        }
        for (int r = 1; r <= M; r++) {
            int len = n - 2 * r;
            for (int i = 0; i < len; i++) {
                er[r][i] = qr[r][i + 1] - qr[r][i] + er[r - 1][i + 1];
                ei[r][i] = qi[r][i + 1] - qi[r][i] + ei[r - 1][i + 1];
            }
            if (r < M) {
                for (int i = 0; i < len - 1; i++) {
                    double[] prod = mul(qr[r][i + 1], qi[r][i + 1], er[r][i + 1], ei[r][i + 1]);
                    double[] z = div(prod[0], prod[1], er[r][i], ei[r][i]);
                    qr[r + 1][i] = z[0];
                    qi[r + 1][i] = z[1];
                }
            }
        }
        // continued-fraction coefficients d_0..d_2M
        double[] dr = new double[n];
        double[] di = new double[n];
        dr[0] = ar[0];
        di[0] = ai[0];
        for (int r = 1; r <= M; r++) {
            dr[2 * r - 1] = -qr[r][0];
            di[2 * r - 1] = -qi[r][0];
            dr[2 * r] = -er[r][0];
            di[2 * r] = -ei[r][0];
        }
        double zr = Math.cos(Math.PI * t / period);
        double zi = Math.sin(Math.PI * t / period);
        // recurrences A_{k} = A_{k-1} + d_{k-1} z A_{k-2}, the same for B
        double[] aR = new double[n + 2];
        double[] aI = new double[n + 2];
        double[] bR = new double[n + 2];
        double[] bI = new double[n + 2];
        aR[1] = dr[0];
        aI[1] = di[0];
        bR[0] = 1;
        bR[1] = 1;
        for (int k = 2; k < n; k++) {
            double[] dz = mul(dr[k - 1], di[k - 1], zr, zi);
            double[] ta = mul(dz[0], dz[1], aR[k - 2], aI[k - 2]);
            double[] tb = mul(dz[0], dz[1], bR[k - 2], bI[k - 2]);
            aR[k] = aR[k - 1] + ta[0];
            aI[k] = aI[k - 1] + ta[1];
            bR[k] = bR[k - 1] + tb[0];
            bI[k] = bI[k - 1] + tb[1];
        }
        // accelerated remainder: h = (1 + (d_{2M-1} - d_{2M}) z) / 2, R = -h (1 - sqrt(1 + d_{2M} z / h^2))
        double[] diffZ = mul(dr[n - 2] - dr[n - 1], di[n - 2] - di[n - 1], zr, zi);
        Complex h = new Complex(0.5 * (1 + diffZ[0]), 0.5 * diffZ[1]);
        Complex dz = new Complex(dr[n - 1], di[n - 1]).multiply(new Complex(zr, zi));
        Complex rem = h.negate().multiply(Complex.ONE.subtract(Complex.ONE.add(dz.divide(h.multiply(h))).sqrt()));
        // the last step of the recurrence with the remainder in place of d_2M z
        double[] ta = mul(rem.getReal(), rem.getImaginary(), aR[n - 2], aI[n - 2]);
        double[] tb = mul(rem.getReal(), rem.getImaginary(), bR[n - 2], bI[n - 2]);
        double numR = aR[n - 1] + ta[0];
        double numI = aI[n - 1] + ta[1];
        double denR = bR[n - 1] + tb[0];
        double denI = bI[n - 1] + tb[1];
        double[] ratio = div(numR, numI, denR, denI);
        return Math.exp(gamma * t) / period * ratio[0];
    }

    private static double[] mul(double ar, double ai, double br, double bi) {
        return new double[] {ar * br - ai * bi, ar * bi + ai * br};
    }

    private static double[] div(double ar, double ai, double br, double bi) {
        double d = br * br + bi * bi;
        return new double[] {(ar * br + ai * bi) / d, (ai * br - ar * bi) / d};
    }
}
