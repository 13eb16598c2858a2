package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * A named quantity from a take-off, with its unit and where it came from.
 *
 * <p>This is the middle link of the trace every number in an estimate carries: a {@link LineItem}
 * names its quantity, and the quantity names its source (a short text such as {@code "bank volume,
 * prismoidal formula, pit 4.5 m deep at side slope 1.0"}). The amount is in {@link #unit()}.
 *
 * @param name   unique name within a {@link QuantitySet}, e.g. {@code "contaminated bank volume"}
 * @param amount how many of {@link #unit()}; finite and not negative
 * @param unit   the unit of {@code amount}
 * @param source how the amount was obtained (method and inputs), for the reviewer
 */
public record Quantity(String name, double amount, CostUnit unit, String source) {

    /** Checks the fields. */
    public Quantity {
        Checks.text("quantity name", name);
        Checks.nonNegative("amount of quantity '" + name + "' (" + (unit == null ? "?" : unit.symbol()) + ")",
                amount);
        Checks.notNull("unit of quantity '" + name + "'", unit);
        Checks.text("source of quantity '" + name + "'", source);
    }

    /** A lump-sum quantity (amount 1, unit {@link CostUnit#LUMP_SUM}). */
    public static Quantity lumpSum(String name, String source) {
        return new Quantity(name, 1.0, CostUnit.LUMP_SUM, source);
    }

    @Override
    public String toString() {
        return name + " = " + amount + " " + unit.symbol() + " (" + source + ")";
    }
}
