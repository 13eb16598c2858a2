package eluvia.transport.internal;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;

/**
 * Equilibrium flushing of a finite layer with a flux inlet and a zero-gradient outlet
 * ({@link FiniteLayerSolution}), times the decay factor exp(-k T) (decay in both phases,
 * van Genuchten and Alves 1982).
 */
public final class FiniteLayerModel implements FlushingModel {
    private final double retardation;
    private final double decayPerPoreVolume;
    private final FiniteLayerSolution solution;

    public FiniteLayerModel(double retardation, double peclet, double decayPerPoreVolume) {
        this.retardation = retardation;
        this.decayPerPoreVolume = decayPerPoreVolume;
        this.solution = new FiniteLayerSolution(peclet);
    }

    public FiniteLayerSolution solution() {
        return solution;
    }

    @Override
    public String name() {
        return "finite-layer";
    }

    @Override
    public String description() {
        return "finite layer in equilibrium, flux inlet and zero-gradient outlet, R = " + retardation + ", P = "
                + solution.peclet() + ": Brenner (1962) series in the initial-value form of van Genuchten and"
                + " Alves (1982); early times and large P by the semi-infinite flux-inlet solution of Lindstrom"
                + " et al. (1967) with one outlet reflection (P >= " + FiniteLayerSolution.IMAGE_FORM_PECLET_PER_TAU
                + " T/R)";
    }

    @Override
    public double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        ModelChecks.check(criterion, poreVolumes);
        double tau = poreVolumes / retardation;
        double value = switch (criterion) {
            case EFFLUENT -> solution.effluent(tau);
            case MEAN_RESIDUAL -> solution.mean(tau);
            case MAX_RESIDUAL -> solution.maximum(tau);
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
