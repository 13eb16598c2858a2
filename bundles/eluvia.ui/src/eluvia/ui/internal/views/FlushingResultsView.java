package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.site.units.Dimension;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * The Flushing view's content: for every flushing design the controlling figures (pore
 * volumes by the design's criterion, calendar days, water to capture and treat), a table of every
 * contaminant under each of the three criteria with the well-mixed and plug-flow bounds, and the
 * pipeline's notes. Every number is read from the design pipeline's run.
 */
public final class FlushingResultsView extends DocumentView {

    private final StatusLine status;
    private final Label headline;
    private final Table table;
    private final Text notes;
    private DesignRun shown;

    public FlushingResultsView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        setLayout(new GridLayout(1, false));
        status = new StatusLine(this);
        headline = new Label(this, SWT.WRAP);
        headline.setFont(JFaceResources.getBannerFont());
        GridData hd = new GridData(SWT.FILL, SWT.TOP, true, false);
        hd.widthHint = 400;
        headline.setLayoutData(hd);
        SashForm sash = new SashForm(this, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        notes = new Text(sash, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL | SWT.BORDER);
        sash.setWeights(70, 30);
        start();
    }

    @Override
    protected void showResults(ProjectDocument document, ResultState state) {
        boolean show = status.show(state, document != null);
        DesignRun run = show ? state.run() : null;
        if (run == shown && run != null) {
            return;
        }
        shown = run;
        table.removeAll();
        for (TableColumn c : table.getColumns()) {
            c.dispose();
        }
        if (run == null) {
            headline.setText(state.status() == ResultState.Status.INPUT_ERRORS ? Messages.Results_seeProblems : "");
            notes.setText(state.errors().stream().map(p -> p.message()).reduce((a, b) -> a + "\n" + b).orElse(""));
            layout(true, true);
            return;
        }
        UnitDisplay u = new UnitDisplay(UiPreferences.unitSystem());
        String volume = u.symbol(Dimension.VOLUME);
        for (String h : new String[] { Messages.Results_design, Messages.Results_contaminant, Messages.Results_criterion,
                Messages.Results_poreVolumes, Messages.Results_calendarDays,
                Messages.bind(Messages.Results_water, volume), Messages.Results_wellMixed, Messages.Results_plugFlow,
                Messages.Results_model }) {
            new TableColumn(table, SWT.LEFT).setText(h);
        }
        List<String> head = new ArrayList<>();
        StringBuilder n = new StringBuilder();
        for (FlushingDesignResult r : run.flushing()) {
            head.add(headline(r, u));
            for (ContaminantFlushing c : r.contaminants()) {
                for (CleanupCriterion k : CleanupCriterion.values()) {
                    FlushingEstimate e = c.estimate(k);
                    if (e == null) {
                        continue;
                    }
                    boolean ok = e.result().reachable();
                    double calendarDays = e.durationDays() * 7.0 / r.operatingDaysPerWeek();
                    TableItem item = new TableItem(table, SWT.NONE);
                    item.setText(new String[] { r.designName(), c.contaminantName(), k.description(),
                            ok ? Numbers.format(e.result().poreVolumes(), Numbers.RESULT_DIGITS) : Messages.Results_notReached,
                            ok ? Numbers.format(calendarDays, Numbers.RESULT_DIGITS) : "\u2013",
                            ok ? Numbers.format(u.toDisplay(e.waterVolumeCubicMetres().orElse(Double.NaN), Dimension.VOLUME),
                                    Numbers.RESULT_DIGITS) : "\u2013",
                            Numbers.format(e.wellMixedPoreVolumes(), Numbers.RESULT_DIGITS),
                            Numbers.format(e.plugFlowPoreVolumes(), Numbers.RESULT_DIGITS), e.modelName() });
                }
            }
            for (String note : r.notes()) {
                n.append(r.designName()).append(": ").append(note).append('\n');
            }
        }
        headline.setText(String.join("\n", head));
        notes.setText(n.toString().trim());
        for (TableColumn c : table.getColumns()) {
            c.pack();
        }
        layout(true, true);
    }

    /** The controlling figures of a design in one sentence, in the units shown. */
    static String headline(FlushingDesignResult r, UnitDisplay u) {
        if (!r.allReachable() || r.controllingContaminant() == null) {
            return Messages.bind(Messages.Results_headlineNotReached, r.designName());
        }
        return Messages.bind(Messages.Results_headline, new Object[] { r.designName(),
                Numbers.format(r.poreVolumes(), Numbers.RESULT_DIGITS), r.criterion().description(), r.controllingContaminant(),
                Numbers.format(r.calendarDays(), Numbers.RESULT_DIGITS),
                u.format(r.waterCapturedCubicMetres(), Dimension.VOLUME, Numbers.RESULT_DIGITS) });
    }

    /** The run shown, or null (tests). */
    public DesignRun shownRun() {
        return shown;
    }

    /** The results table (tests). */
    public Table table() {
        return table;
    }

    /** The controlling figures line (tests). */
    public String headlineText() {
        return headline.getText();
    }

    /** The status line's text (tests). */
    public String statusText() {
        return status.text();
    }
}
