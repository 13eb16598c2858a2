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
 *
 * <p>The inverses read the dimensionless numbers fitted to a column test back as soil
 * properties with the column's own conditions: Kd = (R - 1) theta / rho_b from the retardation
 * factor, and alpha_L = (v L / P - tau D0) / v from the Peclet number P = v L / D (alpha_L = L / P
 * when mechanical dispersion dominates diffusion).
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

    /**
     * Pore-water velocity v = q / theta, in m/day.
     *
     * @param darcyFluxMetresPerDay Darcy flux (specific discharge), m/day, greater than 0
     * @param waterContent volumetric water content, dimensionless, in (0, 1)
     */
    public static double poreWaterVelocityMetresPerDay(double darcyFluxMetresPerDay, double waterContent) {
        TransportInputException.requirePositive("Darcy flux (m/day)", darcyFluxMetresPerDay);
        TransportInputException.requireOpenInterval("water content (-)", waterContent, 0, 1);
        return darcyFluxMetresPerDay / waterContent;
    }

    /**
     * Kd from a retardation factor: the inverse of {@link #retardation}, Kd = (R - 1) theta / rho_b
     * in L/kg (rho_b in kg/L).
     *
     * @param retardation retardation factor, dimensionless, 1 or more and finite
     * @param bulkDensityKgPerCubicMetre dry bulk density, kg/m3, greater than 0
     * @param waterContent volumetric water content, dimensionless, in (0, 1)
     */
    public static double kdFromRetardationLitresPerKg(double retardation, double bulkDensityKgPerCubicMetre,
            double waterContent) {
        if (!(retardation >= 1) || Double.isInfinite(retardation)) {
            throw new TransportInputException("retardation factor (-)", retardation,
                    "1 or more and finite (R = 1 + rho_b Kd / theta is never below 1)");
        }
        TransportInputException.requirePositive("dry bulk density (kg/m3)", bulkDensityKgPerCubicMetre);
        TransportInputException.requireOpenInterval("water content (-)", waterContent, 0, 1);
        return (retardation - 1) * waterContent / (bulkDensityKgPerCubicMetre / 1000);
    }

    /**
     * Longitudinal dispersivity from the Peclet number of a column or layer when mechanical
     * dispersion dominates diffusion (D = alpha_L v): alpha_L = L / P, in m. Where diffusion is not
     * negligible use {@link #dispersivityFromPecletMetres(double, double, double, double, double)}.
     *
     * @param peclet Peclet number P = v L / D, dimensionless, greater than 0 and finite
     * @param lengthMetres length of the column or thickness of the layer, m, greater than 0
     */
    public static double dispersivityFromPecletMetres(double peclet, double lengthMetres) {
        TransportInputException.requirePositive("Peclet number (-)", peclet);
        TransportInputException.requirePositive("length (m)", lengthMetres);
        return lengthMetres / peclet;
    }

    /**
     * Longitudinal dispersivity from the Peclet number with the diffusion part taken out: the
     * inverse of {@link #dispersionSquareMetresPerDay} with D = v L / P, so
     * alpha_L = (v L / P - tau D0) / v, in m.
     *
     * <p>A Peclet number above {@link #diffusionOnlyPeclet} means less spreading than diffusion
     * alone gives: no dispersivity of 0 or more reproduces it, so the column does not determine
     * one beyond diffusion, and this method throws. A mechanical part between -1e-12 tau D0 and 0
     * (rounding of a P equal to that limit) is returned as a dispersivity of 0.
     *
     * @param peclet Peclet number P = v L / D, dimensionless, greater than 0 and at most
     *        {@link #diffusionOnlyPeclet}
     * @param lengthMetres length of the column or thickness of the layer, m, greater than 0
     * @param poreWaterVelocityMetresPerDay pore-water velocity, m/day, greater than 0
     * @param tortuosity tortuosity factor, dimensionless, in [0, 1]
     * @param diffusionSquareMetresPerSecond free-water diffusion coefficient, m2/s, 0 or more
     * @throws TransportInputException for an input outside its range, naming it (a Peclet number
     *         above the diffusion-only one included)
     */
    public static double dispersivityFromPecletMetres(double peclet, double lengthMetres,
            double poreWaterVelocityMetresPerDay, double tortuosity, double diffusionSquareMetresPerSecond) {
        double limit = diffusionOnlyPeclet(lengthMetres, poreWaterVelocityMetresPerDay, tortuosity,
                diffusionSquareMetresPerSecond);
        TransportInputException.requirePositive("Peclet number (-)", peclet);
        double dispersion = poreWaterVelocityMetresPerDay * lengthMetres / peclet;
        double diffusion = tortuosity * diffusionSquareMetresPerSecond * SECONDS_PER_DAY;
        double mechanical = dispersion - diffusion;
        if (mechanical < -1e-12 * diffusion) {
            throw new TransportInputException("Peclet number (-)", peclet, "greater than 0 and at most " + limit
                    + ", the Peclet number v L / (tau D0) of diffusion alone; a larger one means less spreading"
                    + " than diffusion gives, so no dispersivity beyond diffusion is determined");
        }
        return Math.max(0, mechanical) / poreWaterVelocityMetresPerDay;
    }

    /**
     * The Peclet number v L / (tau D0) that diffusion alone gives (dispersivity 0), dimensionless;
     * positive infinity when tau D0 = 0. The largest Peclet number a dispersivity of 0 or more
     * can produce.
     *
     * @param lengthMetres length of the column or thickness of the layer, m, greater than 0
     * @param poreWaterVelocityMetresPerDay pore-water velocity, m/day, greater than 0
     * @param tortuosity tortuosity factor, dimensionless, in [0, 1]
     * @param diffusionSquareMetresPerSecond free-water diffusion coefficient, m2/s, 0 or more
     */
    public static double diffusionOnlyPeclet(double lengthMetres, double poreWaterVelocityMetresPerDay,
            double tortuosity, double diffusionSquareMetresPerSecond) {
        TransportInputException.requirePositive("length (m)", lengthMetres);
        TransportInputException.requirePositive("pore-water velocity (m/day)", poreWaterVelocityMetresPerDay);
        if (!(tortuosity >= 0 && tortuosity <= 1)) {
            throw new TransportInputException("tortuosity (-)", tortuosity, "0 to 1");
        }
        TransportInputException.requireNonNegative("diffusion coefficient (m2/s)", diffusionSquareMetresPerSecond);
        double diffusion = tortuosity * diffusionSquareMetresPerSecond * SECONDS_PER_DAY;
        return diffusion == 0 ? Double.POSITIVE_INFINITY : poreWaterVelocityMetresPerDay * lengthMetres / diffusion;
    }
}
