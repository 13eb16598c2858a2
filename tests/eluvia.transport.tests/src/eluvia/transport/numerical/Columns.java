package eluvia.transport.numerical;

/**
 * Invented test columns (not a real site): plain sandy-loam-like numbers chosen so that the
 * dimensionless groups (Peclet number, retardation factor) take round values.
 */
final class Columns {
    private Columns() {
    }

    /** rho_b = 1600 kg/m3, theta = 0.3, n = 0.4, alpha_L as given, no diffusion. */
    static SoilLayer.Builder sand(double thicknessMetres, double dispersivityMetres) {
        return SoilLayer.builder().thicknessMetres(thicknessMetres).waterContent(0.3).porosity(0.4)
                .bulkDensityKilogramsPerCubicMetre(1600).dispersivityMetres(dispersivityMetres);
    }

    /** Kd (L/kg) giving retardation factor R = 1 + rho_b Kd / theta for rho_b = 1.6 kg/L, theta = 0.3. */
    static double kdForRetardation(double retardation) {
        return (retardation - 1) * 0.3 / 1.6;
    }

    /** Linear interpolation of a cell-centred profile at depth z. */
    static double at(double[] depthMetres, double[] values, double zMetres) {
        for (int i = 0; i + 1 < depthMetres.length; i++) {
            if (depthMetres[i] <= zMetres && depthMetres[i + 1] >= zMetres) {
                double w = (zMetres - depthMetres[i]) / (depthMetres[i + 1] - depthMetres[i]);
                return values[i] + w * (values[i + 1] - values[i]);
            }
        }
        throw new IllegalArgumentException("depth " + zMetres + " m outside the cell centres");
    }
}
