package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.WeakHashMap;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

import eluvia.design.UncertaintyHeadline;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.OutputStatistics;
import eluvia.report.chart.Axis;
import eluvia.report.chart.Histogram;
import eluvia.report.chart.Marker;
import eluvia.report.chart.Tornado;
import eluvia.report.chart.TornadoBar;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.charts.ChartCanvas;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;
import eluvia.ui.internal.preferences.UiPreferences;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.editor.Labels;
import eluvia.ui.internal.uncertainty.UncertaintyJob;
import eluvia.ui.internal.uncertainty.UncertaintySetup;

/**
 * The Uncertainty view's content: the uncertain inputs of the active project (set on the editor's
 * Uncertainty page; a button adds suggested ones when there are none), Run and Cancel, the
 * progress of the Monte Carlo job, and for a chosen result its histogram with P10 / P50 / P90 and
 * its tornado.
 */
public final class UncertaintyView extends DocumentView {

    private final Map<ProjectDocument, Session> sessions = new WeakHashMap<>();
    private final Table inputs;
    private final Label settings;
    private final Button suggest;
    private final Button run;
    private final Button cancel;
    private final ProgressBar progress;
    private final Label status;
    private final Combo output;
    private final ChartCanvas histogram;
    private final ChartCanvas tornado;
    private final Label statistics;
    private final ProjectDocument.Listener modelListener;
    private ProjectDocument document;
    private boolean refreshPending;

    /** What the view keeps per document. */
    private static final class Session {
        UncertaintyJob job;
        UncertaintyResults result;
        String failure;
        int done;
        int total;
    }

    public UncertaintyView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        setLayout(new GridLayout(1, false));
        Label intro = new Label(this, SWT.WRAP);
        intro.setText(Messages.Uncertainty_intro);
        GridData id = new GridData(SWT.FILL, SWT.TOP, true, false);
        id.widthHint = 400;
        intro.setLayoutData(id);
        SashForm sash = new SashForm(this, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));

        Composite top = new Composite(sash, SWT.NONE);
        GridLayout tl = new GridLayout(1, false);
        tl.marginWidth = 0;
        top.setLayout(tl);
        inputs = new Table(top, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        inputs.setHeaderVisible(true);
        inputs.setLinesVisible(true);
        inputs.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        for (String h : new String[] { Messages.Uncertainty_input, Messages.Uncertainty_unit, Messages.Uncertainty_distribution,
                Messages.Uncertainty_p10, Messages.Uncertainty_p50, Messages.Uncertainty_p90 }) {
            new TableColumn(inputs, SWT.LEFT).setText(h);
        }
        Composite bar = new Composite(top, SWT.NONE);
        GridLayout bl = new GridLayout(6, false);
        bl.marginWidth = 0;
        bar.setLayout(bl);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        settings = new Label(bar, SWT.NONE);
        suggest = new Button(bar, SWT.PUSH);
        suggest.setText(Messages.UncertaintyPage_suggest);
        run = new Button(bar, SWT.PUSH);
        run.setText(Messages.Uncertainty_run);
        cancel = new Button(bar, SWT.PUSH);
        cancel.setText(Messages.Uncertainty_cancel);
        cancel.setEnabled(false);
        progress = new ProgressBar(bar, SWT.SMOOTH | SWT.HORIZONTAL);
        GridData pd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        pd.widthHint = 120;
        progress.setLayoutData(pd);
        status = new Label(top, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        sd.widthHint = 300;
        status.setLayoutData(sd);

        Composite bottom = new Composite(sash, SWT.NONE);
        GridLayout bol = new GridLayout(2, true);
        bol.marginWidth = 0;
        bottom.setLayout(bol);
        Composite chooser = new Composite(bottom, SWT.NONE);
        GridLayout cl = new GridLayout(2, false);
        cl.marginWidth = 0;
        chooser.setLayout(cl);
        chooser.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        new Label(chooser, SWT.NONE).setText(Messages.Chart_output);
        output = new Combo(chooser, SWT.READ_ONLY | SWT.DROP_DOWN);
        histogram = new ChartCanvas(bottom);
        histogram.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        tornado = new ChartCanvas(bottom);
        tornado.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        statistics = new Label(bottom, SWT.WRAP);
        GridData std = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        std.widthHint = 400;
        statistics.setLayoutData(std);
        sash.setWeights(40, 60);

        modelListener = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, org.eclipse.emf.common.notify.Notification n) {
                scheduleInputs();
            }
        };
        addDisposeListener(e -> {
            if (document != null) {
                document.removeListener(modelListener);
            }
        });
        suggest.addListener(SWT.Selection, e -> addSuggestions());
        run.addListener(SWT.Selection, e -> runSimulation());
        cancel.addListener(SWT.Selection, e -> cancelSimulation());
        output.addListener(SWT.Selection, e -> showCharts());
        followUnitSystem(this::showCharts);
        start();
    }

    private void scheduleInputs() {
        if (refreshPending || isDisposed()) {
            return;
        }
        refreshPending = true;
        getDisplay().asyncExec(() -> {
            refreshPending = false;
            if (!isDisposed()) {
                showInputs();
                showSession();
            }
        });
    }

    /** Adds the suggested inputs to the project (one undoable edit). */
    public void addSuggestions() {
        if (document == null) {
            return;
        }
        var project = document.project();
        var P = eluvia.site.model.SitePackage.eINSTANCE;
        if (project.getUncertainty() == null) {
            var created = eluvia.site.model.SiteFactory.eINSTANCE.createUncertaintySettings();
            created.setEnabled(true);
            created.getInputs().addAll(UncertaintySetup.suggestions(project));
            document.execute(org.eclipse.emf.edit.command.SetCommand.create(document.domain(), project,
                    P.getProject_Uncertainty(), created));
        } else if (project.getUncertainty().getInputs().isEmpty()) {
            document.execute(org.eclipse.emf.edit.command.AddCommand.create(document.domain(), project.getUncertainty(),
                    P.getUncertaintySettings_Inputs(), UncertaintySetup.suggestions(project)));
        }
    }

    private void showInputs() {
        inputs.removeAll();
        var s = document == null ? null : document.project().getUncertainty();
        if (s != null) {
            for (var i : s.getInputs()) {
                TableItem item = new TableItem(inputs, SWT.NONE);
                String name = UncertaintySetup.nameOf(i);
                String unit = UncertaintySetup.unitOf(i.getFeatureName());
                String[] cells = { name, unit, "", "", "", "" };
                try {
                    var engine = UncertaintySetup.engineInputOf(i);
                    cells[2] = engine.distribution().describe();
                    cells[3] = Numbers.format(engine.p10(), 3);
                    cells[4] = Numbers.format(engine.p50(), 3);
                    cells[5] = Numbers.format(engine.p90(), 3);
                } catch (RuntimeException e) {
                    cells[2] = e.getMessage();
                }
                item.setText(cells);
            }
        }
        for (TableColumn c : inputs.getColumns()) {
            c.pack();
        }
        boolean none = s == null || s.getInputs().isEmpty();
        suggest.setVisible(document != null && none);
        ((GridData) suggestLayout()).exclude = !(document != null && none);
        settings.setText(s == null ? Messages.Uncertainty_noSettings
                : Messages.bind(Messages.Uncertainty_settings, s.getRunCount(), s.getSeed(), Labels.of(s.getSamplingMethod())));
        settings.getParent().layout(true);
    }

    private Object suggestLayout() {
        if (suggest.getLayoutData() == null) {
            suggest.setLayoutData(new GridData());
        }
        return suggest.getLayoutData();
    }

    @Override
    protected void showDocument(ProjectDocument documentOrNull) {
        if (document != null) {
            document.removeListener(modelListener);
        }
        document = documentOrNull;
        if (document != null) {
            document.addListener(modelListener);
        }
        showInputs();
        showSession();
    }

    @Override
    protected void showResults(ProjectDocument documentOrNull, ResultState state) {
        // the simulation runs on request, not after every edit
    }

    private Session session() {
        return document == null ? null : sessions.computeIfAbsent(document, d -> new Session());
    }

    /** Starts a simulation of the active project with the inputs shown. */
    public void runSimulation() {
        Session s = session();
        if (s == null || (s.job != null && s.job.getState() != org.eclipse.core.runtime.jobs.Job.NONE)) {
            return;
        }
        UncertaintyJob job;
        try {
            Session mine = s;
            job = new UncertaintyJob(document.snapshot(), getDisplay(), new UncertaintyJob.Listener() {
                @Override
                public void progress(int done, int total) {
                    mine.done = done;
                    mine.total = total;
                    if (!isDisposed() && session() == mine) {
                        showSession();
                    }
                }

                @Override
                public void finished(UncertaintyResults resultOrNull, String failureOrNull) {
                    mine.result = resultOrNull;
                    mine.failure = failureOrNull;
                    if (!isDisposed() && session() == mine) {
                        showSession();
                    }
                }
            });
        } catch (RuntimeException e) {
            s.failure = e.getMessage();
            showSession();
            return;
        }
        s.job = job;
        s.result = null;
        s.failure = null;
        s.done = 0;
        s.total = job.requestedRuns();
        job.schedule();
        showSession();
    }

    /** Asks the running simulation to stop (it returns its partial result, marked cancelled). */
    public void cancelSimulation() {
        Session s = session();
        if (s != null && s.job != null) {
            s.job.cancel();
        }
    }

    private boolean running(Session s) {
        return s != null && s.job != null && s.job.getState() != org.eclipse.core.runtime.jobs.Job.NONE && s.result == null
                && s.failure == null;
    }

    private void showSession() {
        Session s = session();
        boolean busy = running(s);
        boolean hasInputs = document != null && document.project().getUncertainty() != null
                && !document.project().getUncertainty().getInputs().isEmpty();
        run.setEnabled(s != null && !busy && hasInputs);
        cancel.setEnabled(busy);
        progress.setMaximum(Math.max(1, s == null ? 1 : s.total));
        progress.setSelection(s == null ? 0 : s.done);
        if (s == null) {
            status.setText(Messages.Results_noProject);
        } else if (busy) {
            status.setText(Messages.bind(Messages.Uncertainty_progress, s.done, s.total));
        } else if (s.failure != null) {
            status.setText(Messages.bind(Messages.Uncertainty_failed, s.failure));
        } else if (s.result != null) {
            status.setText(s.result.cancelled()
                    ? Messages.bind(Messages.Uncertainty_cancelled, s.result.completedRunCount(), s.result.requestedRunCount())
                    : Messages.bind(Messages.Uncertainty_done, s.result.completedRunCount(), s.result.failedRunCount())
                            + failures(s.result));
        } else {
            status.setText(Messages.Uncertainty_notRun);
        }
        List<String> outputs = s == null || s.result == null ? List.of()
                : s.result.headlines().stream().map(UncertaintyHeadline::outputName).toList();
        String keep = output.getSelectionIndex() >= 0 ? output.getItem(output.getSelectionIndex()) : null;
        output.setItems(outputs.toArray(String[]::new));
        if (!outputs.isEmpty()) {
            output.select(Math.max(0, outputs.indexOf(keep)));
        }
        showCharts();
        layout(true, true);
    }

    private static String failures(UncertaintyResults r) {
        if (r.failureCounts().isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder();
        r.failureCounts().forEach((reason, n) -> b.append(' ').append(Messages.bind(Messages.Uncertainty_failureCount, n, reason)));
        return b.toString();
    }

    private void showCharts() {
        Session s = session();
        UncertaintyResults r = s == null ? null : s.result;
        String name = output.getSelectionIndex() >= 0 ? output.getItem(output.getSelectionIndex()) : null;
        if (r == null || name == null || r.completedRunCount() < 1) {
            histogram.setChart(null, Messages.Uncertainty_noResult);
            tornado.setChart(null, "");
            statistics.setText("");
            return;
        }
        UncertaintyHeadline h = r.headline(name);
        OutputStatistics st = h.statistics();
        // lengths, areas and volumes in the user's units (the simulation works in SI); others as computed
        UnitDisplay u = new UnitDisplay(UiPreferences.unitSystem());
        Dimension dim = dimensionOf(h.unit());
        String unit = "1".equals(h.unit()) ? "PV" : dim == null ? h.unit() : u.symbol(dim);
        double[] samples = r.simulation().runs().completedOutputValues(name);
        double[] shownSamples = dim == null ? samples : u.figureUnits().values(samples, dim);
        histogram.setChart(samples.length == 0 ? null : new Histogram(Messages.bind(Messages.Uncertainty_histogramTitle, name),
                new Axis(name, unit), shownSamples, Math.max(1, Math.min(Histogram.MAX_BINS, st.histogram().binCount())),
                List.of(new Marker(u.toDisplay(st.p10(), dim), "P10"), new Marker(u.toDisplay(st.p50(), dim), "P50"),
                        new Marker(u.toDisplay(st.p90(), dim), "P90"))),
                Messages.Uncertainty_noResult);
        eluvia.design.uncertainty.Tornado t = h.tornado();
        List<TornadoBar> bars = new ArrayList<>();
        for (eluvia.design.uncertainty.TornadoBar b : t.bars()) {
            if (Double.isFinite(b.outputAtLowInput()) && Double.isFinite(b.outputAtHighInput())) {
                Dimension in = dimensionOf(b.inputUnit());
                String inUnit = in == null ? b.inputUnit() : u.symbol(in);
                bars.add(new TornadoBar(b.inputName(), Numbers.format(u.toDisplay(b.lowInputValue(), in), 3) + " " + inUnit,
                        Numbers.format(u.toDisplay(b.highInputValue(), in), 3) + " " + inUnit,
                        u.toDisplay(b.outputAtLowInput(), dim), u.toDisplay(b.outputAtHighInput(), dim)));
            }
        }
        tornado.setChart(bars.isEmpty() || !Double.isFinite(t.baseOutputValue()) ? null
                : new Tornado(Messages.bind(Messages.Uncertainty_tornadoTitle, name), new Axis(name, unit),
                        u.toDisplay(t.baseOutputValue(), dim), bars), Messages.Uncertainty_noTornado);
        statistics.setText(Messages.bind(Messages.Uncertainty_statistics,
                new Object[] { st.sampleCount(), Numbers.format(u.toDisplay(st.mean(), dim), 3),
                        Numbers.format(u.toDisplay(st.standardDeviation(), dim), 3), Numbers.format(u.toDisplay(st.p10(), dim), 3),
                        Numbers.format(u.toDisplay(st.p50(), dim), 3), Numbers.format(u.toDisplay(st.p90(), dim), 3), unit,
                        OutputStatistics.PERCENTILE_DEFINITION })
                + " " + Messages.bind(Messages.Uncertainty_base, Numbers.format(u.toDisplay(h.baseValue(), dim), 3), unit));
    }

    /** The dimension of a length, area or volume unit of the simulation ("m", "m2", "m3"), null for any other unit. */
    static Dimension dimensionOf(String siUnit) {
        return switch (siUnit == null ? "" : siUnit) {
        case "m" -> Dimension.LENGTH;
        case "m2" -> Dimension.AREA;
        case "m3" -> Dimension.VOLUME;
        default -> null;
        };
    }

    /** The latest result for the active document, or null (tests). */
    public UncertaintyResults result() {
        Session s = session();
        return s == null ? null : s.result;
    }

    /** Why the last simulation of the active document could not run, or null (tests). */
    public String failure() {
        Session s = session();
        return s == null ? null : s.failure;
    }

    /** The running or last job for the active document, or null (tests). */
    public UncertaintyJob job() {
        Session s = session();
        return s == null ? null : s.job;
    }

    /** The status line's text (tests). */
    public String statusText() {
        return status.getText();
    }

    /** The histogram and tornado canvases (tests). */
    public ChartCanvas histogramCanvas() {
        return histogram;
    }

    public ChartCanvas tornadoCanvas() {
        return tornado;
    }
}
