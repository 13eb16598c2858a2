package eluvia.cost;

import java.util.ArrayList;
import java.util.List;

import eluvia.cost.internal.Checks;

/**
 * How to price a take-off: price book, lines, markups, discount rate, operating period and accuracy
 * range. {@link #price(QuantitySet)} turns a {@link QuantitySet} into a {@link CostEstimate}; the same
 * recipe prices the take-offs of an enlarged zone for {@link CostOfDelay}.
 *
 * <p>Method (US EPA / USACE 2000, EPA 540-R-00-002): capital, annual O&amp;M and periodic costs, each a
 * sum of quantity x unit rate lines, marked up with contingency and professional/technical services;
 * present value = total capital (year 0) + total annual O&amp;M x P/A(i, n) + sum of each periodic total
 * x P/F(i, year). Accuracy range by estimate class (default: the feasibility-study range of the guide).
 *
 * @param name                    name of the alternative or estimate
 * @param priceBook               the unit rates
 * @param lines                   the lines, at least one
 * @param capitalMarkups          capital contingency and services
 * @param operatingMarkups        O&amp;M and periodic contingency and services
 * @param discountRatePercent     real discount rate, % per year, in (-100, 100]
 * @param operatingPeriod         years of annual O&amp;M
 * @param accuracy                accuracy range applied to every total
 */
public record EstimateRecipe(String name, PriceBook priceBook, List<LineSpec> lines, CapitalMarkups capitalMarkups,
        OperatingMarkups operatingMarkups, double discountRatePercent, OperatingPeriod operatingPeriod,
        AccuracyRange accuracy) {

    /** Checks the fields and copies the line list. */
    public EstimateRecipe {
        Checks.text("estimate name", name);
        Checks.notNull("price book", priceBook);
        Checks.notNull("estimate lines", lines);
        if (lines.isEmpty()) {
            throw new CostInputException("number of estimate lines", 0, "[1, infinity)");
        }
        lines = List.copyOf(lines);
        for (LineSpec line : lines) {
            priceBook.item(line.priceItemId());
        }
        Checks.notNull("capital markups", capitalMarkups);
        Checks.notNull("O&M markups", operatingMarkups);
        PresentValue.rate(discountRatePercent);
        Checks.notNull("operating period", operatingPeriod);
        Checks.notNull("accuracy range", accuracy);
    }

    /** A builder with no markups, the default discount rate, 0 operating years and the feasibility-study range. */
    public static Builder builder(String name, PriceBook priceBook) {
        return new Builder(name, priceBook);
    }

    /** Whether the discount rate is the default of {@link PresentValue#DEFAULT_RATE_RULE}. */
    public boolean usesDefaultDiscountRate() {
        return discountRatePercent == PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT;
    }

    /** This recipe with another discount rate (for sensitivity runs). */
    public EstimateRecipe withDiscountRatePercent(double ratePercentPerYear) {
        return new EstimateRecipe(name, priceBook, lines, capitalMarkups, operatingMarkups, ratePercentPerYear,
                operatingPeriod, accuracy);
    }

    /** Prices {@code quantities}; throws if a line's quantity is missing or in another unit than its rate. */
    public CostEstimate price(QuantitySet quantities) {
        return CostEstimate.of(this, quantities);
    }

    /** Builds an {@link EstimateRecipe} line by line. */
    public static final class Builder {
        private final String name;
        private final PriceBook priceBook;
        private final List<LineSpec> lines = new ArrayList<>();
        private CapitalMarkups capitalMarkups = CapitalMarkups.none();
        private OperatingMarkups operatingMarkups = OperatingMarkups.none();
        private double discountRatePercent = PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT;
        private OperatingPeriod operatingPeriod = OperatingPeriod.fixed(0);
        private AccuracyRange accuracy = AccuracyRange.FEASIBILITY_STUDY;

        private Builder(String name, PriceBook priceBook) {
            this.name = name;
            this.priceBook = priceBook;
        }

        /** Adds a capital line. */
        public Builder capital(String priceItemId, String quantityName) {
            lines.add(LineSpec.capital(priceItemId, quantityName));
            return this;
        }

        /** Adds an annual O&amp;M line (quantity per year of operation). */
        public Builder annual(String priceItemId, String quantityName) {
            lines.add(LineSpec.annual(priceItemId, quantityName));
            return this;
        }

        /** Adds a periodic line in {@code year}. */
        public Builder periodic(String priceItemId, String quantityName, int year) {
            lines.add(LineSpec.periodic(priceItemId, quantityName, year));
            return this;
        }

        /** Sets the capital markups. */
        public Builder capitalMarkups(CapitalMarkups markups) {
            this.capitalMarkups = markups;
            return this;
        }

        /** Sets the O&amp;M and periodic markups. */
        public Builder operatingMarkups(OperatingMarkups markups) {
            this.operatingMarkups = markups;
            return this;
        }

        /** Sets the real discount rate, % per year. */
        public Builder discountRatePercent(double ratePercentPerYear) {
            this.discountRatePercent = ratePercentPerYear;
            return this;
        }

        /** Sets the operating period. */
        public Builder operatingPeriod(OperatingPeriod period) {
            this.operatingPeriod = period;
            return this;
        }

        /** Sets the accuracy range. */
        public Builder accuracy(AccuracyRange range) {
            this.accuracy = range;
            return this;
        }

        /** The recipe. */
        public EstimateRecipe build() {
            return new EstimateRecipe(name, priceBook, lines, capitalMarkups, operatingMarkups, discountRatePercent,
                    operatingPeriod, accuracy);
        }
    }
}
