package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The inverses that read a column fit's R and P back as Kd and dispersivity: they undo the forward
 * formulas of {@link TransportProperties} and {@link LayerTransport}, match values worked by hand
 * from REFERENCES.md, and reject what they cannot invert, naming the quantity and its range.
 */
final class TransportPropertyInversesTest {

    @Test
    void kdFromTheRetardationCheckValue() {
        // REFERENCES.md [COMP] retardation check: rho_b = 1.6 kg/L, theta = 0.3, Koc = 59 L/kg, foc = 0.002
        // -> Kd = Koc foc = 0.118 L/kg, R = 1.6293 (given to 4 decimals: +-5e-5 in R is +-5e-5 x 0.3 / 1.6 = 9.4e-6 in Kd)
        assertEquals(0.118, TransportProperties.kdFromRetardationLitresPerKg(1.6293, 1600, 0.3), 1e-5);
        // by hand from Kd = (R - 1) theta / rho_b: 0.6293 x 0.3 / 1.6 = 0.18879 / 1.6 = 0.11799375 L/kg
        assertEquals(0.11799375, TransportProperties.kdFromRetardationLitresPerKg(1.6293, 1600, 0.3), 1e-15);
        // no retardation, no sorption (definition of R)
        assertEquals(0.0, TransportProperties.kdFromRetardationLitresPerKg(1, 1800, 0.25), 0);
    }

    @Test
    void dispersivityFromTheAdvectionDispersionCheckValue() {
        // REFERENCES.md [COMP] check case: v = 1 m/d, D = 0.1 m2/d, x = L = 1 m, so P = v L / D = 10.
        // All of D mechanical (D = alpha_L v): alpha_L = L / P = 0.1 m, by hand.
        assertEquals(0.1, TransportProperties.dispersivityFromPecletMetres(10, 1), 1e-16);
        assertEquals(0.1, TransportProperties.dispersivityFromPecletMetres(10, 1, 1, 0.7368, 0), 1e-16);
        // With diffusion: tau = 0.7368 (REFERENCES.md [COMP] Millington-Quirk, theta = n = 0.40) and
        // D0 = 1e-9 m2/s (REFERENCES.md: common practice for small solutes). By hand:
        // tau D0 = 0.7368 x 1e-9 m2/s x 86,400 s/d = 6.365952e-5 m2/d;
        // alpha_L = (v L / P - tau D0) / v = (0.1 - 0.00006365952) / 1 = 0.09993634048 m.
        assertEquals(0.09993634048, TransportProperties.dispersivityFromPecletMetres(10, 1, 1, 0.7368, 1e-9), 1e-15);
        // by hand: v L / (tau D0) = 1 / 6.365952e-5 = 15708.6 (to 6 figures)
        assertEquals(15708.6, TransportProperties.diffusionOnlyPeclet(1, 1, 0.7368, 1e-9), 0.05);
        assertEquals(Double.POSITIVE_INFINITY, TransportProperties.diffusionOnlyPeclet(1, 1, 0.7368, 0), 0);
        assertEquals(Double.POSITIVE_INFINITY, TransportProperties.diffusionOnlyPeclet(1, 1, 0, 1e-9), 0);
    }

    @ParameterizedTest
    @CsvSource({ "1600, 0.118, 0.30", "1450, 0, 0.42", "1900, 12.5, 0.18", "1200, 0.004, 0.55" })
    void kdRoundTripsThroughTheRetardationFormula(double bulkDensityKgPerCubicMetre, double kdLitresPerKg,
            double waterContent) {
        double r = TransportProperties.retardation(bulkDensityKgPerCubicMetre, kdLitresPerKg, waterContent);
        // exact inverse of R = 1 + rho_b Kd / theta (REFERENCES.md): only rounding differs
        assertEquals(kdLitresPerKg,
                TransportProperties.kdFromRetardationLitresPerKg(r, bulkDensityKgPerCubicMetre, waterContent),
                1e-12 * Math.max(1, kdLitresPerKg));
    }

    @ParameterizedTest
    // thickness m, water content, porosity, Darcy flux m/d, dispersivity m, D0 m2/s
    @CsvSource({ "0.3, 0.35, 0.35, 0.5, 0.015, 1e-9", "2.0, 0.30, 0.40, 0.15, 0.2, 1e-9", "0.1, 0.40, 0.40, 0.01, 0.0005, 2e-9",
        "5.0, 0.25, 0.40, 0.05, 0.5, 0", "0.3, 0.35, 0.35, 0.5, 0, 1e-9" })
    void dispersivityRoundTripsThroughTheLayerTransport(double thicknessMetres, double waterContent, double porosity,
            double darcyFluxMetresPerDay, double dispersivityMetres, double diffusionSquareMetresPerSecond) {
        LayerTransport t = LayerTransport.of(new LayerFlushingInput(thicknessMetres, waterContent, porosity, 1600, 0.1,
                darcyFluxMetresPerDay, dispersivityMetres, diffusionSquareMetresPerSecond, 0));
        // the forward chain D = alpha_L v + tau D0, P = v L / D (REFERENCES.md) undone: only rounding differs
        double back = TransportProperties.dispersivityFromPecletMetres(t.peclet(), thicknessMetres,
                t.poreWaterVelocityMetresPerDay(), t.tortuosity(), diffusionSquareMetresPerSecond);
        assertEquals(dispersivityMetres, back, 1e-12 * Math.max(thicknessMetres, dispersivityMetres));
        assertTrue(t.peclet() <= TransportProperties.diffusionOnlyPeclet(thicknessMetres,
                t.poreWaterVelocityMetresPerDay(), t.tortuosity(), diffusionSquareMetresPerSecond) * (1 + 1e-12));
        if (diffusionSquareMetresPerSecond == 0) {
            // D = alpha_L v exactly: the short form L / P is the same inverse
            assertEquals(dispersivityMetres, TransportProperties.dispersivityFromPecletMetres(t.peclet(), thicknessMetres),
                    1e-12 * thicknessMetres);
        }
    }

    @Test
    void poreWaterVelocityIsDarcyFluxOverWaterContent() {
        // v = q / theta (REFERENCES.md, Symbols), by hand: 0.5 / 0.35 = 1.428571... m/d
        assertEquals(0.5 / 0.35, TransportProperties.poreWaterVelocityMetresPerDay(0.5, 0.35), 1e-15);
        assertEquals(1.4285714285714286, TransportProperties.poreWaterVelocityMetresPerDay(0.5, 0.35), 1e-15);
    }

    @Test
    void lessSpreadingThanDiffusionDeterminesNoDispersivity() {
        // v = 1 m/d, L = 1 m, tau D0 = 6.365952e-5 m2/d (as above): the diffusion-only Peclet number is 15708.6
        TransportInputException e = assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(20_000, 1, 1, 0.7368, 1e-9));
        assertEquals("Peclet number (-)", e.quantity());
        assertEquals("20000.0", e.value());
        assertTrue(e.allowedRange().contains("15708.") && e.allowedRange().contains("diffusion"), e.allowedRange());
        // just below the limit the mechanical part is small but real
        double limit = TransportProperties.diffusionOnlyPeclet(1, 1, 0.7368, 1e-9);
        assertTrue(TransportProperties.dispersivityFromPecletMetres(limit * 0.99, 1, 1, 0.7368, 1e-9) > 0);
        // at the limit: a dispersivity of 0 (the rounding of v L / P - tau D0 is not reported as negative)
        assertEquals(0.0, TransportProperties.dispersivityFromPecletMetres(limit, 1, 1, 0.7368, 1e-9), 1e-18);
    }

    @Test
    void inversesRejectBadInputsNamingTheQuantity() {
        assertEquals("retardation factor (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromRetardationLitresPerKg(0.5, 1600, 0.3)).quantity());
        assertEquals("retardation factor (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromRetardationLitresPerKg(Double.NaN, 1600, 0.3)).quantity());
        assertEquals("retardation factor (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromRetardationLitresPerKg(Double.POSITIVE_INFINITY, 1600, 0.3)).quantity());
        assertEquals("dry bulk density (kg/m3)", assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromRetardationLitresPerKg(2, 0, 0.3)).quantity());
        TransportInputException theta = assertThrows(TransportInputException.class,
                () -> TransportProperties.kdFromRetardationLitresPerKg(2, 1600, 30));
        assertEquals("water content (-)", theta.quantity());
        assertTrue(theta.getMessage().contains("30.0") && theta.getMessage().contains("between 0.0 and 1.0"),
                theta.getMessage());
        assertEquals("Peclet number (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(0, 0.3)).quantity());
        assertEquals("Peclet number (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(Double.POSITIVE_INFINITY, 0.3)).quantity());
        assertEquals("length (m)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(10, -1)).quantity());
        assertEquals("Peclet number (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(-3, 0.3, 1, 0.5, 1e-9)).quantity());
        assertEquals("length (m)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(10, 0, 1, 0.5, 1e-9)).quantity());
        assertEquals("pore-water velocity (m/day)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(10, 0.3, 0, 0.5, 1e-9)).quantity());
        assertEquals("tortuosity (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(10, 0.3, 1, 1.5, 1e-9)).quantity());
        assertEquals("diffusion coefficient (m2/s)", assertThrows(TransportInputException.class,
                () -> TransportProperties.dispersivityFromPecletMetres(10, 0.3, 1, 0.5, -1e-9)).quantity());
        assertEquals("Darcy flux (m/day)", assertThrows(TransportInputException.class,
                () -> TransportProperties.poreWaterVelocityMetresPerDay(0, 0.3)).quantity());
        assertEquals("water content (-)", assertThrows(TransportInputException.class,
                () -> TransportProperties.poreWaterVelocityMetresPerDay(0.1, 1)).quantity());
    }
}
