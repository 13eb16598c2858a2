package eluvia.cost;

import java.util.Comparator;
import java.util.List;

import eluvia.cost.internal.Checks;

/**
 * Alternatives side by side (flushing, excavation, hybrid...). Present values are comparable only
 * at one discount rate and in one currency, so the constructor refuses a mix.
 *
 * @param alternatives the alternatives, at least one, in display order
 */
public record AlternativeComparison(List<AlternativeSummary> alternatives) {

    /** Checks the list: non-empty, one currency, one discount rate. */
    public AlternativeComparison {
        Checks.notNull("alternatives", alternatives);
        if (alternatives.isEmpty()) {
            throw new CostInputException("number of alternatives", 0, "[1, infinity)");
        }
        alternatives = List.copyOf(alternatives);
        AlternativeSummary first = alternatives.get(0);
        for (AlternativeSummary a : alternatives) {
            if (!a.estimate().currency().equals(first.estimate().currency())) {
                throw new CostInputException("currency of alternative '" + a.name() + "'", a.estimate().currency(),
                        "the currency of '" + first.name() + "', " + first.estimate().currency());
            }
            if (a.estimate().discountRatePercent() != first.estimate().discountRatePercent()) {
                throw new CostInputException("discount rate (% per year) of alternative '" + a.name() + "'",
                        a.estimate().discountRatePercent(),
                        "the rate of '" + first.name() + "', " + first.estimate().discountRatePercent(),
                        "present values at different rates cannot be compared; price all alternatives at one rate");
            }
        }
    }

    /** The alternative with the lowest present value (the first of equals). */
    public AlternativeSummary lowestPresentValue() {
        return alternatives.stream().min(Comparator.comparingDouble(a -> a.presentValue().amount())).orElseThrow();
    }

    /** The alternative with the shortest duration (the first of equals). */
    public AlternativeSummary shortestDuration() {
        return alternatives.stream().min(Comparator.comparingDouble(AlternativeSummary::durationCalendarDays))
                .orElseThrow();
    }
}
