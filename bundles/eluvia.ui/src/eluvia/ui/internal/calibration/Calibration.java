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
import eluvia.ui.internal.Messages;

/**
 * Column-test calibration through the transport bundle's fitter ({@link ColumnTestFit},
 * Levenberg-Marquardt) and the command that takes the fitted parameters into the project.
 *
 * <p>Taking the parameters in reads the fitted dimensionless numbers back as the project's
 * quantities with the column's own conditions: R = 1 + rho_b Kd / theta (REFERENCES.md; rho_b in
 * kg/L) gives Kd = (R - 1) theta / rho_b; P = v L / D with D = alpha_L v when mechanical
 * dispersion dominates diffusion (REFERENCES.md) gives alpha_L = L / P; beta and omega are the
 * dimensionless two-region parameters as fitted (van Genuchten and Wierenga 1976). These two
 * read-backs are the only arithmetic here; they belong with the fitter and are flagged for it.
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

    /** Kd in L/kg from a fitted R and the column's water content and bulk density (kg/m3). */
    public static double kdLitresPerKg(double retardation, double waterContent, double bulkDensityKgPerCubicMetre) {
        if (!(retardation >= 1) || !(waterContent > 0 && waterContent < 1) || !(bulkDensityKgPerCubicMetre > 0)) {
            throw new IllegalArgumentException(Messages.bind(Messages.Calibration_badColumn, new Object[] {
                    retardation, waterContent, bulkDensityKgPerCubicMetre }));
        }
        return (retardation - 1) * waterContent / (bulkDensityKgPerCubicMetre / 1000);
    }

    /** Longitudinal dispersivity in m from a fitted Peclet number and the column length (m). */
    public static double dispersivityMetres(double peclet, double columnLengthMetres) {
        if (!(peclet > 0) || !(columnLengthMetres > 0)) {
            throw new IllegalArgumentException(Messages.bind(Messages.Calibration_badLength, peclet, columnLengthMetres));
        }
        return columnLengthMetres / peclet;
    }

    /**
     * The undoable command that takes a fit into the project: Kd (entered) of the test's
     * contaminant, the entered dispersivity of its layer (when it has one), and for a two-region fit
     * beta and omega (entered as dimensionless numbers).
     *
     * @return the command, or null when the test has no contaminant
     */
    public static Command accept(EditingDomain domain, ColumnTest test, ColumnFitResult fit) {
        Contaminant c = test.getContaminant();
        if (c == null) {
            return null;
        }
        CompoundCommand all = new CompoundCommand(Messages.bind(Messages.Calibration_command, test.getName()));
        double kd = kdLitresPerKg(fit.parameter("R").value(), test.getWaterContent(), test.getBulkDensityKgPerCubicMetre());
        all.append(SetCommand.create(domain, c, P.getContaminant_KdEntered(), Boolean.TRUE));
        all.append(SetCommand.create(domain, c, P.getContaminant_KdLitresPerKg(), kd));
        SoilLayer layer = test.getLayer();
        if (layer != null) {
            double alpha = dispersivityMetres(fit.parameter("P").value(), test.getColumnLengthMetres());
            all.append(SetCommand.create(domain, layer, P.getSoilLayer_DispersivityRule(), DispersivityRule.ENTERED));
            all.append(SetCommand.create(domain, layer, P.getSoilLayer_DispersivityMetres(), alpha));
        }
        if (fit.model() == ColumnTestFit.Model.FINITE_TWO_REGION) {
            all.append(SetCommand.create(domain, c, P.getContaminant_Nonequilibrium(), NonequilibriumEntry.DIMENSIONLESS));
            all.append(SetCommand.create(domain, c, P.getContaminant_Beta(), fit.parameter("beta").value()));
            all.append(SetCommand.create(domain, c, P.getContaminant_Omega(), fit.parameter("omega").value()));
        }
        return all;
    }
}
