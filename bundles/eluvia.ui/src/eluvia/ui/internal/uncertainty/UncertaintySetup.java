package eluvia.ui.internal.uncertainty;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;

import eluvia.design.DesignPipeline;
import eluvia.design.FlushingDesignResult;
import eluvia.design.uncertainty.UncertaintyStudy;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.ui.internal.Messages;

/**
 * Turns a project and the inputs the user lets vary into a study of the uncertainty engine whose
 * model is the design pipeline: each run copies the project, sets the sampled values and runs
 * {@link DesignPipeline#flush} for every flushing design; its outputs are the pore volumes, the
 * calendar days and the water to capture of each design. The workbench only chooses the inputs;
 * every number comes from the pipeline and the engine.
 *
 * <p>The default spreads offered ({@link #defaults}) are stated starting points, not data: a
 * triangular &plusmn;{@value #FLUX_SPREAD_PERCENT} % on each design's Darcy flux (operating
 * tolerance), a lognormal of geometric standard deviation {@value #KOC_GEOMETRIC_SD} on each Koc
 * (measured Koc of one compound scatter by about a factor of two, from memory) and
 * {@value #DISPERSIVITY_GEOMETRIC_SD} on each layer's entered dispersivity (field values scatter
 * over orders of magnitude at one scale, Gelhar, Welty and Rehfeldt 1992), and a triangular
 * &plusmn;{@value #FOC_SPREAD_PERCENT} % on each layer's organic carbon fraction. The user edits
 * them in the Uncertainty view.
 */
public final class UncertaintySetup {

    /** Default half-width of the triangular spread of a Darcy flux, per cent of the value. */
    public static final double FLUX_SPREAD_PERCENT = 25;
    /** Default geometric standard deviation of a Koc (dimensionless). */
    public static final double KOC_GEOMETRIC_SD = 2;
    /** Default geometric standard deviation of an entered dispersivity (dimensionless). */
    public static final double DISPERSIVITY_GEOMETRIC_SD = 3;
    /** Default half-width of the triangular spread of an organic carbon fraction, per cent of the value. */
    public static final double FOC_SPREAD_PERCENT = 30;

    private static final SitePackage P = SitePackage.eINSTANCE;

    private UncertaintySetup() {
    }

    /** Output name of a design's pore volumes. */
    public static String poreVolumesOutput(String design) {
        return Messages.bind(Messages.Uncertainty_outputPoreVolumes, design);
    }

    /** Output name of a design's calendar days. */
    public static String daysOutput(String design) {
        return Messages.bind(Messages.Uncertainty_outputDays, design);
    }

    /** Output name of a design's water to capture. */
    public static String waterOutput(String design) {
        return Messages.bind(Messages.Uncertainty_outputWater, design);
    }

    /** The inputs offered for a project, with the default spreads stated in the class comment. */
    public static List<UncertainParameter> defaults(Project project) {
        List<UncertainParameter> out = new ArrayList<>();
        for (FlushingDesign d : project.getFlushingDesigns()) {
            double q = d.getDarcyFluxMetresPerDay();
            out.add(new UncertainParameter(Messages.bind(Messages.Uncertainty_inputFlux, d.getName()), "m/d", d,
                    P.getFlushingDesign_DarcyFluxMetresPerDay(), q > 0 ? UncertainParameter.Kind.TRIANGULAR
                            : UncertainParameter.Kind.FIXED,
                    q * (1 - FLUX_SPREAD_PERCENT / 100), q, q * (1 + FLUX_SPREAD_PERCENT / 100)));
        }
        for (Contaminant c : project.getContaminants()) {
            double koc = c.getKocLitresPerKg();
            boolean vary = koc > 0 && !c.isKdEntered();
            out.add(new UncertainParameter(Messages.bind(Messages.Uncertainty_inputKoc, c.getName()), "L/kg", c,
                    P.getContaminant_KocLitresPerKg(), vary ? UncertainParameter.Kind.LOGNORMAL : UncertainParameter.Kind.FIXED,
                    koc, KOC_GEOMETRIC_SD, 0));
        }
        if (project.getSite() != null) {
            for (SoilLayer l : project.getSite().getLayers()) {
                double a = l.getDispersivityMetres();
                boolean entered = l.getDispersivityRule() == eluvia.site.model.DispersivityRule.ENTERED && a > 0;
                out.add(new UncertainParameter(Messages.bind(Messages.Uncertainty_inputDispersivity, l.getName()), "m", l,
                        P.getSoilLayer_DispersivityMetres(), entered ? UncertainParameter.Kind.LOGNORMAL
                                : UncertainParameter.Kind.FIXED,
                        a, DISPERSIVITY_GEOMETRIC_SD, 0));
                double foc = l.getOrganicCarbonFraction();
                out.add(new UncertainParameter(Messages.bind(Messages.Uncertainty_inputFoc, l.getName()), "-", l,
                        P.getSoilLayer_OrganicCarbonFraction(), foc > 0 ? UncertainParameter.Kind.TRIANGULAR
                                : UncertainParameter.Kind.FIXED,
                        foc * (1 - FOC_SPREAD_PERCENT / 100), foc, Math.min(0.99, foc * (1 + FOC_SPREAD_PERCENT / 100))));
            }
        }
        return out;
    }

    /**
     * The study for a project: the parameters as inputs, three outputs per flushing design, the
     * pipeline as the model. The project is copied now (on the caller's thread); the model works on
     * copies of that copy, so the user may go on editing.
     *
     * @throws eluvia.design.uncertainty.UncertaintyInputException for a bad distribution, naming it
     */
    public static UncertaintyStudy study(Project project, List<UncertainParameter> parameters) {
        Project base = EcoreUtil.copy(project);
        Map<String, String> paths = new HashMap<>();
        Map<String, org.eclipse.emf.ecore.EAttribute> attributes = new HashMap<>();
        UncertaintyStudy.Builder b = UncertaintyStudy.builder();
        for (UncertainParameter p : parameters) {
            b.input(p.toInput());
            paths.put(p.name(), EcoreUtil.getRelativeURIFragmentPath(project, p.target()));
            attributes.put(p.name(), p.attribute());
        }
        List<String> designs = project.getFlushingDesigns().stream().map(FlushingDesign::getName).toList();
        for (String d : designs) {
            b.output(poreVolumesOutput(d), "PV").output(daysOutput(d), "d").output(waterOutput(d), "m3");
        }
        b.model(values -> {
            Project copy;
            synchronized (base) {
                copy = EcoreUtil.copy(base);
            }
            for (String name : values.names()) {
                EObject target = EcoreUtil.getEObject(copy, paths.get(name));
                target.eSet(attributes.get(name), values.get(name));
            }
            Map<String, Double> out = new HashMap<>();
            for (FlushingDesign d : copy.getFlushingDesigns()) {
                FlushingDesignResult r = DesignPipeline.flush(copy, d);
                if (!r.allReachable()) {
                    throw new IllegalStateException(Messages.bind(Messages.Uncertainty_notReached, d.getName()));
                }
                out.put(poreVolumesOutput(d.getName()), r.poreVolumes());
                out.put(daysOutput(d.getName()), r.calendarDays());
                out.put(waterOutput(d.getName()), r.waterCapturedCubicMetres());
            }
            return out;
        });
        return b.build();
    }
}
