package eluvia.report.content;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import eluvia.cost.CostEstimate;
import eluvia.design.AlternativeResult;
import eluvia.design.ContaminantFlushing;
import eluvia.design.DepthProfileSet;
import eluvia.design.DepthProfiles;
import eluvia.design.EnlargementPoint;
import eluvia.design.FlushingDesignResult;
import eluvia.design.FlushingMethod;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEnlargement;
import eluvia.design.ZoneOutline;
import eluvia.design.ContaminantZone;
import eluvia.report.chart.Axis;
import eluvia.report.chart.BarChart;
import eluvia.report.chart.BarSeries;
import eluvia.report.chart.DepthProfile;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.Marker;
import eluvia.report.chart.Outline;
import eluvia.report.chart.PlanView;
import eluvia.report.chart.SectionView;
import eluvia.report.chart.ValueGrid;
import eluvia.report.chart.ValuePoint;
import eluvia.report.chart.XySeries;
import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.FlushingModel;
import eluvia.transport.FlushingModels;
import eluvia.transport.LayerTransport;
import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;
import eluvia.zone.PlanPoint;
import eluvia.site.units.Dimension;

/**
 * The chart data of a design package, from results the pipeline already chose. The residual curves
 * sample the chosen analytical models ({@link FlushingModel#remainingFraction}) on a grid of pore
 * volumes: presentation of a result, not a new one. Nothing here solves anything else.
 */
public final class ResultFigures {

    /** Points of a residual curve (dimensionless count). */
    public static final int CURVE_POINTS = 121;
    /** Smallest fraction drawn on a logarithmic residual axis (dimensionless); lower points are left out. */
    public static final double SMALLEST_FRACTION_DRAWN = 1e-8;

    private ResultFigures() {
    }

    /**
     * Remaining fraction against pore volumes for every contaminant and criterion of a design by the
     * equilibrium finite-layer solution, and by the two-region solution for the design's criterion
     * where the contaminant has one; markers at the design's pore volumes and at each target.
     */
    public static LineChart residualCurves(FlushingDesignResult r) {
        double end = curveEnd(r);
        List<XySeries> series = new ArrayList<>();
        List<Marker> targets = new ArrayList<>();
        for (ContaminantFlushing c : r.contaminants()) {
            FlushingEstimate any = c.estimate(r.criterion());
            LayerTransport t = any.transport();
            FlushingModel equilibrium = FlushingModels.finiteLayer(t);
            for (CleanupCriterion k : CleanupCriterion.values()) {
                series.add(curve(c.contaminantName() + ", " + k.description() + " (equilibrium)", equilibrium, k, end));
            }
            if (c.twoRegion() != null && c.method(FlushingMethod.TWO_REGION).map(m -> m.available()).orElse(false)
                    && Double.isFinite(t.peclet())) {
                FlushingModel two = FlushingModels.twoRegion(t, c.twoRegion().beta(), c.twoRegion().omega());
                series.add(curve(c.contaminantName() + ", " + r.criterion().description() + " (two-region)", two,
                        r.criterion(), end));
            }
            if (c.targetFraction() > 0 && c.targetFraction() < 1) {
                targets.add(new Marker(c.targetFraction(), "target " + c.contaminantName()));
            }
        }
        List<Marker> pv = Double.isFinite(r.poreVolumes()) ? List.of(new Marker(r.poreVolumes(), "design"))
                : List.of();
        return new LineChart("", Axis.dimensionless("Pore volumes flushed"),
                Axis.dimensionless("Remaining fraction C/C0"), series, true, pv, targets);
    }

    /**
     * Residual soil concentration against depth over the treated column for the controlling
     * contaminant of a design at 0, 25 %, 50 % and 100 % of the design's pore volumes, as the design
     * bundle computes them ({@link DepthProfiles#ofControlling}); one series per time, named with its
     * pore volumes and calendar days; a vertical marker at the cleanup level, horizontal markers at
     * the layer bases. Logarithmic concentration axis: cells below {@link #SMALLEST_FRACTION_DRAWN}
     * of the initial concentration are left out. Null when the design has no profiles (the set says why).
     * Depths in metres (the design package).
     */
    public static DepthProfile depthProfiles(DepthProfileSet s) {
        return depthProfiles(s, FigureUnits.SI);
    }

    /** {@link #depthProfiles(DepthProfileSet)} with depths in the length unit of {@code units} (concentrations stay mg/kg). */
    public static DepthProfile depthProfiles(DepthProfileSet s, FigureUnits units) {
        if (s == null || !s.available() || s.profiles().isEmpty()) {
            return null;
        }
        List<XySeries> series = new ArrayList<>();
        for (DepthProfileSet.Profile p : s.profiles()) {
            // legend text: three significant figures are enough to tell the times apart (the CSV keeps every digit)
            String name = String.format(Locale.ROOT, "%.3g PV (%.0f %% of design, day %.3g)", p.poreVolumes(),
                    100 * p.shareOfDesign(), p.calendarDays());
            double[] c = p.soilMilligramsPerKg();
            double[] z = units.values(p.depthBelowGroundMetres(), Dimension.LENGTH);
            double floor = SMALLEST_FRACTION_DRAWN * s.initialSoilMilligramsPerKg();
            int n = 0;
            for (double v : c) {
                n += v >= floor ? 1 : 0;
            }
            double[] x = new double[n];
            double[] y = new double[n];
            for (int i = 0, k = 0; i < c.length; i++) {
                if (c[i] >= floor) {
                    x[k] = c[i];
                    y[k++] = z[i];
                }
            }
            if (n > 0) {
                series.add(new XySeries(name, x, y));
            }
        }
        if (series.isEmpty()) {
            return null;
        }
        List<Marker> levels = Double.isFinite(s.cleanupLevelMilligramsPerKg()) && s.cleanupLevelMilligramsPerKg() > 0
                ? List.of(new Marker(s.cleanupLevelMilligramsPerKg(), "cleanup level " + s.contaminantName()))
                : List.of();
        List<Marker> bases = new ArrayList<>();
        for (double b : s.layerBaseDepthsMetres()) {
            bases.add(new Marker(units.value(b, Dimension.LENGTH), "layer base"));
        }
        return new DepthProfile("", new Axis("Soil concentration, " + s.contaminantName(), "mg/kg"),
                units.axis("Depth below ground", Dimension.LENGTH), series, true, levels, bases);
    }

    /** The largest pore volumes drawn: a little past the design's, or the search limit when the target is not reached. */
    static double curveEnd(FlushingDesignResult r) {
        double end = 0;
        for (ContaminantFlushing c : r.contaminants()) {
            for (CleanupCriterion k : CleanupCriterion.values()) {
                FlushingEstimate e = c.estimate(k);
                if (e != null && e.result().reachable()) {
                    end = Math.max(end, e.result().poreVolumes());
                }
            }
        }
        if (Double.isFinite(r.poreVolumes())) {
            end = Math.max(end, r.poreVolumes());
        }
        if (!(end > 0)) {
            end = r.contaminants().isEmpty() ? 10 : r.contaminants().get(0).estimate(r.criterion()).result().maxPoreVolumes();
        }
        return 1.2 * end;
    }

    private static XySeries curve(String name, FlushingModel m, CleanupCriterion k, double end) {
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < CURVE_POINTS; i++) {
            double t = end * i / (CURVE_POINTS - 1);
            double f = m.remainingFraction(k, t);
            if (f >= SMALLEST_FRACTION_DRAWN) {
                pts.add(new double[] { t, f });
            }
        }
        double[] x = new double[pts.size()];
        double[] y = new double[pts.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = pts.get(i)[0];
            y[i] = pts.get(i)[1];
        }
        return new XySeries(name, x, y);
    }

    /**
     * Present value of each priced alternative of one currency, stacked: capital, present value of
     * annual O&amp;M, present value of periodic costs. Null when no alternative of the currency is priced.
     */
    public static BarChart costBreakdown(List<AlternativeResult> alternatives, String currency) {
        List<String> names = new ArrayList<>();
        List<double[]> parts = new ArrayList<>();
        for (AlternativeResult a : alternatives) {
            CostEstimate e = a.estimate();
            if (!a.available() || e == null || !e.currency().equals(currency)) {
                continue;
            }
            names.add(a.name());
            parts.add(new double[] { e.capital().total().amount(), e.presentValueOfAnnual().amount(),
                    e.presentValueOfPeriodic().amount() });
        }
        if (names.isEmpty()) {
            return null;
        }
        String[] series = { "Capital", "Present value of annual O&M", "Present value of periodic costs" };
        List<BarSeries> bars = new ArrayList<>();
        for (int s = 0; s < series.length; s++) {
            double[] v = new double[names.size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = parts.get(i)[s];
            }
            bars.add(new BarSeries(series[s], v));
        }
        return new BarChart("", new Axis("Present value", currency), "Alternative", names, bars, true);
    }

    /** Volume above the cleanup level (m³) against delay for each zone with an enlargement; null when none. */
    public static LineChart enlargement(List<ZoneEnlargement> enlargements) {
        return enlargement(enlargements, FigureUnits.SI);
    }

    /** {@link #enlargement(List)} with volumes in the volume unit of {@code units}. */
    public static LineChart enlargement(List<ZoneEnlargement> enlargements, FigureUnits units) {
        List<XySeries> series = new ArrayList<>();
        for (ZoneEnlargement z : enlargements) {
            if (!z.available() || z.envelope().isEmpty()) {
                continue;
            }
            double[] x = z.envelope().stream().mapToDouble(EnlargementPoint::delayYears).toArray();
            double[] y = units.values(z.envelope().stream().mapToDouble(EnlargementPoint::volumeAboveLevelCubicMetres)
                    .toArray(), Dimension.VOLUME);
            series.add(new XySeries(z.zoneName(), x, y));
        }
        if (series.isEmpty()) {
            return null;
        }
        return new LineChart("", new Axis("Delay before the remedy starts", "yr"),
                units.axis("Volume above the cleanup level", Dimension.VOLUME), series, false, List.of(), List.of());
    }

    /** The most columns of the block model drawn along each side; more are grouped (see {@link #plan}). */
    public static final int MAX_PLAN_CELLS_PER_SIDE = ValueGrid.MAX_CELLS_PER_SIDE;

    /**
     * Plan of the site in metres (the design package): see {@link #plan(Project, Contaminant, ZoneAnalysis, List, FigureUnits)}.
     */
    public static PlanView plan(Project p, Contaminant contaminant, ZoneAnalysis zones, List<ZoneEnlargement> enlargements) {
        return plan(p, contaminant, zones, enlargements, FigureUnits.SI);
    }

    /**
     * Plan of the site for one contaminant, to scale:
     * <ul>
     * <li>the block model of the zone analysis in plan: each column of blocks coloured by the highest
     * estimate of the contaminant over its depth (blocks without an estimate left out; a column with
     * none is not drawn). A model of more than {@value #MAX_PLAN_CELLS_PER_SIDE} columns along a side
     * is drawn in groups of whole columns, each group coloured by its highest estimate (so a group
     * shows above the cleanup level whenever one of its blocks is);</li>
     * <li>the sampling locations coloured by the highest sample of the contaminant there
     * (non-detects at their detection limit);</li>
     * <li>one colour scale (mg/kg, logarithmic) for both, with its colour step at the contaminant's
     * cleanup level;</li>
     * <li>the site boundary, the entered zones' footprints, the proposed zone of the zone analysis
     * (its footprint polygon: convex hull of the columns above a cleanup level of any contaminant) and
     * each entered zone's outline as the cost of delay prices it after the longest delay of the run's
     * enlargement: grown outward by the enlargement's plan growth ({@link ZoneOutline#grownBy}).</li>
     * </ul>
     * Coordinates in the length unit of {@code units}; concentrations in mg/kg. Null when there is
     * nothing to draw.
     *
     * @param zones        the run's zone analysis, or null for none (no block model, no proposed zone)
     * @param enlargements the run's enlargements (may be empty)
     */
    public static PlanView plan(Project p, Contaminant contaminant, ZoneAnalysis zones, List<ZoneEnlargement> enlargements,
            FigureUnits units) {
        List<ValuePoint> points = new ArrayList<>();
        for (SamplingLocation l : p.getSite().getSamplingLocations()) {
            double max = Double.NaN;
            for (Sample s : l.getSamples()) {
                if (s.getContaminant() != contaminant) {
                    continue;
                }
                double v = s.isNonDetect() ? s.getDetectionLimitMilligramsPerKg() : s.getConcentrationMilligramsPerKg();
                if (v > 0 && !(v <= max)) {
                    max = v;
                }
            }
            if (Double.isFinite(max)) {
                points.add(new ValuePoint(l.getName(), units.value(l.getEastingMetres(), Dimension.LENGTH),
                        units.value(l.getNorthingMetres(), Dimension.LENGTH), max));
            }
        }
        List<Outline> outlines = new ArrayList<>();
        if (p.getSite().getBoundary().size() >= 3) {
            outlines.add(outline("Site boundary", p.getSite().getBoundary(), Outline.Kind.BOUNDARY, units));
        }
        for (TreatmentZone z : p.getSite().getZones()) {
            if (z.getFootprint().size() >= 3) {
                outlines.add(outline(z.getName() + " (entered)", z.getFootprint(), Outline.Kind.ZONE, units));
            }
        }
        boolean analysed = zones != null && zones.available();
        if (analysed && zones.proposedZone() != null && zones.proposedZone().footprint().vertices().size() >= 3) {
            List<PlanPoint> v = zones.proposedZone().footprint().vertices();
            outlines.add(new Outline("Proposed zone (hull of the columns above a cleanup level)",
                    units.values(v.stream().mapToDouble(PlanPoint::eastingMetres).toArray(), Dimension.LENGTH),
                    units.values(v.stream().mapToDouble(PlanPoint::northingMetres).toArray(), Dimension.LENGTH),
                    Outline.Kind.PROPOSED));
        }
        for (ZoneEnlargement e : enlargements) {
            enlargedOutline(p, e).ifPresent(o -> outlines.add(new Outline(o.basis() + " (grown "
                    + units.format(o.grownMetres(), Dimension.LENGTH) + ")",
                    units.values(o.eastingMetres(), Dimension.LENGTH), units.values(o.northingMetres(), Dimension.LENGTH),
                    Outline.Kind.ENLARGED)));
        }
        ContaminantZone cz = !analysed ? null : zones.contaminants().stream()
                .filter(x -> x.contaminantName().equals(contaminant.getName()) && x.estimate() != null).findFirst()
                .orElse(null);
        ValueGrid grid = cz == null || cz.estimate().estimatedBlockCount() == 0 ? null : blockColumns(cz.estimate(), units);
        double level = cz != null ? cz.cleanupLevelMilligramsPerKg() : cleanupLevel(p, contaminant);
        Marker marker = level > 0 && Double.isFinite(level)
                ? new Marker(level, "cleanup level " + InputTables.number(level) + " mg/kg")
                : null;
        if (points.isEmpty() && outlines.isEmpty() && grid == null) {
            return null;
        }
        return new PlanView("", units.axis("Easting", Dimension.LENGTH), units.axis("Northing", Dimension.LENGTH),
                new Axis(contaminant.getName() + " in soil", "mg/kg"), points, outlines, true,
                "Sampling location: highest " + contaminant.getName() + " sample", grid, marker);
    }

    /**
     * The outline of an entered zone grown by the plan growth of its enlargement after the longest
     * delay of the run (the outline the cost of delay prices then), in metres; empty when the
     * enlargement is not available, the zone has no footprint polygon or nothing grows.
     */
    public static java.util.Optional<ZoneOutline> enlargedOutline(Project p, ZoneEnlargement e) {
        if (!e.available() || e.envelope().isEmpty()) {
            return java.util.Optional.empty();
        }
        EnlargementPoint last = e.envelope().stream().max(java.util.Comparator.comparingDouble(EnlargementPoint::delayYears))
                .orElseThrow();
        TreatmentZone z = p.getSite().getZones().stream().filter(x -> x.getName().equals(e.zoneName())).findFirst()
                .orElse(null);
        if (z == null || last.delayYears() == 0 || !(last.planGrowthMetres() > 0) || last.volumeAboveLevelCubicMetres() == 0) {
            return java.util.Optional.empty();
        }
        return ZoneOutline.of(z).map(o -> o.grownBy(last.planGrowthMetres(),
                z.getName() + " after " + InputTables.number(last.delayYears()) + " yr"));
    }

    /**
     * The columns of a block estimate, each with its highest estimate over depth (mg/kg, NaN when no
     * block of the column is estimated), grouped into whole columns so that at most
     * {@value #MAX_PLAN_CELLS_PER_SIDE} cells lie along each side.
     */
    static ValueGrid blockColumns(BlockEstimate estimate, FigureUnits units) {
        BlockModel m = estimate.blockModel();
        int nx = m.countEasting();
        int ny = m.countNorthing();
        int nz = m.countDepth();
        int gx = (nx + MAX_PLAN_CELLS_PER_SIDE - 1) / MAX_PLAN_CELLS_PER_SIDE;
        int gy = (ny + MAX_PLAN_CELLS_PER_SIDE - 1) / MAX_PLAN_CELLS_PER_SIDE;
        int cx = (nx + gx - 1) / gx;
        int cy = (ny + gy - 1) / gy;
        double[] v = new double[cx * cy];
        java.util.Arrays.fill(v, Double.NaN);
        for (int k = 0, b = 0; k < nz; k++) {
            for (int j = 0; j < ny; j++) {
                int row = (j / gy) * cx;
                for (int i = 0; i < nx; i++, b++) {
                    double c = estimate.concentrationMgPerKg(b);
                    int cell = row + i / gx;
                    if (!Double.isNaN(c) && !(c <= v[cell])) {
                        v[cell] = c;
                    }
                }
            }
        }
        String size = units.format(m.blockEastingMetres(), Dimension.LENGTH) + " x "
                + units.format(m.blockNorthingMetres(), Dimension.LENGTH);
        String name = gx == 1 && gy == 1 ? "Block columns (" + size + "): highest estimate over depth, blank if none"
                : "Block columns (" + size + ") in groups of " + gx + " x " + gy + ": highest estimate, blank if none";
        return new ValueGrid(name, units.value(m.originEastingMetres(), Dimension.LENGTH),
                units.value(m.originNorthingMetres(), Dimension.LENGTH),
                units.value(gx * m.blockEastingMetres(), Dimension.LENGTH),
                units.value(gy * m.blockNorthingMetres(), Dimension.LENGTH), cx, cy,
                units.value(m.originEastingMetres() + nx * m.blockEastingMetres(), Dimension.LENGTH),
                units.value(m.originNorthingMetres() + ny * m.blockNorthingMetres(), Dimension.LENGTH), v);
    }

    private static double cleanupLevel(Project p, Contaminant c) {
        return p.getCleanupLevels().stream().filter(l -> l.getContaminant() == c).mapToDouble(l -> l.getSoilLevelMilligramsPerKg())
                .findFirst().orElse(Double.NaN);
    }

    /**
     * Vertical section through a zone along easting: the zone as entered (its footprint's easting
     * extent, or the side of a square of its area, from its top to its bottom depth) and the zone
     * above the cleanup level after each delay of the pipeline's enlargement (the source widened by
     * the plan growth on both sides, from the top to the bottom depth the pipeline found), with the
     * layer boundaries. Null when the enlargement is not available. Metres (the design package).
     */
    public static SectionView section(Project p, ZoneEnlargement e) {
        return section(p, e, FigureUnits.SI);
    }

    /** {@link #section(Project, ZoneEnlargement)} with distances and depths in the length unit of {@code units}. */
    public static SectionView section(Project p, ZoneEnlargement e, FigureUnits units) {
        TreatmentZone z = p.getSite().getZones().stream().filter(x -> x.getName().equals(e.zoneName())).findFirst()
                .orElse(null);
        if (z == null || !e.available() || e.envelope().isEmpty()) {
            return null;
        }
        double width;
        if (z.getFootprint().size() >= 3) {
            double min = z.getFootprint().stream().mapToDouble(Vertex::getEastingMetres).min().orElseThrow();
            double max = z.getFootprint().stream().mapToDouble(Vertex::getEastingMetres).max().orElseThrow();
            width = max - min;
        } else {
            width = Math.sqrt(z.getEffectiveAreaSquareMetres());
        }
        if (!(width > 0)) {
            return null;
        }
        List<Outline> outlines = new ArrayList<>();
        double growthMax = e.envelope().stream().mapToDouble(EnlargementPoint::planGrowthMetres).max().orElse(0);
        double left = Math.max(0, growthMax);
        for (EnlargementPoint pt : e.envelope()) {
            if (pt.delayYears() == 0 || !(pt.bottomDepthMetres() > pt.topDepthMetres())) {
                continue;
            }
            double g = Math.max(0, pt.planGrowthMetres());
            outlines.add(rectangle("after " + InputTables.number(pt.delayYears()) + " yr", left - g, left + width + g,
                    pt.topDepthMetres(), pt.bottomDepthMetres(), Outline.Kind.ENLARGED, units));
        }
        outlines.add(rectangle(z.getName() + " as entered", left, left + width, z.getTopDepthMetres(), z.getBottomDepthMetres(),
                Outline.Kind.ZONE, units));
        List<Marker> layers = new ArrayList<>();
        for (eluvia.site.model.SoilLayer l : p.getSite().getLayers()) {
            layers.add(new Marker(units.value(l.getBottomDepthMetres(), Dimension.LENGTH), "base of " + l.getName()));
        }
        double depth = e.envelope().stream().mapToDouble(EnlargementPoint::bottomDepthMetres).max().orElse(z.getBottomDepthMetres());
        double exaggeration = Math.max(1, Math.min(10, Math.round((width + 2 * left) / Math.max(depth, 1e-3) / 2)));
        return new SectionView("", units.axis("Distance along the section (easting)", Dimension.LENGTH),
                units.axis("Depth below ground", Dimension.LENGTH), new Axis("Zone", Axis.DIMENSIONLESS), List.of(), outlines,
                false, exaggeration, layers);
    }

    private static Outline rectangle(String name, double x0, double x1, double top, double bottom, Outline.Kind kind,
            FigureUnits units) {
        return new Outline(name, units.values(new double[] { x0, x1, x1, x0 }, Dimension.LENGTH),
                units.values(new double[] { top, top, bottom, bottom }, Dimension.LENGTH), kind);
    }

    private static Outline outline(String name, List<Vertex> vs, Outline.Kind kind, FigureUnits units) {
        double[] x = vs.stream().mapToDouble(Vertex::getEastingMetres).toArray();
        double[] y = vs.stream().mapToDouble(Vertex::getNorthingMetres).toArray();
        return new Outline(name, units.values(x, Dimension.LENGTH), units.values(y, Dimension.LENGTH), kind);
    }

    /** A figure id from a name: lower case, letters and digits, hyphens between words. */
    public static String id(String prefix, String name) {
        String s = (prefix + "-" + name).toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-+)|(-+$)", "");
        return s.length() > 64 ? s.substring(0, 64).replaceAll("-+$", "") : s;
    }
}
