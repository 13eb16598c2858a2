package eluvia.transport;

/**
 * Dimensionless parameters of two-region (mobile-immobile water) or two-site (equilibrium and
 * kinetic sorption sites) nonequilibrium transport (van Genuchten and Wierenga 1976, Soil Sci.
 * Soc. Am. J. 40:473; Nkedi-Kizza et al. 1984, Water Resour. Res. 20:1123).
 *
 * <p>Physical nonequilibrium: beta = (theta_m + f rho_b Kd) / (theta + rho_b Kd), omega =
 * alpha L / q, with theta_m the mobile water content, f the fraction of sorption sites in contact
 * with mobile water and alpha the first-order mass-transfer coefficient (1/day) between the
 * regions. Chemical nonequilibrium: beta = (1 + F rho_b Kd / theta) / R, omega =
 * k (1 - beta) R L / v, with F the fraction of equilibrium sites and k the first-order rate
 * (1/day) of the kinetic sites. rho_b is in kg/L (kg/m3 / 1000), Kd in L/kg.
 *
 * @param beta fraction of the retardation capacity that is in equilibrium with the flowing
 *        water, dimensionless, 0 &lt; beta &le; 1 (1: equilibrium)
 * @param omega dimensionless mass-transfer (Damkoehler) number, 0 or more (0: no exchange)
 */
public record TwoRegionParameters(double beta, double omega) {

    public TwoRegionParameters {
        if (!(beta > 0 && beta <= 1)) {
            throw new TransportInputException("beta (-)", beta, "greater than 0 and at most 1");
        }
        TransportInputException.requireNonNegative("omega (-)", omega);
    }

    /**
     * Physical (mobile-immobile) nonequilibrium from measurable quantities.
     *
     * @param in the layer (theta, rho_b, Kd, q and L are used)
     * @param mobileWaterFraction theta_m / theta, dimensionless, greater than 0 and at most 1
     * @param mobileSiteFraction f, fraction of sorption sites in contact with mobile water, 0 to 1
     * @param massTransferPerDay alpha, mass-transfer coefficient between the regions, 1/day, 0 or more
     */
    public static TwoRegionParameters physical(LayerFlushingInput in, double mobileWaterFraction,
            double mobileSiteFraction, double massTransferPerDay) {
        if (!(mobileWaterFraction > 0 && mobileWaterFraction <= 1)) {
            throw new TransportInputException("mobile water fraction theta_m/theta (-)", mobileWaterFraction,
                    "greater than 0 and at most 1");
        }
        if (!(mobileSiteFraction >= 0 && mobileSiteFraction <= 1)) {
            throw new TransportInputException("mobile sorption-site fraction f (-)", mobileSiteFraction, "0 to 1");
        }
        TransportInputException.requireNonNegative("mass-transfer coefficient alpha (1/day)", massTransferPerDay);
        double theta = in.waterContent();
        double sorption = in.bulkDensityKgPerCubicMetre() / 1000 * in.kdLitresPerKg();
        double beta = (mobileWaterFraction * theta + mobileSiteFraction * sorption) / (theta + sorption);
        double omega = massTransferPerDay * in.thicknessMetres() / in.darcyFluxMetresPerDay();
        return new TwoRegionParameters(beta, omega);
    }

    /**
     * Chemical (two-site) nonequilibrium from measurable quantities.
     *
     * @param in the layer (theta, rho_b, Kd, q and L are used)
     * @param equilibriumSiteFraction F, fraction of sorption sites at equilibrium, 0 to 1
     * @param kineticRatePerDay k, first-order rate of the kinetic sites, 1/day, 0 or more
     */
    public static TwoRegionParameters chemical(LayerFlushingInput in, double equilibriumSiteFraction,
            double kineticRatePerDay) {
        if (!(equilibriumSiteFraction >= 0 && equilibriumSiteFraction <= 1)) {
            throw new TransportInputException("equilibrium site fraction F (-)", equilibriumSiteFraction, "0 to 1");
        }
        TransportInputException.requireNonNegative("kinetic rate k (1/day)", kineticRatePerDay);
        double theta = in.waterContent();
        double sorptionOverTheta = in.bulkDensityKgPerCubicMetre() / 1000 * in.kdLitresPerKg() / theta;
        double r = 1 + sorptionOverTheta;
        double beta = (1 + equilibriumSiteFraction * sorptionOverTheta) / r;
        double v = in.darcyFluxMetresPerDay() / theta;
        double omega = kineticRatePerDay * (1 - beta) * r * in.thicknessMetres() / v;
        return new TwoRegionParameters(beta, omega);
    }
}
