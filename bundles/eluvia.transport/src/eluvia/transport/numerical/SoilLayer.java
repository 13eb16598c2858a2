package eluvia.transport.numerical;

import java.util.Objects;

import eluvia.transport.TransportInputException;

/**
 * One soil layer of a vertical flushing profile, with everything the numerical solver needs.
 *
 * <p>Units: thickness and dispersivity in m, bulk density in kg/m<sup>3</sup> (dry soil per bulk
 * volume), free-water diffusion coefficient in m<sup>2</sup>/s, decay rates and the mass-transfer
 * rate in 1/day. Water content, porosity, mobile water fraction and sorbing-site fraction are
 * dimensionless volume or site fractions.
 *
 * <p>Dispersion follows D = alpha_L v + tau D0, with the tortuosity tau = theta<sup>7/3</sup> /
 * n<sup>2</sup> of Millington and Quirk (1961). With a two-region layer (van Genuchten and Wierenga
 * 1976) the water is split into a mobile part theta_m = phi theta, which carries the flow
 * (v_m = q / theta_m), and an immobile part theta_im = (1 - phi) theta that exchanges solute with
 * the mobile part at the first-order rate alpha (1/day): theta_im dC_im/dt + (1 - f) rho_b
 * dS_im/dt = alpha (C_m - C_im). The fraction f of the sorbing sites is in contact with the mobile
 * water. With phi = 1 and f &lt; 1 the same equations describe two-site (chemical)
 * non-equilibrium sorption, with alpha the site exchange rate. With phi = 1 and f = 1 (the
 * defaults) the layer is in local equilibrium.
 *
 * <p>Decay is first order, at one rate in the dissolved phase and another on the solids, in both
 * regions.
 */
public final class SoilLayer {
    /** Largest bulk density accepted, kg/m3 (denser than any soil). */
    public static final double MAXIMUM_BULK_DENSITY_KILOGRAMS_PER_CUBIC_METRE = 3000;
    /** Smallest bulk density accepted, kg/m3 (lighter than any peat; catches g/cm3 given as kg/m3). */
    public static final double MINIMUM_BULK_DENSITY_KILOGRAMS_PER_CUBIC_METRE = 100;

    private final double thicknessMetres;
    private final double waterContent;
    private final double porosity;
    private final double bulkDensityKilogramsPerCubicMetre;
    private final SorptionIsotherm isotherm;
    private final double dispersivityMetres;
    private final double freeWaterDiffusionSquareMetresPerSecond;
    private final double decayInWaterPerDay;
    private final double decayOnSolidsPerDay;
    private final double mobileWaterFraction;
    private final double mobileSorbingSiteFraction;
    private final double massTransferRatePerDay;

    private SoilLayer(Builder b) {
        thicknessMetres = TransportInputException.requirePositive("layer thickness (m)", b.thicknessMetres);
        porosity = TransportInputException.requireOpenInterval("porosity (dimensionless)", b.porosity, 0, 1);
        if (!(b.waterContent > 0 && b.waterContent <= porosity)) {
            throw new TransportInputException("volumetric water content (dimensionless)", b.waterContent,
                    "greater than 0 and at most the porosity " + porosity);
        }
        waterContent = b.waterContent;
        if (!(b.bulkDensityKilogramsPerCubicMetre >= MINIMUM_BULK_DENSITY_KILOGRAMS_PER_CUBIC_METRE
                && b.bulkDensityKilogramsPerCubicMetre <= MAXIMUM_BULK_DENSITY_KILOGRAMS_PER_CUBIC_METRE)) {
            throw new TransportInputException("dry bulk density (kg/m3)", b.bulkDensityKilogramsPerCubicMetre,
                    MINIMUM_BULK_DENSITY_KILOGRAMS_PER_CUBIC_METRE + " to " + MAXIMUM_BULK_DENSITY_KILOGRAMS_PER_CUBIC_METRE
                            + " (give it in kg/m3: 1.6 g/cm3 is 1600 kg/m3)");
        }
        bulkDensityKilogramsPerCubicMetre = b.bulkDensityKilogramsPerCubicMetre;
        if (b.isotherm == null) {
            throw new TransportInputException("sorption isotherm", null,
                    "a linear, Freundlich or Langmuir isotherm (use SorptionIsotherm.linear(0) for none)");
        }
        isotherm = b.isotherm;
        dispersivityMetres = TransportInputException.requireNonNegative("longitudinal dispersivity (m)",
                b.dispersivityMetres);
        freeWaterDiffusionSquareMetresPerSecond = TransportInputException
                .requireNonNegative("free-water diffusion coefficient (m2/s)", b.freeWaterDiffusionSquareMetresPerSecond);
        if (freeWaterDiffusionSquareMetresPerSecond > 1e-6) {
            throw new TransportInputException("free-water diffusion coefficient (m2/s)",
                    freeWaterDiffusionSquareMetresPerSecond,
                    "0 to 1e-6 m2/s (small solutes are near 1e-9 m2/s; give it per second, not per day)");
        }
        decayInWaterPerDay = TransportInputException.requireNonNegative("decay rate in water (1/day)",
                b.decayInWaterPerDay);
        decayOnSolidsPerDay = TransportInputException.requireNonNegative("decay rate on solids (1/day)",
                b.decayOnSolidsPerDay);
        if (!(b.mobileWaterFraction > 0 && b.mobileWaterFraction <= 1)) {
            throw new TransportInputException("mobile water fraction (dimensionless)", b.mobileWaterFraction,
                    "greater than 0 and at most 1 (1 = all water mobile)");
        }
        mobileWaterFraction = b.mobileWaterFraction;
        if (!(b.mobileSorbingSiteFraction >= 0 && b.mobileSorbingSiteFraction <= 1)) {
            throw new TransportInputException("fraction of sorbing sites in the mobile region (dimensionless)",
                    b.mobileSorbingSiteFraction, "0 to 1 (1 = all sites in contact with mobile water)");
        }
        mobileSorbingSiteFraction = b.mobileSorbingSiteFraction;
        massTransferRatePerDay = TransportInputException.requireNonNegative("mass-transfer rate (1/day)",
                b.massTransferRatePerDay);
    }

    /** A builder with the defaults: no sorption, no diffusion, no decay, all water mobile. */
    public static Builder builder() {
        return new Builder();
    }

    /** Layer thickness, m. */
    public double thicknessMetres() {
        return thicknessMetres;
    }

    /** Volumetric water content theta (dimensionless). */
    public double waterContent() {
        return waterContent;
    }

    /** Porosity n (dimensionless). */
    public double porosity() {
        return porosity;
    }

    /** Dry bulk density rho_b, kg/m3. */
    public double bulkDensityKilogramsPerCubicMetre() {
        return bulkDensityKilogramsPerCubicMetre;
    }

    /** The sorption isotherm. */
    public SorptionIsotherm isotherm() {
        return isotherm;
    }

    /** Longitudinal dispersivity alpha_L, m. */
    public double dispersivityMetres() {
        return dispersivityMetres;
    }

    /** Free-water diffusion coefficient D0, m2/s. */
    public double freeWaterDiffusionSquareMetresPerSecond() {
        return freeWaterDiffusionSquareMetresPerSecond;
    }

    /** First-order decay rate in the dissolved phase, 1/day. */
    public double decayInWaterPerDay() {
        return decayInWaterPerDay;
    }

    /** First-order decay rate of the sorbed phase, 1/day. */
    public double decayOnSolidsPerDay() {
        return decayOnSolidsPerDay;
    }

    /** Mobile water fraction phi = theta_m / theta (dimensionless). */
    public double mobileWaterFraction() {
        return mobileWaterFraction;
    }

    /** Fraction f of the sorbing sites in contact with the mobile water (dimensionless). */
    public double mobileSorbingSiteFraction() {
        return mobileSorbingSiteFraction;
    }

    /** First-order mass-transfer rate alpha between mobile and immobile regions, 1/day. */
    public double massTransferRatePerDay() {
        return massTransferRatePerDay;
    }

    /** Millington-Quirk tortuosity tau = theta^(7/3) / n^2 (dimensionless). */
    public double tortuosity() {
        return Math.pow(waterContent, 7.0 / 3.0) / (porosity * porosity);
    }

    /**
     * The dispersion term theta_m D_m = alpha_L q + theta_m tau D0 in m2/day at the Darcy flux
     * {@code darcyFluxMetresPerDay} (the coefficient of the concentration gradient in the
     * dispersive flux per unit bulk area).
     */
    public double dispersionTermSquareMetresPerDay(double darcyFluxMetresPerDay) {
        return dispersivityMetres * darcyFluxMetresPerDay
                + mobileWaterFraction * waterContent * tortuosity() * freeWaterDiffusionSquareMetresPerSecond * 86400.0;
    }

    /** True when the layer has an immobile region or rate-limited sites (two-region layer). */
    public boolean isTwoRegion() {
        return mobileWaterFraction < 1 || mobileSorbingSiteFraction < 1;
    }

    @Override
    public String toString() {
        return "SoilLayer[" + thicknessMetres + " m, theta " + waterContent + ", n " + porosity + ", rho_b "
                + bulkDensityKilogramsPerCubicMetre + " kg/m3, " + isotherm.describe() + ", alpha_L "
                + dispersivityMetres + " m]";
    }

    /** Collects the properties of a layer; {@link #build()} checks them all. */
    public static final class Builder {
        private double thicknessMetres = Double.NaN;
        private double waterContent = Double.NaN;
        private double porosity = Double.NaN;
        private double bulkDensityKilogramsPerCubicMetre = Double.NaN;
        private SorptionIsotherm isotherm = SorptionIsotherm.linear(0);
        private double dispersivityMetres = Double.NaN;
        private double freeWaterDiffusionSquareMetresPerSecond;
        private double decayInWaterPerDay;
        private double decayOnSolidsPerDay;
        private double mobileWaterFraction = 1;
        private double mobileSorbingSiteFraction = 1;
        private double massTransferRatePerDay;

        private Builder() {
        }

        /** Layer thickness, m (required). */
        public Builder thicknessMetres(double value) {
            thicknessMetres = value;
            return this;
        }

        /** Volumetric water content during flushing (required, dimensionless). */
        public Builder waterContent(double value) {
            waterContent = value;
            return this;
        }

        /** Porosity (required, dimensionless). */
        public Builder porosity(double value) {
            porosity = value;
            return this;
        }

        /** Dry bulk density, kg/m3 (required). */
        public Builder bulkDensityKilogramsPerCubicMetre(double value) {
            bulkDensityKilogramsPerCubicMetre = value;
            return this;
        }

        /** Sorption isotherm (default: no sorption). */
        public Builder isotherm(SorptionIsotherm value) {
            isotherm = Objects.requireNonNull(value, "isotherm");
            return this;
        }

        /** Longitudinal dispersivity, m (required). */
        public Builder dispersivityMetres(double value) {
            dispersivityMetres = value;
            return this;
        }

        /** Free-water diffusion coefficient, m2/s (default 0). */
        public Builder freeWaterDiffusionSquareMetresPerSecond(double value) {
            freeWaterDiffusionSquareMetresPerSecond = value;
            return this;
        }

        /** Decay rate in the dissolved phase, 1/day (default 0). */
        public Builder decayInWaterPerDay(double value) {
            decayInWaterPerDay = value;
            return this;
        }

        /** Decay rate on the solids, 1/day (default 0). */
        public Builder decayOnSolidsPerDay(double value) {
            decayOnSolidsPerDay = value;
            return this;
        }

        /** Mobile water fraction theta_m / theta, dimensionless (default 1). */
        public Builder mobileWaterFraction(double value) {
            mobileWaterFraction = value;
            return this;
        }

        /** Fraction of sorbing sites in the mobile region, dimensionless (default 1). */
        public Builder mobileSorbingSiteFraction(double value) {
            mobileSorbingSiteFraction = value;
            return this;
        }

        /** First-order mass-transfer rate between the regions, 1/day (default 0). */
        public Builder massTransferRatePerDay(double value) {
            massTransferRatePerDay = value;
            return this;
        }

        /**
         * Checks every property and makes the layer.
         *
         * @throws TransportInputException naming the first property out of its range
         */
        public SoilLayer build() {
            return new SoilLayer(this);
        }
    }
}
