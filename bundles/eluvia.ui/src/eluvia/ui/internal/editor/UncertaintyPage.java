package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Text;

import eluvia.site.model.ColumnTest;
import eluvia.site.model.Contaminant;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.PriceItem;
import eluvia.site.model.RankCorrelation;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySampling;
import eluvia.site.model.UncertaintySettings;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;
import eluvia.ui.internal.uncertainty.UncertaintySetup;

/**
 * The project's uncertainty analysis: runs, seed and sampling, the uncertain inputs (which value of
 * which object varies, by which distribution, in the field's SI unit) and the rank correlations
 * between them. The Uncertainty view runs it.
 */
final class UncertaintyPage extends EditorPage {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private static final String FIELD_UNIT = Messages.UncertaintyPage_fieldUnit;
    private Composite parent;
    private ScrolledComposite area;
    private final List<ObjectTable<?>> tables = new ArrayList<>();

    UncertaintyPage(Bindings bindings) {
        super(bindings);
    }

    @Override
    String title() {
        return Messages.Page_uncertainty;
    }

    @Override
    void create(Composite body) {
        parent = body;
        body.setLayout(new GridLayout(1, false));
        ProjectDocument.Listener rebuild = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, Notification n) {
                if (n.getNotifier() == project && n.getFeature() == P.getProject_Uncertainty() && !parent.isDisposed()) {
                    parent.getDisplay().asyncExec(UncertaintyPage.this::build);
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
        tables.clear();
        if (area != null) {
            area.dispose();
        }
        area = Forms.scrolled(parent);
        Composite form = new Composite(area, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.horizontalSpacing = 12;
        form.setLayout(layout);
        UncertaintySettings s = project.getUncertainty();
        Forms.heading(form, Messages.Page_uncertainty, 2);
        Forms.note(form, Messages.UncertaintyPage_intro, 2);
        if (s == null) {
            Button setUp = new Button(form, SWT.PUSH);
            setUp.setText(Messages.UncertaintyPage_setUp);
            setUp.addListener(SWT.Selection, e -> {
                UncertaintySettings created = SiteFactory.eINSTANCE.createUncertaintySettings();
                created.setEnabled(true);
                created.getInputs().addAll(UncertaintySetup.suggestions(project));
                bindings.execute(SetCommand.create(bindings.document().domain(), project, P.getProject_Uncertainty(), created));
            });
            Forms.fit(area, form);
            parent.layout(true, true);
            return;
        }
        Bindings b = bindings;
        b.check(form, s, P.getUncertaintySettings_Enabled(), Messages.UncertaintyPage_enabled);
        b.number(form, s, P.getUncertaintySettings_RunCount(),
                NumberSpec.fixed(Messages.UncertaintyPage_runs, "-", Range.of(2, true, 10_000_000, true)));
        b.number(form, s, P.getUncertaintySettings_Seed(), NumberSpec.fixed(Messages.UncertaintyPage_seed, "-", Range.any()));
        b.choice(form, s, P.getUncertaintySettings_SamplingMethod(), Messages.UncertaintyPage_sampling,
                UncertaintySampling.VALUES, Labels::of);
        if (s.getInputs().isEmpty()) {
            Button suggest = new Button(form, SWT.PUSH);
            suggest.setText(Messages.UncertaintyPage_suggest);
            suggest.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false, 2, 1));
            suggest.addListener(SWT.Selection, e -> bindings.execute(AddCommand.create(bindings.document().domain(), s,
                    P.getUncertaintySettings_Inputs(), UncertaintySetup.suggestions(project))));
        }
        tables.add(ListEditor.create(form, b, Messages.UncertaintyPage_inputs, s, P.getUncertaintySettings_Inputs(), () -> {
            UncertainInput i = SiteFactory.eINSTANCE.createUncertainInput();
            i.setDistribution(InputDistributionKind.TRIANGULAR);
            return i;
        }, t -> t.text(P.getUncertainInput_Name(), Messages.UncertaintyPage_name)
                .choice(P.getUncertainInput_Target(), Messages.UncertaintyPage_target, this::targets, UncertaintySetup::describe)
                .text(P.getUncertainInput_FeatureName(), Messages.UncertaintyPage_feature)
                .column(Messages.UncertaintyPage_unit, i -> UncertaintySetup.unitOf(i.getFeatureName()))
                .choice(P.getUncertainInput_Distribution(), Messages.UncertaintyPage_distribution,
                        () -> new ArrayList<>(InputDistributionKind.VALUES), Labels::of)
                .number(P.getUncertainInput_MeanInFeatureUnit(), NumberSpec.fixed(Messages.UncertaintyPage_mean, FIELD_UNIT, Range.any()))
                .number(P.getUncertainInput_StandardDeviationInFeatureUnit(),
                        NumberSpec.fixed(Messages.UncertaintyPage_sd, FIELD_UNIT, Range.nonNegative()))
                .number(P.getUncertainInput_MedianInFeatureUnit(),
                        NumberSpec.fixed(Messages.UncertaintyPage_median, FIELD_UNIT, Range.nonNegative()))
                .number(P.getUncertainInput_GeometricStandardDeviation(),
                        NumberSpec.fixed(Messages.UncertaintyPage_gsd, "-", Range.positive()))
                .number(P.getUncertainInput_MinimumInFeatureUnit(), NumberSpec.fixed(Messages.UncertaintyPage_min, FIELD_UNIT, Range.any()))
                .number(P.getUncertainInput_ModeInFeatureUnit(), NumberSpec.fixed(Messages.UncertaintyPage_mode, FIELD_UNIT, Range.any()))
                .number(P.getUncertainInput_MaximumInFeatureUnit(),
                        NumberSpec.fixed(Messages.UncertaintyPage_max, FIELD_UNIT, Range.any()))));
        Forms.note(form, Messages.UncertaintyPage_parametersNote, 2);
        tables.add(ListEditor.create(form, b, Messages.UncertaintyPage_correlations, s,
                P.getUncertaintySettings_RankCorrelations(), () -> SiteFactory.eINSTANCE.createRankCorrelation(),
                t -> t.choice(P.getRankCorrelation_First(), Messages.UncertaintyPage_first, () -> new ArrayList<>(s.getInputs()),
                        UncertaintySetup::nameOf)
                        .choice(P.getRankCorrelation_Second(), Messages.UncertaintyPage_second,
                                () -> new ArrayList<>(s.getInputs()), UncertaintySetup::nameOf)
                        .number(P.getRankCorrelation_Coefficient(),
                                NumberSpec.fixed(Messages.UncertaintyPage_coefficient, "-", Range.of(-1, false, 1, false)))));
        Forms.fit(area, form);
        parent.layout(true, true);
    }

    /** The objects of the project whose numbers may vary. */
    private List<EObject> targets() {
        List<EObject> out = new ArrayList<>();
        for (Iterator<EObject> it = project.eAllContents(); it.hasNext();) {
            EObject o = it.next();
            if (o instanceof SoilLayer || o instanceof Contaminant || o instanceof FlushingDesign
                    || o instanceof ExcavationDesign || o instanceof TreatmentZone || o instanceof SourceConcentration
                    || o instanceof PriceItem || o instanceof ColumnTest) {
                out.add(o);
            }
        }
        return out;
    }

    @Override
    boolean reveal(EObject object, EStructuralFeature feature) {
        boolean mine = object instanceof UncertaintySettings || object instanceof UncertainInput
                || object instanceof RankCorrelation;
        if (!mine) {
            return false;
        }
        Control c = feature == null ? null : bindings.controlFor(object, feature);
        if (c != null) {
            area.showControl(c);
            c.setFocus();
            if (c instanceof Text t) {
                t.selectAll();
            }
            return true;
        }
        for (ObjectTable<?> t : tables) {
            if (reveal(t, object, feature)) {
                area.showControl(t.table());
                return true;
            }
        }
        return true;
    }

    @SuppressWarnings("unchecked")
    private static <X extends EObject> boolean reveal(ObjectTable<X> t, EObject object, EStructuralFeature feature) {
        return t.reveal((X) object, feature);
    }
}
