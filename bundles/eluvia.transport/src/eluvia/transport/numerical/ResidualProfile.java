package eluvia.transport.numerical;

/**
 * The contamination left in the profile at one time.
 *
 * <p>Per cell (top first): the depth of the cell centre in m below the top of the profile, the
 * total soil concentration in mg per kg of dry soil (dissolved in all the water plus sorbed, as a
 * soil sample would report it), and the mobile pore-water concentration in mg/L.
 */
public final class ResidualProfile {
    private final double timeDays;
    private final double poreVolumes;
    private final double[] depthMetres;
    private final double[] soilMilligramsPerKilogram;
    private final double[] poreWaterMilligramsPerLitre;
    private final double meanResidualFraction;
    private final double maxResidualFraction;

    ResidualProfile(double timeDays, double poreVolumes, double[] depthMetres, double[] soilMilligramsPerKilogram,
            double[] poreWaterMilligramsPerLitre, double meanResidualFraction, double maxResidualFraction) {
        this.timeDays = timeDays;
        this.poreVolumes = poreVolumes;
        this.depthMetres = depthMetres;
        this.soilMilligramsPerKilogram = soilMilligramsPerKilogram;
        this.poreWaterMilligramsPerLitre = poreWaterMilligramsPerLitre;
        this.meanResidualFraction = meanResidualFraction;
        this.maxResidualFraction = maxResidualFraction;
    }

    /** Time since flushing began, days. */
    public double timeDays() {
        return timeDays;
    }

    /** Pore volumes passed (dimensionless). */
    public double poreVolumes() {
        return poreVolumes;
    }

    /** Depth of each cell centre below the top of the profile, m (a copy). */
    public double[] depthMetres() {
        return depthMetres.clone();
    }

    /** Total soil concentration per cell, mg/kg of dry soil (a copy). */
    public double[] soilMilligramsPerKilogram() {
        return soilMilligramsPerKilogram.clone();
    }

    /** Mobile pore-water concentration per cell, mg/L (a copy). */
    public double[] poreWaterMilligramsPerLitre() {
        return poreWaterMilligramsPerLitre.clone();
    }

    /** Mass left over the mass at the start (dimensionless). */
    public double meanResidualFraction() {
        return meanResidualFraction;
    }

    /** Highest soil concentration over the highest at the start (dimensionless). */
    public double maxResidualFraction() {
        return maxResidualFraction;
    }
}
