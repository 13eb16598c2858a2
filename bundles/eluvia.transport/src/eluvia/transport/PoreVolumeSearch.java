package eluvia.transport;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;

/**
 * Finds the pore volumes at which a flushing model's criterion falls to a target fraction.
 *
 * <p>Method: the remaining fraction at the limit is evaluated first (if it is still above the
 * target the answer is "not reachable within maxPoreVolumes" with what was reached). Otherwise
 * a bracket is built by halving or doubling from the model's first guess
 * ({@link FlushingModel#poreVolumeGuess}: for the equilibrium models the plug-flow and
 * well-mixed estimates or their geometric mean), and the crossing is located by Brent's method
 * (Commons Math 3.6.1 {@link BrentSolver}; Brent 1973, Dover reprint 2002).
 *
 * <p>Accuracy: relative accuracy {@value #RELATIVE_ACCURACY} on the bracket, so the pore volumes
 * returned are within 1e-9 (relative) of the crossing of the evaluated model. Evaluation cap:
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
    /** Most halvings or doublings of the bracket. */
    public static final int MAX_BRACKET_STEPS = 200;

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
        UnivariateFunction f = t -> {
            count[0]++;
            return model.remainingFraction(criterion, t) - targetFraction;
        };
        double atLimit = f.value(maxPoreVolumes);
        if (atLimit > 0) {
            return new PoreVolumeResult(criterion, targetFraction, false, Double.NaN, atLimit + targetFraction,
                    maxPoreVolumes, count[0]);
        }
        double guess = model.poreVolumeGuess(criterion, targetFraction);
        if (!(guess > 0) || Double.isInfinite(guess)) {
            guess = 1;
        }
        guess = Math.min(guess, maxPoreVolumes);
        double lo;
        double hi;
        double fg = guess == maxPoreVolumes ? atLimit : f.value(guess);
        if (fg > 0) {
            lo = guess;
            hi = guess;
            for (int i = 0;; i++) {
                checkSteps(i, model, criterion, targetFraction);
                hi = Math.min(2 * hi, maxPoreVolumes);
                double fh = hi == maxPoreVolumes ? atLimit : f.value(hi);
                if (fh <= 0) {
                    break;
                }
                lo = hi;
            }
        } else {
            hi = guess;
            lo = guess;
            for (int i = 0;; i++) {
                checkSteps(i, model, criterion, targetFraction);
                lo = lo / 2;
                if (lo < 1e-12 * guess) {
                    lo = 0; // every model starts from 1 at T = 0, above any target
                    break;
                }
                if (f.value(lo) > 0) {
                    break;
                }
                hi = lo;
            }
        }
        BrentSolver solver = new BrentSolver(RELATIVE_ACCURACY, 1e-300, 0);
        double root;
        try {
            root = solver.solve(MAX_SOLVER_EVALUATIONS, f, lo, hi);
        } catch (MathIllegalStateException | org.apache.commons.math3.exception.MathIllegalArgumentException e) {
            throw new IllegalStateException("the pore-volume search for the " + criterion.description()
                    + " to reach " + targetFraction + " with model " + model.name() + " failed between " + lo
                    + " and " + hi + " pore volumes: " + e.getMessage(), e);
        }
        return new PoreVolumeResult(criterion, targetFraction, true, root, atLimit + targetFraction, maxPoreVolumes,
                count[0]);
    }

    private static void checkSteps(int i, FlushingModel model, CleanupCriterion criterion, double target) {
        if (i >= MAX_BRACKET_STEPS) {
            throw new IllegalStateException("no bracket found in " + MAX_BRACKET_STEPS + " steps for the "
                    + criterion.description() + " to reach " + target + " with model " + model.name());
        }
    }
}
