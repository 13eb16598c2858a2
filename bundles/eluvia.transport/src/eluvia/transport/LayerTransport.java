package eluvia.transport;

/**
 * Transport properties of a flushed layer derived from its {@link LayerFlushingInput}, and the
 * dimensionless groups the solutions depend on.
 *
 * <p>Pore volumes T = q t / (theta L) are the time variable of every solution; without decay a
 * solution depends on T / R only (van Genuchten and Alves 1982).
 *
 * @param retardation retardation factor R = 1 + rho_b Kd / theta, dimensionless, &ge; 1
 * @param poreWaterVelocityMetresPerDay v = q / theta, m/day
 * @param tortuosity Millington-Quirk factor theta^(7/3) / n^2, dimensionless
 * @param dispersionSquareMetresPerDay D = alpha_L v + tau D0, m2/day
 * @param peclet Peclet number of the layer P = v L / D, dimensionless; positive infinity when D = 0
 * @param decayPerPoreVolume decay rate times the time one pore volume takes, decayPerDay theta L / q,
 *        dimensionless; the remaining fraction carries the factor exp(-decayPerPoreVolume T)
 */
public record LayerTransport(double retardation, double poreWaterVelocityMetresPerDay, double tortuosity,
        double dispersionSquareMetresPerDay, double peclet, double decayPerPoreVolume) {

    public LayerTransport {
        if (!(retardation >= 1) || Double.isInfinite(retardation)) {
            throw new TransportInputException("retardation factor (-)", retardation, "1 or more and finite");
        }
        TransportInputException.requirePositive("pore-water velocity (m/day)", poreWaterVelocityMetresPerDay);
        if (!(tortuosity >= 0 && tortuosity <= 1)) {
            throw new TransportInputException("tortuosity (-)", tortuosity, "0 to 1");
        }
        TransportInputException.requireNonNegative("dispersion coefficient (m2/day)", dispersionSquareMetresPerDay);
        if (!(peclet > 0)) {
            throw new TransportInputException("Peclet number (-)", peclet, "greater than 0 (infinite without dispersion)");
        }
        TransportInputException.requireNonNegative("decay per pore volume (-)", decayPerPoreVolume);
    }

    /** Derives the transport properties of a layer with the formulas of {@link TransportProperties}. */
    public static LayerTransport of(LayerFlushingInput in) {
        double theta = in.waterContent();
        double r = TransportProperties.retardation(in.bulkDensityKgPerCubicMetre(), in.kdLitresPerKg(), theta);
        double v = in.darcyFluxMetresPerDay() / theta;
        double tau = TransportProperties.millingtonQuirkTortuosity(theta, in.porosity());
        double d = TransportProperties.dispersionSquareMetresPerDay(in.dispersivityMetres(), v, tau,
                in.diffusionSquareMetresPerSecond());
        double p = d == 0 ? Double.POSITIVE_INFINITY : v * in.thicknessMetres() / d;
        double k = in.decayPerDay() * in.thicknessMetres() * theta / in.darcyFluxMetresPerDay();
        return new LayerTransport(r, v, tau, d, p, k);
    }
}
