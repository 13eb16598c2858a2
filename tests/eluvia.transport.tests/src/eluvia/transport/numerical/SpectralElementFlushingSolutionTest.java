package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;
import eluvia.transport.internal.FiniteLayerModel;

/**
 * The spectral-element solution against independent references: the exact finite-layer series
 * (Brenner 1962) for one layer, with the exponential convergence in the degree expected of the
 * spectral element method (Patera 1984); for layered columns, the modal finite-volume solution
 * on fine grids extrapolated by Richardson (second order, so a different discretisation) and a
 * Commons Math 3.6.1 Dormand-Prince method-of-lines solve; and the exact identities of mass,
 * decay and inflow.
 */
final class SpectralElementFlushingSolutionTest {
    private static final double R = 2;

    /** 1 m, theta 0.3, R = 2, q = 0.1 m/day, dispersivity 1/P m, initially 1 mg/L. */
    private static FlushingColumn column(double peclet) {
        SoilLayer layer = Columns.sand(1, 1 / peclet).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R))).build();
        return FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
    }

    /** Two invented layers of different thickness, sorption, dispersivity and initial pore water. */
    private static FlushingColumn twoLayers(double inflow) {
        SoilLayer top = Columns.sand(0.6, 0.05).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(3))).build();
        SoilLayer bottom = Columns.sand(0.9, 0.15).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(1.5)))
                .build();
        return new FlushingColumn(List.of(top, bottom), 0.1, inflow, InitialCondition.poreWaterPerLayer(2, 0.5));
    }

    private static double exactPoreVolumes(double peclet, double target, CleanupCriterion criterion) {
        FiniteLayerModel exact = new FiniteLayerModel(R, peclet, 0);
        return new BrentSolver(1e-14, 1e-14).solve(10_000, t -> exact.remainingFraction(criterion, t) - target, 1e-3,
                1000);
    }

    @Test
    void convergesExponentiallyToTheBrennerSeries() {
        // reference: exact finite-layer series (Brenner 1962), root by Commons Math BrentSolver
        for (double peclet : new double[] { 1, 10, 30 }) {
            double exact = exactPoreVolumes(peclet, 0.01, CleanupCriterion.EFFLUENT);
            double previous = Double.NaN;
            for (int degree = 3; degree <= 7; degree += 2) {
                double error = Math.abs(SpectralElementFlushingSolution.of(column(peclet), degree)
                        .poreVolumesToTarget(CleanupCriterion.EFFLUENT, 0.01, 1000).poreVolumes() / exact - 1);
                if (!Double.isNaN(previous) && previous > 1e-11) {
                    // spectral convergence: two degrees more gain at least a factor 10 (second-order
                    // finite volumes would need three times the cells for that)
                    assertTrue(error < previous / 10 || error < 1e-11,
                            "P = " + peclet + ", degree " + degree + ": " + error + " after " + previous);
                }
                previous = error;
            }
            double atDefault = SpectralElementFlushingSolution.of(column(peclet))
                    .poreVolumesToTarget(CleanupCriterion.EFFLUENT, 0.01, 1000).poreVolumes();
            assertEquals(exact, atDefault, 1e-8 * exact, "P = " + peclet);
        }
    }

    @Test
    void allThreeCriteriaMatchTheBrennerSeriesAlongTheCurve() {
        // reference: exact finite-layer series (Brenner 1962) for effluent, mean and maximum residual
        FiniteLayerModel exact = new FiniteLayerModel(R, 10, 0);
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution.of(column(10), 12);
        for (double pv : new double[] { 0.5, 1, 2, 4, 8 }) {
            for (CleanupCriterion c : CleanupCriterion.values()) {
                // the maximum is read at the points; for one layer it sits at the outlet, a point.
                // Early on the clean inflow meets the contaminated soil in a sharp front, which
                // polynomials resolve last: 1e-6 before one pore volume, 1e-8 after
                assertEquals(exact.remainingFraction(c, pv), s.remainingFraction(c, pv), pv < 1 ? 1e-6 : 1e-8,
                        c + " at " + pv);
            }
        }
    }

    @Test
    void layeredColumnMatchesExtrapolatedFiniteVolumes() {
        // reference: ModalFlushingSolution (second-order finite volumes, exact in time) at 200 and
        // 400 cells per layer, Richardson-extrapolated (error estimate far below the tolerance)
        FlushingColumn col = twoLayers(0);
        SolverSettings grid = SolverSettings.builder().minimumCellsPerLayer(200).maximumCellPeclet(1).build();
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution.of(col, 10);
        for (CleanupCriterion c : new CleanupCriterion[] { CleanupCriterion.EFFLUENT, CleanupCriterion.MEAN_RESIDUAL }) {
            ExtrapolatedTarget fv = ModalFlushingSolution.extrapolatedPoreVolumesToTarget(col, grid, c, 0.01, 1000);
            assertTrue(fv.errorEstimatePoreVolumes() < 1e-5 * fv.poreVolumes(), "estimate " + fv.errorEstimatePoreVolumes());
            double spectral = s.poreVolumesToTarget(c, 0.01, 1000).poreVolumes();
            assertEquals(fv.poreVolumes(), spectral, 2e-6 * spectral, c.toString());
        }
    }

    @Test
    void layeredProfileMatchesTheMethodOfLines() {
        // reference: Commons Math 3.6.1 DormandPrince853 on 80 finite-volume cells per layer
        // (MethodOfLinesReference, relative tolerance 1e-10): second-order space error of order 1e-4
        FlushingColumn col = twoLayers(0);
        int perLayer = 80;
        MethodOfLinesReference mol = new MethodOfLinesReference(col.layers(), perLayer, col.darcyFluxMetresPerDay(), 0);
        double[] start = new double[2 * perLayer];
        for (int i = 0; i < start.length; i++) {
            start[i] = i < perLayer ? 2 : 0.5;
        }
        double[] y0 = mol.initialState(start);
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution.of(col, 10);
        double[] depth = s.pointDepthsMetres();
        for (double days : new double[] { 2, 8, 20 }) {
            double[] y = mol.stateAtDays(y0, days, 1e-10);
            double[] c = s.poreWaterMilligramsPerLitre(days);
            // effluent: the last cell centre is half a cell above the outlet, where the gradient is zero
            double outletStorage = 0.3 * 1.5;
            assertEquals(y[start.length - 1] / outletStorage, s.effluentMilligramsPerLitre(days), 2e-4, days + " days");
            assertEquals(c[c.length - 1], s.effluentMilligramsPerLitre(days), 1e-12);
            // an inner point of each layer against the cell profile interpolated to its depth
            double[] centres = new double[start.length];
            double[] water = new double[start.length];
            for (int i = 0; i < start.length; i++) {
                boolean upper = i < perLayer;
                centres[i] = upper ? (i + 0.5) * 0.6 / perLayer : 0.6 + (i - perLayer + 0.5) * 0.9 / perLayer;
                water[i] = y[i] / (0.3 * (upper ? 3 : 1.5));
            }
            for (int g : new int[] { 3, depth.length - 4 }) {
                assertEquals(Columns.at(centres, water, depth[g]), c[g], 2e-3 * c[g] + 1e-4, "point " + g + " at " + days);
            }
        }
    }

    @Test
    void massLeavesOnlyThroughTheOutlet() {
        // mass balance of the exact solution: stored(0) - stored(t) = integral of q C_out dt
        // (clean inflow, no decay); integral by Commons Math 3.6.1 IterativeLegendreGaussIntegrator
        FlushingColumn col = twoLayers(0);
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution.of(col);
        double q = col.darcyFluxMetresPerDay();
        double t = 25;
        double out = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-14).integrate(100_000,
                d -> q * s.effluentMilligramsPerLitre(d) * 1000, 0, t);
        // initial mass by hand: theta R C0 h per layer, 0.3 x 3 x 2 x 0.6 + 0.3 x 1.5 x 0.5 x 0.9 = 1.2825 mg/L m
        double stored0 = s.storedMilligramsPerSquareMetre(0);
        assertEquals(1282.5, stored0, 1e-9);
        assertEquals(stored0 - s.storedMilligramsPerSquareMetre(t), out, 1e-9 * stored0);
    }

    @Test
    void equalDecayInEveryPhaseScalesTheSolutionByExpMinusMuT() {
        // the same first-order rate mu in water and on solids: C(t) = exp(-mu t) C_without_decay(t)
        double mu = 0.07;
        SoilLayer decaying = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R)))
                .decayInWaterPerDay(mu).decayOnSolidsPerDay(mu).build();
        FlushingColumn col = FlushingColumn.singleLayer(decaying, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
        SpectralElementFlushingSolution with = SpectralElementFlushingSolution.of(col);
        SpectralElementFlushingSolution without = SpectralElementFlushingSolution.of(column(10));
        for (double d : new double[] { 1, 5, 10, 30 }) {
            assertEquals(Math.exp(-mu * d) * without.effluentMilligramsPerLitre(d), with.effluentMilligramsPerLitre(d),
                    1e-12);
        }
    }

    @Test
    void contaminatedInflowApproachesItsConcentration() {
        // steady state with inflow C_in and no decay: C = C_in everywhere (conservation, common practice)
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution.of(twoLayers(0.4));
        for (double c : s.poreWaterMilligramsPerLitre(1e5)) {
            // a constant c is exp(-phi) in u, which the degree-8 polynomials represent to about 1e-8
            assertEquals(0.4, c, 1e-7);
        }
        // and a column already at the inflow concentration stays there
        SoilLayer layer = Columns.sand(1, 0.2).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R))).build();
        SpectralElementFlushingSolution level = SpectralElementFlushingSolution
                .of(FlushingColumn.singleLayer(layer, 0.1, 0.4, InitialCondition.poreWaterPerLayer(0.4)));
        for (double d : new double[] { 0, 1, 10 }) {
            assertEquals(0.4, level.effluentMilligramsPerLitre(d), 1e-7);
        }
    }

    @Test
    void soilInitialConditionGivesTheSamePoreWater() {
        // 10 mg/kg total in a layer with R = 2: pore water C = 10 / ((theta + rho_b Kd) / rho_b)
        // = 10 x 1.6 / 0.6 = 26.67 mg/L (linear isotherm, by hand)
        SoilLayer layer = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(R))).build();
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution
                .of(FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.soilPerLayer(10)));
        assertEquals(10 * 1.6 / 0.6, s.effluentMilligramsPerLitre(0), 1e-9);
        assertEquals(1.0, s.remainingFraction(CleanupCriterion.MAX_RESIDUAL, 0), 1e-12);
    }

    @Test
    void elementsFollowTheLayerPecletNumber() {
        // P = 30 in one layer: ceil(30 / 10) = 3 elements; degree 5: 3 x 5 + 1 = 16 points
        SpectralElementFlushingSolution s = SpectralElementFlushingSolution.of(column(30), 5);
        assertEquals(3, s.elementCount());
        assertEquals(16, s.pointCount());
        double[] z = s.pointDepthsMetres();
        assertEquals(0, z[0], 0);
        assertEquals(1, z[z.length - 1], 1e-15);
        // two layers of P = 12 and 6: 2 + 1 elements
        assertEquals(3, SpectralElementFlushingSolution.of(twoLayers(0), 4).elementCount());
    }

    @Test
    void columnsItCannotTakeAreRefusedWithTheReason() {
        SoilLayer freundlich = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.freundlich(0.5, 0.8)).build();
        TransportInputException e = assertThrows(TransportInputException.class, () -> SpectralElementFlushingSolution
                .of(FlushingColumn.singleLayer(freundlich, 0.1, 0, InitialCondition.poreWaterPerLayer(1))));
        assertEquals("sorption of layer 1", e.quantity());
        assertTrue(e.getMessage().contains("implicit solver"), e.getMessage());
        SoilLayer twoRegion = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(0.2)).mobileWaterFraction(0.6)
                .massTransferRatePerDay(0.1).build();
        assertEquals("sorption of layer 1", assertThrows(TransportInputException.class, () -> SpectralElementFlushingSolution
                .of(FlushingColumn.singleLayer(twoRegion, 0.1, 0, InitialCondition.poreWaterPerLayer(1)))).quantity());
        SoilLayer plug = Columns.sand(1, 0).isotherm(SorptionIsotherm.linear(0.2)).build();
        assertEquals("dispersion term of layer 1 (m2/day)", assertThrows(TransportInputException.class,
                () -> SpectralElementFlushingSolution
                        .of(FlushingColumn.singleLayer(plug, 0.1, 0, InitialCondition.poreWaterPerLayer(1)))).quantity());
        // P = 200: exp(100) spread, far above the limit
        TransportInputException wide = assertThrows(TransportInputException.class,
                () -> SpectralElementFlushingSolution.of(column(200)));
        assertTrue(wide.quantity().startsWith("spread of the spectral-element scale"), wide.quantity());
        assertEquals("degree of the spectral elements (dimensionless)",
                assertThrows(TransportInputException.class, () -> SpectralElementFlushingSolution.of(column(10), 1))
                        .quantity());
        assertEquals("initial condition", assertThrows(TransportInputException.class,
                () -> SpectralElementFlushingSolution.of(new FlushingColumn(List.of(Columns.sand(1, 0.1).build()), 0.1, 0,
                        InitialCondition.poreWaterPerCell(1, 1, 1)))).quantity());
    }
}
