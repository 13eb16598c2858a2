package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.widgets.Composite;

import eluvia.site.model.Contaminant;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** Sampling locations (borings, test pits) and their soil samples. */
final class SamplingPage extends MasterDetailPage<SamplingLocation> {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private final SampleImport importer;

    SamplingPage(Bindings bindings, SampleImport importer) {
        super(bindings);
        this.importer = importer;
    }

    @Override
    String title() {
        return Messages.Page_sampling;
    }

    @Override
    EObject owner() {
        return project.getSite();
    }

    @Override
    EReference list() {
        return P.getSite_SamplingLocations();
    }

    @Override
    List<SamplingLocation> rows() {
        return project.getSite() == null ? List.of() : project.getSite().getSamplingLocations();
    }

    @Override
    void columns(ObjectTable<SamplingLocation> t) {
        var u = bindings.units();
        t.text(P.getSamplingLocation_Name(), Messages.Sampling_name)
                .number(P.getSamplingLocation_EastingMetres(), SitePage.easting())
                .number(P.getSamplingLocation_NorthingMetres(), SitePage.northing())
                .column(Messages.Sampling_sampleCount, l -> Integer.toString(l.getSamples().size()))
                .column(NumberSpec.fixed(Messages.Sampling_highest, "mg/kg", Range.any()).label(u), l -> Numbers.format(
                        l.getSamples().stream().mapToDouble(Sample::getConcentrationMilligramsPerKg).max().orElse(Double.NaN)));
    }

    @Override
    void extraButtons(Composite bar) {
        importer.button(bar);
    }

    @Override
    SamplingLocation newRow() {
        SamplingLocation l = SiteFactory.eINSTANCE.createSamplingLocation();
        l.setName(Messages.bind(Messages.Sampling_newName, rows().size() + 1));
        return l;
    }

    @Override
    void details(Composite form, SamplingLocation l) {
        Bindings b = bindings;
        Forms.heading(form, Messages.bind(Messages.Sampling_heading, l.getName()), 2);
        b.text(form, l, P.getSamplingLocation_Name(), Messages.Sampling_name, false);
        b.number(form, l, P.getSamplingLocation_EastingMetres(), SitePage.easting());
        b.number(form, l, P.getSamplingLocation_NorthingMetres(), SitePage.northing());
        b.number(form, l, P.getSamplingLocation_GroundElevationMetres(),
                NumberSpec.of(Messages.Sampling_groundElevation, Dimension.LENGTH, Range.any()));
        nestedList(form, Messages.Sampling_samplesHeading, l, P.getSamplingLocation_Samples(), () -> {
            Sample s = SiteFactory.eINSTANCE.createSample();
            if (!project.getContaminants().isEmpty()) {
                s.setContaminant(project.getContaminants().get(0));
            }
            return s;
        }, t -> t.number(P.getSample_TopDepthMetres(), NumberSpec.of(Messages.Sample_top, Dimension.LENGTH, Range.nonNegative()))
                .number(P.getSample_BottomDepthMetres(), NumberSpec.of(Messages.Sample_bottom, Dimension.LENGTH, Range.nonNegative()))
                .choice(P.getSample_Contaminant(), Messages.Sample_contaminant, this::contaminants, Labels::name)
                .number(P.getSample_ConcentrationMilligramsPerKg(),
                        NumberSpec.fixed(Messages.Sample_concentration, "mg/kg", Range.nonNegative()))
                .check(P.getSample_NonDetect(), Messages.Sample_nonDetect)
                .number(P.getSample_DetectionLimitMilligramsPerKg(),
                        NumberSpec.fixed(Messages.Sample_detectionLimit, "mg/kg", Range.nonNegative())));
    }

    private List<Contaminant> contaminants() {
        return new ArrayList<>(project.getContaminants());
    }
}
