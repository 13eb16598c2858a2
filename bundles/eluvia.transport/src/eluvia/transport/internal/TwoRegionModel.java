package eluvia.transport.internal;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;

/**
 * Flushing model of {@link TwoRegionSolution}, times the decay factor exp(-k T) (decay at one
 * rate in every phase and region). Effluent: mobile water at the outlet; mean and maximum: the
 * local total, mobile plus immobile.
 */
public final class TwoRegionModel implements FlushingModel {
    private final double retardation;
    private final double peclet;
    private final double decayPerPoreVolume;
    private final TwoRegionSolution solution;

    public TwoRegionModel(double retardation, double peclet, double decayPerPoreVolume, double beta, double omega) {
        this.retardation = retardation;
        this.peclet = peclet;
        this.decayPerPoreVolume = decayPerPoreVolume;
        this.solution = new TwoRegionSolution(retardation, peclet, beta, omega);
    }

    public TwoRegionSolution solution() {
        return solution;
    }

    @Override
    public String name() {
        return "two-region";
    }

    @Override
    public String description() {
        return "finite layer with two-region (mobile-immobile) or two-site nonequilibrium, R = " + retardation
                + ", P = " + peclet + ", beta = " + solution.beta() + ", omega = " + solution.omega()
                + " (van Genuchten and Wierenga 1976; Nkedi-Kizza et al. 1984), exact in the Laplace domain,"
                + " inverted by de Hoog, Knight and Stokes (1982); soil criteria on mobile plus immobile total";
    }

    @Override
    public double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        ModelChecks.check(criterion, poreVolumes);
        if (poreVolumes == 0) {
            return 1;
        }
        double value = switch (criterion) {
            case EFFLUENT -> solution.effluent(poreVolumes);
            case MEAN_RESIDUAL -> solution.meanTotal(poreVolumes);
            case MAX_RESIDUAL -> solution.maximumTotal(poreVolumes).value();
        };
        value = Math.min(1, Math.max(0, value));
        return decayPerPoreVolume > 0 ? value * Math.exp(-decayPerPoreVolume * poreVolumes) : value;
    }

    @Override
    public double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        double plug = new PlugFlowModel(retardation, decayPerPoreVolume).poreVolumeGuess(criterion, targetFraction);
        double mixed = new WellMixedModel(retardation, decayPerPoreVolume).poreVolumeGuess(criterion, targetFraction);
        return Math.sqrt(plug * mixed);
    }
}
