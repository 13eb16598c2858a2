/**
 * The uncertainty engine: Monte Carlo simulation of a model from named uncertain inputs to named
 * outputs, independent of the site model (the design pipeline supplies the model).
 *
 * <ul>
 * <li>{@link eluvia.design.uncertainty.UncertainInput}: an input with its unit and distribution
 * (fixed, normal, lognormal, uniform, triangular; Apache Commons Math 3.6.1 distributions), with its
 * P10 / P50 / P90.</li>
 * <li>{@link eluvia.design.uncertainty.RankCorrelationMatrix}: a target Spearman correlation between
 * inputs, imposed by the method of Iman and Conover (1982).</li>
 * <li>{@link eluvia.design.uncertainty.UncertaintyStudy}: inputs, outputs, model, correlation and the
 * outputs that are costs of alternatives.</li>
 * <li>{@link eluvia.design.uncertainty.MonteCarloRunner} with
 * {@link eluvia.design.uncertainty.SimulationSettings}: Latin hypercube (default) or plain Monte
 * Carlo sampling, reproducible with a seed whatever the number of threads, progress and cancellation
 * through {@link eluvia.design.uncertainty.ProgressSink}, failed runs recorded.</li>
 * <li>{@link eluvia.design.uncertainty.UncertaintyResult}: statistics and histogram of each output,
 * tornado, Spearman rank correlations, probability that each alternative is cheapest, every run.</li>
 * </ul>
 *
 * <p>Bad inputs throw {@link eluvia.design.uncertainty.UncertaintyInputException}, whose message
 * names the quantity, the value and the allowed range.
 */
package eluvia.design.uncertainty;
