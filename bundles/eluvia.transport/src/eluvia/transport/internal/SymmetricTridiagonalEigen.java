package eluvia.transport.internal;

/**
 * Eigenvalues of a real symmetric tridiagonal matrix by the implicit QL method with Wilkinson
 * shifts (the tql2 procedure of Bowdler, Martin, Reinsch and Wilkinson, Handbook for Automatic
 * Computation II, Linear Algebra, 1971), with chosen rows of the eigenvector matrix.
 *
 * <p>The eigenvector matrix V is the product of the plane rotations the method applies. Rather
 * than accumulating all of V (n^3 work), the caller names the vectors x whose projections
 * V^T x it needs (a row of V is V^T times a unit vector); each rotation is applied to those
 * vectors only, so the work is of order n^2 per vector. Passing the n unit vectors gives the
 * whole matrix.
 */
public final class SymmetricTridiagonalEigen {
    /** Most QL iterations per eigenvalue (the method typically needs 1 to 3). */
    static final int MAX_ITERATIONS = 60;

    private SymmetricTridiagonalEigen() {
    }

    /**
     * Overwrites {@code diagonal} with the eigenvalues (in no particular order) and each
     * {@code projections[j]} (length n, on entry a vector x_j) with V^T x_j, so that
     * projections[j][k] is the k-th eigenvector's scalar product with x_j.
     *
     * @param diagonal the n diagonal entries (overwritten)
     * @param offDiagonal the n - 1 entries next to the diagonal, entry i joining rows i and i + 1
     *        (a copy is worked on; the argument is left unchanged)
     * @throws IllegalStateException if an eigenvalue needs more than {@value #MAX_ITERATIONS} iterations
     */
    public static void decompose(double[] diagonal, double[] offDiagonal, double[][] projections) {
        int n = diagonal.length;
        if (offDiagonal.length != Math.max(0, n - 1)) {
            throw new IllegalArgumentException("off-diagonal length " + offDiagonal.length + " for " + n + " rows");
        }
        double[] d = diagonal;
        int count = projections.length;
        double[] e = new double[n];
        System.arraycopy(offDiagonal, 0, e, 0, Math.max(0, n - 1));
        for (int l = 0; l < n; l++) {
            int iterations = 0;
            int m;
            do {
                for (m = l; m < n - 1; m++) {
                    double dd = Math.abs(d[m]) + Math.abs(d[m + 1]);
                    if (Math.abs(e[m]) <= 0x1.0p-53 * dd) {
                        break;
                    }
                }
                if (m != l) {
                    if (++iterations > MAX_ITERATIONS) {
                        throw new IllegalStateException("implicit QL: eigenvalue " + l + " of " + n
                                + " not found in " + MAX_ITERATIONS + " iterations");
                    }
                    // Wilkinson shift from the leading 2 x 2 block
                    double g = (d[l + 1] - d[l]) / (2 * e[l]);
                    double r = Math.sqrt(g * g + 1);
                    g = d[m] - d[l] + e[l] / (g + Math.copySign(r, g));
                    double s = 1;
                    double c = 1;
                    double p = 0;
                    int i;
                    boolean underflow = false;
                    for (i = m - 1; i >= l; i--) {
                        double f = s * e[i];
                        double b = c * e[i];
                        r = Math.sqrt(f * f + g * g);
                        e[i + 1] = r;
                        if (r == 0) {
                            d[i + 1] -= p;
                            e[m] = 0;
                            underflow = true;
                            break;
                        }
                        double inverse = 1 / r;
                        s = f * inverse;
                        c = g * inverse;
                        g = d[i + 1] - p;
                        r = (d[i] - g) * s + 2 * c * b;
                        p = s * r;
                        d[i + 1] = g + p;
                        g = c * r - b;
                        for (int j = 0; j < count; j++) {
                            double[] z = projections[j];
                            double zi1 = z[i + 1];
                            double zi = z[i];
                            z[i + 1] = s * zi + c * zi1;
                            z[i] = c * zi - s * zi1;
                        }
                    }
                    if (underflow) {
                        continue;
                    }
                    d[l] -= p;
                    e[l] = g;
                    e[m] = 0;
                }
            } while (m != l);
        }
    }
}
