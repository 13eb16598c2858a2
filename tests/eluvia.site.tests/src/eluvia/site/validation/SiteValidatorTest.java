package eluvia.site.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ColumnTest;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.PriceBook;
import eluvia.site.model.PriceItem;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.SorptionIsotherm;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.RankCorrelation;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySettings;
import eluvia.site.model.VariogramShapeKind;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;
import eluvia.site.tests.TestProjects;

/**
 * Field by field: each case breaks one field of the (valid) shipped example and expects exactly
 * that field of that object to be reported, with its value, the allowed range and a fix.
 * Physical ranges are facts of the trade (fractions in (0, 1), depths increasing downwards,
 * water content at most the porosity, ...), marked "common practice" where they are usual spans.
 */
final class SiteValidatorTest {

    private static SoilLayer layer(Project p, int i) {
        return p.getSite().getLayers().get(i);
    }

    private static Contaminant contaminant(Project p, int i) {
        return p.getContaminants().get(i);
    }

    private static TreatmentZone zone(Project p) {
        return p.getSite().getZones().get(0);
    }

    private static FlushingDesign design(Project p) {
        return p.getFlushingDesigns().get(0);
    }

    private static CleanupLevel level(Project p, int i) {
        return p.getCleanupLevels().get(i);
    }

    private static SamplingLocation location(Project p, int i) {
        return p.getSite().getSamplingLocations().get(i);
    }

    private static Sample sample(Project p, int i) {
        return location(p, 0).getSamples().get(i);
    }

    private static ExcavationDesign dig(Project p) {
        return p.getExcavationDesigns().get(0);
    }

    private static PriceBook book(Project p) {
        return p.getPriceBooks().get(0);
    }

    private static PriceItem item(Project p, int i) {
        return book(p).getItems().get(i);
    }

    private static ColumnTest column(Project p) {
        return p.getColumnTests().get(0);
    }

    private static SourceConcentration source(Project p, int i) {
        return zone(p).getSourceConcentrations().get(i);
    }

    private static UncertaintySettings uncertainty(Project p) {
        return p.getUncertainty();
    }

    private static UncertainInput uncertain(Project p, int i) {
        return uncertainty(p).getInputs().get(i);
    }

    private static RankCorrelation correlation(Project p, int i) {
        return uncertainty(p).getRankCorrelations().get(i);
    }

    private static ZoneAnalysisSettings zoning(Project p) {
        return p.getZoneAnalysis();
    }

    /** Kriging with an entered spherical variogram: nugget 1, sill 10 (mg/kg)^2, range 20 m. */
    private static void kriging(Project p) {
        zoning(p).setEstimator(ZoneEstimatorKind.ORDINARY_KRIGING);
        zoning(p).setVariogramNuggetMgPerKgSquared(1);
        zoning(p).setVariogramSillMgPerKgSquared(10);
        zoning(p).setVariogramRangeMetres(20);
    }

    private static Arguments error(String what, Consumer<Project> change, Function<Project, EObject> object,
            String field, String value, String range) {
        return Arguments.of(what, change, object, field, Severity.ERROR, value, range);
    }

    private static Arguments warning(String what, Consumer<Project> change, Function<Project, EObject> object,
            String field, String value, String range) {
        return Arguments.of(what, change, object, field, Severity.WARNING, value, range);
    }

    static Stream<Arguments> brokenFields() {
        return Stream.of(
                // Project and site
                warning("project name empty", p -> p.setName(" "), p -> p, "name", "(empty)", "not empty"),
                error("schema version from the future", p -> p.setSchemaVersion(99), p -> p, "schemaVersion", "99", "0 (not saved yet) to"),
                error("no site", p -> p.setSite(null), p -> p, "site", "(none)", "a site"),
                warning("site name empty", p -> p.getSite().setName(null), p -> p.getSite(), "name", "(empty)", "not empty"),
                error("no layers", p -> p.getSite().getLayers().clear(), p -> p.getSite(), "layers", "(none)", "at least one soil layer"),
                warning("no zones", p -> { p.getFlushingDesigns().clear(); p.getSite().getZones().clear(); },
                        p -> p.getSite(), "zones", "(none)", "at least one treatment zone"),
                // Soil layers
                warning("layer name empty", p -> layer(p, 0).setName(""), p -> layer(p, 0), "name", "(empty)", "not empty"),
                warning("duplicate layer names", p -> layer(p, 1).setName("silty SAND"), p -> layer(p, 1), "name", "'silty SAND'", "a name no other layer has"),
                error("negative top depth", p -> layer(p, 0).setTopDepthMetres(-0.5), p -> layer(p, 0), "topDepthMetres", "-0.5", "[0, bottom depth)"),
                warning("first layer below the surface", p -> layer(p, 0).setTopDepthMetres(0.2), p -> layer(p, 0), "topDepthMetres", "0.2", "0 for the first layer"),
                error("bottom above top", p -> layer(p, 0).setBottomDepthMetres(0.0), p -> layer(p, 0), "bottomDepthMetres", "0", "greater than the top depth 0 m"),
                error("bottom not a number", p -> layer(p, 2).setBottomDepthMetres(Double.NaN), p -> layer(p, 2), "bottomDepthMetres", "NaN", "a finite depth"),
                error("gap between layers", p -> layer(p, 1).setTopDepthMetres(1.6), p -> layer(p, 1), "topDepthMetres", "1.6",
                        "equal to the bottom depth of the layer above (1.5 m)"),
                error("overlapping layers", p -> layer(p, 2).setTopDepthMetres(2.5), p -> layer(p, 2), "topDepthMetres", "2.5",
                        "equal to the bottom depth of the layer above (3 m)"),
                error("bulk density zero", p -> layer(p, 0).setBulkDensityKgPerCubicMetre(0), p -> layer(p, 0), "bulkDensityKgPerCubicMetre", "0", "(0, 2650) kg/m3"),
                error("bulk density above the particle density",
                        p -> layer(p, 0).setBulkDensityKgPerCubicMetre(2700), p -> layer(p, 0), "bulkDensityKgPerCubicMetre", "2700", "(0, 2650) kg/m3"),
                warning("bulk density unusual", p -> { layer(p, 0).setBulkDensityKgPerCubicMetre(900); layer(p, 0).setPorosity(0.62); },
                        p -> layer(p, 0), "bulkDensityKgPerCubicMetre", "900", "usually 1000 to 2100 kg/m3"),
                error("porosity above one", p -> layer(p, 0).setPorosity(1.2), p -> layer(p, 0), "porosity", "1.2", "(0, 1)"),
                error("porosity zero", p -> layer(p, 0).setPorosity(0), p -> layer(p, 0), "porosity", "0", "(0, 1)"),
                warning("porosity inconsistent with bulk density", p -> { layer(p, 0).setPorosity(0.6); layer(p, 0).setWaterContent(0.3); },
                        p -> layer(p, 0), "porosity", "0.6", "within 0.1 of 1 - bulk density / 2650 kg/m3 = 0.396"),
                error("water content above porosity", p -> layer(p, 0).setWaterContent(0.45), p -> layer(p, 0), "waterContent", "0.45", "(0, porosity = 0.4]"),
                error("water content zero", p -> layer(p, 1).setWaterContent(0), p -> layer(p, 1), "waterContent", "0", "(0, porosity]"),
                error("foc negative", p -> layer(p, 0).setOrganicCarbonFraction(-0.001), p -> layer(p, 0), "organicCarbonFraction", "-0.001", "[0, 1)"),
                warning("foc entered as percent", p -> layer(p, 0).setOrganicCarbonFraction(0.5), p -> layer(p, 0), "organicCarbonFraction", "0.5", "usually below 0.2"),
                error("conductivity zero", p -> layer(p, 0).setSaturatedConductivityMetresPerDay(0), p -> layer(p, 0), "saturatedConductivityMetresPerDay", "0", "greater than 0 m/d"),
                warning("conductivity implausibly high", p -> layer(p, 0).setSaturatedConductivityMetresPerDay(5e4), p -> layer(p, 0),
                        "saturatedConductivityMetresPerDay", "50000", "up to about 10000 m/d"),
                error("dispersivity zero", p -> layer(p, 0).setDispersivityMetres(0), p -> layer(p, 0), "dispersivityMetres", "0", "greater than 0 m"),
                warning("dispersivity above thickness", p -> layer(p, 0).setDispersivityMetres(2.0), p -> layer(p, 0), "dispersivityMetres", "2", "at most the layer thickness 1.5 m"),
                warning("texture class empty", p -> layer(p, 2).setTextureClass(""), p -> layer(p, 2), "textureClass", "(empty)", "not empty"),
                // Contaminants
                error("contaminant name empty", p -> contaminant(p, 0).setName(null), p -> contaminant(p, 0), "name", "(empty)", "not empty"),
                error("duplicate contaminant", p -> contaminant(p, 1).setName("benzene"), p -> contaminant(p, 1), "name", "'benzene'", "a name no other contaminant has"),
                warning("CAS check digit wrong", p -> contaminant(p, 0).setCasNumber("71-43-3"), p -> contaminant(p, 0), "casNumber", "'71-43-3'", "correct check digit"),
                error("Koc negative", p -> contaminant(p, 0).setKocLitresPerKg(-1), p -> contaminant(p, 0), "kocLitresPerKg", "-1", "0 or more L/kg"),
                warning("Koc zero without Kd", p -> contaminant(p, 0).setKocLitresPerKg(0), p -> contaminant(p, 0), "kocLitresPerKg", "0", "greater than 0 L/kg"),
                error("Kd infinite", p -> contaminant(p, 1).setKdLitresPerKg(Double.POSITIVE_INFINITY), p -> contaminant(p, 1), "kdLitresPerKg", "Infinity", "0 or more L/kg"),
                error("diffusion zero", p -> contaminant(p, 0).setDiffusionSquareMetresPerSecond(0), p -> contaminant(p, 0), "diffusionSquareMetresPerSecond", "0", "greater than 0 m2/s"),
                warning("diffusion in cm2/s by mistake", p -> contaminant(p, 0).setDiffusionSquareMetresPerSecond(1e-5), p -> contaminant(p, 0),
                        "diffusionSquareMetresPerSecond", "1.0E-5", "about 1e-10 to 5e-9 m2/s"),
                error("half-life negative", p -> contaminant(p, 0).setHalfLifeDays(-3), p -> contaminant(p, 0), "halfLifeDays", "-3", "0 (no decay) or more days"),
                // Cleanup levels
                error("cleanup level without contaminant", p -> level(p, 0).setContaminant(null), p -> level(p, 0), "contaminant", "(none)", "a contaminant of this project"),
                error("cleanup level for a foreign contaminant", p -> level(p, 0).setContaminant(SiteFactory.eINSTANCE.createContaminant()),
                        p -> level(p, 0), "contaminant", "''", "a contaminant of this project"),
                error("two levels for one contaminant", p -> level(p, 1).setContaminant(contaminant(p, 0)), p -> level(p, 1), "contaminant", "'Benzene'",
                        "one cleanup level per contaminant"),
                warning("contaminant without a level", p -> p.getCleanupLevels().remove(1), p -> contaminant(p, 1), "cleanupLevels", "(none)",
                        "a cleanup level for each contaminant"),
                error("soil level zero", p -> level(p, 0).setSoilLevelMilligramsPerKg(0), p -> level(p, 0), "soilLevelMilligramsPerKg", "0", "greater than 0 mg/kg"),
                warning("basis empty", p -> level(p, 0).setBasis(""), p -> level(p, 0), "basis", "(empty)", "not empty"),
                // Zones
                warning("zone name empty", p -> zone(p).setName(""), p -> zone(p), "name", "(empty)", "not empty"),
                error("zone area negative without footprint", p -> { zone(p).getFootprint().clear(); zone(p).setAreaSquareMetres(-450); }, p -> zone(p), "areaSquareMetres", "-450", "greater than 0 m2"),
                error("zone top negative", p -> zone(p).setTopDepthMetres(-1), p -> zone(p), "topDepthMetres", "-1", "[0, bottom depth)"),
                error("zone bottom above top", p -> zone(p).setBottomDepthMetres(0), p -> zone(p), "bottomDepthMetres", "0", "greater than the top depth"),
                error("zone below the soil profile", p -> zone(p).setBottomDepthMetres(5), p -> zone(p), "bottomDepthMetres", "5",
                        "at most the bottom of the soil profile, 4 m"),
                error("zone above the soil profile", p -> { layer(p, 0).setTopDepthMetres(0.5); zone(p).setTopDepthMetres(0.2); },
                        p -> zone(p), "topDepthMetres", "0.2", "at least the top of the soil profile, 0.5 m"),
                warning("zone without concentrations", p -> zone(p).getSourceConcentrations().clear(), p -> zone(p), "sourceConcentrations", "(none)",
                        "at least one contaminant"),
                error("source without contaminant", p -> source(p, 0).setContaminant(null), p -> source(p, 0), "contaminant", "(none)", "a contaminant of this project"),
                error("two sources for one contaminant", p -> source(p, 1).setContaminant(contaminant(p, 0)), p -> source(p, 1), "contaminant", "'Benzene'",
                        "one concentration per contaminant and zone"),
                error("source concentration zero", p -> source(p, 0).setSoilConcentrationMilligramsPerKg(0), p -> source(p, 0),
                        "soilConcentrationMilligramsPerKg", "0", "greater than 0 mg/kg"),
                warning("target not below the initial concentration", p -> source(p, 0).setSoilConcentrationMilligramsPerKg(0.04), p -> source(p, 0),
                        "soilConcentrationMilligramsPerKg", "0.04", "above the cleanup level 0.05 mg/kg"),
                // Flushing designs
                warning("design name empty", p -> design(p).setName(null), p -> design(p), "name", "(empty)", "not empty"),
                error("design without zone", p -> design(p).setZone(null), p -> design(p), "zone", "(none)", "a treatment zone of this project"),
                error("design for a foreign zone", p -> design(p).setZone(SiteFactory.eINSTANCE.createTreatmentZone()), p -> design(p), "zone", "''",
                        "a treatment zone of this project"),
                error("flux zero", p -> design(p).setDarcyFluxMetresPerDay(0), p -> design(p), "darcyFluxMetresPerDay", "0", "greater than 0 m/d"),
                warning("flux above the tightest layer's conductivity", p -> design(p).setDarcyFluxMetresPerDay(0.8), p -> design(p), "darcyFluxMetresPerDay", "0.8",
                        "at most the saturated conductivity of layer 'Silty sand', 0.5 m/d"),
                error("eight days a week", p -> design(p).setOperatingDaysPerWeek(8), p -> design(p), "operatingDaysPerWeek", "8", "(0, 7]"),
                error("capture above one", p -> design(p).setCaptureEfficiency(95), p -> design(p), "captureEfficiency", "95", "(0, 1]"),
                error("max pore volumes below one", p -> design(p).setMaxPoreVolumes(0.5), p -> design(p), "maxPoreVolumes", "0.5", "[1, 1000000]"),
                // Schema 2: site frame, boundary and sampling
                error("ground elevation not a number", p -> p.getSite().setGroundSurfaceElevationMetres(Double.NaN), p -> p.getSite(),
                        "groundSurfaceElevationMetres", "NaN", "a finite elevation in m"),
                warning("coordinates without a frame", p -> p.getSite().setCoordinateFrame(""), p -> p.getSite(), "coordinateFrame", "(empty)",
                        "not empty when coordinates are used"),
                error("boundary of two vertices", p -> p.getSite().getBoundary().subList(2, 4).clear(), p -> p.getSite(), "boundary",
                        "2 vertices", "none, or at least 3 vertices"),
                error("boundary on a line", p -> p.getSite().getBoundary().forEach(v -> v.setNorthingMetres(0)), p -> p.getSite(), "boundary",
                        "area 0 m2", "a polygon enclosing a positive area"),
                error("boundary vertex not a number", p -> p.getSite().getBoundary().get(1).setEastingMetres(Double.NaN),
                        p -> p.getSite().getBoundary().get(1), "eastingMetres", "NaN", "a finite coordinate in m"),
                warning("location name empty", p -> location(p, 0).setName(""), p -> location(p, 0), "name", "(empty)", "not empty"),
                warning("duplicate location names", p -> location(p, 1).setName("b-1"), p -> location(p, 1), "name", "'b-1'", "a name no other location has"),
                error("location easting infinite", p -> location(p, 0).setEastingMetres(Double.POSITIVE_INFINITY), p -> location(p, 0),
                        "eastingMetres", "Infinity", "a finite number in m"),
                error("location northing not a number", p -> location(p, 1).setNorthingMetres(Double.NaN), p -> location(p, 1),
                        "northingMetres", "NaN", "a finite number in m"),
                error("location elevation not a number", p -> location(p, 1).setGroundElevationMetres(Double.NaN), p -> location(p, 1),
                        "groundElevationMetres", "NaN", "a finite number in m"),
                error("boundary vertex northing infinite", p -> p.getSite().getBoundary().get(2).setNorthingMetres(Double.NEGATIVE_INFINITY),
                        p -> p.getSite().getBoundary().get(2), "northingMetres", "-Infinity", "a finite coordinate in m"),
                warning("excavation without price book", p -> dig(p).setPriceBook(null), p -> dig(p), "priceBook", "(none)",
                        "a price book of this project"),
                warning("price item name empty", p -> item(p, 1).setName(""), p -> item(p, 1), "name", "(empty)", "not empty"),
                warning("column test name empty", p -> column(p).setName(null), p -> column(p), "name", "(empty)", "not empty"),
                warning("location outside the boundary", p -> location(p, 0).setEastingMetres(95), p -> location(p, 0), "eastingMetres",
                        "95, 15", "inside the site boundary"),
                error("sample top negative", p -> sample(p, 0).setTopDepthMetres(-0.1), p -> sample(p, 0), "topDepthMetres", "-0.1", "0 or more m"),
                error("sample bottom above top", p -> sample(p, 0).setBottomDepthMetres(0.4), p -> sample(p, 0), "bottomDepthMetres", "0.4",
                        "at least the top depth 0.5 m"),
                warning("sample below the profile", p -> { sample(p, 0).setBottomDepthMetres(6); }, p -> sample(p, 0), "bottomDepthMetres", "6",
                        "within the soil profile (to 4 m)"),
                error("sample without contaminant", p -> sample(p, 0).setContaminant(null), p -> sample(p, 0), "contaminant", "(none)",
                        "a contaminant of this project"),
                error("sample concentration negative", p -> sample(p, 0).setConcentrationMilligramsPerKg(-1), p -> sample(p, 0),
                        "concentrationMilligramsPerKg", "-1", "0 or more mg/kg"),
                error("non-detect without limit", p -> sample(p, 0).setNonDetect(true), p -> sample(p, 0), "detectionLimitMilligramsPerKg", "0",
                        "greater than 0 mg/kg for a non-detect"),
                error("detection limit negative", p -> sample(p, 0).setDetectionLimitMilligramsPerKg(-0.01), p -> sample(p, 0),
                        "detectionLimitMilligramsPerKg", "-0.01", "0 or more mg/kg"),
                // Schema 2: layers
                error("swell negative", p -> layer(p, 0).setSwellFactor(-0.1), p -> layer(p, 0), "swellFactor", "-0.1", "[0, 1]"),
                warning("swell of rock", p -> layer(p, 0).setSwellFactor(0.7), p -> layer(p, 0), "swellFactor", "0.7", "up to about 0.6"),
                error("shrinkage too large", p -> layer(p, 0).setShrinkageFactor(0.5), p -> layer(p, 0), "shrinkageFactor", "0.5", "[0, 0.5)"),
                error("dispersivity scale negative", p -> layer(p, 1).setDispersivityScaleMetres(-1), p -> layer(p, 1), "dispersivityScaleMetres",
                        "-1", "0 (the layer thickness) or more m"),
                error("Xu-Eckstein on a flow length of 1 m", p -> layer(p, 2).setDispersivityScaleMetres(0), p -> layer(p, 2),
                        "dispersivityScaleMetres", "0", "a flow length above 1 m for Xu and Eckstein (1995) (0 uses the thickness 1 m)"),
                // Schema 2: contaminants
                error("Freundlich without Kf", p -> contaminant(p, 0).setIsotherm(SorptionIsotherm.FREUNDLICH), p -> contaminant(p, 0),
                        "freundlichKfMgPerKgPerMgPerLitreToN", "0", "greater than 0 (mg/kg)/(mg/L)^n"),
                warning("Freundlich exponent unusual", p -> { contaminant(p, 0).setIsotherm(SorptionIsotherm.FREUNDLICH);
                    contaminant(p, 0).setFreundlichKfMgPerKgPerMgPerLitreToN(0.2); contaminant(p, 0).setFreundlichExponent(2.5); },
                        p -> contaminant(p, 0), "freundlichExponent", "2.5", "usually 0.3 to 1.5"),
                error("Langmuir without maximum", p -> { contaminant(p, 0).setIsotherm(SorptionIsotherm.LANGMUIR);
                    contaminant(p, 0).setLangmuirConstantLitresPerMilligram(0.1); }, p -> contaminant(p, 0), "langmuirMaximumMilligramsPerKg", "0",
                        "greater than 0 mg/kg"),
                error("Langmuir without constant", p -> { contaminant(p, 0).setIsotherm(SorptionIsotherm.LANGMUIR);
                    contaminant(p, 0).setLangmuirMaximumMilligramsPerKg(50); }, p -> contaminant(p, 0), "langmuirConstantLitresPerMilligram", "0",
                        "greater than 0 L/mg"),
                error("beta zero", p -> { contaminant(p, 0).setNonequilibrium(NonequilibriumEntry.DIMENSIONLESS); contaminant(p, 0).setBeta(0); },
                        p -> contaminant(p, 0), "beta", "0", "(0, 1]"),
                error("omega negative", p -> { contaminant(p, 0).setNonequilibrium(NonequilibriumEntry.DIMENSIONLESS); contaminant(p, 0).setOmega(-1); },
                        p -> contaminant(p, 0), "omega", "-1", "0 or more"),
                error("mobile water fraction above one", p -> contaminant(p, 1).setMobileWaterFraction(1.2), p -> contaminant(p, 1),
                        "mobileWaterFraction", "1.2", "(0, 1]"),
                error("mobile site fraction negative", p -> contaminant(p, 1).setMobileSiteFraction(-0.1), p -> contaminant(p, 1),
                        "mobileSiteFraction", "-0.1", "[0, 1]"),
                error("mass-transfer rate negative", p -> contaminant(p, 1).setMassTransferRatePerDay(-0.05), p -> contaminant(p, 1),
                        "massTransferRatePerDay", "-0.05", "0 or more 1/d"),
                error("solubility negative", p -> contaminant(p, 0).setWaterSolubilityMilligramsPerLitre(-1), p -> contaminant(p, 0),
                        "waterSolubilityMilligramsPerLitre", "-1", "0 (not given) or more mg/L"),
                warning("property source empty", p -> contaminant(p, 0).setPropertySource(null), p -> contaminant(p, 0), "propertySource",
                        "(empty)", "not empty"),
                // C_w = C_T / (Kd + theta / rho_b): benzene in the silty sand, Kd = 61.7 x 0.002 = 0.1234 L/kg, theta / rho_b =
                // 0.3 / 1.6 = 0.1875 L/kg: at 1750 mg/L (solubility as entered) C_T = 1750 x 0.3109 = 544.1 mg/kg (computed by hand).
                warning("concentration above what water can dissolve", p -> source(p, 0).setSoilConcentrationMilligramsPerKg(600), p -> source(p, 0),
                        "soilConcentrationMilligramsPerKg", "600", "below 544.1 mg/kg in layer 'Silty sand'"),
                // Schema 2: cleanup levels
                error("neither level entered", p -> level(p, 0).setSoilLevelEntered(false), p -> level(p, 0), "soilLevelEntered", "false",
                        "a soil level, a pore-water level or both"),
                error("pore-water level zero", p -> level(p, 1).setPorewaterLevelMilligramsPerLitre(0), p -> level(p, 1),
                        "porewaterLevelMilligramsPerLitre", "0", "greater than 0 mg/L"),
                // Schema 2: zone footprint
                error("footprint of two vertices", p -> zone(p).getFootprint().subList(2, 4).clear(), p -> zone(p), "footprint", "2 vertices",
                        "none, or at least 3 vertices"),
                error("zone outside the site", p -> zone(p).getFootprint().get(1).setEastingMetres(85), p -> zone(p), "footprint", "vertex (85, 10)",
                        "inside the site boundary"),
                warning("entered area differs from the footprint", p -> zone(p).setAreaSquareMetres(500), p -> zone(p), "areaSquareMetres", "500",
                        "0 or the footprint's area 450.0 m2"),
                // Schema 2: flushing design
                warning("two-region without nonequilibrium parameters", p -> contaminant(p, 1).setNonequilibrium(NonequilibriumEntry.EQUILIBRIUM),
                        p -> p.getFlushingDesigns().get(1), "solutionMethod", "TWO_REGION", "a contaminant with nonequilibrium parameters"),
                error("too few cells", p -> design(p).setNumericalCellCount(5), p -> design(p), "numericalCellCount", "5", "[10, 100000]"),
                error("tolerance too loose", p -> design(p).setNumericalRelativeTolerance(0.1), p -> design(p), "numericalRelativeTolerance", "0.1",
                        "(0, 0.01]"),
                error("monitoring interval zero", p -> design(p).setMonitoringIntervalDays(0), p -> design(p), "monitoringIntervalDays", "0",
                        "greater than 0 d"),
                error("amendment dose negative", p -> design(p).setAmendmentDoseKilogramsPerCubicMetre(-2), p -> design(p),
                        "amendmentDoseKilogramsPerCubicMetre", "-2", "0 (plain water) or more kg/m3"),
                warning("amendment dose without a name", p -> p.getFlushingDesigns().get(1).setAmendmentName(" "), p -> p.getFlushingDesigns().get(1),
                        "amendmentName", "(empty)", "the amendment's name when a dose is given"),
                warning("no price book", p -> design(p).setPriceBook(null), p -> design(p), "priceBook", "(none)", "a price book of this project"),
                error("foreign price book", p -> design(p).setPriceBook(SiteFactory.eINSTANCE.createPriceBook()), p -> design(p), "priceBook", "''",
                        "a price book of this project"),
                // Schema 2: excavation design
                warning("excavation name empty", p -> dig(p).setName(""), p -> dig(p), "name", "(empty)", "not empty"),
                error("excavation without zone", p -> dig(p).setZone(null), p -> dig(p), "zone", "(none)", "a treatment zone of this project"),
                error("side slope negative", p -> dig(p).setSideSlopeHorizontalPerVertical(-1), p -> dig(p), "sideSlopeHorizontalPerVertical", "-1",
                        "[0, 10]"),
                // US OSHA 29 CFR 1926 Subpart P App. B Table B-1 [PUB] (REFERENCES.md): Type C 1-1/2 : 1, Type B 1 : 1, Type A 3/4 : 1.
                warning("slope steeper than Table B-1 for Type C", p -> dig(p).setSideSlopeHorizontalPerVertical(1.0), p -> dig(p),
                        "sideSlopeHorizontalPerVertical", "1", "at least 1.5 H : 1 V for TYPE_C"),
                warning("slope steeper than Table B-1 for Type A", p -> { dig(p).setSoilType(ExcavationSoilType.TYPE_A);
                    dig(p).setSideSlopeHorizontalPerVertical(0.5); }, p -> dig(p), "sideSlopeHorizontalPerVertical", "0.5", "at least 0.75 H : 1 V for TYPE_A"),
                error("overdig negative", p -> dig(p).setOverdigMetres(-0.3), p -> dig(p), "overdigMetres", "-0.3", "0 or more m"),
                error("truck capacity zero", p -> dig(p).setTruckHeapedCapacityCubicMetres(0), p -> dig(p), "truckHeapedCapacityCubicMetres", "0",
                        "greater than 0 m3"),
                error("truck payload negative", p -> dig(p).setTruckPayloadKilograms(-1), p -> dig(p), "truckPayloadKilograms", "-1", "greater than 0 kg"),
                // Schema 2: price books
                warning("price book name empty", p -> book(p).setName(""), p -> book(p), "name", "(empty)", "not empty"),
                warning("currency not a code", p -> book(p).setCurrency("dollars"), p -> book(p), "currency", "'dollars'", "three-letter ISO 4217"),
                warning("price book reference empty", p -> book(p).setReference(""), p -> book(p), "reference", "(empty)", "not empty"),
                error("duplicate item code", p -> item(p, 1).setCode("EXCAVATION.bank"), p -> item(p, 1), "code", "'EXCAVATION.bank'",
                        "a code no other item of the book has"),
                warning("item code empty", p -> item(p, 0).setCode(""), p -> item(p, 0), "code", "(empty)", "not empty"),
                error("item unit empty", p -> item(p, 0).setUnit(null), p -> item(p, 0), "unit", "(empty)", "not empty"),
                error("item rate negative", p -> item(p, 0).setRatePerUnit(-18), p -> item(p, 0), "ratePerUnit", "-18", "0 or more"),
                error("no currency anywhere", p -> book(p).setCurrency(""), p -> item(p, 0), "currency", "(empty)", "a currency here or on the price book"),
                warning("item source note empty", p -> item(p, 2).setSourceNote(""), p -> item(p, 2), "sourceNote", "(empty)", "not empty"),
                // Price book markups: a percentage lies in [0, 100] (per cent of a subtotal, EPA 540-R-00-002 layout; fact of arithmetic)
                error("scope contingency negative", p -> book(p).setScopeContingencyPercent(-1), p -> book(p), "scopeContingencyPercent", "-1", "0 to 100 %"),
                error("bid contingency above 100", p -> book(p).setBidContingencyPercent(100.5), p -> book(p), "bidContingencyPercent", "100.5", "0 to 100 %"),
                error("project management not a number", p -> book(p).setProjectManagementPercent(Double.NaN), p -> book(p), "projectManagementPercent",
                        "NaN", "0 to 100 %"),
                error("remedial design negative", p -> book(p).setRemedialDesignPercent(-0.5), p -> book(p), "remedialDesignPercent", "-0.5", "0 to 100 %"),
                error("construction management above 100", p -> book(p).setConstructionManagementPercent(150), p -> book(p),
                        "constructionManagementPercent", "150", "0 to 100 %"),
                error("O&M contingency negative", p -> book(p).setOperatingContingencyPercent(-10), p -> book(p), "operatingContingencyPercent", "-10",
                        "0 to 100 %"),
                error("O&M project management infinite", p -> book(p).setOperatingProjectManagementPercent(Double.POSITIVE_INFINITY), p -> book(p),
                        "operatingProjectManagementPercent", "Infinity", "0 to 100 %"),
                error("technical support above 100", p -> book(p).setTechnicalSupportPercent(101), p -> book(p), "technicalSupportPercent", "101",
                        "0 to 100 %"),
                // Discount rate: the range this project allows for a real rate (-5 to 30 % per year, the task's bounds), both ends
                error("discount rate above 30", p -> book(p).setDiscountRatePercent(30.5), p -> book(p), "discountRatePercent", "30.5", "-5 to 30 % per year"),
                error("discount rate below -5", p -> book(p).setDiscountRatePercent(-6), p -> book(p), "discountRatePercent", "-6", "-5 to 30 % per year"),
                warning("discount rate not the default without basis", p -> { book(p).setDiscountRatePercent(3); book(p).setDiscountRateBasis(" "); },
                        p -> book(p), "discountRateBasis", "(empty)", "not empty when the discount rate is not the default 7 %"),
                // Schema 2: column tests
                error("column test without contaminant", p -> column(p).setContaminant(null), p -> column(p), "contaminant", "(none)",
                        "a contaminant of this project"),
                error("column test with a foreign layer", p -> column(p).setLayer(SiteFactory.eINSTANCE.createSoilLayer()), p -> column(p), "layer",
                        "''", "a soil layer of this project or none"),
                error("column length zero", p -> column(p).setColumnLengthMetres(0), p -> column(p), "columnLengthMetres", "0", "greater than 0 m"),
                error("column flux zero", p -> column(p).setDarcyFluxMetresPerDay(0), p -> column(p), "darcyFluxMetresPerDay", "0", "greater than 0 m/d"),
                error("column water content one", p -> column(p).setWaterContent(1), p -> column(p), "waterContent", "1", "(0, 1)"),
                error("column bulk density zero", p -> column(p).setBulkDensityKgPerCubicMetre(0), p -> column(p), "bulkDensityKgPerCubicMetre", "0",
                        "(0, 2650) kg/m3"),
                error("column C0 zero", p -> column(p).setReferenceConcentrationMilligramsPerLitre(0), p -> column(p),
                        "referenceConcentrationMilligramsPerLitre", "0", "greater than 0 mg/L"),
                warning("column test with one point", p -> column(p).getPoints().subList(1, 5).clear(), p -> column(p), "points", "1 points",
                        "at least 2 points"),
                error("points out of order", p -> column(p).getPoints().get(2).setPoreVolumes(0.8), p -> column(p).getPoints().get(2), "poreVolumes",
                        "0.8", "greater than the previous point's 1"),
                error("relative concentration negative", p -> column(p).getPoints().get(0).setRelativeConcentration(-0.1),
                        p -> column(p).getPoints().get(0), "relativeConcentration", "-0.1", "0 or more"),
                warning("relative concentration far above one", p -> column(p).getPoints().get(0).setRelativeConcentration(1.5),
                        p -> column(p).getPoints().get(0), "relativeConcentration", "1.5", "up to about 1.2"),
                // Schema 2: revisions
                warning("revision without author", p -> p.getRevisions().get(0).setAuthor(""), p -> p.getRevisions().get(0), "author", "(empty)", "not empty"),
                warning("revision without time", p -> p.getRevisions().get(0).setTimestamp(null), p -> p.getRevisions().get(0), "timestamp", "(none)",
                        "a date and time"),
                warning("revision without summary", p -> p.getRevisions().get(0).setSummary(null), p -> p.getRevisions().get(0), "summary", "(empty)",
                        "not empty"),
                // Uncertainty (ranges: what a distribution needs to be defined, and the Monte Carlo engine's limits)
                error("too few Monte Carlo runs", p -> uncertainty(p).setRunCount(1), p -> uncertainty(p), "runCount", "1", "2 to 10000000"),
                // Iman-Conover needs a positive definite sample correlation of the scores: more runs than inputs + 1
                // (the example has 5 uncertain inputs and one rank correlation: 6 runs are too few)
                error("too few runs for the rank correlations", p -> uncertainty(p).setRunCount(6),
                        p -> uncertainty(p), "runCount", "6", "more than 6 (the number of uncertain inputs + 1) when rank correlations are set"),
                warning("uncertainty on without inputs", p -> { uncertainty(p).getRankCorrelations().clear(); uncertainty(p).getInputs().clear(); uncertainty(p).setEnabled(true); },
                        p -> uncertainty(p), "enabled", "true", "at least one uncertain input"),
                error("duplicate uncertain input names", p -> uncertain(p, 1).setName(uncertain(p, 0).getName().toUpperCase()),
                        p -> uncertain(p, 1), "name", "'" + TestProjects.example().getUncertainty().getInputs().get(0).getName().toUpperCase() + "'",
                        "a name no other uncertain input has"),
                error("uncertain input without target", p -> uncertain(p, 0).setTarget(null), p -> uncertain(p, 0), "target", "(none)",
                        "an object of this project"),
                error("uncertain input on a foreign object", p -> uncertain(p, 0).setTarget(SiteFactory.eINSTANCE.createSoilLayer()),
                        p -> uncertain(p, 0), "target", "SoilLayer", "an object of this project"),
                error("uncertain input without feature", p -> uncertain(p, 0).setFeatureName(""), p -> uncertain(p, 0), "featureName", "(empty)",
                        "the name of a number of the target"),
                error("uncertain input on a feature the target lacks", p -> uncertain(p, 0).setFeatureName("colour"), p -> uncertain(p, 0),
                        "featureName", "'colour'", "a number of a SoilLayer: "),
                error("uncertain input on a text feature", p -> uncertain(p, 0).setFeatureName("name"), p -> uncertain(p, 0),
                        "featureName", "'name'", "porosity"),
                error("uncertain input on a derived feature", p -> uncertain(p, 0).setFeatureName("effectiveDispersivityMetres"),
                        p -> uncertain(p, 0), "featureName", "'effectiveDispersivityMetres'", "a value that is entered, not derived"),
                error("two uncertain inputs on one value", p -> { uncertain(p, 1).setTarget(layer(p, 1)); uncertain(p, 1).setFeatureName("porosity"); },
                        p -> uncertain(p, 1), "featureName", "'porosity'", "a value no other uncertain input varies on the same object"),
                error("normal mean not a number", p -> uncertain(p, 4).setMeanInFeatureUnit(Double.NaN), p -> uncertain(p, 4),
                        "meanInFeatureUnit", "NaN", "a finite number"),
                error("normal standard deviation zero", p -> uncertain(p, 4).setStandardDeviationInFeatureUnit(0), p -> uncertain(p, 4),
                        "standardDeviationInFeatureUnit", "0", "greater than 0"),
                error("lognormal median zero", p -> uncertain(p, 1).setMedianInFeatureUnit(0), p -> uncertain(p, 1),
                        "medianInFeatureUnit", "0", "greater than 0"),
                error("lognormal geometric standard deviation one", p -> uncertain(p, 1).setGeometricStandardDeviation(1), p -> uncertain(p, 1),
                        "geometricStandardDeviation", "1", "greater than 1"),
                error("uniform minimum infinite", p -> uncertain(p, 2).setMinimumInFeatureUnit(Double.NEGATIVE_INFINITY), p -> uncertain(p, 2),
                        "minimumInFeatureUnit", "-Infinity", "a finite number"),
                error("uniform maximum below minimum", p -> uncertain(p, 2).setMaximumInFeatureUnit(0.1), p -> uncertain(p, 2),
                        "maximumInFeatureUnit", "0.1", "greater than the minimum 0.15"),
                error("triangular mode above maximum", p -> uncertain(p, 0).setModeInFeatureUnit(0.5), p -> uncertain(p, 0),
                        "modeInFeatureUnit", "0.5", "[0.34, 0.42]"),
                error("rank correlation without first input", p -> correlation(p, 0).setFirst(null), p -> correlation(p, 0), "first", "(none)",
                        "an uncertain input of this project"),
                error("rank correlation with a foreign input", p -> correlation(p, 0).setSecond(SiteFactory.eINSTANCE.createUncertainInput()),
                        p -> correlation(p, 0), "second", "''", "an uncertain input of this project"),
                error("rank correlation of an input with itself", p -> correlation(p, 0).setSecond(uncertain(p, 0)), p -> correlation(p, 0),
                        "second", "input 1", "an input other than the first"),
                error("rank correlation given twice", p -> {
                    RankCorrelation twice = SiteFactory.eINSTANCE.createRankCorrelation();
                    twice.setFirst(uncertain(p, 2));
                    twice.setSecond(uncertain(p, 0));
                    twice.setCoefficient(0.2);
                    uncertainty(p).getRankCorrelations().add(twice);
                }, p -> correlation(p, 1), "second", "input 1", "a pair no other rank correlation names"),
                error("rank correlation of one", p -> correlation(p, 0).setCoefficient(1), p -> correlation(p, 0), "coefficient", "1", "(-1, 1)"),
                // Zone analysis settings (ranges: what eluvia.zone's estimators and eluvia.design's settings accept)
                error("inverse-distance power zero", p -> zoning(p).setInverseDistancePower(0), p -> zoning(p), "inverseDistancePower", "0",
                        "(0, 20]"),
                error("inverse-distance power above the estimator's limit", p -> zoning(p).setInverseDistancePower(25), p -> zoning(p),
                        "inverseDistancePower", "25", "(0, 20]"),
                error("no neighbours", p -> zoning(p).setMaximumNeighbours(0), p -> zoning(p), "maximumNeighbours", "0", "1 to 200"),
                error("more neighbours than kriging takes", p -> zoning(p).setMaximumNeighbours(201), p -> zoning(p), "maximumNeighbours",
                        "201", "1 to 200"),
                error("search radius negative", p -> zoning(p).setSearchRadiusMetres(-5), p -> zoning(p), "searchRadiusMetres", "-5",
                        "0 (automatic) or greater"),
                error("vertical distance factor zero", p -> zoning(p).setVerticalDistanceFactor(0), p -> zoning(p), "verticalDistanceFactor",
                        "0", "(0, 1000]"),
                error("block plan size above 1000 m", p -> zoning(p).setBlockPlanSizeMetres(1500), p -> zoning(p), "blockPlanSizeMetres",
                        "1500", "0 (automatic) to 1000 m"),
                error("block depth negative", p -> zoning(p).setBlockDepthMetres(-0.5), p -> zoning(p), "blockDepthMetres", "-0.5",
                        "0 (automatic) to 100 m"),
                error("variogram range negative", p -> { kriging(p); zoning(p).setVariogramRangeMetres(-1); }, p -> zoning(p),
                        "variogramRangeMetres", "-1", "0 (automatic first guess) or greater"),
                error("kriging range given without a sill", p -> { kriging(p); zoning(p).setVariogramNuggetMgPerKgSquared(0);
                    zoning(p).setVariogramSillMgPerKgSquared(0); }, p -> zoning(p), "variogramSillMgPerKgSquared", "0",
                        "greater than 0 (mg/kg)^2 when the range is given"),
                error("variogram sill negative", p -> { kriging(p); zoning(p).setVariogramSillMgPerKgSquared(-2); }, p -> zoning(p),
                        "variogramSillMgPerKgSquared", "-2", "0 or greater"),
                error("nugget equal to the sill", p -> { kriging(p); zoning(p).setVariogramNuggetMgPerKgSquared(10); }, p -> zoning(p),
                        "variogramNuggetMgPerKgSquared", "10", "less than the sill 10"),
                error("nugget negative", p -> { kriging(p); zoning(p).setVariogramNuggetMgPerKgSquared(-1); }, p -> zoning(p),
                        "variogramNuggetMgPerKgSquared", "-1", "0 or greater"),
                warning("nugget and sill without a range", p -> { kriging(p); zoning(p).setVariogramRangeMetres(0); }, p -> zoning(p),
                        "variogramNuggetMgPerKgSquared", "1", "0 when the range is 0"),
                warning("exponential shape without a range", p -> zoning(p).setVariogramModel(VariogramShapeKind.EXPONENTIAL),
                        p -> zoning(p), "variogramModel", "EXPONENTIAL", "SPHERICAL when the range is 0"),
                warning("variogram entered for inverse-distance weighting", p -> { kriging(p);
                    zoning(p).setEstimator(ZoneEstimatorKind.INVERSE_DISTANCE); }, p -> zoning(p), "estimator", "INVERSE_DISTANCE",
                        "ORDINARY_KRIGING when a variogram is entered"),
                error("delays out of order", p -> zoning(p).getDelayYears().set(2, 0.5), p -> zoning(p), "delayYears", "0 1 0.5 5 10",
                        "increasing delays, each 0 to 100 years"),
                error("delay beyond 100 years", p -> zoning(p).getDelayYears().add(150.0), p -> zoning(p), "delayYears", "0 1 2 5 10 150",
                        "increasing delays, each 0 to 100 years"),
                error("transverse dispersivity fraction above one", p -> zoning(p).setTransverseDispersivityFraction(1.5), p -> zoning(p),
                        "transverseDispersivityFraction", "1.5", "(0, 1]"),
                error("hot-spot multiple of one", p -> zoning(p).setHotSpotMultiple(1), p -> zoning(p), "hotSpotMultiple", "1",
                        "(1, 1000000]"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenFields")
    void reportsTheBrokenField(String what, Consumer<Project> change, Function<Project, EObject> objectOf, String field,
            Severity severity, String value, String range) {
        Project project = TestProjects.example();
        change.accept(project);
        EObject object = objectOf.apply(project);

        List<Problem> problems = SiteValidator.validate(project);

        List<Problem> matching = problems.stream().filter(p -> p.object() == object && p.field().equals(field))
                .collect(Collectors.toList());
        assertEquals(1, matching.size(), what + ": expected one problem on " + field + ", got " + problems);
        Problem problem = matching.get(0);
        assertEquals(severity, problem.severity(), problem.message());
        assertEquals(value, problem.value(), problem.message());
        assertTrue(problem.allowedRange().contains(range), problem.message());
        assertFalse(problem.fix().isBlank(), "every problem says how to fix it: " + problem.message());
        assertTrue(problem.message().startsWith(problem.objectLabel() + " field " + field + " = " + value + ": allowed "), problem.message());
    }

    /**
     * Fields that take any value (free text, choices whose every value is valid, flags whose
     * consistency is checked through another field): no rule of their own.
     */
    private static final Set<String> FREE_FIELDS = Set.of("Project.description", "Project.unitSystem", "Site.description",
            "Contaminant.kdEntered", "CleanupLevel.statistic", "CleanupLevel.porewaterLevelEntered", "SoilLayer.dispersivityRule",
            "FlushingDesign.criterion", "ExcavationDesign.soilType", "Sample.nonDetect", "ColumnTest.kind",
            "Contaminant.isotherm", "Contaminant.nonequilibrium",
            "UncertaintySettings.seed", "UncertaintySettings.samplingMethod", "UncertainInput.distribution",
            "ZoneAnalysisSettings.nonDetectRule");

    @Test
    void everyFieldHasARuleTestedHereOrTakesAnyValue() {
        Set<String> covered = new HashSet<>();
        brokenFields().forEach(arguments -> {
            Object[] a = arguments.get();
            Project project = TestProjects.example();
            @SuppressWarnings("unchecked")
            Consumer<Project> change = (Consumer<Project>) a[1];
            change.accept(project);
            @SuppressWarnings("unchecked")
            EObject object = ((Function<Project, EObject>) a[2]).apply(project);
            covered.add(object.eClass().getName() + "." + a[3]);
        });
        List<String> missing = new ArrayList<>();
        for (EClass c : TestProjects.modelClasses()) {
            for (EStructuralFeature feature : c.getEAllStructuralFeatures()) {
                boolean isValue = feature instanceof EAttribute || !((EReference) feature).isContainment();
                String key = c.getName() + "." + feature.getName();
                if (isValue && !feature.isDerived() && !covered.contains(key) && !FREE_FIELDS.contains(key)) {
                    missing.add(key);
                }
            }
        }
        assertEquals(List.of(), missing, "fields without a tested rule");
    }

    @Test
    void zoneAnalysisSettingsAcceptTheirDefaultsAndAnEnteredVariogram() {
        Project project = TestProjects.example();
        ZoneAnalysisSettings z = zoning(project);
        assertEquals(List.of(), SiteValidator.validate(project).stream().filter(p -> p.object() == z).collect(Collectors.toList()));
        kriging(project);
        z.setInverseDistancePower(20); // the ends of the estimators' ranges (eluvia.zone limits)
        z.setMaximumNeighbours(200);
        z.setVerticalDistanceFactor(1000);
        z.setBlockPlanSizeMetres(1000);
        z.setBlockDepthMetres(100);
        z.setTransverseDispersivityFraction(1);
        z.getDelayYears().clear(); // no delays: the stated default list
        assertEquals(List.of(), SiteValidator.validate(project).stream().filter(p -> p.object() == z).collect(Collectors.toList()));
        ZoneAnalysisSettings fresh = SiteFactory.eINSTANCE.createZoneAnalysisSettings();
        // the model's defaults are the pipeline's stated defaults (eluvia.design DesignSettings)
        assertEquals(2.0, fresh.getInverseDistancePower());
        assertEquals(16, fresh.getMaximumNeighbours());
        assertEquals(10.0, fresh.getVerticalDistanceFactor());
        assertEquals(0.1, fresh.getTransverseDispersivityFraction());
        assertEquals(10.0, fresh.getHotSpotMultiple());
        assertEquals(ZoneEstimatorKind.INVERSE_DISTANCE, fresh.getEstimator());
    }

    @Test
    void priceBookMarkupsAndRateAcceptTheEndsOfTheirRanges() {
        Project project = TestProjects.example();
        PriceBook b = book(project);
        b.setScopeContingencyPercent(0); // the ends of [0, 100] % (fact of arithmetic)
        b.setBidContingencyPercent(100);
        b.setTechnicalSupportPercent(100);
        b.setDiscountRatePercent(-5); // the ends of -5 to 30 % per year (the task's bounds)
        b.setDiscountRateBasis("negative real rate for the test");
        List<Problem> atLow = SiteValidator.validate(project).stream().filter(p -> p.object() == b).collect(Collectors.toList());
        assertEquals(List.of(), atLow);
        b.setDiscountRatePercent(30);
        List<Problem> atHigh = SiteValidator.validate(project).stream().filter(p -> p.object() == b).collect(Collectors.toList());
        assertEquals(List.of(), atHigh);
        b.setDiscountRatePercent(7.0); // the model's default rate needs no stated basis
        b.setDiscountRateBasis(null);
        List<Problem> atDefault = SiteValidator.validate(project).stream().filter(p -> p.object() == b).collect(Collectors.toList());
        assertEquals(List.of(), atDefault);
    }

    @Test
    void theMessageNamesObjectFieldValueRangeAndFix() {
        Project project = TestProjects.example();
        project.getSite().getLayers().get(0).setPorosity(1.2);

        List<Problem> problems = SiteValidator.validate(project);

        assertEquals(List.of("Layer 'Silty sand' field porosity = 1.2: allowed (0, 1); enter the total porosity as a fraction, e.g. 0.35"),
                problems.stream().map(Problem::message).collect(Collectors.toList()));
        assertEquals(SitePackage.Literals.SOIL_LAYER__POROSITY, problems.get(0).feature());
        assertTrue(SiteValidator.hasErrors(problems));
    }

    @Test
    void unnamedObjectsAreLabelledByPosition() {
        Project project = TestProjects.example();
        project.getSite().getLayers().get(1).setName("");
        project.getSite().getLayers().get(1).setPorosity(-1);

        Problem problem = SiteValidator.validate(project).stream().filter(p -> p.field().equals("porosity")).findFirst().orElseThrow();

        assertEquals("Layer 2", problem.objectLabel());
    }

    @Test
    void aNullProjectIsOneError() {
        List<Problem> problems = SiteValidator.validate(null);

        assertEquals(1, problems.size());
        assertEquals(Severity.ERROR, problems.get(0).severity());
    }

    @Test
    void warningsAloneAreNotErrors() {
        Project project = TestProjects.example();
        project.setName("");

        assertFalse(SiteValidator.hasErrors(SiteValidator.validate(project)));
    }

    @Test
    void casCheckDigitFollowsTheRegistryRule() {
        // CAS numbers of benzene, trichloroethylene, tetrachloroethylene and water, from memory;
        // the check-digit rule (weighted digit sum mod 10) is the CAS registry's published one.
        assertTrue(SiteValidator.isValidCasNumber("71-43-2"));
        assertTrue(SiteValidator.isValidCasNumber("79-01-6"));
        assertTrue(SiteValidator.isValidCasNumber("127-18-4"));
        assertTrue(SiteValidator.isValidCasNumber("7732-18-5"));
        assertFalse(SiteValidator.isValidCasNumber("7732-18-4"));
        assertFalse(SiteValidator.isValidCasNumber("71432"));
        assertFalse(SiteValidator.isValidCasNumber("1-43-2"));
    }

    @Test
    void problemsRefuseMissingParts() {
        assertThrows(NullPointerException.class, () -> new Problem(null, null, "x", "f", "v", "r", ""));
        assertThrows(NullPointerException.class, () -> new Problem(Severity.ERROR, null, null, "f", "v", "r", ""));
        assertThrows(NullPointerException.class, () -> new Problem(Severity.ERROR, null, "x", null, "v", "r", ""));
        assertThrows(NullPointerException.class, () -> new Problem(Severity.ERROR, null, "x", "f", null, "r", ""));
        assertThrows(NullPointerException.class, () -> new Problem(Severity.ERROR, null, "x", "f", "v", null, ""));
        assertEquals("", new Problem(Severity.ERROR, null, "x", "f", "v", "r", null).fix());
    }
}
