package eluvia.ui.internal.views;

import java.util.List;
import java.util.Objects;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Scale;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DepthProfileSet;
import eluvia.design.DepthProfiles;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.report.chart.ChartSpec;
import eluvia.report.content.ResultFigures;
import eluvia.site.model.Project;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.charts.ChartCanvas;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.UnitDisplay;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * The Depth profiles view: soil concentration against depth for one flushing design and
 * contaminant at the start, at the share of the design's pore volumes chosen on a slider (0 to
 * 100 %, whole percent) and at the design's pore volumes. The design bundle computes the profiles
 * ({@link DepthProfiles#of}, the layered numerical solution) in a background job that a newer
 * choice cancels; the chart is the design package's own ({@link ResultFigures#depthProfiles}).
 * Depths below ground in the user's length unit, concentrations mg/kg of dry soil. The view
 * computes nothing itself.
 */
public final class DepthProfilesView extends DocumentView {

    /** The slider's starting position, percent of the design's pore volumes. */
    static final int INITIAL_PERCENT = 50;

    private final StatusLine status;
    private final Combo design;
    private final Combo contaminant;
    private final Scale share;
    private final Label shareText;
    private final ChartCanvas canvas;
    private final Label notes;
    private DesignRun run;
    private Project project;
    private Job job;
    private long generation;
    private DepthProfileSet shown;
    private String shownFailure;

    public DepthProfilesView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        setLayout(new GridLayout(1, false));
        status = new StatusLine(this);
        Composite bar = new Composite(this, SWT.NONE);
        GridLayout bl = new GridLayout(7, false);
        bl.marginWidth = 0;
        bl.marginHeight = 0;
        bar.setLayout(bl);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        new Label(bar, SWT.NONE).setText(Messages.Chart_design);
        design = new Combo(bar, SWT.READ_ONLY | SWT.DROP_DOWN);
        new Label(bar, SWT.NONE).setText(Messages.Chart_contaminant);
        contaminant = new Combo(bar, SWT.READ_ONLY | SWT.DROP_DOWN);
        new Label(bar, SWT.NONE).setText(Messages.DepthProfiles_share);
        share = new Scale(bar, SWT.HORIZONTAL);
        share.setMinimum(0);
        share.setMaximum(100);
        share.setIncrement(1);
        share.setPageIncrement(10);
        share.setSelection(INITIAL_PERCENT);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        sd.widthHint = 200;
        share.setLayoutData(sd);
        shareText = new Label(bar, SWT.NONE);
        GridData ld = new GridData(SWT.BEGINNING, SWT.CENTER, false, false);
        ld.widthHint = 60;
        shareText.setLayoutData(ld);
        canvas = new ChartCanvas(this);
        GridData cd = new GridData(SWT.FILL, SWT.FILL, true, true);
        cd.heightHint = 260;
        cd.widthHint = 360;
        canvas.setLayoutData(cd);
        notes = new Label(this, SWT.WRAP);
        GridData nd = new GridData(SWT.FILL, SWT.TOP, true, false);
        nd.widthHint = 360;
        notes.setLayoutData(nd);
        design.addListener(SWT.Selection, e -> {
            fillContaminants();
            recompute();
        });
        contaminant.addListener(SWT.Selection, e -> recompute());
        share.addListener(SWT.Selection, e -> recompute());
        addDisposeListener(e -> cancelJob());
        // profiles still computing are drawn in the units of the moment when they arrive
        followUnitSystem(() -> {
            if (!busy()) {
                drawShown();
            }
        });
        start();
    }

    @Override
    protected void showResults(ProjectDocument document, ResultState state) {
        boolean show = status.show(state, document != null);
        DesignRun newRun = show ? state.run() : null;
        if (newRun == run && newRun != null) {
            return;
        }
        run = newRun;
        // the profiles are computed from the project as it was for this run (a copy, safe off the UI thread)
        project = run == null ? null : document.snapshot();
        fill(design, run == null ? List.of() : run.flushing().stream().map(FlushingDesignResult::designName).toList());
        fillContaminants();
        recompute();
    }

    private void fillContaminants() {
        FlushingDesignResult d = selectedDesign();
        boolean kept = fill(contaminant,
                d == null ? List.of() : d.contaminants().stream().map(ContaminantFlushing::contaminantName).toList());
        // the controlling contaminant first, unless one of this design was chosen already
        if (!kept && d != null && d.controllingContaminant() != null && contaminant.indexOf(d.controllingContaminant()) >= 0) {
            contaminant.select(contaminant.indexOf(d.controllingContaminant()));
        }
    }

    /** Sets a drop-down's items; returns whether the previous choice was kept. */
    private static boolean fill(Combo c, List<String> items) {
        String keep = c.getSelectionIndex() >= 0 ? c.getItem(c.getSelectionIndex()) : null;
        c.setItems(items.toArray(String[]::new));
        int i = keep == null ? -1 : items.indexOf(keep);
        if (i >= 0) {
            c.select(i);
        } else if (!items.isEmpty()) {
            c.select(0);
        }
        c.getParent().layout(true);
        return i >= 0;
    }

    private FlushingDesignResult selectedDesign() {
        if (run == null || design.getSelectionIndex() < 0) {
            return null;
        }
        String name = design.getItem(design.getSelectionIndex());
        return run.flushing().stream().filter(r -> r.designName().equals(name)).findFirst().orElse(null);
    }

    /** The shares drawn: the start, the slider's share and the design's pore volumes (dimensionless). */
    static List<Double> shares(int percent) {
        if (percent < 0 || percent > 100) {
            throw new IllegalArgumentException("share of the design's pore volumes (%): " + percent + "; allowed: 0 to 100");
        }
        double s = percent / 100.0;
        return s == 0 || s == 1 ? List.of(0.0, 1.0) : List.of(0.0, s, 1.0);
    }

    /** Starts computing the profiles for the current choices; a job still running for older choices is cancelled. */
    private void recompute() {
        cancelJob();
        long mine = ++generation;
        int percent = share.getSelection();
        shareText.setText(percent + " %");
        FlushingDesignResult d = selectedDesign();
        String name = contaminant.getSelectionIndex() < 0 ? null : contaminant.getItem(contaminant.getSelectionIndex());
        if (run == null) {
            show(mine, null, "");
            return;
        }
        if (d == null || name == null) {
            show(mine, null, run.flushing().isEmpty() ? Messages.PoreVolumes_noDesigns : Messages.PoreVolumes_noContaminant);
            return;
        }
        canvas.setChart(canvas.chart(), Messages.DepthProfiles_computing);
        notes.setText(Messages.DepthProfiles_computing);
        Project p = project;
        List<Double> shares = shares(percent);
        org.eclipse.swt.widgets.Display display = getDisplay();
        Job j = new Job(Messages.DepthProfiles_jobName) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                DepthProfileSet set;
                String failure = null;
                try {
                    set = DepthProfiles.of(p, d, name, shares);
                } catch (RuntimeException e) {
                    set = null;
                    failure = Objects.toString(e.getMessage(), e.getClass().getSimpleName());
                }
                if (monitor.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                DepthProfileSet done = set;
                String why = failure;
                if (!display.isDisposed()) {
                    display.asyncExec(() -> show(mine, done, why));
                }
                return Status.OK_STATUS;
            }
        };
        j.setSystem(true);
        job = j;
        j.schedule();
    }

    private void cancelJob() {
        if (job != null) {
            job.cancel();
            job = null;
        }
    }

    /** Shows a computed set (or a reason) unless newer choices were made meanwhile. */
    private void show(long forGeneration, DepthProfileSet set, String failure) {
        if (isDisposed() || forGeneration != generation) {
            return;
        }
        shown = set;
        shownFailure = failure;
        drawShown();
    }

    /** Draws the profiles shown (or the reason there are none) in the user's units. */
    private void drawShown() {
        DepthProfileSet set = shown;
        ChartSpec spec = null;
        String reason = shownFailure == null ? "" : shownFailure;
        if (set != null) {
            try {
                spec = ResultFigures.depthProfiles(set, new UnitDisplay(UiPreferences.unitSystem()).figureUnits());
            } catch (RuntimeException e) {
                reason = Objects.toString(e.getMessage(), e.getClass().getSimpleName());
            }
            if (spec == null && reason.isEmpty()) {
                reason = set.unavailableReason();
            }
        }
        canvas.setChart(spec, reason);
        notes.setText(set == null || !set.available() ? reason : set.basis());
        layout(true, true);
    }

    /** The chart canvas (tests). */
    public ChartCanvas canvas() {
        return canvas;
    }

    /** The slider, percent of the design's pore volumes (tests). */
    public Scale shareScale() {
        return share;
    }

    /** The design drop-down (tests). */
    public Combo designCombo() {
        return design;
    }

    /** The contaminant drop-down (tests). */
    public Combo contaminantCombo() {
        return contaminant;
    }

    /** The profiles shown, or null (tests). */
    public DepthProfileSet shownProfiles() {
        return shown;
    }

    /** Whether profiles are being computed for the current choices (tests). */
    public boolean busy() {
        Job j = job;
        return j != null && j.getState() != Job.NONE;
    }

    /** The notes line's text (tests). */
    public String notesText() {
        return notes.getText();
    }
}
