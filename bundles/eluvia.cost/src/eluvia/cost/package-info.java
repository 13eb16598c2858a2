/**
 * Quantity take-off and cost estimate for soil flushing and excavation: plain Java value types,
 * no EMF, no UI.
 *
 * <p>Flow: {@link eluvia.cost.ExcavationSizing#size} turns an {@link eluvia.cost.ExcavationPlan}
 * into {@link eluvia.cost.ExcavationQuantities} (bank, loose and compacted m3, t, loads, with the
 * protective-system cautions); {@link eluvia.cost.FlushingQuantities#of} turns solver outputs into
 * water volumes, durations, samples and amendment mass. Each take-off becomes a
 * {@link eluvia.cost.QuantitySet} of named {@link eluvia.cost.Quantity} values with their sources;
 * an {@link eluvia.cost.EstimateRecipe} prices it with a {@link eluvia.cost.PriceBook} into a
 * {@link eluvia.cost.CostEstimate} (capital, annual O&amp;M, periodic, markups, present value,
 * accuracy range) whose every line traces back to its quantity and the quantity's source.
 * {@link eluvia.cost.AlternativeComparison} sets alternatives side by side and
 * {@link eluvia.cost.CostOfDelay} prices the enlarged zone after a delay.
 *
 * <p>Sources: prismoidal pit formula and earthwork volume relations (Peurifoy, Construction
 * Planning, Equipment and Methods, Table 4-1 for typical swell); US OSHA 29 CFR 1926 Subpart P,
 * App. B, Table B-1 for side slopes; US EPA / USACE (2000) EPA 540-R-00-002 for the cost structure,
 * present value and the feasibility-study range; AACE International RP 18R-97 for estimate classes
 * (recalled, see {@link eluvia.cost.EstimateClass}). Bad inputs throw
 * {@link eluvia.cost.CostInputException} naming the quantity, value and allowed range.
 */
package eluvia.cost;
