package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

final class BracketedZeroTest {

    private static double[] counted(UnivariateFunction f, double a, double b, int[] count) {
        UnivariateFunction g = x -> {
            count[0]++;
            return f.value(x);
        };
        return new double[] { BracketedZero.find(g, a, f.value(a), b, f.value(b), 1e-12, 200, false) };
    }

    @Test
    void agreesWithTheReferenceBrentSolver() {
        // reference: Commons Math 3.6.1 BrentSolver on the same functions and brackets
        UnivariateFunction[] fs = {
            x -> Math.cos(x) - x,
            x -> Math.exp(-x) - 1e-3,
            x -> x * x * x - 2 * x - 5, // Wallis's cubic, root 2.0945514815423265 (from memory, classical)
            x -> Math.log(x) + 0.5,
            x -> Math.tanh(10 * (x - 0.3)) };
        double[][] brackets = { { 0, 1 }, { 0, 20 }, { 2, 3 }, { 0.01, 5 }, { -1, 4 } };
        BrentSolver reference = new BrentSolver(1e-15, 1e-15, 1e-300);
        for (int i = 0; i < fs.length; i++) {
            int[] count = { 0 };
            double mine = counted(fs[i], brackets[i][0], brackets[i][1], count)[0];
            double theirs = reference.solve(500, fs[i], brackets[i][0], brackets[i][1]);
            assertEquals(theirs, mine, 1e-11 * Math.max(1, Math.abs(theirs)), "function " + i);
            assertTrue(count[0] < 60, "function " + i + " took " + count[0]);
        }
        int[] count = { 0 };
        assertEquals(2.0945514815423265, counted(fs[2], 2, 3, count)[0], 1e-11);
    }

    @Test
    void endsThatAreZerosAreReturnedAndSameSignsRefused() {
        // exact by construction: the given end value is 0 there
        assertEquals(1, BracketedZero.find(x -> x - 1, 1, 0, 3, 2, 1e-12, 10, false), 0);
        assertEquals(3, BracketedZero.find(x -> x - 3, 1, -2, 3, 0, 1e-12, 10, false), 0);
        assertThrows(IllegalArgumentException.class, () -> BracketedZero.find(x -> x * x + 1, -1, 2, 1, 2, 1e-12, 10, false));
    }

    @Test
    void theNonPositiveSideIsReturnedWhenAsked() {
        // exact root ln 1000; the returned end must have f <= 0 (the target met) for every bracket
        for (double hi = 7.5; hi < 40; hi *= 1.37) {
            UnivariateFunction f = x -> Math.exp(-x) * 1000 - 1;
            double t = BracketedZero.find(f, 0, 999, hi, f.value(hi), 1e-10, 200, true);
            assertTrue(f.value(t) <= 0, "f(" + t + ") = " + f.value(t));
            assertEquals(Math.log(1000), t, 3e-9 * t);
        }
    }

    @Test
    void tooFewEvaluationsGiveNaN() {
        // bisection-only function (a step): needs about 40 halvings for 1e-12 on [0, 1]
        UnivariateFunction step = x -> x < 0.123456 ? 1 : -1; // its sign changes at 0.123456 (by construction)
        assertTrue(Double.isNaN(BracketedZero.find(step, 0, 1, 1, -1, 1e-12, 5, false)));
        assertEquals(0.123456, BracketedZero.find(step, 0, 1, 1, -1, 1e-12, 200, false), 1e-11);
    }
}
