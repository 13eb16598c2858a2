package eluvia.app.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

import eluvia.report.Json;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.FlushingScreening;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.LayerTransport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/**
 * {@code flush}: one screening calculation for one homogeneous layer, from options alone, no
 * project file. All values SI.
 */
@Command(name = "flush", mixinStandardHelpOptions = true, sortOptions = false,
        description = { "Pore volumes of clean water to flush one homogeneous layer down to a target fraction of its initial concentration.",
                "Finite-layer solution (flux inlet, zero-gradient outlet; Brenner 1962) with linear sorption and first-order decay.",
                "Results are planning estimates; flushed water must be captured and treated." })
final class FlushCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Option(names = "--thickness-m", required = true, paramLabel = "M", description = "thickness of the treated layer, m (> 0)")
    double thicknessMetres;

    @Option(names = "--water-content", required = true, paramLabel = "FRACTION", description = "volumetric water content during flushing, (0, porosity]")
    double waterContent;

    @Option(names = "--porosity", required = true, paramLabel = "FRACTION", description = "total porosity, (0, 1)")
    double porosity;

    @Option(names = "--bulk-density-kg-m3", required = true, paramLabel = "KG_M3", description = "dry bulk density, kg/m3 (> 0; soils 1100 to 2000)")
    double bulkDensityKgPerCubicMetre;

    @Option(names = "--kd-l-kg", required = true, paramLabel = "L_KG", description = "soil-water distribution coefficient, L/kg (>= 0)")
    double kdLitresPerKg;

    @Option(names = "--darcy-flux-m-d", required = true, paramLabel = "M_D", description = "Darcy flux of flushing water, m/d (> 0)")
    double darcyFluxMetresPerDay;

    @Option(names = "--dispersivity-m", required = true, paramLabel = "M", description = "longitudinal dispersivity, m (>= 0)")
    double dispersivityMetres;

    @Option(names = "--diffusion-m2-s", defaultValue = "1e-9", paramLabel = "M2_S", description = "free-water diffusion coefficient, m2/s (>= 0; default ${DEFAULT-VALUE})")
    double diffusionSquareMetresPerSecond;

    @Option(names = "--decay-per-day", defaultValue = "0", paramLabel = "PER_D", description = "first-order decay rate in water and on solids, 1/d (>= 0; default ${DEFAULT-VALUE})")
    double decayPerDay;

    @Option(names = "--area-m2", paramLabel = "M2", description = "infiltration area, m2 (> 0; optional: gives the water volume)")
    Double areaSquareMetres;

    @Option(names = "--target-fraction", required = true, paramLabel = "FRACTION", description = "cleanup level over initial concentration, (0, 1)")
    double targetFraction;

    @Option(names = "--criterion", defaultValue = "effluent", paramLabel = "WORD", description = "what must meet the target: effluent, mean or max (residual in the layer); default ${DEFAULT-VALUE}")
    String criterion;

    @Option(names = "--max-pore-volumes", defaultValue = "10000", paramLabel = "PV", description = "give up beyond this many pore volumes (> 0; default ${DEFAULT-VALUE})")
    double maxPoreVolumes;

    @Option(names = "--json", description = "print one JSON object instead of text")
    boolean json;

    @Override
    public Integer call() {
        LayerFlushingInput input = checkedInput();
        CleanupCriterion c = criterionOf(criterion);
        OptionalDouble area = areaSquareMetres == null ? OptionalDouble.empty()
                : OptionalDouble.of(OptionCheck.positive("--area-m2", areaSquareMetres));
        OptionCheck.openUnit("--target-fraction", targetFraction);
        OptionCheck.positive("--max-pore-volumes", maxPoreVolumes);
        FlushingEstimate e = FlushingScreening.estimate(input, c, targetFraction, area, maxPoreVolumes);
        PrintWriter out = parent.spec.commandLine().getOut();
        if (json) {
            out.print(toJson(e));
        } else {
            printText(e, out);
        }
        return EluviaCommand.OK;
    }

    private LayerFlushingInput checkedInput() {
        OptionCheck.positive("--thickness-m", thicknessMetres);
        OptionCheck.openUnit("--porosity", porosity);
        if (!(waterContent > 0 && waterContent <= porosity)) {
            throw new OptionCheck("--water-content", waterContent, "greater than 0 and at most the porosity (" + porosity + ")");
        }
        OptionCheck.positive("--bulk-density-kg-m3", bulkDensityKgPerCubicMetre);
        OptionCheck.nonNegative("--kd-l-kg", kdLitresPerKg);
        OptionCheck.positive("--darcy-flux-m-d", darcyFluxMetresPerDay);
        OptionCheck.nonNegative("--dispersivity-m", dispersivityMetres);
        OptionCheck.nonNegative("--diffusion-m2-s", diffusionSquareMetresPerSecond);
        OptionCheck.nonNegative("--decay-per-day", decayPerDay);
        return new LayerFlushingInput(thicknessMetres, waterContent, porosity, bulkDensityKgPerCubicMetre, kdLitresPerKg,
                darcyFluxMetresPerDay, dispersivityMetres, diffusionSquareMetresPerSecond, decayPerDay);
    }

    private static CleanupCriterion criterionOf(String word) {
        for (CleanupCriterion c : CleanupCriterion.values()) {
            if (c.word().equalsIgnoreCase(word)) {
                return c;
            }
        }
        throw new OptionCheck("--criterion", word, "effluent, mean or max");
    }

    static String toJson(FlushingEstimate e) {
        LayerTransport t = e.transport();
        Json j = new Json().beginObject();
        j.field("model", e.modelName()).field("criterion", e.criterion().word())
                .field("targetFraction", e.targetFraction()).field("reachable", e.result().reachable())
                .field("poreVolumes", e.result().poreVolumes())
                .field("wellMixedPoreVolumes", e.wellMixedPoreVolumes())
                .field("plugFlowPoreVolumes", e.plugFlowPoreVolumes()).field("durationDays", e.durationDays());
        j.name("waterVolumeM3");
        if (e.waterVolumeCubicMetres().isPresent()) {
            j.value(e.waterVolumeCubicMetres().getAsDouble());
        } else {
            j.nullValue();
        }
        j.field("onePoreVolumeM3PerM2", e.onePoreVolumeCubicMetresPerSquareMetre())
                .field("retardation", t.retardation()).field("peclet", t.peclet())
                .field("poreWaterVelocityMD", t.poreWaterVelocityMetresPerDay())
                .field("tortuosity", t.tortuosity()).field("dispersionM2D", t.dispersionSquareMetresPerDay())
                .field("decayPerPoreVolume", t.decayPerPoreVolume())
                .field("remainingAtLimit", e.result().remainingAtLimit())
                .field("maxPoreVolumes", e.result().maxPoreVolumes());
        return j.endObject().toString();
    }

    private static void printText(FlushingEstimate e, PrintWriter out) {
        LayerTransport t = e.transport();
        out.printf(Locale.ROOT, "retardation factor R          %.5g%n", t.retardation());
        out.printf(Locale.ROOT, "pore-water velocity           %.5g m/d%n", t.poreWaterVelocityMetresPerDay());
        out.printf(Locale.ROOT, "dispersion coefficient        %.5g m2/d%n", t.dispersionSquareMetresPerDay());
        out.printf(Locale.ROOT, "Peclet number of the layer    %.5g%n", t.peclet());
        out.printf(Locale.ROOT, "criterion                     %s, target %.4g of initial%n", e.criterion().description(), e.targetFraction());
        if (e.result().reachable()) {
            out.printf(Locale.ROOT, "pore volumes to target        %.5g PV (%s)%n", e.result().poreVolumes(), e.modelName());
            out.printf(Locale.ROOT, "duration                      %.5g days of flushing%n", e.durationDays());
        } else {
            out.printf(Locale.ROOT, "pore volumes to target        not reachable within %.5g PV (%.3g of initial left)%n",
                    e.result().maxPoreVolumes(), e.result().remainingAtLimit());
        }
        out.printf(Locale.ROOT, "well-mixed estimate           %.5g PV%n", e.wellMixedPoreVolumes());
        out.printf(Locale.ROOT, "plug-flow estimate            %.5g PV%n", e.plugFlowPoreVolumes());
        if (e.waterVolumeCubicMetres().isPresent()) {
            out.printf(Locale.ROOT, "water to apply and capture    %.5g m3%n", e.waterVolumeCubicMetres().getAsDouble());
        }
        out.println("CAUTION: planning estimate only; flushed water must be captured and treated; a licensed engineer decides.");
    }
}
