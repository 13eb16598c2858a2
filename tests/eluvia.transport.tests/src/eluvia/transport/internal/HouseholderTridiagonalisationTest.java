package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/**
 * Householder reduction followed by implicit QL against Commons Math 3.6.1 EigenDecomposition of
 * random symmetric matrices: eigenvalues and the projections of chosen vectors on the
 * eigenvectors (squared, to be free of each eigenvector's sign).
 */
final class HouseholderTridiagonalisationTest {
    @Test
    void eigenvaluesAndProjectionsMatchCommonsMath() {
        Random random = new Random(20261202);
        for (int n : new int[] { 1, 2, 3, 5, 9, 17, 40 }) {
            double[][] a = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j <= i; j++) {
                    a[i][j] = random.nextGaussian();
                    a[j][i] = a[i][j];
                }
            }
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = random.nextGaussian();
            }
            EigenDecomposition reference = new EigenDecomposition(new Array2DRowRealMatrix(a));
            double[] d = new double[n];
            double[] e = new double[Math.max(0, n - 1)];
            double[][] work = new double[n][];
            for (int i = 0; i < n; i++) {
                work[i] = a[i].clone();
            }
            double[][] projections = { x.clone() };
            HouseholderTridiagonalisation.reduce(work, d, e, projections);
            SymmetricTridiagonalEigen.decompose(d, e, projections);
            Integer[] order = new Integer[n];
            for (int i = 0; i < n; i++) {
                order[i] = i;
            }
            Arrays.sort(order, (p, q) -> Double.compare(d[p], d[q]));
            double[] expected = reference.getRealEigenvalues().clone();
            Integer[] refOrder = new Integer[n];
            for (int i = 0; i < n; i++) {
                refOrder[i] = i;
            }
            Arrays.sort(refOrder, (p, q) -> Double.compare(expected[p], expected[q]));
            RealMatrix v = reference.getV();
            for (int k = 0; k < n; k++) {
                assertEquals(expected[refOrder[k]], d[order[k]], 1e-12 * n, "n = " + n + ", eigenvalue " + k);
                double dot = v.getColumnVector(refOrder[k]).dotProduct(new org.apache.commons.math3.linear.ArrayRealVector(x));
                double mine = projections[0][order[k]];
                assertEquals(dot * dot, mine * mine, 1e-10 * n, "n = " + n + ", projection " + k);
            }
        }
    }
}
