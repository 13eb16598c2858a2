package eluvia.transport.numerical;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import eluvia.transport.TransportInputException;

/**
 * A vertical soil profile flushed from the top: its layers (top first), the steady downward Darcy
 * flux, the concentration of the water applied at the top, and the contamination at the start.
 *
 * <p>Flow is steady and uniform with depth (saturated, or unsaturated at unit gradient), so the
 * same Darcy flux q (m/day) crosses every layer. The top boundary is a flux (third-type) inlet,
 * q C_in = q C - theta_m D_m dC/dz (Danckwerts); the bottom of the lowest layer is a zero-gradient
 * outlet, where the effluent is the flux-averaged concentration leaving the profile. One pore
 * volume is the water held in the whole profile, the sum of theta L over the layers.
 */
public final class FlushingColumn {
    /** Largest Darcy flux accepted, m/day (10 m/day is far beyond any flushing rate). */
    public static final double MAXIMUM_DARCY_FLUX_METRES_PER_DAY = 100;

    private final List<SoilLayer> layers;
    private final double darcyFluxMetresPerDay;
    private final double inflowMilligramsPerLitre;
    private final InitialCondition initialCondition;

    /**
     * @param layers the layers, top first (at least one)
     * @param darcyFluxMetresPerDay downward Darcy flux q, m/day, greater than 0
     * @param inflowMilligramsPerLitre concentration of the applied water, mg/L (0 = clean water)
     * @param initialCondition the contamination at the start
     */
    public FlushingColumn(List<SoilLayer> layers, double darcyFluxMetresPerDay, double inflowMilligramsPerLitre,
            InitialCondition initialCondition) {
        if (layers == null || layers.isEmpty()) {
            throw new TransportInputException("number of soil layers", layers == null ? 0 : layers.size(),
                    "at least 1");
        }
        for (int i = 0; i < layers.size(); i++) {
            if (layers.get(i) == null) {
                throw new TransportInputException("soil layer [" + i + "]", null, "a layer");
            }
        }
        if (!(darcyFluxMetresPerDay > 0 && darcyFluxMetresPerDay <= MAXIMUM_DARCY_FLUX_METRES_PER_DAY)) {
            throw new TransportInputException("Darcy flux (m/day)", darcyFluxMetresPerDay,
                    "greater than 0 and at most " + MAXIMUM_DARCY_FLUX_METRES_PER_DAY + " (give it per day)");
        }
        TransportInputException.requireNonNegative("inflow concentration (mg/L)", inflowMilligramsPerLitre);
        if (initialCondition == null) {
            throw new TransportInputException("initial condition", null, "pore water per cell or per layer, or soil per layer");
        }
        if (initialCondition.kind() != InitialCondition.Kind.PORE_WATER_PER_CELL
                && initialCondition.size() != layers.size()) {
            throw new TransportInputException("number of initial concentrations", initialCondition.size(),
                    "exactly one per layer (" + layers.size() + ")");
        }
        this.layers = Collections.unmodifiableList(new ArrayList<>(layers));
        this.darcyFluxMetresPerDay = darcyFluxMetresPerDay;
        this.inflowMilligramsPerLitre = inflowMilligramsPerLitre;
        this.initialCondition = initialCondition;
    }

    /** A single-layer column. */
    public static FlushingColumn singleLayer(SoilLayer layer, double darcyFluxMetresPerDay,
            double inflowMilligramsPerLitre, InitialCondition initialCondition) {
        return new FlushingColumn(List.of(layer), darcyFluxMetresPerDay, inflowMilligramsPerLitre, initialCondition);
    }

    /** The layers, top first (unmodifiable). */
    public List<SoilLayer> layers() {
        return layers;
    }

    /** Darcy flux q, m/day. */
    public double darcyFluxMetresPerDay() {
        return darcyFluxMetresPerDay;
    }

    /** Concentration of the applied water, mg/L. */
    public double inflowMilligramsPerLitre() {
        return inflowMilligramsPerLitre;
    }

    /** The contamination at the start. */
    public InitialCondition initialCondition() {
        return initialCondition;
    }

    /** Total thickness of the profile, m. */
    public double thicknessMetres() {
        double sum = 0;
        for (SoilLayer l : layers) {
            sum += l.thicknessMetres();
        }
        return sum;
    }

    /** Water held in the profile per unit plan area (one pore volume), m3/m2 = m. */
    public double poreVolumeMetres() {
        double sum = 0;
        for (SoilLayer l : layers) {
            sum += l.waterContent() * l.thicknessMetres();
        }
        return sum;
    }

    /** Days needed to pass {@code poreVolumes} pore volumes (dimensionless) through the profile. */
    public double daysForPoreVolumes(double poreVolumes) {
        return poreVolumes * poreVolumeMetres() / darcyFluxMetresPerDay;
    }

    /** Pore volumes (dimensionless) passed after {@code days} days. */
    public double poreVolumesAfterDays(double days) {
        return days * darcyFluxMetresPerDay / poreVolumeMetres();
    }
}
