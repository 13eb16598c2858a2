package eluvia.transport;

import eluvia.transport.internal.FiniteLayerModel;
import eluvia.transport.internal.PlugFlowModel;
import eluvia.transport.internal.TwoRegionModel;
import eluvia.transport.internal.WellMixedModel;

/**
 * Factories of the equilibrium flushing solutions for one layer (retardation R, Peclet number P
 * and decay per pore volume k from {@link LayerTransport}). All three assume linear equilibrium
 * sorption, a layer initially at a uniform concentration and clean inflow.
 */
public final class FlushingModels {
    private FlushingModels() {
    }

    /**
     * Exact finite-layer solution: flux (third-type) inlet, zero-gradient outlet, layer initially
     * at Ci, clean inflow; the Brenner (1962) series in the initial-value form of van Genuchten and
     * Alves (1982), with the semi-infinite flux-inlet solution (Lindstrom et al. 1967) plus one
     * outlet reflection at early times and large P; the maximum residual is the outlet value (by
     * the maximum principle the profile never falls with depth; the tests check it against a
     * profile search). Decay multiplies every criterion by exp(-k T). Falls back to plug flow when the
     * Peclet number is infinite (no dispersion).
     */
    public static FlushingModel finiteLayer(LayerTransport t) {
        if (Double.isInfinite(t.peclet())) {
            return plugFlow(t);
        }
        return new FiniteLayerModel(t.retardation(), t.peclet(), t.decayPerPoreVolume());
    }

    /**
     * Well-mixed layer (batch flush): C/C0 = exp(-T/R), with decay exp(-(1/R + k) T), the same for
     * every criterion; the P &rarr; 0 limit of the finite layer (US EPA pump-and-treat guidance).
     */
    public static FlushingModel wellMixed(LayerTransport t) {
        return new WellMixedModel(t.retardation(), t.decayPerPoreVolume());
    }

    /** Piston displacement: the front moves 1/R layer thicknesses per pore volume; the P &rarr; infinity limit. */
    public static FlushingModel plugFlow(LayerTransport t) {
        return new PlugFlowModel(t.retardation(), t.decayPerPoreVolume());
    }

    /**
     * Two-region (mobile-immobile) or two-site nonequilibrium in a finite layer with a flux inlet
     * and a zero-gradient outlet, both regions initially at Ci, clean inflow (van Genuchten and
     * Wierenga 1976; Nkedi-Kizza et al. 1984), exact in the Laplace domain and inverted numerically
     * by de Hoog, Knight and Stokes (1982), absolute accuracy about 1e-10 of the initial
     * concentration. Effluent: the mobile water leaving the outlet. Mean and maximum residual: the
     * soil total, mobile plus immobile water and sorbed phase, over its initial value. Decay
     * multiplies every criterion by exp(-k T) (one rate everywhere).
     *
     * @param beta fraction of the retardation in equilibrium with the flowing water, 0 &lt; beta &le; 1
     * @param omega dimensionless mass-transfer coefficient, 0 or more
     * @throws TransportInputException if the Peclet number is infinite (give a dispersivity) or beta, omega are out of range
     */
    public static FlushingModel twoRegion(LayerTransport t, double beta, double omega) {
        return twoRegion(t, new TwoRegionParameters(beta, omega));
    }

    /** {@link #twoRegion(LayerTransport, double, double)} with the parameters as a record. */
    public static FlushingModel twoRegion(LayerTransport t, TwoRegionParameters parameters) {
        if (Double.isInfinite(t.peclet())) {
            throw new TransportInputException("Peclet number (-)", t.peclet(),
                    "finite for the two-region solution: give a dispersivity or a diffusion coefficient");
        }
        return new TwoRegionModel(t.retardation(), t.peclet(), t.decayPerPoreVolume(), parameters.beta(),
                parameters.omega());
    }
}
