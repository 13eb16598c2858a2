package eluvia.transport.internal;

/**
 * Gauss-Lobatto-Legendre points of degree p on [-1, 1] (the end points and the p - 1 roots of
 * P_p', P_p the Legendre polynomial), their quadrature weights 2 / (p (p + 1) P_p(x_i)^2), exact
 * for polynomials of degree up to 2p - 1 (Abramowitz and Stegun 1964, 25.4.32), the derivative
 * matrix of the Lagrange polynomials through the points, and the stiffness matrix of those
 * polynomials, S_ij = integral of l_i' l_j' (exact, its integrand has degree 2p - 2): the
 * reference element of the spectral element method (Patera 1984).
 *
 * <p>Immutable; {@link #of(int)} keeps one instance per degree.
 */
public final class GaussLobattoLegendre {
    /** Highest degree offered. */
    public static final int MAXIMUM_DEGREE = 24;

    private static final GaussLobattoLegendre[] CACHE = new GaussLobattoLegendre[MAXIMUM_DEGREE + 1];

    private final int degree;
    private final double[] points;
    private final double[] weights;
    private final double[][] stiffness;

    private GaussLobattoLegendre(int p) {
        degree = p;
        points = new double[p + 1];
        weights = new double[p + 1];
        for (int i = 0; i <= p; i++) {
            double x = -Math.cos(Math.PI * i / p); // Chebyshev-Lobatto start, close to the roots
            if (i > 0 && i < p) {
                for (int it = 0; it < 100; it++) {
                    // Newton on f = (1 - x^2) P_p'(x) = p (P_(p-1) - x P_p), f' = -p (p + 1) P_p
                    double[] pq = legendre(p, x);
                    double step = (pq[1] - x * pq[0]) / (-(p + 1) * pq[0]);
                    x -= step;
                    if (Math.abs(step) <= 1e-16) {
                        break;
                    }
                }
            }
            points[i] = x;
            double pp = legendre(p, x)[0];
            weights[i] = 2.0 / (p * (p + 1) * pp * pp);
        }
        // symmetric by construction
        for (int i = 0; i < (p + 1) / 2; i++) {
            double x = 0.5 * (points[p - i] - points[i]);
            points[i] = -x;
            points[p - i] = x;
            double w = 0.5 * (weights[i] + weights[p - i]);
            weights[i] = w;
            weights[p - i] = w;
        }
        if (p % 2 == 0) {
            points[p / 2] = 0;
        }
        double[][] d = derivativeMatrix(points);
        stiffness = new double[p + 1][p + 1];
        for (int i = 0; i <= p; i++) {
            for (int j = i; j <= p; j++) {
                double s = 0;
                for (int q = 0; q <= p; q++) {
                    s += weights[q] * d[q][i] * d[q][j];
                }
                stiffness[i][j] = s;
                stiffness[j][i] = s;
            }
        }
    }

    /** The points, weights and matrices of degree {@code p}, 1 to {@value #MAXIMUM_DEGREE}. */
    public static GaussLobattoLegendre of(int p) {
        if (p < 1 || p > MAXIMUM_DEGREE) {
            throw new IllegalArgumentException("degree " + p + " outside 1 to " + MAXIMUM_DEGREE);
        }
        synchronized (CACHE) {
            if (CACHE[p] == null) {
                CACHE[p] = new GaussLobattoLegendre(p);
            }
            return CACHE[p];
        }
    }

    /** P_p(x) and P_(p-1)(x) by the three-term recurrence. */
    private static double[] legendre(int p, double x) {
        double previous = 1;
        double current = x;
        for (int k = 2; k <= p; k++) {
            double next = ((2 * k - 1) * x * current - (k - 1) * previous) / k;
            previous = current;
            current = next;
        }
        return new double[] { current, previous };
    }

    /** D_ij = l_j'(x_i) from the barycentric form; each row sums to zero (derivative of a constant). */
    private static double[][] derivativeMatrix(double[] x) {
        int n = x.length;
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            c[i] = 1;
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    c[i] *= x[i] - x[j];
                }
            }
        }
        double[][] d = new double[n][n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    d[i][j] = c[i] / (c[j] * (x[i] - x[j]));
                    s += d[i][j];
                }
            }
            d[i][i] = -s;
        }
        return d;
    }

    /** The degree p. */
    public int degree() {
        return degree;
    }

    /** Point i on [-1, 1], ascending, 0 to p. */
    public double point(int i) {
        return points[i];
    }

    /** Quadrature weight of point i (they sum to 2). */
    public double weight(int i) {
        return weights[i];
    }

    /** Integral over [-1, 1] of l_i' l_j'. */
    public double stiffness(int i, int j) {
        return stiffness[i][j];
    }
}
