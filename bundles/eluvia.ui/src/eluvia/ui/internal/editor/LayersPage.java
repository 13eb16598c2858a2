package eluvia.ui.internal.editor;

import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.widgets.Composite;

import eluvia.site.model.DispersivityRule;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** The soil layers, from the ground surface down: a table and the selected layer's properties. */
final class LayersPage extends MasterDetailPage<SoilLayer> {

    private static final SitePackage P = SitePackage.eINSTANCE;

    LayersPage(Bindings bindings) {
        super(bindings);
    }

    static NumberSpec top() {
        return NumberSpec.of(Messages.Layer_top, Dimension.LENGTH, Range.nonNegative());
    }

    static NumberSpec bottom() {
        return NumberSpec.of(Messages.Layer_bottom, Dimension.LENGTH, Range.positive());
    }

    @Override
    String title() {
        return Messages.Page_layers;
    }

    @Override
    EObject owner() {
        return project.getSite();
    }

    @Override
    EReference list() {
        return P.getSite_Layers();
    }

    @Override
    List<SoilLayer> rows() {
        return project.getSite() == null ? List.of() : project.getSite().getLayers();
    }

    @Override
    void columns(ObjectTable<SoilLayer> t) {
        var u = bindings.units();
        t.text(P.getSoilLayer_Name(), Messages.Layer_name)
                .number(P.getSoilLayer_TopDepthMetres(), top())
                .number(P.getSoilLayer_BottomDepthMetres(), bottom())
                .column(Messages.Layer_texture, SoilLayer::getTextureClass)
                .column(NumberSpec.fixed(Messages.Layer_porosity, "-", Range.any()).label(u), l -> Numbers.format(l.getPorosity()))
                .column(NumberSpec.fixed(Messages.Layer_waterContent, "-", Range.any()).label(u),
                        l -> Numbers.format(l.getWaterContent()))
                .column(NumberSpec.fixed(Messages.Layer_foc, "-", Range.any()).label(u),
                        l -> Numbers.format(l.getOrganicCarbonFraction()))
                .column(NumberSpec.of(Messages.Layer_effectiveDispersivity, Dimension.LENGTH, Range.any()).label(u),
                        l -> Numbers.format(u.toDisplay(l.getEffectiveDispersivityMetres(), Dimension.LENGTH)));
    }

    @Override
    SoilLayer newRow() {
        SoilLayer l = SiteFactory.eINSTANCE.createSoilLayer();
        List<SoilLayer> layers = rows();
        double top = layers.isEmpty() ? 0 : layers.get(layers.size() - 1).getBottomDepthMetres();
        l.setName(Messages.bind(Messages.Layer_newName, layers.size() + 1));
        l.setTopDepthMetres(top);
        l.setBottomDepthMetres(top + 1);
        return l;
    }

    @Override
    void details(Composite form, SoilLayer l) {
        Bindings b = bindings;
        Forms.heading(form, Messages.bind(Messages.Layer_heading, Labels.name(l)), 2);
        b.text(form, l, P.getSoilLayer_Name(), Messages.Layer_name, false);
        b.number(form, l, P.getSoilLayer_TopDepthMetres(), top());
        b.number(form, l, P.getSoilLayer_BottomDepthMetres(), bottom());
        b.text(form, l, P.getSoilLayer_TextureClass(), Messages.Layer_texture, false);
        Forms.heading(form, Messages.Layer_soilHeading, 2);
        b.number(form, l, P.getSoilLayer_BulkDensityKgPerCubicMetre(),
                NumberSpec.of(Messages.Layer_bulkDensity, Dimension.DENSITY, Range.positive()));
        b.number(form, l, P.getSoilLayer_Porosity(), NumberSpec.fixed(Messages.Layer_porosity, "-", Range.of(0, false, 1, false)));
        b.number(form, l, P.getSoilLayer_WaterContent(),
                NumberSpec.fixed(Messages.Layer_waterContent, "-", Range.of(0, false, 1, false)));
        b.number(form, l, P.getSoilLayer_OrganicCarbonFraction(),
                NumberSpec.fixed(Messages.Layer_foc, "-", Range.of(0, true, 1, false)));
        b.number(form, l, P.getSoilLayer_SaturatedConductivityMetresPerDay(),
                NumberSpec.of(Messages.Layer_conductivity, Dimension.VELOCITY, Range.positive()));
        Forms.heading(form, Messages.Layer_dispersionHeading, 2);
        b.choice(form, l, P.getSoilLayer_DispersivityRule(), Messages.Layer_dispersivityRule, DispersivityRule.VALUES,
                Labels::of);
        b.number(form, l, P.getSoilLayer_DispersivityMetres(),
                NumberSpec.of(Messages.Layer_dispersivity, Dimension.LENGTH, Range.positive()));
        b.number(form, l, P.getSoilLayer_DispersivityScaleMetres(),
                NumberSpec.of(Messages.Layer_dispersivityScale, Dimension.LENGTH, Range.nonNegative()));
        Forms.note(form, Messages.Layer_dispersivityNote, 2);
        Forms.heading(form, Messages.Layer_earthworkHeading, 2);
        b.number(form, l, P.getSoilLayer_SwellFactor(), NumberSpec.fixed(Messages.Layer_swell, "-", Range.nonNegative()));
        b.number(form, l, P.getSoilLayer_ShrinkageFactor(),
                NumberSpec.fixed(Messages.Layer_shrinkage, "-", Range.of(0, true, 1, false)));
    }
}
