/**
 * From soil samples to the volume of soil above the cleanup level.
 *
 * <p>Typical use by the design pipeline:
 * <pre>
 * SampleSet samples = SampleSet.of(soilSamples, NonDetectRule.HALF_DETECTION_LIMIT, 10.0);
 * BlockModel model = new BlockModel(e0, n0, 0.0, 2.0, 2.0, 0.5, 50, 40, 16);
 * ExperimentalVariogram look = ExperimentalVariogram.compute(samples, 5.0, 12);   // shown to the engineer
 * VariogramModel chosen = new VariogramModel(VariogramShape.SPHERICAL, nugget, sill, range);
 * BlockEstimate estimate = new OrdinaryKriging(chosen, 16, Double.POSITIVE_INFINITY).estimate(samples, model);
 * ExceedanceZone zone = ExceedanceZone.find(new ContaminantEstimate("benzene", estimate, 0.5));
 * zone.volumeCubicMetres(); zone.footprintPolygon(); zone.proposedTreatmentZone();
 * </pre>
 * Lengths are in metres, depths measured downwards from a level ground surface, concentrations
 * in mg/kg of dry soil, semivariances and kriging variances in (mg/kg)^2. Inverse-distance
 * weighting ({@link eluvia.zone.InverseDistanceWeighting}) replaces kriging where no variogram
 * can be chosen. Bad inputs throw {@link eluvia.zone.ZoneInputException}, whose message names the
 * quantity, the value and the allowed range. Plain Java and Commons Math only; no EMF, no UI.
 */
package eluvia.zone;
