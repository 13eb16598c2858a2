package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

final class TransportPropertiesTest {

    @Test
    void retardationFromKocMatchesCheckValue() {
        double kd = TransportProperties.kdFromKoc(59, 0.002);
        // REFERENCES.md [COMP]: rho_b = 1.6 kg/L, theta = 0.3, Koc = 59 L/kg, foc = 0.002 -> R = 1.6293
        // (computed from R = 1 + rho_b Kd / theta, Kd = Koc foc, Karickhoff et al. 1979)
        assertEquals(1.6293, TransportProperties.retardation(1600, kd, 0.3), 5e-5);
        // exact formula evaluated independently: 1 + 1.6 * 0.118 / 0.3
        assertEquals(1 + 1.6 * 0.118 / 0.3, TransportProperties.retardation(1600, kd, 0.3), 1e-14);
        // no sorption, no retardation (definition of R)
        assertEquals(1.0, TransportProperties.retardation(1800, 0, 0.25), 0);
    }

    @Test
    void millingtonQuirkMatchesCheckValues() {
        // REFERENCES.md [COMP]: Millington and Quirk (1961), theta = n = 0.40 -> 0.7368
        assertEquals(0.7368, TransportProperties.millingtonQuirkTortuosity(0.40, 0.40), 5e-5);
        // REFERENCES.md [COMP]: Millington and Quirk (1961), theta = 0.25, n = 0.40 -> 0.2461
        assertEquals(0.2461, TransportProperties.millingtonQuirkTortuosity(0.25, 0.40), 5e-5);
    }

    @Test
    void dispersionIsMechanicalPlusDiffusive() {
        // exact formula D = alpha v + tau D0 evaluated independently: 0.05 m * 0.4 m/d + 0.5 * 1e-9 m2/s * 86400 s/d
        assertEquals(0.05 * 0.4 + 0.5 * 1e-9 * 86400,
                TransportProperties.dispersionSquareMetresPerDay(0.05, 0.4, 0.5, 1e-9), 1e-16);
    }

    @Test
    void layerTransportDerivesEveryGroup() {
        LayerFlushingInput in = new LayerFlushingInput(2.0, 0.30, 0.40, 1600, 0.118, 0.15, 0.2, 1e-9, 0.01);
        LayerTransport t = LayerTransport.of(in);
        double v = 0.15 / 0.30; // v = q / theta
        double tau = Math.pow(0.30, 7.0 / 3) / (0.40 * 0.40); // Millington and Quirk (1961)
        double d = 0.2 * v + tau * 1e-9 * 86400; // D = alpha v + tau D0
        // exact formulas of REFERENCES.md (Symbols) evaluated independently in the test
        assertEquals(1 + 1.6 * 0.118 / 0.30, t.retardation(), 1e-14);
        assertEquals(v, t.poreWaterVelocityMetresPerDay(), 1e-15);
        assertEquals(tau, t.tortuosity(), 1e-15);
        assertEquals(d, t.dispersionSquareMetresPerDay(), 1e-15);
        assertEquals(v * 2.0 / d, t.peclet(), 1e-12); // P = v L / D
        assertEquals(0.01 * 2.0 * 0.30 / 0.15, t.decayPerPoreVolume(), 1e-15); // k = mu theta L / q
    }

    @Test
    void noDispersionGivesInfinitePecletAndPlugFlow() {
        LayerFlushingInput in = new LayerFlushingInput(1.0, 0.3, 0.35, 1500, 0.2, 0.1, 0, 0, 0);
        LayerTransport t = LayerTransport.of(in);
        assertEquals(Double.POSITIVE_INFINITY, t.peclet(), 0); // P = v L / D with D = 0
        FlushingModel model = FlushingModels.finiteLayer(t);
        assertEquals("plug-flow", model.name());
        double r = t.retardation();
        PoreVolumeResult res = PoreVolumeSearch.solve(model, CleanupCriterion.EFFLUENT, 0.01, 100);
        // plug flow: the front reaches the outlet after R pore volumes (REFERENCES.md, P -> infinity gives T -> R)
        assertEquals(r, res.poreVolumes(), 1e-9 * r);
        for (CleanupCriterion c : CleanupCriterion.values()) {
            for (double pv = 0; pv < 3 * r; pv += 0.1) {
                double f = model.remainingFraction(c, pv);
                assertTrue(f >= 0 && f <= 1, c + " at " + pv + ": " + f);
            }
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 4, 5, 6, 7, 8})
    void everyInputFieldIsValidated(int field) {
        double[] good = {2.0, 0.30, 0.40, 1600, 0.1, 0.15, 0.2, 1e-9, 0.01};
        String[] names = {"layer thickness (m)", "water content (-)", "porosity (-)", "dry bulk density (kg/m3)",
            "Kd (L/kg)", "Darcy flux (m/day)", "dispersivity (m)", "diffusion coefficient (m2/s)",
            "decay rate (1/day)" };
        // zero is allowed for Kd, dispersivity, diffusion and decay; everything else must be positive
        boolean zeroAllowed = field == 4 || field == 6 || field == 7 || field == 8;
        double[][] bad = zeroAllowed ? new double[][] {{-1e-3}, {Double.NaN}, {Double.POSITIVE_INFINITY}}
                : new double[][] {{0}, {-1}, {Double.NaN}, {Double.POSITIVE_INFINITY}};
        for (double[] b : bad) {
            double[] v = good.clone();
            v[field] = b[0];
            TransportInputException e = assertThrows(TransportInputException.class, () -> build(v));
            assertEquals(names[field], e.quantity());
            assertTrue(e.getMessage().contains(String.valueOf(b[0])), e.getMessage());
        }
    }

    @Test
    void waterContentCannotExceedPorosityAndPorosityBelowOne() {
        TransportInputException e = assertThrows(TransportInputException.class,
                () -> new LayerFlushingInput(1, 0.45, 0.40, 1600, 0, 0.1, 0.1, 0, 0));
        assertEquals("water content (-)", e.quantity());
        assertTrue(e.allowedRange().contains("0.4"), e.allowedRange());
        e = assertThrows(TransportInputException.class,
                () -> new LayerFlushingInput(1, 0.3, 1.0, 1600, 0, 0.1, 0.1, 0, 0));
        assertEquals("porosity (-)", e.quantity());
        // a percentage instead of a fraction
        e = assertThrows(TransportInputException.class,
                () -> new LayerFlushingInput(1, 30, 40, 1600, 0, 0.1, 0.1, 0, 0));
        assertEquals("porosity (-)", e.quantity());
    }

    @Test
    void propertyFunctionsRejectBadInputs() {
        assertEquals("dry bulk density (kg/m3)", assertThrows(TransportInputException.class,
                () -> TransportProperties.retardation(0, 0.1, 0.3)).quantity());
        assertEquals("Kd (L/kg)", assertThrows(TransportInputException.class,
                () -> TransportProperties.retardation(1600, -0.1, 0.3)).quantity());
        assertEquals("water content (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.retardation(1600, 0.1, 0)).quantity());
        assertEquals("water content (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.millingtonQuirkTortuosity(0.5, 0.4)).quantity());
        assertEquals("porosity (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.millingtonQuirkTortuosity(0.2, 0)).quantity());
        assertEquals("Koc (L/kg)", assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromKoc(-1, 0.01)).quantity());
        assertEquals("organic carbon fraction (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromKoc(59, 2)).quantity());
        assertEquals("dispersivity (m)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersionSquareMetresPerDay(-1, 1, 0.5, 1e-9)).quantity());
        assertEquals("pore-water velocity (m/day)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersionSquareMetresPerDay(0.1, Double.NaN, 0.5, 1e-9)).quantity());
        assertEquals("tortuosity (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersionSquareMetresPerDay(0.1, 1, 1.5, 1e-9)).quantity());
        assertEquals("diffusion coefficient (m2/s)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersionSquareMetresPerDay(0.1, 1, 0.5, -1e-9)).quantity());
    }

    @Test
    void layerTransportRejectsBadDirectInputs() {
        assertEquals("retardation factor (-)", assertThrows(TransportInputException.class,
                () -> new LayerTransport(0.5, 1, 0.5, 0.1, 10, 0)).quantity());
        assertEquals("pore-water velocity (m/day)", assertThrows(TransportInputException.class,
                () -> new LayerTransport(1, 0, 0.5, 0.1, 10, 0)).quantity());
        assertEquals("tortuosity (-)", assertThrows(TransportInputException.class,
                () -> new LayerTransport(1, 1, -0.5, 0.1, 10, 0)).quantity());
        assertEquals("dispersion coefficient (m2/day)", assertThrows(TransportInputException.class,
                () -> new LayerTransport(1, 1, 0.5, -0.1, 10, 0)).quantity());
        assertEquals("Peclet number (-)", assertThrows(TransportInputException.class,
                () -> new LayerTransport(1, 1, 0.5, 0.1, 0, 0)).quantity());
        assertEquals("decay per pore volume (-)", assertThrows(TransportInputException.class,
                () -> new LayerTransport(1, 1, 0.5, 0.1, 10, -1)).quantity());
    }

    private static LayerFlushingInput build(double[] v) {
        return new LayerFlushingInput(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8]);
    }
}
