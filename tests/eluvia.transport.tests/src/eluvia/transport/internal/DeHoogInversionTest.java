package eluvia.transport.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

final class DeHoogInversionTest {

    @Test
    void invertsTransformsWithKnownOriginals() {
        for (double t : new double[] {0.01, 0.5, 1, 3, 10}) {
            // standard transform pairs (any table, e.g. Abramowitz and Stegun 1964, 29.3):
            // 1/(s + 1) <-> exp(-t); 1/(s^2 + 1) <-> sin t; exp(-2 sqrt(s))/s <-> erfc(1/sqrt(t))
            assertEquals(Math.exp(-t), DeHoogInversion.invert(s -> s.add(1).reciprocal(), t), 1e-11, "exp " + t);
            assertEquals(Math.sin(t), DeHoogInversion.invert(s -> s.multiply(s).add(1).reciprocal(), t), 1e-11, "sin " + t);
            assertEquals(Erf.erfc(1 / Math.sqrt(t)),
                    DeHoogInversion.invert(s -> s.sqrt().multiply(-2).exp().divide(s), t), 1e-11, "erfc " + t);
            assertEquals(1.0, DeHoogInversion.invert(Complex::reciprocal, t), 1e-11, "unit step " + t);
        }
    }
}
