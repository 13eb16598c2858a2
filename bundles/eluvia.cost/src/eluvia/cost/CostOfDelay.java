package eluvia.cost;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

import eluvia.cost.internal.Checks;

/**
 * Present value against years of delay: while nothing is done the zone enlarges by dispersion, so
 * a later start means larger quantities; the pipeline supplies the take-off for each delay, this
 * helper prices it with one recipe.
 *
 * <p>Two present values per delay d: at the start of work (the estimate of the enlarged zone, as if
 * work began now), and today = that x P/F(i, d) (work begins d years from now). The first shows what
 * the delay adds to the job; the second is what a present-value comparison sees, where discounting
 * can hide that growth. Both are given, with the increase over no delay.
 *
 * @param baseline the point at delay 0
 * @param points   one point per requested delay, in the order requested
 */
public record CostOfDelay(Point baseline, List<Point> points) {

    /** Copies the list. */
    public CostOfDelay {
        Checks.notNull("baseline", baseline);
        points = List.copyOf(points);
    }

    /**
     * Prices the take-off after each delay.
     *
     * @param recipe              the recipe for every delay
     * @param quantitiesAfterDelay take-off for a start after the given years of delay (0 included)
     * @param delayYears          delays to evaluate, years, each in [0, 1000]
     */
    public static CostOfDelay of(EstimateRecipe recipe, DoubleFunction<QuantitySet> quantitiesAfterDelay,
            double... delayYears) {
        Checks.notNull("estimate recipe", recipe);
        Checks.notNull("quantities after delay", quantitiesAfterDelay);
        Checks.notNull("delay years", delayYears);
        for (double d : delayYears) {
            Checks.closed("delay (years)", d, 0.0, 1000.0, null);
        }
        CostEstimate base = recipe.price(Checks.notNull("quantities after delay 0", quantitiesAfterDelay.apply(0.0)));
        Point baseline = new Point(0.0, base, base.presentValue(), base.presentValue(), Money.zero(base.currency()),
                Money.zero(base.currency()));
        List<Point> points = new ArrayList<>();
        for (double d : delayYears) {
            CostEstimate e = recipe.price(Checks.notNull("quantities after delay " + d, quantitiesAfterDelay.apply(d)));
            Money atStart = e.presentValue();
            Money today = atStart.times(PresentValue.singleFactor(recipe.discountRatePercent(), d));
            points.add(new Point(d, e, atStart, today, atStart.minus(baseline.presentValueAtStartOfWork()),
                    today.minus(baseline.presentValueToday())));
        }
        return new CostOfDelay(baseline, points);
    }

    /**
     * The estimate after one delay.
     *
     * @param delayYears                    years of delay
     * @param estimate                      the priced take-off after the delay
     * @param presentValueAtStartOfWork     present value at the (delayed) start of work
     * @param presentValueToday             that, discounted over the delay
     * @param increaseAtStartOfWork         present value at start of work minus the baseline's
     * @param increaseToday                 present value today minus the baseline's
     */
    public record Point(double delayYears, CostEstimate estimate, Money presentValueAtStartOfWork,
            Money presentValueToday, Money increaseAtStartOfWork, Money increaseToday) {
    }
}
