package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Composite;

import eluvia.design.Cautions;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.PriceBook;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SolutionMethod;
import eluvia.site.model.TreatmentZone;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** In-situ flushing alternatives: zone, flux, operation, criterion and solution method. */
final class FlushingPage extends MasterDetailPage<FlushingDesign> {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private final Color cautionColour;

    FlushingPage(Bindings bindings, Color cautionColour) {
        super(bindings);
        this.cautionColour = cautionColour;
    }

    static NumberSpec flux() {
        return NumberSpec.of(Messages.Flushing_flux, Dimension.VELOCITY, Range.positive());
    }

    @Override
    String title() {
        return Messages.Page_flushing;
    }

    @Override
    EObject owner() {
        return project;
    }

    @Override
    EReference list() {
        return P.getProject_FlushingDesigns();
    }

    @Override
    List<FlushingDesign> rows() {
        return project.getFlushingDesigns();
    }

    @Override
    void columns(ObjectTable<FlushingDesign> t) {
        t.text(P.getFlushingDesign_Name(), Messages.Flushing_name)
                .column(Messages.Flushing_zone, d -> d.getZone() == null ? Messages.Fields_none : Labels.name(d.getZone()))
                .number(P.getFlushingDesign_DarcyFluxMetresPerDay(), flux())
                .column(Messages.Flushing_criterion, d -> Labels.of(d.getCriterion()))
                .column(Messages.Flushing_method, d -> Labels.of(d.getSolutionMethod()))
                .column(NumberSpec.fixed(Messages.Flushing_daysPerWeek, "d/week", Range.any()).label(bindings.units()),
                        d -> Numbers.format(d.getOperatingDaysPerWeek()));
    }

    @Override
    FlushingDesign newRow() {
        FlushingDesign d = SiteFactory.eINSTANCE.createFlushingDesign();
        d.setName(Messages.bind(Messages.Flushing_newName, rows().size() + 1));
        if (project.getSite() != null && !project.getSite().getZones().isEmpty()) {
            d.setZone(project.getSite().getZones().get(0));
        }
        d.setOperatingDaysPerWeek(7);
        d.setCaptureEfficiency(0.95);
        d.setMaxPoreVolumes(1000);
        return d;
    }

    @Override
    void details(Composite form, FlushingDesign d) {
        Bindings b = bindings;
        Forms.caution(form, Cautions.CAPTURE_FLUSHED_WATER, cautionColour, 2);
        Forms.heading(form, Messages.bind(Messages.Flushing_heading, d.getName()), 2);
        b.text(form, d, P.getFlushingDesign_Name(), Messages.Flushing_name, false);
        b.choice(form, d, P.getFlushingDesign_Zone(), Messages.Flushing_zone, zones(), Labels::name);
        b.number(form, d, P.getFlushingDesign_DarcyFluxMetresPerDay(), flux());
        b.number(form, d, P.getFlushingDesign_OperatingDaysPerWeek(),
                NumberSpec.fixed(Messages.Flushing_daysPerWeek, "d/week", Range.of(0, false, 7, true)));
        b.number(form, d, P.getFlushingDesign_CaptureEfficiency(),
                NumberSpec.fixed(Messages.Flushing_capture, "-", Range.of(0, false, 1, true)));
        b.choice(form, d, P.getFlushingDesign_Criterion(), Messages.Flushing_criterion, ComplianceCriterion.VALUES, Labels::of);
        b.number(form, d, P.getFlushingDesign_MaxPoreVolumes(),
                NumberSpec.fixed(Messages.Flushing_maxPoreVolumes, "PV", Range.of(1, true, 1e6, true)));
        Forms.heading(form, Messages.Flushing_methodHeading, 2);
        b.choice(form, d, P.getFlushingDesign_SolutionMethod(), Messages.Flushing_method, SolutionMethod.VALUES, Labels::of);
        b.number(form, d, P.getFlushingDesign_NumericalCellCount(),
                NumberSpec.fixed(Messages.Flushing_cells, "-", Range.of(10, true, 100000, true)));
        b.number(form, d, P.getFlushingDesign_NumericalRelativeTolerance(),
                NumberSpec.fixed(Messages.Flushing_tolerance, "-", Range.of(0, false, 0.1, true)));
        Forms.heading(form, Messages.Flushing_operationHeading, 2);
        b.number(form, d, P.getFlushingDesign_MonitoringIntervalDays(),
                NumberSpec.fixed(Messages.Flushing_monitoring, "d", Range.positive()));
        b.text(form, d, P.getFlushingDesign_AmendmentName(), Messages.Flushing_amendment, false);
        b.number(form, d, P.getFlushingDesign_AmendmentDoseKilogramsPerCubicMetre(),
                NumberSpec.of(Messages.Flushing_amendmentDose, Dimension.DENSITY, Range.nonNegative()));
        b.choice(form, d, P.getFlushingDesign_PriceBook(), Messages.Flushing_priceBook, priceBooks(), Labels::name);
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
