package eluvia.ui.internal.calibration;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CompoundCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.EditingDomain;

import eluvia.site.model.ColumnTest;
import eluvia.site.model.ColumnTestKind;
import eluvia.site.model.ColumnTestPoint;
import eluvia.site.model.Contaminant;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.transport.ColumnFitResult;
import eluvia.transport.ColumnObservation;
import eluvia.transport.ColumnTestFit;
import eluvia.transport.TransportInputException;
import eluvia.transport.TransportProperties;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.editor.Labels;
import eluvia.ui.internal.fields.Numbers;

/**
 * Column-test calibration through the transport bundle's fitter ({@link ColumnTestFit},
 * Levenberg-Marquardt) and the command that takes the fitted parameters into the project.
 *
 * <p>Taking the parameters in reads the fitted dimensionless numbers back as the project's
 * quantities with the column's own conditions, by the inverses in {@link TransportProperties}:
 * Kd from R, and the dispersivity from P with the column's diffusion taken out
 * (D = alpha_L v + tau D0, v = q / theta; tau by Millington and Quirk for a saturated column,
 * porosity = water content, as a column test does not record its porosity). When P is above what
 * diffusion alone gives, the column determines no dispersivity and the layer's is left as it was.
 * beta and omega are the dimensionless two-region parameters as fitted (van Genuchten and
 * Wierenga 1976).
 */
public final class Calibration {

    private static final SitePackage P = SitePackage.eINSTANCE;

    private Calibration() {
    }

    /** The column test's curve kind as the fitter's. */
    public static ColumnTestFit.Curve curve(ColumnTest test) {
        return test.getKind() == ColumnTestKind.ELUTION ? ColumnTestFit.Curve.ELUTION : ColumnTestFit.Curve.BREAKTHROUGH;
    }

    /** The measured points as the fitter's observations. */
    public static List<ColumnObservation> observations(ColumnTest test) {
        List<ColumnObservation> out = new ArrayList<>();
        for (ColumnTestPoint p : test.getPoints()) {
            out.add(new ColumnObservation(p.getPoreVolumes(), p.getRelativeConcentration()));
        }
        return out;
    }

    /**
     * Fits a column test.
     *
     * @throws eluvia.transport.TransportInputException for data the fitter cannot use, naming what is wrong
     */
    public static ColumnFitResult fit(ColumnTest test, ColumnTestFit.Model model) {
        return ColumnTestFit.fit(observations(test), curve(test), model);
    }

    /**
     * What taking a fit in does: the command, and why the layer's dispersivity was left as it was
     * (null when it was set, or the test names no layer).
     */
    public record Acceptance(Command command, String dispersivityNote) {
    }

    /**
     * The undoable command that takes a fit into the project: Kd (entered) of the test's
     * contaminant, the entered dispersivity of its layer (when it has one and the column determines
     * one beyond diffusion), and for a two-region fit beta and omega (entered as dimensionless
     * numbers).
     *
     * @return the command and its note, or null when the test has no contaminant
     * @throws IllegalArgumentException when a column condition is outside its range: the message
     *         names it, its value, the range, and where to correct it
     */
    public static Acceptance accept(EditingDomain domain, ColumnTest test, ColumnFitResult fit) {
        Contaminant c = test.getContaminant();
        if (c == null) {
            return null;
        }
        CompoundCommand all = new CompoundCommand(Messages.bind(Messages.Calibration_command, test.getName()));
        String note = null;
        try {
            double theta = test.getWaterContent();
            double kd = TransportProperties.kdFromRetardationLitresPerKg(fit.parameter("R").value(),
                    test.getBulkDensityKgPerCubicMetre(), theta);
            all.append(SetCommand.create(domain, c, P.getContaminant_KdEntered(), Boolean.TRUE));
            all.append(SetCommand.create(domain, c, P.getContaminant_KdLitresPerKg(), kd));
            SoilLayer layer = test.getLayer();
            if (layer != null) {
                double peclet = fit.parameter("P").value();
                double length = test.getColumnLengthMetres();
                double v = TransportProperties.poreWaterVelocityMetresPerDay(test.getDarcyFluxMetresPerDay(), theta);
                double tau = TransportProperties.millingtonQuirkTortuosity(theta, theta);
                double d0 = c.getDiffusionSquareMetresPerSecond();
                double limit = TransportProperties.diffusionOnlyPeclet(length, v, tau, d0);
                if (peclet <= limit) {
                    double alpha = TransportProperties.dispersivityFromPecletMetres(peclet, length, v, tau, d0);
                    all.append(SetCommand.create(domain, layer, P.getSoilLayer_DispersivityRule(), DispersivityRule.ENTERED));
                    all.append(SetCommand.create(domain, layer, P.getSoilLayer_DispersivityMetres(), alpha));
                } else {
                    note = Messages.bind(Messages.Calibration_diffusionOnly, new Object[] { Numbers.format(peclet, 4),
                            Numbers.format(limit, 4), Labels.name(layer) });
                }
            }
        } catch (TransportInputException e) {
            throw new IllegalArgumentException(Messages.bind(Messages.Calibration_badColumn, e.getMessage(), test.getName()), e);
        }
        if (fit.model() == ColumnTestFit.Model.FINITE_TWO_REGION) {
            all.append(SetCommand.create(domain, c, P.getContaminant_Nonequilibrium(), NonequilibriumEntry.DIMENSIONLESS));
            all.append(SetCommand.create(domain, c, P.getContaminant_Beta(), fit.parameter("beta").value()));
            all.append(SetCommand.create(domain, c, P.getContaminant_Omega(), fit.parameter("omega").value()));
        }
        return new Acceptance(all, note);
    }
}
