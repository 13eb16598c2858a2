package eluvia.design.uncertainty;

import java.util.Arrays;
import java.util.Comparator;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;

/**
 * Induces a rank correlation among sampled columns without changing any column's values (so
 * marginal distributions and Latin hypercube strata are kept): the method of Iman, R.L.,
 * Conover, W.J. (1982) A distribution-free approach to inducing rank correlation among input
 * variables, Commun. Statist. Simul. Comput. 11(3):311-334.
 *
 * <p>Steps: a score matrix R whose columns are independent random permutations of the van der
 * Waerden scores Phi^-1(i / (n + 1)); its sample correlation T = Q Q^T and the target C = P P^T
 * (Cholesky factors); R* = R (P Q^-1)^T has sample correlation exactly C; each input column is
 * then reordered so that its ranks are those of the matching column of R*.
 */
final class ImanConover {
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private ImanConover() {
    }

    /**
     * Reorders {@code columns} (k columns of n values each) in place.
     *
     * @param columns             the sample, column by column; n greater than k
     * @param targetScoreCorrelation the Pearson correlation wanted between the normal scores (k x k,
     *                            positive definite)
     * @param random              the generator for the score permutations
     */
    static void rearrange(double[][] columns, double[][] targetScoreCorrelation, RandomGenerator random) {
        int k = columns.length;
        int n = columns[0].length;
        double[] scores = new double[n];
        for (int i = 0; i < n; i++) {
            scores[i] = STANDARD_NORMAL.inverseCumulativeProbability((i + 1.0) / (n + 1.0));
        }
        double[][] r = new double[n][k];
        for (int j = 0; j < k; j++) {
            int[] permutation = SampleGenerator.permutation(n, random);
            for (int i = 0; i < n; i++) {
                r[i][j] = scores[permutation[i]];
            }
        }
        RealMatrix scoreMatrix = new Array2DRowRealMatrix(r, false);
        RealMatrix sampleCorrelation = new PearsonsCorrelation().computeCorrelationMatrix(scoreMatrix);
        RealMatrix target = symmetrised(targetScoreCorrelation);
        RealMatrix p;
        RealMatrix q;
        try {
            p = new CholeskyDecomposition(target).getL();
            q = new CholeskyDecomposition(sampleCorrelation).getL();
        } catch (NonPositiveDefiniteMatrixException e) {
            throw new IllegalStateException("The rank correlation could not be imposed on " + n + " runs of " + k
                    + " correlated inputs (a correlation matrix is not positive definite); use more runs", e);
        }
        RealMatrix s = p.multiply(MatrixUtils.inverse(q));
        RealMatrix correlatedScores = scoreMatrix.multiply(s.transpose());
        Integer[] order = new Integer[n];
        for (int j = 0; j < k; j++) {
            double[] correlatedColumn = correlatedScores.getColumn(j);
            for (int i = 0; i < n; i++) {
                order[i] = i;
            }
            Arrays.sort(order, Comparator.comparingDouble(i -> correlatedColumn[i]));
            double[] sorted = columns[j].clone();
            Arrays.sort(sorted);
            for (int rank = 0; rank < n; rank++) {
                columns[j][order[rank]] = sorted[rank];
            }
        }
    }

    private static RealMatrix symmetrised(double[][] matrix) {
        int k = matrix.length;
        double[][] symmetric = new double[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                symmetric[i][j] = i == j ? 1 : 0.5 * (matrix[i][j] + matrix[j][i]);
            }
        }
        return new Array2DRowRealMatrix(symmetric, false);
    }
}
