package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

import eluvia.report.chart.Axis;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.Marker;
import eluvia.report.chart.XySeries;
import eluvia.site.model.ColumnTest;
import eluvia.transport.ColumnFitResult;
import eluvia.transport.ColumnTestFit;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.calibration.Calibration;
import eluvia.ui.internal.charts.ChartCanvas;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;

/**
 * The Calibration view's content: a column test of the active project fitted by the transport
 * bundle's fitter (in a job), the measured curve with the fitted one, the residuals, the
 * parameters with their standard errors and 95 % intervals, the fitter's warnings, and a button
 * that takes the parameters into the project as one undoable edit.
 */
public final class CalibrationView extends DocumentView {

    /** Points of the drawn fitted curve. */
    static final int CURVE_POINTS = 120;

    private final Combo test;
    private final Combo model;
    private final Button fit;
    private final Button accept;
    private final Label status;
    private final ChartCanvas curve;
    private final ChartCanvas residuals;
    private final Table parameters;
    private ProjectDocument document;
    private ColumnFitResult result;
    private ColumnTest fitted;
    private Job job;

    public CalibrationView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        setLayout(new GridLayout(2, true));
        Composite bar = new Composite(this, SWT.NONE);
        GridLayout bl = new GridLayout(6, false);
        bl.marginWidth = 0;
        bar.setLayout(bl);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        new Label(bar, SWT.NONE).setText(Messages.Calibration_test);
        test = new Combo(bar, SWT.READ_ONLY | SWT.DROP_DOWN);
        new Label(bar, SWT.NONE).setText(Messages.Calibration_model);
        model = new Combo(bar, SWT.READ_ONLY | SWT.DROP_DOWN);
        for (ColumnTestFit.Model m : ColumnTestFit.Model.values()) {
            model.add(label(m));
        }
        model.select(0);
        fit = new Button(bar, SWT.PUSH);
        fit.setText(Messages.Calibration_fit);
        accept = new Button(bar, SWT.PUSH);
        accept.setText(Messages.Calibration_accept);
        accept.setEnabled(false);
        status = new Label(this, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        sd.widthHint = 300;
        status.setLayoutData(sd);
        curve = new ChartCanvas(this);
        GridData cd = new GridData(SWT.FILL, SWT.FILL, true, true);
        cd.heightHint = 200;
        cd.widthHint = 200;
        curve.setLayoutData(cd);
        residuals = new ChartCanvas(this);
        GridData rd = new GridData(SWT.FILL, SWT.FILL, true, true);
        rd.heightHint = 200;
        rd.widthHint = 200;
        residuals.setLayoutData(rd);
        parameters = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        parameters.setHeaderVisible(true);
        parameters.setLinesVisible(true);
        GridData td = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        td.heightHint = parameters.getItemHeight() * 5 + parameters.getHeaderHeight();
        parameters.setLayoutData(td);
        for (String h : new String[] { Messages.Calibration_parameter, Messages.Calibration_value,
                Messages.Calibration_standardError, Messages.Calibration_interval, Messages.Calibration_identifiable }) {
            new TableColumn(parameters, SWT.LEFT).setText(h);
        }
        fit.addListener(SWT.Selection, e -> startFit());
        accept.addListener(SWT.Selection, e -> acceptFit());
        test.addListener(SWT.Selection, e -> showMeasured());
        start();
    }

    static String label(ColumnTestFit.Model m) {
        return switch (m) {
        case FINITE_EQUILIBRIUM -> Messages.Calibration_finite;
        case SEMI_INFINITE_EQUILIBRIUM -> Messages.Calibration_semiInfinite;
        case FINITE_TWO_REGION -> Messages.Calibration_twoRegion;
        };
    }

    @Override
    protected void showDocument(ProjectDocument documentOrNull) {
        document = documentOrNull;
        result = null;
        fitted = null;
        test.removeAll();
        if (document != null) {
            for (ColumnTest t : document.project().getColumnTests()) {
                test.add(t.getName());
            }
            if (test.getItemCount() > 0) {
                test.select(0);
            }
        }
        showMeasured();
    }

    @Override
    protected void showResults(ProjectDocument documentOrNull, ResultState state) {
        // calibration runs on request
    }

    private ColumnTest selectedTest() {
        int i = test.getSelectionIndex();
        return document == null || i < 0 || i >= document.project().getColumnTests().size() ? null
                : document.project().getColumnTests().get(i);
    }

    private void showMeasured() {
        ColumnTest t = selectedTest();
        fit.setEnabled(t != null);
        accept.setEnabled(result != null && fitted == t);
        if (t == null) {
            status.setText(document == null ? Messages.Results_noProject : Messages.Calibration_noTests);
            curve.setChart(null, "");
            residuals.setChart(null, "");
            parameters.removeAll();
            return;
        }
        if (result == null || fitted != t) {
            status.setText(Messages.Calibration_notFitted);
            parameters.removeAll();
            residuals.setChart(null, Messages.Calibration_notFitted);
        }
        curve.setChart(curveChart(t, fitted == t ? result : null), Messages.Calibration_noPoints);
    }

    /** The measured points and, after a fit, the fitted curve (values of the fitter's model). */
    static LineChart curveChart(ColumnTest t, ColumnFitResult fit) {
        var obs = Calibration.observations(t);
        if (obs.isEmpty()) {
            return null;
        }
        double[] x = obs.stream().mapToDouble(o -> o.poreVolumes()).toArray();
        double[] y = obs.stream().mapToDouble(o -> o.relativeConcentration()).toArray();
        List<XySeries> series = new ArrayList<>();
        series.add(new XySeries(Messages.Calibration_measured, x, y));
        if (fit != null) {
            double max = 0;
            for (double v : x) {
                max = Math.max(max, v);
            }
            double[] fx = new double[CURVE_POINTS];
            double[] fy = new double[CURVE_POINTS];
            double[] p = fit.parameters().stream().mapToDouble(ColumnFitResult.FittedParameter::value).toArray();
            for (int i = 0; i < CURVE_POINTS; i++) {
                fx[i] = max * 1.05 * (i + 1) / CURVE_POINTS;
                fy[i] = ColumnTestFit.predict(fit.curve(), fit.model(), p, fx[i]);
            }
            series.add(new XySeries(Messages.bind(Messages.Calibration_fitted, label(fit.model())), fx, fy));
        }
        return new LineChart(Messages.bind(Messages.Calibration_curveTitle, t.getName()),
                new Axis(Messages.Calibration_poreVolumes, "PV"), Axis.dimensionless(Messages.Calibration_relative), series,
                false, List.of(), List.of());
    }

    /** Fits the selected test in a job. */
    public void startFit() {
        ColumnTest t = selectedTest();
        if (t == null || (job != null && job.getState() != Job.NONE)) {
            return;
        }
        ColumnTestFit.Model m = ColumnTestFit.Model.values()[Math.max(0, model.getSelectionIndex())];
        ColumnTest copy = org.eclipse.emf.ecore.util.EcoreUtil.copy(t);
        status.setText(Messages.Calibration_fitting);
        fit.setEnabled(false);
        job = new Job(Messages.Calibration_jobName) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                ColumnFitResult r = null;
                String failure = null;
                try {
                    r = Calibration.fit(copy, m);
                } catch (RuntimeException e) {
                    failure = e.getMessage();
                }
                ColumnFitResult done = r;
                String f = failure;
                if (!isDisposed()) {
                    getDisplay().asyncExec(() -> finished(t, done, f));
                }
                return Status.OK_STATUS;
            }
        };
        job.setSystem(true);
        job.schedule();
    }

    private void finished(ColumnTest t, ColumnFitResult r, String failure) {
        if (isDisposed()) {
            return;
        }
        fit.setEnabled(true);
        if (r == null) {
            status.setText(Messages.bind(Messages.Calibration_failed, failure));
            return;
        }
        result = r;
        fitted = t;
        parameters.removeAll();
        for (ColumnFitResult.FittedParameter p : r.parameters()) {
            TableItem item = new TableItem(parameters, SWT.NONE);
            item.setText(new String[] { p.name(), Numbers.format(p.value(), 4), Numbers.format(p.standardError(), 3),
                    Numbers.format(p.lower95(), 4) + " \u2013 " + Numbers.format(p.upper95(), 4),
                    p.identifiable() ? Messages.Fields_yes : Messages.Calibration_notIdentifiable });
        }
        for (TableColumn c : parameters.getColumns()) {
            c.pack();
        }
        double[] x = Calibration.observations(t).stream().mapToDouble(o -> o.poreVolumes()).toArray();
        double[] res = r.residuals().stream().mapToDouble(Double::doubleValue).toArray();
        residuals.setChart(new LineChart(Messages.Calibration_residualTitle, new Axis(Messages.Calibration_poreVolumes, "PV"),
                Axis.dimensionless(Messages.Calibration_residual), List.of(new XySeries(Messages.Calibration_residual, x, res)),
                false, List.of(), List.of(new Marker(0, "0"))), "");
        String warnings = r.warnings().isEmpty() ? "" : " " + String.join(" ", r.warnings());
        status.setText(Messages.bind(Messages.Calibration_done, Numbers.format(r.rootMeanSquareResidual(), 3),
                r.degreesOfFreedom()) + warnings);
        showMeasured();
        layout(true, true);
    }

    /** Takes the last fit into the project as one undoable edit. */
    public boolean acceptFit() {
        if (result == null || fitted == null || document == null) {
            return false;
        }
        try {
            Calibration.Acceptance a = Calibration.accept(document.domain(), fitted, result);
            boolean done = a != null && document.execute(a.command());
            status.setText(!done ? Messages.Calibration_noContaminant
                    : a.dispersivityNote() == null ? Messages.Calibration_accepted
                    : Messages.Calibration_accepted + " " + a.dispersivityNote());
            return done;
        } catch (RuntimeException e) {
            status.setText(e.getMessage());
            return false;
        }
    }

    /** The last fit, or null (tests). */
    public ColumnFitResult result() {
        return result;
    }

    /** The fitting job, or null (tests). */
    public Job job() {
        return job;
    }

    /** The model drop-down (tests). */
    public Combo modelCombo() {
        return model;
    }

    /** The chart of the curve (tests). */
    public ChartCanvas curveCanvas() {
        return curve;
    }

    /** The status text (tests). */
    public String statusText() {
        return status.getText();
    }
}
