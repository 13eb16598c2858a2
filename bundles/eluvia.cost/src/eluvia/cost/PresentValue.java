package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * Present-value factors at a real discount rate i per year (given in per cent).
 *
 * <p>Uniform series (years 1 to n, end of year): P/A = [(1 + i)^n - 1] / [i (1 + i)^n];
 * single amount in year n: P/F = (1 + i)^-n. At i = 0 the series factor is its limit n. The series
 * factor is evaluated as -expm1(-n log1p(i)) / i, algebraically the same and free of the
 * cancellation the textbook form suffers as i goes to 0. Rates in (-100, 100] % are accepted
 * (the formulas hold for i &gt; -1; real rates have been negative).
 */
public final class PresentValue {
    /** Default real discount rate, % per year. */
    public static final double DEFAULT_REAL_DISCOUNT_RATE_PERCENT = 7.0;

    /** Which rule the default follows, to print beside any present value at the default rate. */
    public static final String DEFAULT_RATE_RULE = "7 % real per year: the rate of OMB Circular A-94 (1992), "
            + "adopted for feasibility-study present-value analysis (US EPA/USACE 2000, EPA 540-R-00-002). "
            + "The circular was revised later; the rate is an input.";

    private PresentValue() {
    }

    /** Uniform-series present-worth factor P/A (years), for {@code years} (0 or more) at the rate. */
    public static double seriesFactor(double ratePercentPerYear, double years) {
        double i = rate(ratePercentPerYear);
        double n = Checks.nonNegative("years of the uniform series", years);
        if (i == 0.0) {
            return n;
        }
        return -Math.expm1(-n * Math.log1p(i)) / i;
    }

    /** Single-payment present-worth factor P/F (dimensionless) for an amount in {@code year} (0 or more). */
    public static double singleFactor(double ratePercentPerYear, double year) {
        double i = rate(ratePercentPerYear);
        double n = Checks.nonNegative("year of the single amount", year);
        return Math.exp(-n * Math.log1p(i));
    }

    static double rate(double ratePercentPerYear) {
        return Checks.openClosed("discount rate (% per year)", ratePercentPerYear, -100.0, 100.0,
                "enter per cent per year (7 for 7 %)") / 100.0;
    }
}
