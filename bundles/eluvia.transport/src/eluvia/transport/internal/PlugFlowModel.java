package eluvia.transport.internal;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;

/**
 * Piston displacement: the clean-water front moves 1/R layer thicknesses per pore volume and
 * reaches the outlet at T = R; ahead of it the layer keeps its initial concentration (times the
 * decay factor exp(-k T)), behind it the layer is clean. Effluent and maximum are exp(-k T)
 * until T = R and 0 from then on; the mean is (1 - T/R) exp(-k T).
 */
public record PlugFlowModel(double retardation, double decayPerPoreVolume) implements FlushingModel {
    @Override
    public String name() {
        return "plug-flow";
    }

    @Override
    public String description() {
        return "plug flow (piston displacement, no dispersion): the front reaches the outlet after R = "
                + retardation + " pore volumes";
    }

    @Override
    public double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        ModelChecks.check(criterion, poreVolumes);
        double decay = Math.exp(-decayPerPoreVolume * poreVolumes);
        double front = poreVolumes / retardation;
        if (front >= 1) {
            return 0;
        }
        return criterion == CleanupCriterion.MEAN_RESIDUAL ? (1 - front) * decay : decay;
    }

    @Override
    public double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        double r = criterion == CleanupCriterion.MEAN_RESIDUAL ? retardation * (1 - targetFraction) : retardation;
        return decayPerPoreVolume > 0 ? Math.min(r, -Math.log(targetFraction) / decayPerPoreVolume) : r;
    }
}
