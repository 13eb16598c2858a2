package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.Random;

import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

final class SymmetricTridiagonalEigenTest {

    @Test
    void constantMatrixHasTheClassicalEigenvalues() {
        // the n x n tridiagonal matrix with a on the diagonal and b beside it has eigenvalues
        // a + 2 b cos(k pi / (n + 1)), k = 1..n (classical result, e.g. Smith 1985, Numerical
        // Solution of Partial Differential Equations; from memory)
        int n = 17;
        double a = 2.5;
        double b = -0.8;
        double[] d = new double[n];
        double[] e = new double[n - 1];
        Arrays.fill(d, a);
        Arrays.fill(e, b);
        SymmetricTridiagonalEigen.decompose(d, e, new double[0][]);
        Arrays.sort(d);
        double[] expected = new double[n];
        for (int k = 1; k <= n; k++) {
            expected[k - 1] = a + 2 * b * Math.cos(k * Math.PI / (n + 1));
        }
        Arrays.sort(expected);
        for (int k = 0; k < n; k++) {
            assertEquals(expected[k], d[k], 1e-14 * Math.abs(a) * 4, "eigenvalue " + k);
        }
    }

    @Test
    void agreesWithTheReferenceEigenDecomposition() {
        // reference: Commons Math 3.6.1 EigenDecomposition of the same symmetric tridiagonal matrix;
        // projections compared through products p_x[k] p_y[k], which do not depend on the sign
        // of an eigenvector
        Random random = new Random(20261202);
        for (int n : new int[] { 1, 2, 5, 12, 40 }) {
            double[] d = new double[n];
            double[] e = new double[Math.max(0, n - 1)];
            for (int i = 0; i < n; i++) {
                d[i] = 1 + 10 * random.nextDouble();
            }
            for (int i = 0; i + 1 < n; i++) {
                e[i] = -3 * random.nextDouble();
            }
            double[] x = random.doubles(n).toArray();
            double[] y = random.doubles(n).toArray();
            EigenDecomposition reference = new EigenDecomposition(d.clone(), e.clone());
            double[] values = d.clone();
            double[] px = x.clone();
            double[] py = y.clone();
            SymmetricTridiagonalEigen.decompose(values, e, new double[][] { px, py });
            for (int k = 0; k < n; k++) {
                double lambda = values[k];
                int j = nearest(reference.getRealEigenvalues(), lambda);
                assertEquals(reference.getRealEigenvalue(j), lambda, 1e-12 * 40, "n = " + n + ", eigenvalue " + k);
                RealVector v = reference.getEigenvector(j);
                double expected = dot(v, x) * dot(v, y);
                assertEquals(expected, px[k] * py[k], 1e-11 * n, "n = " + n + ", projection product " + k);
            }
        }
    }

    @Test
    void projectionsOfTheUnitVectorsAreAnOrthogonalMatrix() {
        // V^T V = I (the rotations are orthogonal) and V diag(lambda) V^T = the matrix (definition)
        int n = 9;
        double[] d = { 4, 3, 5, 2, 6, 3, 4, 5, 3 };
        double[] e = { -1, -0.5, -1.2, -0.7, -0.3, -1, -0.9, -0.4 };
        double[][] rows = new double[n][n];
        for (int i = 0; i < n; i++) {
            rows[i][i] = 1;
        }
        double[] values = d.clone();
        SymmetricTridiagonalEigen.decompose(values, e, rows);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double orth = 0;
                double recon = 0;
                for (int k = 0; k < n; k++) {
                    orth += rows[i][k] * rows[j][k];
                    recon += rows[i][k] * values[k] * rows[j][k];
                }
                assertEquals(i == j ? 1 : 0, orth, 1e-14 * n);
                double entry = i == j ? d[i] : Math.abs(i - j) == 1 ? e[Math.min(i, j)] : 0;
                assertEquals(entry, recon, 1e-13 * n);
            }
        }
    }

    @Test
    void wrongLengthsAreRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> SymmetricTridiagonalEigen.decompose(new double[3], new double[3], new double[0][]));
    }

    private static int nearest(double[] values, double x) {
        int best = 0;
        for (int i = 1; i < values.length; i++) {
            if (Math.abs(values[i] - x) < Math.abs(values[best] - x)) {
                best = i;
            }
        }
        return best;
    }

    private static double dot(RealVector v, double[] x) {
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            s += v.getEntry(i) * x[i];
        }
        return s;
    }
}
