package eluvia.benchmarks;

import java.util.List;

import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.InitialCondition;
import eluvia.transport.numerical.SoilLayer;
import eluvia.transport.numerical.SorptionIsotherm;

/**
 * The invented columns the benchmarks run (not a real site): a 1 m sandy layer, theta 0.3,
 * n 0.4, rho_b 1600 kg/m3, q 0.1 m/day, flushed clean from 1 mg/L.
 */
final class Cases {
    static final double THICKNESS_METRES = 1.0;
    static final double WATER_CONTENT = 0.3;
    static final double DARCY_FLUX_METRES_PER_DAY = 0.1;

    private Cases() {
    }

    /** Kd (L/kg) for retardation R with rho_b = 1.6 kg/L and theta = 0.3. */
    static double kdForRetardation(double retardation) {
        return (retardation - 1) * WATER_CONTENT / 1.6;
    }

    static SoilLayer layer(double dispersivityMetres, SorptionIsotherm isotherm) {
        return SoilLayer.builder().thicknessMetres(THICKNESS_METRES).waterContent(WATER_CONTENT).porosity(0.4)
                .bulkDensityKilogramsPerCubicMetre(1600).dispersivityMetres(dispersivityMetres).isotherm(isotherm)
                .build();
    }

    static FlushingColumn column(SoilLayer layer, double initialMilligramsPerLitre) {
        return new FlushingColumn(List.of(layer), DARCY_FLUX_METRES_PER_DAY, 0,
                InitialCondition.poreWaterPerLayer(initialMilligramsPerLitre));
    }
}
