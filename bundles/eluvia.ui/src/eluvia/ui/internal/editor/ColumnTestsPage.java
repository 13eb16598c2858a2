package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.widgets.Composite;

import eluvia.site.model.ColumnTest;
import eluvia.site.model.ColumnTestKind;
import eluvia.site.model.Contaminant;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** Laboratory column tests: the column's conditions and its measured curve (fitted in the Calibration view). */
final class ColumnTestsPage extends MasterDetailPage<ColumnTest> {

    private static final SitePackage P = SitePackage.eINSTANCE;

    ColumnTestsPage(Bindings bindings) {
        super(bindings);
    }

    @Override
    String title() {
        return Messages.Page_columnTests;
    }

    @Override
    EObject owner() {
        return project;
    }

    @Override
    EReference list() {
        return P.getProject_ColumnTests();
    }

    @Override
    List<ColumnTest> rows() {
        return project.getColumnTests();
    }

    @Override
    void columns(ObjectTable<ColumnTest> t) {
        t.text(P.getColumnTest_Name(), Messages.ColumnTest_name)
                .column(Messages.ColumnTest_contaminant, c -> c.getContaminant() == null ? Messages.Fields_none
                        : Labels.name(c.getContaminant()))
                .column(Messages.ColumnTest_kind, c -> Labels.of(c.getKind()))
                .column(Messages.ColumnTest_pointCount, c -> Integer.toString(c.getPoints().size()));
    }

    @Override
    ColumnTest newRow() {
        ColumnTest c = SiteFactory.eINSTANCE.createColumnTest();
        c.setName(Messages.bind(Messages.ColumnTest_newName, rows().size() + 1));
        if (!project.getContaminants().isEmpty()) {
            c.setContaminant(project.getContaminants().get(0));
        }
        return c;
    }

    @Override
    void details(Composite form, ColumnTest c) {
        Bindings b = bindings;
        Forms.heading(form, Messages.bind(Messages.ColumnTest_heading, c.getName()), 2);
        b.text(form, c, P.getColumnTest_Name(), Messages.ColumnTest_name, false);
        b.choice(form, c, P.getColumnTest_Contaminant(), Messages.ColumnTest_contaminant, contaminants(), Labels::name);
        b.choice(form, c, P.getColumnTest_Layer(), Messages.ColumnTest_layer, layers(), Labels::name);
        b.choice(form, c, P.getColumnTest_Kind(), Messages.ColumnTest_kind, ColumnTestKind.VALUES, Labels::of);
        b.number(form, c, P.getColumnTest_ColumnLengthMetres(),
                NumberSpec.of(Messages.ColumnTest_length, Dimension.LENGTH, Range.positive()));
        b.number(form, c, P.getColumnTest_DarcyFluxMetresPerDay(), FlushingPage.flux());
        b.number(form, c, P.getColumnTest_WaterContent(),
                NumberSpec.fixed(Messages.Layer_waterContent, "-", Range.of(0, false, 1, false)));
        b.number(form, c, P.getColumnTest_BulkDensityKgPerCubicMetre(),
                NumberSpec.of(Messages.Layer_bulkDensity, Dimension.DENSITY, Range.positive()));
        b.number(form, c, P.getColumnTest_ReferenceConcentrationMilligramsPerLitre(),
                NumberSpec.fixed(Messages.ColumnTest_referenceConcentration, "mg/L", Range.positive()));
        nestedList(form, Messages.ColumnTest_pointsHeading, c, P.getColumnTest_Points(),
                () -> SiteFactory.eINSTANCE.createColumnTestPoint(),
                t -> t.number(P.getColumnTestPoint_PoreVolumes(),
                        NumberSpec.fixed(Messages.ColumnTest_poreVolumes, "PV", Range.nonNegative()))
                        .number(P.getColumnTestPoint_RelativeConcentration(),
                                NumberSpec.fixed(Messages.ColumnTest_relativeConcentration, "-", Range.nonNegative())));
    }

    private List<Contaminant> contaminants() {
        List<Contaminant> c = new ArrayList<>();
        c.add(null);
        c.addAll(project.getContaminants());
        return c;
    }

    private List<SoilLayer> layers() {
        List<SoilLayer> l = new ArrayList<>();
        l.add(null);
        if (project.getSite() != null) {
            l.addAll(project.getSite().getLayers());
        }
        return l;
    }
}
