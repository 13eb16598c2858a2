package eluvia.transport;

import org.apache.commons.math3.analysis.UnivariateFunction;

import eluvia.transport.internal.BracketedZero;

/**
 * Finds the pore volumes at which a flushing model's criterion falls to a target fraction.
 *
 * <p>Method: the remaining fraction at the limit is evaluated first (if it is still above the
 * target the answer is "not reachable within maxPoreVolumes" with what was reached). The search
 * then works on g(T) = ln(remaining fraction / target), which is nearly straight once the slowest
 * mode of the solution leads, so interpolation converges in a few evaluations. From the model's
 * first guess ({@link FlushingModel#poreVolumeGuess}: for the equilibrium models the plug-flow and
 * well-mixed estimates or their geometric mean) the crossing is bracketed: below the guess by
 * [0, guess] (every model starts from 1 at T = 0, so g(0) = ln(1/target) is known), above it by
 * chord steps from T = 0 (an upper bound while g is concave) or doublings, capped by the limit.
 * The crossing is then located by Brent's method (Brent 1973, Dover reprint 2002;
 * {@link BracketedZero}, which reuses the bracket's values).
 *
 * <p>Accuracy: relative accuracy {@value #RELATIVE_ACCURACY} on the bracket, so the pore volumes
 * returned are within 1e-9 (relative) of the crossing of the evaluated model, and on the side
 * where the target is met (the remaining fraction there is at most the target, to rounding). Evaluation cap:
 * {@value #MAX_BRACKET_STEPS} bracketing steps and {@value #MAX_SOLVER_EVALUATIONS} solver
 * evaluations; a model that needs more gets an {@link IllegalStateException} with the numbers.
 * The remaining fractions of the equilibrium models fall monotonically with pore volumes, so the
 * crossing found is the first one.
 */
public final class PoreVolumeSearch {
    /** Relative accuracy asked of Brent's method on the pore volumes. */
    public static final double RELATIVE_ACCURACY = 1e-10;
    /** Most evaluations Brent's method may use. */
    public static final int MAX_SOLVER_EVALUATIONS = 200;
    /** Widening of a chord step so that a nearly concave curve is still bracketed. */
    static final double CHORD_MARGIN = 1.05;
    /** Most steps out from the first guess to bracket the crossing. */
    public static final int MAX_BRACKET_STEPS = 200;

    /** Stands for the logarithm of a remaining fraction that is 0 or below (the smallest normal double's). */
    private static final double LOG_SMALLEST = -745;

    private PoreVolumeSearch() {
    }

    /**
     * @param model the flushing solution
     * @param criterion the cleanup criterion
     * @param targetFraction target over initial concentration, dimensionless, between 0 and 1 (both excluded)
     * @param maxPoreVolumes the largest number of pore volumes (dimensionless) to consider, greater than 0
     */
    public static PoreVolumeResult solve(FlushingModel model, CleanupCriterion criterion, double targetFraction,
            double maxPoreVolumes) {
        if (model == null) {
            throw new TransportInputException("flushing model", null, "a model from FlushingModels");
        }
        if (criterion == null) {
            throw new TransportInputException("cleanup criterion", null, "one of effluent, mean, max");
        }
        if (!(targetFraction > 0 && targetFraction < 1)) {
            throw new TransportInputException("target fraction", targetFraction, "between 0 and 1, both excluded");
        }
        TransportInputException.requirePositive("maximum pore volumes (-)", maxPoreVolumes);

        int[] count = {0};
        double logTarget = Math.log(targetFraction);
        UnivariateFunction f = t -> {
            count[0]++;
            return logOverTarget(model.remainingFraction(criterion, t), logTarget);
        };
        count[0]++;
        double remainingAtLimit = model.remainingFraction(criterion, maxPoreVolumes);
        double atLimit = logOverTarget(remainingAtLimit, logTarget);
        if (remainingAtLimit > targetFraction) {
            return new PoreVolumeResult(criterion, targetFraction, false, Double.NaN, remainingAtLimit,
                    maxPoreVolumes, count[0]);
        }
        double guess = model.poreVolumeGuess(criterion, targetFraction);
        if (!(guess > 0) || Double.isInfinite(guess)) {
            guess = 1;
        }
        guess = Math.min(guess, maxPoreVolumes);
        // g(0) = ln(1 / target): every model starts from a remaining fraction of 1 at T = 0
        double atStart = -logTarget;
        double lo;
        double flo;
        double hi;
        double fhi;
        double fg = guess == maxPoreVolumes ? atLimit : f.value(guess);
        if (fg > 0) {
            // not yet reached at the guess: step out along the chord from T = 0 (an upper bound
            // where ln(remaining) is concave, as it is while one mode takes the lead), else by
            // doubling; the limit, where the target is met, caps every step
            lo = guess;
            flo = fg;
            for (int i = 0;; i++) {
                checkSteps(i, model, criterion, targetFraction);
                double chord = flo < atStart ? lo * atStart / (atStart - flo) * CHORD_MARGIN : Double.POSITIVE_INFINITY;
                double next = Math.min(Math.min(chord, 2 * lo + 1), maxPoreVolumes);
                double fn = next == maxPoreVolumes ? atLimit : f.value(next);
                if (fn <= 0) {
                    hi = next;
                    fhi = fn;
                    break;
                }
                lo = next;
                flo = fn;
            }
        } else {
            // reached at the guess: the crossing lies between T = 0 and the guess
            lo = 0;
            flo = atStart;
            hi = guess;
            fhi = fg;
        }
        double root = BracketedZero.find(f, lo, flo, hi, fhi, RELATIVE_ACCURACY, MAX_SOLVER_EVALUATIONS,
                true);
        if (Double.isNaN(root)) {
            throw new IllegalStateException("the pore-volume search for the " + criterion.description()
                    + " to reach " + targetFraction + " with model " + model.name() + " did not converge in "
                    + MAX_SOLVER_EVALUATIONS + " evaluations between " + lo + " and " + hi + " pore volumes");
        }
        return new PoreVolumeResult(criterion, targetFraction, true, root, remainingAtLimit, maxPoreVolumes,
                count[0]);
    }

    /**
     * ln(remaining / target): nearly linear in T once one exponential mode leads, so Brent's
     * interpolation converges in a few steps; a remaining fraction of 0 or below counts as the
     * smallest normal double's logarithm.
     */
    private static double logOverTarget(double remaining, double logTarget) {
        return (remaining > 0 ? Math.log(remaining) : LOG_SMALLEST) - logTarget;
    }

    private static void checkSteps(int i, FlushingModel model, CleanupCriterion criterion, double target) {
        if (i >= MAX_BRACKET_STEPS) {
            throw new IllegalStateException("no bracket found in " + MAX_BRACKET_STEPS + " steps for the "
                    + criterion.description() + " to reach " + target + " with model " + model.name());
        }
    }
}
