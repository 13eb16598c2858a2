package eluvia.design.internal;

import java.util.ArrayList;
import java.util.List;

import eluvia.design.EffectiveLayer;
import eluvia.site.derived.Dispersivities;
import eluvia.site.model.SoilLayer;

/**
 * Combines the soil layers overlapping a depth interval into one {@link EffectiveLayer}. Each
 * layer's dispersivity is the one its dispersivity rule gives ({@link Dispersivities}).
 */
public final class LayerCombination {

    private LayerCombination() {
    }

    /**
     * @param layers the site's layers, any order
     * @param topDepthMetres top of the interval, m below ground
     * @param bottomDepthMetres bottom of the interval, m below ground
     * @throws IllegalArgumentException when no layer overlaps the interval or the layers leave a gap in it
     */
    public static EffectiveLayer over(List<? extends SoilLayer> layers, double topDepthMetres, double bottomDepthMetres) {
        double total = 0;
        double theta = 0;
        double n = 0;
        double rho = 0;
        double rhoFoc = 0;
        double alpha = 0;
        double resistanceDaysPerMetre = 0; // sum of L_i / Ks_i, for the harmonic mean
        boolean conductivityKnown = true;
        List<String> names = new ArrayList<>();
        for (SoilLayer layer : layers) {
            double overlap = Math.min(bottomDepthMetres, layer.getBottomDepthMetres())
                    - Math.max(topDepthMetres, layer.getTopDepthMetres());
            if (overlap <= 0) {
                continue;
            }
            total += overlap;
            theta += overlap * layer.getWaterContent();
            n += overlap * layer.getPorosity();
            rho += overlap * layer.getBulkDensityKgPerCubicMetre();
            rhoFoc += overlap * layer.getBulkDensityKgPerCubicMetre() * layer.getOrganicCarbonFraction();
            alpha += overlap * Dispersivities.effectiveDispersivityMetres(layer);
            if (layer.getSaturatedConductivityMetresPerDay() > 0) {
                resistanceDaysPerMetre += overlap / layer.getSaturatedConductivityMetresPerDay();
            } else {
                conductivityKnown = false;
            }
            names.add(layer.getName());
        }
        double wanted = bottomDepthMetres - topDepthMetres;
        if (names.isEmpty()) {
            throw new IllegalArgumentException("no soil layer covers the depth interval " + topDepthMetres + " m to "
                    + bottomDepthMetres + " m; add a layer there or change the zone's depths");
        }
        if (total < wanted * (1 - 1e-9)) {
            throw new IllegalArgumentException("the soil layers cover only " + total + " m of the zone's "
                    + wanted + " m depth interval; make the layers contiguous over the zone");
        }
        double ks = conductivityKnown ? total / resistanceDaysPerMetre : Double.NaN;
        return new EffectiveLayer(topDepthMetres, bottomDepthMetres, theta / total, n / total, rho / total,
                rhoFoc / rho, alpha / total, ks, List.copyOf(names));
    }

    /**
     * The part of one site layer inside a depth interval.
     *
     * @param layer the site layer
     * @param topDepthMetres top of the part, m below ground
     * @param bottomDepthMetres bottom of the part, m below ground
     */
    public record Slice(SoilLayer layer, double topDepthMetres, double bottomDepthMetres) {
        /** Thickness of the part, m. */
        public double thicknessMetres() {
            return bottomDepthMetres - topDepthMetres;
        }
    }

    /**
     * The layers overlapping a depth interval, clipped to it, top first.
     *
     * @throws IllegalArgumentException as {@link #over} when no layer overlaps or the layers leave a gap
     */
    public static List<Slice> slices(List<? extends SoilLayer> layers, double topDepthMetres, double bottomDepthMetres) {
        over(layers, topDepthMetres, bottomDepthMetres);
        List<Slice> out = new ArrayList<>();
        for (SoilLayer layer : layers) {
            double top = Math.max(topDepthMetres, layer.getTopDepthMetres());
            double bottom = Math.min(bottomDepthMetres, layer.getBottomDepthMetres());
            if (bottom > top) {
                out.add(new Slice(layer, top, bottom));
            }
        }
        out.sort((a, b) -> Double.compare(a.topDepthMetres(), b.topDepthMetres()));
        return List.copyOf(out);
    }
}
