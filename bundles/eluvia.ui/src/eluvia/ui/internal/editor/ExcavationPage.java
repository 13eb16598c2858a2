package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Composite;

import eluvia.design.Cautions;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.PriceBook;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.TreatmentZone;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/**
 * Excavation alternatives: zone, side slopes by soil type, overdig and trucks. The excavation
 * safety caution shows while the excavation (zone bottom plus overdig) is deeper than
 * {@link #PROTECTIVE_SYSTEM_DEPTH_METRES}.
 */
final class ExcavationPage extends MasterDetailPage<ExcavationDesign> {

    /**
     * Depth beyond which most occupational safety rules require a protective system: 5 ft = 1.524 m
     * (US OSHA 29 CFR 1926 Subpart P, REFERENCES.md; "about 1.5 m" in the cautions).
     */
    static final double PROTECTIVE_SYSTEM_DEPTH_METRES = 5 * 0.3048;

    private static final SitePackage P = SitePackage.eINSTANCE;
    private final Color cautionColour;

    ExcavationPage(Bindings bindings, Color cautionColour) {
        super(bindings);
        this.cautionColour = cautionColour;
    }

    @Override
    String title() {
        return Messages.Page_excavation;
    }

    @Override
    EObject owner() {
        return project;
    }

    @Override
    EReference list() {
        return P.getProject_ExcavationDesigns();
    }

    @Override
    List<ExcavationDesign> rows() {
        return project.getExcavationDesigns();
    }

    /** The depth of the pit's floor below ground: the zone's bottom plus the overdig, m (0 without a zone). */
    static double pitDepthMetres(ExcavationDesign d) {
        return d.getZone() == null ? 0 : d.getZone().getBottomDepthMetres() + d.getOverdigMetres();
    }

    @Override
    void columns(ObjectTable<ExcavationDesign> t) {
        t.text(P.getExcavationDesign_Name(), Messages.Excavation_name)
                .column(Messages.Excavation_zone, d -> d.getZone() == null ? Messages.Fields_none : Labels.name(d.getZone()))
                .column(Messages.Excavation_soilType, d -> Labels.of(d.getSoilType()))
                .number(P.getExcavationDesign_SideSlopeHorizontalPerVertical(), slope());
    }

    static NumberSpec slope() {
        return NumberSpec.fixed(Messages.Excavation_slope, "H:V", Range.nonNegative());
    }

    @Override
    ExcavationDesign newRow() {
        ExcavationDesign d = SiteFactory.eINSTANCE.createExcavationDesign();
        d.setName(Messages.bind(Messages.Excavation_newName, rows().size() + 1));
        if (project.getSite() != null && !project.getSite().getZones().isEmpty()) {
            d.setZone(project.getSite().getZones().get(0));
        }
        return d;
    }

    @Override
    void details(Composite form, ExcavationDesign d) {
        Bindings b = bindings;
        Composite caution = Forms.caution(form, Cautions.EXCAVATION_SAFETY, cautionColour, 2);
        Runnable depthCheck = () -> {
            if (caution.isDisposed()) {
                return;
            }
            boolean deep = pitDepthMetres(d) > PROTECTIVE_SYSTEM_DEPTH_METRES;
            ((org.eclipse.swt.layout.GridData) caution.getLayoutData()).exclude = !deep;
            caution.setVisible(deep);
            caution.getParent().layout(true, true);
        };
        depthCheck.run();
        eluvia.ui.internal.document.ProjectDocument.Listener l = new eluvia.ui.internal.document.ProjectDocument.Listener() {
            @Override
            public void modelChanged(eluvia.ui.internal.document.ProjectDocument doc,
                    org.eclipse.emf.common.notify.Notification n) {
                depthCheck.run();
            }
        };
        b.document().addListener(l);
        caution.addDisposeListener(e -> b.document().removeListener(l));
        Forms.heading(form, Messages.bind(Messages.Excavation_heading, d.getName()), 2);
        b.text(form, d, P.getExcavationDesign_Name(), Messages.Excavation_name, false);
        b.choice(form, d, P.getExcavationDesign_Zone(), Messages.Excavation_zone, zones(), Labels::name);
        b.choice(form, d, P.getExcavationDesign_SoilType(), Messages.Excavation_soilType, ExcavationSoilType.VALUES, Labels::of);
        b.number(form, d, P.getExcavationDesign_SideSlopeHorizontalPerVertical(), slope());
        Forms.note(form, Messages.Excavation_slopeNote, 2);
        b.number(form, d, P.getExcavationDesign_OverdigMetres(),
                NumberSpec.of(Messages.Excavation_overdig, Dimension.LENGTH, Range.nonNegative()));
        Forms.heading(form, Messages.Excavation_haulHeading, 2);
        b.number(form, d, P.getExcavationDesign_TruckHeapedCapacityCubicMetres(),
                NumberSpec.of(Messages.Excavation_truckCapacity, Dimension.VOLUME, Range.positive()));
        b.number(form, d, P.getExcavationDesign_TruckPayloadKilograms(),
                NumberSpec.of(Messages.Excavation_truckPayload, Dimension.MASS, Range.positive()));
        b.choice(form, d, P.getExcavationDesign_PriceBook(), Messages.Excavation_priceBook, priceBooks(), Labels::name);
    }

    private List<TreatmentZone> zones() {
        List<TreatmentZone> z = new ArrayList<>();
        z.add(null);
        if (project.getSite() != null) {
            z.addAll(project.getSite().getZones());
        }
        return z;
    }

    private List<PriceBook> priceBooks() {
        List<PriceBook> b = new ArrayList<>();
        b.add(null);
        b.addAll(project.getPriceBooks());
        return b;
    }
}
