package eluvia.transport.numerical;

import java.util.Arrays;

import eluvia.transport.TransportInputException;

/**
 * Contamination at the start of flushing, with the pore water and the solids in equilibrium
 * (and, in two-region layers, the immobile region at the same pore-water concentration as the
 * mobile one).
 *
 * <p>Three forms: a pore-water concentration (mg/L) per computational cell, one per layer, or a
 * total soil concentration (mg per kg of dry soil, dissolved plus sorbed) per layer, converted to
 * the equilibrium pore-water concentration through the layer's isotherm.
 */
public final class InitialCondition {
    /** How the values are to be read. */
    public enum Kind {
        /** One pore-water concentration (mg/L) per cell, top cell first. */
        PORE_WATER_PER_CELL,
        /** One pore-water concentration (mg/L) per layer, top layer first. */
        PORE_WATER_PER_LAYER,
        /** One total soil concentration (mg/kg dry soil) per layer, top layer first. */
        SOIL_PER_LAYER
    }

    private final Kind kind;
    private final double[] values;

    private InitialCondition(Kind kind, double[] values, String quantity) {
        if (values == null || values.length == 0) {
            throw new TransportInputException(quantity, values == null ? null : "[]", "at least one value");
        }
        for (int i = 0; i < values.length; i++) {
            TransportInputException.requireNonNegative(quantity + " [" + i + "]", values[i]);
        }
        this.kind = kind;
        this.values = values.clone();
    }

    /**
     * Pore-water concentration per cell, mg/L, top cell first; the length must equal the
     * solver's cell count ({@link NumericalFlushingSolver#cellCount()}).
     */
    public static InitialCondition poreWaterPerCell(double... milligramsPerLitre) {
        return new InitialCondition(Kind.PORE_WATER_PER_CELL, milligramsPerLitre,
                "initial pore-water concentration per cell (mg/L)");
    }

    /** Pore-water concentration per layer, mg/L, top layer first. */
    public static InitialCondition poreWaterPerLayer(double... milligramsPerLitre) {
        return new InitialCondition(Kind.PORE_WATER_PER_LAYER, milligramsPerLitre,
                "initial pore-water concentration per layer (mg/L)");
    }

    /** Total soil concentration (dissolved plus sorbed, per kg of dry soil), mg/kg, per layer. */
    public static InitialCondition soilPerLayer(double... milligramsPerKilogram) {
        return new InitialCondition(Kind.SOIL_PER_LAYER, milligramsPerKilogram,
                "initial soil concentration per layer (mg/kg)");
    }

    /** How the values are read. */
    public Kind kind() {
        return kind;
    }

    /** A copy of the values (mg/L or mg/kg, see {@link #kind()}). */
    public double[] values() {
        return values.clone();
    }

    double value(int index) {
        return values[index];
    }

    int size() {
        return values.length;
    }

    /**
     * The pore-water concentration (mg/L) in equilibrium with a total soil concentration,
     * solving theta C / rho_b + S(C) = soil by bisection to the last bit (the total is increasing
     * in C, and C lies between 0 and soil rho_b / theta).
     *
     * @param layer the layer, for theta, rho_b and the isotherm
     * @param soilMilligramsPerKilogram total soil concentration, mg/kg
     */
    public static double poreWaterInEquilibrium(SoilLayer layer, double soilMilligramsPerKilogram) {
        TransportInputException.requireNonNegative("soil concentration (mg/kg)", soilMilligramsPerKilogram);
        double rhoKilogramsPerLitre = layer.bulkDensityKilogramsPerCubicMetre() / 1000.0;
        double theta = layer.waterContent();
        double lo = 0;
        double hi = soilMilligramsPerKilogram * rhoKilogramsPerLitre / theta;
        if (hi == 0) {
            return 0;
        }
        SorptionIsotherm s = layer.isotherm();
        for (int i = 0; i < 2000 && hi > lo; i++) {
            double mid = 0.5 * (lo + hi);
            if (mid <= lo || mid >= hi) {
                break;
            }
            double total = theta * mid / rhoKilogramsPerLitre + s.sorbedMilligramsPerKilogram(mid);
            if (total < soilMilligramsPerKilogram) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Override
    public String toString() {
        return kind + Arrays.toString(values);
    }
}
