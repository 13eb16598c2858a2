package eluvia.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

import eluvia.report.Json;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.FlushingModels;
import eluvia.transport.FlushingScreening;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.LayerTransport;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.ReboundEstimate;
import eluvia.transport.TwoRegionParameters;
import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.FlushingRunResult;
import eluvia.transport.numerical.InitialCondition;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.SoilLayer;
import eluvia.transport.numerical.SolverSettings;
import eluvia.transport.numerical.SorptionIsotherm;
import eluvia.transport.numerical.SpectralElementFlushingSolution;
import eluvia.transport.numerical.TargetOutcome;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/**
 * {@code flush}: one screening calculation from options alone, no project file. All values SI.
 *
 * <p>Models: {@code equilibrium} (finite layer, Brenner 1962), {@code two-region} (van Genuchten and
 * Wierenga 1976, exact in the Laplace domain), {@code numerical} (finite volumes: layered profiles
 * from {@code --layers}, Freundlich or Langmuir sorption), {@code spectral} (spectral elements, exact
 * in time: layered profiles with linear equilibrium sorption).
 */
@Command(name = "flush", mixinStandardHelpOptions = true, sortOptions = false,
        description = { "Pore volumes of clean water to flush a layer down to a target fraction of its initial concentration.",
                "Models: equilibrium (finite layer, flux inlet, zero-gradient outlet; Brenner 1962), two-region",
                "(nonequilibrium; van Genuchten and Wierenga 1976), numerical (finite volumes; layered, nonlinear sorption)",
                "and spectral (spectral elements exact in time; layered, linear equilibrium sorption; Patera 1984).",
                "Results are planning estimates; flushed water must be captured and treated." })
final class FlushCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Option(names = "--model", defaultValue = "equilibrium", paramLabel = "WORD", description = "equilibrium, two-region, numerical or spectral (default ${DEFAULT-VALUE})")
    String model;

    @Option(names = "--thickness-m", paramLabel = "M", description = "thickness of the treated layer, m (> 0)")
    Double thicknessMetres;

    @Option(names = "--water-content", paramLabel = "FRACTION", description = "volumetric water content during flushing, (0, porosity]")
    Double waterContent;

    @Option(names = "--porosity", paramLabel = "FRACTION", description = "total porosity, (0, 1)")
    Double porosity;

    @Option(names = "--bulk-density-kg-m3", paramLabel = "KG_M3", description = "dry bulk density, kg/m3 (> 0; soils about 1100 to 2000)")
    Double bulkDensityKgPerCubicMetre;

    @Option(names = "--kd-l-kg", paramLabel = "L_KG", description = "soil-water distribution coefficient, L/kg (>= 0); linear sorption")
    Double kdLitresPerKg;

    @Option(names = "--dispersivity-m", paramLabel = "M", description = "longitudinal dispersivity, m (>= 0)")
    Double dispersivityMetres;

    @Option(names = "--layers", paramLabel = "FILE", description = "CSV of layers top to bottom (with --model numerical or spectral; replaces the single-layer options); see README")
    Path layersFile;

    @Option(names = "--darcy-flux-m-d", required = true, paramLabel = "M_D", description = "Darcy flux of flushing water, m/d (> 0)")
    double darcyFluxMetresPerDay;

    @Option(names = "--diffusion-m2-s", defaultValue = "1e-9", paramLabel = "M2_S", description = "free-water diffusion coefficient, m2/s (>= 0; default ${DEFAULT-VALUE})")
    double diffusionSquareMetresPerSecond;

    @Option(names = "--decay-per-day", defaultValue = "0", paramLabel = "PER_D", description = "first-order decay rate in water and on solids, 1/d (>= 0; default ${DEFAULT-VALUE})")
    double decayPerDay;

    @Option(names = "--beta", paramLabel = "FRACTION", description = "two-region: equilibrium fraction of the retardation capacity, (0, 1]")
    Double beta;

    @Option(names = "--omega", paramLabel = "NUMBER", description = "two-region: dimensionless mass-transfer number, >= 0")
    Double omega;

    @Option(names = "--freundlich-kf", paramLabel = "KF", description = "numerical: Freundlich Kf, (mg/kg)/(mg/L)^n (> 0)")
    Double freundlichKf;

    @Option(names = "--freundlich-n", paramLabel = "N", description = "numerical: Freundlich exponent n (> 0)")
    Double freundlichN;

    @Option(names = "--langmuir-smax", paramLabel = "MG_KG", description = "numerical: Langmuir capacity Smax, mg/kg (> 0)")
    Double langmuirSmax;

    @Option(names = "--langmuir-k", paramLabel = "L_MG", description = "numerical: Langmuir affinity K, L/mg (> 0)")
    Double langmuirK;

    @Option(names = "--initial-soil-mg-kg", paramLabel = "MG_KG", description = "initial total soil concentration, mg/kg (> 0); needed with nonlinear sorption")
    Double initialSoilMilligramsPerKg;

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
        String m = model.toLowerCase(Locale.ROOT);
        if (!List.of("equilibrium", "two-region", "numerical", "spectral").contains(m)) {
            throw new OptionCheck("--model", model, "equilibrium, two-region, numerical or spectral");
        }
        CleanupCriterion c = criterionOf(criterion);
        OptionalDouble area = areaSquareMetres == null ? OptionalDouble.empty()
                : OptionalDouble.of(OptionCheck.positive("--area-m2", areaSquareMetres));
        OptionCheck.positive("--darcy-flux-m-d", darcyFluxMetresPerDay);
        OptionCheck.nonNegative("--diffusion-m2-s", diffusionSquareMetresPerSecond);
        OptionCheck.nonNegative("--decay-per-day", decayPerDay);
        OptionCheck.openUnit("--target-fraction", targetFraction);
        OptionCheck.positive("--max-pore-volumes", maxPoreVolumes);
        if (!m.equals("two-region") && (beta != null || omega != null)) {
            throw new OptionCheck(beta != null ? "--beta" : "--omega", beta != null ? beta : omega, "only with --model two-region");
        }
        boolean nonlinear = freundlichKf != null || freundlichN != null || langmuirSmax != null || langmuirK != null;
        if (!m.equals("numerical") && nonlinear) {
            throw new OptionCheck("the Freundlich and Langmuir options", "given", "only with --model numerical");
        }
        if (!m.equals("numerical") && !m.equals("spectral") && layersFile != null) {
            throw new OptionCheck("--layers", "given", "only with --model numerical or spectral");
        }
        PrintWriter out = parent.spec.commandLine().getOut();
        if (m.equals("numerical") || m.equals("spectral")) {
            return layered(m.equals("spectral"), c, area, nonlinear, out);
        }
        LayerFlushingInput input = checkedInput(kdOption());
        FlushingEstimate e;
        ReboundEstimate rebound = null;
        if (m.equals("two-region")) {
            if (beta == null || omega == null) {
                throw new OptionCheck(beta == null ? "--beta" : "--omega", "missing", "both --beta and --omega with --model two-region");
            }
            if (!(beta > 0 && beta <= 1)) {
                throw new OptionCheck("--beta", beta, "greater than 0 and at most 1");
            }
            OptionCheck.nonNegative("--omega", omega);
            TwoRegionParameters p = new TwoRegionParameters(beta, omega);
            LayerTransport t = LayerTransport.of(input);
            e = FlushingScreening.estimate(input, FlushingModels.twoRegion(t, p), c, targetFraction, area, maxPoreVolumes);
            rebound = ReboundEstimate.afterEffluentMeetsTarget(t, p, targetFraction, maxPoreVolumes);
        } else {
            e = FlushingScreening.estimate(input, c, targetFraction, area, maxPoreVolumes);
        }
        if (json) {
            out.print(toJson(e, rebound, Double.NaN));
        } else {
            printText(e, out);
            if (rebound != null) {
                out.println("rebound                       " + rebound.describe());
            }
        }
        return EluviaCommand.OK;
    }

    private double kdOption() {
        if (kdLitresPerKg == null) {
            throw new OptionCheck("--kd-l-kg", "missing", "a number 0 or greater (required unless --layers is given)");
        }
        return OptionCheck.nonNegative("--kd-l-kg", kdLitresPerKg);
    }

    private static double required(String option, Double value) {
        if (value == null) {
            throw new OptionCheck(option, "missing", "required unless --layers is given with --model numerical or spectral");
        }
        return value;
    }

    private LayerFlushingInput checkedInput(double kd) {
        double l = OptionCheck.positive("--thickness-m", required("--thickness-m", thicknessMetres));
        double n = OptionCheck.openUnit("--porosity", required("--porosity", porosity));
        double theta = required("--water-content", waterContent);
        if (!(theta > 0 && theta <= n)) {
            throw new OptionCheck("--water-content", theta, "greater than 0 and at most the porosity (" + n + ")");
        }
        double rho = OptionCheck.positive("--bulk-density-kg-m3", required("--bulk-density-kg-m3", bulkDensityKgPerCubicMetre));
        double alpha = OptionCheck.nonNegative("--dispersivity-m", required("--dispersivity-m", dispersivityMetres));
        return new LayerFlushingInput(l, theta, n, rho, kd, darcyFluxMetresPerDay, alpha, diffusionSquareMetresPerSecond,
                decayPerDay);
    }

    private SorptionIsotherm isothermOption() {
        if (freundlichKf != null || freundlichN != null) {
            if (langmuirSmax != null || langmuirK != null) {
                throw new OptionCheck("--langmuir-smax", "given with Freundlich options", "one isotherm: Freundlich or Langmuir");
            }
            double kf = OptionCheck.positive("--freundlich-kf", required("--freundlich-kf", freundlichKf));
            double en = OptionCheck.positive("--freundlich-n", required("--freundlich-n", freundlichN));
            return SorptionIsotherm.freundlich(kf, en);
        }
        if (langmuirSmax != null || langmuirK != null) {
            double smax = OptionCheck.positive("--langmuir-smax", required("--langmuir-smax", langmuirSmax));
            double k = OptionCheck.positive("--langmuir-k", required("--langmuir-k", langmuirK));
            return SorptionIsotherm.langmuir(smax, k);
        }
        return SorptionIsotherm.linear(kdOption());
    }

    /** {@code --model numerical} (finite volumes) or {@code --model spectral} (spectral elements) on the layers. */
    private int layered(boolean spectral, CleanupCriterion c, OptionalDouble area, boolean nonlinear, PrintWriter out) {
        List<SoilLayer> layers;
        if (layersFile != null) {
            layers = LayersCsv.read(parent.environment.workingDirectory().resolve(layersFile), diffusionSquareMetresPerSecond,
                    decayPerDay);
        } else {
            LayerFlushingInput in = checkedInput(nonlinear ? 0 : kdOption());
            layers = List.of(SoilLayer.builder().thicknessMetres(in.thicknessMetres()).waterContent(in.waterContent())
                    .porosity(in.porosity()).bulkDensityKilogramsPerCubicMetre(in.bulkDensityKgPerCubicMetre())
                    .isotherm(isothermOption()).dispersivityMetres(in.dispersivityMetres())
                    .freeWaterDiffusionSquareMetresPerSecond(diffusionSquareMetresPerSecond).decayInWaterPerDay(decayPerDay)
                    .decayOnSolidsPerDay(decayPerDay).build());
        }
        boolean anyNonlinear = layers.stream().anyMatch(x -> !x.isotherm().isLinear());
        if (spectral && (anyNonlinear || layers.stream().anyMatch(SoilLayer::isTwoRegion))) {
            throw new OptionCheck("--model", model,
                    "numerical for nonlinear or two-region layers; spectral takes linear equilibrium layers only");
        }
        double initial;
        if (initialSoilMilligramsPerKg != null) {
            initial = OptionCheck.positive("--initial-soil-mg-kg", initialSoilMilligramsPerKg);
        } else if (anyNonlinear) {
            throw new OptionCheck("--initial-soil-mg-kg", "missing", "a number greater than 0: nonlinear sorption depends on the concentration");
        } else {
            initial = 1; // linear: the fractions do not depend on the level
        }
        double[] soil = new double[layers.size()];
        java.util.Arrays.fill(soil, initial);
        FlushingColumn column = new FlushingColumn(layers, darcyFluxMetresPerDay, 0, InitialCondition.soilPerLayer(soil));
        boolean reached;
        double poreVolumes;
        double remaining;
        String text;
        FlushingRunResult run = null;
        SpectralElementFlushingSolution modes = null;
        double degreeCheck = Double.NaN;
        if (spectral) {
            try {
                modes = SpectralElementFlushingSolution.of(column);
            } catch (eluvia.transport.TransportInputException e) {
                throw new OptionCheck("--model", model, "numerical for this column; the spectral elements refuse it: "
                        + e.getMessage());
            }
            PoreVolumeResult p = modes.poreVolumesToTarget(c, targetFraction, maxPoreVolumes);
            reached = p.reachable();
            poreVolumes = p.poreVolumes();
            remaining = p.remainingAtLimit();
            // the same column two degrees higher: its difference estimates the error of the answer
            PoreVolumeResult check = SpectralElementFlushingSolution.of(column, SpectralElementFlushingSolution.DEFAULT_DEGREE + 2)
                    .poreVolumesToTarget(c, targetFraction, maxPoreVolumes);
            degreeCheck = reached && check.reachable() ? Math.abs(check.poreVolumes() / poreVolumes - 1) : Double.NaN;
            text = reached ? String.format(Locale.ROOT, "%s (%.4g days)", p.describe(), column.daysForPoreVolumes(poreVolumes))
                    : p.describe();
        } else {
            run = new NumericalFlushingSolver(column, SolverSettings.defaults())
                    .run(FlushingRunRequest.upToPoreVolumes(maxPoreVolumes).target(c, targetFraction).build());
            TargetOutcome o = run.outcome(c);
            reached = o.reached();
            poreVolumes = o.poreVolumes();
            remaining = o.finalFraction();
            text = o.message();
        }
        double days = reached ? column.daysForPoreVolumes(poreVolumes) : Double.NaN;
        double waterPerArea = column.poreVolumeMetres();
        Json j = new Json().beginObject();
        j.field("model", spectral ? "spectral" : "numerical").field("criterion", c.word()).field("targetFraction", targetFraction)
                .field("reachable", reached).field("poreVolumes", poreVolumes).field("durationDays", days);
        j.name("waterVolumeM3");
        if (area.isPresent() && reached) {
            j.value(poreVolumes * waterPerArea * area.getAsDouble());
        } else {
            j.nullValue();
        }
        double rTheta = 0;
        double theta = 0;
        for (SoilLayer x : layers) {
            double slope = x.isotherm().isLinear() ? x.isotherm().slopeLitresPerKilogram(0)
                    : x.isotherm().sorbedMilligramsPerKilogram(run.initialPoreWaterMilligramsPerLitre()) / run.initialPoreWaterMilligramsPerLitre();
            rTheta += x.thicknessMetres() * (x.waterContent() + x.bulkDensityKilogramsPerCubicMetre() / 1000 * slope);
            theta += x.thicknessMetres() * x.waterContent();
        }
        double retardation = rTheta / theta;
        j.field("retardation", retardation)
                .field("retardationBasis", anyNonlinear ? "water-weighted over the layers, chord S/C at the initial pore-water concentration"
                        : "water-weighted over the layers");
        j.field("peclet", Double.NaN);
        j.field("wellMixedPoreVolumes", -retardation * Math.log(targetFraction));
        j.field("onePoreVolumeM3PerM2", waterPerArea).field("layers", layers.size());
        if (spectral) {
            j.field("degree", modes.degree()).field("points", modes.pointCount())
                    .field("degreeCheckRelativeDifference", degreeCheck);
        } else {
            j.field("cells", run.cellCount()).field("massBalanceError", run.massBalance().relativeError());
        }
        j.field("remainingAtLimit", remaining).field("maxPoreVolumes", maxPoreVolumes);
        if (json) {
            out.print(j.endObject().toString());
        } else {
            out.println(text);
            if (spectral) {
                if (!Double.isNaN(degreeCheck)) {
                    out.printf(Locale.ROOT, "degree %d against degree %d: relative difference %.2g%n", modes.degree(),
                            modes.degree() + 2, degreeCheck);
                }
            } else {
                out.printf(Locale.ROOT, "mass balance relative error    %.3g%n", run.massBalance().relativeError());
            }
            out.println("CAUTION: planning estimate only; flushed water must be captured and treated; a licensed engineer decides.");
        }
        return EluviaCommand.OK;
    }

    private static CleanupCriterion criterionOf(String word) {
        for (CleanupCriterion c : CleanupCriterion.values()) {
            if (c.word().equalsIgnoreCase(word)) {
                return c;
            }
        }
        throw new OptionCheck("--criterion", word, "effluent, mean or max");
    }

    static String toJson(FlushingEstimate e, ReboundEstimate rebound, double massBalanceError) {
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
        if (!Double.isNaN(massBalanceError)) {
            j.field("massBalanceError", massBalanceError);
        }
        if (rebound != null) {
            j.field("reboundFraction", rebound.reboundAtOutletFraction())
                    .field("reboundMeanFraction", rebound.reboundMeanFraction())
                    .field("reboundMaxFraction", rebound.reboundMaxFraction())
                    .field("waterMeetsButSoilDoesNot", rebound.waterMeetsButSoilDoesNot());
        }
        return j.endObject().toString();
    }

    private static void printText(FlushingEstimate e, PrintWriter out) {
        LayerTransport t = e.transport();
        out.printf(Locale.ROOT, "model                         %s%n", e.modelName());
        out.printf(Locale.ROOT, "retardation factor R          %.5g%n", t.retardation());
        out.printf(Locale.ROOT, "pore-water velocity           %.5g m/d%n", t.poreWaterVelocityMetresPerDay());
        out.printf(Locale.ROOT, "dispersion coefficient        %.5g m2/d%n", t.dispersionSquareMetresPerDay());
        out.printf(Locale.ROOT, "Peclet number of the layer    %.5g%n", t.peclet());
        out.printf(Locale.ROOT, "criterion                     %s, target %.4g of initial%n", e.criterion().description(), e.targetFraction());
        if (e.result().reachable()) {
            out.printf(Locale.ROOT, "pore volumes to target        %.5g PV%n", e.result().poreVolumes());
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
