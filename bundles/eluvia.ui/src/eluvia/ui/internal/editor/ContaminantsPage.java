package eluvia.ui.internal.editor;

import java.util.List;

import org.eclipse.emf.common.command.CompoundCommand;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Text;

import eluvia.site.library.LibraryEntry;
import eluvia.site.library.LibraryValue;
import eluvia.site.library.PropertyLibrary;
import eluvia.site.model.Contaminant;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SorptionIsotherm;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/**
 * The contaminants of concern: a table and the selected contaminant's properties, which can be
 * picked from the property library (each value with its source and whether it is published or
 * recalled from memory). Taking library values is one undoable edit.
 */
final class ContaminantsPage extends MasterDetailPage<Contaminant> {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private final PropertyLibrary library;

    ContaminantsPage(Bindings bindings, PropertyLibrary library) {
        super(bindings);
        this.library = library;
    }

    @Override
    String title() {
        return Messages.Page_contaminants;
    }

    @Override
    EObject owner() {
        return project;
    }

    @Override
    EReference list() {
        return P.getProject_Contaminants();
    }

    @Override
    List<Contaminant> rows() {
        return project.getContaminants();
    }

    @Override
    void columns(ObjectTable<Contaminant> t) {
        t.text(P.getContaminant_Name(), Messages.Contaminant_name)
                .column(Messages.Contaminant_cas, Contaminant::getCasNumber)
                .column(Messages.Contaminant_kocColumn, c -> Numbers.format(c.getKocLitresPerKg()))
                .column(Messages.Contaminant_kdColumn, c -> c.isKdEntered() ? Numbers.format(c.getKdLitresPerKg())
                        : Messages.Contaminant_kdFromKoc)
                .column(Messages.Contaminant_isotherm, c -> Labels.of(c.getIsotherm()))
                .column(Messages.Contaminant_sourceColumn, c -> sourceSummary(c));
    }

    static String sourceSummary(Contaminant c) {
        String s = c.getPropertySource();
        if (s == null || s.isBlank()) {
            return Messages.Contaminant_sourceNone;
        }
        return s.contains("FROM MEMORY") ? Messages.Contaminant_sourceHasMemory : Messages.Contaminant_sourceStated;
    }

    @Override
    Contaminant newRow() {
        Contaminant c = SiteFactory.eINSTANCE.createContaminant();
        c.setName(Messages.bind(Messages.Contaminant_newName, rows().size() + 1));
        return c;
    }

    @Override
    void details(Composite form, Contaminant c) {
        Bindings b = bindings;
        Forms.heading(form, Messages.bind(Messages.Contaminant_heading, Labels.name(c)), 2);
        libraryPicker(form, c);
        b.text(form, c, P.getContaminant_Name(), Messages.Contaminant_name, false);
        b.text(form, c, P.getContaminant_CasNumber(), Messages.Contaminant_cas, false);
        Forms.heading(form, Messages.Contaminant_sorptionHeading, 2);
        b.choice(form, c, P.getContaminant_Isotherm(), Messages.Contaminant_isotherm, SorptionIsotherm.VALUES, Labels::of);
        b.number(form, c, P.getContaminant_KocLitresPerKg(), NumberSpec.fixed(Messages.Contaminant_koc, "L/kg", Range.nonNegative()));
        b.check(form, c, P.getContaminant_KdEntered(), Messages.Contaminant_kdEntered);
        b.number(form, c, P.getContaminant_KdLitresPerKg(), NumberSpec.fixed(Messages.Contaminant_kd, "L/kg", Range.nonNegative()));
        b.number(form, c, P.getContaminant_FreundlichKfMgPerKgPerMgPerLitreToN(),
                NumberSpec.fixed(Messages.Contaminant_kf, "(mg/kg)/(mg/L)^n", Range.nonNegative()));
        b.number(form, c, P.getContaminant_FreundlichExponent(),
                NumberSpec.fixed(Messages.Contaminant_freundlichN, "-", Range.positive()));
        b.number(form, c, P.getContaminant_LangmuirMaximumMilligramsPerKg(),
                NumberSpec.fixed(Messages.Contaminant_smax, "mg/kg", Range.nonNegative()));
        b.number(form, c, P.getContaminant_LangmuirConstantLitresPerMilligram(),
                NumberSpec.fixed(Messages.Contaminant_langmuirK, "L/mg", Range.nonNegative()));
        Forms.heading(form, Messages.Contaminant_otherHeading, 2);
        b.number(form, c, P.getContaminant_DiffusionSquareMetresPerSecond(),
                NumberSpec.fixed(Messages.Contaminant_diffusion, "m2/s", Range.positive()));
        b.number(form, c, P.getContaminant_HalfLifeDays(), NumberSpec.fixed(Messages.Contaminant_halfLife, "d", Range.nonNegative()));
        b.number(form, c, P.getContaminant_WaterSolubilityMilligramsPerLitre(),
                NumberSpec.fixed(Messages.Contaminant_solubility, "mg/L", Range.nonNegative()));
        Forms.heading(form, Messages.Contaminant_nonequilibriumHeading, 2);
        b.choice(form, c, P.getContaminant_Nonequilibrium(), Messages.Contaminant_nonequilibrium, NonequilibriumEntry.VALUES,
                Labels::of);
        b.number(form, c, P.getContaminant_Beta(), NumberSpec.fixed(Messages.Contaminant_beta, "-", Range.of(0, false, 1, true)));
        b.number(form, c, P.getContaminant_Omega(), NumberSpec.fixed(Messages.Contaminant_omega, "-", Range.nonNegative()));
        b.number(form, c, P.getContaminant_MobileWaterFraction(),
                NumberSpec.fixed(Messages.Contaminant_mobileWater, "-", Range.of(0, false, 1, true)));
        b.number(form, c, P.getContaminant_MobileSiteFraction(),
                NumberSpec.fixed(Messages.Contaminant_siteFraction, "-", Range.of(0, true, 1, true)));
        b.number(form, c, P.getContaminant_MassTransferRatePerDay(),
                NumberSpec.fixed(Messages.Contaminant_rate, "1/d", Range.nonNegative()));
        Forms.heading(form, Messages.Contaminant_sourceHeading, 2);
        b.text(form, c, P.getContaminant_PropertySource(), Messages.Contaminant_source, true);
    }

    private void libraryPicker(Composite form, Contaminant c) {
        List<LibraryEntry> entries = library.entries();
        bindings.label(form, Messages.Contaminant_library);
        Composite row = new Composite(form, SWT.NONE);
        org.eclipse.swt.layout.GridLayout gl = new org.eclipse.swt.layout.GridLayout(2, false);
        gl.marginWidth = 0;
        gl.marginHeight = 0;
        row.setLayout(gl);
        row.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Combo combo = new Combo(row, SWT.READ_ONLY | SWT.DROP_DOWN);
        combo.setData(Bindings.LABEL_KEY, Messages.Contaminant_library);
        for (LibraryEntry e : entries) {
            combo.add(e.name() + (e.casNumber().isBlank() ? "" : " (" + e.casNumber() + ")"));
        }
        Button apply = new Button(row, SWT.PUSH);
        apply.setText(Messages.Contaminant_libraryApply);
        apply.setEnabled(false);
        new org.eclipse.swt.widgets.Label(form, SWT.NONE);
        Text values = new Text(form, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.BORDER | SWT.V_SCROLL);
        values.setData("eluvia.role", "library-values");
        GridData vd = new GridData(SWT.FILL, SWT.TOP, true, false);
        vd.widthHint = Bindings.charsWide(values, 50);
        vd.heightHint = values.getLineHeight() * 4;
        values.setLayoutData(vd);
        values.setText(Messages.Contaminant_libraryHint);
        library.find(c.getCasNumber() == null || c.getCasNumber().isBlank() ? c.getName() : c.getCasNumber())
                .ifPresent(e -> {
                    combo.select(entries.indexOf(e));
                    values.setText(describe(e));
                    apply.setEnabled(true);
                });
        combo.addListener(SWT.Selection, e -> {
            int i = combo.getSelectionIndex();
            if (i >= 0) {
                values.setText(describe(entries.get(i)));
                apply.setEnabled(true);
            }
        });
        apply.addListener(SWT.Selection, e -> {
            int i = combo.getSelectionIndex();
            if (i >= 0) {
                take(entries.get(i), c);
            }
        });
    }

    static String describe(LibraryEntry e) {
        StringBuilder b = new StringBuilder();
        for (LibraryValue v : e.values()) {
            if (b.length() > 0) {
                b.append('\n');
            }
            b.append(v.quantity().key()).append(": ").append(v.describe());
        }
        return b.toString();
    }

    /** Takes a library entry's values into a contaminant as one undoable command. */
    void take(LibraryEntry entry, Contaminant c) {
        Contaminant copy = EcoreUtil.copy(c);
        PropertyLibrary.applyTo(entry, copy);
        CompoundCommand all = new CompoundCommand(Messages.bind(Messages.Contaminant_libraryCommand, entry.name()));
        for (EAttribute a : P.getContaminant().getEAllAttributes()) {
            if (a.isChangeable() && !a.isDerived() && !java.util.Objects.equals(copy.eGet(a), c.eGet(a))) {
                all.append(SetCommand.create(bindings.document().domain(), c, a, copy.eGet(a)));
            }
        }
        if (!all.isEmpty()) {
            bindings.execute(all);
        }
    }
}
