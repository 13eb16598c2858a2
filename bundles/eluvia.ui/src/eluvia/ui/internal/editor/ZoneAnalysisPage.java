package eluvia.ui.internal.editor;

import java.util.function.Supplier;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

import eluvia.design.ContaminantZone;
import eluvia.design.DesignRun;
import eluvia.design.ZoneAnalysis;
import eluvia.site.model.NonDetectValue;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.VariogramShapeKind;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.Range;
import eluvia.zone.ExperimentalVariogram;
import eluvia.zone.LagClass;

/**
 * The project's zone-analysis settings: estimator, non-detect rule, inverse-distance power,
 * neighbours, search radius, vertical distance factor, block sizes, variogram, delays, transverse
 * dispersivity fraction and hot-spot multiple; the allowed ranges are those of the site bundle's
 * validation. Below them, the experimental variogram of the latest results (lag classes, pairs,
 * semivariance per contaminant, computed by the zone bundle in the pipeline), so that the variogram
 * can be chosen from it. The page computes nothing.
 */
final class ZoneAnalysisPage extends EditorPage {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private final Supplier<ResultState> results;
    private Composite parent;
    private ScrolledComposite area;
    private Table variogram;
    private Label variogramNote;

    ZoneAnalysisPage(Bindings bindings, Supplier<ResultState> results) {
        super(bindings);
        this.results = results;
    }

    @Override
    String title() {
        return Messages.Page_zoneAnalysis;
    }

    @Override
    void create(Composite body) {
        parent = body;
        body.setLayout(new GridLayout(1, false));
        ProjectDocument.Listener rebuild = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, Notification n) {
                if (n.getNotifier() == project && n.getFeature() == P.getProject_ZoneAnalysis() && !parent.isDisposed()) {
                    parent.getDisplay().asyncExec(ZoneAnalysisPage.this::build);
                }
            }
        };
        bindings.document().addListener(rebuild);
        body.addDisposeListener(e -> bindings.document().removeListener(rebuild));
        build();
    }

    private void build() {
        if (parent.isDisposed()) {
            return;
        }
        if (area != null) {
            area.dispose();
        }
        area = Forms.scrolled(parent);
        Composite form = new Composite(area, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.horizontalSpacing = 12;
        form.setLayout(layout);
        Forms.heading(form, Messages.Page_zoneAnalysis, 2);
        Forms.note(form, Messages.ZoneAnalysisPage_intro, 2);
        ZoneAnalysisSettings s = project.getZoneAnalysis();
        if (s == null) {
            Button use = new Button(form, SWT.PUSH);
            use.setText(Messages.ZoneAnalysisPage_use);
            use.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false, 2, 1));
            use.addListener(SWT.Selection, e -> bindings.execute(SetCommand.create(bindings.document().domain(), project,
                    P.getProject_ZoneAnalysis(), SiteFactory.eINSTANCE.createZoneAnalysisSettings())));
        } else {
            fields(form, s);
        }
        Forms.heading(form, Messages.ZoneAnalysisPage_variogramHeading, 2);
        variogramNote = Forms.note(form, "", 2);
        variogram = new Table(form, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        variogram.setHeaderVisible(true);
        variogram.setLinesVisible(true);
        GridData td = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        td.heightHint = variogram.getItemHeight() * 12;
        variogram.setLayoutData(td);
        String length = bindings.units().symbol(Dimension.LENGTH);
        for (String h : new String[] { Messages.ZoneAnalysisPage_contaminant,
                Messages.bind(Messages.ZoneAnalysisPage_lagClass, length), Messages.bind(Messages.ZoneAnalysisPage_meanLag, length),
                Messages.ZoneAnalysisPage_pairs, Messages.ZoneAnalysisPage_semivariance }) {
            TableColumn c = new TableColumn(variogram, SWT.RIGHT);
            c.setText(h);
        }
        showVariogram();
        Forms.fit(area, form);
        parent.layout(true, true);
    }

    private void fields(Composite form, ZoneAnalysisSettings s) {
        Bindings b = bindings;
        b.choice(form, s, P.getZoneAnalysisSettings_Estimator(), Messages.ZoneAnalysisPage_estimator, ZoneEstimatorKind.VALUES,
                Labels::of);
        b.choice(form, s, P.getZoneAnalysisSettings_NonDetectRule(), Messages.ZoneAnalysisPage_nonDetect, NonDetectValue.VALUES,
                Labels::of);
        b.number(form, s, P.getZoneAnalysisSettings_InverseDistancePower(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_power, "-", Range.of(0, false, 20, true)));
        b.number(form, s, P.getZoneAnalysisSettings_MaximumNeighbours(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_neighbours, "-", Range.of(1, true, 200, true)));
        b.number(form, s, P.getZoneAnalysisSettings_SearchRadiusMetres(),
                NumberSpec.of(Messages.ZoneAnalysisPage_searchRadius, Dimension.LENGTH, Range.nonNegative()));
        b.number(form, s, P.getZoneAnalysisSettings_VerticalDistanceFactor(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_verticalFactor, "-", Range.of(0, false, 1000, true)));
        b.number(form, s, P.getZoneAnalysisSettings_BlockPlanSizeMetres(),
                NumberSpec.of(Messages.ZoneAnalysisPage_blockPlan, Dimension.LENGTH, Range.of(0, true, 1000, true)));
        b.number(form, s, P.getZoneAnalysisSettings_BlockDepthMetres(),
                NumberSpec.of(Messages.ZoneAnalysisPage_blockDepth, Dimension.LENGTH, Range.of(0, true, 100, true)));
        Forms.note(form, Messages.ZoneAnalysisPage_automaticNote, 2);
        Forms.heading(form, Messages.ZoneAnalysisPage_variogramModelHeading, 2);
        Forms.note(form, Messages.ZoneAnalysisPage_variogramNote, 2);
        b.choice(form, s, P.getZoneAnalysisSettings_VariogramModel(), Messages.ZoneAnalysisPage_variogramShape,
                VariogramShapeKind.VALUES, Labels::of);
        b.number(form, s, P.getZoneAnalysisSettings_VariogramNuggetMgPerKgSquared(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_nugget, "(mg/kg)\u00b2", Range.nonNegative()));
        b.number(form, s, P.getZoneAnalysisSettings_VariogramSillMgPerKgSquared(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_sill, "(mg/kg)\u00b2", Range.nonNegative()));
        b.number(form, s, P.getZoneAnalysisSettings_VariogramRangeMetres(),
                NumberSpec.of(Messages.ZoneAnalysisPage_range, Dimension.LENGTH, Range.nonNegative()));
        Forms.heading(form, Messages.ZoneAnalysisPage_enlargementHeading, 2);
        b.numberList(form, s, P.getZoneAnalysisSettings_DelayYears(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_delays, "years", Range.of(0, true, 100, true)), true);
        b.number(form, s, P.getZoneAnalysisSettings_TransverseDispersivityFraction(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_transverse, "-", Range.of(0, false, 1, true)));
        b.number(form, s, P.getZoneAnalysisSettings_HotSpotMultiple(),
                NumberSpec.fixed(Messages.ZoneAnalysisPage_hotSpot, "-", Range.of(1, false, 1_000_000, true)));
    }

    @Override
    void resultsChanged() {
        if (variogram != null && !variogram.isDisposed()) {
            showVariogram();
            Forms.refit(area);
        }
    }

    /** Fills the variogram table from the latest run (the previous run while one is computing). */
    private void showVariogram() {
        variogram.removeAll();
        DesignRun run = results.get().run();
        ZoneAnalysis z = run == null ? null : run.zoneAnalysis();
        String length = bindings.units().symbol(Dimension.LENGTH);
        StringBuilder note = new StringBuilder();
        if (z == null) {
            note.append(Messages.ZoneAnalysisPage_noResults);
        } else if (!z.available()) {
            note.append(Messages.bind(Messages.ZoneAnalysisPage_notAvailable, z.unavailableReason()));
        } else {
            for (ContaminantZone c : z.contaminants()) {
                ExperimentalVariogram v = c.experimentalVariogram();
                if (v == null) {
                    note.append(Messages.bind(Messages.ZoneAnalysisPage_tooFewLocations, c.contaminantName())).append(' ');
                    continue;
                }
                note.append(Messages.bind(Messages.ZoneAnalysisPage_variogramBasis, new Object[] { c.contaminantName(),
                        Numbers.format(v.sampleVarianceMgPerKgSquared(), Numbers.RESULT_DIGITS), v.basisDescription(),
                        c.variogramBasis().isEmpty() ? "" : " " + c.variogramBasis() })).append(' ');
                for (LagClass l : v.lagClasses()) {
                    TableItem item = new TableItem(variogram, SWT.NONE);
                    item.setText(new String[] { c.contaminantName(),
                            Numbers.format(bindings.units().toDisplay(l.fromMetres(), Dimension.LENGTH), Numbers.RESULT_DIGITS)
                                    + " \u2013 " + Numbers.format(bindings.units().toDisplay(l.toMetres(), Dimension.LENGTH),
                                            Numbers.RESULT_DIGITS),
                            l.pairCount() == 0 ? "\u2013"
                                    : Numbers.format(bindings.units().toDisplay(l.meanLagMetres(), Dimension.LENGTH),
                                            Numbers.RESULT_DIGITS),
                            Long.toString(l.pairCount()),
                            l.pairCount() == 0 ? "\u2013" : Numbers.format(l.semivarianceMgPerKgSquared(), Numbers.RESULT_DIGITS) });
                }
            }
            note.append(Messages.bind(Messages.ZoneAnalysisPage_lagUnits, length));
        }
        variogramNote.setText(note.toString().trim());
        for (TableColumn c : variogram.getColumns()) {
            c.pack();
        }
    }

    /** The variogram table (tests). */
    Table variogramTable() {
        return variogram;
    }

    @Override
    boolean reveal(EObject object, EStructuralFeature feature) {
        ZoneAnalysisSettings s = project.getZoneAnalysis();
        if (s == null || !within(object, s)) {
            return false;
        }
        Control c = feature == null ? null : bindings.controlFor(s, feature);
        if (c != null) {
            area.showControl(c);
            c.setFocus();
        }
        return true;
    }
}
