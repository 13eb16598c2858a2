package eluvia.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

final class FluxLimitTest {

    @Test
    void comparesTheFluxWithKs() {
        // REFERENCES.md units: 1 cm/s = 864 m/day; a sand with Ks = 1e-3 cm/s has Ks = 0.864 m/day
        double ks = 1e-3 * 864;
        FluxLimit.Check ok = FluxLimit.check(0.1, ks);
        assertEquals(FluxLimit.Status.WITHIN, ok.status());
        assertEquals(0.1 / ks, ok.fluxOverConductivity(), 1e-15);
        assertEquals(FluxLimit.Status.NEAR_LIMIT, FluxLimit.check(0.8, ks).status());
        FluxLimit.Check over = FluxLimit.check(1.0, ks);
        // unit-gradient infiltration cannot exceed Ks (Darcy's law with gradient 1)
        assertEquals(FluxLimit.Status.EXCEEDS, over.status());
        assertTrue(over.message().contains("0.864"), over.message());
        assertEquals(FluxLimit.Status.WITHIN, FluxLimit.require(0.1, ks).status());
    }

    @Test
    void refusesFluxAboveKsAndBadInputs() {
        TransportInputException e = assertThrows(TransportInputException.class, () -> FluxLimit.require(2, 1));
        assertEquals("Darcy flux (m/day)", e.quantity());
        assertTrue(e.allowedRange().contains("at most the saturated hydraulic conductivity 1.0"), e.allowedRange());
        assertEquals("Darcy flux (m/day)", assertThrows(TransportInputException.class,
                () -> FluxLimit.check(0, 1)).quantity());
        assertEquals("saturated hydraulic conductivity (m/day)", assertThrows(TransportInputException.class,
                () -> FluxLimit.check(0.1, Double.NaN)).quantity());
    }
}
