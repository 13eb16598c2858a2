package eluvia.transport.internal;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;

/**
 * Well-mixed ("batch flush") layer: C/C0 = exp(-(1/R + k) T) for every criterion, k the decay per
 * pore volume (US EPA pump-and-treat guidance; Zheng, Bennett and Andrews 1991).
 */
public record WellMixedModel(double retardation, double decayPerPoreVolume) implements FlushingModel {
    @Override
    public String name() {
        return "well-mixed";
    }

    @Override
    public String description() {
        return "well-mixed layer (batch flush), C/C0 = exp(-T/R" + (decayPerPoreVolume > 0 ? " - k T" : "")
                + "), R = " + retardation + " (US EPA pump-and-treat guidance; Zheng, Bennett and Andrews 1991)";
    }

    @Override
    public double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        ModelChecks.check(criterion, poreVolumes);
        return Math.exp(-(1 / retardation + decayPerPoreVolume) * poreVolumes);
    }

    @Override
    public double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        return -Math.log(targetFraction) / (1 / retardation + decayPerPoreVolume);
    }
}
