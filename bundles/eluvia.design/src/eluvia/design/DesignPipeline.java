package eluvia.design;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import eluvia.cost.AlternativeKind;
import eluvia.cost.CostEstimate;
import eluvia.cost.CostInputException;
import eluvia.cost.CostOfDelay;
import eluvia.cost.FlushingInput;
import eluvia.cost.FlushingQuantities;
import eluvia.cost.MonitoringPlan;
import eluvia.cost.PitFootprint;
import eluvia.cost.QuantitySet;
import eluvia.design.internal.CostRecipes;
import eluvia.design.internal.Enlarger;
import eluvia.design.internal.ExcavationTakeOff;
import eluvia.design.internal.FlushingSolutions;
import eluvia.design.internal.LayerCombination;
import eluvia.design.internal.RunProgress;
import eluvia.design.internal.ZoneAnalyser;
import eluvia.site.derived.ZoneGeometry;
import eluvia.site.model.Contaminant;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SolutionMethod;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.validation.Problem;
import eluvia.site.validation.Severity;
import eluvia.site.validation.SiteValidator;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingPushDown;
import eluvia.transport.FluxLimit;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.TransportInputException;
import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;
import eluvia.zone.ContaminantEstimate;
import eluvia.zone.ExceedanceZone;
import eluvia.zone.PlanPoint;
import eluvia.zone.ZoneInputException;

/**
 * The design pipeline: a site model in, design results out. The workbench and the command line
 * both call this and nothing else, so that a number on screen and in a report is the same number.
 *
 * <p>Order (each stage's method and source in its result type):
 * <ol>
 * <li>validation (errors stop the run with a {@link DesignInputException} naming every field);</li>
 * <li>flushing, per design: the treated column's combined layer ({@link EffectiveLayer}); per
 * contaminant above its level the pore volumes to the level under each criterion by the
 * equilibrium finite layer (Brenner 1962) and the well-mixed estimate, by two-region
 * nonequilibrium when the contaminant has its parameters (with the rebound), by the numerical
 * layered solution when the design's solution method asks for it; the design's solution method
 * picks the governing one ({@link FlushingMethod}); duration and water from the controlling
 * contaminant; the flushing take-off (eluvia.cost FlushingQuantities); how far below the column
 * the flushing pushes contamination (eluvia.transport FlushingPushDown);</li>
 * <li>zone analysis from the samples ({@link ZoneAnalysis}, eluvia.zone);</li>
 * <li>enlargement of every entered zone by dispersion against delay ({@link ZoneEnlargement});</li>
 * <li>excavation take-off of every excavation design ({@link ExcavationResult}, eluvia.cost);</li>
 * <li>alternatives priced side by side: flushing per flushing design, excavation per excavation
 * design, hybrid per flushing design ({@link AlternativeResult}); cost of delay for flushing and
 * excavation ({@link CostOfDelayResult}).</li>
 * </ol>
 *
 * <p>The hybrid excavates the hot spot - the blocks of the zone analysis above
 * {@link DesignSettings#hotSpotMultiple()} times a cleanup level whose centres lie in the flushing
 * design's zone - and flushes the rest of the zone's area, with every contaminant taken at the
 * lower of its source concentration and the hot-spot threshold (no block left is estimated above
 * it). Monitoring: one effluent sample per monitoring interval of the design.
 */
public final class DesignPipeline {

    private DesignPipeline() {
    }

    /**
     * Runs the pipeline with the default settings and no progress reporting.
     *
     * @throws DesignInputException when validation finds errors; it carries every problem
     */
    public static DesignRun run(Project project) {
        return run(project, DesignSettings.defaults(), DesignProgress.NONE);
    }

    /**
     * Runs the pipeline.
     *
     * @param project the project
     * @param requested the run's settings ({@link DesignSettings#defaults()} for the stated defaults); the
     *        zone-analysis settings the caller did not set are taken from the project when it has them
     *        ({@link DesignSettings#resolvedFor(Project)}), and the run's notes and settings say so
     * @param progress receives progress and may cancel ({@link DesignProgress#NONE} for none)
     * @throws DesignInputException when the project or the settings have errors; it carries every problem
     * @throws DesignCancelledException when the progress receiver asked the run to stop
     */
    public static DesignRun run(Project project, DesignSettings requested, DesignProgress progress) {
        Instant started = Instant.now();
        if (requested == null) {
            throw DesignInputException.of(null, "Design settings", "settings", "null", "settings",
                    "pass DesignSettings.defaults()");
        }
        List<Problem> problems = SiteValidator.validate(project);
        List<Problem> errors = new ArrayList<>(problems.stream().filter(p -> p.severity() == Severity.ERROR).toList());
        if (errors.isEmpty()) {
            errors.addAll(designFieldProblems(project));
        }
        if (!errors.isEmpty()) {
            throw new DesignInputException(errors);
        }
        DesignSettings settings = requested.resolvedFor(project);
        RunProgress rp = new RunProgress(progress, units(project, settings));
        List<String> notes = new ArrayList<>();

        List<FlushingDesignResult> flushing = new ArrayList<>();
        for (FlushingDesign design : project.getFlushingDesigns()) {
            flushing.add(flush(project, design, settings, rp));
        }

        rp.begin("zone analysis from the samples");
        ZoneAnalysis zones = guarded(null, "Zone analysis", () -> ZoneAnalyser.analyse(project, settings, rp));
        rp.end(ZoneAnalyser.unitsOf(settings));

        List<ZoneEnlargement> enlargements = new ArrayList<>();
        for (TreatmentZone zone : project.getSite().getZones()) {
            rp.begin("enlargement of zone '" + zone.getName() + "' by dispersion");
            enlargements.add(guarded(zone, "Zone '" + zone.getName() + "'", () -> Enlarger.enlarge(project, zone,
                    layerOf(project, zone), settings)));
            rp.end(1);
        }

        List<ExcavationResult> excavations = new ArrayList<>();
        for (ExcavationDesign d : project.getExcavationDesigns()) {
            rp.begin("excavation take-off '" + d.getName() + "'");
            excavations.add(guarded(d, "Excavation design '" + d.getName() + "'",
                    () -> ExcavationTakeOff.size(project.getSite().getLayers(), d, settings)));
            rp.end(0.2);
        }

        List<AlternativeResult> alternatives = new ArrayList<>();
        List<CostOfDelayResult> delays = new ArrayList<>();
        for (int i = 0; i < flushing.size(); i++) {
            FlushingDesign d = project.getFlushingDesigns().get(i);
            FlushingDesignResult r = flushing.get(i);
            rp.begin("costs of flushing design '" + d.getName() + "'");
            AlternativeResult a = guarded(d, "Flushing design '" + d.getName() + "'",
                    () -> flushingAlternative(project, d, r, settings));
            alternatives.add(a);
            delays.add(guarded(d, "Flushing design '" + d.getName() + "'",
                    () -> flushingDelay(project, d, r, a, enlargementOf(enlargements, d.getZone()), settings)));
            rp.end(0.5);
        }
        for (int i = 0; i < excavations.size(); i++) {
            ExcavationDesign d = project.getExcavationDesigns().get(i);
            ExcavationResult x = excavations.get(i);
            rp.begin("costs of excavation design '" + d.getName() + "'");
            AlternativeResult a = guarded(d, "Excavation design '" + d.getName() + "'",
                    () -> excavationAlternative(project, d, x, settings));
            alternatives.add(a);
            delays.add(guarded(d, "Excavation design '" + d.getName() + "'",
                    () -> excavationDelay(project, d, a, enlargementOf(enlargements, d.getZone()), settings)));
            rp.end(0.5);
        }
        for (int i = 0; i < flushing.size(); i++) {
            FlushingDesign d = project.getFlushingDesigns().get(i);
            FlushingDesignResult r = flushing.get(i);
            rp.begin("hybrid of flushing design '" + d.getName() + "'");
            alternatives.add(guarded(d, "Flushing design '" + d.getName() + "'",
                    () -> hybridAlternative(project, d, r, zones, settings, rp)));
            rp.end(0);
        }

        String lowest = lowestPresentValue(alternatives, notes);
        List<String> cautions = new ArrayList<>(Cautions.forFlushing());
        boolean digging = alternatives.stream().anyMatch(a -> a.available() && a.kind() != AlternativeKind.FLUSHING);
        if (digging) {
            cautions.add(Cautions.EXCAVATION_SAFETY);
        }
        if (alternatives.stream().anyMatch(AlternativeResult::inventedRates)) {
            cautions.add(Cautions.INVENTED_EXAMPLE);
        }
        notes.add("Settings of this run: " + String.join("; ", settings.describe()) + ".");
        rp.begin("done");
        return new DesignRun(project.getName(), started, problems, flushing, cautions, settings, zones, enlargements,
                excavations, alternatives, lowest, delays, notes);
    }

    /** Results of one flushing design with the default settings. */
    public static FlushingDesignResult flush(Project project, FlushingDesign design) {
        return flush(project, design, DesignSettings.defaults(), new RunProgress(DesignProgress.NONE, 1));
    }

    private static FlushingDesignResult flush(Project project, FlushingDesign design, DesignSettings settings,
            RunProgress rp) {
        String label = "Flushing design '" + design.getName() + "'";
        return guarded(design, label, () -> flushOnce(project, design, design.getZone(), settings, rp, null));
    }

    /**
     * One flushing design over a zone; {@code rest} (hybrid) replaces the zone's area and caps the
     * initial concentrations.
     */
    private static FlushingDesignResult flushOnce(Project project, FlushingDesign design, TreatmentZone zone,
            DesignSettings settings, RunProgress rp, double[] rest) {
        EffectiveLayer layer = layerOf(project, zone);
        List<LayerCombination.Slice> slices = LayerCombination.slices(project.getSite().getLayers(),
                zone.getTopDepthMetres(), zone.getBottomDepthMetres());
        double area = rest != null ? rest[0] : ZoneGeometry.effectiveAreaSquareMetres(zone);
        double capMgPerKg = rest != null ? rest[1] : Double.POSITIVE_INFINITY;
        CleanupCriterion criterion = CleanupCriterion.valueOf(design.getCriterion().getName());
        List<String> notes = new ArrayList<>();
        notes.add("Treated column " + layer.topDepthMetres() + " m to " + layer.bottomDepthMetres() + " m: "
                + layer.basis() + ".");

        List<ContaminantFlushing> rows = new ArrayList<>();
        for (SourceConcentration source : zone.getSourceConcentrations()) {
            Contaminant c = source.getContaminant();
            double level = ZoneAnalyser.levelOf(project, c);
            if (level <= 0) {
                notes.add("No soil cleanup level for " + c.getName() + ": it is not assessed.");
                continue;
            }
            double initial = Math.min(source.getSoilConcentrationMilligramsPerKg(), capMgPerKg);
            if (initial <= level) {
                notes.add(c.getName() + " starts at or below its cleanup level (" + initial + " <= " + level
                        + " mg/kg): no flushing needed for it.");
                continue;
            }
            double units = design.getSolutionMethod() == SolutionMethod.NUMERICAL ? FlushingSolutions.NUMERICAL_UNITS
                    : FlushingSolutions.ANALYTICAL_UNITS;
            rp.begin((rest != null ? "hybrid rest, " : "") + "flushing design '" + design.getName() + "', " + c.getName());
            rows.add(FlushingSolutions.assess(layer, slices, design, area, c, initial, level, rp, notes));
            rp.end(units);
        }

        String controlling = null;
        double controllingPv = -1;
        boolean allReachable = true;
        for (ContaminantFlushing row : rows) {
            PoreVolumeResult e = row.governingResult(criterion);
            if (e == null) {
                allReachable = false;
                notes.add(row.contaminantName() + ": the governing " + row.governingMethod().label()
                        + " is not available (" + row.governing().unavailableReason() + "); the design has no pore "
                        + "volumes for it. The equilibrium figures are given for comparison.");
                continue;
            }
            if (!e.reachable()) {
                allReachable = false;
                notes.add(row.contaminantName() + " does not reach its cleanup level by the " + criterion.description()
                        + " within " + design.getMaxPoreVolumes() + " pore volumes by the " + row.governingMethod().label()
                        + " (it reaches " + String.format(Locale.ROOT, "%.3g", e.remainingAtLimit())
                        + " of the initial concentration).");
                continue;
            }
            if (e.poreVolumes() > controllingPv) {
                controllingPv = e.poreVolumes();
                controlling = row.contaminantName();
            }
        }
        double onePv = layer.waterContent() * layer.thicknessMetres() * area;
        double pv = allReachable && controlling != null ? controllingPv : Double.NaN;
        double operatingDays = pv * layer.waterContent() * layer.thicknessMetres() / design.getDarcyFluxMetresPerDay();
        double calendarDays = operatingDays * 7.0 / design.getOperatingDaysPerWeek();
        double applied = pv * onePv;
        double captured = applied * design.getCaptureEfficiency();
        if (Double.isFinite(layer.saturatedConductivityMetresPerDay()) && layer.saturatedConductivityMetresPerDay() > 0) {
            FluxLimit.Check flux = FluxLimit.check(design.getDarcyFluxMetresPerDay(),
                    layer.saturatedConductivityMetresPerDay());
            if (flux.status() != FluxLimit.Status.WITHIN) {
                notes.add("Flux check against the column's saturated hydraulic conductivity (harmonic mean of the "
                        + "layers): " + flux.message() + ".");
            }
        }
        FlushingQuantities quantities = null;
        List<BelowLayerPush> push = new ArrayList<>();
        if (Double.isFinite(pv) && pv > 0) {
            quantities = FlushingQuantities.of(new FlushingInput(pv, onePv, design.getDarcyFluxMetresPerDay(), area,
                    design.getOperatingDaysPerWeek(), design.getCaptureEfficiency(), settings.extractionToInjectionRatio(),
                    MonitoringPlan.perWeek(7.0 / design.getMonitoringIntervalDays()),
                    design.getAmendmentDoseKilogramsPerCubicMetre()));
            if (rest == null && settings.pushDownBelowColumn()) {
                for (ContaminantFlushing row : rows) {
                    push.add(pushDown(row, pv));
                }
            }
        } else if (!rows.isEmpty()) {
            notes.add("No flushing quantities or costs: the cleanup level is not reached by every contaminant.");
        }
        return new FlushingDesignResult(design.getName(), zone.getName(), area, layer, onePv, criterion, rows, controlling,
                allReachable, pv, operatingDays, calendarDays, applied, captured, applied - captured,
                design.getOperatingDaysPerWeek(), design.getCaptureEfficiency(), notes,
                design.getSolutionMethod().getName(), quantities, push);
    }

    private static BelowLayerPush pushDown(ContaminantFlushing row, double poreVolumes) {
        try {
            FlushingPushDown.Result r = FlushingPushDown.estimate(row.estimate(CleanupCriterion.EFFLUENT).input(),
                    poreVolumes, row.targetFraction());
            return new BelowLayerPush(row.contaminantName(), true, "", r);
        } catch (TransportInputException e) {
            return new BelowLayerPush(row.contaminantName(), false, e.getMessage(), null);
        }
    }

    private static EffectiveLayer layerOf(Project project, TreatmentZone zone) {
        try {
            return LayerCombination.over(project.getSite().getLayers(), zone.getTopDepthMetres(),
                    zone.getBottomDepthMetres());
        } catch (IllegalArgumentException e) {
            throw DesignInputException.of(zone, "Zone '" + zone.getName() + "'", "bottomDepthMetres",
                    zone.getBottomDepthMetres(), "within the soil layers", e.getMessage());
        }
    }

    private static ZoneEnlargement enlargementOf(List<ZoneEnlargement> list, TreatmentZone zone) {
        return zone == null ? null : list.stream().filter(e -> e.zoneName().equals(zone.getName())).findFirst().orElse(null);
    }

    // ---------------------------------------------------------------- alternatives

    private static AlternativeResult flushingAlternative(Project project, FlushingDesign d, FlushingDesignResult r,
            DesignSettings settings) {
        String name = "Flushing: " + d.getName();
        String basis = "flushing design '" + d.getName() + "' of zone '" + r.zoneName() + "', "
                + r.criterion().description() + ", " + d.getSolutionMethod().getLiteral().toLowerCase(Locale.ROOT)
                + " solution";
        if (r.quantities() == null) {
            return AlternativeResult.notAvailable(name, AlternativeKind.FLUSHING, basis,
                    "the cleanup level is not reached within the design's pore-volume limit (or the governing solution "
                            + "is not available): no quantities, no costs");
        }
        CostRecipes.BookChoice book = CostRecipes.bookFor(project, d.getPriceBook());
        QuantitySet q = r.quantities().toQuantitySet().merge(CostRecipes.lumpSums(book.example()));
        return priced(name, AlternativeKind.FLUSHING, basis, q, book, settings, r.quantities().calendarDays(), List.of());
    }

    private static AlternativeResult excavationAlternative(Project project, ExcavationDesign d, ExcavationResult x,
            DesignSettings settings) {
        String name = "Excavation: " + d.getName();
        String basis = "excavation design '" + d.getName() + "' of zone '" + x.zoneName() + "'";
        CostRecipes.BookChoice book = CostRecipes.bookFor(project, d.getPriceBook());
        QuantitySet q = x.quantities().toQuantitySet().merge(CostRecipes.lumpSums(book.example()));
        List<String> notes = new ArrayList<>(x.notes());
        notes.add("Duration not estimated: the project has no excavation production rate.");
        return priced(name, AlternativeKind.EXCAVATION, basis, q, book, settings, Double.NaN, notes);
    }

    private static AlternativeResult priced(String name, AlternativeKind kind, String basis, QuantitySet q,
            CostRecipes.BookChoice book, DesignSettings settings, double durationDays, List<String> extraNotes) {
        CostRecipes.Priced p = CostRecipes.recipe(name, kind, book, settings);
        if (p.recipe() == null) {
            return AlternativeResult.notAvailable(name, kind, basis, "no item of " + book.source()
                    + " prices this alternative: " + String.join("; ", p.unpriced()));
        }
        CostEstimate estimate = p.recipe().price(q);
        List<String> notes = new ArrayList<>(extraNotes);
        notes.add("Price book: " + book.source() + ".");
        notes.addAll(p.notes());
        return new AlternativeResult(name, kind, true, "", basis, q, estimate, book.book().name(), book.invented(),
                p.unpriced(), durationDays, notes);
    }

    private static ExcavationDesign excavationFor(Project project, TreatmentZone zone) {
        for (ExcavationDesign x : project.getExcavationDesigns()) {
            if (x.getZone() == zone) {
                return x;
            }
        }
        return project.getExcavationDesigns().isEmpty() ? null : project.getExcavationDesigns().get(0);
    }

    private static AlternativeResult hybridAlternative(Project project, FlushingDesign d, FlushingDesignResult r,
            ZoneAnalysis zones, DesignSettings settings, RunProgress rp) {
        double k = settings.hotSpotMultiple();
        String name = "Hybrid: excavate the hot spot, flush the rest (" + d.getName() + ")";
        TreatmentZone zone = d.getZone();
        String basis = String.format(Locale.ROOT, "hot spot = blocks above %s x the cleanup level in zone '%s', dug out; "
                + "the rest of the zone flushed by design '%s'", fmt(k), zone.getName(), d.getName());
        if (!zones.available()) {
            return AlternativeResult.notAvailable(name, AlternativeKind.HYBRID, basis,
                    "the hot spot needs the zone analysis from samples, which is not available: " + zones.unavailableReason());
        }
        BlockModel model = zones.blockModel();
        boolean polygon = zone.getFootprint().size() >= 3;
        List<ContaminantEstimate> hot = new ArrayList<>();
        for (ContaminantZone cz : zones.contaminants()) {
            double[] values = cz.estimate().concentrationsMgPerKg();
            for (int b = 0; b < values.length; b++) {
                double depth = model.centreDepthMetres(model.layerOf(b));
                boolean inside = depth >= zone.getTopDepthMetres() && depth <= zone.getBottomDepthMetres()
                        && (!polygon || ZoneGeometry.contains(zone.getFootprint(),
                                model.centreEastingMetres(model.columnOf(b)), model.centreNorthingMetres(model.rowOf(b))));
                if (!inside) {
                    values[b] = 0;
                }
            }
            hot.add(new ContaminantEstimate(cz.contaminantName(), BlockEstimate.ofValues(model, values,
                    cz.estimate().methodDescription()), k * cz.cleanupLevelMilligramsPerKg()));
        }
        ExceedanceZone hotSpot = ExceedanceZone.find(hot);
        if (hotSpot.isEmpty()) {
            return AlternativeResult.notAvailable(name, AlternativeKind.HYBRID, basis, "no block of zone '" + zone.getName()
                    + "' is estimated above " + fmt(k) + " times a cleanup level: there is no hot spot to dig out");
        }
        eluvia.zone.TreatmentZone dig = hotSpot.proposedTreatmentZone().orElseThrow();
        List<PlanPoint> vertices = dig.footprint().vertices();
        double[] x = new double[vertices.size()];
        double[] y = new double[vertices.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = vertices.get(i).eastingMetres();
            y[i] = vertices.get(i).northingMetres();
        }
        PitFootprint footprint = PitFootprint.convexPolygon(x, y);
        double zoneArea = ZoneGeometry.effectiveAreaSquareMetres(zone);
        double restArea = zoneArea - Math.min(footprint.areaSquareMetres(), zoneArea);
        if (restArea < 0.05 * zoneArea) {
            return AlternativeResult.notAvailable(name, AlternativeKind.HYBRID, basis, String.format(Locale.ROOT,
                    "the hot spot (%.1f m2) covers nearly all of the zone (%.1f m2): the hybrid is the excavation",
                    footprint.areaSquareMetres(), zoneArea));
        }
        ExcavationDesign xd = excavationFor(project, zone);
        ExcavationTakeOff.PitParameters p = ExcavationTakeOff.parametersOf(xd != null ? xd : defaultsNamed());
        List<String> notes = new ArrayList<>();
        String[] sb = new String[1];
        eluvia.cost.EarthworkFactors soil = ExcavationTakeOff.soilOver(project.getSite().getLayers(),
                dig.bottomDepthMetres() + p.overdigMetres(), sb, notes);
        eluvia.cost.ExcavationQuantities digQ = ExcavationTakeOff.size(footprint, dig.topDepthMetres(),
                dig.bottomDepthMetres(), p, soil, settings);
        notes.add(String.format(Locale.ROOT, "Hot spot: %d blocks (%.1f m3) above %s x a cleanup level, dug as %s from "
                + "%.3f to %.3f m deep; pit parameters from %s; side slope %s; soil: %s.", hotSpot.blockCount(),
                hotSpot.volumeCubicMetres(), fmt(k), dig.footprint().method(), dig.topDepthMetres(), dig.bottomDepthMetres(),
                xd != null ? "excavation design '" + xd.getName() + "'" : "the site model's excavation defaults",
                p.slopeBasis(), sb[0]));
        FlushingDesignResult restResult = flushRest(project, d, zone, settings, rp, restArea, k, notes);
        if (restResult.quantities() == null) {
            return AlternativeResult.notAvailable(name, AlternativeKind.HYBRID, basis, restResult.contaminants().isEmpty()
                    ? "after the hot spot no contaminant of the zone is above its cleanup level: the hybrid is an excavation"
                    : "the rest of the zone does not reach its cleanup level within the design's pore-volume limit");
        }
        notes.add(String.format(Locale.ROOT, "Rest of the zone: %.1f m2 of %.1f m2 flushed for %.4g pore volumes (%s), "
                + "each contaminant at the lower of its source concentration and %s x its cleanup level.", restArea, zoneArea,
                restResult.poreVolumes(), restResult.criterion().description(), fmt(k)));
        CostRecipes.BookChoice book = CostRecipes.bookFor(project, d.getPriceBook());
        QuantitySet q = digQ.toQuantitySet().merge(restResult.quantities().toQuantitySet())
                .merge(CostRecipes.lumpSums(book.example()));
        notes.addAll(restResult.notes());
        return priced(name, AlternativeKind.HYBRID, basis, q, book, settings, restResult.quantities().calendarDays(), notes);
    }

    private static ExcavationDesign defaultsNamed() {
        ExcavationDesign x = SiteFactory.eINSTANCE.createExcavationDesign();
        x.setName("site model defaults");
        return x;
    }

    private static FlushingDesignResult flushRest(Project project, FlushingDesign d, TreatmentZone zone,
            DesignSettings settings, RunProgress rp, double restArea, double k, List<String> notes) {
        // the cap differs per contaminant (k x its own level): flush a copy of the zone with capped concentrations
        TreatmentZone capped = org.eclipse.emf.ecore.util.EcoreUtil.copy(zone);
        for (int i = 0; i < capped.getSourceConcentrations().size(); i++) {
            SourceConcentration sc = zone.getSourceConcentrations().get(i);
            double level = ZoneAnalyser.levelOf(project, sc.getContaminant());
            if (level > 0) {
                capped.getSourceConcentrations().get(i).setSoilConcentrationMilligramsPerKg(
                        Math.min(sc.getSoilConcentrationMilligramsPerKg(), k * level));
            }
        }
        return flushOnce(project, d, capped, settings, rp, new double[] { restArea, Double.POSITIVE_INFINITY });
    }

    // ---------------------------------------------------------------- cost of delay

    /** Why the cost of delay of an alternative cannot be computed, or null when it can. */
    private static CostOfDelayResult delayNotAvailable(AlternativeResult a, ZoneEnlargement e, String zoneName) {
        if (!a.available()) {
            return CostOfDelayResult.notAvailable(a.name(), zoneName, "the alternative is not available");
        }
        if (e == null || !e.available()) {
            return CostOfDelayResult.notAvailable(a.name(), zoneName, "the zone's enlargement is not available"
                    + (e == null ? "" : ": " + e.unavailableReason()));
        }
        return null;
    }

    private static CostOfDelayResult flushingDelay(Project project, FlushingDesign d, FlushingDesignResult r,
            AlternativeResult a, ZoneEnlargement e, DesignSettings settings) {
        String zoneName = d.getZone().getName();
        CostOfDelayResult missing = delayNotAvailable(a, e, zoneName);
        if (missing != null) {
            return missing;
        }
        TreatmentZone zone = d.getZone();
        String[] fb = new String[1];
        PitFootprint outline = ExcavationTakeOff.footprintOf(zone, fb);
        FlushingInput base = r.quantities().input();
        double theta = r.layer().waterContent();
        CostRecipes.BookChoice book = CostRecipes.bookFor(project, d.getPriceBook());
        QuantitySet lump = CostRecipes.lumpSums(book.example());
        CostOfDelay cod = CostOfDelay.of(a.estimate().recipe(), delay -> {
            EnlargementPoint p = pointAt(e, delay);
            if (delay == 0 || p == null || p.volumeAboveLevelCubicMetres() == 0) {
                return a.quantities();
            }
            double area = outline.offset(p.planGrowthMetres()).areaSquareMetres();
            double thickness = p.bottomDepthMetres() - p.topDepthMetres();
            FlushingInput in = new FlushingInput(base.poreVolumes(), theta * thickness * area, base.darcyFluxMetresPerDay(),
                    area, base.operatingDaysPerWeek(), base.captureEfficiencyFraction(), base.extractionToInjectionRatio(),
                    base.monitoring(), base.amendmentDoseKilogramsPerCubicMetre());
            return FlushingQuantities.of(in).toQuantitySet().merge(lump);
        }, settings.delayYears());
        return new CostOfDelayResult(a.name(), zoneName, true, "", cod, "after each delay the zone's outline ("
                + fb[0] + ") is offset by the envelope's plan growth and the column runs over its enlarged depth range; "
                + "the same pore volumes are flushed (the peak falls as the zone spreads, so this errs on the long side)");
    }

    private static CostOfDelayResult excavationDelay(Project project, ExcavationDesign d, AlternativeResult a,
            ZoneEnlargement e, DesignSettings settings) {
        String zoneName = d.getZone() == null ? "" : d.getZone().getName();
        CostOfDelayResult missing = delayNotAvailable(a, e, zoneName);
        if (missing != null) {
            return missing;
        }
        TreatmentZone zone = d.getZone();
        String[] fb = new String[1];
        PitFootprint outline = ExcavationTakeOff.footprintOf(zone, fb);
        ExcavationTakeOff.PitParameters p = ExcavationTakeOff.parametersOf(d);
        CostRecipes.BookChoice book = CostRecipes.bookFor(project, d.getPriceBook());
        QuantitySet lump = CostRecipes.lumpSums(book.example());
        CostOfDelay cod = CostOfDelay.of(a.estimate().recipe(), delay -> {
            EnlargementPoint pt = pointAt(e, delay);
            if (delay == 0 || pt == null || pt.volumeAboveLevelCubicMetres() == 0) {
                return a.quantities();
            }
            List<String> ignored = new ArrayList<>();
            String[] sb = new String[1];
            eluvia.cost.EarthworkFactors soil = ExcavationTakeOff.soilOver(project.getSite().getLayers(),
                    pt.bottomDepthMetres() + p.overdigMetres(), sb, ignored);
            return ExcavationTakeOff.size(outline.offset(pt.planGrowthMetres()), pt.topDepthMetres(), pt.bottomDepthMetres(),
                    p, soil, settings).toQuantitySet().merge(lump);
        }, settings.delayYears());
        return new CostOfDelayResult(a.name(), zoneName, true, "", cod, "after each delay the zone's outline (" + fb[0]
                + ") is offset by the envelope's plan growth and dug over its enlarged depth range");
    }

    private static EnlargementPoint pointAt(ZoneEnlargement e, double delayYears) {
        for (EnlargementPoint p : e.envelope()) {
            if (p.delayYears() == delayYears) {
                return p;
            }
        }
        return null;
    }

    private static String lowestPresentValue(List<AlternativeResult> alternatives, List<String> notes) {
        AlternativeResult best = null;
        String currency = null;
        for (AlternativeResult a : alternatives) {
            if (!a.available()) {
                continue;
            }
            if (currency == null) {
                currency = a.estimate().currency();
            } else if (!currency.equals(a.estimate().currency())) {
                notes.add("The alternatives are priced in different currencies (" + currency + ", "
                        + a.estimate().currency() + "): their present values are not compared.");
                return null;
            }
            if (best == null || a.estimate().presentValue().amount() < best.estimate().presentValue().amount()) {
                best = a;
            }
        }
        if (best != null && alternatives.stream().anyMatch(a -> a.available() && !a.unpriced().isEmpty())) {
            notes.add("Some alternatives leave cost items unpriced (see each alternative): compare their present values "
                    + "with care.");
        }
        return best == null ? null : best.name();
    }

    // ---------------------------------------------------------------- checks and plumbing

    /** Problems in the design fields the pipeline uses beyond what the site validator checks. */
    static List<Problem> designFieldProblems(Project project) {
        List<Problem> out = new ArrayList<>();
        for (FlushingDesign d : project.getFlushingDesigns()) {
            String label = "Flushing design '" + d.getName() + "'";
            if (!(d.getMonitoringIntervalDays() > 0 && d.getMonitoringIntervalDays() <= 3650)) {
                out.add(error(d, label, "monitoringIntervalDays", d.getMonitoringIntervalDays(), "(0, 3650] days",
                        "enter the days between effluent samplings, e.g. 7"));
            }
            if (!(d.getAmendmentDoseKilogramsPerCubicMetre() >= 0 && d.getAmendmentDoseKilogramsPerCubicMetre() <= 1000)) {
                out.add(error(d, label, "amendmentDoseKilogramsPerCubicMetre", d.getAmendmentDoseKilogramsPerCubicMetre(),
                        "[0, 1000] kg/m3", "kg of amendment per m3 of flushing solution; 0 for plain water"));
            }
            if (d.getSolutionMethod() == SolutionMethod.NUMERICAL) {
                if (d.getNumericalCellCount() < 1 || d.getNumericalCellCount() > 100_000) {
                    out.add(error(d, label, "numericalCellCount", d.getNumericalCellCount(), "1 to 100000",
                            "200 cells over the zone depth is a good start"));
                }
                if (!(d.getNumericalRelativeTolerance() > 0 && d.getNumericalRelativeTolerance() <= 1e-2)) {
                    out.add(error(d, label, "numericalRelativeTolerance", d.getNumericalRelativeTolerance(), "(0, 0.01]",
                            "1e-6 is a good start"));
                }
            }
        }
        return out;
    }

    private static Problem error(org.eclipse.emf.ecore.EObject o, String label, String field, double value, String range,
            String fix) {
        return new Problem(Severity.ERROR, o, label, field, Double.toString(value), range, fix);
    }

    /** Runs a stage, turning the bundles' input exceptions into a {@link DesignInputException} naming the object. */
    private static <T> T guarded(org.eclipse.emf.ecore.EObject object, String label, java.util.function.Supplier<T> stage) {
        try {
            return stage.get();
        } catch (DesignInputException | DesignCancelledException e) {
            throw e;
        } catch (TransportInputException e) {
            throw DesignInputException.of(object, label, e.quantity(), e.value(), e.allowedRange(), "");
        } catch (ZoneInputException e) {
            throw DesignInputException.of(object, label, e.quantity(), e.value(), e.allowedRange(), "");
        } catch (CostInputException e) {
            throw DesignInputException.of(object, label, e.quantity(), e.value(), e.allowedRange(), "");
        }
    }

    private static double units(Project project, DesignSettings settings) {
        double u = ZoneAnalyser.unitsOf(settings) + project.getSite().getZones().size()
                + 0.2 * project.getExcavationDesigns().size();
        for (FlushingDesign d : project.getFlushingDesigns()) {
            u += 2 * hybridUnits(project, d) + 1;
        }
        return u;
    }

    private static double hybridUnits(Project project, FlushingDesign d) {
        int n = d.getZone() == null ? 0 : d.getZone().getSourceConcentrations().size();
        return n * (d.getSolutionMethod() == SolutionMethod.NUMERICAL ? FlushingSolutions.NUMERICAL_UNITS
                : FlushingSolutions.ANALYTICAL_UNITS);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
