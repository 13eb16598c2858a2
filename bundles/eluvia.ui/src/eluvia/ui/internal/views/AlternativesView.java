package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

import eluvia.cost.CostEstimate;
import eluvia.cost.LineItem;
import eluvia.design.AlternativeResult;
import eluvia.design.DesignRun;
import eluvia.report.chart.BarChart;
import eluvia.report.content.ResultFigures;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.charts.ChartCanvas;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;

/**
 * The Alternatives view's content: every remedial alternative side by side (kind, capital, annual
 * O&amp;M, present value with its accuracy range, duration, whether its rates are invented), the
 * cost breakdown chart of the design package ({@link ResultFigures#costBreakdown}), and the priced
 * lines of the selected alternative, each naming its quantity and the quantity's source. Every
 * number is the pipeline's.
 */
public final class AlternativesView extends DocumentView {

    private final StatusLine status;
    private final Table alternatives;
    private final ChartCanvas chart;
    private final Table lines;
    private final Label notes;
    private DesignRun shown;
    private final List<AlternativeResult> rows = new ArrayList<>();

    public AlternativesView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        setLayout(new GridLayout(1, false));
        status = new StatusLine(this);
        SashForm sash = new SashForm(this, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        alternatives = table(sash);
        for (String h : new String[] { Messages.Alternatives_name, Messages.Alternatives_kind, Messages.Alternatives_capital,
                Messages.Alternatives_annual, Messages.Alternatives_presentValue, Messages.Alternatives_range,
                Messages.Alternatives_duration, Messages.Alternatives_rates, Messages.Alternatives_basis }) {
            new TableColumn(alternatives, SWT.LEFT).setText(h);
        }
        SashForm bottom = new SashForm(sash, SWT.HORIZONTAL);
        chart = new ChartCanvas(bottom);
        lines = table(bottom);
        for (String h : new String[] { Messages.Alternatives_line, Messages.Alternatives_category, Messages.Alternatives_amount,
                Messages.Alternatives_rate, Messages.Alternatives_cost, Messages.Alternatives_source }) {
            new TableColumn(lines, SWT.LEFT).setText(h);
        }
        bottom.setWeights(45, 55);
        sash.setWeights(35, 65);
        notes = new Label(this, SWT.WRAP);
        GridData nd = new GridData(SWT.FILL, SWT.TOP, true, false);
        nd.widthHint = 300;
        notes.setLayoutData(nd);
        alternatives.addListener(SWT.Selection, e -> showLines());
        start();
    }

    private static Table table(Composite parent) {
        Table t = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        return t;
    }

    @Override
    protected void showResults(ProjectDocument document, ResultState state) {
        boolean show = status.show(state, document != null);
        DesignRun run = show ? state.run() : null;
        if (run == shown && run != null) {
            return;
        }
        shown = run;
        alternatives.removeAll();
        rows.clear();
        if (run == null) {
            chart.setChart(null, "");
            lines.removeAll();
            notes.setText("");
            return;
        }
        Set<String> currencies = new LinkedHashSet<>();
        for (AlternativeResult a : run.alternatives()) {
            rows.add(a);
            TableItem item = new TableItem(alternatives, SWT.NONE);
            CostEstimate e = a.estimate();
            if (a.available() && e != null) {
                currencies.add(e.currency());
                item.setText(new String[] { a.name(), words(a.kind()),
                        money(e.capital().total().amount(), e.currency()), money(e.annual().total().amount(), e.currency()),
                        money(e.presentValue().amount(), e.currency()),
                        money(e.presentValueLow().amount(), e.currency()) + " \u2013 "
                                + money(e.presentValueHigh().amount(), e.currency()),
                        Double.isFinite(a.durationCalendarDays()) ? Numbers.format(a.durationCalendarDays(), 3) : "\u2013",
                        a.inventedRates() ? Messages.Alternatives_invented : a.priceBookName(), a.basis() });
            } else {
                item.setText(new String[] { a.name(), words(a.kind()),
                        Messages.bind(Messages.Alternatives_notAvailable, a.unavailableReason()), "", "", "", "", "", a.basis() });
            }
        }
        for (TableColumn c : alternatives.getColumns()) {
            c.pack();
            c.setWidth(Math.min(c.getWidth(), 320));
        }
        BarChart breakdown = currencies.isEmpty() ? null
                : ResultFigures.costBreakdown(run.alternatives(), currencies.iterator().next());
        chart.setChart(breakdown, Messages.Alternatives_noneChart);
        StringBuilder b = new StringBuilder();
        if (run.lowestPresentValue() != null) {
            b.append(Messages.bind(Messages.Alternatives_lowest, run.lowestPresentValue())).append(' ');
        }
        if (run.alternatives().stream().anyMatch(AlternativeResult::inventedRates)) {
            b.append("\u26a0 ").append(eluvia.design.Cautions.INVENTED_EXAMPLE);
        }
        notes.setText(b.toString().trim());
        if (!rows.isEmpty()) {
            alternatives.select(0);
        }
        showLines();
        layout(true, true);
    }

    private static String words(Enum<?> e) {
        return e.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
    }

    private static String money(double amount, String currency) {
        return Numbers.format(amount, 4) + " " + currency;
    }

    private void showLines() {
        lines.removeAll();
        int i = alternatives.getSelectionIndex();
        if (i < 0 || i >= rows.size() || rows.get(i).estimate() == null) {
            return;
        }
        CostEstimate e = rows.get(i).estimate();
        for (LineItem l : e.lines()) {
            TableItem item = new TableItem(lines, SWT.NONE);
            item.setText(new String[] { l.item().description(), words(l.spec().category()),
                    Numbers.format(l.quantity().amount(), 4) + " " + l.quantity().unit().symbol(),
                    Numbers.format(l.item().ratePerUnit(), 4) + " " + l.item().currency() + "/" + l.item().unit().symbol(),
                    money(l.cost().amount(), l.cost().currency()), l.quantity().name() + ": " + l.quantity().source() });
        }
        for (TableColumn c : lines.getColumns()) {
            c.pack();
            c.setWidth(Math.min(c.getWidth(), 360));
        }
    }

    /** The alternatives table (tests). */
    public Table alternativesTable() {
        return alternatives;
    }

    /** The lines table (tests). */
    public Table linesTable() {
        return lines;
    }

    /** The chart (tests). */
    public ChartCanvas chartCanvas() {
        return chart;
    }
}
