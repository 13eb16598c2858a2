package eluvia.design;

import eluvia.design.uncertainty.OutputStatistics;
import eluvia.design.uncertainty.Tornado;

/**
 * One headline figure of the design with its uncertainty: what it is, the deterministic value of
 * the design run, and its distribution over the completed Monte Carlo runs.
 *
 * @param outputName    the name of the output in the simulation (unique), e.g.
 *                      {@code "flushing design 'A': duration"}
 * @param subjectKind   what the figure belongs to: {@code "flushing design"}, {@code "excavation design"},
 *                      {@code "zone"}, {@code "alternative"} or {@code "zone analysis"}
 * @param subjectName   the name of that design, zone or alternative (empty for the zone analysis)
 * @param quantity      the figure in words, e.g. {@code "duration"}, {@code "present value"}
 * @param unit          its unit: {@code "1"} for pore volumes (dimensionless), {@code "d"} for calendar
 *                      days, {@code "m3"}, {@code "loads"}, or the price book's currency code for money
 * @param baseValue     the figure of the deterministic design run (every input at its entered value),
 *                      in {@code unit}
 * @param statistics    P10 / P50 / P90, mean, standard deviation, range and histogram, in {@code unit}
 * @param tornado       the figure with one input at a time at its P10 and its P90, the others at their
 *                      entered values, largest swing first
 */
public record UncertaintyHeadline(String outputName, String subjectKind, String subjectName, String quantity,
        String unit, double baseValue, OutputStatistics statistics, Tornado tornado) {
}
