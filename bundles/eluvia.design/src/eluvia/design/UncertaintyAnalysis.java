package eluvia.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;

import eluvia.cost.CostEstimate;
import eluvia.cost.ExcavationQuantities;
import eluvia.design.uncertainty.InputSummary;
import eluvia.design.uncertainty.MonteCarloRunner;
import eluvia.design.uncertainty.ProgressSink;
import eluvia.design.uncertainty.RankCorrelationMatrix;
import eluvia.design.uncertainty.SamplingMethod;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.design.uncertainty.UncertainInput;
import eluvia.design.uncertainty.UncertaintyInputException;
import eluvia.design.uncertainty.UncertaintyModel;
import eluvia.design.uncertainty.UncertaintyResult;
import eluvia.design.uncertainty.UncertaintyStudy;
import eluvia.site.model.PriceBook;
import eluvia.site.model.PriceItem;
import eluvia.site.model.Project;
import eluvia.site.model.RankCorrelation;
import eluvia.site.model.UncertaintySampling;
import eluvia.site.model.UncertaintySettings;

/**
 * Monte Carlo uncertainty of a project's headline figures: every run copies the project, sets
 * the sampled value of each uncertain input (a double attribute of a project object, in its SI
 * unit, {@code eluvia.site.model.UncertainInput}), runs the {@link DesignPipeline} and collects
 * the headlines.
 *
 * <p>Headlines (declared from a deterministic run with every input at its entered value; units in
 * {@link UncertaintyHeadline#unit()}): per flushing design that reaches its cleanup level the pore
 * volumes, duration in calendar days, water applied and water captured; the volume above the
 * cleanup level of the zone analysis when it has one; per entered zone the enlarged volume above
 * the cleanup level after the longest delay; per excavation design the pit and contaminated bank
 * volumes, contaminated loads and compacted backfill; per priced alternative the capital cost and
 * the present value, and per currency the probability that each has the lowest present value.
 * Statistics, tornado and Spearman rank correlations come from {@link MonteCarloRunner}
 * (Latin hypercube after McKay, Beckman and Conover 1979, rank correlation by Iman and Conover
 * 1982); the tornado's base case is the deterministic design (each input at its entered value,
 * or its P50 when the entered value lies outside the distribution).
 *
 * <p>A run that fails validation with its sampled values, in which a flushing design misses its
 * cleanup level or an alternative cannot be priced is recorded as failed with its reason
 * ({@link UncertaintyRunException}) and counted in {@link UncertaintyResults#failureCounts()}; it
 * is never dropped silently. The same seed gives the same results with any number of threads.
 * Progress and cancellation go through the {@link ProgressSink}; a run already in the pipeline when
 * the sink cancels stops at the pipeline's next check and is counted as failed ("cancelled").
 *
 * <p>The runs use the caller's {@link DesignSettings} except that the push-down below the treated
 * column ({@link DesignSettings#pushDownBelowColumn()}) is switched off: it is not a headline
 * figure here and takes most of a run's time.
 */
public final class UncertaintyAnalysis {

    /** Subject kinds of {@link UncertaintyHeadline#subjectKind()}. */
    public static final String FLUSHING_DESIGN = "flushing design";
    /** The zone analysis from the samples. */
    public static final String ZONE_ANALYSIS = "zone analysis";
    /** An entered treatment zone (enlargement by dispersion). */
    public static final String ZONE = "zone";
    /** An excavation design. */
    public static final String EXCAVATION_DESIGN = "excavation design";
    /** A priced alternative. */
    public static final String ALTERNATIVE = "alternative";

    /** Quantities of {@link UncertaintyHeadline#quantity()}. */
    public static final String PORE_VOLUMES = "pore volumes";
    /** Calendar days of flushing, d. */
    public static final String DURATION = "duration";
    /** Flushing water applied, m3. */
    public static final String WATER_APPLIED = "water applied";
    /** Flushing water captured for treatment, m3. */
    public static final String WATER_CAPTURED = "water captured";
    /** Volume above the cleanup level, bank m3. */
    public static final String VOLUME_ABOVE_LEVEL = "volume above the cleanup level";
    /** Enlarged zone volume above the cleanup level after the longest delay, m3. */
    public static final String ENLARGED_VOLUME = "enlarged volume after the longest delay";
    /** Pit bank volume, m3. */
    public static final String PIT_BANK_VOLUME = "pit bank volume";
    /** Contaminated bank volume, m3. */
    public static final String CONTAMINATED_BANK_VOLUME = "contaminated bank volume";
    /** Truck loads of contaminated soil. */
    public static final String CONTAMINATED_LOADS = "contaminated loads";
    /** Compacted backfill volume, m3. */
    public static final String BACKFILL = "backfill compacted volume";
    /** Capital cost, in the price book's currency. */
    public static final String CAPITAL_COST = "capital cost";
    /** Present value, in the price book's currency. */
    public static final String PRESENT_VALUE = "present value";

    /** Feature-name endings and their units, longest first (the model names every SI unit). */
    private static final String[][] UNIT_SUFFIXES = { { "SquareMetresPerSecond", "m2/s" }, { "KgPerCubicMetre", "kg/m3" },
            { "KilogramsPerCubicMetre", "kg/m3" }, { "MilligramsPerLitre", "mg/L" }, { "MilligramsPerKg", "mg/kg" },
            { "LitresPerMilligram", "L/mg" }, { "MetresPerDay", "m/d" }, { "LitresPerKg", "L/kg" },
            { "SquareMetres", "m2" }, { "CubicMetres", "m3" }, { "Kilograms", "kg" }, { "PerDay", "1/d" },
            { "Percent", "%" }, { "Metres", "m" }, { "Days", "d" }, { "Years", "a" }, { "PerWeek", "d/week" } };

    private UncertaintyAnalysis() {
    }

    /** Whether the project asks for the uncertainty analysis (settings present, enabled, with inputs). */
    public static boolean enabled(Project project) {
        UncertaintySettings u = project == null ? null : project.getUncertainty();
        return u != null && u.isEnabled() && !u.getInputs().isEmpty();
    }

    /**
     * The simulation settings the project states: its runs, seed and sampling method, one worker
     * thread per available processor, histogram bins by Sturges' rule.
     *
     * @throws UncertaintyInputException when the project has no uncertainty settings or they are out of range
     */
    public static SimulationSettings settingsOf(Project project) {
        UncertaintySettings u = requireSettings(project);
        SamplingMethod method = u.getSamplingMethod() == UncertaintySampling.PLAIN ? SamplingMethod.PLAIN_MONTE_CARLO
                : SamplingMethod.LATIN_HYPERCUBE;
        int threads = Math.max(1, Math.min(SimulationSettings.MAX_THREADS, Runtime.getRuntime().availableProcessors()));
        return new SimulationSettings(u.getRunCount(), method, u.getSeed(), threads, 0);
    }

    /** Runs the analysis if the project enables it ({@link #enabled}), with its own settings. */
    public static Optional<UncertaintyResults> runIfEnabled(Project project, DesignSettings designSettings,
            ProgressSink progress) {
        return enabled(project) ? Optional.of(run(project, designSettings, null, progress)) : Optional.empty();
    }

    /** {@link #run(Project, DesignSettings, SimulationSettings, ProgressSink)} with the default design settings. */
    public static UncertaintyResults run(Project project, SimulationSettings override, ProgressSink progress) {
        return run(project, DesignSettings.defaults(), override, progress);
    }

    /**
     * Runs the analysis (whether or not the project's settings enable it).
     *
     * @param project        the project with its uncertain inputs; not changed
     * @param designSettings the pipeline's settings for every run
     * @param override       simulation settings to use instead of the project's, or null
     * @param progress       progress and cancellation ({@link ProgressSink#NONE} for none)
     * @throws DesignInputException      when the project itself fails validation
     * @throws UncertaintyInputException when there are no uncertain inputs, no headline figure, or
     *                                   the inputs or their correlations cannot be sampled
     */
    public static UncertaintyResults run(Project project, DesignSettings designSettings, SimulationSettings override,
            ProgressSink progress) {
        UncertaintySettings u = requireSettings(project);
        if (u.getInputs().isEmpty()) {
            throw new UncertaintyInputException("number of uncertain inputs of project '" + project.getName() + "'", 0,
                    "1 or more: add the uncertain inputs to the project's uncertainty settings");
        }
        if (designSettings == null) {
            throw new UncertaintyInputException("design settings", "null", "settings: pass DesignSettings.defaults()");
        }
        // the push-down below the treated column is no headline here and costs most of a run: leave it out
        DesignSettings pipelineSettings = designSettings.toBuilder().pushDownBelowColumn(false).build();
        ProgressSink sink = progress == null ? ProgressSink.NONE : progress;
        SimulationSettings settings = override != null ? override : settingsOf(project);

        DesignRun base = DesignPipeline.run(project, pipelineSettings, DesignProgress.NONE);

        EcoreUtil.Copier templateCopier = new EcoreUtil.Copier();
        Project template = (Project) templateCopier.copy(project);
        templateCopier.copyReferences();
        int k = u.getInputs().size();
        EObject[] targets = new EObject[k];
        EAttribute[] features = new EAttribute[k];
        List<UncertainInput> inputs = new ArrayList<>();
        Map<eluvia.site.model.UncertainInput, String> nameOf = new HashMap<>();
        for (int i = 0; i < k; i++) {
            eluvia.site.model.UncertainInput entry = u.getInputs().get(i);
            targets[i] = templateCopier.get(entry.getTarget());
            features[i] = (EAttribute) entry.getTarget().eClass().getEStructuralFeature(entry.getFeatureName());
            UncertainInput input = input(entry, i);
            inputs.add(input);
            nameOf.put(entry, input.name());
        }
        // the uncertain inputs are not needed in the runs' copies (their validation would repeat each time)
        template.setUncertainty(null);

        List<Headline> headlines = headlines(base);
        if (headlines.isEmpty()) {
            throw new UncertaintyInputException("number of headline figures of project '" + project.getName() + "'", 0,
                    "1 or more: no flushing design reaches its cleanup level, and there is no zone analysis,"
                            + " enlargement, excavation or priced alternative to vary");
        }
        UncertaintyStudy.Builder study = UncertaintyStudy.builder().inputs(inputs);
        for (Headline h : headlines) {
            study.output(h.outputName(), h.unit());
        }
        Map<String, List<String>> byCurrency = new LinkedHashMap<>();
        for (Headline h : headlines) {
            if (h.quantity().equals(PRESENT_VALUE)) {
                byCurrency.computeIfAbsent(h.unit(), c -> new ArrayList<>()).add(h.outputName());
            }
        }
        byCurrency.forEach((currency, names) -> {
            if (names.size() >= 2) {
                study.compareAlternatives(cheapestLabel(currency), names);
            }
        });
        if (!u.getRankCorrelations().isEmpty()) {
            RankCorrelationMatrix.Builder matrix = RankCorrelationMatrix.builder();
            for (RankCorrelation r : u.getRankCorrelations()) {
                matrix.pair(nameOf.get(r.getFirst()), nameOf.get(r.getSecond()), r.getCoefficient());
            }
            study.rankCorrelation(matrix.build());
        }
        CancelWatch watch = new CancelWatch(sink);
        study.model(new PipelineModel(template, targets, features, inputs, headlines, pipelineSettings, watch));
        UncertaintyResult result = new MonteCarloRunner(settings).run(study.build(), watch);
        return results(project.getName(), result, headlines);
    }

    /** The label of the comparison of priced alternatives in one currency. */
    public static String cheapestLabel(String currency) {
        return "lowest present value (" + currency + ")";
    }

    // ---- inputs ---------------------------------------------------------------------------------

    private static UncertaintySettings requireSettings(Project project) {
        if (project == null) {
            throw new UncertaintyInputException("project", "null", "a project with uncertainty settings");
        }
        UncertaintySettings u = project.getUncertainty();
        if (u == null) {
            throw new UncertaintyInputException("uncertainty settings of project '" + project.getName() + "'", "(none)",
                    "settings with at least one uncertain input: add them to the project");
        }
        return u;
    }

    private static UncertainInput input(eluvia.site.model.UncertainInput entry, int index) {
        EObject target = entry.getTarget();
        String name = entry.getName() == null || entry.getName().isBlank()
                ? label(target) + " " + entry.getFeatureName() : entry.getName().trim();
        String unit = unitOf(target, entry.getFeatureName());
        UncertainInput input = switch (entry.getDistribution()) {
        case NORMAL -> UncertainInput.normal(name, unit, entry.getMeanInFeatureUnit(), entry.getStandardDeviationInFeatureUnit());
        case LOGNORMAL -> UncertainInput.lognormal(name, unit, entry.getMedianInFeatureUnit(), entry.getGeometricStandardDeviation());
        case UNIFORM -> UncertainInput.uniform(name, unit, entry.getMinimumInFeatureUnit(), entry.getMaximumInFeatureUnit());
        case TRIANGULAR -> UncertainInput.triangular(name, unit, entry.getMinimumInFeatureUnit(), entry.getModeInFeatureUnit(),
                entry.getMaximumInFeatureUnit());
        };
        EStructuralFeature feature = target.eClass().getEStructuralFeature(entry.getFeatureName());
        double entered = ((Number) target.eGet(feature)).doubleValue();
        try {
            return input.withBaseValue(entered);
        } catch (UncertaintyInputException outsideTheDistribution) {
            return input;
        }
    }

    /** The unit of a model attribute from its name (the model names every unit), e.g. m/d for ...MetresPerDay. */
    static String unitOf(EObject target, String featureName) {
        if (target instanceof PriceItem item && "ratePerUnit".equals(featureName)) {
            String currency = item.getCurrency() != null && !item.getCurrency().isBlank() ? item.getCurrency()
                    : item.eContainer() instanceof PriceBook book ? book.getCurrency() : "";
            return currency.trim() + "/" + (item.getUnit() == null ? "" : item.getUnit().trim());
        }
        for (String[] suffix : UNIT_SUFFIXES) {
            if (featureName.endsWith(suffix[0])) {
                return suffix[1];
            }
        }
        return "1";
    }

    private static String label(EObject object) {
        EStructuralFeature nameFeature = object.eClass().getEStructuralFeature("name");
        Object name = nameFeature == null ? null : object.eGet(nameFeature);
        String kind = object.eClass().getName();
        if (name instanceof String s && !s.isBlank()) {
            return kind + " '" + s + "'";
        }
        if (object instanceof eluvia.site.model.SourceConcentration sc && sc.getContaminant() != null
                && sc.eContainer() != null) {
            return kind + " of '" + sc.getContaminant().getName() + "' in " + label(sc.eContainer());
        }
        return kind;
    }

    // ---- headlines ------------------------------------------------------------------------------

    /** One headline figure and how to read it from a design run. */
    private record Headline(String outputName, String subjectKind, String subjectName, String quantity, String unit,
            double baseValue, Reader reader) {
    }

    @FunctionalInterface
    private interface Reader {
        /** The figure from a run; throws {@link UncertaintyRunException} when the run does not have it. */
        double read(DesignRun run);
    }

    private static List<Headline> headlines(DesignRun base) {
        List<Headline> out = new ArrayList<>();
        for (int i = 0; i < base.flushing().size(); i++) {
            FlushingDesignResult r = base.flushing().get(i);
            if (!r.allReachable() || !Double.isFinite(r.poreVolumes())) {
                continue;
            }
            int index = i;
            String name = r.designName();
            add(out, base, FLUSHING_DESIGN, name, PORE_VOLUMES, "1", run -> flushing(run, index).poreVolumes());
            add(out, base, FLUSHING_DESIGN, name, DURATION, "d", run -> flushing(run, index).calendarDays());
            add(out, base, FLUSHING_DESIGN, name, WATER_APPLIED, "m3", run -> flushing(run, index).waterAppliedCubicMetres());
            add(out, base, FLUSHING_DESIGN, name, WATER_CAPTURED, "m3", run -> flushing(run, index).waterCapturedCubicMetres());
        }
        if (base.zoneAnalysis() != null && base.zoneAnalysis().available()
                && Double.isFinite(base.zoneAnalysis().volumeAboveLevelCubicMetres())) {
            add(out, base, ZONE_ANALYSIS, "", VOLUME_ABOVE_LEVEL, "m3", run -> {
                if (run.zoneAnalysis() == null || !run.zoneAnalysis().available()) {
                    throw new UncertaintyRunException("zone analysis not available",
                            run.zoneAnalysis() == null ? "none" : run.zoneAnalysis().unavailableReason(), null);
                }
                return run.zoneAnalysis().volumeAboveLevelCubicMetres();
            });
        }
        for (int i = 0; i < base.enlargements().size(); i++) {
            ZoneEnlargement e = base.enlargements().get(i);
            if (!e.available() || e.envelope().isEmpty()) {
                continue;
            }
            int index = i;
            add(out, base, ZONE, e.zoneName(), ENLARGED_VOLUME, "m3", run -> {
                ZoneEnlargement x = run.enlargements().get(index);
                if (!x.available() || x.envelope().isEmpty()) {
                    throw new UncertaintyRunException("enlargement of zone '" + x.zoneName() + "' not available",
                            x.unavailableReason(), null);
                }
                return x.envelope().get(x.envelope().size() - 1).volumeAboveLevelCubicMetres();
            });
        }
        for (int i = 0; i < base.excavations().size(); i++) {
            ExcavationResult x = base.excavations().get(i);
            if (x.quantities() == null) {
                continue;
            }
            int index = i;
            String name = x.designName();
            add(out, base, EXCAVATION_DESIGN, name, PIT_BANK_VOLUME, "m3", run -> excavation(run, index).pitBankVolumeCubicMetres());
            add(out, base, EXCAVATION_DESIGN, name, CONTAMINATED_BANK_VOLUME, "m3",
                    run -> excavation(run, index).contaminatedBankVolumeCubicMetres());
            add(out, base, EXCAVATION_DESIGN, name, CONTAMINATED_LOADS, "loads", run -> excavation(run, index).contaminatedLoads());
            add(out, base, EXCAVATION_DESIGN, name, BACKFILL, "m3", run -> excavation(run, index).backfillCompactedVolumeCubicMetres());
        }
        for (AlternativeResult a : base.alternatives()) {
            if (!a.available() || a.estimate() == null) {
                continue;
            }
            String name = a.name();
            String currency = a.estimate().currency();
            add(out, base, ALTERNATIVE, name, CAPITAL_COST, currency, run -> estimate(run, name, currency).capital().total().amount());
            add(out, base, ALTERNATIVE, name, PRESENT_VALUE, currency, run -> estimate(run, name, currency).presentValue().amount());
        }
        return out;
    }

    private static void add(List<Headline> out, DesignRun base, String kind, String subject, String quantity, String unit,
            Reader reader) {
        String outputName = kind + (subject.isEmpty() ? "" : " '" + subject + "'") + ": " + quantity;
        double baseValue = reader.read(base);
        if (Double.isFinite(baseValue) && out.stream().noneMatch(h -> h.outputName().equals(outputName))) {
            out.add(new Headline(outputName, kind, subject, quantity, unit, baseValue, reader));
        }
    }

    private static FlushingDesignResult flushing(DesignRun run, int index) {
        FlushingDesignResult r = run.flushing().get(index);
        if (!r.allReachable() || !Double.isFinite(r.poreVolumes())) {
            throw new UncertaintyRunException("cleanup level not reached: flushing design '" + r.designName() + "'",
                    String.join(" ", r.notes()), null);
        }
        return r;
    }

    private static ExcavationQuantities excavation(DesignRun run, int index) {
        ExcavationResult x = run.excavations().get(index);
        if (x.quantities() == null) {
            throw new UncertaintyRunException("no take-off: excavation design '" + x.designName() + "'",
                    String.join(" ", x.notes()), null);
        }
        return x.quantities();
    }

    private static CostEstimate estimate(DesignRun run, String name, String currency) {
        AlternativeResult a = run.alternative(name).orElseThrow(() -> new UncertaintyRunException(
                "alternative missing: '" + name + "'", "the run priced " + run.alternatives().stream()
                        .map(AlternativeResult::name).toList(), null));
        if (!a.available() || a.estimate() == null) {
            throw new UncertaintyRunException("alternative not available: '" + name + "'", a.unavailableReason(), null);
        }
        if (!currency.equals(a.estimate().currency())) {
            throw new UncertaintyRunException("currency changed: alternative '" + name + "'",
                    a.estimate().currency() + " instead of " + currency, null);
        }
        return a.estimate();
    }

    // ---- the model the engine evaluates -----------------------------------------------------------

    /** Remembers that the sink asked to stop, so that a pipeline run in progress stops too. */
    private static final class CancelWatch implements ProgressSink, DesignProgress {
        private final ProgressSink sink;
        private volatile boolean cancelled;

        CancelWatch(ProgressSink sink) {
            this.sink = sink;
        }

        @Override
        public void worked(int done, int total) {
            sink.worked(done, total);
        }

        @Override
        public boolean cancelled() {
            if (sink.cancelled()) {
                cancelled = true;
            }
            return cancelled;
        }

        @Override
        public void advanced(String stage, double fractionDone) {
            // the Monte Carlo engine reports progress per run
        }

        @Override
        public boolean cancelRequested() {
            return cancelled;
        }
    }

    /** One pipeline run per evaluation, on a fresh copy of the project; shares nothing that changes. */
    private static final class PipelineModel implements UncertaintyModel {
        private final Project template;
        private final EObject[] targets;
        private final EAttribute[] features;
        private final List<UncertainInput> inputs;
        private final List<Headline> headlines;
        private final DesignSettings settings;
        private final CancelWatch watch;

        PipelineModel(Project template, EObject[] targets, EAttribute[] features, List<UncertainInput> inputs,
                List<Headline> headlines, DesignSettings settings, CancelWatch watch) {
            this.template = template;
            this.targets = targets;
            this.features = features;
            this.inputs = inputs;
            this.headlines = headlines;
            this.settings = settings;
            this.watch = watch;
        }

        @Override
        public Map<String, Double> evaluate(eluvia.design.uncertainty.InputValues values) {
            EcoreUtil.Copier copier = new EcoreUtil.Copier();
            Project copy = (Project) copier.copy(template);
            copier.copyReferences();
            for (int i = 0; i < targets.length; i++) {
                copier.get(targets[i]).eSet(features[i], values.get(inputs.get(i).name()));
            }
            DesignRun run;
            try {
                run = DesignPipeline.run(copy, settings, watch);
            } catch (DesignInputException e) {
                String first = e.problems().isEmpty() ? "the project" : e.problems().get(0).objectLabel() + " field "
                        + e.problems().get(0).field();
                throw new UncertaintyRunException("validation: " + first, e.getMessage(), e);
            } catch (DesignCancelledException e) {
                throw new UncertaintyRunException("cancelled while the run was in progress", String.valueOf(e.getMessage()), e);
            } catch (RuntimeException e) {
                throw new UncertaintyRunException("pipeline stopped: " + e.getClass().getSimpleName(),
                        String.valueOf(e.getMessage()), e);
            }
            Map<String, Double> out = new HashMap<>();
            for (Headline h : headlines) {
                double value = h.reader().read(run);
                if (!Double.isFinite(value)) {
                    throw new UncertaintyRunException("no value: " + h.outputName(), "the run gave " + value, null);
                }
                out.put(h.outputName(), value);
            }
            return out;
        }
    }

    // ---- results --------------------------------------------------------------------------------

    private static UncertaintyResults results(String projectName, UncertaintyResult result, List<Headline> headlines) {
        List<UncertaintyHeadline> out = new ArrayList<>();
        for (Headline h : headlines) {
            out.add(new UncertaintyHeadline(h.outputName(), h.subjectKind(), h.subjectName(), h.quantity(), h.unit(),
                    h.baseValue(), result.statistics(h.outputName()), result.tornado(h.outputName())));
        }
        Map<String, Integer> counts = new HashMap<>();
        result.failedRuns().forEach(f -> counts.merge(UncertaintyRunException.categoryOf(f.reason()), 1, Integer::sum));
        Map<String, Integer> sorted = new LinkedHashMap<>();
        counts.entrySet().stream()
                .sorted(Map.Entry.<String, Integer>comparingByValue().reversed().thenComparing(Map.Entry.comparingByKey()))
                .forEach(e -> sorted.put(e.getKey(), e.getValue()));
        List<InputSummary> inputs = result.inputSummaries();
        return new UncertaintyResults(projectName, result.requestedRunCount(), result.completedRunCount(),
                result.failedRunCount(), result.cancelled(), inputs, out, result.cheapestAlternatives(),
                result.rankCorrelations(), sorted, result);
    }
}
