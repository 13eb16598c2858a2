package eluvia.design.uncertainty;

import org.apache.commons.math3.distribution.LogNormalDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.exception.OutOfRangeException;

/**
 * Commons Math's lognormal distribution with its quantile in closed form, exp(scale + shape z_p)
 * with z_p the standard normal quantile. Commons Math 3.6.1 inverts the lognormal cumulative
 * distribution numerically to an absolute accuracy of 1e-9, which is coarse for small quantities
 * (a hydraulic conductivity of 1e-6 m/s) and slow for sampling.
 */
final class ExactQuantileLogNormal extends LogNormalDistribution {
    private static final long serialVersionUID = 1L;

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    ExactQuantileLogNormal(double scale, double shape) {
        super(null, scale, shape);
    }

    @Override
    public double inverseCumulativeProbability(double p) {
        if (p < 0 || p > 1) {
            throw new OutOfRangeException(p, 0, 1);
        }
        if (p == 0) {
            return 0;
        }
        if (p == 1) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.exp(getScale() + getShape() * STANDARD_NORMAL.inverseCumulativeProbability(p));
    }
}
