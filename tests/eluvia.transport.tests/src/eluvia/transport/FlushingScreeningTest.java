package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;

/** Invented scenario (not a real site): a 1.5 m silty sand layer flushed at 0.12 m/day. */
final class FlushingScreeningTest {
    private static final LayerFlushingInput LAYER =
            new LayerFlushingInput(1.5, 0.32, 0.40, 1650, 0.25, 0.12, 0.15, 1e-9, 0);

    @Test
    void durationAndWaterFollowFromThePoreVolumes() {
        FlushingEstimate e = FlushingScreening.estimate(LAYER, CleanupCriterion.MEAN_RESIDUAL, 0.05,
                OptionalDouble.of(400), 200);
        assertTrue(e.result().reachable());
        double t = e.result().poreVolumes();
        // definitions: one pore volume theta L; duration T theta L / q; water T theta L A
        assertEquals(0.32 * 1.5, e.onePoreVolumeCubicMetresPerSquareMetre(), 1e-15);
        assertEquals(t * 0.32 * 1.5 / 0.12, e.durationDays(), 1e-12 * e.durationDays());
        assertEquals(t * 0.32 * 1.5 * 400, e.waterVolumeCubicMetres().getAsDouble(), 1e-9);
        assertEquals("finite-layer", e.modelName());
        double r = e.transport().retardation();
        // REFERENCES.md: batch flush T = -R ln(C/C0)
        assertEquals(-r * Math.log(0.05), e.wellMixedPoreVolumes(), 1e-12 * e.wellMixedPoreVolumes());
        // plug flow mean (1 - T/R) = 0.05
        assertEquals(0.95 * r, e.plugFlowPoreVolumes(), 1e-9 * r);
        // the exact answer lies between the plug-flow and the well-mixed estimates (common practice)
        assertTrue(t > e.plugFlowPoreVolumes() && t < e.wellMixedPoreVolumes(), t + " " + e);
        // the same search done by hand
        assertEquals(PoreVolumeSearch.solve(FlushingModels.finiteLayer(LayerTransport.of(LAYER)),
                CleanupCriterion.MEAN_RESIDUAL, 0.05, 200).poreVolumes(), t, 0);
    }

    @Test
    void anotherModelCanBeChosen() {
        FlushingModel two = FlushingModels.twoRegion(LayerTransport.of(LAYER),
                TwoRegionParameters.physical(LAYER, 0.7, 0.5, 0.005));
        FlushingEstimate e = FlushingScreening.estimate(LAYER, two, CleanupCriterion.MEAN_RESIDUAL, 0.05,
                OptionalDouble.of(400), 500);
        FlushingEstimate eq = FlushingScreening.estimate(LAYER, CleanupCriterion.MEAN_RESIDUAL, 0.05,
                OptionalDouble.of(400), 500);
        assertEquals("two-region", e.modelName());
        // common practice (DESIGN.md): nonequilibrium tails need more pore volumes than equilibrium
        assertTrue(e.result().poreVolumes() > eq.result().poreVolumes(), e.result() + " " + eq.result());
        assertEquals(eq.wellMixedPoreVolumes(), e.wellMixedPoreVolumes(), 0);
        assertEquals("flushing model", assertThrows(TransportInputException.class,
                () -> FlushingScreening.estimate(LAYER, null, CleanupCriterion.EFFLUENT, 0.1, OptionalDouble.empty(), 10))
                .quantity());
    }

    @Test
    void withoutAreaThereIsNoWaterVolume() {
        FlushingEstimate e = FlushingScreening.estimate(LAYER, CleanupCriterion.EFFLUENT, 0.01, OptionalDouble.empty(), 200);
        assertFalse(e.waterVolumeCubicMetres().isPresent());
    }

    @Test
    void unreachableGivesNaNDuration() {
        FlushingEstimate e = FlushingScreening.estimate(LAYER, CleanupCriterion.MAX_RESIDUAL, 1e-8, OptionalDouble.of(10), 3);
        assertFalse(e.result().reachable());
        assertTrue(Double.isNaN(e.durationDays()));
        assertTrue(Double.isNaN(e.waterVolumeCubicMetres().getAsDouble()));
    }

    @Test
    void badInputsAreRefused() {
        assertEquals("treated area (m2)", assertThrows(TransportInputException.class,
                () -> FlushingScreening.estimate(LAYER, CleanupCriterion.EFFLUENT, 0.01, OptionalDouble.of(0), 100))
                .quantity());
        assertEquals("treated area (m2)", assertThrows(TransportInputException.class,
                () -> FlushingScreening.estimate(LAYER, CleanupCriterion.EFFLUENT, 0.01, null, 100)).quantity());
        assertEquals("layer", assertThrows(TransportInputException.class,
                () -> FlushingScreening.estimate(null, CleanupCriterion.EFFLUENT, 0.01, OptionalDouble.empty(), 100))
                .quantity());
        assertEquals("target fraction", assertThrows(TransportInputException.class,
                () -> FlushingScreening.estimate(LAYER, CleanupCriterion.EFFLUENT, 2, OptionalDouble.empty(), 100))
                .quantity());
        assertEquals("cleanup criterion", assertThrows(TransportInputException.class,
                () -> FlushingScreening.estimate(LAYER, null, 0.1, OptionalDouble.empty(), 100)).quantity());
    }
}
