package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * How many years annual O&amp;M runs: a fixed number, or a {@link CostUnit#YEAR} quantity of the
 * take-off (so that a longer flush in a larger, later zone runs longer, e.g.
 * {@link FlushingQuantities#OPERATING_YEARS}).
 */
public sealed interface OperatingPeriod permits OperatingPeriod.Fixed, OperatingPeriod.FromQuantity {

    /** The number of years, 0 to 1000, for this take-off. */
    int years(QuantitySet quantities);

    /** A fixed number of years. */
    static Fixed fixed(int years) {
        return new Fixed(years);
    }

    /** The amount of the named year quantity, which must be a whole number. */
    static FromQuantity fromQuantity(String quantityName) {
        return new FromQuantity(quantityName);
    }

    /**
     * A fixed number of years.
     *
     * @param operatingYears years of annual O&amp;M, 0 to 1000
     */
    record Fixed(int operatingYears) implements OperatingPeriod {
        /** Checks the field. */
        public Fixed {
            if (operatingYears < 0 || operatingYears > 1000) {
                throw new CostInputException("operatingYears", operatingYears, "[0, 1000]");
            }
        }

        @Override
        public int years(QuantitySet quantities) {
            return operatingYears;
        }
    }

    /**
     * The years taken from a quantity of the take-off.
     *
     * @param quantityName name of a quantity in years
     */
    record FromQuantity(String quantityName) implements OperatingPeriod {
        /** Checks the field. */
        public FromQuantity {
            Checks.text("operating years quantity name", quantityName);
        }

        @Override
        public int years(QuantitySet quantities) {
            Quantity q = quantities.get(quantityName);
            if (q.unit() != CostUnit.YEAR) {
                throw new CostInputException("unit of quantity '" + quantityName + "'", q.unit().symbol(), "yr");
            }
            double y = q.amount();
            if (y != Math.rint(y) || y > 1000) {
                throw new CostInputException("quantity '" + quantityName + "' (yr)", y, "a whole number in [0, 1000]",
                        "round the operating period to whole years in the take-off");
            }
            return (int) y;
        }
    }
}
