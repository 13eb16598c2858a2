package eluvia.ui.internal.fields;

import java.util.function.DoubleUnaryOperator;

import eluvia.ui.internal.Messages;

/**
 * The allowed values of a number field, in the model's storage unit: a lower and an upper bound,
 * each open or closed; infinite bounds for none.
 *
 * @param min lower bound in storage units ({@code -Infinity} for none)
 * @param minInclusive whether {@code min} itself is allowed
 * @param max upper bound in storage units ({@code +Infinity} for none)
 * @param maxInclusive whether {@code max} itself is allowed
 */
public record Range(double min, boolean minInclusive, double max, boolean maxInclusive) {

    /** Greater than 0. */
    public static Range positive() {
        return new Range(0, false, Double.POSITIVE_INFINITY, false);
    }

    /** 0 or more. */
    public static Range nonNegative() {
        return new Range(0, true, Double.POSITIVE_INFINITY, false);
    }

    /** Any finite number. */
    public static Range any() {
        return new Range(Double.NEGATIVE_INFINITY, false, Double.POSITIVE_INFINITY, false);
    }

    /** An interval. */
    public static Range of(double min, boolean minInclusive, double max, boolean maxInclusive) {
        return new Range(min, minInclusive, max, maxInclusive);
    }

    /** True for a finite value inside the range. */
    public boolean test(double value) {
        if (!Double.isFinite(value)) {
            return false;
        }
        boolean aboveMin = minInclusive ? value >= min : value > min;
        boolean belowMax = maxInclusive ? value <= max : value < max;
        return aboveMin && belowMax;
    }

    /**
     * The range in words, with its bounds converted for display, e.g. "greater than 0" or
     * "greater than 0 and at most 7".
     *
     * @param toDisplay converts a bound from storage units to the unit shown
     * @param unitSuffix appended to each bound, e.g. " ft" (may be empty)
     */
    public String describe(DoubleUnaryOperator toDisplay, String unitSuffix) {
        boolean hasMin = Double.isFinite(min);
        boolean hasMax = Double.isFinite(max);
        String lo = hasMin ? Numbers.format(toDisplay.applyAsDouble(min)) + unitSuffix : "";
        String hi = hasMax ? Numbers.format(toDisplay.applyAsDouble(max)) + unitSuffix : "";
        String low = minInclusive ? Messages.bind(Messages.Range_atLeast, lo) : Messages.bind(Messages.Range_greaterThan, lo);
        String high = maxInclusive ? Messages.bind(Messages.Range_atMost, hi) : Messages.bind(Messages.Range_lessThan, hi);
        if (hasMin && hasMax) {
            return Messages.bind(Messages.Range_both, low, high);
        }
        if (hasMin) {
            return low;
        }
        if (hasMax) {
            return high;
        }
        return Messages.Range_anyNumber;
    }
}
