package eluvia.design;

import java.util.List;

/**
 * How one contaminant's zone enlarges while nothing is done.
 *
 * @param contaminantName the contaminant
 * @param initialMilligramsPerKg its source concentration in the zone, mg/kg
 * @param cleanupLevelMilligramsPerKg its soil cleanup level, mg/kg
 * @param retardation R of the zone's combined layer (dimensionless)
 * @param poreWaterVelocityMetresPerDay downward pore-water velocity while nothing is done, m/d
 * @param verticalDispersionSquareMetresPerDay D_z = alpha_L v + tau D0, m2/d
 * @param horizontalDispersionSquareMetresPerDay D_x = D_y = alpha_T v + tau D0, m2/d
 * @param curve the zone above its cleanup level after each delay
 */
public record ContaminantSpreading(String contaminantName, double initialMilligramsPerKg,
        double cleanupLevelMilligramsPerKg, double retardation, double poreWaterVelocityMetresPerDay,
        double verticalDispersionSquareMetresPerDay, double horizontalDispersionSquareMetresPerDay,
        List<EnlargementPoint> curve) {

    /** Copies the list. */
    public ContaminantSpreading {
        curve = List.copyOf(curve);
    }
}
