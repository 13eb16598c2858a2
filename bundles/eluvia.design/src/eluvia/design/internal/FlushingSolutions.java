package eluvia.design.internal;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignCancelledException;
import eluvia.design.DesignInputException;
import eluvia.design.EffectiveLayer;
import eluvia.design.FlushingMethod;
import eluvia.design.MethodEstimate;
import eluvia.design.NumericalDetail;
import eluvia.design.SpectralCheck;
import eluvia.design.TwoRegionDetail;
import eluvia.site.derived.Dispersivities;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.SolutionMethod;
import eluvia.site.model.SoilLayer;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.FlushingModel;
import eluvia.transport.FlushingModels;
import eluvia.transport.FlushingScreening;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.LayerTransport;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.PoreVolumeSearch;
import eluvia.transport.ReboundEstimate;
import eluvia.transport.TransportInputException;
import eluvia.transport.TransportProperties;
import eluvia.transport.TwoRegionParameters;
import eluvia.transport.numerical.FlushingCancelledException;
import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.FlushingProgress;
import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.FlushingRunResult;
import eluvia.transport.numerical.InitialCondition;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.SolverSettings;
import eluvia.transport.numerical.SorptionIsotherm;
import eluvia.transport.numerical.SpectralElementFlushingSolution;
import eluvia.transport.numerical.TargetOutcome;

/**
 * The flushing solutions of one contaminant in one design: equilibrium finite layer and
 * well-mixed always, two-region whenever the contaminant has nonequilibrium parameters, the
 * numerical layered profile when the design asks for it.
 */
public final class FlushingSolutions {

    /** Progress units of one analytical assessment (all criteria, all analytical models). */
    public static final double ANALYTICAL_UNITS = 1;
    /** Progress units of one numerical run. */
    public static final double NUMERICAL_UNITS = 20;
    /** Smallest number of cells of a layer in the numerical grid (thin layers still get a profile). */
    static final int MINIMUM_CELLS_PER_LAYER = 5;

    private FlushingSolutions() {
    }

    /**
     * Assesses one contaminant.
     *
     * @param layer the combined layer of the zone's depth interval
     * @param slices the site layers clipped to the zone's depth interval, top first
     * @param design the flushing design
     * @param areaSquareMetres the zone's plan area, m2
     * @param c the contaminant
     * @param initialMgPerKg initial soil concentration, mg/kg
     * @param levelMgPerKg soil cleanup level, mg/kg
     * @param progress the run's progress (the numerical run reports within its units)
     * @param notes notes of the design, added to
     */
    public static ContaminantFlushing assess(EffectiveLayer layer, List<LayerCombination.Slice> slices,
            FlushingDesign design, double areaSquareMetres, Contaminant c, double initialMgPerKg, double levelMgPerKg,
            RunProgress progress, List<String> notes) {
        double kd;
        String kdBasis;
        if (c.isKdEntered()) {
            kd = c.getKdLitresPerKg();
            kdBasis = "entered";
        } else {
            kd = TransportProperties.kdFromKoc(c.getKocLitresPerKg(), layer.organicCarbonFraction());
            kdBasis = String.format(Locale.ROOT, "Koc x foc = %s L/kg x %.4g (Karickhoff et al. 1979)",
                    c.getKocLitresPerKg(), layer.organicCarbonFraction());
        }
        double decayPerDay = c.getHalfLifeDays() > 0 ? Math.log(2) / c.getHalfLifeDays() : 0;
        LayerFlushingInput input = new LayerFlushingInput(layer.thicknessMetres(), layer.waterContent(),
                layer.porosity(), layer.bulkDensityKgPerCubicMetre(), kd, design.getDarcyFluxMetresPerDay(),
                layer.dispersivityMetres(), c.getDiffusionSquareMetresPerSecond(), decayPerDay);
        double target = levelMgPerKg / initialMgPerKg;
        double maxPv = design.getMaxPoreVolumes();
        if (c.getIsotherm() != null && c.getIsotherm() != eluvia.site.model.SorptionIsotherm.LINEAR) {
            notes.add(c.getName() + ": the analytical solutions use linear sorption with Kd = " + fmt(kd)
                    + " L/kg; only the numerical solution uses the " + c.getIsotherm().getLiteral().toLowerCase(Locale.ROOT)
                    + " isotherm.");
        }

        Map<CleanupCriterion, FlushingEstimate> estimates = new EnumMap<>(CleanupCriterion.class);
        Map<CleanupCriterion, PoreVolumeResult> equilibrium = new EnumMap<>(CleanupCriterion.class);
        for (CleanupCriterion criterion : CleanupCriterion.values()) {
            FlushingEstimate e = FlushingScreening.estimate(input, criterion, target,
                    OptionalDouble.of(areaSquareMetres), maxPv);
            estimates.put(criterion, e);
            equilibrium.put(criterion, e.result());
        }
        LayerTransport t = LayerTransport.of(input);
        List<MethodEstimate> methods = new ArrayList<>();
        FlushingModel finite = FlushingModels.finiteLayer(t);
        methods.add(MethodEstimate.of(FlushingMethod.EQUILIBRIUM, finite.description(), equilibrium));
        FlushingModel wellMixed = FlushingModels.wellMixed(t);
        methods.add(MethodEstimate.of(FlushingMethod.WELL_MIXED, wellMixed.description(), search(wellMixed, target, maxPv)));

        TwoRegionDetail twoRegion = null;
        NonequilibriumEntry entry = c.getNonequilibrium() == null ? NonequilibriumEntry.EQUILIBRIUM : c.getNonequilibrium();
        if (entry != NonequilibriumEntry.EQUILIBRIUM) {
            TwoRegionParameters parameters = twoRegionParameters(c, entry, input);
            String basis = twoRegionBasis(c, entry, parameters);
            try {
                FlushingModel model = FlushingModels.twoRegion(t, parameters);
                methods.add(MethodEstimate.of(FlushingMethod.TWO_REGION, model.description(), search(model, target, maxPv)));
                ReboundEstimate rebound = ReboundEstimate.afterEffluentMeetsTarget(t, parameters, target, maxPv);
                twoRegion = new TwoRegionDetail(parameters.beta(), parameters.omega(), basis, rebound);
                if (rebound.waterMeetsButSoilDoesNot()) {
                    notes.add(c.getName() + ": if flushing stops when the effluent first meets the target, the soil "
                            + "does not: " + rebound.describe() + ". Judge compliance on soil samples.");
                }
            } catch (TransportInputException e) {
                methods.add(MethodEstimate.notAvailable(FlushingMethod.TWO_REGION, e.getMessage()));
            }
        } else {
            methods.add(MethodEstimate.notAvailable(FlushingMethod.TWO_REGION, c.getName()
                    + " has no nonequilibrium parameters (local equilibrium): the two-region solution with beta = 1 "
                    + "is the equilibrium solution"));
        }

        FlushingMethod governing = governingMethod(design, entry);
        NumericalDetail numerical = null;
        if (design.getSolutionMethod() == SolutionMethod.NUMERICAL) {
            String why = numericalUnavailableReason(c, entry);
            if (why != null) {
                methods.add(MethodEstimate.notAvailable(FlushingMethod.NUMERICAL, why));
                notes.add(c.getName() + ": the numerical solution is not available: " + why + ".");
            } else {
                Object[] out = runNumerical(slices, design, c, entry, initialMgPerKg, target, progress);
                MethodEstimate fv = (MethodEstimate) out[0];
                methods.add(fv);
                numerical = (NumericalDetail) out[1];
                noteSpectralCheck(c.getName(), fv, numerical.spectralCheck(), notes);
            }
        } else {
            methods.add(MethodEstimate.notAvailable(FlushingMethod.NUMERICAL,
                    "not run: the design's solution method is " + design.getSolutionMethod().getLiteral()
                            + " (choose NUMERICAL to run the layered finite-volume solution)"));
        }
        if (design.getSolutionMethod() == SolutionMethod.TWO_REGION && entry == NonequilibriumEntry.EQUILIBRIUM) {
            notes.add(c.getName() + " has no nonequilibrium parameters: under the two-region method it is at "
                    + "equilibrium (beta = 1), so the equilibrium solution governs it.");
        }
        return new ContaminantFlushing(c.getName(), initialMgPerKg, levelMgPerKg, target, kd, kdBasis, decayPerDay,
                estimates, governing, methods, twoRegion, numerical);
    }

    /** Which solution sets the design's numbers for a contaminant. */
    static FlushingMethod governingMethod(FlushingDesign design, NonequilibriumEntry entry) {
        SolutionMethod m = design.getSolutionMethod() == null ? SolutionMethod.EQUILIBRIUM : design.getSolutionMethod();
        switch (m) {
            case TWO_REGION:
                return entry == NonequilibriumEntry.EQUILIBRIUM ? FlushingMethod.EQUILIBRIUM : FlushingMethod.TWO_REGION;
            case NUMERICAL:
                return FlushingMethod.NUMERICAL;
            default:
                return FlushingMethod.EQUILIBRIUM;
        }
    }

    private static Map<CleanupCriterion, PoreVolumeResult> search(FlushingModel model, double target, double maxPv) {
        Map<CleanupCriterion, PoreVolumeResult> out = new EnumMap<>(CleanupCriterion.class);
        for (CleanupCriterion criterion : CleanupCriterion.values()) {
            out.put(criterion, PoreVolumeSearch.solve(model, criterion, target, maxPv));
        }
        return out;
    }

    private static TwoRegionParameters twoRegionParameters(Contaminant c, NonequilibriumEntry entry,
            LayerFlushingInput input) {
        try {
            switch (entry) {
                case DIMENSIONLESS:
                    return new TwoRegionParameters(c.getBeta(), c.getOmega());
                case PHYSICAL:
                    return TwoRegionParameters.physical(input, c.getMobileWaterFraction(), c.getMobileSiteFraction(),
                            c.getMassTransferRatePerDay());
                default:
                    return TwoRegionParameters.chemical(input, c.getMobileSiteFraction(), c.getMassTransferRatePerDay());
            }
        } catch (TransportInputException e) {
            throw DesignInputException.of(c, "Contaminant '" + c.getName() + "'", fieldOf(e.quantity()), e.value(),
                    e.allowedRange(), "correct the " + entry.getLiteral().toLowerCase(Locale.ROOT)
                            + " nonequilibrium parameters");
        }
    }

    private static String fieldOf(String quantity) {
        String q = quantity.toLowerCase(Locale.ROOT);
        if (q.startsWith("beta")) {
            return "beta";
        } else if (q.startsWith("omega")) {
            return "omega";
        } else if (q.contains("mobile water")) {
            return "mobileWaterFraction";
        } else if (q.contains("site fraction") || q.contains("sorption-site")) {
            return "mobileSiteFraction";
        } else if (q.contains("mass-transfer") || q.contains("kinetic rate")) {
            return "massTransferRatePerDay";
        }
        return quantity;
    }

    private static String twoRegionBasis(Contaminant c, NonequilibriumEntry entry, TwoRegionParameters p) {
        switch (entry) {
            case DIMENSIONLESS:
                return "beta and omega entered";
            case PHYSICAL:
                return String.format(Locale.ROOT, "physical (mobile-immobile water): theta_m/theta = %s, f = %s, alpha = %s 1/d; "
                        + "beta = (theta_m + f rho_b Kd)/(theta + rho_b Kd) = %.4g, omega = alpha L / q = %.4g "
                        + "(van Genuchten and Wierenga 1976)", c.getMobileWaterFraction(), c.getMobileSiteFraction(),
                        c.getMassTransferRatePerDay(), p.beta(), p.omega());
            default:
                return String.format(Locale.ROOT, "chemical (two-site): F = %s, k = %s 1/d; beta = (1 + F rho_b Kd/theta)/R = "
                        + "%.4g, omega = k (1 - beta) R L / v = %.4g (Nkedi-Kizza et al. 1984)", c.getMobileSiteFraction(),
                        c.getMassTransferRatePerDay(), p.beta(), p.omega());
        }
    }

    /** Why the numerical solution cannot describe this contaminant, or null when it can. */
    public static String numericalUnavailableReason(Contaminant c, NonequilibriumEntry entry) {
        eluvia.site.model.SorptionIsotherm iso = c.getIsotherm() == null ? eluvia.site.model.SorptionIsotherm.LINEAR
                : c.getIsotherm();
        if (entry == NonequilibriumEntry.DIMENSIONLESS) {
            return "beta and omega entered as dimensionless numbers belong to one homogeneous layer; the layered "
                    + "solution needs the physical (theta_m/theta, f, alpha) or chemical (F, k) parameters";
        }
        if (entry == NonequilibriumEntry.CHEMICAL && iso != eluvia.site.model.SorptionIsotherm.LINEAR) {
            return "two-site kinetics with a nonlinear isotherm: the rate k maps onto the solver's exchange rate only "
                    + "for linear sorption (alpha = k (1 - F) rho_b Kd)";
        }
        return null;
    }

    private static SorptionIsotherm isotherm(Contaminant c, SoilLayer layer) {
        eluvia.site.model.SorptionIsotherm iso = c.getIsotherm() == null ? eluvia.site.model.SorptionIsotherm.LINEAR
                : c.getIsotherm();
        try {
            switch (iso) {
                case FREUNDLICH:
                    return SorptionIsotherm.freundlich(c.getFreundlichKfMgPerKgPerMgPerLitreToN(), c.getFreundlichExponent());
                case LANGMUIR:
                    return SorptionIsotherm.langmuir(c.getLangmuirMaximumMilligramsPerKg(),
                            c.getLangmuirConstantLitresPerMilligram());
                default:
                    return SorptionIsotherm.linear(kdOf(c, layer));
            }
        } catch (TransportInputException e) {
            String field = iso == eluvia.site.model.SorptionIsotherm.FREUNDLICH
                    ? (e.quantity().toLowerCase(Locale.ROOT).contains("exponent") ? "freundlichExponent"
                            : "freundlichKfMgPerKgPerMgPerLitreToN")
                    : iso == eluvia.site.model.SorptionIsotherm.LANGMUIR
                            ? (e.quantity().toLowerCase(Locale.ROOT).contains("capacity") ? "langmuirMaximumMilligramsPerKg"
                                    : "langmuirConstantLitresPerMilligram")
                            : "kdLitresPerKg";
            throw DesignInputException.of(c, "Contaminant '" + c.getName() + "'", field, e.value(), e.allowedRange(),
                    "correct the isotherm parameters");
        }
    }

    private static double kdOf(Contaminant c, SoilLayer layer) {
        return c.isKdEntered() ? c.getKdLitresPerKg()
                : TransportProperties.kdFromKoc(c.getKocLitresPerKg(), layer.getOrganicCarbonFraction());
    }

    /**
     * One slice of the treated column as the numerical solver's layer: the layer's soil, the
     * contaminant's isotherm (Kd per layer from Koc foc unless entered), decay in water and on solids,
     * and the two-region or two-site parameters of the contaminant's nonequilibrium entry (chemical:
     * exchange rate alpha = k (1 - F) rho_b Kd). Shared by the pipeline's numerical run and the depth
     * profiles so both describe the same column.
     *
     * @param decayPerDay first-order decay rate, 1/d
     * @param fix what the message of a refused value tells the user to do
     */
    public static eluvia.transport.numerical.SoilLayer numericalLayer(LayerCombination.Slice s, Contaminant c,
            NonequilibriumEntry entry, double decayPerDay, String fix) {
        SoilLayer l = s.layer();
        eluvia.transport.numerical.SoilLayer.Builder b = eluvia.transport.numerical.SoilLayer.builder()
                .thicknessMetres(s.thicknessMetres()).waterContent(l.getWaterContent()).porosity(l.getPorosity())
                .bulkDensityKilogramsPerCubicMetre(l.getBulkDensityKgPerCubicMetre()).isotherm(isotherm(c, l))
                .dispersivityMetres(Dispersivities.effectiveDispersivityMetres(l))
                .freeWaterDiffusionSquareMetresPerSecond(c.getDiffusionSquareMetresPerSecond())
                .decayInWaterPerDay(decayPerDay).decayOnSolidsPerDay(decayPerDay);
        if (entry == NonequilibriumEntry.PHYSICAL) {
            b.mobileWaterFraction(c.getMobileWaterFraction()).mobileSorbingSiteFraction(c.getMobileSiteFraction())
                    .massTransferRatePerDay(c.getMassTransferRatePerDay());
        } else if (entry == NonequilibriumEntry.CHEMICAL) {
            double rhoKgPerLitre = l.getBulkDensityKgPerCubicMetre() / 1000;
            double alpha = c.getMassTransferRatePerDay() * (1 - c.getMobileSiteFraction()) * rhoKgPerLitre * kdOf(c, l);
            b.mobileWaterFraction(1).mobileSorbingSiteFraction(c.getMobileSiteFraction()).massTransferRatePerDay(alpha);
        }
        try {
            return b.build();
        } catch (TransportInputException e) {
            throw DesignInputException.of(l, "Layer '" + l.getName() + "'", e.quantity(), e.value(), e.allowedRange(), fix);
        }
    }

    /**
     * The spectral-element solution of the numerical run's column (exact in time, a different
     * discretisation), for every criterion; not available for nonlinear or two-region layers or a
     * profile outside its range, with the reason.
     */
    static SpectralCheck spectralCheck(FlushingColumn column, double target, double maxPoreVolumes) {
        for (eluvia.transport.numerical.SoilLayer l : column.layers()) {
            if (!l.isotherm().isLinear() || l.isTwoRegion()) {
                return SpectralCheck.notAvailable("not computed: the spectral-element check takes linear equilibrium "
                        + "layers only, and these are " + (l.isTwoRegion() ? "two-region (nonequilibrium)" : "nonlinear"));
            }
        }
        SpectralElementFlushingSolution s;
        try {
            s = SpectralElementFlushingSolution.of(column);
        } catch (TransportInputException e) {
            return SpectralCheck.notAvailable("the spectral-element check cannot take this profile: " + e.getMessage());
        }
        Map<CleanupCriterion, PoreVolumeResult> byCriterion = new EnumMap<>(CleanupCriterion.class);
        for (CleanupCriterion k : CleanupCriterion.values()) {
            byCriterion.put(k, s.poreVolumesToTarget(k, target, maxPoreVolumes));
        }
        return new SpectralCheck(true, "", s.degree(), s.pointCount(), byCriterion);
    }

    /** A design note when the numerical run and its spectral-element check differ by more than 1 %. */
    private static void noteSpectralCheck(String contaminant, MethodEstimate numerical, SpectralCheck check,
            List<String> notes) {
        for (CleanupCriterion k : CleanupCriterion.values()) {
            double d = check.relativeDifference(k, numerical.result(k));
            if (Math.abs(d) > SpectralCheck.NOTE_ABOVE_RELATIVE_DIFFERENCE) {
                notes.add(String.format(Locale.ROOT, "%s: the numerical run and its independent spectral-element check "
                        + "differ by %.2g %% in pore volumes to the %s target; raise the design's numerical cell count or "
                        + "tighten its relative tolerance until they agree.", contaminant, 100 * d, k.word()));
            }
        }
    }

    /** The numerical run: returns the method estimate and the detail. */
    private static Object[] runNumerical(List<LayerCombination.Slice> slices, FlushingDesign design, Contaminant c,
            NonequilibriumEntry entry, double initialMgPerKg, double target, RunProgress progress) {
        double decayPerDay = c.getHalfLifeDays() > 0 ? Math.log(2) / c.getHalfLifeDays() : 0;
        List<eluvia.transport.numerical.SoilLayer> layers = new ArrayList<>();
        double thickness = 0;
        String nonequilibrium = "local equilibrium";
        for (LayerCombination.Slice s : slices) {
            layers.add(numericalLayer(s, c, entry, decayPerDay,
                    "correct the layer or the contaminant's parameters for the numerical solution"));
            if (entry == NonequilibriumEntry.PHYSICAL) {
                nonequilibrium = "physical two-region in every layer: theta_m/theta = " + c.getMobileWaterFraction()
                        + ", f = " + c.getMobileSiteFraction() + ", alpha = " + c.getMassTransferRatePerDay() + " 1/d";
            } else if (entry == NonequilibriumEntry.CHEMICAL) {
                nonequilibrium = "chemical two-site in every layer: F = " + c.getMobileSiteFraction() + ", k = "
                        + c.getMassTransferRatePerDay() + " 1/d as exchange rate alpha = k (1 - F) rho_b Kd per layer";
            }
            thickness += s.thicknessMetres();
        }
        double[] initial = new double[layers.size()];
        java.util.Arrays.fill(initial, initialMgPerKg);
        FlushingColumn column = new FlushingColumn(layers, design.getDarcyFluxMetresPerDay(), 0,
                InitialCondition.soilPerLayer(initial));
        int cells = Math.max(1, design.getNumericalCellCount());
        double tolerance = design.getNumericalRelativeTolerance();
        SolverSettings settings;
        try {
            settings = SolverSettings.builder().maximumCellSizeMetres(thickness / cells)
                    .minimumCellsPerLayer(MINIMUM_CELLS_PER_LAYER).stepTolerance(tolerance).build();
        } catch (TransportInputException e) {
            throw DesignInputException.of(design, "Flushing design '" + design.getName() + "'",
                    "numericalRelativeTolerance", tolerance, e.allowedRange(), "1e-6 is a good start");
        }
        NumericalFlushingSolver solver = new NumericalFlushingSolver(column, settings);
        double maxPv = design.getMaxPoreVolumes();
        FlushingProgress forward = new FlushingProgress() {
            @Override
            public void advanced(double poreVolumes, double maximumPoreVolumes) {
                progress.within(NUMERICAL_UNITS, poreVolumes / maximumPoreVolumes);
            }

            @Override
            public boolean cancelRequested() {
                return progress.cancelRequested();
            }
        };
        FlushingRunRequest request = FlushingRunRequest.upToPoreVolumes(maxPv).targetForAll(target)
                .stopWhenTargetsReached(true).progress(forward).build();
        FlushingRunResult result;
        try {
            result = solver.run(request);
        } catch (FlushingCancelledException e) {
            throw new DesignCancelledException(progress.stage());
        }
        Map<CleanupCriterion, PoreVolumeResult> byCriterion = new EnumMap<>(CleanupCriterion.class);
        for (CleanupCriterion k : CleanupCriterion.values()) {
            TargetOutcome o = result.outcome(k);
            byCriterion.put(k, new PoreVolumeResult(k, target, o.reached(), o.reached() ? o.poreVolumes() : Double.NaN,
                    o.finalFraction(), maxPv, result.acceptedSteps()));
        }
        String iso = layers.get(0).isotherm().describe() + (layers.size() > 1 && (c.getIsotherm() == null
                || c.getIsotherm() == eluvia.site.model.SorptionIsotherm.LINEAR) ? " (Kd per layer)" : "");
        SpectralCheck check = spectralCheck(column, target, maxPv);
        String checked = "";
        if (check.available()) {
            double largest = 0;
            for (CleanupCriterion k : CleanupCriterion.values()) {
                double d = check.relativeDifference(k, byCriterion.get(k));
                if (Math.abs(d) > Math.abs(largest)) {
                    largest = d;
                }
            }
            checked = String.format(Locale.ROOT, "; independent check by spectral elements (degree %d, exact in time): "
                    + "largest relative difference %.1e", check.degree(), largest);
        }
        String description = String.format(Locale.ROOT,
                "numerical finite-volume solution over %d layers (%d cells, BDF2, step tolerance %s), %s, mass-balance "
                        + "error %.2e%s", layers.size(), result.cellCount(), tolerance, iso,
                result.massBalance().relativeError(), checked);
        NumericalDetail detail = new NumericalDetail(layers.size(), result.cellCount(), result.acceptedSteps(),
                result.rejectedSteps(), tolerance, thickness / cells, result.massBalance(), iso, nonequilibrium, check);
        return new Object[] { MethodEstimate.of(FlushingMethod.NUMERICAL, description, byCriterion), detail };
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
