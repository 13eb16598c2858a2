package eluvia.zone;

/**
 * A variogram model for ordinary kriging: a nugget plus one structure of the chosen shape.
 *
 * <p>{@code gamma(0) = 0} and, for a lag {@code h > 0},
 * {@code gamma(h) = nugget + (sill - nugget) shape(h / range)}; the covariance is
 * {@code C(h) = sill - gamma(h)} (Isaaks and Srivastava 1989, An Introduction to Applied
 * Geostatistics, ch. 16; Journel and Huijbregts 1978, Mining Geostatistics). Note that
 * {@code sill} here is the total sill, the plateau the variogram rises to, nugget included (the
 * structure's own contribution is {@code sill - nugget}). Lags and the range are the vertically
 * scaled distances of {@link SampleSet}, in metres. Semivariances are in (mg/kg)^2.
 *
 * @param shape                the shape of the structure
 * @param nuggetMgPerKgSquared the nugget (jump at the origin), (mg/kg)^2, 0 to {@code sill}
 * @param sillMgPerKgSquared   the total sill, (mg/kg)^2, greater than 0
 * @param rangeMetres          the range (practical range for the exponential and Gaussian
 *                             shapes), scaled m, greater than 0
 */
public record VariogramModel(VariogramShape shape, double nuggetMgPerKgSquared, double sillMgPerKgSquared,
        double rangeMetres) {

    /** Checks every field; throws {@link ZoneInputException} naming the field and its range. */
    public VariogramModel {
        ZoneInputException.requireNonNull("variogram shape", shape);
        ZoneInputException.requireNonNegative("variogram nuggetMgPerKgSquared", nuggetMgPerKgSquared);
        ZoneInputException.requirePositive("variogram sillMgPerKgSquared", sillMgPerKgSquared);
        ZoneInputException.requirePositive("variogram rangeMetres", rangeMetres);
        if (nuggetMgPerKgSquared > sillMgPerKgSquared) {
            throw new ZoneInputException("variogram nuggetMgPerKgSquared", nuggetMgPerKgSquared,
                    "0 to the total sill " + sillMgPerKgSquared + " (the sill includes the nugget)");
        }
    }

    /** The semivariance at a scaled lag, (mg/kg)^2. */
    public double semivarianceMgPerKgSquared(double lagMetres) {
        if (!(lagMetres >= 0) || Double.isInfinite(lagMetres)) {
            throw new ZoneInputException("variogram lagMetres", lagMetres, "0 or greater and finite");
        }
        if (lagMetres == 0) {
            return 0.0;
        }
        return nuggetMgPerKgSquared + (sillMgPerKgSquared - nuggetMgPerKgSquared) * shape.value(lagMetres / rangeMetres);
    }

    /** The covariance at a scaled lag, {@code sill - gamma(h)}, (mg/kg)^2. */
    public double covarianceMgPerKgSquared(double lagMetres) {
        return sillMgPerKgSquared - semivarianceMgPerKgSquared(lagMetres);
    }

    /** One line for results, e.g. "spherical, nugget 0.5, sill 4.0 (mg/kg)^2, range 30.0 m". */
    public String description() {
        return shape.label() + " variogram, nugget " + nuggetMgPerKgSquared + " (mg/kg)^2, sill " + sillMgPerKgSquared
                + " (mg/kg)^2, range " + rangeMetres + " m (scaled)";
    }
}
