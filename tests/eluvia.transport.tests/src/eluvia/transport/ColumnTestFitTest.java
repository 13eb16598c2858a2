package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Column calibration on synthetic curves: invented column tests (not measured data) made from
 * known parameters with the bundle's own forward models plus seeded Gaussian noise
 * (java.util.Random), so the true values are known exactly.
 */
final class ColumnTestFitTest {

    private static List<ColumnObservation> synthetic(ColumnTestFit.Curve curve, ColumnTestFit.Model model, double[] truth,
            double from, double to, int n, double noise, long seed) {
        Random random = new Random(seed);
        List<ColumnObservation> data = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double t = from + (to - from) * i / (n - 1);
            double c = ColumnTestFit.predict(curve, model, truth, t) + noise * random.nextGaussian();
            data.add(new ColumnObservation(t, c));
        }
        return data;
    }

    @Test
    void recoversEquilibriumParametersInsideTheirIntervals() {
        double[] truth = {2.3, 15};
        for (ColumnTestFit.Model model : new ColumnTestFit.Model[] {ColumnTestFit.Model.FINITE_EQUILIBRIUM,
            ColumnTestFit.Model.SEMI_INFINITE_EQUILIBRIUM }) {
            List<ColumnObservation> data = synthetic(ColumnTestFit.Curve.BREAKTHROUGH, model, truth, 0.2, 6, 40, 0.005, 7);
            ColumnFitResult fit = ColumnTestFit.fit(data, ColumnTestFit.Curve.BREAKTHROUGH, model);
            assertEquals(38, fit.degreesOfFreedom());
            for (int j = 0; j < 2; j++) {
                ColumnFitResult.FittedParameter p = fit.parameters().get(j);
                assertTrue(p.lower95() <= truth[j] && truth[j] <= p.upper95(), model + " " + p);
                assertTrue(p.identifiable(), p.toString());
                assertTrue(p.standardError() < 0.1 * p.value(), p.toString());
            }
            // the residual spread recovers the noise level put in (0.005) within sampling scatter
            assertEquals(0.005, fit.rootMeanSquareResidual(), 0.0025);
            assertTrue(fit.warnings().isEmpty(), fit.warnings().toString());
        }
    }

    @Test
    void intervalsCoverTheTruthAtAboutTheirNominalRate() {
        // 20 independent seeds: a 95 % interval that misses in more than 5 (binomial tail below 0.3 %) is wrong
        double[] truth = {1.8, 25};
        int misses = 0;
        for (long seed = 100; seed < 120; seed++) {
            List<ColumnObservation> data = synthetic(ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_EQUILIBRIUM,
                    truth, 0.3, 4, 30, 0.01, seed);
            ColumnFitResult fit = ColumnTestFit.fit(data, ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_EQUILIBRIUM);
            ColumnFitResult.FittedParameter r = fit.parameter("R");
            if (r.lower95() > truth[0] || r.upper95() < truth[0]) {
                misses++;
            }
        }
        assertTrue(misses <= 5, "misses " + misses);
    }

    @Test
    void recoversTwoRegionParametersFromAnElutionCurve() {
        double[] truth = {3, 20, 0.5, 0.8};
        List<ColumnObservation> data = synthetic(ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_TWO_REGION, truth,
                0.25, 15, 60, 0.003, 11);
        ColumnFitResult fit = ColumnTestFit.fit(data, ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_TWO_REGION,
                new double[] {2.5, 10, 0.6, 0.5});
        for (int j = 0; j < 4; j++) {
            ColumnFitResult.FittedParameter p = fit.parameters().get(j);
            assertTrue(p.lower95() <= truth[j] && truth[j] <= p.upper95(), p.toString());
        }
        assertEquals(60, fit.residuals().size());
    }

    @Test
    void saysWhenTheDataDoNotDetermineTheParameters() {
        // only the first, flat part of a breakthrough curve: the front has not arrived, nothing fixes P or R
        double[] truth = {4, 10};
        List<ColumnObservation> data = synthetic(ColumnTestFit.Curve.BREAKTHROUGH, ColumnTestFit.Model.FINITE_EQUILIBRIUM,
                truth, 0.1, 1.0, 12, 0.002, 3);
        ColumnFitResult fit = ColumnTestFit.fit(data, ColumnTestFit.Curve.BREAKTHROUGH,
                ColumnTestFit.Model.FINITE_EQUILIBRIUM, new double[] {3, 10});
        assertFalse(fit.warnings().isEmpty());
        assertTrue(fit.parameters().stream().anyMatch(p -> !p.identifiable()), fit.toString());
    }

    @Test
    void breakthroughIsOneMinusElution() {
        // linearity: a clean column fed with C0 plus a column at C0 flushed clean make a column at C0 throughout
        double[] x = {2, 12, 0.6, 1.5};
        for (double t : new double[] {0.5, 2, 5}) {
            assertEquals(1.0, ColumnTestFit.predict(ColumnTestFit.Curve.BREAKTHROUGH, ColumnTestFit.Model.FINITE_TWO_REGION, x, t)
                    + ColumnTestFit.predict(ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_TWO_REGION, x, t), 1e-15);
        }
        // the semi-infinite model is the Ogata-Banks solution at X = 1 (REFERENCES.md [COMP] 0.585289 at P = 10, T = 1)
        assertEquals(0.585289, ColumnTestFit.predict(ColumnTestFit.Curve.BREAKTHROUGH,
                ColumnTestFit.Model.SEMI_INFINITE_EQUILIBRIUM, new double[] {1, 10}, 1), 5e-7);
    }

    @Test
    void badInputsAreRefused() {
        List<ColumnObservation> two = List.of(new ColumnObservation(1, 0.5), new ColumnObservation(2, 0.9));
        assertEquals("number of column observations", assertThrows(TransportInputException.class,
                () -> ColumnTestFit.fit(two, ColumnTestFit.Curve.BREAKTHROUGH, ColumnTestFit.Model.FINITE_EQUILIBRIUM)).quantity());
        assertEquals("column curve", assertThrows(TransportInputException.class,
                () -> ColumnTestFit.fit(two, null, ColumnTestFit.Model.FINITE_EQUILIBRIUM)).quantity());
        assertEquals("number of parameters", assertThrows(TransportInputException.class,
                () -> ColumnTestFit.predict(ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_TWO_REGION,
                        new double[] {2, 10}, 1)).quantity());
        assertEquals("R (-)", assertThrows(TransportInputException.class,
                () -> ColumnTestFit.predict(ColumnTestFit.Curve.ELUTION, ColumnTestFit.Model.FINITE_EQUILIBRIUM,
                        new double[] {0.5, 10}, 1)).quantity());
        assertEquals("pore volumes of a column sample (-)", assertThrows(TransportInputException.class,
                () -> new ColumnObservation(-1, 0.5)).quantity());
        assertEquals("relative concentration C/C0 of a column sample (-)", assertThrows(TransportInputException.class,
                () -> new ColumnObservation(1, 35)).quantity());
    }
}
