package eluvia.ui.internal.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.apache.commons.math3.special.Erf;
import org.eclipse.emf.edit.command.AddCommand;
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

    @Test
    void kdAndDispersivityAreReadBackFromTheFittedNumbers() {
        // REFERENCES.md [COMP] retardation check: rho_b = 1.6 kg/L, theta = 0.3, Kd = Koc foc = 59 x 0.002 = 0.118 L/kg
        double r = TransportProperties.retardation(1600, 0.118, 0.3);
        assertEquals(1.6293, r, 5e-5);
        assertEquals(0.118, Calibration.kdLitresPerKg(r, 0.3, 1600), 1e-12);
        // P = v L / D with D = alpha_L v (REFERENCES.md): alpha_L = L / P
        assertEquals(0.015, Calibration.dispersivityMetres(20, 0.3), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Calibration.kdLitresPerKg(0.5, 0.3, 1600));
        assertThrows(IllegalArgumentException.class, () -> Calibration.kdLitresPerKg(2, 1.2, 1600));
        assertThrows(IllegalArgumentException.class, () -> Calibration.kdLitresPerKg(2, 0.3, 0));
        assertThrows(IllegalArgumentException.class, () -> Calibration.dispersivityMetres(0, 0.3));
        assertThrows(IllegalArgumentException.class, () -> Calibration.dispersivityMetres(10, -1));
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
            assertEquals(0.3 / fit.parameter("P").value(), layer.getDispersivityMetres(), 1e-15);
            assertEquals(DispersivityRule.ENTERED, layer.getDispersivityRule());
            f.document.undo();
            assertEquals(kdBefore, c.getKdLitresPerKg());
            assertEquals(enteredBefore, c.isKdEntered());
            assertEquals(ruleBefore, layer.getDispersivityRule());
            assertEquals(alphaBefore, layer.getDispersivityMetres());
        }
    }
}
