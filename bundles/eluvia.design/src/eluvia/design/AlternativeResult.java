package eluvia.design;

import java.util.List;

import eluvia.cost.AlternativeKind;
import eluvia.cost.CostEstimate;
import eluvia.cost.QuantitySet;

/**
 * One remedial alternative priced: flushing of a zone, excavation of a zone, or the hybrid
 * (excavate the hot spot, flush the rest). Its quantities are the take-offs of the pipeline; its
 * estimate prices them with the price book (eluvia.cost EstimateRecipe: capital, annual O&amp;M and
 * periodic costs, contingency, professional and technical services, present value at the run's
 * discount rate, accuracy range; US EPA/USACE 2000, EPA 540-R-00-002). Every cost line names its
 * quantity and every quantity its source.
 *
 * @param name the alternative's name
 * @param kind flushing, excavation or hybrid
 * @param available whether it could be quantified and priced
 * @param unavailableReason why not (empty when available)
 * @param basis which designs and zones it is made of, in words
 * @param quantities the take-off (null when not available)
 * @param estimate the priced take-off (null when not available); money in the price book's currency
 * @param priceBookName the price book used
 * @param inventedRates whether the rates are invented (the shipped example): never use such figures
 * @param unpriced cost items the alternative needs that the price book does not have (left out of the estimate)
 * @param durationCalendarDays calendar days from the start of work to the cleanup level; NaN when not
 *        estimated (excavation: no production rate in the project)
 * @param notes bases and warnings
 */
public record AlternativeResult(String name, AlternativeKind kind, boolean available, String unavailableReason,
        String basis, QuantitySet quantities, CostEstimate estimate, String priceBookName, boolean inventedRates,
        List<String> unpriced, double durationCalendarDays, List<String> notes) {

    /** Copies the lists. */
    public AlternativeResult {
        unpriced = List.copyOf(unpriced);
        notes = List.copyOf(notes);
    }

    /** A "not available" alternative: no numbers, only the reason. */
    public static AlternativeResult notAvailable(String name, AlternativeKind kind, String basis, String reason) {
        return new AlternativeResult(name, kind, false, reason, basis, null, null, "", false, List.of(), Double.NaN,
                List.of());
    }
}
