package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * An amount of money in a named currency (the unit of every cost in this bundle).
 *
 * <p>Arithmetic between two amounts checks that the currencies agree; there is no conversion.
 * Amounts are not rounded: reports round for display.
 *
 * @param amount   the amount in {@code currency}; finite (negative only for differences)
 * @param currency currency label as the price book states it, e.g. {@code "USD"}
 */
public record Money(double amount, String currency) {

    /** Checks the fields. */
    public Money {
        if (!Double.isFinite(amount)) {
            throw new CostInputException("money amount (" + currency + ")", amount, "finite");
        }
        Checks.text("currency", currency);
    }

    /** Zero in {@code currency}. */
    public static Money zero(String currency) {
        return new Money(0.0, currency);
    }

    /** The sum; throws if the currencies differ. */
    public Money plus(Money other) {
        requireSameCurrency(other);
        return new Money(amount + other.amount, currency);
    }

    /** The difference; throws if the currencies differ. */
    public Money minus(Money other) {
        requireSameCurrency(other);
        return new Money(amount - other.amount, currency);
    }

    /** This amount times a dimensionless factor. */
    public Money times(double factor) {
        return new Money(amount * factor, currency);
    }

    /** {@code percent} per cent of this amount. */
    public Money percent(double percent) {
        return new Money(amount * percent / 100.0, currency);
    }

    private void requireSameCurrency(Money other) {
        Checks.notNull("money amount", other);
        if (!currency.equals(other.currency)) {
            throw new CostInputException("currency", other.currency, "the same currency as " + currency,
                    "use one price book currency for the whole estimate; this bundle does not convert");
        }
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "%.2f %s", amount, currency);
    }
}
