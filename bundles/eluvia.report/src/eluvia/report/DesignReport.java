package eluvia.report;

import java.lang.reflect.RecordComponent;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import eluvia.cost.CostEstimate;
import eluvia.cost.CostOfDelay;
import eluvia.cost.EstimateClass;
import eluvia.cost.PresentValue;
import eluvia.cost.Quantity;
import eluvia.design.AlternativeResult;
import eluvia.design.BelowLayerPush;
import eluvia.design.Cautions;
import eluvia.design.ContaminantFlushing;
import eluvia.design.ContaminantZone;
import eluvia.design.CostOfDelayResult;
import eluvia.design.DepthProfileSet;
import eluvia.design.DepthProfiles;
import eluvia.design.DesignRun;
import eluvia.design.EnlargementPoint;
import eluvia.design.EnteredZoneComparison;
import eluvia.design.ExcavationResult;
import eluvia.design.FlushingDesignResult;
import eluvia.design.FlushingMethod;
import eluvia.design.MethodEstimate;
import eluvia.design.UncertaintyAnalysis;
import eluvia.design.UncertaintyHeadline;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.InputSummary;
import eluvia.design.uncertainty.OutputStatistics;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEnlargement;
import eluvia.report.chart.BarChart;
import eluvia.report.chart.DepthProfile;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.PlanView;
import eluvia.report.chart.SectionView;
import eluvia.report.content.InputTables;
import eluvia.report.content.Methods;
import eluvia.report.content.ResultFigures;
import eluvia.report.document.Block;
import eluvia.report.document.BulletList;
import eluvia.report.document.Caution;
import eluvia.report.document.Column;
import eluvia.report.document.Document;
import eluvia.report.document.DocumentMetadata;
import eluvia.report.document.Figure;
import eluvia.report.document.KeyFigure;
import eluvia.report.document.KeyFigures;
import eluvia.report.document.Paragraph;
import eluvia.report.document.Section;
import eluvia.report.document.SignOffBlock;
import eluvia.report.document.Table;
import eluvia.report.internal.Html;
import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.model.Revision;
import eluvia.site.validation.Problem;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.PoreVolumeResult;

/**
 * Builds the design package as a {@link Document}: cover with the sign-off block for the licensed
 * engineer, scope and cautions, the inputs exactly as used, the methods with their published
 * sources, the results per alternative with their charts, the cost estimates with their class and
 * range, the verification appendix and what a reviewer needs to reproduce every number. The HTML
 * and the PDF of a package are both rendered from this one document.
 *
 * <p>Units: every table column and chart axis carries its unit; money is in the currency of the
 * price book of each estimate.
 */
public final class DesignReport {

    /** Title of every design package. */
    public static final String TITLE = "Remediation design package";
    /** Headings of the level-1 sections, in order. */
    public static final String SCOPE = "Scope and cautions";
    public static final String SUMMARY = "Summary of results";
    public static final String INPUTS = "Site and inputs as used";
    public static final String METHODS = "Methods and sources";
    public static final String RESULTS = "Results by alternative";
    public static final String COSTS = "Cost estimates";
    public static final String VERIFICATION = "Verification appendix";
    public static final String REPRODUCE = "Reproducing these results";
    /** The level-1 headings in document order. */
    public static final List<String> CHAPTERS = List.of(SCOPE, SUMMARY, INPUTS, METHODS, RESULTS, COSTS, VERIFICATION,
            REPRODUCE);
    /** The words of the failure banner. */
    public static final String FAILED_BANNER = "VERIFICATION FAILED";
    /** Sign-off statement of the licensed engineer. */
    public static final String SIGN_OFF_STATEMENT = "I have reviewed the inputs, methods and results of this design "
            + "package and accept responsibility for the design based on it.";

    private static final int SIG = 4;
    /** The outcome words of a verification row. */
    public static final String PASSED = "passed";
    public static final String FAILED = "FAILED";

    private DesignReport() {
    }

    /**
     * The document.
     *
     * @param projectSha256 lower-case hexadecimal SHA-256 of the project file, or null when the run did not come from a file
     * @param issued the date of issue
     * @param verification the outcome of the verification cases run for this package
     */
    public static Document build(Project project, DesignRun run, String projectSha256, String productVersion,
            LocalDate issued, PackageOptions options, VerificationAppendix.Outcome verification) {
        if (project == null || run == null || options == null || verification == null || issued == null) {
            throw new IllegalArgumentException("design report input is missing (null): project, run, options, "
                    + "verification and date of issue are required");
        }
        DocumentMetadata meta = new DocumentMetadata(project.getName(), revision(project), issued,
                productVersion == null || productVersion.isBlank() ? "unknown" : productVersion, projectSha256);
        boolean failed = !verification.passed();
        String subtitle = failed
                ? FAILED_BANNER + ": " + verification.failures().size() + " of " + verification.rows().size()
                        + " verification cases outside their tolerance. Do not rely on these results."
                : "Soil flushing and excavation sizing for review and signature by the licensed engineer of record";
        Document.Builder d = Document.builder(TITLE, meta).subtitle(subtitle)
                .coverSignOff(SignOffBlock.licensedEngineer(SIGN_OFF_STATEMENT));
        List<FlushingDesignResult> flushing = run.flushing().stream().filter(r -> options.reports(r.designName())).toList();
        List<AlternativeResult> alternatives = run.alternatives().stream().filter(a -> options.reports(a.name())).toList();
        scope(d, run, alternatives, verification);
        summary(d, run, flushing, alternatives);
        inputs(d, project, run, flushing);
        d.section(Section.of(METHODS, 1, Paragraph.of("Each result rests on the published method listed here. Where "
                + "a method has no published source the table says so."), Methods.table()));
        results(d, project, run, flushing, options);
        costs(d, alternatives, run);
        verificationSection(d, verification);
        reproduce(d, run, projectSha256, meta.productVersion());
        return d.build();
    }

    /** "Rev. n, date: summary (author)" from the last revision entry, or "unrevised". */
    public static String revision(Project p) {
        List<Revision> revs = p.getRevisions();
        if (revs.isEmpty()) {
            return "unrevised";
        }
        Revision r = revs.get(revs.size() - 1);
        StringBuilder b = new StringBuilder("Rev. ").append(revs.size());
        if (r.getTimestamp() != null) {
            b.append(", ").append(r.getTimestamp().toInstant().atZone(ZoneOffset.UTC).toLocalDate());
        }
        if (r.getSummary() != null && !r.getSummary().isBlank()) {
            b.append(": ").append(r.getSummary());
        }
        if (r.getAuthor() != null && !r.getAuthor().isBlank()) {
            b.append(" (").append(r.getAuthor()).append(')');
        }
        return b.toString();
    }

    // ---------------------------------------------------------------- scope

    private static void scope(Document.Builder d, DesignRun run, List<AlternativeResult> alternatives,
            VerificationAppendix.Outcome verification) {
        List<Block> b = new ArrayList<>();
        if (!verification.passed()) {
            b.add(failedCaution(verification));
        }
        b.add(Paragraph.of("This package sizes in-situ soil flushing and excavation of the zones of project '"
                + run.projectName() + "': pore volumes to reach each cleanup level, duration, water to capture and treat, "
                + "excavation quantities, enlargement of the zone by dispersion while nothing is done, and costs with "
                + "their accuracy range. It is a planning estimate computed from the inputs of section 3 by the methods "
                + "of section 4; it is not a design until a licensed engineer has reviewed and signed it."));
        Set<String> cautions = new LinkedHashSet<>(run.cautions());
        if (!run.excavations().isEmpty()) {
            cautions.add(Cautions.EXCAVATION_SAFETY);
        }
        if (alternatives.stream().anyMatch(AlternativeResult::inventedRates)) {
            cautions.add(Cautions.INVENTED_EXAMPLE);
        }
        for (String c : cautions) {
            b.add(new Caution(cautionTitle(c), List.of(Paragraph.of(c))));
        }
        if (!run.problems().isEmpty()) {
            b.add(Paragraph.marked("**Warnings from validation** (the run went ahead; check each one):"));
            b.add(new BulletList(run.problems().stream().map(Problem::message).map(Paragraph::of).toList()));
        }
        d.section(new Section(SCOPE, 1, b));
    }

    private static String cautionTitle(String caution) {
        if (caution.equals(Cautions.LICENSED_REVIEW)) {
            return "A licensed engineer must review and seal the design";
        }
        if (caution.equals(Cautions.CAPTURE_FLUSHED_WATER)) {
            return "Flushed water must be captured and treated";
        }
        if (caution.equals(Cautions.EXCAVATION_SAFETY)) {
            return "Excavations need protective systems";
        }
        if (caution.equals(Cautions.INVENTED_EXAMPLE)) {
            return "Example data and unit rates are invented";
        }
        return "Caution";
    }

    static Caution failedCaution(VerificationAppendix.Outcome v) {
        List<Paragraph> ps = new ArrayList<>();
        ps.add(Paragraph.marked("**" + FAILED_BANNER + ".** " + v.failures().size() + " of " + v.rows().size()
                + " verification cases of this program fall outside their tolerance (see the verification appendix). "
                + "The results of this package must not be relied on until the cause is found."));
        for (VerificationAppendix.Row r : v.failures()) {
            ps.add(Paragraph.of("Failed: " + r.verificationCase().name() + " (reference "
                    + InputTables.number(r.verificationCase().referenceValue()) + ", computed "
                    + InputTables.number(r.computedValue()) + (r.error().isEmpty() ? "" : ", " + r.error()) + ")"));
        }
        return new Caution(FAILED_BANNER, ps);
    }

    // ---------------------------------------------------------------- summary

    private static void summary(Document.Builder d, DesignRun run, List<FlushingDesignResult> flushing,
            List<AlternativeResult> alternatives) {
        List<Block> b = new ArrayList<>();
        for (FlushingDesignResult r : flushing) {
            b.add(Paragraph.marked("**" + r.designName() + "** (flushing of zone " + r.zoneName() + ", held to the "
                    + r.criterion().description() + ", " + r.solutionMethod().toLowerCase(Locale.ROOT).replace('_', '-')
                    + " solution)"));
            b.add(headline(r, run));
        }
        Table.Builder t = Table.with(Column.text("Alternative"), Column.text("Kind"), Column.text("Available"),
                Column.number("Present value", "currency"), Column.number("Low", "currency"),
                Column.number("High", "currency"), Column.text("Currency"), Column.number("Duration", "calendar d"));
        for (AlternativeResult a : alternatives) {
            CostEstimate e = a.estimate();
            t.row(a.name(), a.kind().name().toLowerCase(Locale.ROOT), a.available() ? "yes" : "no: " + a.unavailableReason(),
                    e == null ? "" : money(e.presentValue().amount()), e == null ? "" : money(e.presentValueLow().amount()),
                    e == null ? "" : money(e.presentValueHigh().amount()), e == null ? "" : e.currency(),
                    num(a.durationCalendarDays()));
        }
        if (!alternatives.isEmpty()) {
            b.add(t.caption("Alternatives side by side; low and high by the accuracy range of each estimate. "
                    + (run.lowestPresentValue() == null ? "No lowest present value is named (none comparable)."
                            : "Lowest present value: " + run.lowestPresentValue() + ".")).build());
        }
        if (b.isEmpty()) {
            b.add(Paragraph.of("The project has no flushing design and no priced alternative selected for this package."));
        }
        d.section(new Section(SUMMARY, 1, b));
    }

    private static KeyFigures headline(FlushingDesignResult r, DesignRun run) {
        List<KeyFigure> k = new ArrayList<>();
        k.add(new KeyFigure("Pore volumes to target", num(r.poreVolumes()), Column.DIMENSIONLESS,
                r.controllingContaminant() == null ? "target not reached" : "controlled by " + r.controllingContaminant()));
        k.add(new KeyFigure("Duration", num(r.calendarDays()), "calendar days",
                InputTables.number(r.operatingDaysPerWeek()) + " operating days per week"));
        k.add(new KeyFigure("Water to capture and treat", num(r.waterCapturedCubicMetres()), "m\u00b3",
                "of " + num(r.waterAppliedCubicMetres()) + " m\u00b3 applied"));
        run.alternatives().stream().filter(a -> a.available() && a.estimate() != null && a.basis() != null
                && a.basis().contains(r.designName())).findFirst().ifPresent(a -> k.add(new KeyFigure(
                        "Present value, " + a.name(), money(a.estimate().presentValue().amount()), a.estimate().currency(),
                        money(a.estimate().presentValueLow().amount()) + " to "
                                + money(a.estimate().presentValueHigh().amount()))));
        return new KeyFigures(k);
    }

    // ---------------------------------------------------------------- inputs

    private static void inputs(Document.Builder d, Project p, DesignRun run, List<FlushingDesignResult> flushing) {
        d.section(Section.of(INPUTS, 1, Paragraph.of("Every value of the project file as the run used it, with its "
                + "unit and where it came from: entered, from the property library (its source and whether it is "
                + "published or from memory are in each contaminant's property source), or derived by the rule given. "
                + (p.getDescription() == null || p.getDescription().isBlank() ? "" : p.getDescription()))));
        d.section(new Section("Project file contents", 2, InputTables.blocks(p)));
        List<Block> derived = new ArrayList<>();
        for (FlushingDesignResult r : flushing) {
            derived.add(Paragraph.marked("**" + r.designName() + "**, zone " + r.zoneName() + ": " + r.layer().basis()
                    + "; area " + num(r.zoneAreaSquareMetres()) + " m\u00b2; one pore volume " + num(r.onePoreVolumeCubicMetres())
                    + " m\u00b3."));
            Table.Builder t = Table.with(Column.text("Contaminant"), Column.number("Kd", "L/kg"),
                    Column.number("R", Column.DIMENSIONLESS), Column.number("v", "m/d"), Column.number("D", "m\u00b2/d"),
                    Column.number("Peclet P", Column.DIMENSIONLESS), Column.number("Initial", "mg/kg"),
                    Column.number("Cleanup level", "mg/kg"), Column.number("Target C/C0", Column.DIMENSIONLESS));
            for (ContaminantFlushing c : r.contaminants()) {
                FlushingEstimate e = c.estimate(r.criterion());
                t.row(c.contaminantName(), num(c.kdLitresPerKg()), num(e.transport().retardation()),
                        num(e.transport().poreWaterVelocityMetresPerDay()), num(e.transport().dispersionSquareMetresPerDay()),
                        num(e.transport().peclet()), num(c.initialSoilMilligramsPerKg()), num(c.cleanupLevelMilligramsPerKg()),
                        num(c.targetFraction()));
            }
            derived.add(t.caption("Derived values of " + r.designName() + ": Kd = Koc foc (Karickhoff et al. 1979) unless "
                    + "entered; R = 1 + \u03c1b Kd / \u03b8; v = q / \u03b8; D = \u03b1L v + \u03c4 D0 (Millington-Quirk \u03c4); "
                    + "P = v L / D.").build());
            derived.add(new BulletList(r.contaminants().stream()
                    .map(c -> Paragraph.of("Kd of " + c.contaminantName() + ": " + c.kdBasis())).toList()));
        }
        if (derived.isEmpty()) {
            derived.add(Paragraph.of("No flushing design is reported, so no transport properties were derived."));
        }
        d.section(new Section("Derived values", 2, derived));
        List<String> settings = run.settings().describe();
        d.section(new Section("Settings of the run", 2, settings.isEmpty() ? List.of(Paragraph.of("No settings."))
                : List.of(new BulletList(settings.stream().map(Paragraph::of).toList()))));
    }

    // ---------------------------------------------------------------- results

    private static void results(Document.Builder d, Project p, DesignRun run, List<FlushingDesignResult> flushing,
            PackageOptions options) {
        d.section(Section.of(RESULTS, 1, Paragraph.of("Results of each flushing design, the zone "
                + "estimated from the samples, the zone's enlargement by dispersion and the excavation take-offs.")));
        for (FlushingDesignResult r : flushing) {
            flushingSection(d, r, run, p);
        }
        zoneSection(d, p, run.zoneAnalysis(), run.enlargements());
        enlargementSection(d, p, run.enlargements());
        for (ExcavationResult x : run.excavations()) {
            excavationSection(d, x);
        }
        uncertaintySection(d, options.uncertainty(), options);
    }

    /** The headline quantities drawn as histogram and tornado. */
    static final List<String> UNCERTAINTY_FIGURE_QUANTITIES = List.of(UncertaintyAnalysis.PORE_VOLUMES,
            UncertaintyAnalysis.DURATION, UncertaintyAnalysis.PRESENT_VALUE);

    private static void uncertaintySection(Document.Builder d, UncertaintyResults u, PackageOptions options) {
        if (u == null) {
            d.section(Section.of("Uncertainty", 2, Paragraph.of("The uncertainty analysis was not run for this package, "
                    + "so no P10 / P50 / P90 ranges, histograms or tornado charts are shown; the cost range is the "
                    + "accuracy range of the estimate class (section 6).")));
            return;
        }
        List<Block> b = new ArrayList<>();
        b.add(Paragraph.of("Monte Carlo over the uncertain inputs of the project: " + u.completedRunCount() + " of "
                + u.requestedRunCount() + " runs completed, " + u.failedRunCount() + " failed"
                + (u.cancelled() ? "; the analysis was cancelled before every run was made" : "") + ". Each run copies "
                + "the project, sets the sampled inputs and runs the whole pipeline. Percentiles: "
                + OutputStatistics.PERCENTILE_DEFINITION));
        Table.Builder in = Table.with(Column.text("Input (unit)"), Column.text("Distribution"),
                Column.number("P10", "input unit"), Column.number("P50", "input unit"), Column.number("P90", "input unit"));
        for (InputSummary i : u.inputs()) {
            in.row(i.name() + " (" + unit(i.unit()) + ")", i.distribution(), num(i.p10()), num(i.p50()), num(i.p90()));
        }
        b.add(in.caption("Uncertain inputs.").build());
        Table.Builder h = Table.with(Column.text("Figure (unit)"), Column.number("Base", "figure unit"),
                Column.number("P10", "figure unit"), Column.number("P50", "figure unit"),
                Column.number("P90", "figure unit"), Column.number("Mean", "figure unit"));
        List<UncertaintyHeadline> shown = u.headlines().stream()
                .filter(x -> x.subjectName().isEmpty() || options.reports(x.subjectName())
                        || !x.subjectKind().equals(UncertaintyAnalysis.FLUSHING_DESIGN)
                                && !x.subjectKind().equals(UncertaintyAnalysis.ALTERNATIVE))
                .toList();
        for (UncertaintyHeadline x : shown) {
            OutputStatistics st = x.statistics();
            h.row(headlineName(x) + " (" + unit(x.unit()) + ")", num(x.baseValue()), st == null ? "" : num(st.p10()),
                    st == null ? "" : num(st.p50()), st == null ? "" : num(st.p90()), st == null ? "" : num(st.mean()));
        }
        b.add(h.caption("Headline figures: the deterministic design run (base) and their spread over the runs.").build());
        d.section(new Section("Uncertainty", 2, b));
        int n = 0;
        for (UncertaintyHeadline x : shown) {
            if (!UNCERTAINTY_FIGURE_QUANTITIES.contains(x.quantity()) || x.statistics() == null) {
                continue;
            }
            List<Block> f = new ArrayList<>();
            double[] samples = u.simulation().runs().completedOutputValues(x.outputName());
            OutputStatistics st = x.statistics();
            n++;
            if (samples.length > 0 && java.util.Arrays.stream(samples).allMatch(Double::isFinite)) {
                int bins = Math.max(1, Math.min(eluvia.report.chart.Histogram.MAX_BINS,
                        (int) Math.ceil(Math.log(samples.length) / Math.log(2)) + 1));
                f.add(new Figure(ResultFigures.id("histogram-" + n, x.outputName()), new eluvia.report.chart.Histogram("",
                        new eluvia.report.chart.Axis(capitalised(x.quantity()), unit(x.unit())), samples, bins,
                        List.of(new eluvia.report.chart.Marker(st.p10(), "P10"), new eluvia.report.chart.Marker(st.p50(), "P50"),
                                new eluvia.report.chart.Marker(st.p90(), "P90"))),
                        "Spread of " + headlineName(x) + " over " + samples.length + " completed runs (" + bins
                                + " bins by Sturges' rule), with P10, P50 and P90."));
            }
            eluvia.design.uncertainty.Tornado t = x.tornado();
            if (t != null && Double.isFinite(t.baseOutputValue())) {
                List<eluvia.report.chart.TornadoBar> bars = new ArrayList<>();
                for (eluvia.design.uncertainty.TornadoBar bar : t.bars()) {
                    if (Double.isFinite(bar.outputAtLowInput()) && Double.isFinite(bar.outputAtHighInput())) {
                        bars.add(new eluvia.report.chart.TornadoBar(bar.inputName(),
                                num(bar.lowInputValue()) + " " + unit(bar.inputUnit()),
                                num(bar.highInputValue()) + " " + unit(bar.inputUnit()), bar.outputAtLowInput(),
                                bar.outputAtHighInput()));
                    }
                }
                if (!bars.isEmpty()) {
                    f.add(new Figure(ResultFigures.id("tornado-" + n, x.outputName()), new eluvia.report.chart.Tornado("",
                            new eluvia.report.chart.Axis(capitalised(x.quantity()), unit(x.unit())), t.baseOutputValue(),
                            bars), "Sensitivity of " + headlineName(x) + ": each input alone at its P10 and P90, the "
                                    + "others at their base values."));
                }
            }
            if (!f.isEmpty()) {
                d.section(new Section("Uncertainty of " + headlineName(x), 3, f));
            }
        }
    }

    private static String headlineName(UncertaintyHeadline x) {
        return x.quantity() + (x.subjectName().isEmpty() ? "" : ", " + x.subjectName());
    }

    private static String unit(String u) {
        return u == null || u.isBlank() || u.equals("1") ? Column.DIMENSIONLESS : u;
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /**
     * The independent checks of the numerical runs in words (spectral elements on the same layered
     * profile, exact in time), or null when no numerical run was made.
     */
    static String spectralChecks(FlushingDesignResult r) {
        List<String> parts = new ArrayList<>();
        for (ContaminantFlushing c : r.contaminants()) {
            if (c.numerical() == null) {
                continue;
            }
            parts.add(c.contaminantName() + ": " + c.numerical().spectralCheck()
                    .describe(c.method(FlushingMethod.NUMERICAL).orElse(null)));
        }
        if (parts.isEmpty()) {
            return null;
        }
        return "Independent check of the numerical runs, the same layered profile by a different discretisation "
                + "(spectral elements; Patera 1984): " + String.join("; ", parts) + ".";
    }

    private static void flushingSection(Document.Builder d, FlushingDesignResult r, DesignRun run, Project p) {
        List<Block> b = new ArrayList<>();
        b.add(headline(r, run));
        b.add(Paragraph.of("Controlling contaminant: " + (r.controllingContaminant() == null ? "none reaches its target"
                : r.controllingContaminant()) + ". Operating " + num(r.operatingDays()) + " days; capture efficiency "
                + num(100 * r.captureEfficiency()) + " %; water escaping capture " + num(r.waterEscapingCubicMetres())
                + " m\u00b3."));
        List<Column> cols = new ArrayList<>();
        cols.add(Column.text("Contaminant"));
        cols.add(Column.text("Solution"));
        for (CleanupCriterion k : CleanupCriterion.values()) {
            cols.add(Column.number("PV, " + k.description(), Column.DIMENSIONLESS));
        }
        List<List<String>> rows = new ArrayList<>();
        for (ContaminantFlushing c : r.contaminants()) {
            for (MethodEstimate m : c.methods()) {
                List<String> row = new ArrayList<>();
                row.add(c.contaminantName());
                row.add(m.method().label() + (m.method() == c.governingMethod() ? " (governs)" : "")
                        + (m.available() ? "" : ": " + m.unavailableReason()));
                for (CleanupCriterion k : CleanupCriterion.values()) {
                    PoreVolumeResult pv = m.result(k);
                    row.add(pv == null ? "" : pv.reachable() ? num(pv.poreVolumes()) : "not reached");
                }
                rows.add(row);
            }
        }
        b.add(new Table(cols, rows, "Pore volumes to each contaminant's target by every solution computed; the design "
                + "is held to the " + r.criterion().description() + "."));
        String checks = spectralChecks(r);
        if (checks != null) {
            b.add(Paragraph.of(checks));
        }
        LineChart curves = ResultFigures.residualCurves(r);
        b.add(new Figure(ResultFigures.id("residual", r.designName()), curves, "Remaining fraction against pore volumes "
                + "flushed for " + r.designName() + ", for each contaminant and criterion: the equilibrium finite-layer "
                + "solution (Brenner 1962) and, where given, the two-region solution, sampled at "
                + ResultFigures.CURVE_POINTS + " points; markers at the design pore volumes and the targets."));
        DepthProfileSet depth = DepthProfiles.ofControlling(p, r);
        DepthProfile profiles = ResultFigures.depthProfiles(depth);
        if (profiles != null) {
            b.add(new Figure(ResultFigures.id("depth", r.designName()), profiles, "Residual soil concentration (mg/kg) "
                    + "of " + depth.contaminantName() + " against depth below ground (m) over the treated column of "
                    + r.designName() + " at 0, 25, 50 and 100 % of the design's " + num(depth.designPoreVolumes())
                    + " pore volumes (calendar days in the legend): " + depth.basis() + ". Cleanup level and layer "
                    + "bases marked; cells below " + ResultFigures.SMALLEST_FRACTION_DRAWN + " of the initial "
                    + "concentration are not drawn."));
        } else if (!depth.available()) {
            b.add(Paragraph.of("No concentration-against-depth profiles for " + r.designName() + ": "
                    + depth.unavailableReason() + "."));
        }
        if (!r.pushDown().isEmpty()) {
            Table.Builder t = Table.with(Column.text("Contaminant"), Column.number("Deepest below layer", "m"),
                    Column.number("Still above target at end", "m"), Column.number("Peak C/C0 below at end", Column.DIMENSIONLESS));
            for (BelowLayerPush push : r.pushDown()) {
                if (push.available()) {
                    t.row(push.contaminantName(), num(push.result().deepestBelowLayerMetres()),
                            num(push.result().belowLayerAtEndMetres()), num(push.result().peakBelowLayerAtEndFraction()));
                } else {
                    t.row(push.contaminantName() + ": " + push.unavailableReason(), "", "", "");
                }
            }
            b.add(t.caption("Contaminant pushed below the treated column while flushing (depths below its base).").build());
        }
        if (!r.notes().isEmpty()) {
            b.add(new BulletList(r.notes().stream().map(Paragraph::of).toList()));
        }
        d.section(new Section("Flushing: " + r.designName(), 2, b));
    }

    private static void zoneSection(Document.Builder d, Project p, ZoneAnalysis z, List<ZoneEnlargement> enlargements) {
        List<Block> b = new ArrayList<>();
        if (z == null || !z.available()) {
            b.add(Paragraph.of("No zone was estimated from the samples: "
                    + (z == null ? "the run has no zone analysis." : z.unavailableReason())));
        } else {
            b.add(Paragraph.of("Estimator: " + z.estimator().label() + "; " + z.blockModelBasis() + ". Volume above at "
                    + "least one cleanup level: " + num(z.volumeAboveLevelCubicMetres()) + " bank m\u00b3."));
            Table.Builder t = Table.with(Column.text("Contaminant"), Column.number("Cleanup level", "mg/kg"),
                    Column.number("Samples", Column.DIMENSIONLESS), Column.number("Non-detects", Column.DIMENSIONLESS),
                    Column.number("Highest sample", "mg/kg"), Column.number("Volume above level", "m\u00b3"),
                    Column.text("Variogram"));
            for (ContaminantZone c : z.contaminants()) {
                t.row(c.contaminantName(), num(c.cleanupLevelMilligramsPerKg()), Integer.toString(c.sampleCount()),
                        Integer.toString(c.nonDetectCount()), num(c.maxSampleMilligramsPerKg()),
                        c.exceedance() == null ? "" : num(c.exceedance().volumeCubicMetres()),
                        c.variogramBasis() == null || c.variogramBasis().isBlank() ? "none (inverse distance)" : c.variogramBasis());
            }
            b.add(t.build());
            if (!z.enteredZones().isEmpty()) {
                Table.Builder e = Table.with(Column.text("Entered zone"), Column.number("Entered volume", "m\u00b3"),
                        Column.number("Estimated inside", "m\u00b3"), Column.number("Estimated outside", "m\u00b3"),
                        Column.number("Share inside", Column.DIMENSIONLESS), Column.text("Assessment"));
                for (EnteredZoneComparison c : z.enteredZones()) {
                    e.row(c.zoneName(), num(c.enteredVolumeCubicMetres()), num(c.estimatedInsideCubicMetres()),
                            num(c.estimatedOutsideCubicMetres()), num(c.fractionInside()), c.assessment());
                }
                b.add(e.caption("Entered zones against the zone estimated from the samples.").build());
            }
            if (!z.notes().isEmpty()) {
                b.add(new BulletList(z.notes().stream().map(Paragraph::of).toList()));
            }
        }
        for (Contaminant c : p.getContaminants()) {
            PlanView plan = ResultFigures.plan(p, c, z, enlargements);
            if (plan != null) {
                StringBuilder caption = new StringBuilder("Plan, to scale: ");
                if (plan.grid() != null) {
                    caption.append("the block model's columns coloured by their highest ").append(c.getName())
                            .append(" estimate over depth (blank where no block is estimated), ");
                }
                caption.append("sampling locations coloured by the highest ").append(c.getName())
                        .append(" sample (non-detects at their detection limit)");
                if (plan.valueMarker() != null) {
                    caption.append(", one colour scale (mg/kg) changing from greys to warm colours at the ")
                            .append(plan.valueMarker().label());
                }
                caption.append("; the site boundary, the entered zone footprints");
                if (plan.outlines().stream().anyMatch(o -> o.kind() == eluvia.report.chart.Outline.Kind.PROPOSED)) {
                    caption.append(", the proposed zone (").append(eluvia.zone.ExceedanceZone.FOOTPRINT_METHOD).append(")");
                }
                if (plan.outlines().stream().anyMatch(o -> o.kind() == eluvia.report.chart.Outline.Kind.ENLARGED)) {
                    caption.append(" and each entered zone grown by its plan growth after the longest delay (the outline "
                            + "the cost of delay prices)");
                }
                b.add(new Figure(ResultFigures.id("plan", c.getName()), plan, caption.append('.').toString()));
            }
        }
        d.section(new Section("Zone from the samples", 2, b));
    }

    private static void enlargementSection(Document.Builder d, Project project, List<ZoneEnlargement> enlargements) {
        List<Block> b = new ArrayList<>();
        b.add(Paragraph.of("While nothing is done the zone enlarges by dispersion: " + ZoneEnlargement.METHOD + "."));
        for (ZoneEnlargement z : enlargements) {
            if (!z.available()) {
                b.add(Paragraph.of(z.zoneName() + ": not computed: " + z.unavailableReason()));
                continue;
            }
            Table.Builder t = Table.with(Column.number("Delay", "yr"), Column.number("Volume above level", "m\u00b3"),
                    Column.number("Ratio to source", Column.DIMENSIONLESS), Column.number("Peak C/C0", Column.DIMENSIONLESS),
                    Column.number("Footprint", "m\u00b2"), Column.number("Plan growth", "m"), Column.number("Top", "m"),
                    Column.number("Bottom", "m"));
            for (EnlargementPoint e : z.envelope()) {
                t.row(num(e.delayYears()), num(e.volumeAboveLevelCubicMetres()), num(e.ratio()), num(e.peakFraction()),
                        num(e.footprintAreaSquareMetres()), num(e.planGrowthMetres()), num(e.topDepthMetres()),
                        num(e.bottomDepthMetres()));
            }
            b.add(t.caption("Zone " + z.zoneName() + " (source " + num(z.sourceVolumeCubicMetres()) + " m\u00b3, "
                    + z.sourceBasis() + "): envelope over its contaminants after each delay; depths below ground.").build());
            SectionView section = ResultFigures.section(project, z);
            if (section != null) {
                b.add(new Figure(ResultFigures.id("section", z.zoneName()), section, "Section through zone " + z.zoneName()
                        + " along easting: the zone as entered and the soil above the cleanup level after each delay "
                        + "(widened by the plan growth on each side, between the top and bottom depths found), layer "
                        + "bases as lines; vertical exaggeration " + InputTables.number(section.verticalExaggeration()) + "."));
            }
            if (!z.notes().isEmpty()) {
                b.add(new BulletList(z.notes().stream().map(Paragraph::of).toList()));
            }
        }
        LineChart chart = ResultFigures.enlargement(enlargements);
        if (chart != null) {
            b.add(new Figure("enlargement", chart, "Volume of soil above the cleanup level against the delay before the "
                    + "remedy starts, per zone (the envelope of its contaminants)."));
        }
        d.section(new Section("Zone enlargement by dispersion", 2, b));
    }

    private static void excavationSection(Document.Builder d, ExcavationResult x) {
        List<Block> b = new ArrayList<>();
        b.add(Paragraph.of("Zone " + x.zoneName() + ". Outline: " + x.footprintBasis() + ". Side slope: " + x.slopeBasis()
                + ". Soil: " + x.soilBasis() + "."));
        b.add(recordTable(x.quantities(), "Excavation take-off of " + x.designName()
                + " (pit volume by the prismoidal formula; loose = bank (1 + swell); compacted = bank (1 - shrinkage))."));
        List<String> notes = new ArrayList<>(x.notes());
        notes.addAll(x.quantities().cautions().stream().map(Object::toString).toList());
        notes.addAll(x.quantities().assumptions());
        if (!notes.isEmpty()) {
            b.add(new BulletList(notes.stream().map(Paragraph::of).toList()));
        }
        d.section(new Section("Excavation: " + x.designName(), 2, b));
    }

    /** Every number of a record as a row of quantity, value and unit (the unit from the component's name). */
    static Table recordTable(Record r, String caption) {
        Table.Builder t = Table.with(Column.text("Quantity"), Column.number("Value", "as stated"), Column.text("Unit"));
        for (RecordComponent c : r.getClass().getRecordComponents()) {
            Class<?> type = c.getType();
            if (type != double.class && type != int.class && type != long.class) {
                continue;
            }
            Object v;
            try {
                v = c.getAccessor().invoke(r);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException("record component " + c.getName() + " of " + r.getClass().getSimpleName()
                        + " could not be read", e);
            }
            String[] hu = headingAndUnit(c.getName());
            t.row(hu[0], v instanceof Double dv ? num(dv) : v.toString(), hu[1]);
        }
        return t.caption(caption).build();
    }

    private static String[] headingAndUnit(String name) {
        String[][] suffixes = { { "CubicMetres", "m\u00b3" }, { "SquareMetres", "m\u00b2" }, { "Metres", "m" },
                { "Tonnes", "t" }, { "Loads", "loads" } };
        String unit = "-";
        for (String[] s : suffixes) {
            if (name.endsWith(s[0])) {
                unit = s[1];
                if (!s[0].equals("Loads")) {
                    name = name.substring(0, name.length() - s[0].length());
                }
                break;
            }
        }
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < name.length(); i++) {
            char ch = name.charAt(i);
            b.append(i == 0 ? String.valueOf(Character.toUpperCase(ch))
                    : Character.isUpperCase(ch) ? " " + Character.toLowerCase(ch) : String.valueOf(ch));
        }
        return new String[] { b.toString(), unit };
    }

    // ---------------------------------------------------------------- costs

    private static void costs(Document.Builder d, List<AlternativeResult> alternatives, DesignRun run) {
        EstimateClass cls = EstimateClass.forFeasibilityStudy();
        d.section(Section.of(COSTS, 1, Paragraph.of("Estimates of " + EstimateClass.SOURCE + " Class "
                + cls.number() + " (" + cls.endUsage() + "), made by the method of US EPA/USACE (2000), EPA 540-R-00-002. "
                + "Default discount rate: " + PresentValue.DEFAULT_RATE_RULE)));
        Set<String> currencies = new LinkedHashSet<>();
        for (AlternativeResult a : alternatives) {
            List<Block> b = new ArrayList<>();
            b.add(Paragraph.of(a.basis() + (a.priceBookName() == null || a.priceBookName().isBlank() ? ""
                    : ". Price book: " + a.priceBookName()) + (a.inventedRates() ? " (rates invented for the example)." : ".")));
            CostEstimate e = a.estimate();
            if (!a.available() || e == null) {
                b.add(Paragraph.of("Not priced: " + a.unavailableReason()));
            } else {
                currencies.add(e.currency());
                b.add(new KeyFigures(List.of(
                        new KeyFigure("Present value", money(e.presentValue().amount()), e.currency(),
                                "at " + num(e.discountRatePercent()) + " % per year"),
                        new KeyFigure("Range", money(e.presentValueLow().amount()) + " to " + money(e.presentValueHigh().amount()),
                                e.currency(), e.recipe().accuracy().source()),
                        new KeyFigure("Capital", money(e.capital().total().amount()), e.currency(), "year 0"),
                        new KeyFigure("Annual O&M", money(e.annual().total().amount()), e.currency(),
                                e.operatingYears() + " years, P/A " + num(e.seriesFactor())))));
                if (a.quantities() != null) {
                    Table.Builder q = Table.with(Column.text("Quantity"), Column.number("Amount", "as stated"),
                            Column.text("Unit"), Column.text("Source"));
                    for (Quantity x : a.quantities().all()) {
                        q.row(x.name(), num(x.amount()), x.unit().symbol(), x.source());
                    }
                    b.add(q.caption("Take-off priced for " + a.name() + ".").build());
                }
                Table.Builder lines = Table.with(Column.text("Line"), Column.number("Cost", e.currency()));
                e.lines().forEach(l -> lines.row(l.trace(), money(l.cost().amount())));
                lines.row("Capital total (with contingency and services)", money(e.capital().total().amount()));
                lines.row("Present value of annual O&M", money(e.presentValueOfAnnual().amount()));
                lines.row("Present value of periodic costs", money(e.presentValueOfPeriodic().amount()));
                lines.row("Present value", money(e.presentValue().amount()));
                b.add(lines.caption("Cost lines as quantity x rate, and the totals.").build());
                b.add(new BulletList(e.trace().stream().skip(1 + e.lines().size()).map(Paragraph::of).toList().isEmpty()
                        ? List.of(Paragraph.of("No markups."))
                        : e.trace().stream().skip(1 + e.lines().size()).map(Paragraph::of).toList()));
            }
            if (!a.unpriced().isEmpty()) {
                b.add(Paragraph.of("Not priced (missing from the price book): " + String.join(", ", a.unpriced()) + "."));
            }
            run.costOfDelay().stream().filter(c -> c.alternativeName().equals(a.name()) && c.available()).findFirst()
                    .ifPresent(c -> b.add(costOfDelayTable(c)));
            if (!a.notes().isEmpty()) {
                b.add(new BulletList(a.notes().stream().map(Paragraph::of).toList()));
            }
            d.section(new Section("Alternative: " + a.name(), 2, b));
        }
        for (String currency : currencies) {
            BarChart chart = ResultFigures.costBreakdown(alternatives, currency);
            if (chart != null) {
                d.section(Section.of("Cost breakdown (" + currency + ")", 2, new Figure(ResultFigures.id("cost", currency),
                        chart, "Present value of each priced alternative in " + currency + ": capital, present value of "
                                + "annual O&M and of periodic costs, stacked.")));
            }
        }
    }

    private static Table costOfDelayTable(CostOfDelayResult c) {
        String cur = c.points().isEmpty() ? "currency" : c.points().get(0).presentValueToday().currency();
        Table.Builder t = Table.with(Column.number("Delay", "yr"), Column.number("PV at start of work", cur),
                Column.number("PV today", cur), Column.number("Increase today", cur));
        for (CostOfDelay.Point p : c.points()) {
            t.row(num(p.delayYears()), money(p.presentValueAtStartOfWork().amount()), money(p.presentValueToday().amount()),
                    money(p.increaseToday().amount()));
        }
        return t.caption("Cost of delay for " + c.alternativeName() + " (zone " + c.zoneName() + " enlarging): " + c.basis())
                .build();
    }

    // ---------------------------------------------------------------- verification

    private static void verificationSection(Document.Builder d, VerificationAppendix.Outcome v) {
        List<Block> b = new ArrayList<>();
        if (!v.passed()) {
            b.add(failedCaution(v));
        }
        b.add(Paragraph.marked("The verification cases were **run by this program when the package was written**, "
                + "and each computed value is set against a reference value with its source. "
                + (v.passed() ? "**All " + v.rows().size() + " cases passed.**"
                        : "**" + v.failures().size() + " of " + v.rows().size() + " cases FAILED.**")));
        b.addAll(verificationTables(v));
        d.section(new Section(VERIFICATION, 1, b));
    }

    /**
     * The verification rows as two tables: case number, case, reference, computed, difference,
     * tolerance and pass/fail; then per case number the source of the reference and the basis of
     * the tolerance.
     */
    public static List<Table> verificationTables(VerificationAppendix.Outcome v) {
        Table.Builder t = Table.with(Column.text("Case"), Column.number("Reference", "case unit"),
                Column.number("Computed", "case unit"), Column.number("Difference", "case unit"),
                Column.number("Tolerance", "case unit"), Column.text("Outcome"));
        Table.Builder s = Table.with(Column.text("Case"), Column.text("Source of the reference"),
                Column.text("Basis of the tolerance"));
        int n = 0;
        for (VerificationAppendix.Row r : v.rows()) {
            VerificationAppendix.Case c = r.verificationCase();
            String no = "V" + ++n;
            t.row(no + ": " + c.name() + " (unit: " + c.unit() + ")", sig(c.referenceValue(), 8),
                    r.error().isEmpty() ? sig(r.computedValue(), 8) : "error: " + r.error(), sig(r.difference(), 2),
                    sig(c.tolerance(), 2), r.passed() ? PASSED : FAILED);
            s.row("Case " + no, c.source(), c.toleranceBasis());
        }
        return List.of(t.caption("Verification cases run for this package; values in the unit of each case (\"-\" "
                + "for dimensionless); reference and computed values to 8 significant figures. A case passes when "
                + "|difference| is at most its tolerance.").build(),
                s.caption("Sources of the reference values and bases of the tolerances.").build());
    }

    // ---------------------------------------------------------------- reproduce

    private static void reproduce(Document.Builder d, DesignRun run, String sha, String version) {
        d.section(Section.of(REPRODUCE, 1, Paragraph.of("Every number of this package follows from the project file "
                + "and the program version below; the same file run by the same version gives the same numbers. The "
                + "machine-readable results, with every number to full precision, are in results.json beside this "
                + "document, and the numbers of every figure in the CSV file of the same name as the figure."),
                Table.with(Column.text("Item"), Column.text("Value"))
                        .row("Project file SHA-256", sha == null ? "not computed (the run did not come from a saved file)" : sha)
                        .row("Program version", version).row("Run started", run.startedAt().toString())
                        .row("Project", run.projectName()).build(),
                new BulletList(run.notes().isEmpty() ? List.of(Paragraph.of("No run-wide notes."))
                        : run.notes().stream().map(Paragraph::of).toList())));
    }

    // ---------------------------------------------------------------- formatting

    /** A number to 4 significant figures with grouped thousands; an en dash for NaN. */
    static String num(double v) {
        return Html.num(v, SIG);
    }

    /** Money to whole units with grouped thousands. */
    static String money(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%,.0f", v) : "\u2013";
    }

    private static String sig(double v, int digits) {
        if (!Double.isFinite(v)) {
            return Html.num(v, digits);
        }
        if (v == 0) {
            return "0";
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(digits)).stripTrailingZeros().toString()
                .replace("E", "e").replace("e+", "e");
    }
}
