package eluvia.site.validation;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;

import eluvia.site.files.ProjectFiles;
import eluvia.site.library.CasNumbers;
import eluvia.site.derived.Dispersivities;
import eluvia.site.derived.ZoneGeometry;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ColumnTest;
import eluvia.site.model.ColumnTestPoint;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.PriceBook;
import eluvia.site.model.PriceItem;
import eluvia.site.model.Revision;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.SolutionMethod;
import eluvia.site.model.SorptionIsotherm;
import eluvia.site.model.Vertex;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.RankCorrelation;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySettings;
import eluvia.site.model.VariogramShapeKind;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;

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

    /** Lowest real discount rate a price book may carry, % per year. */
    private static final double MIN_DISCOUNT_RATE_PERCENT = -5;
    /** Highest real discount rate a price book may carry, % per year. */
    private static final double MAX_DISCOUNT_RATE_PERCENT = 30;
    /** The model's default real discount rate, % per year (OMB Circular A-94 (1992)). */
    private static final double DEFAULT_DISCOUNT_RATE_PERCENT = 7.0;

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
        for (int i = 0; i < project.getExcavationDesigns().size(); i++) {
            excavationDesign(project, project.getExcavationDesigns().get(i), i);
        }
        for (int i = 0; i < project.getPriceBooks().size(); i++) {
            priceBook(project.getPriceBooks().get(i), i);
        }
        for (int i = 0; i < project.getColumnTests().size(); i++) {
            columnTest(project, project.getColumnTests().get(i), i);
        }
        for (int i = 0; i < project.getRevisions().size(); i++) {
            revision(project.getRevisions().get(i), i);
        }
        if (project.getUncertainty() != null) {
            uncertainty(project, project.getUncertainty());
        }
        if (project.getZoneAnalysis() != null) {
            zoneAnalysis(project.getZoneAnalysis());
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
        if (!finite(site.getGroundSurfaceElevationMetres())) {
            error(site, label, "groundSurfaceElevationMetres", num(site.getGroundSurfaceElevationMetres()), "a finite elevation in m",
                    "enter the ground surface elevation above the site datum in metres");
        }
        boolean usesCoordinates = !site.getBoundary().isEmpty() || !site.getSamplingLocations().isEmpty()
                || site.getZones().stream().anyMatch(z -> !z.getFootprint().isEmpty());
        if (usesCoordinates && (site.getCoordinateFrame() == null || site.getCoordinateFrame().isBlank())) {
            warning(site, label, "coordinateFrame", "(empty)", "not empty when coordinates are used",
                    "say what the eastings and northings refer to (origin, orientation, datum)");
        }
        polygon(site, label, "boundary", site.getBoundary());
        Set<String> locationNames = new HashSet<>();
        for (int i = 0; i < site.getSamplingLocations().size(); i++) {
            SamplingLocation location = site.getSamplingLocations().get(i);
            samplingLocation(site, location, i);
            String key = key(location.getName());
            if (!key.isEmpty() && !locationNames.add(key)) {
                warning(location, label("Sampling location", location.getName(), i), "name", quote(location.getName()),
                        "a name no other location has", "rename one of the locations");
            }
        }
    }

    /** A polygon is either absent or has at least 3 finite vertices enclosing a positive area. */
    private boolean polygon(EObject owner, String label, String field, List<Vertex> vertices) {
        if (vertices.isEmpty()) {
            return false;
        }
        if (vertices.size() < 3) {
            error(owner, label, field, vertices.size() + " vertices", "none, or at least 3 vertices",
                    "add vertices to close the polygon, or remove them all");
            return false;
        }
        for (int i = 0; i < vertices.size(); i++) {
            Vertex v = vertices.get(i);
            if (!finite(v.getEastingMetres()) || !finite(v.getNorthingMetres())) {
                error(v, label + " vertex " + (i + 1), !finite(v.getEastingMetres()) ? "eastingMetres" : "northingMetres",
                        num(!finite(v.getEastingMetres()) ? v.getEastingMetres() : v.getNorthingMetres()),
                        "a finite coordinate in m", "enter the local easting and northing in metres");
                return false;
            }
        }
        if (ZoneGeometry.polygonAreaSquareMetres(vertices) <= 0) {
            error(owner, label, field, "area 0 m2", "a polygon enclosing a positive area",
                    "the vertices lie on one line; correct them");
            return false;
        }
        return true;
    }

    private void samplingLocation(Site site, SamplingLocation location, int index) {
        String label = label("Sampling location", location.getName(), index);
        requireName(location, label, location.getName(), Severity.WARNING, "name the location, e.g. 'B-12'");
        boolean coordinatesOk = true;
        for (String field : List.of("eastingMetres", "northingMetres", "groundElevationMetres")) {
            double value = (Double) location.eGet(location.eClass().getEStructuralFeature(field));
            if (!finite(value)) {
                error(location, label, field, num(value), "a finite number in m", "enter the value in metres");
                coordinatesOk = false;
            }
        }
        if (coordinatesOk && site.getBoundary().size() >= 3
                && !ZoneGeometry.contains(site.getBoundary(), location.getEastingMetres(), location.getNorthingMetres())) {
            warning(location, label, "eastingMetres", num(location.getEastingMetres()) + ", " + num(location.getNorthingMetres()),
                    "inside the site boundary", "check the coordinates, or extend the site boundary");
        }
        Project project = site.eContainer() instanceof Project p ? p : null;
        for (int i = 0; i < location.getSamples().size(); i++) {
            Sample sample = location.getSamples().get(i);
            String sampleLabel = "Sample " + (i + 1) + " at " + label;
            double top = sample.getTopDepthMetres();
            double bottom = sample.getBottomDepthMetres();
            if (!(finite(top) && top >= 0)) {
                error(sample, sampleLabel, "topDepthMetres", num(top), "0 or more m", "enter the depth below ground in metres");
            } else if (!(finite(bottom) && bottom >= top)) {
                error(sample, sampleLabel, "bottomDepthMetres", num(bottom), "at least the top depth " + num(top) + " m",
                        "enter the bottom of the sampled interval in metres");
            } else if (!site.getLayers().isEmpty()
                    && bottom > site.getLayers().get(site.getLayers().size() - 1).getBottomDepthMetres() + DEPTH_TOLERANCE_METRES) {
                warning(sample, sampleLabel, "bottomDepthMetres", num(bottom), "within the soil profile (to "
                        + num(site.getLayers().get(site.getLayers().size() - 1).getBottomDepthMetres()) + " m)",
                        "extend the soil layers or check the depth");
            }
            Contaminant c = sample.getContaminant();
            if (c == null) {
                error(sample, sampleLabel, "contaminant", "(none)", "a contaminant of this project", "choose the contaminant analysed");
            } else if (project != null && !EcoreUtil.isAncestor(project, c)) {
                error(sample, sampleLabel, "contaminant", quote(c.getName()), "a contaminant of this project", "choose one from this project");
            }
            double concentration = sample.getConcentrationMilligramsPerKg();
            if (!(finite(concentration) && concentration >= 0)) {
                error(sample, sampleLabel, "concentrationMilligramsPerKg", num(concentration), "0 or more mg/kg",
                        "enter the measured concentration in mg/kg of dry soil");
            }
            double limit = sample.getDetectionLimitMilligramsPerKg();
            if (!(finite(limit) && limit >= 0)) {
                error(sample, sampleLabel, "detectionLimitMilligramsPerKg", num(limit), "0 or more mg/kg",
                        "enter the laboratory reporting limit in mg/kg");
            } else if (sample.isNonDetect() && limit <= 0) {
                error(sample, sampleLabel, "detectionLimitMilligramsPerKg", num(limit), "greater than 0 mg/kg for a non-detect",
                        "enter the laboratory reporting limit of the non-detect");
            }
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
        swellAndShrinkage(layer, label);
        boolean entered = layer.getDispersivityRule() == DispersivityRule.ENTERED;
        double scale = layer.getDispersivityScaleMetres();
        if (!(finite(scale) && scale >= 0)) {
            error(layer, label, "dispersivityScaleMetres", num(scale), "0 (the layer thickness) or more m",
                    "enter the flow length for the dispersivity rule in metres, or 0 for the layer thickness");
        } else if (layer.getDispersivityRule() == DispersivityRule.XU_ECKSTEIN_1995 && depthsOk && finite(bottom)
                && !(Dispersivities.scaleMetres(layer) > 1)) {
            error(layer, label, "dispersivityScaleMetres", num(scale), "a flow length above 1 m for Xu and Eckstein (1995)"
                    + (scale == 0 ? " (0 uses the thickness " + num(bottom - top) + " m)" : ""),
                    "choose the rule alpha_L = 0.1 L, enter the dispersivity, or give a flow length above 1 m");
        }
        double dispersivity = layer.getDispersivityMetres();
        if (!entered) {
            // the entered value is not used; nothing to check
        } else if (!(finite(dispersivity) && dispersivity > 0)) {
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

    private void swellAndShrinkage(SoilLayer layer, String label) {
        double swell = layer.getSwellFactor();
        if (!(finite(swell) && swell >= 0 && swell <= 1)) {
            error(layer, label, "swellFactor", num(swell), "[0, 1]", "enter the swell as a fraction: loose = bank x (1 + swell), e.g. 0.25");
        } else if (swell > 0.6) {
            warning(layer, label, "swellFactor", num(swell), "up to about 0.6 for soils (clay 30-60 %; rock 50-80 %, Peurifoy Table 4-1)",
                    "check the value; a swell above 0.6 is rock rather than soil");
        }
        double shrinkage = layer.getShrinkageFactor();
        if (!(finite(shrinkage) && shrinkage >= 0 && shrinkage < 0.5)) {
            error(layer, label, "shrinkageFactor", num(shrinkage), "[0, 0.5)",
                    "enter the shrinkage as a fraction: compacted = bank x (1 - shrinkage), e.g. 0.10");
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
            isotherm(c, label);
            nonequilibrium(c, label);
            double solubility = c.getWaterSolubilityMilligramsPerLitre();
            if (!(finite(solubility) && solubility >= 0)) {
                error(c, label, "waterSolubilityMilligramsPerLitre", num(solubility), "0 (not given) or more mg/L",
                        "enter the solubility in water in mg/L, or 0");
            }
            if (c.getPropertySource() == null || c.getPropertySource().isBlank()) {
                warning(c, label, "propertySource", "(empty)", "not empty", "state where Koc and the other values come from");
            }
        }
    }

    private void isotherm(Contaminant c, String label) {
        if (c.getIsotherm() == SorptionIsotherm.FREUNDLICH) {
            positive(c, label, "freundlichKfMgPerKgPerMgPerLitreToN", c.getFreundlichKfMgPerKgPerMgPerLitreToN(),
                    "(mg/kg)/(mg/L)^n", "enter Kf of S = Kf C^n with S in mg/kg and C in mg/L");
            double n = c.getFreundlichExponent();
            if (!(finite(n) && n > 0)) {
                error(c, label, "freundlichExponent", num(n), "greater than 0", "enter the Freundlich exponent n, e.g. 0.9");
            } else if (n < 0.3 || n > 1.5) {
                warning(c, label, "freundlichExponent", num(n), "usually 0.3 to 1.5 (common practice)", "check the exponent");
            }
        } else if (c.getIsotherm() == SorptionIsotherm.LANGMUIR) {
            positive(c, label, "langmuirMaximumMilligramsPerKg", c.getLangmuirMaximumMilligramsPerKg(), "mg/kg",
                    "enter the sorption maximum Smax in mg/kg");
            positive(c, label, "langmuirConstantLitresPerMilligram", c.getLangmuirConstantLitresPerMilligram(), "L/mg",
                    "enter the Langmuir constant K in L/mg");
        }
    }

    private void nonequilibrium(Contaminant c, String label) {
        NonequilibriumEntry entry = c.getNonequilibrium();
        if (entry == NonequilibriumEntry.DIMENSIONLESS) {
            fraction(c, label, "beta", c.getBeta(), false, "enter beta in (0, 1]; 1 is equilibrium");
            double omega = c.getOmega();
            if (!(finite(omega) && omega >= 0)) {
                error(c, label, "omega", num(omega), "0 or more", "enter the dimensionless mass-transfer coefficient omega");
            }
        } else if (entry == NonequilibriumEntry.PHYSICAL || entry == NonequilibriumEntry.CHEMICAL) {
            if (entry == NonequilibriumEntry.PHYSICAL) {
                fraction(c, label, "mobileWaterFraction", c.getMobileWaterFraction(), false,
                        "enter the mobile share of the water content, theta_m / theta, in (0, 1]");
            }
            double f = c.getMobileSiteFraction();
            if (!(finite(f) && f >= 0 && f <= 1)) {
                error(c, label, "mobileSiteFraction", num(f), "[0, 1]", entry == NonequilibriumEntry.PHYSICAL
                        ? "enter the fraction f of sorption sites in contact with mobile water"
                        : "enter the fraction F of instantaneous sorption sites");
            }
            double rate = c.getMassTransferRatePerDay();
            if (!(finite(rate) && rate >= 0)) {
                error(c, label, "massTransferRatePerDay", num(rate), "0 or more 1/d", "enter the first-order rate in 1/d");
            }
        }
    }

    private void positive(EObject object, String label, String field, double value, String unit, String fix) {
        if (!(finite(value) && value > 0)) {
            error(object, label, field, num(value), "greater than 0 " + unit, fix);
        }
    }

    private void fraction(EObject object, String label, String field, double value, boolean zeroAllowed, String fix) {
        if (!(finite(value) && (zeroAllowed ? value >= 0 : value > 0) && value <= 1)) {
            error(object, label, field, num(value), zeroAllowed ? "[0, 1]" : "(0, 1]", fix);
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
            if (!level.isSoilLevelEntered() && !level.isPorewaterLevelEntered()) {
                error(level, label, "soilLevelEntered", "false", "a soil level, a pore-water level or both",
                        "tick the level(s) that apply and enter them");
            }
            if (level.isSoilLevelEntered() && !(finite(soil) && soil > 0)) {
                error(level, label, "soilLevelMilligramsPerKg", num(soil), "greater than 0 mg/kg",
                        "enter the cleanup level in mg/kg of dry soil");
            }
            double water = level.getPorewaterLevelMilligramsPerLitre();
            if (level.isPorewaterLevelEntered() && !(finite(water) && water > 0)) {
                error(level, label, "porewaterLevelMilligramsPerLitre", num(water), "greater than 0 mg/L",
                        "enter the pore-water cleanup level in mg/L");
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
        boolean footprintOk = polygon(zone, label, "footprint", zone.getFootprint());
        if (zone.getFootprint().isEmpty() && !(finite(area) && area > 0)) {
            error(zone, label, "areaSquareMetres", num(area), "greater than 0 m2", "enter the plan area of the zone in m2, or draw its footprint");
        } else if (footprintOk) {
            double polygonArea = ZoneGeometry.polygonAreaSquareMetres(zone.getFootprint());
            if (area != 0 && Math.abs(area - polygonArea) > 0.01 * polygonArea) {
                warning(zone, label, "areaSquareMetres", num(area), "0 or the footprint's area " + round(polygonArea, 1) + " m2",
                        "the footprint polygon gives the area; the entered area is not used");
            }
            if (site.getBoundary().size() >= 3) {
                for (Vertex v : zone.getFootprint()) {
                    if (!ZoneGeometry.contains(site.getBoundary(), v.getEastingMetres(), v.getNorthingMetres())) {
                        error(zone, label, "footprint", "vertex (" + num(v.getEastingMetres()) + ", " + num(v.getNorthingMetres()) + ")",
                                "inside the site boundary", "move the zone's vertices inside the site, or extend the site boundary");
                        break;
                    }
                }
            }
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
            napl(site, zone, source, sourceLabel, c, concentration);
            CleanupLevel level = levelOf(project, c);
            if (level != null && finite(level.getSoilLevelMilligramsPerKg()) && level.getSoilLevelMilligramsPerKg() > 0
                    && concentration <= level.getSoilLevelMilligramsPerKg()) {
                warning(source, sourceLabel, "soilConcentrationMilligramsPerKg", num(concentration),
                        "above the cleanup level " + num(level.getSoilLevelMilligramsPerKg()) + " mg/kg",
                        "the zone is already below the cleanup level for this contaminant; nothing to treat for it");
            }
        }
    }

    /**
     * Pore-water concentration of a total soil concentration at linear equilibrium,
     * C_w = C_T / (Kd + theta / rho_b) (rho_b in kg/L), compared with the solubility: above it a
     * non-aqueous phase is probably present.
     */
    private void napl(Site site, TreatmentZone zone, SourceConcentration source, String sourceLabel, Contaminant c,
            double concentration) {
        if (c == null || !(c.getWaterSolubilityMilligramsPerLitre() > 0) || c.getIsotherm() != SorptionIsotherm.LINEAR) {
            return;
        }
        for (SoilLayer layer : site.getLayers()) {
            boolean overlaps = layer.getBottomDepthMetres() > zone.getTopDepthMetres() && layer.getTopDepthMetres() < zone.getBottomDepthMetres();
            double rhoKgPerLitre = layer.getBulkDensityKgPerCubicMetre() / 1000.0;
            double kd = c.isKdEntered() ? c.getKdLitresPerKg() : c.getKocLitresPerKg() * layer.getOrganicCarbonFraction();
            double denominator = kd + layer.getWaterContent() / rhoKgPerLitre;
            if (overlaps && rhoKgPerLitre > 0 && denominator > 0) {
                double porewater = concentration / denominator;
                if (porewater > c.getWaterSolubilityMilligramsPerLitre()) {
                    warning(source, sourceLabel, "soilConcentrationMilligramsPerKg", num(concentration),
                            "below " + round(c.getWaterSolubilityMilligramsPerLitre() * denominator, 1) + " mg/kg in layer "
                                    + quote(layer.getName()) + ", where pore water would reach the solubility "
                                    + num(c.getWaterSolubilityMilligramsPerLitre()) + " mg/L",
                            "a non-aqueous phase (NAPL) is probably present; the flushing estimates assume dissolved and sorbed contaminant only");
                    return;
                }
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
        if (design.getSolutionMethod() == SolutionMethod.TWO_REGION && zone != null
                && zone.getSourceConcentrations().stream().map(SourceConcentration::getContaminant)
                        .allMatch(c -> c == null || c.getNonequilibrium() == NonequilibriumEntry.EQUILIBRIUM)) {
            warning(design, label, "solutionMethod", "TWO_REGION", "a contaminant with nonequilibrium parameters",
                    "enter beta and omega (or the physical or chemical parameters) for the zone's contaminants, or choose EQUILIBRIUM");
        }
        int cells = design.getNumericalCellCount();
        if (cells < 10 || cells > 100_000) {
            error(design, label, "numericalCellCount", Integer.toString(cells), "[10, 100000]",
                    "enter the number of cells of the numerical solution, e.g. 200");
        }
        double tolerance = design.getNumericalRelativeTolerance();
        if (!(finite(tolerance) && tolerance > 0 && tolerance <= 0.01)) {
            error(design, label, "numericalRelativeTolerance", num(tolerance), "(0, 0.01]", "enter a relative accuracy, e.g. 1e-6");
        }
        positive(design, label, "monitoringIntervalDays", design.getMonitoringIntervalDays(), "d",
                "enter the days between effluent samplings, e.g. 7");
        double dose = design.getAmendmentDoseKilogramsPerCubicMetre();
        if (!(finite(dose) && dose >= 0)) {
            error(design, label, "amendmentDoseKilogramsPerCubicMetre", num(dose), "0 (plain water) or more kg/m3",
                    "enter the amendment dose in kg per m3 of flushing solution");
        } else if (dose > 0 && (design.getAmendmentName() == null || design.getAmendmentName().isBlank())) {
            warning(design, label, "amendmentName", "(empty)", "the amendment's name when a dose is given", "name the amendment");
        }
        priceBookOf(project, design, label, design.getPriceBook());
    }

    private void priceBookOf(Project project, EObject design, String label, PriceBook book) {
        if (book == null) {
            warning(design, label, "priceBook", "(none)", "a price book of this project", "choose the price book to cost this alternative");
        } else if (!EcoreUtil.isAncestor(project, book)) {
            error(design, label, "priceBook", quote(book.getName()), "a price book of this project", "choose one from this project");
        }
    }

    private void excavationDesign(Project project, ExcavationDesign design, int index) {
        String label = label("Excavation design", design.getName(), index);
        requireName(design, label, design.getName(), Severity.WARNING, "name the alternative");
        TreatmentZone zone = design.getZone();
        if (zone == null) {
            error(design, label, "zone", "(none)", "a treatment zone of this project", "choose the zone to dig out");
        } else if (!EcoreUtil.isAncestor(project, zone)) {
            error(design, label, "zone", quote(zone.getName()), "a treatment zone of this project", "choose one from this project");
        }
        double slope = design.getSideSlopeHorizontalPerVertical();
        double steepest = steepestSlope(design.getSoilType());
        if (!(finite(slope) && slope >= 0 && slope <= 10)) {
            error(design, label, "sideSlopeHorizontalPerVertical", num(slope), "[0, 10] (horizontal per vertical)",
                    "enter the side slope as H:V, e.g. 1.5 for 1.5 H : 1 V");
        } else if (slope < steepest) {
            warning(design, label, "sideSlopeHorizontalPerVertical", num(slope), "at least " + num(steepest) + " H : 1 V for "
                    + design.getSoilType() + " (US OSHA 29 CFR 1926 Subpart P App. B Table B-1, excavations under 20 ft)",
                    "flatten the slope or plan a protective system; follow the rules where the site is");
        }
        double overdig = design.getOverdigMetres();
        if (!(finite(overdig) && overdig >= 0)) {
            error(design, label, "overdigMetres", num(overdig), "0 or more m", "enter the extra depth dug beyond the zone in metres");
        }
        positive(design, label, "truckHeapedCapacityCubicMetres", design.getTruckHeapedCapacityCubicMetres(), "m3",
                "enter the heaped capacity of one truck in m3, e.g. 15");
        positive(design, label, "truckPayloadKilograms", design.getTruckPayloadKilograms(), "kg",
                "enter the legal payload of one truck in kg, e.g. 20000");
        priceBookOf(project, design, label, design.getPriceBook());
    }

    /** Maximum allowable slopes, H per V (US OSHA 29 CFR 1926 Subpart P App. B Table B-1 [PUB]). */
    static double steepestSlope(ExcavationSoilType type) {
        return switch (type) {
            case STABLE_ROCK -> 0.0;
            case TYPE_A -> 0.75;
            case TYPE_B -> 1.0;
            case TYPE_C -> 1.5;
        };
    }

    private void priceBook(PriceBook book, int index) {
        String label = label("Price book", book.getName(), index);
        requireName(book, label, book.getName(), Severity.WARNING, "name the price book");
        boolean bookCurrency = book.getCurrency() != null && !book.getCurrency().isBlank();
        if (bookCurrency && !book.getCurrency().trim().matches("[A-Z]{3}")) {
            warning(book, label, "currency", quote(book.getCurrency()), "a three-letter ISO 4217 code, e.g. USD or EUR", "enter the currency code");
        }
        if (book.getReference() == null || book.getReference().isBlank()) {
            warning(book, label, "reference", "(empty)", "not empty", "state where the rates come from and their price date");
        }
        // Markups: per cent of a subtotal (EPA 540-R-00-002 layout); the guide's usual ranges depend
        // on the project and are not checked here, only that a percentage is a percentage.
        percent(book, label, "scopeContingencyPercent", book.getScopeContingencyPercent());
        percent(book, label, "bidContingencyPercent", book.getBidContingencyPercent());
        percent(book, label, "projectManagementPercent", book.getProjectManagementPercent());
        percent(book, label, "remedialDesignPercent", book.getRemedialDesignPercent());
        percent(book, label, "constructionManagementPercent", book.getConstructionManagementPercent());
        percent(book, label, "operatingContingencyPercent", book.getOperatingContingencyPercent());
        percent(book, label, "operatingProjectManagementPercent", book.getOperatingProjectManagementPercent());
        percent(book, label, "technicalSupportPercent", book.getTechnicalSupportPercent());
        double discountRatePercent = book.getDiscountRatePercent();
        if (!(finite(discountRatePercent) && discountRatePercent >= MIN_DISCOUNT_RATE_PERCENT
                && discountRatePercent <= MAX_DISCOUNT_RATE_PERCENT)) {
            error(book, label, "discountRatePercent", num(discountRatePercent), "-5 to 30 % per year",
                    "enter the real discount rate in % per year (7 for 7 %)");
        } else if (discountRatePercent != DEFAULT_DISCOUNT_RATE_PERCENT
                && (book.getDiscountRateBasis() == null || book.getDiscountRateBasis().isBlank())) {
            warning(book, label, "discountRateBasis", "(empty)", "not empty when the discount rate is not the default 7 %",
                    "state which rule or guidance the " + num(discountRatePercent) + " % rate follows");
        }
        Set<String> codes = new HashSet<>();
        for (int i = 0; i < book.getItems().size(); i++) {
            PriceItem item = book.getItems().get(i);
            String itemLabel = label("Price item", item.getName(), i) + " in " + label;
            requireName(item, itemLabel, item.getName(), Severity.WARNING, "say what is priced");
            String code = key(item.getCode());
            if (code.isEmpty()) {
                warning(item, itemLabel, "code", "(empty)", "not empty", "give the item a short code, e.g. excavation.bank");
            } else if (!codes.add(code)) {
                error(item, itemLabel, "code", quote(item.getCode()), "a code no other item of the book has", "rename the duplicate code");
            }
            if (item.getUnit() == null || item.getUnit().isBlank()) {
                error(item, itemLabel, "unit", "(empty)", "not empty", "enter the unit the rate is per, e.g. m3");
            }
            double rate = item.getRatePerUnit();
            if (!(finite(rate) && rate >= 0)) {
                error(item, itemLabel, "ratePerUnit", num(rate), "0 or more", "enter the rate per unit");
            }
            boolean itemCurrency = item.getCurrency() != null && !item.getCurrency().isBlank();
            if (!itemCurrency && !bookCurrency) {
                error(item, itemLabel, "currency", "(empty)", "a currency here or on the price book", "enter the currency, e.g. USD");
            } else if (itemCurrency && !item.getCurrency().trim().matches("[A-Z]{3}")) {
                warning(item, itemLabel, "currency", quote(item.getCurrency()), "a three-letter ISO 4217 code", "enter the currency code");
            }
            if (item.getSourceNote() == null || item.getSourceNote().isBlank()) {
                warning(item, itemLabel, "sourceNote", "(empty)", "not empty", "say where this rate comes from");
            }
        }
    }

    private void columnTest(Project project, ColumnTest test, int index) {
        String label = label("Column test", test.getName(), index);
        requireName(test, label, test.getName(), Severity.WARNING, "name the test");
        Contaminant c = test.getContaminant();
        if (c == null) {
            error(test, label, "contaminant", "(none)", "a contaminant of this project", "choose the contaminant tested");
        } else if (!EcoreUtil.isAncestor(project, c)) {
            error(test, label, "contaminant", quote(c.getName()), "a contaminant of this project", "choose one from this project");
        }
        if (test.getLayer() != null && !EcoreUtil.isAncestor(project, test.getLayer())) {
            error(test, label, "layer", quote(test.getLayer().getName()), "a soil layer of this project or none", "choose one from this project");
        }
        positive(test, label, "columnLengthMetres", test.getColumnLengthMetres(), "m", "enter the length of the soil column in metres");
        positive(test, label, "darcyFluxMetresPerDay", test.getDarcyFluxMetresPerDay(), "m/d", "enter the Darcy flux through the column in m/d");
        double water = test.getWaterContent();
        if (!(finite(water) && water > 0 && water < 1)) {
            error(test, label, "waterContent", num(water), "(0, 1)", "enter the column's volumetric water content as a fraction");
        }
        double density = test.getBulkDensityKgPerCubicMetre();
        if (!(finite(density) && density > 0 && density < PARTICLE_DENSITY_KG_PER_CUBIC_METRE)) {
            error(test, label, "bulkDensityKgPerCubicMetre", num(density), "(0, 2650) kg/m3", "enter the column's dry bulk density in kg/m3");
        }
        positive(test, label, "referenceConcentrationMilligramsPerLitre", test.getReferenceConcentrationMilligramsPerLitre(), "mg/L",
                "enter C0 in mg/L");
        if (test.getPoints().size() < 2) {
            warning(test, label, "points", test.getPoints().size() + " points", "at least 2 points", "enter the measured curve");
        }
        double previous = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < test.getPoints().size(); i++) {
            ColumnTestPoint point = test.getPoints().get(i);
            String pointLabel = "Point " + (i + 1) + " of " + label;
            double pv = point.getPoreVolumes();
            if (!(finite(pv) && pv >= 0)) {
                error(point, pointLabel, "poreVolumes", num(pv), "0 or more", "enter the pore volumes passed");
            } else if (pv <= previous) {
                error(point, pointLabel, "poreVolumes", num(pv), "greater than the previous point's " + num(previous),
                        "enter the points in increasing pore volumes");
            }
            previous = finite(pv) ? Math.max(previous, pv) : previous;
            double cc0 = point.getRelativeConcentration();
            if (!(finite(cc0) && cc0 >= 0)) {
                error(point, pointLabel, "relativeConcentration", num(cc0), "0 or more", "enter C/C0");
            } else if (cc0 > 1.2) {
                warning(point, pointLabel, "relativeConcentration", num(cc0), "up to about 1.2 (measurement scatter above 1)",
                        "check C0 and the measured concentration");
            }
        }
    }

    private void revision(Revision revision, int index) {
        String label = "Revision " + (index + 1);
        if (revision.getAuthor() == null || revision.getAuthor().isBlank()) {
            warning(revision, label, "author", "(empty)", "not empty", "say who made the change");
        }
        if (revision.getTimestamp() == null) {
            warning(revision, label, "timestamp", "(none)", "a date and time", "enter when the change was made");
        }
        if (revision.getSummary() == null || revision.getSummary().isBlank()) {
            warning(revision, label, "summary", "(empty)", "not empty", "say what changed");
        }
    }

    // ---- zone analysis -------------------------------------------------------------------------

    /** The largest inverse-distance power (as eluvia.zone InverseDistanceWeighting.MAX_POWER). */
    static final double MAX_INVERSE_DISTANCE_POWER = 20.0;
    /** The most neighbours per block (as eluvia.zone OrdinaryKriging.MAX_NEIGHBOURS). */
    static final int MAX_ZONE_NEIGHBOURS = 200;
    /** The largest vertical distance factor (as eluvia.zone SampleSet.MAX_VERTICAL_DISTANCE_FACTOR). */
    static final double MAX_VERTICAL_DISTANCE_FACTOR = 1000.0;
    /** The largest block plan size, m (as eluvia.design DesignSettings). */
    static final double MAX_BLOCK_PLAN_SIZE_METRES = 1000.0;
    /** The largest block depth, m (as eluvia.design DesignSettings). */
    static final double MAX_BLOCK_DEPTH_METRES = 100.0;
    /** The longest delay before the remedy starts, years (as eluvia.design DesignSettings). */
    static final double MAX_DELAY_YEARS = 100.0;
    /** The largest hot-spot multiple of the cleanup level (as eluvia.design DesignSettings). */
    static final double MAX_HOT_SPOT_MULTIPLE = 1e6;

    private void zoneAnalysis(ZoneAnalysisSettings z) {
        String label = "Zone analysis settings";
        double power = z.getInverseDistancePower();
        if (!(finite(power) && power > 0 && power <= MAX_INVERSE_DISTANCE_POWER)) {
            error(z, label, "inverseDistancePower", num(power), "(0, " + num(MAX_INVERSE_DISTANCE_POWER) + "] (dimensionless)",
                    "enter the power of the inverse-distance weights; 2 is common practice");
        }
        int neighbours = z.getMaximumNeighbours();
        if (neighbours < 1 || neighbours > MAX_ZONE_NEIGHBOURS) {
            error(z, label, "maximumNeighbours", Integer.toString(neighbours), "1 to " + MAX_ZONE_NEIGHBOURS,
                    "enter the most samples used per block; 16 is common practice");
        }
        double radius = z.getSearchRadiusMetres();
        if (!(finite(radius) && radius >= 0)) {
            error(z, label, "searchRadiusMetres", num(radius), "0 (automatic) or greater, finite, m",
                    "enter the search radius in metres (vertically scaled), or 0 for the automatic choice");
        }
        double factor = z.getVerticalDistanceFactor();
        if (!(finite(factor) && factor > 0 && factor <= MAX_VERTICAL_DISTANCE_FACTOR)) {
            error(z, label, "verticalDistanceFactor", num(factor), "(0, " + num(MAX_VERTICAL_DISTANCE_FACTOR) + "] (dimensionless)",
                    "enter the horizontal over the vertical range of correlation; 1 is isotropic, 10 the stated default");
        }
        double plan = z.getBlockPlanSizeMetres();
        if (!(finite(plan) && plan >= 0 && plan <= MAX_BLOCK_PLAN_SIZE_METRES)) {
            error(z, label, "blockPlanSizeMetres", num(plan), "0 (automatic) to " + num(MAX_BLOCK_PLAN_SIZE_METRES) + " m",
                    "enter the plan size of a block in metres, or 0 for the automatic choice");
        }
        double depth = z.getBlockDepthMetres();
        if (!(finite(depth) && depth >= 0 && depth <= MAX_BLOCK_DEPTH_METRES)) {
            error(z, label, "blockDepthMetres", num(depth), "0 (automatic) to " + num(MAX_BLOCK_DEPTH_METRES) + " m",
                    "enter the depth of a block in metres, or 0 for the automatic choice");
        }
        double nugget = z.getVariogramNuggetMgPerKgSquared();
        double sill = z.getVariogramSillMgPerKgSquared();
        double range = z.getVariogramRangeMetres();
        boolean rangeOk = finite(range) && range >= 0;
        if (!rangeOk) {
            error(z, label, "variogramRangeMetres", num(range), "0 (automatic first guess) or greater, finite, m (scaled)",
                    "enter the range read from the experimental variogram, or 0 for the automatic first guess");
        }
        boolean sillOk = finite(sill) && sill >= 0;
        if (!sillOk) {
            error(z, label, "variogramSillMgPerKgSquared", num(sill), "0 or greater, finite, (mg/kg)^2",
                    "enter the total sill (nugget included) read from the experimental variogram");
        } else if (rangeOk && range > 0 && !(sill > 0)) {
            error(z, label, "variogramSillMgPerKgSquared", num(sill), "greater than 0 (mg/kg)^2 when the range is given",
                    "enter the total sill read from the experimental variogram, or set the range to 0 for the automatic first guess");
        }
        if (!(finite(nugget) && nugget >= 0)) {
            error(z, label, "variogramNuggetMgPerKgSquared", num(nugget), "0 or greater, finite, (mg/kg)^2",
                    "enter the nugget read from the experimental variogram, 0 for none");
        } else if (rangeOk && range > 0 && sillOk && sill > 0 && !(nugget < sill)) {
            error(z, label, "variogramNuggetMgPerKgSquared", num(nugget), "0 to less than the sill " + num(sill) + " (mg/kg)^2",
                    "the sill includes the nugget: enter a nugget below the sill, or raise the sill");
        } else if (rangeOk && range == 0 && (nugget > 0 || sillOk && sill > 0)) {
            warning(z, label, "variogramNuggetMgPerKgSquared", num(nugget), "0 when the range is 0 (automatic first guess)",
                    "the automatic first guess ignores the nugget and the sill: enter the range too, or clear the nugget and the sill");
        }
        if (rangeOk && range == 0 && z.getVariogramModel() != VariogramShapeKind.SPHERICAL) {
            warning(z, label, "variogramModel", z.getVariogramModel().getName(), "SPHERICAL when the range is 0 (automatic first guess)",
                    "the automatic first guess is spherical: enter the nugget, sill and range of the chosen shape");
        }
        if (z.getEstimator() == ZoneEstimatorKind.INVERSE_DISTANCE && rangeOk && range > 0) {
            warning(z, label, "estimator", z.getEstimator().getName(), "ORDINARY_KRIGING when a variogram is entered",
                    "the variogram is used by ordinary kriging only: choose ORDINARY_KRIGING, or set the range to 0");
        }
        List<Double> delays = z.getDelayYears();
        for (int i = 0; i < delays.size(); i++) {
            double d = delays.get(i);
            if (!(finite(d) && d >= 0 && d <= MAX_DELAY_YEARS) || i > 0 && !(d > delays.get(i - 1))) {
                List<String> text = new ArrayList<>();
                for (double each : delays) {
                    text.add(num(each));
                }
                error(z, label, "delayYears", String.join(" ", text), "increasing delays, each 0 to " + num(MAX_DELAY_YEARS) + " years",
                        "list the delays in years in increasing order, e.g. 0 1 2 5 10; none for that default");
                break;
            }
        }
        double transverse = z.getTransverseDispersivityFraction();
        if (!(finite(transverse) && transverse > 0 && transverse <= 1)) {
            error(z, label, "transverseDispersivityFraction", num(transverse), "(0, 1] (dimensionless)",
                    "enter transverse over longitudinal dispersivity; 0.1 by common practice");
        }
        double hotSpot = z.getHotSpotMultiple();
        if (!(finite(hotSpot) && hotSpot > 1 && hotSpot <= MAX_HOT_SPOT_MULTIPLE)) {
            error(z, label, "hotSpotMultiple", num(hotSpot), "(1, " + num(MAX_HOT_SPOT_MULTIPLE) + "] (dimensionless)",
                    "enter the multiple of the cleanup level above which the hybrid digs the soil out, e.g. 10");
        }
    }

    // ---- uncertainty ---------------------------------------------------------------------------

    /** The fewest Monte Carlo runs (as eluvia.design's simulation settings). */
    static final int MIN_UNCERTAINTY_RUNS = 2;
    /** The most Monte Carlo runs (as eluvia.design's simulation settings). */
    static final int MAX_UNCERTAINTY_RUNS = 10_000_000;

    private void uncertainty(Project project, UncertaintySettings settings) {
        String label = "Uncertainty settings";
        int runs = settings.getRunCount();
        if (runs < MIN_UNCERTAINTY_RUNS || runs > MAX_UNCERTAINTY_RUNS) {
            error(settings, label, "runCount", Integer.toString(runs), MIN_UNCERTAINTY_RUNS + " to " + MAX_UNCERTAINTY_RUNS,
                    "enter the number of Monte Carlo runs; 1,000 to 10,000 is usual");
        }
        int inputs = settings.getInputs().size();
        if (runs >= MIN_UNCERTAINTY_RUNS && !settings.getRankCorrelations().isEmpty() && runs <= inputs + 1) {
            // the rank correlation is imposed through the Cholesky factor of the sample correlation
            // of all inputs' scores, which is positive definite only with more runs than inputs + 1
            error(settings, label, "runCount", Integer.toString(runs),
                    "more than " + (inputs + 1) + " (the number of uncertain inputs + 1) when rank correlations are set",
                    "raise the number of runs (1,000 to 10,000 is usual) or remove the rank correlations");
        }
        if (settings.isEnabled() && settings.getInputs().isEmpty()) {
            warning(settings, label, "enabled", "true", "true only with at least one uncertain input",
                    "add the uncertain inputs, or switch the uncertainty analysis off");
        }
        Set<String> names = new HashSet<>();
        Set<String> varied = new HashSet<>();
        for (int i = 0; i < settings.getInputs().size(); i++) {
            UncertainInput input = settings.getInputs().get(i);
            String inputLabel = label("Uncertain input", input.getName(), i);
            String key = key(input.getName());
            if (!key.isEmpty() && !names.add(key)) {
                error(input, inputLabel, "name", quote(input.getName()), "a name no other uncertain input has",
                        "rename one of the inputs so that results can be told apart");
            }
            EObject target = input.getTarget();
            boolean targetOk = false;
            if (target == null) {
                error(input, inputLabel, "target", "(none)", "an object of this project",
                        "choose the object whose value is uncertain, e.g. a soil layer or a flushing design");
            } else if (!EcoreUtil.isAncestor(project, target)) {
                error(input, inputLabel, "target", target.eClass().getName(), "an object of this project",
                        "choose an object of this project; the one chosen was removed or belongs to another project");
            } else {
                targetOk = true;
            }
            if (targetOk && uncertainFeature(input, inputLabel, target)
                    && !varied.add(EcoreUtil.getURI(target).fragment() + "#" + input.getFeatureName())) {
                error(input, inputLabel, "featureName", quote(input.getFeatureName()),
                        "a value no other uncertain input varies on the same object", "remove the duplicate input");
            }
            distribution(input, inputLabel);
        }
        Set<String> pairs = new HashSet<>();
        for (int i = 0; i < settings.getRankCorrelations().size(); i++) {
            RankCorrelation correlation = settings.getRankCorrelations().get(i);
            String correlationLabel = "Rank correlation " + (i + 1);
            UncertainInput first = correlation.getFirst();
            UncertainInput second = correlation.getSecond();
            boolean firstOk = correlated(settings, correlation, correlationLabel, "first", first);
            boolean secondOk = correlated(settings, correlation, correlationLabel, "second", second);
            if (firstOk && secondOk) {
                int a = settings.getInputs().indexOf(first);
                int b = settings.getInputs().indexOf(second);
                if (a == b) {
                    error(correlation, correlationLabel, "second", "input " + (b + 1), "an input other than the first",
                            "a value is always fully correlated with itself; choose two different inputs");
                } else if (!pairs.add(Math.min(a, b) + "-" + Math.max(a, b))) {
                    error(correlation, correlationLabel, "second", "input " + (b + 1),
                            "a pair no other rank correlation names", "remove the duplicate correlation");
                }
            }
            double r = correlation.getCoefficient();
            if (!(finite(r) && r > -1 && r < 1)) {
                error(correlation, correlationLabel, "coefficient", num(r), "(-1, 1) (dimensionless)",
                        "enter the Spearman rank correlation, e.g. -0.5; exactly -1 or 1 would make the two inputs one");
            }
        }
    }

    /** Checks that the input's feature is a changeable, single-valued double attribute of its target. */
    private boolean uncertainFeature(UncertainInput input, String label, EObject target) {
        String name = input.getFeatureName();
        if (name == null || name.isBlank()) {
            error(input, label, "featureName", "(empty)", "the name of a number of the target",
                    "enter the name of the value that varies, e.g. " + exampleFeatures(target));
            return false;
        }
        EStructuralFeature feature = target.eClass().getEStructuralFeature(name);
        if (!(feature instanceof EAttribute attribute)) {
            error(input, label, "featureName", quote(name), "a number of a " + target.eClass().getName() + ": "
                    + exampleFeatures(target), "choose one of the listed names (spelled as shown)");
            return false;
        }
        Class<?> type = attribute.getEAttributeType().getInstanceClass();
        if (type != double.class && type != Double.class || attribute.isMany()) {
            error(input, label, "featureName", quote(name), "a number of a " + target.eClass().getName() + ": "
                    + exampleFeatures(target), "'" + name + "' is not a single number; choose one of the listed names");
            return false;
        }
        if (!attribute.isChangeable() || attribute.isDerived()) {
            error(input, label, "featureName", quote(name), "a value that is entered, not derived: "
                    + exampleFeatures(target), "'" + name + "' is computed from other values; make those uncertain instead");
            return false;
        }
        return true;
    }

    /** The changeable double attributes of the target's class, for messages. */
    private static String exampleFeatures(EObject target) {
        List<String> names = new ArrayList<>();
        for (EAttribute attribute : target.eClass().getEAllAttributes()) {
            Class<?> type = attribute.getEAttributeType().getInstanceClass();
            if ((type == double.class || type == Double.class) && !attribute.isMany() && attribute.isChangeable()
                    && !attribute.isDerived()) {
                names.add(attribute.getName());
            }
        }
        return names.isEmpty() ? "(this object has no numbers that can vary)" : String.join(", ", names);
    }

    private void distribution(UncertainInput input, String label) {
        switch (input.getDistribution()) {
        case NORMAL -> {
            if (!finite(input.getMeanInFeatureUnit())) {
                error(input, label, "meanInFeatureUnit", num(input.getMeanInFeatureUnit()), "a finite number in the feature's unit",
                        "enter the mean of the normal distribution");
            }
            positive(input, label, "standardDeviationInFeatureUnit", input.getStandardDeviationInFeatureUnit(),
                    "in the feature's unit", "enter the standard deviation of the normal distribution");
        }
        case LOGNORMAL -> {
            positive(input, label, "medianInFeatureUnit", input.getMedianInFeatureUnit(), "in the feature's unit",
                    "enter the median of the lognormal distribution (a lognormal value is always positive)");
            double gsd = input.getGeometricStandardDeviation();
            if (!(finite(gsd) && gsd > 1)) {
                error(input, label, "geometricStandardDeviation", num(gsd), "greater than 1 (dimensionless)",
                        "enter exp(standard deviation of ln x), e.g. 2 for a factor-of-two spread");
            }
        }
        case UNIFORM, TRIANGULAR -> {
            double min = input.getMinimumInFeatureUnit();
            double max = input.getMaximumInFeatureUnit();
            if (!finite(min)) {
                error(input, label, "minimumInFeatureUnit", num(min), "a finite number in the feature's unit",
                        "enter the smallest value");
            } else if (!(finite(max) && max > min)) {
                error(input, label, "maximumInFeatureUnit", num(max), "greater than the minimum " + num(min),
                        "enter the largest value, above the minimum");
            } else if (input.getDistribution() == InputDistributionKind.TRIANGULAR) {
                double mode = input.getModeInFeatureUnit();
                if (!(finite(mode) && mode >= min && mode <= max)) {
                    error(input, label, "modeInFeatureUnit", num(mode), "[" + num(min) + ", " + num(max) + "] (minimum to maximum)",
                            "enter the most likely value, between the minimum and the maximum");
                }
            }
        }
        }
    }

    private boolean correlated(UncertaintySettings settings, RankCorrelation correlation, String label, String field,
            UncertainInput input) {
        if (input == null) {
            error(correlation, label, field, "(none)", "an uncertain input of this project", "choose the input");
            return false;
        }
        if (!settings.getInputs().contains(input)) {
            error(correlation, label, field, quote(input.getName()), "an uncertain input of this project",
                    "choose one of this project's uncertain inputs");
            return false;
        }
        return true;
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

    private void percent(EObject object, String label, String field, double valuePercent) {
        if (!(finite(valuePercent) && valuePercent >= 0 && valuePercent <= 100)) {
            error(object, label, field, num(valuePercent), "0 to 100 %", "enter per cent (15 for 15 %), 0 for none");
        }
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
