package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.swt.widgets.Composite;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ComplianceStatistic;
import eluvia.site.model.Contaminant;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** The cleanup level of each contaminant: in soil and/or pore water, its basis and compliance statistic. */
final class CleanupLevelsPage extends MasterDetailPage<CleanupLevel> {

    private static final SitePackage P = SitePackage.eINSTANCE;

    CleanupLevelsPage(Bindings bindings) {
        super(bindings);
    }

    static NumberSpec soilLevel() {
        return NumberSpec.fixed(Messages.Cleanup_soilLevel, "mg/kg", Range.positive());
    }

    @Override
    String title() {
        return Messages.Page_cleanup;
    }

    @Override
    EObject owner() {
        return project;
    }

    @Override
    EReference list() {
        return P.getProject_CleanupLevels();
    }

    @Override
    List<CleanupLevel> rows() {
        return project.getCleanupLevels();
    }

    @Override
    void columns(ObjectTable<CleanupLevel> t) {
        var u = bindings.units();
        t.choice(P.getCleanupLevel_Contaminant(), Messages.Cleanup_contaminant, this::contaminants, Labels::name)
                .number(P.getCleanupLevel_SoilLevelMilligramsPerKg(), soilLevel())
                .column(NumberSpec.fixed(Messages.Cleanup_porewaterLevel, "mg/L", Range.any()).label(u),
                        l -> l.isPorewaterLevelEntered() ? Numbers.format(l.getPorewaterLevelMilligramsPerLitre()) : "\u2013")
                .column(Messages.Cleanup_statistic, l -> Labels.of(l.getStatistic()))
                .column(Messages.Cleanup_basis, CleanupLevel::getBasis);
    }

    @Override
    CleanupLevel newRow() {
        CleanupLevel l = SiteFactory.eINSTANCE.createCleanupLevel();
        for (Contaminant c : project.getContaminants()) {
            if (project.getCleanupLevels().stream().noneMatch(x -> x.getContaminant() == c)) {
                l.setContaminant(c);
                break;
            }
        }
        return l;
    }

    @Override
    void details(Composite form, CleanupLevel l) {
        Bindings b = bindings;
        Forms.heading(form, Messages.bind(Messages.Cleanup_heading, Labels.name(l)), 2);
        b.choice(form, l, P.getCleanupLevel_Contaminant(), Messages.Cleanup_contaminant, contaminants(), Labels::name);
        b.check(form, l, P.getCleanupLevel_SoilLevelEntered(), Messages.Cleanup_soilEntered);
        b.number(form, l, P.getCleanupLevel_SoilLevelMilligramsPerKg(), soilLevel());
        b.check(form, l, P.getCleanupLevel_PorewaterLevelEntered(), Messages.Cleanup_porewaterEntered);
        b.number(form, l, P.getCleanupLevel_PorewaterLevelMilligramsPerLitre(),
                NumberSpec.fixed(Messages.Cleanup_porewaterLevel, "mg/L", Range.positive()));
        b.choice(form, l, P.getCleanupLevel_Statistic(), Messages.Cleanup_statistic, ComplianceStatistic.VALUES, Labels::of);
        b.text(form, l, P.getCleanupLevel_Basis(), Messages.Cleanup_basis, true);
    }

    private List<Contaminant> contaminants() {
        return new ArrayList<>(project.getContaminants());
    }
}
