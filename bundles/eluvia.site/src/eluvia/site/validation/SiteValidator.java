package eluvia.site.validation;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;

import eluvia.site.files.ProjectFiles;
import eluvia.site.library.CasNumbers;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;

/**
 * Checks every field of a project: ranges, required values and consistency between fields
 * (water content at most the porosity, contiguous layers, zones inside the soil profile, cleanup
 * levels below the initial concentrations, ...). Each violation is a {@link Problem} that names
 * the object, the field, the value, the allowed range and the fix.
 *
 * <p>Units are those of the model (SI; see the feature names). Ranges are physical limits
 * (errors) or the usual span of the quantity (warnings, which say where the span comes from).
 */
public final class SiteValidator {

    /** Density of soil mineral grains used for the porosity/bulk-density cross-check (common practice: quartz, 2650 kg/m3). */
    static final double PARTICLE_DENSITY_KG_PER_CUBIC_METRE = 2650.0;
    /** How far the porosity may stray from 1 - rho_b / rho_s before a warning (dimensionless). */
    static final double POROSITY_CONSISTENCY_TOLERANCE = 0.1;
    /** Depths closer than this (m) are taken as equal when checking that layers are contiguous. */
    static final double DEPTH_TOLERANCE_METRES = 1e-6;

    private final List<Problem> problems = new ArrayList<>();

    private SiteValidator() {
    }

    /**
     * Validates a project.
     *
     * @param project the project; null gives one error
     * @return the problems found, errors and warnings, in model order; empty when all is well
     */
    public static List<Problem> validate(Project project) {
        SiteValidator validator = new SiteValidator();
        validator.project(project);
        return List.copyOf(validator.problems);
    }

    /** True when the list holds at least one {@link Severity#ERROR}. */
    public static boolean hasErrors(List<Problem> problems) {
        return problems.stream().anyMatch(p -> p.severity() == Severity.ERROR);
    }

    // ---- objects ---------------------------------------------------------------------------------

    private void project(Project project) {
        if (project == null) {
            error(null, "Project", "project", "(none)", "a project", "open or create a project");
            return;
        }
        String label = label("Project", project.getName(), -1);
        requireName(project, label, project.getName(), Severity.WARNING, "give the project a name");
        int version = project.getSchemaVersion();
        if (version < 0 || version > ProjectFiles.CURRENT_SCHEMA_VERSION) {
            error(project, label, "schemaVersion", Integer.toString(version),
                    "0 (not saved yet) to " + ProjectFiles.CURRENT_SCHEMA_VERSION, "save the project with this version of Eluvia");
        }
        Site site = project.getSite();
        if (site == null) {
            error(project, label, "site", "(none)", "a site", "add a site with its soil layers");
        } else {
            site(site);
        }
        contaminants(project);
        cleanupLevels(project);
        if (site != null) {
            for (int i = 0; i < site.getZones().size(); i++) {
                zone(project, site, site.getZones().get(i), i);
            }
        }
        for (int i = 0; i < project.getFlushingDesigns().size(); i++) {
            flushingDesign(project, project.getFlushingDesigns().get(i), i);
        }
    }

    private void site(Site site) {
        String label = label("Site", site.getName(), -1);
        requireName(site, label, site.getName(), Severity.WARNING, "give the site a name");
        if (site.getLayers().isEmpty()) {
            error(site, label, "layers", "(none)", "at least one soil layer", "add the soil layers from the ground surface down");
        }
        Set<String> names = new HashSet<>();
        SoilLayer above = null;
        for (int i = 0; i < site.getLayers().size(); i++) {
            SoilLayer layer = site.getLayers().get(i);
            layer(layer, i, above);
            String key = key(layer.getName());
            if (!key.isEmpty() && !names.add(key)) {
                warning(layer, layerLabel(layer, i), "name", quote(layer.getName()), "a name no other layer has",
                        "rename one of the layers so that results can be told apart");
            }
            above = layer;
        }
        if (site.getZones().isEmpty()) {
            warning(site, label, "zones", "(none)", "at least one treatment zone", "add the zone to be treated");
        }
    }

    private void layer(SoilLayer layer, int index, SoilLayer above) {
        String label = layerLabel(layer, index);
        requireName(layer, label, layer.getName(), Severity.WARNING, "name the layer, e.g. 'Silty sand'");
        double top = layer.getTopDepthMetres();
        double bottom = layer.getBottomDepthMetres();
        boolean depthsOk = atLeast(layer, label, "topDepthMetres", top, 0.0, "[0, bottom depth)",
                "enter the depth of the layer's top below the ground surface in metres (0 at the surface)");
        if (finite(bottom) && depthsOk && bottom <= top) {
            error(layer, label, "bottomDepthMetres", num(bottom), "greater than the top depth " + num(top) + " m",
                    "enter the depth of the layer's bottom below the ground surface in metres");
        } else if (!finite(bottom)) {
            error(layer, label, "bottomDepthMetres", num(bottom), "a finite depth greater than the top depth", "enter a number in metres");
        }
        if (above == null) {
            if (depthsOk && top > DEPTH_TOLERANCE_METRES) {
                warning(layer, label, "topDepthMetres", num(top), "0 for the first layer",
                        "start the first layer at the ground surface, or add the layer above it");
            }
        } else if (finite(top) && finite(above.getBottomDepthMetres())
                && Math.abs(top - above.getBottomDepthMetres()) > DEPTH_TOLERANCE_METRES) {
            error(layer, label, "topDepthMetres", num(top), "equal to the bottom depth of the layer above ("
                    + num(above.getBottomDepthMetres()) + " m)", top > above.getBottomDepthMetres()
                            ? "layers must be contiguous: close the gap by setting the top depth to "
                                    + num(above.getBottomDepthMetres()) + " m or adding a layer"
                            : "layers must not overlap: set the top depth to " + num(above.getBottomDepthMetres()) + " m");
        }
        double density = layer.getBulkDensityKgPerCubicMetre();
        if (!(finite(density) && density > 0 && density < PARTICLE_DENSITY_KG_PER_CUBIC_METRE)) {
            error(layer, label, "bulkDensityKgPerCubicMetre", num(density), "(0, 2650) kg/m3",
                    "enter the dry bulk density in kg/m3, e.g. 1600 (1.6 g/cm3 = 1600 kg/m3)");
        } else if (density < 1000 || density > 2100) {
            warning(layer, label, "bulkDensityKgPerCubicMetre", num(density), "usually 1000 to 2100 kg/m3 for mineral soils (common practice)",
                    "check the value and its unit (1.6 g/cm3 = 1600 kg/m3)");
        }
        double porosity = layer.getPorosity();
        boolean porosityOk = finite(porosity) && porosity > 0 && porosity < 1;
        if (!porosityOk) {
            error(layer, label, "porosity", num(porosity), "(0, 1)", "enter the total porosity as a fraction, e.g. 0.35");
        } else if (finite(density) && density > 0 && density < PARTICLE_DENSITY_KG_PER_CUBIC_METRE) {
            double expected = 1.0 - density / PARTICLE_DENSITY_KG_PER_CUBIC_METRE;
            if (Math.abs(porosity - expected) > POROSITY_CONSISTENCY_TOLERANCE) {
                warning(layer, label, "porosity", num(porosity), "within " + num(POROSITY_CONSISTENCY_TOLERANCE)
                        + " of 1 - bulk density / 2650 kg/m3 = " + round(expected, 3),
                        "check porosity and bulk density together (particle density 2650 kg/m3, common practice)");
            }
        }
        double water = layer.getWaterContent();
        if (!(finite(water) && water > 0 && water < 1)) {
            error(layer, label, "waterContent", num(water), "(0, porosity]",
                    "enter the volumetric water content during flushing as a fraction, e.g. 0.30");
        } else if (porosityOk && water > porosity + 1e-12) {
            error(layer, label, "waterContent", num(water), "(0, porosity = " + num(porosity) + "]",
                    "the water content cannot exceed the porosity; at saturation enter the porosity");
        }
        double foc = layer.getOrganicCarbonFraction();
        if (!(finite(foc) && foc >= 0 && foc < 1)) {
            error(layer, label, "organicCarbonFraction", num(foc), "[0, 1)",
                    "enter foc as a fraction of dry mass, e.g. 0.002 for 0.2 %");
        } else if (foc > 0.2) {
            warning(layer, label, "organicCarbonFraction", num(foc), "usually below 0.2 for mineral soils (common practice)",
                    "check that foc is a fraction, not a percentage (0.2 % = 0.002)");
        }
        double conductivity = layer.getSaturatedConductivityMetresPerDay();
        if (!(finite(conductivity) && conductivity > 0)) {
            error(layer, label, "saturatedConductivityMetresPerDay", num(conductivity), "greater than 0 m/d",
                    "enter the saturated hydraulic conductivity in m/d (1 cm/s = 864 m/d)");
        } else if (conductivity > 1e4) {
            warning(layer, label, "saturatedConductivityMetresPerDay", num(conductivity),
                    "up to about 10000 m/d (clean gravel, common practice)", "check the unit (1 cm/s = 864 m/d)");
        }
        double dispersivity = layer.getDispersivityMetres();
        if (!(finite(dispersivity) && dispersivity > 0)) {
            error(layer, label, "dispersivityMetres", num(dispersivity), "greater than 0 m",
                    "enter the longitudinal dispersivity in metres, e.g. 0.1 x the layer thickness (common practice)");
        } else if (depthsOk && finite(bottom) && bottom > top && dispersivity > bottom - top) {
            warning(layer, label, "dispersivityMetres", num(dispersivity), "at most the layer thickness " + num(bottom - top) + " m",
                    "a dispersivity larger than the flow length is unusual; check the value");
        }
        if (layer.getTextureClass() == null || layer.getTextureClass().isBlank()) {
            warning(layer, label, "textureClass", "(empty)", "not empty", "enter the texture class, e.g. 'sandy loam'");
        }
    }

    private void contaminants(Project project) {
        Set<String> names = new HashSet<>();
        for (int i = 0; i < project.getContaminants().size(); i++) {
            Contaminant c = project.getContaminants().get(i);
            String label = label("Contaminant", c.getName(), i);
            requireName(c, label, c.getName(), Severity.ERROR, "enter the contaminant's name, e.g. 'Benzene'");
            String key = key(c.getName());
            if (!key.isEmpty() && !names.add(key)) {
                error(c, label, "name", quote(c.getName()), "a name no other contaminant has", "remove or rename the duplicate");
            }
            String cas = c.getCasNumber();
            if (cas != null && !cas.isBlank() && !isValidCasNumber(cas.trim())) {
                warning(c, label, "casNumber", quote(cas), "empty or a CAS number with a correct check digit, e.g. 71-43-2",
                        "check the CAS registry number");
            }
            double koc = c.getKocLitresPerKg();
            if (!(finite(koc) && koc >= 0)) {
                error(c, label, "kocLitresPerKg", num(koc), "0 or more L/kg",
                        "enter Koc in L/kg, e.g. from the property library");
            } else if (!c.isKdEntered() && koc == 0) {
                warning(c, label, "kocLitresPerKg", num(koc), "greater than 0 L/kg for a sorbing contaminant",
                        "0 means no sorption (R = 1); enter Koc or a measured Kd");
            }
            double kd = c.getKdLitresPerKg();
            if (!(finite(kd) && kd >= 0)) {
                error(c, label, "kdLitresPerKg", num(kd), "0 or more L/kg", "enter the measured Kd in L/kg");
            }
            double diffusion = c.getDiffusionSquareMetresPerSecond();
            if (!(finite(diffusion) && diffusion > 0)) {
                error(c, label, "diffusionSquareMetresPerSecond", num(diffusion), "greater than 0 m2/s",
                        "enter the free-water diffusion coefficient in m2/s, about 1e-9 for small solutes");
            } else if (diffusion < 1e-10 || diffusion > 5e-9) {
                warning(c, label, "diffusionSquareMetresPerSecond", num(diffusion),
                        "about 1e-10 to 5e-9 m2/s for solutes in water (common practice)",
                        "check the unit: 1e-5 cm2/s = 1e-9 m2/s");
            }
            double halfLife = c.getHalfLifeDays();
            if (!(finite(halfLife) && halfLife >= 0)) {
                error(c, label, "halfLifeDays", num(halfLife), "0 (no decay) or more days", "enter the decay half-life in days, or 0");
            }
        }
    }

    private void cleanupLevels(Project project) {
        Set<Contaminant> seen = new HashSet<>();
        for (int i = 0; i < project.getCleanupLevels().size(); i++) {
            CleanupLevel level = project.getCleanupLevels().get(i);
            Contaminant c = level.getContaminant();
            String label = c == null ? "Cleanup level " + (i + 1) : "Cleanup level for " + quote(c.getName());
            if (c == null) {
                error(level, label, "contaminant", "(none)", "a contaminant of this project", "choose the contaminant");
            } else if (!EcoreUtil.isAncestor(project, c)) {
                error(level, label, "contaminant", quote(c.getName()), "a contaminant of this project", "choose one from this project");
            } else if (!seen.add(c)) {
                error(level, label, "contaminant", quote(c.getName()), "one cleanup level per contaminant", "remove the duplicate level");
            }
            double soil = level.getSoilLevelMilligramsPerKg();
            if (!(finite(soil) && soil > 0)) {
                error(level, label, "soilLevelMilligramsPerKg", num(soil), "greater than 0 mg/kg",
                        "enter the cleanup level in mg/kg of dry soil");
            }
            if (level.getBasis() == null || level.getBasis().isBlank()) {
                warning(level, label, "basis", "(empty)", "not empty", "state where the level comes from (rule, permit, risk assessment)");
            }
        }
        for (Contaminant c : project.getContaminants()) {
            if (!seen.contains(c) && c.getName() != null) {
                warning(c, label("Contaminant", c.getName(), project.getContaminants().indexOf(c)), "cleanupLevels",
                        "(none)", "a cleanup level for each contaminant of concern", "add its cleanup level");
            }
        }
    }

    private void zone(Project project, Site site, TreatmentZone zone, int index) {
        String label = label("Zone", zone.getName(), index);
        requireName(zone, label, zone.getName(), Severity.WARNING, "name the zone");
        double area = zone.getAreaSquareMetres();
        if (!(finite(area) && area > 0)) {
            error(zone, label, "areaSquareMetres", num(area), "greater than 0 m2", "enter the plan area of the zone in m2");
        }
        double top = zone.getTopDepthMetres();
        double bottom = zone.getBottomDepthMetres();
        boolean topOk = atLeast(zone, label, "topDepthMetres", top, 0.0, "[0, bottom depth)",
                "enter the depth of the zone's top below the ground surface in metres");
        if (!finite(bottom) || (topOk && bottom <= top)) {
            error(zone, label, "bottomDepthMetres", num(bottom), "greater than the top depth " + num(top) + " m",
                    "enter the depth of the zone's bottom below the ground surface in metres");
        } else if (!site.getLayers().isEmpty()) {
            double profileTop = site.getLayers().get(0).getTopDepthMetres();
            double profileBottom = site.getLayers().get(site.getLayers().size() - 1).getBottomDepthMetres();
            if (bottom > profileBottom + DEPTH_TOLERANCE_METRES) {
                error(zone, label, "bottomDepthMetres", num(bottom), "at most the bottom of the soil profile, "
                        + num(profileBottom) + " m", "extend the soil layers down to the zone's bottom or raise it");
            }
            if (topOk && top < profileTop - DEPTH_TOLERANCE_METRES) {
                error(zone, label, "topDepthMetres", num(top), "at least the top of the soil profile, " + num(profileTop) + " m",
                        "add the soil layer above or lower the zone's top");
            }
        }
        if (zone.getSourceConcentrations().isEmpty()) {
            warning(zone, label, "sourceConcentrations", "(none)", "at least one contaminant",
                    "enter the representative initial concentration of each contaminant in the zone");
        }
        Set<Contaminant> seen = new HashSet<>();
        for (int i = 0; i < zone.getSourceConcentrations().size(); i++) {
            SourceConcentration source = zone.getSourceConcentrations().get(i);
            Contaminant c = source.getContaminant();
            String sourceLabel = c == null ? "Source concentration " + (i + 1) + " in " + label
                    : "Source concentration of " + quote(c.getName()) + " in " + label;
            if (c == null) {
                error(source, sourceLabel, "contaminant", "(none)", "a contaminant of this project", "choose the contaminant");
            } else if (!EcoreUtil.isAncestor(project, c)) {
                error(source, sourceLabel, "contaminant", quote(c.getName()), "a contaminant of this project",
                        "choose one from this project");
            } else if (!seen.add(c)) {
                error(source, sourceLabel, "contaminant", quote(c.getName()), "one concentration per contaminant and zone",
                        "remove the duplicate");
            }
            double concentration = source.getSoilConcentrationMilligramsPerKg();
            if (!(finite(concentration) && concentration > 0)) {
                error(source, sourceLabel, "soilConcentrationMilligramsPerKg", num(concentration), "greater than 0 mg/kg",
                        "enter the representative initial soil concentration in mg/kg");
                continue;
            }
            CleanupLevel level = levelOf(project, c);
            if (level != null && finite(level.getSoilLevelMilligramsPerKg()) && level.getSoilLevelMilligramsPerKg() > 0
                    && concentration <= level.getSoilLevelMilligramsPerKg()) {
                warning(source, sourceLabel, "soilConcentrationMilligramsPerKg", num(concentration),
                        "above the cleanup level " + num(level.getSoilLevelMilligramsPerKg()) + " mg/kg",
                        "the zone is already below the cleanup level for this contaminant; nothing to treat for it");
            }
        }
    }

    private void flushingDesign(Project project, FlushingDesign design, int index) {
        String label = label("Flushing design", design.getName(), index);
        requireName(design, label, design.getName(), Severity.WARNING, "name the alternative");
        TreatmentZone zone = design.getZone();
        if (zone == null) {
            error(design, label, "zone", "(none)", "a treatment zone of this project", "choose the zone to flush");
        } else if (!EcoreUtil.isAncestor(project, zone)) {
            error(design, label, "zone", quote(zone.getName()), "a treatment zone of this project", "choose one from this project");
        }
        double flux = design.getDarcyFluxMetresPerDay();
        if (!(finite(flux) && flux > 0)) {
            error(design, label, "darcyFluxMetresPerDay", num(flux), "greater than 0 m/d",
                    "enter the applied Darcy flux in m/d (water volume per plan area per day)");
        } else if (zone != null && project.getSite() != null) {
            SoilLayer tightest = tightestLayer(project.getSite(), zone);
            if (tightest != null && flux > tightest.getSaturatedConductivityMetresPerDay()) {
                warning(design, label, "darcyFluxMetresPerDay", num(flux), "at most the saturated conductivity of layer "
                        + quote(tightest.getName()) + ", " + num(tightest.getSaturatedConductivityMetresPerDay()) + " m/d",
                        "a flux above the conductivity needs a hydraulic gradient above 1 (ponding or pressure); check it can be applied");
            }
        }
        double days = design.getOperatingDaysPerWeek();
        if (!(finite(days) && days > 0 && days <= 7)) {
            error(design, label, "operatingDaysPerWeek", num(days), "(0, 7]", "enter the days of operation per week, e.g. 5 or 7");
        }
        double capture = design.getCaptureEfficiency();
        if (!(finite(capture) && capture > 0 && capture <= 1)) {
            error(design, label, "captureEfficiency", num(capture), "(0, 1]",
                    "enter the fraction of flushed water captured, e.g. 0.95 for 95 %");
        }
        // criterion: an EMF enum attribute is never null (setting null restores the default), so no rule.
        double maxPv = design.getMaxPoreVolumes();
        if (!(finite(maxPv) && maxPv >= 1 && maxPv <= 1e6)) {
            error(design, label, "maxPoreVolumes", num(maxPv), "[1, 1000000]",
                    "enter the most pore volumes to search, e.g. 1000");
        }
    }

    // ---- helpers -----------------------------------------------------------------------------------

    private static SoilLayer tightestLayer(Site site, TreatmentZone zone) {
        SoilLayer tightest = null;
        for (SoilLayer layer : site.getLayers()) {
            boolean overlaps = layer.getBottomDepthMetres() > zone.getTopDepthMetres()
                    && layer.getTopDepthMetres() < zone.getBottomDepthMetres();
            double k = layer.getSaturatedConductivityMetresPerDay();
            if (overlaps && finite(k) && k > 0
                    && (tightest == null || k < tightest.getSaturatedConductivityMetresPerDay())) {
                tightest = layer;
            }
        }
        return tightest;
    }

    private static CleanupLevel levelOf(Project project, Contaminant contaminant) {
        for (CleanupLevel level : project.getCleanupLevels()) {
            if (level.getContaminant() == contaminant) {
                return level;
            }
        }
        return null;
    }

    /** True when the text is a CAS registry number with a correct check digit (see {@link CasNumbers}). */
    static boolean isValidCasNumber(String cas) {
        return CasNumbers.isValid(cas);
    }

    private boolean atLeast(EObject object, String label, String field, double value, double minimum,
            String range, String fix) {
        if (!finite(value) || value < minimum) {
            error(object, label, field, num(value), range, fix);
            return false;
        }
        return true;
    }

    private void requireName(EObject object, String label, String name, Severity severity, String fix) {
        if (name == null || name.isBlank()) {
            add(severity, object, label, "name", "(empty)", "not empty", fix);
        }
    }

    private void error(EObject object, String label, String field, String value, String range, String fix) {
        add(Severity.ERROR, object, label, field, value, range, fix);
    }

    private void warning(EObject object, String label, String field, String value, String range, String fix) {
        add(Severity.WARNING, object, label, field, value, range, fix);
    }

    private void add(Severity severity, EObject object, String label, String field, String value, String range, String fix) {
        problems.add(new Problem(severity, object, label, field, value, range, fix));
    }

    private static String layerLabel(SoilLayer layer, int index) {
        return label("Layer", layer.getName(), index);
    }

    private static String label(String kind, String name, int index) {
        if (name != null && !name.isBlank()) {
            return kind + " " + quote(name);
        }
        return index >= 0 ? kind + " " + (index + 1) : kind;
    }

    private static String quote(String text) {
        return "'" + Objects.toString(text, "") + "'";
    }

    private static String key(String name) {
        return name == null ? "" : name.trim().toLowerCase(Locale.ROOT);
    }

    private static boolean finite(double value) {
        return Double.isFinite(value);
    }

    /** A number as the user would type it: 1600 rather than 1600.0, 1.0E-9 kept as is. */
    static String num(double value) {
        if (Double.isFinite(value) && value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return Double.toString(value);
    }

    private static String round(double value, int digits) {
        return String.format(Locale.ROOT, "%." + digits + "f", value);
    }
}
