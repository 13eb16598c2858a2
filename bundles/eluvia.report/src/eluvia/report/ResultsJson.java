package eluvia.report;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignRun;
import eluvia.design.EffectiveLayer;
import eluvia.design.FlushingDesignResult;
import eluvia.site.validation.Problem;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;

/**
 * Writes a {@link DesignRun} as the {@code results.json} of a design package. The format is our
 * own and documented in {@code docs/results-json.md}; every quantity's unit is in its key.
 */
public final class ResultsJson {

    /** Version of the results format; raise it when a key changes meaning or is removed. */
    public static final int FORMAT_VERSION = 1;

    private ResultsJson() {
    }

    /** The JSON text of a run, with the SHA-256 of the project file it came from (may be null). */
    public static String of(DesignRun run, String projectSha256, String productVersion) {
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
        j.name("flushing").beginArray();
        for (FlushingDesignResult r : run.flushing()) {
            writeFlushing(j, r);
        }
        j.endArray();
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
            j.endObject();
        }
        j.endArray();
        j.name("notes").beginArray();
        r.notes().forEach(j::value);
        j.endArray();
        j.endObject();
    }
}
