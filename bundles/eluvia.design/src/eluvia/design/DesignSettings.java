package eluvia.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import eluvia.cost.AccuracyRange;
import eluvia.cost.CapitalMarkups;
import eluvia.cost.EarthworkFactors;
import eluvia.cost.OperatingMarkups;
import eluvia.cost.PresentValue;
import eluvia.zone.NonDetectRule;
import eluvia.zone.SampleSet;
import eluvia.site.model.Project;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.zone.InverseDistanceWeighting;
import eluvia.zone.OrdinaryKriging;
import eluvia.zone.VariogramModel;
import eluvia.zone.VariogramShape;

/**
 * The choices of a pipeline run, each with a stated default. The zone-analysis choices can also be
 * project data (eluvia.site {@code ZoneAnalysisSettings}): {@link #resolvedFor(Project)} takes each
 * of them from the project unless the caller set it on the {@link Builder}, so a value set for a
 * run wins over the project's, and the project's over the default. Every result lists the settings
 * it was computed with ({@link #describe()}), and says of each whether it is the default, came from
 * the project or was set for the run, so that a reviewer sees every assumption.
 *
 * <p>Units are in the names: metres, metres per day, years, per cent. Dimensionless settings say
 * so below. {@link #defaults()} is what {@link DesignPipeline#run(eluvia.site.model.Project)} uses.
 * Bad values are refused by {@link Builder#build()} with a {@link DesignInputException} naming the
 * setting, the value and the allowed range.
 */
public final class DesignSettings {

    /** Default delays before the remedy starts, years: 0, 1, 2, 5 and 10 (a stated choice). */
    public static final double[] DEFAULT_DELAY_YEARS = { 0, 1, 2, 5, 10 };

    /**
     * Default transverse dispersivity over longitudinal dispersivity, 0.1 (dimensionless; common
     * practice, a tenth of the longitudinal value).
     */
    public static final double DEFAULT_TRANSVERSE_DISPERSIVITY_FRACTION = 0.1;

    /**
     * Default net infiltration (Darcy flux downwards) while nothing is done, m/d: 0.3 m per year
     * (from memory: a few hundred millimetres of net infiltration a year in a humid climate; not a
     * published constant - enter the site's value).
     */
    public static final double DEFAULT_DELAY_DARCY_FLUX_METRES_PER_DAY = 0.3 / 365.25;

    /** Default hot-spot multiple: blocks above 10 times the cleanup level are dug out in the hybrid (a stated choice). */
    public static final double DEFAULT_HOT_SPOT_MULTIPLE = 10.0;

    /** Default margin around the samples' extent when the site has no boundary, m (a stated choice). */
    public static final double DEFAULT_SAMPLE_MARGIN_METRES = 5.0;

    /** Default grid cells per axis of the enlargement integration (dimensionless count; see {@link #enlargementCellsPerAxis()}). */
    public static final int DEFAULT_ENLARGEMENT_CELLS_PER_AXIS = 200;

    /**
     * Default factors of imported backfill at its source: swell 0.25, shrinkage 0.10, bank density
     * 1.9 t/m3 (stated defaults within the common-practice ranges; Peurifoy, Table 4-1 as quoted for
     * the swell of common earth, 20-45 %). Enter the borrow source's values.
     */
    public static final EarthworkFactors DEFAULT_BORROW_SOIL = new EarthworkFactors(0.25, 0.10, 1.9,
            "stated default for borrow fill (swell 25 %, shrinkage 10 %, 1.9 t/m3; common-practice ranges): "
                    + "enter the borrow source's values");

    private final ZoneEstimator zoneEstimator;
    private final NonDetectRule nonDetectRule;
    private final double verticalDistanceFactor;
    private final double blockPlanSizeMetres;
    private final double blockDepthMetres;
    private final double sampleMarginMetres;
    private final double searchRadiusMetres;
    private final double inverseDistancePower;
    private final int maximumNeighbours;
    private final VariogramModel variogram;
    private final double[] delayYears;
    private final double transverseDispersivityFraction;
    private final double delayDarcyFluxMetresPerDay;
    private final int enlargementCellsPerAxis;
    private final double hotSpotMultiple;
    private final double discountRatePercent;
    private final boolean discountRateEntered;
    private final AccuracyRange accuracy;
    private final CapitalMarkups capitalMarkups;
    private final OperatingMarkups operatingMarkups;
    private final double extractionToInjectionRatio;
    private final boolean reuseOverburdenAsBackfill;
    private final EarthworkFactors borrowSoil;
    private final boolean pushDownBelowColumn;
    private final Set<String> fromProject;
    private final Builder source;

    private DesignSettings(Builder b) {
        this.source = b.copy();
        List<eluvia.site.validation.Problem> problems = new ArrayList<>();
        zoneEstimator = b.zoneEstimator;
        if (zoneEstimator == null) {
            problems.add(problem("zoneEstimator", "null", "INVERSE_DISTANCE or ORDINARY_KRIGING", ""));
        }
        nonDetectRule = b.nonDetectRule;
        if (nonDetectRule == null) {
            problems.add(problem("nonDetectRule", "null", "HALF_DETECTION_LIMIT, DETECTION_LIMIT or ZERO", ""));
        }
        verticalDistanceFactor = b.verticalDistanceFactor;
        if (!(verticalDistanceFactor > 0 && verticalDistanceFactor <= SampleSet.MAX_VERTICAL_DISTANCE_FACTOR)) {
            problems.add(problem("verticalDistanceFactor", num(verticalDistanceFactor),
                    "(0, " + SampleSet.MAX_VERTICAL_DISTANCE_FACTOR + "] (dimensionless)",
                    "the horizontal range of correlation over the vertical one; 1 is isotropic"));
        }
        blockPlanSizeMetres = b.blockPlanSizeMetres;
        if (!Double.isNaN(blockPlanSizeMetres) && !(blockPlanSizeMetres > 0 && blockPlanSizeMetres <= 1000)) {
            problems.add(problem("blockPlanSizeMetres", num(blockPlanSizeMetres), "(0, 1000] m, or NaN for the automatic choice", ""));
        }
        blockDepthMetres = b.blockDepthMetres;
        if (!Double.isNaN(blockDepthMetres) && !(blockDepthMetres > 0 && blockDepthMetres <= 100)) {
            problems.add(problem("blockDepthMetres", num(blockDepthMetres), "(0, 100] m, or NaN for the automatic choice", ""));
        }
        sampleMarginMetres = b.sampleMarginMetres;
        if (!(sampleMarginMetres >= 0 && sampleMarginMetres <= 10_000)) {
            problems.add(problem("sampleMarginMetres", num(sampleMarginMetres), "[0, 10000] m", ""));
        }
        searchRadiusMetres = b.searchRadiusMetres;
        if (!Double.isNaN(searchRadiusMetres) && !(searchRadiusMetres > 0)) {
            problems.add(problem("searchRadiusMetres", num(searchRadiusMetres),
                    "greater than 0 m (Infinity for no limit), or NaN for the automatic choice", ""));
        }
        inverseDistancePower = b.inverseDistancePower;
        if (!(inverseDistancePower > 0 && inverseDistancePower <= InverseDistanceWeighting.MAX_POWER)) {
            problems.add(problem("inverseDistancePower", num(inverseDistancePower),
                    "(0, " + InverseDistanceWeighting.MAX_POWER + "] (dimensionless)", "2 is common practice"));
        }
        maximumNeighbours = b.maximumNeighbours;
        if (!(maximumNeighbours >= 1 && maximumNeighbours <= OrdinaryKriging.MAX_NEIGHBOURS)) {
            problems.add(problem("maximumNeighbours", Integer.toString(maximumNeighbours),
                    "1 to " + OrdinaryKriging.MAX_NEIGHBOURS, "16 is a common choice"));
        }
        variogram = b.variogram;
        delayYears = b.delayYears == null ? null : b.delayYears.clone();
        if (delayYears == null || delayYears.length == 0) {
            problems.add(problem("delayYears", "(none)", "one or more delays in [0, 100] years", "e.g. 0, 1, 2, 5, 10"));
        } else {
            for (int i = 0; i < delayYears.length; i++) {
                if (!(delayYears[i] >= 0 && delayYears[i] <= 100) || (i > 0 && !(delayYears[i] > delayYears[i - 1]))) {
                    problems.add(problem("delayYears", Arrays.toString(delayYears),
                            "increasing delays, each in [0, 100] years", "list the delays in increasing order"));
                    break;
                }
            }
        }
        transverseDispersivityFraction = b.transverseDispersivityFraction;
        if (!(transverseDispersivityFraction > 0 && transverseDispersivityFraction <= 1)) {
            problems.add(problem("transverseDispersivityFraction", num(transverseDispersivityFraction),
                    "(0, 1] (dimensionless)", "transverse over longitudinal dispersivity, 0.1 by common practice"));
        }
        delayDarcyFluxMetresPerDay = b.delayDarcyFluxMetresPerDay;
        if (!(delayDarcyFluxMetresPerDay >= 0 && delayDarcyFluxMetresPerDay <= 1)) {
            problems.add(problem("delayDarcyFluxMetresPerDay", num(delayDarcyFluxMetresPerDay), "[0, 1] m/d",
                    "the net infiltration while nothing is done, in metres per day (0.3 m/yr = 0.00082 m/d)"));
        }
        enlargementCellsPerAxis = b.enlargementCellsPerAxis;
        if (enlargementCellsPerAxis < 8 || enlargementCellsPerAxis > 2000) {
            problems.add(problem("enlargementCellsPerAxis", Integer.toString(enlargementCellsPerAxis), "8 to 2000", ""));
        }
        hotSpotMultiple = b.hotSpotMultiple;
        if (!(hotSpotMultiple > 1 && hotSpotMultiple <= 1e6)) {
            problems.add(problem("hotSpotMultiple", num(hotSpotMultiple), "(1, 1000000] (dimensionless)",
                    "the hot spot is the soil above this multiple of the cleanup level"));
        }
        discountRatePercent = b.discountRatePercent;
        discountRateEntered = b.discountRateEntered;
        if (!(discountRatePercent > -100 && discountRatePercent <= 100)) {
            problems.add(problem("discountRatePercent", num(discountRatePercent), "(-100, 100] % per year",
                    "enter per cent per year (7 for 7 %)"));
        }
        accuracy = b.accuracy;
        if (accuracy == null) {
            problems.add(problem("accuracy", "null", "an accuracy range", "e.g. the feasibility-study range -30 % / +50 %"));
        }
        capitalMarkups = b.capitalMarkups;
        operatingMarkups = b.operatingMarkups;
        extractionToInjectionRatio = b.extractionToInjectionRatio;
        if (!(extractionToInjectionRatio >= 1 && extractionToInjectionRatio <= 10)) {
            problems.add(problem("extractionToInjectionRatio", num(extractionToInjectionRatio), "[1, 10] (dimensionless)",
                    "extracted volume per applied volume; 1 extracts as much as is applied"));
        }
        reuseOverburdenAsBackfill = b.reuseOverburdenAsBackfill;
        borrowSoil = b.borrowSoil;
        if (borrowSoil == null) {
            problems.add(problem("borrowSoil", "null", "earthwork factors of the borrow fill", ""));
        }
        pushDownBelowColumn = b.pushDownBelowColumn;
        fromProject = Set.copyOf(b.fromProject);
        if (!problems.isEmpty()) {
            throw new DesignInputException(problems);
        }
    }

    private static eluvia.site.validation.Problem problem(String field, String value, String range, String fix) {
        return new eluvia.site.validation.Problem(eluvia.site.validation.Severity.ERROR, null, "Design settings", field,
                value, range, fix);
    }

    private static String num(double v) {
        return Double.toString(v);
    }

    /** The defaults (see each accessor). */
    public static DesignSettings defaults() {
        return builder().build();
    }

    /** A builder starting from the defaults. */
    public static Builder builder() {
        return new Builder();
    }

    /** A builder starting from these settings. */
    public Builder toBuilder() {
        return source.copy();
    }

    /**
     * The settings a run of this project uses: each zone-analysis setting (estimator, non-detect
     * rule, vertical distance factor, block sizes, search radius, variogram, delays, transverse
     * dispersivity fraction, hot-spot multiple) that the caller did not set on the builder is taken
     * from the project's zone-analysis settings when the project has them; {@link #describe()} then
     * marks it "from the project". A 0 in the project's search radius, block sizes or variogram
     * range means the automatic choice, an empty delay list the default delays.
     *
     * @param project the project (null or without zone-analysis settings: these settings unchanged)
     * @throws DesignInputException when a project value is out of range (the message names the
     *         project's field), or when the project asks for an inverse-distance power or a number of
     *         neighbours other than the {@value InverseDistanceWeighting#DEFAULT_POWER} and
     *         {@value InverseDistanceWeighting#DEFAULT_MAX_NEIGHBOURS} the pipeline's zone analysis uses
     */
    public DesignSettings resolvedFor(Project project) {
        ZoneAnalysisSettings z = project == null ? null : project.getZoneAnalysis();
        if (z == null) {
            return this;
        }
        String label = "Zone analysis settings";
        List<eluvia.site.validation.Problem> problems = new ArrayList<>();
        if (!problems.isEmpty()) {
            throw new DesignInputException(problems);
        }
        Builder b = source.copy();
        Set<String> set = source.entered;
        if (!set.contains("zoneEstimator")) {
            b.zoneEstimator = ZoneEstimator.valueOf(z.getEstimator().getName());
            b.fromProject.add("zoneEstimator");
        }
        if (!set.contains("nonDetectRule")) {
            b.nonDetectRule = NonDetectRule.valueOf(z.getNonDetectRule().getName());
            b.fromProject.add("nonDetectRule");
        }
        if (!set.contains("verticalDistanceFactor")) {
            b.verticalDistanceFactor = z.getVerticalDistanceFactor();
            b.fromProject.add("verticalDistanceFactor");
        }
        if (!set.contains("blockPlanSizeMetres")) {
            b.blockPlanSizeMetres = z.getBlockPlanSizeMetres() == 0 ? Double.NaN : z.getBlockPlanSizeMetres();
            b.fromProject.add("blockPlanSizeMetres");
        }
        if (!set.contains("blockDepthMetres")) {
            b.blockDepthMetres = z.getBlockDepthMetres() == 0 ? Double.NaN : z.getBlockDepthMetres();
            b.fromProject.add("blockDepthMetres");
        }
        if (!set.contains("searchRadiusMetres")) {
            b.searchRadiusMetres = z.getSearchRadiusMetres() == 0 ? Double.NaN : z.getSearchRadiusMetres();
            b.fromProject.add("searchRadiusMetres");
        }
        if (!set.contains("inverseDistancePower")) {
            b.inverseDistancePower = z.getInverseDistancePower();
            b.fromProject.add("inverseDistancePower");
        }
        if (!set.contains("maximumNeighbours")) {
            b.maximumNeighbours = z.getMaximumNeighbours();
            b.fromProject.add("maximumNeighbours");
        }
        if (!set.contains("variogram")) {
            if (z.getVariogramRangeMetres() != 0) {
                try {
                    b.variogram = new VariogramModel(VariogramShape.valueOf(z.getVariogramModel().getName()),
                            z.getVariogramNuggetMgPerKgSquared(), z.getVariogramSillMgPerKgSquared(),
                            z.getVariogramRangeMetres());
                } catch (eluvia.zone.ZoneInputException e) {
                    String field = e.quantity().contains("nugget") ? "variogramNuggetMgPerKgSquared"
                            : e.quantity().contains("sill") ? "variogramSillMgPerKgSquared" : "variogramRangeMetres";
                    throw DesignInputException.of(z, label, field, e.value(), e.allowedRange(),
                            "enter the variogram read from the experimental variogram of the results");
                }
            } else {
                b.variogram = null;
            }
            b.fromProject.add("variogram");
        }
        if (!set.contains("delayYears")) {
            double[] delays = z.getDelayYears().stream().mapToDouble(Double::doubleValue).toArray();
            b.delayYears = delays.length == 0 ? DEFAULT_DELAY_YEARS.clone() : delays;
            b.fromProject.add("delayYears");
        }
        if (!set.contains("transverseDispersivityFraction")) {
            b.transverseDispersivityFraction = z.getTransverseDispersivityFraction();
            b.fromProject.add("transverseDispersivityFraction");
        }
        if (!set.contains("hotSpotMultiple")) {
            b.hotSpotMultiple = z.getHotSpotMultiple();
            b.fromProject.add("hotSpotMultiple");
        }
        try {
            return b.build();
        } catch (DesignInputException e) {
            List<eluvia.site.validation.Problem> named = new ArrayList<>();
            for (eluvia.site.validation.Problem p : e.problems()) {
                String field = projectField(p.field());
                named.add(b.fromProject.contains(p.field()) && field != null
                        ? new eluvia.site.validation.Problem(p.severity(), z, label, field, p.value(), p.allowedRange(), p.fix())
                        : p);
            }
            throw new DesignInputException(named);
        }
    }

    /** The project's field of a setting, or null. */
    private static String projectField(String setting) {
        return switch (setting) {
        case "zoneEstimator" -> "estimator";
        case "variogram" -> "variogramRangeMetres";
        case "nonDetectRule", "verticalDistanceFactor", "blockPlanSizeMetres", "blockDepthMetres", "searchRadiusMetres", "inverseDistancePower", "maximumNeighbours",
                "delayYears", "transverseDispersivityFraction", "hotSpotMultiple" -> setting;
        default -> null;
        };
    }

    /**
     * Whether a setting came from the project's zone-analysis settings ({@link #resolvedFor(Project)});
     * the name is the builder method's, e.g. "delayYears".
     */
    public boolean fromProject(String settingName) {
        return fromProject.contains(settingName);
    }

    /** Estimator of the block concentrations (default {@link ZoneEstimator#INVERSE_DISTANCE}). */
    public ZoneEstimator zoneEstimator() {
        return zoneEstimator;
    }

    /** Value a non-detect takes (default half the detection limit, common practice). */
    public NonDetectRule nonDetectRule() {
        return nonDetectRule;
    }

    /**
     * Vertical distance factor of the samples (dimensionless, horizontal over vertical range of
     * correlation; default {@value SampleSet#DEFAULT_VERTICAL_DISTANCE_FACTOR}, the zone bundle's stated judgement).
     */
    public double verticalDistanceFactor() {
        return verticalDistanceFactor;
    }

    /** Plan size of a block, m; NaN (default) for the automatic choice (see {@link DesignPipeline}). */
    public double blockPlanSizeMetres() {
        return blockPlanSizeMetres;
    }

    /** Depth of a block, m; NaN (default) for the automatic choice. */
    public double blockDepthMetres() {
        return blockDepthMetres;
    }

    /** Margin around the samples' extent when the site has no boundary polygon, m (default 5 m). */
    public double sampleMarginMetres() {
        return sampleMarginMetres;
    }

    /**
     * Search radius of the estimators, m (vertically scaled distance of eluvia.zone SampleSet); NaN
     * (default) for the automatic choice: the largest plan distance from a sampling location to
     * its nearest neighbour (a stated choice: every point of a sampled area without large holes is
     * within it of a sample, and the estimate reaches no farther than the sampling spacing beyond
     * the outermost samples), no limit with a single location. Blocks beyond it from every sample
     * have no estimate and are not counted. The volume above the level depends on it wherever the
     * sampling is sparse: look at the unestimated blocks and at the result with a larger radius.
     */
    public double searchRadiusMetres() {
        return searchRadiusMetres;
    }

    /** Power of the inverse-distance weights (dimensionless; 2, common practice, unless set). */
    public double inverseDistancePower() {
        return inverseDistancePower;
    }

    /** Most samples an estimate uses, for both estimators (16 unless set). */
    public int maximumNeighbours() {
        return maximumNeighbours;
    }

    /**
     * Variogram model for kriging; null (default) for the stated default rule: spherical, no
     * nugget, sill = the variance of the sample values, range = half the largest scaled distance
     * between samples (common practice as a first guess; not fitted - choose a model from the
     * experimental variogram the results show).
     */
    public VariogramModel variogram() {
        return variogram;
    }

    /** Delays before the remedy starts, years, increasing (a copy; default 0, 1, 2, 5, 10). */
    public double[] delayYears() {
        return delayYears.clone();
    }

    /** Transverse over longitudinal dispersivity (dimensionless; default 0.1, common practice). */
    public double transverseDispersivityFraction() {
        return transverseDispersivityFraction;
    }

    /** Net infiltration (downward Darcy flux) while nothing is done, m/d (default 0.3 m per year, stated). */
    public double delayDarcyFluxMetresPerDay() {
        return delayDarcyFluxMetresPerDay;
    }

    /**
     * Cells per axis of the grid on which the enlarged volume above the cleanup level is
     * integrated (a count; default {@value #DEFAULT_ENLARGEMENT_CELLS_PER_AXIS}): the cell-centre
     * (midpoint) rule over the plan quadrant that holds the zone, the depth interval of each column
     * found from a table. The depth interval closes like a square root at the edge of the zone, so
     * the error falls as the cell size to the power 1.5: against the transport bundle's quadrature
     * it was 1.2e-3, 3.9e-4, 1.4e-4 and 4.7e-5 (relative) at 50, 100, 200 and 400 cells in the tests.
     */
    public int enlargementCellsPerAxis() {
        return enlargementCellsPerAxis;
    }

    /** Hot spot of the hybrid: blocks above this multiple of the cleanup level (dimensionless; default 10). */
    public double hotSpotMultiple() {
        return hotSpotMultiple;
    }

    /**
     * Real discount rate, % per year (default {@link PresentValue#DEFAULT_RATE_RULE}). It prices
     * an alternative only when {@link #discountRateEntered()} or when the invented example book
     * prices it; otherwise the rate of the project's price book applies.
     */
    public double discountRatePercent() {
        return discountRatePercent;
    }

    /**
     * Whether the discount rate was set for this run ({@link Builder#discountRatePercent(double)}):
     * then it wins over the rate of a project's price book.
     */
    public boolean discountRateEntered() {
        return discountRateEntered;
    }

    /** Whether the discount rate is the default. */
    public boolean usesDefaultDiscountRate() {
        return discountRatePercent == PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT;
    }

    /** Accuracy range of every estimate (default the feasibility-study range of EPA 540-R-00-002). */
    public AccuracyRange accuracy() {
        return accuracy;
    }

    /**
     * Capital markups (contingency, professional and technical services); when set they win over
     * the price book's. Null (default): the markups of the project's price book that prices the
     * alternative (its percentage fields), or the invented markups of the example book when the
     * invented example book prices it; every estimate states which.
     */
    public CapitalMarkups capitalMarkups() {
        return capitalMarkups;
    }

    /** O&amp;M markups; null (default) as for {@link #capitalMarkups()}. */
    public OperatingMarkups operatingMarkups() {
        return operatingMarkups;
    }

    /** Extracted over applied water (dimensionless; default 1, balanced). */
    public double extractionToInjectionRatio() {
        return extractionToInjectionRatio;
    }

    /** Whether clean overburden goes back in the pit (default true, common practice). */
    public boolean reuseOverburdenAsBackfill() {
        return reuseOverburdenAsBackfill;
    }

    /** Factors of the imported backfill (default {@link #DEFAULT_BORROW_SOIL}). */
    public EarthworkFactors borrowSoil() {
        return borrowSoil;
    }

    /**
     * Whether to estimate how far below the treated column each flushing design pushes
     * contamination (default true; it takes a few hundred milliseconds per contaminant).
     */
    public boolean pushDownBelowColumn() {
        return pushDownBelowColumn;
    }

    /** Every setting as "name = value (basis)", defaults marked, for results and the design package. */
    public List<String> describe() {
        Builder d = new Builder();
        List<String> s = new ArrayList<>();
        s.add(line("zoneEstimator", "zone estimator", zoneEstimator.label(), zoneEstimator == d.zoneEstimator));
        s.add(line("nonDetectRule", "non-detects", nonDetectRule.description(), nonDetectRule == d.nonDetectRule));
        s.add(line("verticalDistanceFactor", "vertical distance factor (dimensionless)", fmt(verticalDistanceFactor),
                verticalDistanceFactor == d.verticalDistanceFactor));
        s.add(line("blockPlanSizeMetres", "block plan size (m)", Double.isNaN(blockPlanSizeMetres) ? "automatic" : fmt(blockPlanSizeMetres),
                Double.isNaN(blockPlanSizeMetres)));
        s.add(line("blockDepthMetres", "block depth (m)", Double.isNaN(blockDepthMetres) ? "automatic" : fmt(blockDepthMetres),
                Double.isNaN(blockDepthMetres)));
        s.add(line("margin around the samples without a site boundary (m)", fmt(sampleMarginMetres),
                sampleMarginMetres == d.sampleMarginMetres));
        s.add(line("searchRadiusMetres", "search radius (m, scaled)", Double.isNaN(searchRadiusMetres)
                ? "automatic: the largest nearest-neighbour distance between sampling locations"
                : fmt(searchRadiusMetres), Double.isNaN(searchRadiusMetres)));
        s.add(line("inverseDistancePower", "inverse-distance power (-)", fmt(inverseDistancePower),
                inverseDistancePower == d.inverseDistancePower));
        s.add(line("maximumNeighbours", "most neighbours of an estimate", Integer.toString(maximumNeighbours),
                maximumNeighbours == d.maximumNeighbours));
        s.add(line("variogram", "variogram", variogram == null
                ? "spherical, no nugget, sill = sample variance, range = half the largest sample separation (first guess, not fitted)"
                : variogram.description(), variogram == null));
        s.add(line("delayYears", "delays (years)", Arrays.toString(delayYears), Arrays.equals(delayYears, DEFAULT_DELAY_YEARS)));
        s.add(line("transverseDispersivityFraction", "transverse / longitudinal dispersivity (dimensionless)", fmt(transverseDispersivityFraction),
                transverseDispersivityFraction == d.transverseDispersivityFraction));
        s.add(line("net infiltration while nothing is done (m/d)", fmt(delayDarcyFluxMetresPerDay),
                delayDarcyFluxMetresPerDay == d.delayDarcyFluxMetresPerDay));
        s.add(line("enlargement grid cells per axis", Integer.toString(enlargementCellsPerAxis),
                enlargementCellsPerAxis == d.enlargementCellsPerAxis));
        s.add(line("hotSpotMultiple", "hot-spot multiple of the cleanup level (dimensionless)", fmt(hotSpotMultiple),
                hotSpotMultiple == d.hotSpotMultiple));
        s.add(line("real discount rate (% per year)", discountRateEntered ? fmt(discountRatePercent)
                : "the price book's rate; " + fmt(discountRatePercent) + " (" + PresentValue.DEFAULT_RATE_RULE
                        + ") with the invented example book", !discountRateEntered));
        s.add(line("accuracy range", accuracy.lowPercent() + " % / +" + accuracy.highPercent() + " % (" + accuracy.source()
                + ")", accuracy == d.accuracy));
        s.add(line("capital markups", capitalMarkups == null ? "the price book's markups (invented ones with the invented example book)"
                : capitalMarkups.toString(), capitalMarkups == null));
        s.add(line("O&M markups", operatingMarkups == null ? "the price book's markups (invented ones with the invented example book)"
                : operatingMarkups.toString(), operatingMarkups == null));
        s.add(line("extraction-to-injection ratio (dimensionless)", fmt(extractionToInjectionRatio),
                extractionToInjectionRatio == d.extractionToInjectionRatio));
        s.add(line("clean overburden reused as backfill", Boolean.toString(reuseOverburdenAsBackfill),
                reuseOverburdenAsBackfill == d.reuseOverburdenAsBackfill));
        s.add(line("borrow fill", borrowSoil.source() + " (swell " + fmt(borrowSoil.swellFraction()) + ", shrinkage "
                + fmt(borrowSoil.shrinkageFraction()) + ", " + fmt(borrowSoil.bankDensityTonnesPerCubicMetre()) + " t/m3)",
                borrowSoil == d.borrowSoil));
        s.add(line("depth flushing pushes contamination below the column", pushDownBelowColumn ? "estimated" : "not estimated",
                pushDownBelowColumn == d.pushDownBelowColumn));
        return s;
    }

    private static String line(String name, String value, boolean isDefault) {
        return name + " = " + value + (isDefault ? " [default]" : " [set for this run]");
    }

    private String line(String setting, String name, String value, boolean isDefault) {
        return fromProject.contains(setting) ? name + " = " + value + " [from the project]" : line(name, value, isDefault);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    /** Collects settings; {@link #build()} checks them all. */
    public static final class Builder {
        private ZoneEstimator zoneEstimator = ZoneEstimator.INVERSE_DISTANCE;
        private NonDetectRule nonDetectRule = NonDetectRule.HALF_DETECTION_LIMIT;
        private double verticalDistanceFactor = SampleSet.DEFAULT_VERTICAL_DISTANCE_FACTOR;
        private double blockPlanSizeMetres = Double.NaN;
        private double blockDepthMetres = Double.NaN;
        private double sampleMarginMetres = DEFAULT_SAMPLE_MARGIN_METRES;
        private double searchRadiusMetres = Double.NaN;
        private double inverseDistancePower = InverseDistanceWeighting.DEFAULT_POWER;
        private int maximumNeighbours = InverseDistanceWeighting.DEFAULT_MAX_NEIGHBOURS;
        private VariogramModel variogram;
        private double[] delayYears = DEFAULT_DELAY_YEARS.clone();
        private double transverseDispersivityFraction = DEFAULT_TRANSVERSE_DISPERSIVITY_FRACTION;
        private double delayDarcyFluxMetresPerDay = DEFAULT_DELAY_DARCY_FLUX_METRES_PER_DAY;
        private int enlargementCellsPerAxis = DEFAULT_ENLARGEMENT_CELLS_PER_AXIS;
        private double hotSpotMultiple = DEFAULT_HOT_SPOT_MULTIPLE;
        private double discountRatePercent = PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT;
        private boolean discountRateEntered;
        private AccuracyRange accuracy = AccuracyRange.FEASIBILITY_STUDY;
        private CapitalMarkups capitalMarkups;
        private OperatingMarkups operatingMarkups;
        private double extractionToInjectionRatio = 1.0;
        private boolean reuseOverburdenAsBackfill = true;
        private EarthworkFactors borrowSoil = DEFAULT_BORROW_SOIL;
        private boolean pushDownBelowColumn = true;
        /** Names of the zone-analysis settings set on this builder: they win over a project's. */
        private final Set<String> entered = new LinkedHashSet<>();
        /** Names of the settings taken from a project by {@link DesignSettings#resolvedFor(Project)}. */
        private final Set<String> fromProject = new LinkedHashSet<>();

        private Builder() {
        }

        private Builder copy() {
            Builder b = new Builder();
            b.zoneEstimator = zoneEstimator;
            b.nonDetectRule = nonDetectRule;
            b.verticalDistanceFactor = verticalDistanceFactor;
            b.blockPlanSizeMetres = blockPlanSizeMetres;
            b.blockDepthMetres = blockDepthMetres;
            b.sampleMarginMetres = sampleMarginMetres;
            b.searchRadiusMetres = searchRadiusMetres;
            b.inverseDistancePower = inverseDistancePower;
            b.maximumNeighbours = maximumNeighbours;
            b.variogram = variogram;
            b.delayYears = delayYears == null ? null : delayYears.clone();
            b.transverseDispersivityFraction = transverseDispersivityFraction;
            b.delayDarcyFluxMetresPerDay = delayDarcyFluxMetresPerDay;
            b.enlargementCellsPerAxis = enlargementCellsPerAxis;
            b.hotSpotMultiple = hotSpotMultiple;
            b.discountRatePercent = discountRatePercent;
            b.discountRateEntered = discountRateEntered;
            b.accuracy = accuracy;
            b.capitalMarkups = capitalMarkups;
            b.operatingMarkups = operatingMarkups;
            b.extractionToInjectionRatio = extractionToInjectionRatio;
            b.reuseOverburdenAsBackfill = reuseOverburdenAsBackfill;
            b.borrowSoil = borrowSoil;
            b.pushDownBelowColumn = pushDownBelowColumn;
            b.entered.addAll(entered);
            b.fromProject.addAll(fromProject);
            return b;
        }

        /** The estimator of the block concentrations. */
        public Builder zoneEstimator(ZoneEstimator value) {
            zoneEstimator = value;
            set("zoneEstimator");
            return this;
        }

        /** The value non-detects take. */
        public Builder nonDetectRule(NonDetectRule value) {
            nonDetectRule = value;
            set("nonDetectRule");
            return this;
        }

        /** The vertical distance factor (dimensionless). */
        public Builder verticalDistanceFactor(double value) {
            verticalDistanceFactor = value;
            set("verticalDistanceFactor");
            return this;
        }

        /** Plan size of a block, m (NaN for the automatic choice). */
        public Builder blockPlanSizeMetres(double value) {
            blockPlanSizeMetres = value;
            set("blockPlanSizeMetres");
            return this;
        }

        /** Depth of a block, m (NaN for the automatic choice). */
        public Builder blockDepthMetres(double value) {
            blockDepthMetres = value;
            set("blockDepthMetres");
            return this;
        }

        /** Margin around the samples without a site boundary, m. */
        public Builder sampleMarginMetres(double value) {
            sampleMarginMetres = value;
            return this;
        }

        /** Power of the inverse-distance weights (dimensionless, greater than 0). */
        public Builder inverseDistancePower(double value) {
            inverseDistancePower = value;
            set("inverseDistancePower");
            return this;
        }

        /** Most samples an estimate uses (IDW and kriging), 1 or more. */
        public Builder maximumNeighbours(int value) {
            maximumNeighbours = value;
            set("maximumNeighbours");
            return this;
        }

        /** Search radius of the estimators, m (scaled; NaN for the automatic choice, Infinity for none). */
        public Builder searchRadiusMetres(double value) {
            searchRadiusMetres = value;
            set("searchRadiusMetres");
            return this;
        }

        /** The variogram model for kriging (null for the stated default rule). */
        public Builder variogram(VariogramModel value) {
            variogram = value;
            set("variogram");
            return this;
        }

        /** Delays before the remedy starts, years, increasing. */
        public Builder delayYears(double... values) {
            delayYears = values == null ? null : values.clone();
            set("delayYears");
            return this;
        }

        /** Transverse over longitudinal dispersivity (dimensionless). */
        public Builder transverseDispersivityFraction(double value) {
            transverseDispersivityFraction = value;
            set("transverseDispersivityFraction");
            return this;
        }

        /** Net infiltration while nothing is done, m/d. */
        public Builder delayDarcyFluxMetresPerDay(double value) {
            delayDarcyFluxMetresPerDay = value;
            return this;
        }

        /** Cells per axis of the enlargement integration grid. */
        public Builder enlargementCellsPerAxis(int value) {
            enlargementCellsPerAxis = value;
            return this;
        }

        /** Hot-spot multiple of the cleanup level (dimensionless). */
        public Builder hotSpotMultiple(double value) {
            hotSpotMultiple = value;
            set("hotSpotMultiple");
            return this;
        }

        /**
         * Real discount rate, % per year; once set it wins over the rate of a project's price book
         * (see {@link DesignSettings#discountRateEntered()}).
         */
        public Builder discountRatePercent(double value) {
            discountRatePercent = value;
            discountRateEntered = true;
            return this;
        }

        /** Accuracy range. */
        public Builder accuracy(AccuracyRange value) {
            accuracy = value;
            return this;
        }

        /** Capital markups (null for the default rule). */
        public Builder capitalMarkups(CapitalMarkups value) {
            capitalMarkups = value;
            return this;
        }

        /** O&amp;M markups (null for the default rule). */
        public Builder operatingMarkups(OperatingMarkups value) {
            operatingMarkups = value;
            return this;
        }

        /** Extracted over applied water (dimensionless). */
        public Builder extractionToInjectionRatio(double value) {
            extractionToInjectionRatio = value;
            return this;
        }

        /** Whether clean overburden goes back in the pit. */
        public Builder reuseOverburdenAsBackfill(boolean value) {
            reuseOverburdenAsBackfill = value;
            return this;
        }

        /** Factors of the imported backfill. */
        public Builder borrowSoil(EarthworkFactors value) {
            borrowSoil = value;
            return this;
        }

        /** Whether to estimate how far below the treated column flushing pushes contamination. */
        public Builder pushDownBelowColumn(boolean value) {
            pushDownBelowColumn = value;
            return this;
        }

        /** Marks a setting as set for this run: it wins over the project's value and is no longer "from the project". */
        private void set(String name) {
            entered.add(name);
            fromProject.remove(name);
        }

        /** Checks every setting and makes the settings. */
        public DesignSettings build() {
            return new DesignSettings(this);
        }
    }
}
