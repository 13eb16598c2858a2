package eluvia.transport;

import java.util.OptionalDouble;

/**
 * Screening calculation for flushing one layer to a cleanup criterion with the exact
 * finite-layer equilibrium solution ({@link FlushingModels#finiteLayer}), with the well-mixed and
 * plug-flow estimates beside it for comparison.
 *
 * <p>Units: pore volumes T are dimensionless; duration in days is T theta L / q; the water
 * volume in m3 is T theta L A for a treated area A in m2; one pore volume is theta L m3 per m2.
 */
public final class FlushingScreening {
    private FlushingScreening() {
    }

    /**
     * @param in the layer
     * @param criterion the cleanup criterion
     * @param targetFraction cleanup level over initial concentration, dimensionless, between 0 and 1 (both excluded)
     * @param areaSquareMetres plan area treated, m2, greater than 0 when present
     * @param maxPoreVolumes the largest number of pore volumes to consider, dimensionless
     */
    public static FlushingEstimate estimate(LayerFlushingInput in, CleanupCriterion criterion, double targetFraction,
            OptionalDouble areaSquareMetres, double maxPoreVolumes) {
        if (in == null) {
            throw new TransportInputException("layer", null, "a LayerFlushingInput");
        }
        return estimate(in, FlushingModels.finiteLayer(LayerTransport.of(in)), criterion, targetFraction,
                areaSquareMetres, maxPoreVolumes);
    }

    /**
     * The same with a model of the caller's choice (for example {@link FlushingModels#twoRegion}
     * built from {@code LayerTransport.of(in)}); the well-mixed and plug-flow estimates are those
     * of the layer.
     */
    public static FlushingEstimate estimate(LayerFlushingInput in, FlushingModel model, CleanupCriterion criterion,
            double targetFraction, OptionalDouble areaSquareMetres, double maxPoreVolumes) {
        if (model == null) {
            throw new TransportInputException("flushing model", null, "a model from FlushingModels");
        }
        if (in == null) {
            throw new TransportInputException("layer", null, "a LayerFlushingInput");
        }
        if (areaSquareMetres == null) {
            throw new TransportInputException("treated area (m2)", null, "a value or OptionalDouble.empty()");
        }
        if (areaSquareMetres.isPresent()) {
            TransportInputException.requirePositive("treated area (m2)", areaSquareMetres.getAsDouble());
        }
        LayerTransport t = LayerTransport.of(in);
        PoreVolumeResult result = PoreVolumeSearch.solve(model, criterion, targetFraction, maxPoreVolumes);

        double wellMixed = FlushingModels.wellMixed(t).poreVolumeGuess(criterion, targetFraction);
        // The plug-flow criterion is 0 from T = R on, so a search limited to R always succeeds.
        double plug = PoreVolumeSearch.solve(FlushingModels.plugFlow(t), criterion, targetFraction, t.retardation())
                .poreVolumes();

        double onePoreVolume = in.waterContent() * in.thicknessMetres();
        double pv = result.poreVolumes(); // NaN when not reachable
        double duration = pv * onePoreVolume / in.darcyFluxMetresPerDay();
        OptionalDouble water = areaSquareMetres.isPresent()
                ? OptionalDouble.of(pv * onePoreVolume * areaSquareMetres.getAsDouble())
                : OptionalDouble.empty();
        return new FlushingEstimate(in, t, criterion, model.name(), targetFraction, result, wellMixed, plug, duration,
                water, onePoreVolume);
    }
}
