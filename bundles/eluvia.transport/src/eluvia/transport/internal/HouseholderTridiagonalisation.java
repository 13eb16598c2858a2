package eluvia.transport.internal;

/**
 * Reduction of a real symmetric matrix to tridiagonal form by Householder reflections, A = Q T
 * Q^T (Householder 1958; the tred procedure of Martin, Reinsch and Wilkinson, Handbook for
 * Automatic Computation II, Linear Algebra, 1971, without accumulating Q), for
 * {@link SymmetricTridiagonalEigen}: together they give the eigenvalues of a small dense
 * symmetric matrix and the projections V^T x of chosen vectors on its eigenvectors (V = Q W
 * with W the eigenvectors of T, so V^T x = W^T (Q^T x)).
 */
public final class HouseholderTridiagonalisation {
    private HouseholderTridiagonalisation() {
    }

    /**
     * Reduces {@code a} and replaces each vector x of {@code vectors} by Q^T x.
     *
     * @param a the symmetric n x n matrix, full (both triangles); overwritten
     * @param diagonal receives the n diagonal entries of T
     * @param offDiagonal receives the n - 1 entries of T next to the diagonal
     * @param vectors vectors of length n, each overwritten by Q^T x
     */
    public static void reduce(double[][] a, double[] diagonal, double[] offDiagonal, double[][] vectors) {
        int n = a.length;
        if (diagonal.length != n || offDiagonal.length != Math.max(0, n - 1)) {
            throw new IllegalArgumentException("diagonal " + diagonal.length + " and off-diagonal "
                    + offDiagonal.length + " for " + n + " rows");
        }
        double[] v = new double[n];
        double[] p = new double[n];
        for (int k = 0; k + 2 < n; k++) {
            double norm2 = 0;
            for (int i = k + 1; i < n; i++) {
                norm2 += a[i][k] * a[i][k];
            }
            double x0 = a[k + 1][k];
            double alpha = -Math.copySign(Math.sqrt(norm2), x0);
            diagonal[k] = a[k][k];
            offDiagonal[k] = alpha;
            // v = x - alpha e1, H = I - beta v v^T with beta = 2 / (v^T v) = 1 / (norm2 - alpha x0)
            double h = norm2 - alpha * x0;
            if (h == 0) {
                continue; // the column is already reduced: H = I
            }
            double beta = 1 / h;
            v[k + 1] = x0 - alpha;
            for (int i = k + 2; i < n; i++) {
                v[i] = a[i][k];
            }
            // p = beta A v on the trailing block, w = p - (beta / 2)(v^T p) v, A <- A - v w^T - w v^T
            double vp = 0;
            for (int i = k + 1; i < n; i++) {
                double[] row = a[i];
                double s = 0;
                for (int j = k + 1; j < n; j++) {
                    s += row[j] * v[j];
                }
                p[i] = beta * s;
                vp += v[i] * p[i];
            }
            double half = 0.5 * beta * vp;
            for (int i = k + 1; i < n; i++) {
                p[i] -= half * v[i];
            }
            for (int i = k + 1; i < n; i++) {
                double[] row = a[i];
                double vi = v[i];
                double wi = p[i];
                for (int j = k + 1; j < n; j++) {
                    row[j] -= vi * p[j] + wi * v[j];
                }
            }
            for (double[] x : vectors) {
                double s = 0;
                for (int i = k + 1; i < n; i++) {
                    s += v[i] * x[i];
                }
                s *= beta;
                for (int i = k + 1; i < n; i++) {
                    x[i] -= s * v[i];
                }
            }
        }
        if (n >= 2) {
            diagonal[n - 2] = a[n - 2][n - 2];
            offDiagonal[n - 2] = a[n - 1][n - 2];
        }
        if (n >= 1) {
            diagonal[n - 1] = a[n - 1][n - 1];
        }
    }
}
