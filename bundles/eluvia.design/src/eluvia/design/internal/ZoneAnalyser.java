package eluvia.design.internal;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import eluvia.design.ContaminantZone;
import eluvia.design.DesignInputException;
import eluvia.design.DesignSettings;
import eluvia.design.EnteredZoneComparison;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEstimator;
import eluvia.site.derived.ZoneGeometry;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.Site;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;
import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;
import eluvia.zone.ContaminantEstimate;
import eluvia.zone.ContaminantExceedance;
import eluvia.zone.ExceedanceZone;
import eluvia.zone.ExperimentalVariogram;
import eluvia.zone.InverseDistanceWeighting;
import eluvia.zone.OrdinaryKriging;
import eluvia.zone.SampleSet;
import eluvia.zone.SoilSample;
import eluvia.zone.VariogramModel;
import eluvia.zone.VariogramShape;
import eluvia.zone.ZoneInputException;

/**
 * The zone analysis of the pipeline: samples of the site model to {@link SoilSample}s, one block
 * model, an estimate per contaminant (by depth layer of blocks, so that progress is reported and a
 * cancel is honoured between layers), the exceedance zone and the comparison with the entered zones.
 *
 * <p>Automatic block sizes (when the settings give none): the plan size is the smallest of 0.25,
 * 0.5, 1, 2, 2.5, 5, 10, 20, 25, 50 and 100 m that keeps at most {@value #MAX_PLAN_CELLS_PER_SIDE}
 * blocks along the longer side of the model; the depth is the smallest of 0.1, 0.2, 0.25, 0.5, 1 and
 * 2 m that keeps at most {@value #MAX_DEPTH_LAYERS} layers over the soil profile (a stated choice:
 * blocks small against the zone, few enough for a fast run).
 */
public final class ZoneAnalyser {
    /** Most blocks along the longer plan side with automatic sizes. */
    static final int MAX_PLAN_CELLS_PER_SIDE = 100;
    /** Most block layers with automatic sizes. */
    static final int MAX_DEPTH_LAYERS = 16;
    /** Progress units of the estimate by inverse-distance weighting. */
    public static final double IDW_UNITS = 1;
    /** Progress units of the estimate by kriging. */
    public static final double KRIGING_UNITS = 5;

    private static final double[] PLAN_SIZES_METRES = { 0.25, 0.5, 1, 2, 2.5, 5, 10, 20, 25, 50, 100 };
    private static final double[] DEPTH_SIZES_METRES = { 0.1, 0.2, 0.25, 0.5, 1, 2 };

    private ZoneAnalyser() {
    }

    /** The samples of one contaminant, as the zone bundle takes them. */
    public static List<SoilSample> samplesOf(Site site, Contaminant c) {
        List<SoilSample> out = new ArrayList<>();
        for (SamplingLocation loc : site.getSamplingLocations()) {
            for (Sample s : loc.getSamples()) {
                if (s.getContaminant() != c) {
                    continue;
                }
                String label = "Sample of " + c.getName() + " at '" + loc.getName() + "', " + s.getTopDepthMetres() + " to "
                        + s.getBottomDepthMetres() + " m";
                try {
                    if (s.isNonDetect()) {
                        out.add(SoilSample.belowDetection(loc.getEastingMetres(), loc.getNorthingMetres(),
                                s.getTopDepthMetres(), s.getBottomDepthMetres(), s.getDetectionLimitMilligramsPerKg()));
                    } else {
                        out.add(new SoilSample(loc.getEastingMetres(), loc.getNorthingMetres(), s.getTopDepthMetres(),
                                s.getBottomDepthMetres(), s.getConcentrationMilligramsPerKg(), false,
                                s.getDetectionLimitMilligramsPerKg() > 0 ? s.getDetectionLimitMilligramsPerKg() : Double.NaN));
                    }
                } catch (ZoneInputException e) {
                    throw DesignInputException.of(s, label, sampleField(e.quantity()), e.value(), e.allowedRange(),
                            "correct the sample");
                }
            }
        }
        return out;
    }

    private static String sampleField(String quantity) {
        if (quantity.contains("bottomDepth")) {
            return "bottomDepthMetres";
        } else if (quantity.contains("topDepth")) {
            return "topDepthMetres";
        } else if (quantity.contains("detectionLimit")) {
            return "detectionLimitMilligramsPerKg";
        } else if (quantity.contains("concentration")) {
            return "concentrationMilligramsPerKg";
        } else if (quantity.contains("easting")) {
            return "eastingMetres";
        } else if (quantity.contains("northing")) {
            return "northingMetres";
        }
        return quantity;
    }

    /** Runs the analysis. */
    public static ZoneAnalysis analyse(Project project, DesignSettings settings, RunProgress progress) {
        Site site = project.getSite();
        ZoneEstimator estimator = settings.zoneEstimator();
        Map<Contaminant, List<SoilSample>> byContaminant = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        for (Contaminant c : project.getContaminants()) {
            List<SoilSample> samples = samplesOf(site, c);
            if (samples.isEmpty()) {
                continue;
            }
            if (levelOf(project, c) <= 0) {
                notes.add(c.getName() + " has samples but no soil cleanup level: it is not in the zone analysis.");
                continue;
            }
            byContaminant.put(c, samples);
        }
        if (byContaminant.isEmpty()) {
            return ZoneAnalysis.notAvailable(site.getSamplingLocations().isEmpty()
                    ? "the project has no sampling locations: the zone analysis needs soil samples"
                    : "no contaminant with a soil cleanup level has samples", estimator);
        }
        Object[] grid = blockModel(site, settings, byContaminant);
        BlockModel model = (BlockModel) grid[0];
        double radius = settings.searchRadiusMetres();
        String basis = (String) grid[1];
        if (Double.isNaN(radius)) {
            radius = automaticRadius(site);
            notes.add(Double.isInfinite(radius) ? "Search radius: no limit (a single sampling location)."
                    : String.format(Locale.ROOT, "Search radius %.4g m (scaled): the largest distance from a sampling "
                            + "location to its nearest neighbour (automatic); blocks farther from every sample have no "
                            + "estimate and are not counted.", radius));
        }
        notes.add("Depths of samples are below the ground at their location, with the ground taken as level over "
                + "the site (the locations' ground elevations are not used).");

        List<ContaminantEstimate> estimates = new ArrayList<>();
        List<ContaminantZone> zones = new ArrayList<>();
        List<Object[]> parts = new ArrayList<>();
        int done = 0;
        double units = unitsOf(settings);
        for (Map.Entry<Contaminant, List<SoilSample>> e : byContaminant.entrySet()) {
            Contaminant c = e.getKey();
            double level = levelOf(project, c);
            SampleSet samples = SampleSet.of(e.getValue(), settings.nonDetectRule(), settings.verticalDistanceFactor());
            ExperimentalVariogram experimental = experimental(samples);
            VariogramModel variogram = null;
            String variogramBasis = "";
            ZoneEstimator used = estimator;
            if (estimator == ZoneEstimator.ORDINARY_KRIGING) {
                if (settings.variogram() != null) {
                    variogram = settings.variogram();
                    variogramBasis = (settings.fromProject("variogram") ? "from the project: " : "set for this run: ")
                            + variogram.description();
                } else if (samples.size() >= 2 && samples.valueVarianceMgPerKgSquared() > 0) {
                    double range = 0.5 * largestDistance(samples);
                    variogram = new VariogramModel(VariogramShape.SPHERICAL, 0, samples.valueVarianceMgPerKgSquared(),
                            range);
                    variogramBasis = "stated default, not fitted: spherical, no nugget, sill = sample variance "
                            + fmt(samples.valueVarianceMgPerKgSquared()) + " (mg/kg)^2, range = half the largest sample "
                            + "separation = " + fmt(range) + " m (scaled); choose a model from the experimental variogram";
                } else {
                    used = ZoneEstimator.INVERSE_DISTANCE;
                    notes.add(c.getName() + ": kriging needs at least two distinct sample locations with different "
                            + "values; inverse-distance weighting was used instead.");
                }
            }
            final int index = done;
            final int count = byContaminant.size();
            BlockEstimate estimate = estimateByLayer(samples, model, used, variogram, radius, settings.inverseDistancePower(),
                    settings.maximumNeighbours(), f -> progress.within(units,
                    (index + f) / count));
            done++;
            double maxSample = 0;
            for (int p = 0; p < samples.size(); p++) {
                maxSample = Math.max(maxSample, samples.valueMgPerKg(p));
            }
            estimates.add(new ContaminantEstimate(c.getName(), estimate, level));
            parts.add(new Object[] { c, level, samples, maxSample, estimate, experimental, variogram, variogramBasis });
        }
        ExceedanceZone exceedance = ExceedanceZone.find(estimates);
        for (int i = 0; i < parts.size(); i++) {
            Object[] p = parts.get(i);
            Contaminant c = (Contaminant) p[0];
            SampleSet samples = (SampleSet) p[2];
            ContaminantExceedance ce = exceedance.byContaminant().get(i);
            zones.add(new ContaminantZone(c.getName(), (Double) p[1], samples.inputSampleCount(), samples.nonDetectCount(),
                    (Double) p[3], (BlockEstimate) p[4], ce, (ExperimentalVariogram) p[5], (VariogramModel) p[6],
                    (String) p[7]));
        }
        if (exceedance.unestimatedBlockCount() > 0) {
            notes.add(exceedance.unestimatedBlockCount() + " blocks have no estimate and are not counted.");
        }
        List<EnteredZoneComparison> entered = new ArrayList<>();
        for (TreatmentZone z : site.getZones()) {
            entered.add(compare(z, exceedance));
        }
        return new ZoneAnalysis(true, "", model, basis, estimator, zones, exceedance,
                exceedance.proposedTreatmentZone().orElse(null), entered, notes);
    }

    /** Progress units of the analysis under these settings. */
    public static double unitsOf(DesignSettings settings) {
        return settings.zoneEstimator() == ZoneEstimator.ORDINARY_KRIGING ? KRIGING_UNITS : IDW_UNITS;
    }

    /** The soil cleanup level of a contaminant, mg/kg, or 0 when it has none. */
    public static double levelOf(Project project, Contaminant c) {
        for (CleanupLevel level : project.getCleanupLevels()) {
            if (level.getContaminant() == c && level.isSoilLevelEntered() && level.getSoilLevelMilligramsPerKg() > 0) {
                return level.getSoilLevelMilligramsPerKg();
            }
        }
        return 0;
    }

    /** Estimates layer by layer of blocks (one depth layer per call of the estimator). */
    static BlockEstimate estimateByLayer(SampleSet samples, BlockModel model, ZoneEstimator estimator,
            VariogramModel variogram, double searchRadiusMetres, double power, int maximumNeighbours,
            java.util.function.DoubleConsumer fractionDone) {
        double[] values = new double[model.blockCount()];
        int perLayer = model.planCellCount();
        String description = null;
        InverseDistanceWeighting idw = new InverseDistanceWeighting(power, searchRadiusMetres, maximumNeighbours);
        OrdinaryKriging kriging = estimator == ZoneEstimator.ORDINARY_KRIGING
                ? new OrdinaryKriging(variogram, maximumNeighbours, searchRadiusMetres)
                : null;
        for (int k = 0; k < model.countDepth(); k++) {
            BlockModel layer = new BlockModel(model.originEastingMetres(), model.originNorthingMetres(),
                    model.topDepthMetres(k), model.blockEastingMetres(), model.blockNorthingMetres(),
                    model.blockDepthMetres(), model.countEasting(), model.countNorthing(), 1);
            BlockEstimate part = kriging != null ? kriging.estimate(samples, layer) : idw.estimate(samples, layer);
            System.arraycopy(part.concentrationsMgPerKg(), 0, values, k * perLayer, perLayer);
            description = part.methodDescription();
            fractionDone.accept((k + 1.0) / model.countDepth());
        }
        if (kriging != null) {
            description = "ordinary kriging, " + variogram.description() + ", up to "
                    + OrdinaryKriging.DEFAULT_MAX_NEIGHBOURS + " neighbours within " + (Double.isInfinite(searchRadiusMetres)
                            ? "any distance" : fmt(searchRadiusMetres) + " m (scaled)") + ", from " + samples.description();
        }
        return BlockEstimate.ofValues(model, values, description);
    }

    /** The largest plan distance from a sampling location to its nearest neighbour, m (infinite for one location). */
    static double automaticRadius(Site site) {
        List<double[]> points = new ArrayList<>();
        for (SamplingLocation l : site.getSamplingLocations()) {
            if (!l.getSamples().isEmpty()) {
                points.add(new double[] { l.getEastingMetres(), l.getNorthingMetres() });
            }
        }
        double largest = 0;
        for (double[] a : points) {
            double nearest = Double.POSITIVE_INFINITY;
            for (double[] b : points) {
                double d = Math.hypot(a[0] - b[0], a[1] - b[1]);
                if (d > 0) {
                    nearest = Math.min(nearest, d);
                }
            }
            if (Double.isFinite(nearest)) {
                largest = Math.max(largest, nearest);
            }
        }
        return largest > 0 ? largest : Double.POSITIVE_INFINITY;
    }

    private static ExperimentalVariogram experimental(SampleSet samples) {
        if (samples.size() < 2 || samples.size() > ExperimentalVariogram.MAX_POINTS) {
            return null;
        }
        double max = largestDistance(samples);
        if (!(max > 0)) {
            return null;
        }
        int lags = 10;
        return ExperimentalVariogram.compute(samples, 0.5 * max / lags, lags);
    }

    private static double largestDistance(SampleSet samples) {
        double max = 0;
        for (int a = 0; a < samples.size(); a++) {
            for (int b = a + 1; b < samples.size(); b++) {
                max = Math.max(max, samples.scaledDistanceMetres(a, b));
            }
        }
        return max;
    }

    /** The block model and the words that state how it was chosen. */
    static Object[] blockModel(Site site, DesignSettings settings, Map<Contaminant, List<SoilSample>> samples) {
        double minE = Double.POSITIVE_INFINITY;
        double maxE = Double.NEGATIVE_INFINITY;
        double minN = Double.POSITIVE_INFINITY;
        double maxN = Double.NEGATIVE_INFINITY;
        double deepest = 0;
        for (List<SoilSample> list : samples.values()) {
            for (SoilSample s : list) {
                minE = Math.min(minE, s.eastingMetres());
                maxE = Math.max(maxE, s.eastingMetres());
                minN = Math.min(minN, s.northingMetres());
                maxN = Math.max(maxN, s.northingMetres());
                deepest = Math.max(deepest, s.bottomDepthMetres());
            }
        }
        String extent;
        if (site.getBoundary().size() >= 3) {
            for (Vertex v : site.getBoundary()) {
                minE = Math.min(minE, v.getEastingMetres());
                maxE = Math.max(maxE, v.getEastingMetres());
                minN = Math.min(minN, v.getNorthingMetres());
                maxN = Math.max(maxN, v.getNorthingMetres());
            }
            extent = "the site boundary's bounding box (and every sample)";
        } else {
            for (TreatmentZone z : site.getZones()) {
                for (Vertex v : z.getFootprint()) {
                    minE = Math.min(minE, v.getEastingMetres());
                    maxE = Math.max(maxE, v.getEastingMetres());
                    minN = Math.min(minN, v.getNorthingMetres());
                    maxN = Math.max(maxN, v.getNorthingMetres());
                }
            }
            double m = settings.sampleMarginMetres();
            minE -= m;
            maxE += m;
            minN -= m;
            maxN += m;
            extent = "the samples' and zone footprints' extent with a margin of " + fmt(m)
                    + " m (the site has no boundary polygon)";
        }
        for (SoilLayer l : site.getLayers()) {
            deepest = Math.max(deepest, l.getBottomDepthMetres());
        }
        double width = Math.max(maxE - minE, 1e-6);
        double height = Math.max(maxN - minN, 1e-6);
        double plan = settings.blockPlanSizeMetres();
        String planBasis = settings.fromProject("blockPlanSizeMetres") ? "from the project" : "set for this run";
        if (Double.isNaN(plan)) {
            plan = PLAN_SIZES_METRES[PLAN_SIZES_METRES.length - 1];
            for (double s : PLAN_SIZES_METRES) {
                if (Math.ceil(Math.max(width, height) / s - 1e-9) <= MAX_PLAN_CELLS_PER_SIDE) {
                    plan = s;
                    break;
                }
            }
            planBasis = "automatic: the smallest of 0.25 to 100 m with at most " + MAX_PLAN_CELLS_PER_SIDE
                    + " blocks along the longer side";
        }
        double depth = settings.blockDepthMetres();
        String depthBasis = settings.fromProject("blockDepthMetres") ? "from the project" : "set for this run";
        if (Double.isNaN(depth)) {
            depth = DEPTH_SIZES_METRES[DEPTH_SIZES_METRES.length - 1];
            for (double s : DEPTH_SIZES_METRES) {
                if (Math.ceil(deepest / s - 1e-9) <= MAX_DEPTH_LAYERS) {
                    depth = s;
                    break;
                }
            }
            depthBasis = "automatic: the smallest of 0.1 to 2 m with at most " + MAX_DEPTH_LAYERS + " layers";
        }
        int nx = Math.max(1, (int) Math.ceil(width / plan - 1e-9));
        int ny = Math.max(1, (int) Math.ceil(height / plan - 1e-9));
        int nz = Math.max(1, (int) Math.ceil(deepest / depth - 1e-9));
        BlockModel model;
        try {
            model = new BlockModel(minE, minN, 0, plan, plan, depth, nx, ny, nz);
        } catch (ZoneInputException e) {
            throw DesignInputException.of(null, "Design settings", plan == settings.blockPlanSizeMetres()
                    ? "blockPlanSizeMetres" : "blockDepthMetres", e.value(), e.allowedRange(), "use larger blocks");
        }
        String basis = String.format(Locale.ROOT,
                "%d x %d x %d blocks of %s m x %s m x %s m from easting %s m, northing %s m, 0 to %s m deep, over %s; "
                        + "plan size %s, depth %s", nx, ny, nz, fmt(plan), fmt(plan), fmt(depth), fmt(minE), fmt(minN),
                fmt(nz * depth), extent, planBasis, depthBasis);
        return new Object[] { model, basis };
    }

    private static EnteredZoneComparison compare(TreatmentZone z, ExceedanceZone exceedance) {
        double enteredVolume = ZoneGeometry.volumeCubicMetres(z);
        double total = exceedance.volumeCubicMetres();
        if (z.getFootprint().size() < 3) {
            return new EnteredZoneComparison(z.getName(), enteredVolume, Double.NaN, Double.NaN, Double.NaN,
                    String.format(Locale.ROOT, "the entered zone has no footprint polygon, so it cannot be placed on the "
                            + "site; its volume %.1f m3 against %.1f m3 estimated above the cleanup level", enteredVolume,
                            total));
        }
        BlockModel m = exceedance.blockModel();
        double inside = 0;
        for (int b : exceedance.blockIndices()) {
            int k = m.layerOf(b);
            double depth = m.centreDepthMetres(k);
            if (depth >= z.getTopDepthMetres() && depth <= z.getBottomDepthMetres()
                    && ZoneGeometry.contains(z.getFootprint(), m.centreEastingMetres(m.columnOf(b)),
                            m.centreNorthingMetres(m.rowOf(b)))) {
                inside += m.blockVolumeCubicMetres();
            }
        }
        double outside = total - inside;
        double fraction = total > 0 ? inside / total : Double.NaN;
        String assessment;
        if (total == 0) {
            assessment = "no block is above a cleanup level: the samples do not support the entered zone";
        } else {
            assessment = String.format(Locale.ROOT, "the entered zone holds %.0f %% of the %.1f m3 estimated above the "
                    + "cleanup level (%.1f m3 lie outside it); it is %.2f times the estimated volume", 100 * fraction, total,
                    outside, enteredVolume / total);
            if (outside > 0.1 * total) {
                assessment += "; consider enlarging it towards the proposed zone";
            }
        }
        return new EnteredZoneComparison(z.getName(), enteredVolume, inside, outside, fraction, assessment);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
