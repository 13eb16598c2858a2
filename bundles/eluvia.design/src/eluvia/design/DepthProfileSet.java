package eluvia.design;

import java.util.Arrays;
import java.util.List;

import eluvia.transport.numerical.MassBalance;

/**
 * Residual soil concentration against depth over the treated column of one flushing design, for one
 * contaminant, at chosen shares of the pore volumes the design needs ({@link DepthProfiles}).
 *
 * <p>Depths are metres below ground; soil concentrations are total (dissolved in all the water plus
 * sorbed) in mg per kg of dry soil, as a soil sample reports them. Times are given both as operating
 * days (days of pumping) and as calendar days at the design's operating days per week.
 *
 * @param designName the flushing design's name
 * @param contaminantName the contaminant the profiles are of
 * @param available whether profiles were computed; when false, {@code unavailableReason} says why and
 *        the profile list is empty
 * @param unavailableReason why not, or "" when available
 * @param initialSoilMilligramsPerKg initial soil concentration over the column, mg/kg
 * @param cleanupLevelMilligramsPerKg the contaminant's soil cleanup level, mg/kg
 * @param topDepthMetres top of the treated column, m below ground
 * @param bottomDepthMetres bottom of the treated column, m below ground
 * @param layerBaseDepthsMetres base of each layer slice of the column, m below ground, top first
 * @param designPoreVolumes the pore volumes the design needs (dimensionless), NaN when not available
 * @param profiles the profiles in time order
 * @param massBalance the solute bookkeeping of the numerical run, null when not available
 * @param basis how the profiles were computed (solver, grid, isotherm), in words
 */
public record DepthProfileSet(String designName, String contaminantName, boolean available, String unavailableReason,
        double initialSoilMilligramsPerKg, double cleanupLevelMilligramsPerKg, double topDepthMetres,
        double bottomDepthMetres, List<Double> layerBaseDepthsMetres, double designPoreVolumes,
        List<Profile> profiles, MassBalance massBalance, String basis) {

    /** Copies the lists. */
    public DepthProfileSet {
        layerBaseDepthsMetres = List.copyOf(layerBaseDepthsMetres);
        profiles = List.copyOf(profiles);
    }

    /** A set without profiles, with the reason. */
    static DepthProfileSet notAvailable(String designName, String contaminantName, String reason) {
        return new DepthProfileSet(designName, contaminantName == null ? "" : contaminantName, false, reason, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, List.of(), Double.NaN, List.of(), null, "");
    }

    /**
     * One residual profile.
     *
     * @param shareOfDesign share of the design's pore volumes flushed (dimensionless, 0 to 1)
     * @param poreVolumes pore volumes flushed (dimensionless)
     * @param operatingDays days of pumping, d
     * @param calendarDays elapsed days at the design's operating days per week, d
     * @param depthBelowGroundMetres depth of each cell centre, m below ground, top first
     * @param soilMilligramsPerKg total soil concentration per cell, mg/kg of dry soil
     * @param meanResidualFraction mass left over the mass at the start (dimensionless)
     * @param maxResidualFraction highest soil concentration over the highest at the start (dimensionless)
     */
    public record Profile(double shareOfDesign, double poreVolumes, double operatingDays, double calendarDays,
            double[] depthBelowGroundMetres, double[] soilMilligramsPerKg, double meanResidualFraction,
            double maxResidualFraction) {

        /** Copies the arrays. */
        public Profile {
            depthBelowGroundMetres = depthBelowGroundMetres.clone();
            soilMilligramsPerKg = soilMilligramsPerKg.clone();
        }

        @Override
        public double[] depthBelowGroundMetres() {
            return depthBelowGroundMetres.clone();
        }

        @Override
        public double[] soilMilligramsPerKg() {
            return soilMilligramsPerKg.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Profile p && p.shareOfDesign == shareOfDesign && p.poreVolumes == poreVolumes
                    && p.operatingDays == operatingDays && p.calendarDays == calendarDays
                    && Arrays.equals(p.depthBelowGroundMetres, depthBelowGroundMetres)
                    && Arrays.equals(p.soilMilligramsPerKg, soilMilligramsPerKg)
                    && p.meanResidualFraction == meanResidualFraction && p.maxResidualFraction == maxResidualFraction;
        }

        @Override
        public int hashCode() {
            return Double.hashCode(poreVolumes) * 31 + Arrays.hashCode(soilMilligramsPerKg);
        }

        @Override
        public String toString() {
            return "Profile[" + poreVolumes + " PV, " + soilMilligramsPerKg.length + " cells]";
        }
    }
}
