package eluvia.ui.internal.uncertainty;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;

import eluvia.site.model.Contaminant;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySettings;
import eluvia.ui.internal.Messages;

/**
 * Helpers for the project's uncertainty settings (site model: {@link UncertaintySettings} with its
 * {@link UncertainInput}s): names and units as shown, the engine's distribution of an input for
 * the preview of its P10 / P50 / P90, and suggested inputs. The analysis itself is the design
 * bundle's {@link eluvia.design.UncertaintyAnalysis}.
 *
 * <p>{@link #suggestions} offers inputs with stated starting spreads, not data: a triangular
 * &plusmn;{@value #FLUX_SPREAD_PERCENT} % on each design's Darcy flux, a lognormal of geometric
 * standard deviation {@value #KOC_GEOMETRIC_SD} on each Koc (measured Koc of one compound scatter
 * by about a factor of two, from memory), {@value #DISPERSIVITY_GEOMETRIC_SD} on each entered
 * dispersivity (field values scatter over orders of magnitude at one scale, Gelhar, Welty and
 * Rehfeldt 1992) and a triangular &plusmn;{@value #FOC_SPREAD_PERCENT} % on each organic carbon
 * fraction. The user edits them on the editor's Uncertainty page.
 */
public final class UncertaintySetup {

    /** Suggested half-width of the triangular spread of a Darcy flux, per cent of the value. */
    public static final double FLUX_SPREAD_PERCENT = 25;
    /** Suggested geometric standard deviation of a Koc (dimensionless). */
    public static final double KOC_GEOMETRIC_SD = 2;
    /** Suggested geometric standard deviation of an entered dispersivity (dimensionless). */
    public static final double DISPERSIVITY_GEOMETRIC_SD = 3;
    /** Suggested half-width of the triangular spread of an organic carbon fraction, per cent of the value. */
    public static final double FOC_SPREAD_PERCENT = 30;

    private static final SitePackage P = SitePackage.eINSTANCE;

    private UncertaintySetup() {
    }

    /** The SI unit a model attribute's name states, e.g. m/d for darcyFluxMetresPerDay; "-" when it states none. */
    public static String unitOf(String featureName) {
        String f = featureName == null ? "" : featureName;
        String[][] suffixes = { { "MetresPerDay", "m/d" }, { "SquareMetresPerSecond", "m2/s" }, { "SquareMetres", "m2" },
                { "CubicMetres", "m3" }, { "KgPerCubicMetre", "kg/m3" }, { "KilogramsPerCubicMetre", "kg/m3" },
                { "LitresPerKg", "L/kg" }, { "MilligramsPerKg", "mg/kg" }, { "MilligramsPerLitre", "mg/L" },
                { "LitresPerMilligram", "L/mg" }, { "Kilograms", "kg" }, { "PerDay", "1/d" }, { "Days", "d" },
                { "Metres", "m" }, { "PerUnit", Messages.PriceItem_perUnit } };
        for (String[] s : suffixes) {
            if (f.endsWith(s[0])) {
                return s[1];
            }
        }
        return "-";
    }

    /** The name an input has in results: its own, or one made from its target and feature. */
    public static String nameOf(UncertainInput input) {
        if (input.getName() != null && !input.getName().isBlank()) {
            return input.getName().trim();
        }
        return describe(input.getTarget()) + " " + input.getFeatureName();
    }

    /** A short description of a project object, e.g. "Layer Silty sand". */
    public static String describe(EObject o) {
        if (o == null) {
            return Messages.Fields_none;
        }
        EStructuralFeature name = o.eClass().getEStructuralFeature("name");
        Object n = name == null ? null : o.eGet(name);
        String type = o.eClass().getName();
        if (n == null && o.eClass().getEStructuralFeature("code") != null) {
            n = o.eGet(o.eClass().getEStructuralFeature("code"));
        }
        return n == null ? type : type + " " + n;
    }

    /** Inputs offered for a project that has none yet, with the stated spreads of the class comment. */
    public static List<UncertainInput> suggestions(Project project) {
        List<UncertainInput> out = new ArrayList<>();
        for (FlushingDesign d : project.getFlushingDesigns()) {
            double q = d.getDarcyFluxMetresPerDay();
            if (q > 0) {
                out.add(triangular(d, P.getFlushingDesign_DarcyFluxMetresPerDay(),
                        Messages.bind(Messages.Uncertainty_inputFlux, d.getName()), q * (1 - FLUX_SPREAD_PERCENT / 100), q,
                        q * (1 + FLUX_SPREAD_PERCENT / 100)));
            }
        }
        for (Contaminant c : project.getContaminants()) {
            if (c.getKocLitresPerKg() > 0 && !c.isKdEntered()) {
                out.add(lognormal(c, P.getContaminant_KocLitresPerKg(), Messages.bind(Messages.Uncertainty_inputKoc,
                        c.getName()), c.getKocLitresPerKg(), KOC_GEOMETRIC_SD));
            }
        }
        if (project.getSite() != null) {
            for (SoilLayer l : project.getSite().getLayers()) {
                if (l.getDispersivityRule() == DispersivityRule.ENTERED && l.getDispersivityMetres() > 0) {
                    out.add(lognormal(l, P.getSoilLayer_DispersivityMetres(),
                            Messages.bind(Messages.Uncertainty_inputDispersivity, l.getName()), l.getDispersivityMetres(),
                            DISPERSIVITY_GEOMETRIC_SD));
                }
                double foc = l.getOrganicCarbonFraction();
                if (foc > 0) {
                    out.add(triangular(l, P.getSoilLayer_OrganicCarbonFraction(),
                            Messages.bind(Messages.Uncertainty_inputFoc, l.getName()), foc * (1 - FOC_SPREAD_PERCENT / 100),
                            foc, Math.min(0.99, foc * (1 + FOC_SPREAD_PERCENT / 100))));
                }
            }
        }
        return out;
    }

    private static UncertainInput triangular(EObject target, EAttribute a, String name, double min, double mode, double max) {
        UncertainInput i = SiteFactory.eINSTANCE.createUncertainInput();
        i.setName(name);
        i.setTarget(target);
        i.setFeatureName(a.getName());
        i.setDistribution(InputDistributionKind.TRIANGULAR);
        i.setMinimumInFeatureUnit(min);
        i.setModeInFeatureUnit(mode);
        i.setMaximumInFeatureUnit(max);
        return i;
    }

    private static UncertainInput lognormal(EObject target, EAttribute a, String name, double median, double gsd) {
        UncertainInput i = SiteFactory.eINSTANCE.createUncertainInput();
        i.setName(name);
        i.setTarget(target);
        i.setFeatureName(a.getName());
        i.setDistribution(InputDistributionKind.LOGNORMAL);
        i.setMedianInFeatureUnit(median);
        i.setGeometricStandardDeviation(gsd);
        return i;
    }

    /** The engine's input for a model input. */
    public static eluvia.design.uncertainty.UncertainInput engineInputOf(UncertainInput i) {
        String name = nameOf(i);
        String unit = unitOf(i.getFeatureName());
        InputDistributionKind kind = i.getDistribution() == null ? InputDistributionKind.NORMAL : i.getDistribution();
        return switch (kind) {
        case NORMAL -> eluvia.design.uncertainty.UncertainInput.normal(name, unit, i.getMeanInFeatureUnit(),
                i.getStandardDeviationInFeatureUnit());
        case LOGNORMAL -> eluvia.design.uncertainty.UncertainInput.lognormal(name, unit, i.getMedianInFeatureUnit(),
                i.getGeometricStandardDeviation());
        case UNIFORM -> eluvia.design.uncertainty.UncertainInput.uniform(name, unit, i.getMinimumInFeatureUnit(),
                i.getMaximumInFeatureUnit());
        case TRIANGULAR -> eluvia.design.uncertainty.UncertainInput.triangular(name, unit, i.getMinimumInFeatureUnit(),
                i.getModeInFeatureUnit(), i.getMaximumInFeatureUnit());
        };
    }
}
