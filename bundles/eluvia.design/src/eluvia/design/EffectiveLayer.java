package eluvia.design;

import java.util.List;

/**
 * Homogeneous properties of the soil column a zone occupies, for the single-layer analytical
 * flushing solutions.
 *
 * <p>Layers overlapping the zone's depth interval are combined by overlap thickness so that the
 * water volume and the sorption capacity of the column are kept exactly: water content, porosity
 * and bulk density are thickness-weighted means; the organic-carbon fraction is weighted by
 * thickness times bulk density (so that rho_b Kd, and with it R theta, is the thickness-weighted
 * mean); dispersivity is a thickness-weighted mean (a screening choice); saturated hydraulic
 * conductivity is the harmonic mean, which governs vertical flow through layers in series.
 *
 * @param topDepthMetres depth of the top of the treated column below ground, m
 * @param bottomDepthMetres depth of its bottom, m
 * @param waterContent volumetric water content during flushing (dimensionless)
 * @param porosity total porosity (dimensionless)
 * @param bulkDensityKgPerCubicMetre dry bulk density, kg/m3
 * @param organicCarbonFraction organic-carbon fraction, weighted by rho_b thickness (dimensionless)
 * @param dispersivityMetres longitudinal dispersivity, m
 * @param saturatedConductivityMetresPerDay vertical (harmonic mean) saturated hydraulic conductivity, m/d
 * @param layerNames names of the layers combined, top to bottom
 */
public record EffectiveLayer(double topDepthMetres, double bottomDepthMetres, double waterContent, double porosity,
        double bulkDensityKgPerCubicMetre, double organicCarbonFraction, double dispersivityMetres,
        double saturatedConductivityMetresPerDay, List<String> layerNames) {

    /** Thickness of the treated column, m. */
    public double thicknessMetres() {
        return bottomDepthMetres - topDepthMetres;
    }

    /** How the layers were combined, in words for the report. */
    public String basis() {
        if (layerNames.size() == 1) {
            return "properties of layer '" + layerNames.get(0) + "'";
        }
        return "thickness-weighted combination of layers " + String.join(", ", layerNames)
                + " (water, pore and sorption capacity kept; harmonic-mean conductivity)";
    }
}
