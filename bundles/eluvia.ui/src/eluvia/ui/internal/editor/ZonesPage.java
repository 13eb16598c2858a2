package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.widgets.Composite;

import eluvia.site.model.Contaminant;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** Treatment zones: depth interval, plan area or footprint, and the initial concentration of each contaminant. */
final class ZonesPage extends MasterDetailPage<TreatmentZone> {

    private static final SitePackage P = SitePackage.eINSTANCE;

    ZonesPage(Bindings bindings) {
        super(bindings);
    }

    @Override
    String title() {
        return Messages.Page_zones;
    }

    @Override
    EObject owner() {
        return project.getSite();
    }

    @Override
    EReference list() {
        return P.getSite_Zones();
    }

    @Override
    List<TreatmentZone> rows() {
        return project.getSite() == null ? List.of() : project.getSite().getZones();
    }

    @Override
    void columns(ObjectTable<TreatmentZone> t) {
        var u = bindings.units();
        t.text(P.getTreatmentZone_Name(), Messages.Zone_name)
                .number(P.getTreatmentZone_TopDepthMetres(), NumberSpec.of(Messages.Zone_top, Dimension.LENGTH, Range.nonNegative()))
                .number(P.getTreatmentZone_BottomDepthMetres(),
                        NumberSpec.of(Messages.Zone_bottom, Dimension.LENGTH, Range.positive()))
                .column(NumberSpec.of(Messages.Zone_effectiveArea, Dimension.AREA, Range.any()).label(u),
                        z -> eluvia.ui.internal.fields.Numbers.format(u.toDisplay(z.getEffectiveAreaSquareMetres(), Dimension.AREA)))
                .column(NumberSpec.of(Messages.Zone_volume, Dimension.VOLUME, Range.any()).label(u),
                        z -> eluvia.ui.internal.fields.Numbers.format(u.toDisplay(z.getVolumeCubicMetres(), Dimension.VOLUME)));
    }

    @Override
    TreatmentZone newRow() {
        TreatmentZone z = SiteFactory.eINSTANCE.createTreatmentZone();
        z.setName(Messages.bind(Messages.Zone_newName, rows().size() + 1));
        z.setBottomDepthMetres(1);
        return z;
    }

    @Override
    void details(Composite form, TreatmentZone z) {
        Bindings b = bindings;
        Forms.heading(form, Messages.bind(Messages.Zone_heading, Labels.name(z)), 2);
        b.text(form, z, P.getTreatmentZone_Name(), Messages.Zone_name, false);
        b.number(form, z, P.getTreatmentZone_TopDepthMetres(), NumberSpec.of(Messages.Zone_top, Dimension.LENGTH, Range.nonNegative()));
        b.number(form, z, P.getTreatmentZone_BottomDepthMetres(),
                NumberSpec.of(Messages.Zone_bottom, Dimension.LENGTH, Range.positive()));
        b.number(form, z, P.getTreatmentZone_AreaSquareMetres(), NumberSpec.of(Messages.Zone_area, Dimension.AREA, Range.positive()));
        Forms.note(form, Messages.Zone_areaNote, 2);
        nestedList(form, Messages.Zone_sourcesHeading, z, P.getTreatmentZone_SourceConcentrations(), () -> {
            SourceConcentration s = SiteFactory.eINSTANCE.createSourceConcentration();
            for (Contaminant c : project.getContaminants()) {
                if (z.getSourceConcentrations().stream().noneMatch(x -> x.getContaminant() == c)) {
                    s.setContaminant(c);
                    break;
                }
            }
            return s;
        }, t -> t.choice(P.getSourceConcentration_Contaminant(), Messages.Zone_contaminant, this::contaminants, Labels::name)
                .number(P.getSourceConcentration_SoilConcentrationMilligramsPerKg(),
                        NumberSpec.fixed(Messages.Zone_initialConcentration, "mg/kg", Range.positive())));
        nestedList(form, Messages.Zone_footprintHeading, z, P.getTreatmentZone_Footprint(),
                () -> SiteFactory.eINSTANCE.createVertex(), t -> t.number(P.getVertex_EastingMetres(), SitePage.easting())
                        .number(P.getVertex_NorthingMetres(), SitePage.northing()));
    }

    private List<Contaminant> contaminants() {
        return new ArrayList<>(project.getContaminants());
    }
}
