package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

import eluvia.cost.ExcavationQuantities;
import eluvia.design.DesignRun;
import eluvia.design.ExcavationResult;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * The Excavation view's content: the take-off of every excavation design side by side (pit depth,
 * bank, loose and compacted volumes, masses, loads, backfill and import), in the units shown, with
 * the protective-system cautions and the bases of the take-off. Every number is the pipeline's
 * (eluvia.cost ExcavationSizing through the design pipeline).
 */
public final class ExcavationView extends DocumentView {

    /** Kilograms per tonne: the take-off gives masses in t, the unit system shows them per {@link Dimension#MASS}. */
    static final double KILOGRAMS_PER_TONNE = 1000;

    private final StatusLine status;
    private final Table table;
    private final Text notes;
    private DesignRun shown;

    /** One row: its label, its dimension (null for a count) and how to read it from a take-off (in storage units). */
    private record Row(String label, Dimension dimension, ToDoubleFunction<ExcavationQuantities> value) {
    }

    public ExcavationView(Composite parent, OpenDocuments documents) {
        super(parent, documents);
        setLayout(new GridLayout(1, false));
        status = new StatusLine(this);
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        notes = new Text(this, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL | SWT.BORDER);
        GridData nd = new GridData(SWT.FILL, SWT.FILL, true, false);
        nd.heightHint = notes.getLineHeight() * 6;
        nd.widthHint = 300;
        notes.setLayoutData(nd);
        start();
    }

    private static List<Row> rows() {
        double t = KILOGRAMS_PER_TONNE;
        return List.of(new Row(Messages.Excavation_pitDepth, Dimension.LENGTH, ExcavationQuantities::pitDepthMetres),
                new Row(Messages.Excavation_zoneVolume, Dimension.VOLUME, ExcavationQuantities::zoneVolumeCubicMetres),
                new Row(Messages.Excavation_pitBank, Dimension.VOLUME, ExcavationQuantities::pitBankVolumeCubicMetres),
                new Row(Messages.Excavation_contaminatedBank, Dimension.VOLUME,
                        ExcavationQuantities::contaminatedBankVolumeCubicMetres),
                new Row(Messages.Excavation_contaminatedLoose, Dimension.VOLUME,
                        ExcavationQuantities::contaminatedLooseVolumeCubicMetres),
                new Row(Messages.Excavation_contaminatedMass, Dimension.MASS, q -> q.contaminatedMassTonnes() * t),
                new Row(Messages.Excavation_contaminatedLoads, null, ExcavationQuantities::contaminatedLoads),
                new Row(Messages.Excavation_overburdenBank, Dimension.VOLUME, ExcavationQuantities::overburdenBankVolumeCubicMetres),
                new Row(Messages.Excavation_overburdenLoose, Dimension.VOLUME,
                        ExcavationQuantities::overburdenLooseVolumeCubicMetres),
                new Row(Messages.Excavation_overburdenLoads, null, ExcavationQuantities::overburdenOffSiteLoads),
                new Row(Messages.Excavation_backfill, Dimension.VOLUME, ExcavationQuantities::backfillCompactedVolumeCubicMetres),
                new Row(Messages.Excavation_reused, Dimension.VOLUME,
                        ExcavationQuantities::reusedOverburdenCompactedVolumeCubicMetres),
                new Row(Messages.Excavation_import, Dimension.VOLUME, ExcavationQuantities::importCompactedVolumeCubicMetres),
                new Row(Messages.Excavation_importMass, Dimension.MASS, q -> q.importMassTonnes() * t),
                new Row(Messages.Excavation_importLoads, null, ExcavationQuantities::importLoads));
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
            notes.setText("");
            return;
        }
        if (run.excavations().isEmpty()) {
            notes.setText(Messages.Excavation_none);
            layout(true, true);
            return;
        }
        UnitDisplay u = new UnitDisplay(UiPreferences.unitSystem());
        new TableColumn(table, SWT.LEFT).setText(Messages.Excavation_quantity);
        for (ExcavationResult e : run.excavations()) {
            new TableColumn(table, SWT.RIGHT).setText(e.designName());
        }
        for (Row row : rows()) {
            TableItem item = new TableItem(table, SWT.NONE);
            List<String> cells = new ArrayList<>();
            cells.add(row.label() + " (" + (row.dimension() == null ? Messages.Excavation_loadsUnit : u.symbol(row.dimension()))
                    + ")");
            for (ExcavationResult e : run.excavations()) {
                double v = row.value().applyAsDouble(e.quantities());
                cells.add(row.dimension() == null ? Numbers.format(v, 4)
                        : Numbers.format(u.toDisplay(v, row.dimension()), Numbers.RESULT_DIGITS + 1));
            }
            item.setText(cells.toArray(String[]::new));
        }
        for (TableColumn c : table.getColumns()) {
            c.pack();
        }
        StringBuilder b = new StringBuilder();
        for (ExcavationResult e : run.excavations()) {
            b.append(e.designName()).append(": ");
            e.quantities().cautions().forEach(c -> b.append("\u26a0 ").append(c.text()).append(" "));
            b.append(e.footprintBasis()).append(' ').append(e.slopeBasis()).append(' ').append(e.soilBasis());
            e.notes().forEach(n -> b.append(' ').append(n));
            b.append('\n');
        }
        notes.setText(b.toString().trim());
        layout(true, true);
    }

    /** The table (tests). */
    public Table table() {
        return table;
    }

    /** The notes (tests). */
    public String notesText() {
        return notes.getText();
    }
}
