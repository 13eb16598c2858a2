package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import eluvia.design.DesignRun;
import eluvia.report.chart.ChartSpec;
import eluvia.ui.internal.charts.ChartCanvas;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.UnitDisplay;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * A result view with one chart of the report bundle, chosen by up to two drop-downs (e.g. the
 * design and the contaminant), and a line of notes under it. Subclasses turn the pipeline's run
 * into the choices and the chart; they compute nothing.
 */
abstract class ChartView extends DocumentView {

    private final StatusLine status;
    private final Combo first;
    private final Combo second;
    private final ChartCanvas canvas;
    private final Label notes;
    private DesignRun run;

    ChartView(Composite parent, OpenDocuments documents, String firstLabel, String secondLabel) {
        super(parent, documents);
        setLayout(new GridLayout(1, false));
        status = new StatusLine(this);
        Composite bar = new Composite(this, SWT.NONE);
        GridLayout bl = new GridLayout(4, false);
        bl.marginWidth = 0;
        bl.marginHeight = 0;
        bar.setLayout(bl);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        first = combo(bar, firstLabel);
        second = combo(bar, secondLabel);
        canvas = new ChartCanvas(this);
        GridData cd = new GridData(SWT.FILL, SWT.FILL, true, true);
        cd.heightHint = 220;
        cd.widthHint = 360;
        canvas.setLayoutData(cd);
        notes = new Label(this, SWT.WRAP);
        GridData nd = new GridData(SWT.FILL, SWT.TOP, true, false);
        nd.widthHint = 360;
        notes.setLayoutData(nd);
        if (first != null) {
            first.addListener(SWT.Selection, e -> {
                fillSecond();
                redrawChart();
            });
        }
        if (second != null) {
            second.addListener(SWT.Selection, e -> redrawChart());
        }
        followUnitSystem(this::redrawChart);
    }

    private static Combo combo(Composite bar, String label) {
        if (label == null) {
            return null;
        }
        new Label(bar, SWT.NONE).setText(label);
        Combo c = new Combo(bar, SWT.READ_ONLY | SWT.DROP_DOWN);
        c.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false));
        return c;
    }

    /** The choices of the first drop-down for a run. */
    abstract List<String> firstChoices(DesignRun run);

    /** The choices of the second drop-down for a run and the first choice (empty when there is none). */
    List<String> secondChoices(DesignRun run, String firstChoice) {
        return List.of();
    }

    /**
     * The chart for the choices in the user's units ({@code units}: lengths, areas and volumes; pass
     * {@link UnitDisplay#figureUnits()} to the report bundle's figures), or null when there is
     * nothing to draw; put the reason in {@link #noChartReason}.
     */
    abstract ChartSpec chart(DesignRun run, String firstChoice, String secondChoice, UnitDisplay units);

    /** Why there is no chart for the choices (shown in the chart's place). */
    abstract String noChartReason(DesignRun run, String firstChoice, String secondChoice);

    /** Notes under the chart: bases, sources, what is not available. */
    String notes(DesignRun run, String firstChoice, String secondChoice) {
        return "";
    }

    @Override
    protected void showResults(ProjectDocument document, ResultState state) {
        boolean show = status.show(state, document != null);
        DesignRun newRun = show ? state.run() : null;
        if (newRun == run && newRun != null) {
            return;
        }
        run = newRun;
        fill(first, run == null ? List.of() : firstChoices(run));
        fillSecond();
        redrawChart();
    }

    private void fillSecond() {
        if (second != null) {
            fill(second, run == null ? List.of() : secondChoices(run, selected(first)));
        }
    }

    private static void fill(Combo c, List<String> items) {
        if (c == null) {
            return;
        }
        String keep = c.getSelectionIndex() >= 0 ? c.getItem(c.getSelectionIndex()) : null;
        c.setItems(items.toArray(String[]::new));
        int i = keep == null ? -1 : items.indexOf(keep);
        if (i >= 0) {
            c.select(i);
        } else if (!items.isEmpty()) {
            c.select(0);
        }
        c.getParent().layout(true);
    }

    private static String selected(Combo c) {
        return c == null || c.getSelectionIndex() < 0 ? null : c.getItem(c.getSelectionIndex());
    }

    /** Draws the chart for the current choices again. */
    final void redrawChart() {
        if (run == null) {
            canvas.setChart(null, "");
            notes.setText("");
            return;
        }
        String a = selected(first);
        String b = selected(second);
        ChartSpec spec = null;
        String reason;
        try {
            spec = chart(run, a, b, new UnitDisplay(UiPreferences.unitSystem()));
            reason = spec == null ? noChartReason(run, a, b) : "";
        } catch (RuntimeException e) {
            reason = Objects.toString(e.getMessage(), e.getClass().getSimpleName());
        }
        canvas.setChart(spec, reason);
        notes.setText(notes(run, a, b));
        layout(true, true);
    }

    /** The chart canvas (tests). */
    public ChartCanvas canvas() {
        return canvas;
    }

    /** The first drop-down (tests), or null. */
    public Combo firstCombo() {
        return first;
    }

    /** The second drop-down (tests), or null. */
    public Combo secondCombo() {
        return second;
    }

    /** The notes line's text (tests). */
    public String notesText() {
        return notes.getText();
    }

    /** The project of the active document, or null. */
    protected eluvia.site.model.Project project() {
        return documents.active() == null ? null : documents.active().project();
    }

    /** The run shown (tests). */
    public DesignRun shownRun() {
        return run;
    }

    static List<String> names(List<String> names) {
        return new ArrayList<>(names);
    }
}
