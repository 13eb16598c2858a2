package eluvia.transport.numerical;

import eluvia.transport.TransportInputException;

/**
 * Equilibrium relation between the concentration in pore water and the amount sorbed on the
 * soil solids.
 *
 * <p>Pore-water concentrations are in mg/L, sorbed concentrations in mg per kg of dry soil. Three
 * published forms are offered:
 * <ul>
 * <li>linear, S = Kd C, with the distribution coefficient Kd in L/kg (Kd = Koc foc, Karickhoff,
 * Brown and Scott 1979);</li>
 * <li>Freundlich (Freundlich 1909), S = Kf C<sup>n</sup>, Kf in (mg/kg)/(mg/L)<sup>n</sup>,
 * exponent n dimensionless;</li>
 * <li>Langmuir (Langmuir 1918), S = Smax K C / (1 + K C), capacity Smax in mg/kg, affinity K in
 * L/mg; at low concentration it tends to the linear form with Kd = Smax K.</li>
 * </ul>
 * For negative arguments (the small undershoots a second-order scheme may make next to a front)
 * every form is extended as an odd function, S(-C) = -S(C), so that mass stays balanced.
 */
public sealed interface SorptionIsotherm {

    /** Sorbed concentration in mg/kg in equilibrium with {@code waterMilligramsPerLitre}. */
    double sorbedMilligramsPerKilogram(double waterMilligramsPerLitre);

    /**
     * Slope dS/dC in L/kg at {@code waterMilligramsPerLitre}; at C = 0 a Freundlich isotherm with
     * n &lt; 1 has an infinite slope, reported as {@code Double.POSITIVE_INFINITY}.
     */
    double slopeLitresPerKilogram(double waterMilligramsPerLitre);

    /** True for the linear form, whose retardation does not depend on concentration. */
    boolean isLinear();

    /** A short plain-language description with the parameter values, for reports. */
    String describe();

    /** A parameter for {@link #describe()}: 6 significant digits, no trailing zeros (0.1234, not 0.12340000000000001). */
    private static String shortest(double value) {
        if (!Double.isFinite(value) || value == 0) {
            return value == 0 ? "0" : String.valueOf(value);
        }
        java.math.BigDecimal d = new java.math.BigDecimal(value).round(new java.math.MathContext(6)).stripTrailingZeros();
        double magnitude = Math.abs(value);
        return magnitude >= 1e-4 && magnitude < 1e7 ? d.toPlainString() : d.toString();
    }

    /**
     * Linear isotherm.
     *
     * @param kdLitresPerKilogram distribution coefficient Kd in L/kg, 0 or greater (0 = no sorption)
     */
    static SorptionIsotherm linear(double kdLitresPerKilogram) {
        return new Linear(kdLitresPerKilogram);
    }

    /**
     * Freundlich isotherm.
     *
     * @param kf Freundlich coefficient in (mg/kg)/(mg/L)<sup>n</sup>, 0 or greater
     * @param exponent Freundlich exponent n (dimensionless), in (0, 2]
     */
    static SorptionIsotherm freundlich(double kf, double exponent) {
        return new Freundlich(kf, exponent);
    }

    /**
     * Langmuir isotherm.
     *
     * @param capacityMilligramsPerKilogram sorption capacity Smax in mg/kg, greater than 0
     * @param affinityLitresPerMilligram Langmuir constant K in L/mg, greater than 0
     */
    static SorptionIsotherm langmuir(double capacityMilligramsPerKilogram, double affinityLitresPerMilligram) {
        return new Langmuir(capacityMilligramsPerKilogram, affinityLitresPerMilligram);
    }

    /**
     * Linear isotherm S = Kd C.
     *
     * @param kdLitresPerKilogram distribution coefficient in L/kg
     */
    record Linear(double kdLitresPerKilogram) implements SorptionIsotherm {
        public Linear {
            TransportInputException.requireNonNegative("distribution coefficient Kd (L/kg)", kdLitresPerKilogram);
        }

        @Override
        public double sorbedMilligramsPerKilogram(double waterMilligramsPerLitre) {
            return kdLitresPerKilogram * waterMilligramsPerLitre;
        }

        @Override
        public double slopeLitresPerKilogram(double waterMilligramsPerLitre) {
            return kdLitresPerKilogram;
        }

        @Override
        public boolean isLinear() {
            return true;
        }

        @Override
        public String describe() {
            return "linear, Kd = " + SorptionIsotherm.shortest(kdLitresPerKilogram) + " L/kg";
        }
    }

    /**
     * Freundlich isotherm S = Kf C<sup>n</sup>.
     *
     * @param kf Freundlich coefficient in (mg/kg)/(mg/L)<sup>n</sup>
     * @param exponent Freundlich exponent n, dimensionless
     */
    record Freundlich(double kf, double exponent) implements SorptionIsotherm {
        /** Largest Freundlich exponent accepted. */
        public static final double MAXIMUM_EXPONENT = 2.0;

        public Freundlich {
            TransportInputException.requireNonNegative("Freundlich coefficient Kf ((mg/kg)/(mg/L)^n)", kf);
            if (!(exponent > 0 && exponent <= MAXIMUM_EXPONENT)) {
                throw new TransportInputException("Freundlich exponent n (dimensionless)", exponent,
                        "greater than 0 and at most " + MAXIMUM_EXPONENT);
            }
        }

        @Override
        public double sorbedMilligramsPerKilogram(double waterMilligramsPerLitre) {
            double s = kf * Math.pow(Math.abs(waterMilligramsPerLitre), exponent);
            return waterMilligramsPerLitre < 0 ? -s : s;
        }

        @Override
        public double slopeLitresPerKilogram(double waterMilligramsPerLitre) {
            double c = Math.abs(waterMilligramsPerLitre);
            if (c == 0) {
                return exponent < 1 ? Double.POSITIVE_INFINITY : (exponent == 1 ? kf : 0);
            }
            return exponent * kf * Math.pow(c, exponent - 1);
        }

        @Override
        public boolean isLinear() {
            return false;
        }

        @Override
        public String describe() {
            return "Freundlich, Kf = " + SorptionIsotherm.shortest(kf) + " (mg/kg)/(mg/L)^n, n = "
                    + SorptionIsotherm.shortest(exponent);
        }
    }

    /**
     * Langmuir isotherm S = Smax K C / (1 + K C).
     *
     * @param capacityMilligramsPerKilogram sorption capacity Smax in mg/kg
     * @param affinityLitresPerMilligram Langmuir constant K in L/mg
     */
    record Langmuir(double capacityMilligramsPerKilogram, double affinityLitresPerMilligram)
            implements SorptionIsotherm {
        public Langmuir {
            TransportInputException.requirePositive("Langmuir capacity Smax (mg/kg)", capacityMilligramsPerKilogram);
            TransportInputException.requirePositive("Langmuir constant K (L/mg)", affinityLitresPerMilligram);
        }

        @Override
        public double sorbedMilligramsPerKilogram(double waterMilligramsPerLitre) {
            return capacityMilligramsPerKilogram * affinityLitresPerMilligram * waterMilligramsPerLitre
                    / (1 + affinityLitresPerMilligram * Math.abs(waterMilligramsPerLitre));
        }

        @Override
        public double slopeLitresPerKilogram(double waterMilligramsPerLitre) {
            double d = 1 + affinityLitresPerMilligram * Math.abs(waterMilligramsPerLitre);
            return capacityMilligramsPerKilogram * affinityLitresPerMilligram / (d * d);
        }

        @Override
        public boolean isLinear() {
            return false;
        }

        @Override
        public String describe() {
            return "Langmuir, Smax = " + SorptionIsotherm.shortest(capacityMilligramsPerKilogram) + " mg/kg, K = "
                    + SorptionIsotherm.shortest(affinityLitresPerMilligram) + " L/mg";
        }
    }
}
