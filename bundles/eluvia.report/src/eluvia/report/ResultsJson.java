package eluvia.report;

import eluvia.design.UncertaintyHeadline;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.CheapestAlternative;
import eluvia.design.uncertainty.InputSummary;
import eluvia.design.uncertainty.OutputStatistics;
import eluvia.design.uncertainty.TornadoBar;

import java.util.Map;

import eluvia.cost.AccuracyRange;
import eluvia.cost.CapitalCost;
import eluvia.cost.Caution;
import eluvia.cost.CostEstimate;
import eluvia.cost.CostOfDelay;
import eluvia.cost.ExcavationQuantities;
import eluvia.cost.LineItem;
import eluvia.cost.OperatingCost;
import eluvia.cost.PresentValue;
import eluvia.cost.Quantity;
import eluvia.cost.QuantitySet;
import eluvia.design.AlternativeResult;
import eluvia.design.BelowLayerPush;
import eluvia.design.ContaminantFlushing;
import eluvia.design.ContaminantSpreading;
import eluvia.design.ContaminantZone;
import eluvia.design.CostOfDelayResult;
import eluvia.design.DesignRun;
import eluvia.design.EffectiveLayer;
import eluvia.design.EnlargementPoint;
import eluvia.design.EnteredZoneComparison;
import eluvia.design.ExcavationResult;
import eluvia.design.FlushingDesignResult;
import eluvia.design.MethodEstimate;
import eluvia.design.NumericalDetail;
import eluvia.design.SpectralCheck;
import eluvia.design.TwoRegionDetail;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEnlargement;
import eluvia.site.validation.Problem;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.ReboundEstimate;
import eluvia.transport.numerical.MassBalance;
import eluvia.zone.BlockModel;
import eluvia.zone.ExperimentalVariogram;
import eluvia.zone.LagClass;
import eluvia.zone.PlanPoint;
import eluvia.zone.TreatmentZone;

/**
 * Writes a {@link DesignRun} as the {@code results.json} of a design package. The format is our
 * own and documented in {@code docs/results-json.md}; every quantity's unit is in its key (money
 * in the {@code currency} given beside it), and every cost line names its quantity and the
 * quantity its source.
 */
public final class ResultsJson {

    /**
     * Version of the results format; raise it when a key changes meaning or is removed. Version 2:
     * {@code flushing[].poreVolumes} (and the durations and water volumes) come from the design's
     * solution method, which before was always the equilibrium solution.
     */
    public static final int FORMAT_VERSION = 2;

    private ResultsJson() {
    }

    /** The JSON text of a run, with the SHA-256 of the project file it came from (may be null). */
    public static String of(DesignRun run, String projectSha256, String productVersion) {
        return of(run, projectSha256, productVersion, null, null);
    }

    /**
     * The JSON text of a run with, when given, the outcome of the verification cases run for the
     * package and the uncertainty analysis (either may be null).
     */
    public static String of(DesignRun run, String projectSha256, String productVersion,
            VerificationAppendix.Outcome verification, UncertaintyResults uncertainty) {
        Json j = new Json().beginObject();
        j.field("format", "eluvia-results").field("formatVersion", FORMAT_VERSION);
        j.field("project", run.projectName());
        j.field("projectSha256", projectSha256);
        j.field("productVersion", productVersion);
        j.field("startedAt", run.startedAt().toString());
        j.name("cautions").beginArray();
        run.cautions().forEach(j::value);
        j.endArray();
        j.name("warnings").beginArray();
        for (Problem p : run.problems()) {
            j.value(p.message());
        }
        j.endArray();
        j.name("settings").beginArray();
        run.settings().describe().forEach(j::value);
        j.endArray();
        j.name("flushing").beginArray();
        for (FlushingDesignResult r : run.flushing()) {
            writeFlushing(j, r);
        }
        j.endArray();
        j.name("zoneAnalysis");
        writeZones(j, run.zoneAnalysis());
        j.name("enlargement").beginArray();
        for (ZoneEnlargement e : run.enlargements()) {
            writeEnlargement(j, e);
        }
        j.endArray();
        j.name("excavations").beginArray();
        for (ExcavationResult x : run.excavations()) {
            writeExcavation(j, x);
        }
        j.endArray();
        j.name("alternatives").beginArray();
        for (AlternativeResult a : run.alternatives()) {
            writeAlternative(j, a);
        }
        j.endArray();
        j.field("lowestPresentValue", run.lowestPresentValue());
        j.name("costOfDelay").beginArray();
        for (CostOfDelayResult c : run.costOfDelay()) {
            writeCostOfDelay(j, c);
        }
        j.endArray();
        j.name("notes").beginArray();
        run.notes().forEach(j::value);
        j.endArray();
        if (verification != null) {
            writeVerification(j, verification);
        }
        if (uncertainty != null) {
            writeUncertainty(j, uncertainty);
        }
        return j.endObject().toString();
    }

    private static void writeFlushing(Json j, FlushingDesignResult r) {
        j.beginObject();
        j.field("design", r.designName()).field("zone", r.zoneName());
        j.field("zoneAreaM2", r.zoneAreaSquareMetres());
        EffectiveLayer l = r.layer();
        j.name("treatedColumn").beginObject()
                .field("topDepthM", l.topDepthMetres()).field("bottomDepthM", l.bottomDepthMetres())
                .field("thicknessM", l.thicknessMetres()).field("waterContent", l.waterContent())
                .field("porosity", l.porosity()).field("bulkDensityKgM3", l.bulkDensityKgPerCubicMetre())
                .field("organicCarbonFraction", l.organicCarbonFraction())
                .field("dispersivityM", l.dispersivityMetres())
                .field("saturatedConductivityMD", l.saturatedConductivityMetresPerDay())
                .field("basis", l.basis()).endObject();
        j.field("onePoreVolumeM3", r.onePoreVolumeCubicMetres());
        j.field("solutionMethod", r.solutionMethod());
        j.field("criterion", r.criterion().word());
        j.field("controllingContaminant", r.controllingContaminant());
        j.field("allReachable", r.allReachable());
        j.field("poreVolumes", r.poreVolumes());
        j.field("operatingDays", r.operatingDays()).field("calendarDays", r.calendarDays());
        j.field("operatingDaysPerWeek", r.operatingDaysPerWeek());
        j.field("waterAppliedM3", r.waterAppliedCubicMetres());
        j.field("captureEfficiency", r.captureEfficiency());
        j.field("waterCapturedM3", r.waterCapturedCubicMetres());
        j.field("waterEscapingM3", r.waterEscapingCubicMetres());
        j.name("contaminants").beginArray();
        for (ContaminantFlushing c : r.contaminants()) {
            j.beginObject();
            j.field("name", c.contaminantName()).field("initialSoilMgKg", c.initialSoilMilligramsPerKg())
                    .field("cleanupLevelMgKg", c.cleanupLevelMilligramsPerKg())
                    .field("targetFraction", c.targetFraction()).field("kdLKg", c.kdLitresPerKg())
                    .field("kdBasis", c.kdBasis()).field("decayPerDay", c.decayPerDay());
            FlushingEstimate any = c.estimate(CleanupCriterion.EFFLUENT);
            j.field("retardation", any.transport().retardation()).field("peclet", any.transport().peclet())
                    .field("poreWaterVelocityMD", any.transport().poreWaterVelocityMetresPerDay())
                    .field("dispersionM2D", any.transport().dispersionSquareMetresPerDay())
                    .field("wellMixedPoreVolumes", any.wellMixedPoreVolumes())
                    .field("plugFlowPoreVolumes", any.plugFlowPoreVolumes()).field("model", any.modelName());
            j.name("byCriterion").beginObject();
            for (CleanupCriterion k : CleanupCriterion.values()) {
                FlushingEstimate e = c.estimate(k);
                j.name(k.word()).beginObject().field("reachable", e.result().reachable())
                        .field("poreVolumes", e.result().poreVolumes()).field("durationDays", e.durationDays())
                        .field("waterVolumeM3", e.waterVolumeCubicMetres().orElse(Double.NaN))
                        .field("remainingAtLimit", e.result().remainingAtLimit()).endObject();
            }
            j.endObject();
            j.field("governingMethod", c.governingMethod().word());
            j.name("methods").beginObject();
            for (MethodEstimate m : c.methods()) {
                j.name(m.method().word()).beginObject().field("available", m.available())
                        .field("unavailableReason", m.unavailableReason()).field("description", m.description());
                j.name("byCriterion").beginObject();
                for (Map.Entry<CleanupCriterion, PoreVolumeResult> e : m.byCriterion().entrySet()) {
                    j.name(e.getKey().word()).beginObject().field("reachable", e.getValue().reachable())
                            .field("poreVolumes", e.getValue().poreVolumes())
                            .field("remainingAtLimit", e.getValue().remainingAtLimit()).endObject();
                }
                j.endObject().endObject();
            }
            j.endObject();
            writeTwoRegion(j, c.twoRegion());
            writeNumerical(j, c.numerical());
            j.endObject();
        }
        j.endArray();
        j.name("pushDown").beginArray();
        for (BelowLayerPush p : r.pushDown()) {
            j.beginObject().field("contaminant", p.contaminantName()).field("available", p.available())
                    .field("unavailableReason", p.unavailableReason());
            if (p.result() != null) {
                j.field("poreVolumesFlushed", p.result().poreVolumesFlushed())
                        .field("deepestBelowColumnM", p.result().deepestBelowLayerMetres())
                        .field("poreVolumesAtDeepest", p.result().poreVolumesAtDeepest())
                        .field("belowColumnAtEndM", p.result().belowLayerAtEndMetres())
                        .field("peakBelowColumnAtEndFraction", p.result().peakBelowLayerAtEndFraction());
            }
            j.endObject();
        }
        j.endArray();
        j.name("quantities");
        if (r.quantities() == null) {
            j.nullValue();
        } else {
            writeQuantities(j, r.quantities().toQuantitySet());
        }
        j.name("notes").beginArray();
        r.notes().forEach(j::value);
        j.endArray();
        j.endObject();
    }

    private static void writeTwoRegion(Json j, TwoRegionDetail t) {
        j.name("twoRegion");
        if (t == null) {
            j.nullValue();
            return;
        }
        j.beginObject().field("beta", t.beta()).field("omega", t.omega()).field("basis", t.basis());
        ReboundEstimate r = t.rebound();
        j.name("rebound").beginObject().field("effluentReachable", r.effluentResult().reachable())
                .field("effluentPoreVolumes", r.effluentResult().poreVolumes())
                .field("reboundAtOutletFraction", r.reboundAtOutletFraction())
                .field("reboundMeanFraction", r.reboundMeanFraction())
                .field("reboundMaxFraction", r.reboundMaxFraction())
                .field("waterMeetsButSoilDoesNot", r.waterMeetsButSoilDoesNot()).field("text", r.describe()).endObject();
        j.endObject();
    }

    private static void writeNumerical(Json j, NumericalDetail n) {
        j.name("numerical");
        if (n == null) {
            j.nullValue();
            return;
        }
        MassBalance m = n.massBalance();
        j.beginObject().field("layerCount", n.layerCount()).field("cellCount", n.cellCount())
                .field("acceptedSteps", n.acceptedSteps()).field("rejectedSteps", n.rejectedSteps())
                .field("stepTolerance", n.stepTolerance()).field("maximumCellSizeM", n.maximumCellSizeMetres())
                .field("isotherm", n.isotherm()).field("nonequilibrium", n.nonequilibrium())
                .field("massBalanceRelativeError", n.massBalanceRelativeError());
        j.name("massBalance").beginObject().field("initialStoredMgM2", m.initialStoredMilligramsPerSquareMetre())
                .field("inflowMgM2", m.inflowMilligramsPerSquareMetre())
                .field("outflowMgM2", m.outflowMilligramsPerSquareMetre())
                .field("decayedMgM2", m.decayedMilligramsPerSquareMetre())
                .field("finalStoredMgM2", m.finalStoredMilligramsPerSquareMetre()).endObject();
        SpectralCheck s = n.spectralCheck();
        j.name("spectralCheck").beginObject().field("available", s.available())
                .field("unavailableReason", s.unavailableReason()).field("degree", s.degree())
                .field("pointCount", s.pointCount());
        j.name("byCriterion").beginObject();
        for (CleanupCriterion k : CleanupCriterion.values()) {
            PoreVolumeResult r = s.byCriterion().get(k);
            if (r != null) {
                j.name(k.word()).beginObject().field("reachable", r.reachable()).field("poreVolumes", r.poreVolumes())
                        .endObject();
            }
        }
        j.endObject().endObject();
        j.endObject();
    }

    private static void writeQuantities(Json j, QuantitySet q) {
        j.beginArray();
        for (Quantity x : q.all()) {
            j.beginObject().field("name", x.name()).field("amount", x.amount()).field("unit", x.unit().symbol())
                    .field("source", x.source()).endObject();
        }
        j.endArray();
    }

    private static void writeZones(Json j, ZoneAnalysis z) {
        j.beginObject().field("available", z.available()).field("unavailableReason", z.unavailableReason())
                .field("estimator", z.estimator().label());
        if (z.available()) {
            BlockModel m = z.blockModel();
            j.name("blockModel").beginObject().field("originEastingM", m.originEastingMetres())
                    .field("originNorthingM", m.originNorthingMetres()).field("originDepthM", m.originDepthMetres())
                    .field("blockEastingM", m.blockEastingMetres()).field("blockNorthingM", m.blockNorthingMetres())
                    .field("blockDepthM", m.blockDepthMetres()).field("countEasting", m.countEasting())
                    .field("countNorthing", m.countNorthing()).field("countDepth", m.countDepth())
                    .field("basis", z.blockModelBasis()).endObject();
            j.field("volumeAboveLevelM3", z.exceedance().volumeCubicMetres())
                    .field("blocksAbove", z.exceedance().blockCount())
                    .field("footprintAreaM2", z.exceedance().footprintAreaSquareMetres())
                    .field("topDepthM", z.exceedance().topDepthMetres())
                    .field("bottomDepthM", z.exceedance().bottomDepthMetres())
                    .field("unestimatedBlocks", z.exceedance().unestimatedBlockCount())
                    .field("description", z.exceedance().description());
            j.name("proposedZone");
            TreatmentZone p = z.proposedZone();
            if (p == null) {
                j.nullValue();
            } else {
                j.beginObject().name("footprint").beginArray();
                for (PlanPoint v : p.footprint().vertices()) {
                    j.beginObject().field("eastingM", v.eastingMetres()).field("northingM", v.northingMetres()).endObject();
                }
                j.endArray().field("areaM2", p.footprint().areaSquareMetres()).field("topDepthM", p.topDepthMetres())
                        .field("bottomDepthM", p.bottomDepthMetres()).field("volumeM3", p.volumeCubicMetres())
                        .field("basis", p.basis()).endObject();
            }
            j.name("contaminants").beginArray();
            for (ContaminantZone c : z.contaminants()) {
                j.beginObject().field("name", c.contaminantName()).field("cleanupLevelMgKg", c.cleanupLevelMilligramsPerKg())
                        .field("samples", c.sampleCount()).field("nonDetects", c.nonDetectCount())
                        .field("maxSampleMgKg", c.maxSampleMilligramsPerKg())
                        .field("blocksAbove", c.exceedance().blockCount())
                        .field("volumeAboveLevelM3", c.exceedance().volumeCubicMetres())
                        .field("maxBlockMgKg", c.exceedance().maxConcentrationMgPerKg())
                        .field("unestimatedBlocks", c.exceedance().unestimatedBlockCount())
                        .field("method", c.exceedance().methodDescription())
                        .field("variogram", c.variogramUsed() == null ? null : c.variogramUsed().description())
                        .field("variogramBasis", c.variogramBasis());
                j.name("experimentalVariogram");
                ExperimentalVariogram v = c.experimentalVariogram();
                if (v == null) {
                    j.nullValue();
                } else {
                    j.beginArray();
                    for (LagClass lag : v.lagClasses()) {
                        j.beginObject().field("fromM", lag.fromMetres()).field("toM", lag.toMetres())
                                .field("meanLagM", lag.meanLagMetres()).field("pairs", lag.pairCount())
                                .field("semivarianceMgKg2", lag.semivarianceMgPerKgSquared()).endObject();
                    }
                    j.endArray();
                }
                j.endObject();
            }
            j.endArray();
            j.name("enteredZones").beginArray();
            for (EnteredZoneComparison e : z.enteredZones()) {
                j.beginObject().field("zone", e.zoneName()).field("enteredVolumeM3", e.enteredVolumeCubicMetres())
                        .field("estimatedInsideM3", e.estimatedInsideCubicMetres())
                        .field("estimatedOutsideM3", e.estimatedOutsideCubicMetres())
                        .field("fractionInside", e.fractionInside()).field("assessment", e.assessment()).endObject();
            }
            j.endArray();
        }
        j.name("notes").beginArray();
        z.notes().forEach(j::value);
        j.endArray();
        j.endObject();
    }

    private static void writePoint(Json j, EnlargementPoint p) {
        j.beginObject().field("delayYears", p.delayYears()).field("volumeAboveLevelM3", p.volumeAboveLevelCubicMetres())
                .field("unboundedVolumeM3", p.unboundedVolumeCubicMetres()).field("ratio", p.ratio())
                .field("peakFraction", p.peakFraction()).field("footprintAreaM2", p.footprintAreaSquareMetres())
                .field("planGrowthM", p.planGrowthMetres()).field("topDepthM", p.topDepthMetres())
                .field("bottomDepthM", p.bottomDepthMetres()).endObject();
    }

    private static void writeEnlargement(Json j, ZoneEnlargement e) {
        j.beginObject().field("zone", e.zoneName()).field("available", e.available())
                .field("unavailableReason", e.unavailableReason()).field("method", ZoneEnlargement.METHOD)
                .field("sourceVolumeM3", e.sourceVolumeCubicMetres()).field("sourceBasis", e.sourceBasis());
        j.name("contaminants").beginArray();
        for (ContaminantSpreading s : e.contaminants()) {
            j.beginObject().field("name", s.contaminantName()).field("initialMgKg", s.initialMilligramsPerKg())
                    .field("cleanupLevelMgKg", s.cleanupLevelMilligramsPerKg()).field("retardation", s.retardation())
                    .field("poreWaterVelocityMD", s.poreWaterVelocityMetresPerDay())
                    .field("verticalDispersionM2D", s.verticalDispersionSquareMetresPerDay())
                    .field("horizontalDispersionM2D", s.horizontalDispersionSquareMetresPerDay());
            j.name("curve").beginArray();
            s.curve().forEach(p -> writePoint(j, p));
            j.endArray().endObject();
        }
        j.endArray();
        j.name("envelope").beginArray();
        e.envelope().forEach(p -> writePoint(j, p));
        j.endArray();
        j.name("notes").beginArray();
        e.notes().forEach(j::value);
        j.endArray();
        j.endObject();
    }

    private static void writeCautions(Json j, java.util.List<Caution> cautions) {
        j.beginArray();
        for (Caution c : cautions) {
            j.beginObject().field("code", c.code()).field("text", c.text()).endObject();
        }
        j.endArray();
    }

    private static void writeExcavation(Json j, ExcavationResult x) {
        ExcavationQuantities q = x.quantities();
        j.beginObject().field("design", x.designName()).field("zone", x.zoneName())
                .field("footprintBasis", x.footprintBasis()).field("slopeBasis", x.slopeBasis())
                .field("soilBasis", x.soilBasis()).field("pitDepthM", q.pitDepthMetres())
                .field("sideSlopeHorizontalPerVertical", q.plan().design().sideSlopeHorizontalPerVertical());
        j.name("quantities");
        writeQuantities(j, q.toQuantitySet());
        j.name("cautions");
        writeCautions(j, q.cautions());
        j.name("assumptions").beginArray();
        q.assumptions().forEach(j::value);
        j.endArray();
        j.name("notes").beginArray();
        x.notes().forEach(j::value);
        j.endArray();
        j.endObject();
    }

    private static void writeAlternative(Json j, AlternativeResult a) {
        j.beginObject().field("name", a.name()).field("kind", a.kind().name().toLowerCase(java.util.Locale.ROOT))
                .field("available", a.available()).field("unavailableReason", a.unavailableReason())
                .field("basis", a.basis()).field("durationCalendarDays", a.durationCalendarDays())
                .field("priceBook", a.priceBookName()).field("inventedRates", a.inventedRates());
        j.name("quantities");
        if (a.quantities() == null) {
            j.nullValue();
        } else {
            writeQuantities(j, a.quantities());
        }
        j.name("costs");
        if (a.estimate() == null) {
            j.nullValue();
        } else {
            writeCosts(j, a.estimate());
        }
        j.name("unpriced").beginArray();
        a.unpriced().forEach(j::value);
        j.endArray();
        j.name("notes").beginArray();
        a.notes().forEach(j::value);
        j.endArray();
        j.endObject();
    }

    private static void writeCosts(Json j, CostEstimate e) {
        j.beginObject().field("currency", e.currency()).field("estimate", e.recipe().name());
        j.name("lines").beginArray();
        for (LineItem l : e.lines()) {
            j.beginObject().field("category", l.spec().category().name().toLowerCase(java.util.Locale.ROOT))
                    .field("year", l.spec().year()).field("priceItem", l.item().id())
                    .field("description", l.item().description()).field("quantity", l.quantity().name())
                    .field("amount", l.quantity().amount()).field("unit", l.quantity().unit().symbol())
                    .field("rate", l.item().ratePerUnit()).field("rateSource", l.item().sourceNote())
                    .field("rateInvented", l.item().invented()).field("cost", l.cost().amount())
                    .field("quantitySource", l.quantity().source()).endObject();
        }
        j.endArray();
        CapitalCost c = e.capital();
        j.name("capital").beginObject().field("subtotal", c.subtotal().amount())
                .field("scopeContingency", c.scopeContingency().amount())
                .field("bidContingency", c.bidContingency().amount())
                .field("projectManagement", c.projectManagement().amount())
                .field("remedialDesign", c.remedialDesign().amount())
                .field("constructionManagement", c.constructionManagement().amount())
                .field("total", c.total().amount()).endObject();
        j.name("annual");
        writeOperating(j, e.annual());
        j.name("periodic").beginArray();
        for (Map.Entry<Integer, OperatingCost> p : e.periodic().entrySet()) {
            j.beginObject().field("year", p.getKey()).field("total", p.getValue().total().amount()).endObject();
        }
        j.endArray();
        j.field("operatingYears", e.operatingYears()).field("discountRatePercent", e.discountRatePercent())
                .field("discountRateRule", e.recipe().usesDefaultDiscountRate() ? PresentValue.DEFAULT_RATE_RULE : "entered (its basis is in the alternative's notes)")
                .field("seriesFactorPA", e.seriesFactor())
                .field("presentValueOfAnnual", e.presentValueOfAnnual().amount())
                .field("presentValueOfPeriodic", e.presentValueOfPeriodic().amount())
                .field("presentValue", e.presentValue().amount());
        AccuracyRange a = e.recipe().accuracy();
        j.name("accuracy").beginObject().field("lowPercent", a.lowPercent()).field("highPercent", a.highPercent())
                .field("source", a.source()).field("status", a.status().label()).endObject();
        j.field("presentValueLow", e.presentValueLow().amount()).field("presentValueHigh", e.presentValueHigh().amount());
        j.name("cautions");
        writeCautions(j, e.cautions());
        j.name("trace").beginArray();
        e.trace().forEach(j::value);
        j.endArray();
        j.endObject();
    }

    private static void writeOperating(Json j, OperatingCost o) {
        j.beginObject().field("subtotal", o.subtotal().amount()).field("contingency", o.contingency().amount())
                .field("projectManagement", o.projectManagement().amount())
                .field("technicalSupport", o.technicalSupport().amount()).field("total", o.total().amount()).endObject();
    }

    private static void writeCostOfDelay(Json j, CostOfDelayResult c) {
        j.beginObject().field("alternative", c.alternativeName()).field("zone", c.zoneName())
                .field("available", c.available()).field("unavailableReason", c.unavailableReason())
                .field("basis", c.basis());
        j.field("currency", c.costOfDelay() == null ? null : c.costOfDelay().baseline().estimate().currency());
        j.name("points").beginArray();
        for (CostOfDelay.Point p : c.points()) {
            j.beginObject().field("delayYears", p.delayYears())
                    .field("presentValueAtStartOfWork", p.presentValueAtStartOfWork().amount())
                    .field("presentValueToday", p.presentValueToday().amount())
                    .field("increaseAtStartOfWork", p.increaseAtStartOfWork().amount())
                    .field("increaseToday", p.increaseToday().amount()).endObject();
        }
        j.endArray();
        j.endObject();
    }

    private static void writeVerification(Json j, VerificationAppendix.Outcome v) {
        j.name("verification").beginObject().field("passed", v.passed());
        j.name("cases").beginArray();
        for (VerificationAppendix.Row r : v.rows()) {
            VerificationAppendix.Case c = r.verificationCase();
            j.beginObject().field("case", c.name()).field("unit", c.unit()).field("reference", c.referenceValue())
                    .field("source", c.source()).field("computed", r.computedValue()).field("difference", r.difference())
                    .field("tolerance", c.tolerance()).field("passed", r.passed()).field("error", r.error()).endObject();
        }
        j.endArray().endObject();
    }

    private static void writeUncertainty(Json j, UncertaintyResults u) {
        j.name("uncertainty").beginObject().field("requestedRuns", u.requestedRunCount())
                .field("completedRuns", u.completedRunCount()).field("failedRuns", u.failedRunCount())
                .field("cancelled", u.cancelled())
                .field("samplingMethod", String.valueOf(u.simulation().settings().samplingMethod()))
                .field("seed", u.simulation().settings().seed())
                .field("percentileDefinition", OutputStatistics.PERCENTILE_DEFINITION);
        j.name("inputs").beginArray();
        for (InputSummary in : u.inputs()) {
            j.beginObject().field("name", in.name()).field("unit", in.unit()).field("distribution", in.distribution())
                    .field("p10", in.p10()).field("p50", in.p50()).field("p90", in.p90()).field("mean", in.mean())
                    .field("baseValue", in.baseValue()).endObject();
        }
        j.endArray().name("headlines").beginArray();
        for (UncertaintyHeadline h : u.headlines()) {
            OutputStatistics s = h.statistics();
            j.beginObject().field("outputName", h.outputName()).field("subjectKind", h.subjectKind())
                    .field("subjectName", h.subjectName()).field("quantity", h.quantity()).field("unit", h.unit())
                    .field("deterministic", h.baseValue());
            if (s != null) {
                j.field("p10", s.p10()).field("p50", s.p50()).field("p90", s.p90()).field("mean", s.mean())
                        .field("standardDeviation", s.standardDeviation()).field("min", s.min()).field("max", s.max());
                if (s.histogram() != null) {
                    j.name("histogram").beginObject().field("lowerEdge", s.histogram().lowerEdge())
                            .field("upperEdge", s.histogram().upperEdge()).name("counts").beginArray();
                    s.histogram().counts().forEach(c -> j.value(c));
                    j.endArray().endObject();
                }
            }
            if (h.tornado() != null) {
                j.name("tornado").beginArray();
                for (TornadoBar b : h.tornado().bars()) {
                    j.beginObject().field("inputName", b.inputName()).field("lowInputValue", b.lowInputValue())
                            .field("highInputValue", b.highInputValue()).field("outputAtLowInput", b.outputAtLowInput())
                            .field("outputAtHighInput", b.outputAtHighInput()).endObject();
                }
                j.endArray();
            }
            j.endObject();
        }
        j.endArray().name("cheapest").beginArray();
        for (CheapestAlternative c : u.cheapest()) {
            j.beginObject().field("label", c.label()).name("alternatives").beginArray();
            for (int i = 0; i < c.outputNames().size(); i++) {
                j.beginObject().field("output", c.outputNames().get(i)).field("probability", c.probabilities().get(i))
                        .endObject();
            }
            j.endArray().endObject();
        }
        j.endArray().name("failureCounts").beginObject();
        u.failureCounts().forEach((k, v) -> j.field(k, v));
        j.endObject().endObject();
    }
}
