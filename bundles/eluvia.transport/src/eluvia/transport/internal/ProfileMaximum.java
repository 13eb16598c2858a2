package eluvia.transport.internal;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * Largest value of a depth profile f(X) on 0 &le; X &le; 1 (dimensionless depth), without
 * assuming where it is: the profile is sampled at {@value #SAMPLES} equally spaced depths
 * (both ends included) and the best sample is refined by Brent's method (Commons Math
 * {@link BrentOptimizer}, relative tolerance 1e-10) between its neighbours. The answer is the
 * larger of the refined and the sampled values, so a maximum at an end is found exactly.
 */
public final class ProfileMaximum {
    /** Number of equally spaced samples. */
    public static final int SAMPLES = 33;

    private final double depth;
    private final double value;

    private ProfileMaximum(double depth, double value) {
        this.depth = depth;
        this.value = value;
    }

    /** The depth X of the maximum (dimensionless, 0..1). */
    public double depth() {
        return depth;
    }

    /** The maximum value. */
    public double value() {
        return value;
    }

    public static ProfileMaximum of(DoubleUnaryOperator profile) {
        int best = 0;
        double bestValue = Double.NEGATIVE_INFINITY;
        double step = 1.0 / (SAMPLES - 1);
        for (int i = 0; i < SAMPLES; i++) {
            double v = profile.applyAsDouble(i == SAMPLES - 1 ? 1.0 : i * step);
            if (v > bestValue) {
                bestValue = v;
                best = i;
            }
        }
        double bestDepth = best == SAMPLES - 1 ? 1.0 : best * step;
        double lo = Math.max(0, (best - 1) * step);
        double hi = Math.min(1, (best + 1) * step);
        UnivariatePointValuePair refined = new BrentOptimizer(1e-10, 1e-14).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(profile::applyAsDouble), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi, bestDepth));
        if (refined.getValue() > bestValue) {
            return new ProfileMaximum(refined.getPoint(), refined.getValue());
        }
        return new ProfileMaximum(bestDepth, bestValue);
    }
}
