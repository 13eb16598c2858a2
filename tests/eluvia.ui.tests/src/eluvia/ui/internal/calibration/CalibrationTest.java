package eluvia.ui.internal.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.apache.commons.math3.special.Erf;
import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.model.ColumnTest;
import eluvia.site.model.ColumnTestKind;
import eluvia.site.model.ColumnTestPoint;
import eluvia.site.model.Contaminant;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.UnitSystem;
import eluvia.transport.ColumnFitResult;
import eluvia.transport.ColumnTestFit;
import eluvia.transport.TransportProperties;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.views.CalibrationView;

/** Column-test calibration: the fitter's parameters shown and taken into the project as one undoable edit. */
final class CalibrationTest {

    @TempDir
    Path dir;

    /**
     * Ogata and Banks (1961) at X = 1, the flux-averaged effluent of the flux-inlet column
     * (REFERENCES.md), evaluated here with Commons Math 3.6.1 Erf.erfc.
     */
    private static double ogataBanks(double poreVolumes, double peclet, double retardation) {
        double s = 2 * Math.sqrt(retardation * poreVolumes / peclet);
        return 0.5 * Erf.erfc((retardation - poreVolumes) / s)
                + 0.5 * Math.exp(peclet) * Erf.erfc((retardation + poreVolumes) / s);
    }

    /** A fit with the given R and P, as the fitter reports it. */
    private static ColumnFitResult fitted(double retardation, double peclet) {
        return new ColumnFitResult(ColumnTestFit.Curve.BREAKTHROUGH, ColumnTestFit.Model.SEMI_INFINITE_EQUILIBRIUM,
                List.of(new ColumnFitResult.FittedParameter("R", retardation, 0.01, retardation - 0.02, retardation + 0.02, true),
                        new ColumnFitResult.FittedParameter("P", peclet, 0.1, peclet - 0.2, peclet + 0.2, true)),
                List.of(), 0, 10, 20, List.of());
    }

    /** A column of 0.3 m, q = 0.5 m/d, theta = 0.35, rho_b = 1600 kg/m3, of a contaminant with D0 and a layer. */
    private static ColumnTest column(double diffusionSquareMetresPerSecond) {
        Contaminant c = SiteFactory.eINSTANCE.createContaminant();
        c.setName("Contaminant (test)");
        c.setDiffusionSquareMetresPerSecond(diffusionSquareMetresPerSecond);
        SoilLayer layer = SiteFactory.eINSTANCE.createSoilLayer();
        layer.setName("Layer (test)");
        layer.setDispersivityMetres(0.5);
        ColumnTest t = SiteFactory.eINSTANCE.createColumnTest();
        t.setName("Column (test)");
        t.setContaminant(c);
        t.setLayer(layer);
        t.setColumnLengthMetres(0.3);
        t.setDarcyFluxMetresPerDay(0.5);
        t.setWaterContent(0.35);
        t.setBulkDensityKgPerCubicMetre(1600);
        return t;
    }

    @Test
    void theReadBackUsesTheColumnsConditionsAndSaysWhatItCannotDetermine() {
        EditingDomain domain = new AdapterFactoryEditingDomain(
                new ComposedAdapterFactory(ComposedAdapterFactory.Descriptor.Registry.INSTANCE), new BasicCommandStack());
        ColumnTest t = column(1e-9);
        Calibration.Acceptance a = Calibration.accept(domain, t, fitted(2.0, 20));
        assertNull(a.dispersivityNote());
        a.command().execute();
        // Kd = (R - 1) theta / rho_b = 1 x 0.35 / 1.6 = 0.21875 L/kg, by hand (REFERENCES.md: R = 1 + rho_b Kd / theta)
        assertEquals(0.21875, t.getContaminant().getKdLitresPerKg(), 1e-15);
        assertTrue(t.getContaminant().isKdEntered());
        // D = v L / P and D = alpha_L v + tau D0 (REFERENCES.md), v = q / theta, tau = theta^(7/3) / n^2 with n = theta
        // (saturated column): alpha_L = (v L / P - tau D0) / v, evaluated here
        double v = 0.5 / 0.35;
        double tau = Math.pow(0.35, 7.0 / 3) / (0.35 * 0.35);
        assertEquals((v * 0.3 / 20 - tau * 1e-9 * 86400) / v, t.getLayer().getDispersivityMetres(), 1e-15);
        assertEquals(DispersivityRule.ENTERED, t.getLayer().getDispersivityRule());

        // A diffusion coefficient of 1e-6 m2/s (invented: a thousand times a small solute's) spreads more than P = 20 says:
        // v L / (tau D0) = 1.42857 x 0.3 / (0.704730 x 1e-6 x 86400) = 0.428571 / 0.0608887 = 7.039 (by hand) is below 20.
        ColumnTest slow = column(1e-6);
        a = Calibration.accept(domain, slow, fitted(2.0, 20));
        assertNotNull(a.dispersivityNote());
        assertTrue(a.dispersivityNote().contains("Layer (test)") && a.dispersivityNote().contains("7.039")
                && a.dispersivityNote().contains("left as it was"), a.dispersivityNote());
        a.command().execute();
        assertEquals(0.5, slow.getLayer().getDispersivityMetres(), "the layer's dispersivity is kept");
        assertEquals(0.21875, slow.getContaminant().getKdLitresPerKg(), 1e-15, "Kd is still taken in");

        // bad column conditions: the message names the quantity, its value, the range and where to correct it
        ColumnTest noFlow = column(1e-9);
        noFlow.setDarcyFluxMetresPerDay(0);
        String m = assertThrows(IllegalArgumentException.class, () -> Calibration.accept(domain, noFlow, fitted(2.0, 20)))
                .getMessage();
        assertTrue(m.contains("Darcy flux (m/day) = 0.0") && m.contains("greater than 0") && m.contains("Column tests page")
                && m.contains("Column (test)"), m);
        ColumnTest wet = column(1e-9);
        wet.setWaterContent(35);
        m = assertThrows(IllegalArgumentException.class, () -> Calibration.accept(domain, wet, fitted(2.0, 20))).getMessage();
        assertTrue(m.contains("water content (-) = 35.0") && m.contains("between 0.0 and 1.0"), m);
        m = assertThrows(IllegalArgumentException.class, () -> Calibration.accept(domain, column(1e-9), fitted(0.5, 20)))
                .getMessage();
        assertTrue(m.contains("retardation factor (-) = 0.5"), m);
    }

    @Test
    void aBreakthroughCurveIsFittedShownAndAcceptedAsOneUndoableEdit() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI)) {
            f.awaitResults();
            SitePackage p = SitePackage.eINSTANCE;
            Contaminant c = f.document.project().getContaminants().get(0);
            SoilLayer layer = f.document.project().getSite().getLayers().get(0);
            ColumnTest t = SiteFactory.eINSTANCE.createColumnTest();
            t.setName("Synthetic breakthrough (test)");
            t.setContaminant(c);
            t.setLayer(layer);
            t.setKind(ColumnTestKind.BREAKTHROUGH);
            t.setColumnLengthMetres(0.3);
            t.setDarcyFluxMetresPerDay(0.5);
            t.setWaterContent(0.35);
            t.setBulkDensityKgPerCubicMetre(1600);
            t.setReferenceConcentrationMilligramsPerLitre(1);
            double trueR = 2.0;
            double trueP = 10.0;
            for (int i = 1; i <= 24; i++) {
                ColumnTestPoint pt = SiteFactory.eINSTANCE.createColumnTestPoint();
                pt.setPoreVolumes(0.2 * i);
                pt.setRelativeConcentration(ogataBanks(0.2 * i, trueP, trueR));
                t.getPoints().add(pt);
            }
            f.document.execute(AddCommand.create(f.document.domain(), f.document.project(), p.getProject_ColumnTests(), t));
            SashForm host = new SashForm(f.gui.shell, SWT.VERTICAL);
            CalibrationView view = new CalibrationView(host, f.documents);
            f.gui.shell.layout(true, true);
            f.gui.flush();
            // the synthetic test is the second one (after the example's)
            org.eclipse.swt.widgets.Combo testCombo = eluvia.ui.internal.Gui.find(host, org.eclipse.swt.widgets.Combo.class,
                    combo -> combo.indexOf(t.getName()) >= 0);
            testCombo.select(testCombo.indexOf(t.getName()));
            testCombo.notifyListeners(SWT.Selection, null);
            view.modelCombo().select(ColumnTestFit.Model.SEMI_INFINITE_EQUILIBRIUM.ordinal());
            view.startFit();
            f.gui.waitUntil("the fit", () -> view.result() != null && view.job().getState() == org.eclipse.core.runtime.jobs.Job.NONE);
            ColumnFitResult fit = view.result();
            assertNotNull(fit, view.statusText());
            // noise-free data of the model fitted: the parameters come back (fitter's own tolerance is finer)
            assertEquals(trueR, fit.parameter("R").value(), 1e-3 * trueR);
            assertEquals(trueP, fit.parameter("P").value(), 1e-2 * trueP);
            f.gui.flush();
            assertNotNull(view.curveCanvas().chart(), "measured and fitted curve drawn");
            f.gui.shell.setSize(1280, 860);
            f.gui.flush();
            f.gui.screenshot("calibration-view");

            double kdBefore = c.getKdLitresPerKg();
            boolean enteredBefore = c.isKdEntered();
            DispersivityRule ruleBefore = layer.getDispersivityRule();
            double alphaBefore = layer.getDispersivityMetres();
            assertTrue(view.acceptFit());
            // R = 1 + rho_b Kd / theta with the column's rho_b and theta (REFERENCES.md), through the transport formula
            assertEquals(fit.parameter("R").value(), TransportProperties.retardation(1600, c.getKdLitresPerKg(), 0.35), 1e-12);
            assertTrue(c.isKdEntered());
            // D = v L / P = alpha_L v + tau D0 (REFERENCES.md) with the column's v = q / theta and tau of a saturated
            // column (Millington and Quirk, n = theta), evaluated here: alpha_L = (v L / P - tau D0) / v
            double v = 0.5 / 0.35;
            double tau = Math.pow(0.35, 7.0 / 3) / (0.35 * 0.35);
            double d0 = c.getDiffusionSquareMetresPerSecond() * 86400;
            assertEquals((v * 0.3 / fit.parameter("P").value() - tau * d0) / v, layer.getDispersivityMetres(), 1e-15);
            assertEquals(DispersivityRule.ENTERED, layer.getDispersivityRule());
            f.document.undo();
            assertEquals(kdBefore, c.getKdLitresPerKg());
            assertEquals(enteredBefore, c.isKdEntered());
            assertEquals(ruleBefore, layer.getDispersivityRule());
            assertEquals(alphaBefore, layer.getDispersivityMetres());
        }
    }
}
