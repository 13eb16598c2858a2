package eluvia.ui.editor;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.TabFolder;
import org.eclipse.swt.widgets.TabItem;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

import eluvia.design.Cautions;
import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignInputException;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;
import eluvia.site.validation.Problem;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.ui.Fields;

/**
 * The project editor's content: the inputs on the left (site and layers, contaminants, zones,
 * flushing designs), the results on the right, recomputed through the design pipeline after
 * every good edit. The composite computes nothing itself.
 */
public final class ProjectEditorComposite extends Composite {

    private final Project project;
    private final Runnable onEdit;
    private final Map<Text, String> fieldMessages = new LinkedHashMap<>();
    private Label messageLabel;
    private Table resultsTable;
    private Label headline;
    private Text notes;
    private DesignRun lastRun;

    /**
     * @param onEdit called after every change of the model (the part marks itself dirty)
     */
    public ProjectEditorComposite(Composite parent, Project project, Runnable onEdit) {
        super(parent, SWT.NONE);
        this.project = project;
        this.onEdit = onEdit;
        setLayout(new GridLayout(1, false));
        cautionBanner();
        SashForm sash = new SashForm(this, SWT.HORIZONTAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        inputs(sash);
        results(sash);
        sash.setWeights(45, 55);
        recompute();
    }

    /** The last successful run, or null when the inputs have errors. */
    public DesignRun lastRun() {
        return lastRun;
    }

    /** The results table: one row per design, contaminant and criterion. */
    Table resultsTable() {
        return resultsTable;
    }

    /** The line above the table with the controlling figures. */
    Label headline() {
        return headline;
    }

    /** The message line under the inputs (bad values, validation errors). */
    Label messageLabel() {
        return messageLabel;
    }

    private void cautionBanner() {
        Composite banner = new Composite(this, SWT.BORDER);
        banner.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        banner.setLayout(new GridLayout(1, false));
        Color amber = new Color(255, 246, 229);
        banner.setBackground(amber);
        for (String c : Cautions.forFlushing()) {
            Label l = new Label(banner, SWT.WRAP);
            l.setText("\u26a0 " + c);
            l.setBackground(amber);
            GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false);
            gd.widthHint = 600;
            l.setLayoutData(gd);
        }
    }

    private void inputs(Composite parent) {
        Composite left = new Composite(parent, SWT.NONE);
        left.setLayout(new GridLayout(1, false));
        TabFolder tabs = new TabFolder(left, SWT.TOP);
        tabs.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        flushingTab(tabs);
        zonesTab(tabs);
        layersTab(tabs);
        contaminantsTab(tabs);
        messageLabel = new Label(left, SWT.WRAP);
        GridData gd = new GridData(SWT.FILL, SWT.TOP, true, false);
        gd.widthHint = 400;
        gd.heightHint = 48;
        messageLabel.setLayoutData(gd);
        messageLabel.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
    }

    private Composite tab(TabFolder tabs, String title) {
        TabItem item = new TabItem(tabs, SWT.NONE);
        item.setText(title);
        Composite c = new Composite(tabs, SWT.NONE);
        c.setLayout(new GridLayout(2, false));
        item.setControl(c);
        return c;
    }

    private void flushingTab(TabFolder tabs) {
        Composite c = tab(tabs, "Flushing designs");
        for (FlushingDesign d : project.getFlushingDesigns()) {
            Group g = group(c, "Design: " + d.getName());
            Fields.number(g, "Darcy flux (m/d)", d.getDarcyFluxMetresPerDay(), v -> v > 0, "greater than 0",
                    v -> edit(() -> d.setDarcyFluxMetresPerDay(v)), this::fieldMessage);
            Fields.number(g, "Operating days per week (d)", d.getOperatingDaysPerWeek(), v -> v > 0 && v <= 7,
                    "greater than 0 and at most 7", v -> edit(() -> d.setOperatingDaysPerWeek(v)), this::fieldMessage);
            Fields.number(g, "Capture efficiency (fraction)", d.getCaptureEfficiency(), v -> v > 0 && v <= 1,
                    "greater than 0 and at most 1", v -> edit(() -> d.setCaptureEfficiency(v)), this::fieldMessage);
            Fields.number(g, "Pore-volume limit (PV)", d.getMaxPoreVolumes(), v -> v > 0, "greater than 0",
                    v -> edit(() -> d.setMaxPoreVolumes(v)), this::fieldMessage);
            new Label(g, SWT.NONE).setText("Criterion");
            Combo combo = new Combo(g, SWT.READ_ONLY);
            for (CleanupCriterion k : CleanupCriterion.values()) {
                combo.add(k.description());
            }
            combo.select(CleanupCriterion.valueOf(d.getCriterion().getName()).ordinal());
            combo.addListener(SWT.Selection, e -> edit(() -> d.setCriterion(
                    ComplianceCriterion.getByName(CleanupCriterion.values()[combo.getSelectionIndex()].name()))));
        }
    }

    private void zonesTab(TabFolder tabs) {
        Composite c = tab(tabs, "Zones");
        for (TreatmentZone z : project.getSite().getZones()) {
            Group g = group(c, "Zone: " + z.getName());
            Fields.number(g, "Area (m\u00b2)", z.getAreaSquareMetres(), v -> v > 0, "greater than 0",
                    v -> edit(() -> z.setAreaSquareMetres(v)), this::fieldMessage);
            Fields.number(g, "Top depth (m)", z.getTopDepthMetres(), v -> v >= 0, "0 or greater",
                    v -> edit(() -> z.setTopDepthMetres(v)), this::fieldMessage);
            Fields.number(g, "Bottom depth (m)", z.getBottomDepthMetres(), v -> v > 0, "greater than 0 and below the top",
                    v -> edit(() -> z.setBottomDepthMetres(v)), this::fieldMessage);
            z.getSourceConcentrations().forEach(s -> Fields.number(g,
                    "Initial " + (s.getContaminant() == null ? "?" : s.getContaminant().getName()) + " (mg/kg)",
                    s.getSoilConcentrationMilligramsPerKg(), v -> v > 0, "greater than 0",
                    v -> edit(() -> s.setSoilConcentrationMilligramsPerKg(v)), this::fieldMessage));
        }
    }

    private void layersTab(TabFolder tabs) {
        Composite c = tab(tabs, "Soil layers");
        Table t = table(c, "Layer", "Top (m)", "Bottom (m)", "Texture", "\u03c1b (kg/m\u00b3)", "Porosity", "\u03b8",
                "foc", "Ks (m/d)", "\u03b1L (m)");
        for (SoilLayer l : project.getSite().getLayers()) {
            row(t, l.getName(), f(l.getTopDepthMetres()), f(l.getBottomDepthMetres()), l.getTextureClass(),
                    f(l.getBulkDensityKgPerCubicMetre()), f(l.getPorosity()), f(l.getWaterContent()),
                    f(l.getOrganicCarbonFraction()), f(l.getSaturatedConductivityMetresPerDay()),
                    f(l.getDispersivityMetres()));
        }
        pack(t);
    }

    private void contaminantsTab(TabFolder tabs) {
        Composite c = tab(tabs, "Contaminants");
        Table t = table(c, "Contaminant", "CAS", "Koc (L/kg)", "Kd (L/kg)", "D0 (m\u00b2/s)", "Half-life (d)");
        for (Contaminant x : project.getContaminants()) {
            row(t, x.getName(), x.getCasNumber(), f(x.getKocLitresPerKg()), x.isKdEntered() ? f(x.getKdLitresPerKg()) : "from Koc",
                    f(x.getDiffusionSquareMetresPerSecond()), x.getHalfLifeDays() > 0 ? f(x.getHalfLifeDays()) : "no decay");
        }
        pack(t);
    }

    private void results(Composite parent) {
        Composite right = new Composite(parent, SWT.NONE);
        right.setLayout(new GridLayout(1, false));
        Label title = new Label(right, SWT.NONE);
        title.setText("Results (recomputed after every edit)");
        title.setFont(org.eclipse.jface.resource.JFaceResources.getBannerFont());
        headline = new Label(right, SWT.WRAP);
        GridData hd = new GridData(SWT.FILL, SWT.TOP, true, false);
        hd.widthHint = 500;
        headline.setLayoutData(hd);
        resultsTable = table(right, "Design", "Contaminant", "Criterion", "Pore volumes (PV)", "Duration (calendar d)",
                "Water applied (m\u00b3)");
        ((GridData) resultsTable.getLayoutData()).horizontalSpan = 1;
        notes = new Text(right, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL | SWT.BORDER);
        GridData nd = new GridData(SWT.FILL, SWT.FILL, true, false);
        nd.heightHint = 110;
        nd.widthHint = 500;
        notes.setLayoutData(nd);
    }

    private void edit(Runnable change) {
        change.run();
        onEdit.run();
        recompute();
    }

    /** Runs the design pipeline on the current model and shows the results or the problems. */
    public void recompute() {
        resultsTable.removeAll();
        try {
            lastRun = DesignPipeline.run(project);
        } catch (DesignInputException e) {
            lastRun = null;
            StringBuilder b = new StringBuilder();
            for (Problem p : e.problems()) {
                b.append(p.message()).append('\n');
            }
            headline.setText("The inputs have errors; no results until they are fixed (see below).");
            notes.setText(b.toString());
            showMessages();
            return;
        } catch (RuntimeException e) {
            lastRun = null;
            headline.setText("No results: " + e.getMessage());
            notes.setText("");
            return;
        }
        StringBuilder head = new StringBuilder();
        StringBuilder n = new StringBuilder();
        for (FlushingDesignResult r : lastRun.flushing()) {
            if (r.allReachable()) {
                head.append(String.format(Locale.ROOT, "%s: %s PV by %s (%s controls), %s calendar days, %s m\u00b3 of water to capture%n",
                        r.designName(), Fields.format(round(r.poreVolumes())), r.criterion().description(),
                        r.controllingContaminant(), Fields.format(round(r.calendarDays())),
                        Fields.format(round(r.waterCapturedCubicMetres()))));
            } else {
                head.append(r.designName()).append(": cleanup level not reached within the pore-volume limit\n");
            }
            for (ContaminantFlushing c : r.contaminants()) {
                for (CleanupCriterion k : CleanupCriterion.values()) {
                    FlushingEstimate e = c.estimate(k);
                    boolean ok = e.result().reachable();
                    double days = e.durationDays() * 7.0 / r.operatingDaysPerWeek();
                    row(resultsTable, r.designName(), c.contaminantName(), k.description(),
                            ok ? Fields.format(round(e.result().poreVolumes())) : "not reached",
                            ok ? Fields.format(round(days)) : "\u2013",
                            ok ? Fields.format(round(e.waterVolumeCubicMetres().orElse(Double.NaN))) : "\u2013");
                }
            }
            r.notes().forEach(x -> n.append(x).append('\n'));
        }
        headline.setText(head.toString().trim());
        notes.setText(n.toString());
        pack(resultsTable);
        showMessages();
        layout(true, true);
    }

    private void fieldMessage(Text field, String message) {
        if (message == null) {
            fieldMessages.remove(field);
        } else {
            fieldMessages.put(field, message);
        }
        showMessages();
    }

    private void showMessages() {
        StringBuilder b = new StringBuilder();
        fieldMessages.values().forEach(m -> b.append(m).append('\n'));
        messageLabel.setText(b.toString().trim());
    }

    private static double round(double v) {
        if (!Double.isFinite(v) || v == 0) {
            return v;
        }
        double scale = Math.pow(10, 3 - Math.ceil(Math.log10(Math.abs(v))));
        return Math.round(v * scale) / scale;
    }

    private static String f(double v) {
        return Fields.format(v);
    }

    private static Group group(Composite parent, String title) {
        Group g = new Group(parent, SWT.NONE);
        g.setText(title);
        g.setLayout(new GridLayout(2, false));
        g.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        return g;
    }

    private static Table table(Composite parent, String... columns) {
        Table t = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        GridData gd = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1);
        gd.heightHint = 200;
        t.setLayoutData(gd);
        for (String c : columns) {
            new TableColumn(t, SWT.LEFT).setText(c);
        }
        return t;
    }

    private static void row(Table t, String... cells) {
        TableItem item = new TableItem(t, SWT.NONE);
        item.setText(cells);
    }

    private static void pack(Table t) {
        for (TableColumn c : t.getColumns()) {
            c.pack();
        }
    }
}
