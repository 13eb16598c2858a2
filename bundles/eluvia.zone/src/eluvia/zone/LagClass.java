package eluvia.zone;

/**
 * One lag class of an experimental variogram: the pairs whose scaled separation lies in
 * {@code (fromMetres, toMetres]} and half their mean squared difference.
 *
 * @param fromMetres                lower bound of the class (excluded), scaled m
 * @param toMetres                  upper bound of the class (included), scaled m
 * @param meanLagMetres             mean separation of the pairs in the class, scaled m (NaN when empty)
 * @param pairCount                 number of sample pairs in the class
 * @param semivarianceMgPerKgSquared {@code sum (z_i - z_j)^2 / (2 N)}, (mg/kg)^2 (NaN when empty)
 */
public record LagClass(double fromMetres, double toMetres, double meanLagMetres, long pairCount,
        double semivarianceMgPerKgSquared) {
}
