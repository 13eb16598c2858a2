package eluvia.design;

import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import eluvia.design.internal.LayerCombination;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.validation.Problem;
import eluvia.site.validation.Severity;
import eluvia.site.validation.SiteValidator;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.FlushingScreening;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.TransportProperties;

/**
 * The design pipeline: a site model in, design results out. The workbench and the command line
 * both call this and nothing else, so that a number on screen and in a report is the same number.
 *
 * <p>Order: validation (errors stop the run), then for every flushing design the treated column's
 * combined layer properties ({@link EffectiveLayer}), then for every contaminant with a source
 * concentration in the zone and a soil cleanup level the pore volumes to reach the level under each
 * cleanup criterion (transport bundle, finite-layer solution of Brenner 1962), then duration and
 * water volumes from the controlling contaminant.
 */
public final class DesignPipeline {

    private DesignPipeline() {
    }

    /**
     * Runs the pipeline.
     *
     * @throws DesignInputException when validation finds errors; it carries every problem
     */
    public static DesignRun run(Project project) {
        Instant started = Instant.now();
        List<Problem> problems = SiteValidator.validate(project);
        List<Problem> errors = problems.stream().filter(p -> p.severity() == Severity.ERROR).toList();
        if (!errors.isEmpty()) {
            throw new DesignInputException(errors);
        }
        List<FlushingDesignResult> flushing = new ArrayList<>();
        for (FlushingDesign design : project.getFlushingDesigns()) {
            flushing.add(flush(project, design));
        }
        return new DesignRun(project.getName(), started, problems, List.copyOf(flushing), Cautions.forFlushing());
    }

    /** Results of one flushing design. */
    public static FlushingDesignResult flush(Project project, FlushingDesign design) {
        TreatmentZone zone = design.getZone();
        EffectiveLayer layer = LayerCombination.over(project.getSite().getLayers(), zone.getTopDepthMetres(),
                zone.getBottomDepthMetres());
        double area = zone.getAreaSquareMetres();
        CleanupCriterion criterion = CleanupCriterion.valueOf(design.getCriterion().getName());
        List<String> notes = new ArrayList<>();
        notes.add("Treated column " + layer.topDepthMetres() + " m to " + layer.bottomDepthMetres() + " m: "
                + layer.basis() + ".");

        List<ContaminantFlushing> rows = new ArrayList<>();
        for (SourceConcentration source : zone.getSourceConcentrations()) {
            Contaminant c = source.getContaminant();
            CleanupLevel level = cleanupLevelOf(project, c);
            if (level == null) {
                notes.add("No soil cleanup level for " + c.getName() + ": it is not assessed.");
                continue;
            }
            if (source.getSoilConcentrationMilligramsPerKg() <= level.getSoilLevelMilligramsPerKg()) {
                notes.add(c.getName() + " starts at or below its cleanup level (" + source.getSoilConcentrationMilligramsPerKg()
                        + " <= " + level.getSoilLevelMilligramsPerKg() + " mg/kg): no flushing needed for it.");
                continue;
            }
            rows.add(assess(layer, design, area, c, source.getSoilConcentrationMilligramsPerKg(),
                    level.getSoilLevelMilligramsPerKg()));
        }

        String controlling = null;
        double controllingPv = -1;
        boolean allReachable = true;
        for (ContaminantFlushing row : rows) {
            FlushingEstimate e = row.estimate(criterion);
            if (!e.result().reachable()) {
                allReachable = false;
                notes.add(row.contaminantName() + " does not reach its cleanup level by the " + criterion.description()
                        + " within " + design.getMaxPoreVolumes() + " pore volumes (it reaches "
                        + String.format("%.3g", e.result().remainingAtLimit()) + " of the initial concentration).");
                continue;
            }
            if (e.result().poreVolumes() > controllingPv) {
                controllingPv = e.result().poreVolumes();
                controlling = row.contaminantName();
            }
        }
        double onePv = layer.waterContent() * layer.thicknessMetres() * area;
        double pv = allReachable && controlling != null ? controllingPv : Double.NaN;
        double operatingDays = pv * layer.waterContent() * layer.thicknessMetres() / design.getDarcyFluxMetresPerDay();
        double calendarDays = operatingDays * 7.0 / design.getOperatingDaysPerWeek();
        double applied = pv * onePv;
        double captured = applied * design.getCaptureEfficiency();
        if (!Double.isNaN(layer.saturatedConductivityMetresPerDay())
                && design.getDarcyFluxMetresPerDay() > layer.saturatedConductivityMetresPerDay()) {
            notes.add("The Darcy flux " + design.getDarcyFluxMetresPerDay()
                    + " m/d exceeds the saturated hydraulic conductivity of the column ("
                    + String.format("%.3g", layer.saturatedConductivityMetresPerDay())
                    + " m/d, harmonic mean): the soil cannot take this flux under a unit gradient; lower the flux.");
        }
        return new FlushingDesignResult(design.getName(), zone.getName(), area, layer, onePv, criterion,
                List.copyOf(rows), controlling, allReachable, pv, operatingDays, calendarDays, applied, captured,
                applied - captured, design.getOperatingDaysPerWeek(), design.getCaptureEfficiency(),
                List.copyOf(notes));
    }

    private static ContaminantFlushing assess(EffectiveLayer layer, FlushingDesign design, double area, Contaminant c,
            double initialMgPerKg, double levelMgPerKg) {
        double kd;
        String kdBasis;
        if (c.isKdEntered()) {
            kd = c.getKdLitresPerKg();
            kdBasis = "entered";
        } else {
            kd = TransportProperties.kdFromKoc(c.getKocLitresPerKg(), layer.organicCarbonFraction());
            kdBasis = String.format("Koc x foc = %s L/kg x %.4g (Karickhoff et al. 1979)", c.getKocLitresPerKg(),
                    layer.organicCarbonFraction());
        }
        double decayPerDay = c.getHalfLifeDays() > 0 ? Math.log(2) / c.getHalfLifeDays() : 0;
        LayerFlushingInput input = new LayerFlushingInput(layer.thicknessMetres(), layer.waterContent(),
                layer.porosity(), layer.bulkDensityKgPerCubicMetre(), kd, design.getDarcyFluxMetresPerDay(),
                layer.dispersivityMetres(), c.getDiffusionSquareMetresPerSecond(), decayPerDay);
        double target = levelMgPerKg / initialMgPerKg;
        Map<CleanupCriterion, FlushingEstimate> estimates = new EnumMap<>(CleanupCriterion.class);
        for (CleanupCriterion criterion : CleanupCriterion.values()) {
            estimates.put(criterion, FlushingScreening.estimate(input, criterion, target, OptionalDouble.of(area),
                    design.getMaxPoreVolumes()));
        }
        return new ContaminantFlushing(c.getName(), initialMgPerKg, levelMgPerKg, target, kd, kdBasis, decayPerDay,
                estimates);
    }

    private static CleanupLevel cleanupLevelOf(Project project, Contaminant c) {
        for (CleanupLevel level : project.getCleanupLevels()) {
            if (level.getContaminant() == c && level.getSoilLevelMilligramsPerKg() > 0) {
                return level;
            }
        }
        return null;
    }
}
