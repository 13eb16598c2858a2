package eluvia.design.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import eluvia.cost.CostInputException;
import eluvia.cost.EarthworkFactors;
import eluvia.cost.ExcavationDesign;
import eluvia.cost.ExcavationPlan;
import eluvia.cost.ExcavationQuantities;
import eluvia.cost.ExcavationSizing;
import eluvia.cost.HaulTruck;
import eluvia.cost.PitFootprint;
import eluvia.cost.SideSlopeTable;
import eluvia.cost.SoilSlopeClass;
import eluvia.design.DesignInputException;
import eluvia.design.DesignSettings;
import eluvia.design.ExcavationResult;
import eluvia.design.ZoneOutline;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;

/**
 * Excavation take-offs of the pipeline: the site model's excavation designs (and the hot spot of a
 * hybrid, and a delayed zone) to eluvia.cost {@link ExcavationPlan}s.
 *
 * <p>Soil factors: swell and shrinkage are the thickness-weighted means of the layers the pit cuts
 * (ground surface to pit bottom); the bank density including pore water is
 * (rho_b + 1000 kg/m3 x theta) / 1000 t/m3, thickness-weighted, with theta the layer's water
 * content (a stated assumption: the water content entered for flushing stands for the moisture
 * when digging).
 */
public final class ExcavationTakeOff {

    private ExcavationTakeOff() {
    }

    /** The excavation parameters of a site-model design (or of a fresh one, for its defaults). */
    public record PitParameters(SoilSlopeClass soilClass, double sideSlopeHorizontalPerVertical, String slopeBasis,
            double overdigMetres, HaulTruck truck) {
    }

    /** The parameters of a site-model excavation design, with the slope rule. */
    public static PitParameters parametersOf(eluvia.site.model.ExcavationDesign d) {
        String label = "Excavation design '" + d.getName() + "'";
        SoilSlopeClass soil = SoilSlopeClass.valueOf((d.getSoilType() == null
                ? eluvia.site.model.ExcavationSoilType.TYPE_C : d.getSoilType()).getName());
        double slope;
        String slopeBasis;
        if (d.eIsSet(SitePackage.Literals.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL)) {
            slope = d.getSideSlopeHorizontalPerVertical();
            slopeBasis = "entered in the design: " + slope + " H:1V";
        } else {
            slope = SideSlopeTable.defaults().slopeHorizontalPerVertical(soil);
            slopeBasis = "not entered (the site model's default, which cannot be told from an entered "
                    + d.getSideSlopeHorizontalPerVertical() + "): " + slope + " H:1V for " + soil.label() + " from "
                    + SoilSlopeClass.SOURCE;
        }
        if (!(slope >= 0 && slope <= SideSlopeTable.MAXIMUM_SLOPE_HORIZONTAL_PER_VERTICAL)) {
            throw DesignInputException.of(d, label, "sideSlopeHorizontalPerVertical", slope,
                    "[0, " + SideSlopeTable.MAXIMUM_SLOPE_HORIZONTAL_PER_VERTICAL + "] (horizontal per vertical)",
                    "enter horizontal distance per unit depth (1.5 for 1-1/2 : 1)");
        }
        if (!(d.getOverdigMetres() >= 0 && d.getOverdigMetres() <= 10)) {
            throw DesignInputException.of(d, label, "overdigMetres", d.getOverdigMetres(), "[0, 10] m",
                    "the extra depth and width dug beyond the zone");
        }
        HaulTruck truck;
        try {
            truck = new HaulTruck(d.getTruckHeapedCapacityCubicMetres(), d.getTruckPayloadKilograms() / 1000.0);
        } catch (CostInputException e) {
            boolean capacity = e.quantity().startsWith("heaped");
            throw DesignInputException.of(d, label, capacity ? "truckHeapedCapacityCubicMetres" : "truckPayloadKilograms",
                    capacity ? d.getTruckHeapedCapacityCubicMetres() : d.getTruckPayloadKilograms(),
                    capacity ? "(0, 100] m3" : "(0, 100000] kg", "enter the truck's heaped capacity in m3 and payload in kg");
        }
        return new PitParameters(soil, slope, slopeBasis, d.getOverdigMetres(), truck);
    }

    /** The zone's outline as a pit footprint, with how it was obtained in {@code basis[0]}. */
    public static PitFootprint footprintOf(TreatmentZone zone, String[] basis) {
        Optional<ZoneOutline> outline = ZoneOutline.of(zone);
        if (outline.isPresent()) {
            ZoneOutline o = outline.get();
            basis[0] = o.convexHull()
                    ? "the convex hull of the zone's footprint polygon (the outline is not convex; a pit with "
                            + "uniformly sloped sides must enclose it)"
                    : "the zone's footprint polygon (" + zone.getFootprint().size() + " corners, mitred pit corners)";
            return PitFootprint.convexPolygon(o.eastingMetres(), o.northingMetres());
        }
        double side = Math.sqrt(zone.getAreaSquareMetres());
        basis[0] = String.format(Locale.ROOT, "a square of the zone's area %.4g m2 (%.4g m x %.4g m; the zone has no "
                + "footprint polygon)", zone.getAreaSquareMetres(), side, side);
        return PitFootprint.rectangle(side, side);
    }

    /** Factors of the soil cut from the surface to {@code pitDepthMetres}, with how they were obtained in {@code basis[0]}. */
    public static EarthworkFactors soilOver(List<? extends SoilLayer> layers, double pitDepthMetres, String[] basis,
            List<String> notes) {
        double profileBottom = 0;
        for (SoilLayer l : layers) {
            profileBottom = Math.max(profileBottom, l.getBottomDepthMetres());
        }
        double bottom = Math.min(pitDepthMetres, profileBottom);
        if (pitDepthMetres > profileBottom + 1e-9) {
            notes.add(String.format(Locale.ROOT, "The pit (%.3f m deep) goes below the soil profile (%.3f m): the soil "
                    + "factors of the profile are used for the rest.", pitDepthMetres, profileBottom));
        }
        List<LayerCombination.Slice> slices = LayerCombination.slices(layers, 0, bottom);
        double swell = 0;
        double shrink = 0;
        double density = 0;
        double total = 0;
        List<String> names = new ArrayList<>();
        for (LayerCombination.Slice s : slices) {
            SoilLayer l = s.layer();
            double h = s.thicknessMetres();
            swell += h * l.getSwellFactor();
            shrink += h * l.getShrinkageFactor();
            density += h * (l.getBulkDensityKgPerCubicMetre() + 1000 * l.getWaterContent()) / 1000;
            total += h;
            names.add(l.getName());
            if (l.getSwellFactor() == 0) {
                notes.add("Layer '" + l.getName() + "' has a swell factor of 0: its loose volume equals its bank volume; "
                        + "enter its swell (typical 0.05 to 0.60, Peurifoy Table 4-1 as quoted).");
            }
        }
        swell /= total;
        shrink /= total;
        density /= total;
        basis[0] = String.format(Locale.ROOT, "thickness-weighted over layers %s from 0 to %.3f m: swell %.4f, shrinkage "
                + "%.4f, bank density (rho_b + 1000 theta)/1000 = %.4f t/m3 (water content as entered for flushing)",
                String.join(", ", names), bottom, swell, shrink, density);
        try {
            return new EarthworkFactors(swell, shrink, density, "site layers " + String.join(", ", names));
        } catch (CostInputException e) {
            throw DesignInputException.of(slices.get(0).layer(), "Layer '" + slices.get(0).layer().getName() + "'",
                    e.quantity().startsWith("swell") ? "swellFactor" : e.quantity().startsWith("shrinkage")
                            ? "shrinkageFactor" : "bulkDensityKgPerCubicMetre", e.value(), e.allowedRange(),
                    "swell in [0, 1] and shrinkage in [0, 1) as fractions (0.25 for 25 %)");
        }
    }

    /** The take-off of a pit around a prism. */
    public static ExcavationQuantities size(PitFootprint zoneFootprint, double topDepthMetres, double bottomDepthMetres,
            PitParameters p, EarthworkFactors soil, DesignSettings settings) {
        ExcavationDesign design = new ExcavationDesign(zoneFootprint, topDepthMetres, bottomDepthMetres, p.overdigMetres(),
                p.soilClass(), p.sideSlopeHorizontalPerVertical());
        return ExcavationSizing.size(new ExcavationPlan(design, soil, settings.borrowSoil(), p.truck(),
                settings.reuseOverburdenAsBackfill()));
    }

    /** The take-off of a site-model excavation design. */
    public static ExcavationResult size(List<? extends SoilLayer> layers, eluvia.site.model.ExcavationDesign d,
            DesignSettings settings) {
        TreatmentZone zone = d.getZone();
        if (zone == null) {
            throw DesignInputException.of(d, "Excavation design '" + d.getName() + "'", "zone", "(none)",
                    "a treatment zone of this project", "choose the zone to dig out");
        }
        PitParameters p = parametersOf(d);
        String[] fb = new String[1];
        PitFootprint footprint = footprintOf(zone, fb);
        List<String> notes = new ArrayList<>();
        String[] sb = new String[1];
        EarthworkFactors soil = soilOver(layers, zone.getBottomDepthMetres() + p.overdigMetres(), sb, notes);
        ExcavationQuantities q = size(footprint, zone.getTopDepthMetres(), zone.getBottomDepthMetres(), p, soil, settings);
        return new ExcavationResult(d.getName(), zone.getName(), fb[0], p.slopeBasis(), sb[0], q, notes);
    }
}
