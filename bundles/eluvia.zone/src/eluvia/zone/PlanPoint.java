package eluvia.zone;

/**
 * A point in plan.
 *
 * @param eastingMetres  easting, m
 * @param northingMetres northing, m
 */
public record PlanPoint(double eastingMetres, double northingMetres) {
}
