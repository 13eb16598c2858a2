package eluvia.transport;

import eluvia.transport.internal.ProfileMaximum;
import eluvia.transport.internal.TwoRegionModel;
import eluvia.transport.internal.TwoRegionSolution;

/**
 * What the pore water returns to if flushing stops as soon as the effluent first meets the
 * target, for two-region or two-site nonequilibrium ({@link FlushingModels#twoRegion}).
 *
 * <p>After flushing stops the mobile water and the immobile region (or the kinetic sites)
 * re-equilibrate in place. With no flow the local total is conserved, so the water returns to the
 * local total concentration beta c1 + (1 - beta) c2 (a mass-balance equilibrium; all values are
 * fractions of the initial concentration, dimensionless). Decay after the stop is ignored (the
 * rebound is not reduced by it), which is the conservative side.
 *
 * @param targetFraction the target, fraction of the initial concentration
 * @param effluentResult the pore-volume search on the effluent criterion
 * @param reboundAtOutletFraction the water concentration after rebound at the outlet; NaN if not reachable
 * @param reboundMeanFraction the layer mean after rebound (equal to the mean residual of the soil); NaN if not reachable
 * @param reboundMaxFraction the largest value after rebound anywhere in the layer (the maximum residual); NaN if not reachable
 * @param waterMeetsButSoilDoesNot warning: the effluent meets the target but the soil (the maximum
 *        residual, mobile plus immobile) does not, so concentrations will rebound above the target
 */
public record ReboundEstimate(double targetFraction, PoreVolumeResult effluentResult, double reboundAtOutletFraction,
        double reboundMeanFraction, double reboundMaxFraction, boolean waterMeetsButSoilDoesNot) {

    /**
     * Relative excess of the soil's maximum over the target below which the warning is not given:
     * the search stops within 1e-10 of the crossing, and an excess of that size is no rebound.
     */
    public static final double SOIL_MARGIN = 1e-6;

    /**
     * @param t the layer's transport properties (R, P, decay per pore volume)
     * @param parameters beta and omega
     * @param targetFraction the effluent target, between 0 and 1 (both excluded)
     * @param maxPoreVolumes the search limit, pore volumes
     */
    public static ReboundEstimate afterEffluentMeetsTarget(LayerTransport t, TwoRegionParameters parameters,
            double targetFraction, double maxPoreVolumes) {
        if (t == null || parameters == null) {
            throw new TransportInputException(t == null ? "transport properties" : "two-region parameters", null,
                    "given");
        }
        TwoRegionModel model = (TwoRegionModel) FlushingModels.twoRegion(t, parameters);
        PoreVolumeResult eff = PoreVolumeSearch.solve(model, CleanupCriterion.EFFLUENT, targetFraction, maxPoreVolumes);
        if (!eff.reachable()) {
            return new ReboundEstimate(targetFraction, eff, Double.NaN, Double.NaN, Double.NaN, false);
        }
        double decay = Math.exp(-t.decayPerPoreVolume() * eff.poreVolumes());
        TwoRegionSolution s = model.solution();
        TwoRegionSolution.Profile profile = s.profile(eff.poreVolumes());
        double outlet = profile.total(1) * decay;
        double mean = s.meanTotal(eff.poreVolumes()) * decay;
        double max = ProfileMaximum.of(profile::total).value() * decay;
        return new ReboundEstimate(targetFraction, eff, outlet, mean, max, max > targetFraction * (1 + SOIL_MARGIN));
    }

    /** Plain words for a report. */
    public String describe() {
        if (!effluentResult.reachable()) {
            return effluentResult.describe();
        }
        String s = effluentResult.describe() + "; if flushing stops then, the water returns to "
                + String.format(java.util.Locale.ROOT, "%.3g", reboundAtOutletFraction)
                + " of the initial concentration at the outlet and up to "
                + String.format(java.util.Locale.ROOT, "%.3g", reboundMaxFraction) + " in the layer";
        return waterMeetsButSoilDoesNot ? s + ": the water meets the target but the soil does not" : s;
    }
}
