package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Gauss-Lobatto-Legendre points and weights against published closed forms and exactness. */
final class GaussLobattoLegendreTest {
    @Test
    void fivePointRuleMatchesItsClosedForm() {
        // Abramowitz and Stegun 1964, 25.4.32 (Lobatto, n = 5): points 0, +-sqrt(3/7), +-1;
        // weights 32/45, 49/90, 1/10
        GaussLobattoLegendre g = GaussLobattoLegendre.of(4);
        double[] x = { -1, -Math.sqrt(3.0 / 7), 0, Math.sqrt(3.0 / 7), 1 };
        double[] w = { 0.1, 49.0 / 90, 32.0 / 45, 49.0 / 90, 0.1 };
        for (int i = 0; i < 5; i++) {
            assertEquals(x[i], g.point(i), 1e-15);
            assertEquals(w[i], g.weight(i), 1e-15);
        }
    }

    @Test
    void integratesPolynomialsUpToDegreeTwoPMinusOneExactly() {
        // integral of x^k over [-1, 1] = 2 / (k + 1) for even k, 0 for odd k (calculus)
        for (int p = 1; p <= GaussLobattoLegendre.MAXIMUM_DEGREE; p++) {
            GaussLobattoLegendre g = GaussLobattoLegendre.of(p);
            for (int k = 0; k <= 2 * p - 1; k++) {
                double s = 0;
                for (int i = 0; i <= p; i++) {
                    s += g.weight(i) * Math.pow(g.point(i), k);
                }
                assertEquals(k % 2 == 0 ? 2.0 / (k + 1) : 0, s, 1e-13, "degree " + p + ", x^" + k);
            }
        }
    }

    @Test
    void stiffnessMatchesLinearAndQuadraticElementsByHand() {
        // linear element on [-1, 1]: l0' = -1/2, l1' = 1/2, so S = [[1/2, -1/2], [-1/2, 1/2]]
        GaussLobattoLegendre one = GaussLobattoLegendre.of(1);
        assertEquals(0.5, one.stiffness(0, 0), 1e-15);
        assertEquals(-0.5, one.stiffness(0, 1), 1e-15);
        // quadratic element (points -1, 0, 1): S = [[7, -8, 1], [-8, 16, -8], [1, -8, 7]] / 6
        // (standard finite-element stiffness, common practice)
        GaussLobattoLegendre two = GaussLobattoLegendre.of(2);
        double[][] s = { { 7, -8, 1 }, { -8, 16, -8 }, { 1, -8, 7 } };
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(s[i][j] / 6, two.stiffness(i, j), 1e-14);
            }
        }
    }

    @Test
    void refusesDegreesOutsideItsRange() {
        assertThrows(IllegalArgumentException.class, () -> GaussLobattoLegendre.of(0));
        assertThrows(IllegalArgumentException.class, () -> GaussLobattoLegendre.of(GaussLobattoLegendre.MAXIMUM_DEGREE + 1));
    }
}
