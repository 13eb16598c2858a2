package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.WeakHashMap;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.ComboBoxCellEditor;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swt.widgets.Table;

import eluvia.design.uncertainty.OutputStatistics;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.design.uncertainty.UncertaintyResult;
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
import eluvia.ui.internal.uncertainty.UncertainParameter;
import eluvia.ui.internal.uncertainty.UncertaintyJob;
import eluvia.ui.internal.uncertainty.UncertaintySetup;

/**
 * The Uncertainty view's content: which inputs of the active project vary and how (a table of
 * distributions, starting from stated defaults), the number of runs, Run and Cancel, the progress
 * of the Monte Carlo job, and for a chosen result its histogram with P10 / P50 / P90 and its
 * tornado. The inputs chosen here are kept for the session, not in the project file.
 */
public final class UncertaintyView extends DocumentView {

    /** Default number of runs: the example's pipeline takes about a tenth of a second per design and run. */
    public static final int DEFAULT_RUNS = 200;

    private final Map<ProjectDocument, Session> sessions = new WeakHashMap<>();
    private final TableViewer inputs;
    private final Spinner runs;
    private final Button run;
    private final Button cancel;
    private final ProgressBar progress;
    private final Label status;
    private final Combo output;
    private final ChartCanvas histogram;
    private final ChartCanvas tornado;
    private final Label statistics;
    private ProjectDocument document;

    /** What the view keeps per document. */
    private static final class Session {
        List<UncertainParameter> parameters;
        UncertaintyJob job;
        UncertaintyResult result;
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
        inputs = new TableViewer(top, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        Table table = inputs.getTable();
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        inputs.setContentProvider(ArrayContentProvider.getInstance());
        columns();
        Composite bar = new Composite(top, SWT.NONE);
        GridLayout bl = new GridLayout(6, false);
        bl.marginWidth = 0;
        bar.setLayout(bl);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        new Label(bar, SWT.NONE).setText(Messages.Uncertainty_runs);
        runs = new Spinner(bar, SWT.BORDER);
        runs.setValues(DEFAULT_RUNS, SimulationSettings.MIN_RUNS, 1_000_000, 0, 50, 500);
        run = new Button(bar, SWT.PUSH);
        run.setText(Messages.Uncertainty_run);
        cancel = new Button(bar, SWT.PUSH);
        cancel.setText(Messages.Uncertainty_cancel);
        cancel.setEnabled(false);
        progress = new ProgressBar(bar, SWT.SMOOTH | SWT.HORIZONTAL);
        GridData pd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        pd.widthHint = 120;
        progress.setLayoutData(pd);
        status = new Label(bar, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        sd.widthHint = 200;
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

        run.addListener(SWT.Selection, e -> runSimulation());
        cancel.addListener(SWT.Selection, e -> cancelSimulation());
        output.addListener(SWT.Selection, e -> showCharts());
        start();
    }

    private void columns() {
        column(Messages.Uncertainty_input, 190, p -> p.name(), null);
        column(Messages.Uncertainty_unit, 50, p -> p.unit(), null);
        String[] kinds = java.util.Arrays.stream(UncertainParameter.Kind.values()).map(UncertainParameter.Kind::label)
                .toArray(String[]::new);
        column(Messages.Uncertainty_distribution, 230, p -> p.kind().label(), new EditingSupport(inputs) {
            private final ComboBoxCellEditor editor = new ComboBoxCellEditor(inputs.getTable(), kinds, SWT.READ_ONLY);

            @Override
            protected CellEditor getCellEditor(Object element) {
                return editor;
            }

            @Override
            protected boolean canEdit(Object element) {
                return true;
            }

            @Override
            protected Object getValue(Object element) {
                return ((UncertainParameter) element).kind().ordinal();
            }

            @Override
            protected void setValue(Object element, Object value) {
                if (value instanceof Integer i && i >= 0) {
                    ((UncertainParameter) element).setKind(UncertainParameter.Kind.values()[i]);
                    inputs.update(element, null);
                }
            }
        });
        for (int i = 0; i < 3; i++) {
            int index = i;
            column(Messages.bind(Messages.Uncertainty_parameter, "abc".charAt(i)), 80,
                    p -> index < p.kind().parameterCount() ? Numbers.format(p.value(index)) : "",
                    new EditingSupport(inputs) {
                        private final TextCellEditor editor = new TextCellEditor(inputs.getTable(), SWT.RIGHT);

                        @Override
                        protected CellEditor getCellEditor(Object element) {
                            return editor;
                        }

                        @Override
                        protected boolean canEdit(Object element) {
                            return index < ((UncertainParameter) element).kind().parameterCount();
                        }

                        @Override
                        protected Object getValue(Object element) {
                            return Numbers.format(((UncertainParameter) element).value(index));
                        }

                        @Override
                        protected void setValue(Object element, Object value) {
                            double v = Numbers.parse(String.valueOf(value));
                            if (Double.isNaN(v)) {
                                status.setText(Messages.bind(Messages.Uncertainty_badNumber,
                                        ((UncertainParameter) element).name(), value));
                                return;
                            }
                            ((UncertainParameter) element).setValue(index, v);
                            inputs.update(element, null);
                        }
                    });
        }
    }

    private interface Text {
        String of(UncertainParameter p);
    }

    private void column(String header, int width, Text text, EditingSupport editing) {
        TableViewerColumn c = new TableViewerColumn(inputs, SWT.LEFT);
        c.getColumn().setText(header);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.of((UncertainParameter) element);
            }
        });
        if (editing != null) {
            c.setEditingSupport(editing);
        }
    }

    @Override
    protected void showDocument(ProjectDocument documentOrNull) {
        document = documentOrNull;
        Session s = session();
        inputs.setInput(s == null ? List.of() : s.parameters);
        showSession();
    }

    @Override
    protected void showResults(ProjectDocument documentOrNull, ResultState state) {
        // the simulation runs on request, not after every edit
    }

    private Session session() {
        if (document == null) {
            return null;
        }
        return sessions.computeIfAbsent(document, d -> {
            Session s = new Session();
            s.parameters = new ArrayList<>(UncertaintySetup.defaults(d.project()));
            return s;
        });
    }

    /** Starts a simulation of the active project with the inputs shown. */
    public void runSimulation() {
        Session s = session();
        if (s == null || (s.job != null && s.job.getState() != org.eclipse.core.runtime.jobs.Job.NONE)) {
            return;
        }
        UncertaintyJob job;
        try {
            var study = UncertaintySetup.study(document.project(), s.parameters);
            SimulationSettings settings = SimulationSettings.defaults().withRunCount(runs.getSelection());
            Session mine = s;
            job = new UncertaintyJob(study, settings, getDisplay(), new UncertaintyJob.Listener() {
                @Override
                public void progress(int done, int total) {
                    mine.done = done;
                    mine.total = total;
                    if (!isDisposed() && session() == mine) {
                        showSession();
                    }
                }

                @Override
                public void finished(UncertaintyResult resultOrNull, String failureOrNull) {
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
        s.total = runs.getSelection();
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
        run.setEnabled(s != null && !busy);
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
                    : Messages.bind(Messages.Uncertainty_done, s.result.completedRunCount(), s.result.failedRunCount()));
        } else {
            status.setText(Messages.Uncertainty_notRun);
        }
        List<String> outputs = s == null || s.result == null ? List.of()
                : s.result.outputStatistics().stream().map(OutputStatistics::name).toList();
        String keep = output.getSelectionIndex() >= 0 ? output.getItem(output.getSelectionIndex()) : null;
        output.setItems(outputs.toArray(String[]::new));
        if (!outputs.isEmpty()) {
            output.select(Math.max(0, outputs.indexOf(keep)));
        }
        showCharts();
        layout(true, true);
    }

    private void showCharts() {
        Session s = session();
        UncertaintyResult r = s == null ? null : s.result;
        String name = output.getSelectionIndex() >= 0 ? output.getItem(output.getSelectionIndex()) : null;
        if (r == null || name == null || r.completedRunCount() < 1) {
            histogram.setChart(null, Messages.Uncertainty_noResult);
            tornado.setChart(null, "");
            statistics.setText("");
            return;
        }
        OutputStatistics st = r.statistics(name);
        double[] samples = r.runs().completedOutputValues(name);
        histogram.setChart(new Histogram(Messages.bind(Messages.Uncertainty_histogramTitle, name),
                new Axis(name, st.unit()), samples, Math.max(1, Math.min(Histogram.MAX_BINS, st.histogram().binCount())),
                List.of(new Marker(st.p10(), "P10"), new Marker(st.p50(), "P50"), new Marker(st.p90(), "P90"))),
                Messages.Uncertainty_noResult);
        eluvia.design.uncertainty.Tornado t = r.tornado(name);
        List<TornadoBar> bars = new ArrayList<>();
        for (eluvia.design.uncertainty.TornadoBar b : t.bars()) {
            if (Double.isFinite(b.outputAtLowInput()) && Double.isFinite(b.outputAtHighInput())) {
                bars.add(new TornadoBar(b.inputName(), Numbers.format(b.lowInputValue(), 3) + " " + b.inputUnit(),
                        Numbers.format(b.highInputValue(), 3) + " " + b.inputUnit(), b.outputAtLowInput(),
                        b.outputAtHighInput()));
            }
        }
        tornado.setChart(bars.isEmpty() || !Double.isFinite(t.baseOutputValue()) ? null
                : new Tornado(Messages.bind(Messages.Uncertainty_tornadoTitle, name), new Axis(name, st.unit()),
                        t.baseOutputValue(), bars), Messages.Uncertainty_noTornado);
        statistics.setText(Messages.bind(Messages.Uncertainty_statistics,
                new Object[] { st.sampleCount(), Numbers.format(st.mean(), 3), Numbers.format(st.standardDeviation(), 3),
                        Numbers.format(st.p10(), 3), Numbers.format(st.p50(), 3), Numbers.format(st.p90(), 3), st.unit(),
                        OutputStatistics.PERCENTILE_DEFINITION }));
    }

    /** The inputs shown for the active document (tests). */
    public List<UncertainParameter> parameters() {
        Session s = session();
        return s == null ? List.of() : s.parameters;
    }

    /** The latest result for the active document, or null (tests). */
    public UncertaintyResult result() {
        Session s = session();
        return s == null ? null : s.result;
    }

    /** The running or last job for the active document, or null (tests). */
    public UncertaintyJob job() {
        Session s = session();
        return s == null ? null : s.job;
    }

    /** The runs spinner (tests). */
    public Spinner runsSpinner() {
        return runs;
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
