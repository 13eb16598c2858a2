package eluvia.transport;

/**
 * Published formulas for the transport properties of a soil layer.
 *
 * <ul>
 * <li>Retardation factor R = 1 + rho_b Kd / theta (linear equilibrium sorption), with rho_b in
 * kg/L (kg/m3 / 1000) and Kd in L/kg, dimensionless.</li>
 * <li>Tortuosity factor tau = theta^(7/3) / n^2 (Millington and Quirk 1961, Trans. Faraday Soc.
 * 57:1200), dimensionless; the effective diffusion coefficient in the pore water is tau D0.</li>
 * <li>Kd = Koc foc (Karickhoff, Brown and Scott 1979, Water Res. 13:241), Koc in L/kg.</li>
 * <li>Hydrodynamic dispersion D = alpha_L v + tau D0 (mechanical dispersion plus diffusion),
 * in m2/day, with D0 given in m2/s as tabulated (86,400 s per day).</li>
 * </ul>
 */
public final class TransportProperties {
    /** Seconds per day, to turn a tabulated diffusion coefficient in m2/s into m2/day. */
    public static final double SECONDS_PER_DAY = 86_400;

    private TransportProperties() {
    }

    /**
     * Retardation factor R = 1 + rho_b Kd / theta (dimensionless).
     *
     * @param bulkDensityKgPerCubicMetre dry bulk density, kg/m3, greater than 0
     * @param kdLitresPerKg distribution coefficient, L/kg, 0 or more
     * @param waterContent volumetric water content, dimensionless, in (0, 1)
     */
    public static double retardation(double bulkDensityKgPerCubicMetre, double kdLitresPerKg, double waterContent) {
        TransportInputException.requirePositive("dry bulk density (kg/m3)", bulkDensityKgPerCubicMetre);
        TransportInputException.requireNonNegative("Kd (L/kg)", kdLitresPerKg);
        TransportInputException.requireOpenInterval("water content (-)", waterContent, 0, 1);
        return 1 + bulkDensityKgPerCubicMetre / 1000 * kdLitresPerKg / waterContent;
    }

    /**
     * Millington-Quirk tortuosity factor theta^(7/3) / n^2 (dimensionless, at most 1).
     *
     * @param waterContent volumetric water content, dimensionless, in (0, porosity]
     * @param porosity porosity, dimensionless, in (0, 1)
     */
    public static double millingtonQuirkTortuosity(double waterContent, double porosity) {
        TransportInputException.requireOpenInterval("porosity (-)", porosity, 0, 1);
        if (!(waterContent > 0 && waterContent <= porosity)) {
            throw new TransportInputException("water content (-)", waterContent,
                    "greater than 0 and at most the porosity " + porosity);
        }
        return Math.pow(waterContent, 7.0 / 3.0) / (porosity * porosity);
    }

    /**
     * Kd = Koc foc (Karickhoff et al. 1979), in L/kg.
     *
     * @param kocLitresPerKg organic-carbon partition coefficient, L/kg, 0 or more
     * @param organicCarbonFraction mass fraction of organic carbon in the soil, dimensionless, in [0, 1]
     */
    public static double kdFromKoc(double kocLitresPerKg, double organicCarbonFraction) {
        TransportInputException.requireNonNegative("Koc (L/kg)", kocLitresPerKg);
        if (!(organicCarbonFraction >= 0 && organicCarbonFraction <= 1)) {
            throw new TransportInputException("organic carbon fraction (-)", organicCarbonFraction,
                    "0 to 1 (a mass fraction: 0.2 % is 0.002)");
        }
        return kocLitresPerKg * organicCarbonFraction;
    }

    /**
     * Hydrodynamic dispersion coefficient D = alpha_L v + tau D0, in m2/day.
     *
     * @param dispersivityMetres longitudinal dispersivity, m, 0 or more
     * @param poreWaterVelocityMetresPerDay pore-water velocity, m/day, 0 or more
     * @param tortuosity tortuosity factor, dimensionless, in [0, 1]
     * @param diffusionSquareMetresPerSecond free-water diffusion coefficient, m2/s, 0 or more
     */
    public static double dispersionSquareMetresPerDay(double dispersivityMetres, double poreWaterVelocityMetresPerDay,
            double tortuosity, double diffusionSquareMetresPerSecond) {
        TransportInputException.requireNonNegative("dispersivity (m)", dispersivityMetres);
        TransportInputException.requireNonNegative("pore-water velocity (m/day)", poreWaterVelocityMetresPerDay);
        if (!(tortuosity >= 0 && tortuosity <= 1)) {
            throw new TransportInputException("tortuosity (-)", tortuosity, "0 to 1");
        }
        TransportInputException.requireNonNegative("diffusion coefficient (m2/s)", diffusionSquareMetresPerSecond);
        return dispersivityMetres * poreWaterVelocityMetresPerDay
                + tortuosity * diffusionSquareMetresPerSecond * SECONDS_PER_DAY;
    }
}
