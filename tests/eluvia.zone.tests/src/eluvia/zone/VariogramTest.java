package eluvia.zone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Variogram models against the standard textbook forms (Isaaks and Srivastava 1989, An
 * Introduction to Applied Geostatistics, ch. 16; Journel and Huijbregts 1978, Mining
 * Geostatistics; written here from memory), and the experimental variogram against hand sums.
 */
final class VariogramTest {

    private static final double TOLERANCE = 1e-12;

    @Test
    void sphericalAtZeroHalfRangeRangeAndBeyond() {
        VariogramModel m = new VariogramModel(VariogramShape.SPHERICAL, 1.0, 5.0, 10.0);
        assertEquals(0.0, m.semivarianceMgPerKgSquared(0)); // gamma(0) = 0 by definition (from memory, standard form)
        // spherical: c0 + c (1.5 h/a - 0.5 (h/a)^3): 1 + 4 (0.75 - 0.0625) = 3.75 (from memory, standard form)
        assertEquals(3.75, m.semivarianceMgPerKgSquared(5.0), TOLERANCE);
        assertEquals(5.0, m.semivarianceMgPerKgSquared(10.0), TOLERANCE); // reaches the sill at the range
        assertEquals(5.0, m.semivarianceMgPerKgSquared(25.0), TOLERANCE); // flat beyond the range
        assertEquals(1.0, m.semivarianceMgPerKgSquared(1e-12), 1e-9); // the nugget just off the origin
        assertEquals(5.0, m.covarianceMgPerKgSquared(0)); // C(0) = sill
        assertEquals(1.25, m.covarianceMgPerKgSquared(5.0), TOLERANCE); // C(h) = sill - gamma(h)
        assertEquals(0.0, m.covarianceMgPerKgSquared(12.0), TOLERANCE);
    }

    @Test
    void exponentialAtZeroRangeAndBeyond() {
        VariogramModel m = new VariogramModel(VariogramShape.EXPONENTIAL, 1.0, 5.0, 10.0);
        assertEquals(0.0, m.semivarianceMgPerKgSquared(0));
        // exponential with practical range a: c0 + c (1 - exp(-3 h / a)) (from memory, standard form)
        assertEquals(1.0 + 4.0 * (1 - Math.exp(-3.0)), m.semivarianceMgPerKgSquared(10.0), TOLERANCE);
        assertEquals(1.0 + 4.0 * (1 - Math.exp(-1.5)), m.semivarianceMgPerKgSquared(5.0), TOLERANCE);
        assertEquals(1.0 + 4.0 * (1 - Math.exp(-9.0)), m.semivarianceMgPerKgSquared(30.0), TOLERANCE);
        // 95 % of the structure at the practical range (from memory: the definition of the practical range)
        assertEquals(0.95, (m.semivarianceMgPerKgSquared(10.0) - 1.0) / 4.0, 0.001);
    }

    @Test
    void gaussianAtZeroRangeAndBeyond() {
        VariogramModel m = new VariogramModel(VariogramShape.GAUSSIAN, 0.0, 2.0, 10.0);
        assertEquals(0.0, m.semivarianceMgPerKgSquared(0));
        // Gaussian with practical range a: c0 + c (1 - exp(-3 h^2 / a^2)) (from memory, standard form)
        assertEquals(2.0 * (1 - Math.exp(-3.0)), m.semivarianceMgPerKgSquared(10.0), TOLERANCE);
        assertEquals(2.0 * (1 - Math.exp(-0.75)), m.semivarianceMgPerKgSquared(5.0), TOLERANCE);
        assertEquals(2.0 * (1 - Math.exp(-27.0)), m.semivarianceMgPerKgSquared(30.0), TOLERANCE);
        // parabolic at the origin: gamma(h) ~ 3 c h^2 / a^2 for small h (series of 1 - exp(-x))
        assertEquals(3 * 2.0 * 1e-6 / 100, m.semivarianceMgPerKgSquared(1e-3), 1e-12);
    }

    @Test
    void pureNuggetModelIsAccepted() {
        VariogramModel m = new VariogramModel(VariogramShape.SPHERICAL, 3.0, 3.0, 1.0);
        assertEquals(3.0, m.semivarianceMgPerKgSquared(0.5));
        assertEquals(0.0, m.semivarianceMgPerKgSquared(0.0));
    }

    private static void assertRejects(String field, String range, Executable executable) {
        ZoneInputException e = assertThrows(ZoneInputException.class, executable);
        assertTrue(e.getMessage().contains(field), e.getMessage());
        assertTrue(e.getMessage().contains(range), e.getMessage());
    }

    @Test
    void badModelsNameTheField() {
        assertRejects("variogram shape", "not null", () -> new VariogramModel(null, 0, 1, 1));
        assertRejects("nuggetMgPerKgSquared", "0 or greater", () -> new VariogramModel(VariogramShape.SPHERICAL, -1, 1, 1));
        assertRejects("sillMgPerKgSquared", "greater than 0", () -> new VariogramModel(VariogramShape.SPHERICAL, 0, 0, 1));
        assertRejects("rangeMetres", "greater than 0", () -> new VariogramModel(VariogramShape.GAUSSIAN, 0, 1, 0));
        assertRejects("rangeMetres", "greater than 0",
                () -> new VariogramModel(VariogramShape.EXPONENTIAL, 0, 1, Double.POSITIVE_INFINITY));
        assertRejects("nuggetMgPerKgSquared", "the sill includes the nugget",
                () -> new VariogramModel(VariogramShape.SPHERICAL, 2, 1, 1));
        VariogramModel m = new VariogramModel(VariogramShape.SPHERICAL, 0, 1, 1);
        assertRejects("lagMetres", "0 or greater", () -> m.semivarianceMgPerKgSquared(-1));
        assertRejects("lagMetres", "0 or greater", () -> m.semivarianceMgPerKgSquared(Double.NaN));
        assertRejects("lag / range", "0 or greater", () -> VariogramShape.GAUSSIAN.value(-0.1));
    }

    /** Values 1, 2, 4 at x = 0, 1, 2 m and 0 under the first, 0.5 m deeper (1 m scaled with factor 2). */
    private static SampleSet fourSamples() {
        return SampleSet.of(List.of(SoilSample.detected(0, 0, 1, 1, 1), SoilSample.detected(1, 0, 1, 1, 2),
                SoilSample.detected(2, 0, 1, 1, 4), SoilSample.detected(0, 0, 1.5, 1.5, 0)), NonDetectRule.ZERO, 2.0);
    }

    @Test
    void experimentalVariogramInAllDirections() {
        ExperimentalVariogram v = ExperimentalVariogram.compute(fourSamples(), 1.0, 4);
        // hand: class (0, 1]: pairs at 1 m with differences 1, 2, 1 -> (1 + 4 + 1) / (2 x 3) = 1
        assertEquals(3, v.lagClasses().get(0).pairCount());
        assertEquals(1.0, v.lagClasses().get(0).semivarianceMgPerKgSquared(), TOLERANCE);
        assertEquals(1.0, v.lagClasses().get(0).meanLagMetres(), TOLERANCE);
        // hand: class (1, 2]: (x=0, x=2) at 2 m, difference 3; (x=1, deep) at sqrt(2) m, difference 2 -> 13 / 4
        assertEquals(2, v.lagClasses().get(1).pairCount());
        assertEquals(3.25, v.lagClasses().get(1).semivarianceMgPerKgSquared(), TOLERANCE);
        assertEquals((2 + Math.sqrt(2)) / 2, v.lagClasses().get(1).meanLagMetres(), TOLERANCE);
        // hand: class (2, 3]: (x=2, deep) at sqrt(5) m, difference 4 -> 16 / 2
        assertEquals(1, v.lagClasses().get(2).pairCount());
        assertEquals(8.0, v.lagClasses().get(2).semivarianceMgPerKgSquared(), TOLERANCE);
        assertEquals(0, v.lagClasses().get(3).pairCount());
        assertTrue(Double.isNaN(v.lagClasses().get(3).semivarianceMgPerKgSquared()));
        assertEquals(6, v.pairCount()); // hand: 4 x 3 / 2 pairs, all within 4 m
        assertEquals(2.0, v.lagClasses().get(2).fromMetres());
        assertEquals(3.0, v.lagClasses().get(2).toMetres());
        // hand: population variance of {1, 2, 4, 0}: mean 7/4, squares 9/16 + 1/16 + 81/16 + 49/16 = 140/16, / 4
        assertEquals(140.0 / 64.0, v.sampleVarianceMgPerKgSquared(), TOLERANCE);
    }

    @Test
    void experimentalVariogramByDirection() {
        ExperimentalVariogram horizontal = ExperimentalVariogram.compute(fourSamples(), 1.0, 4,
                PairDirection.NEAR_HORIZONTAL);
        // hand: only the three pairs at the same depth: (0, 1], differences 1 and 2 -> 5/4; (1, 2], difference 3 -> 9/2
        assertEquals(2, horizontal.lagClasses().get(0).pairCount());
        assertEquals(1.25, horizontal.lagClasses().get(0).semivarianceMgPerKgSquared(), TOLERANCE);
        assertEquals(1, horizontal.lagClasses().get(1).pairCount());
        assertEquals(4.5, horizontal.lagClasses().get(1).semivarianceMgPerKgSquared(), TOLERANCE);
        assertEquals(3, horizontal.pairCount()); // the pairs dipping 45 and 26.6 degrees are left out
        ExperimentalVariogram vertical = ExperimentalVariogram.compute(fourSamples(), 1.0, 4, PairDirection.NEAR_VERTICAL);
        // hand: only the pair straight down, 1 m scaled, difference 1 -> 1/2
        assertEquals(1, vertical.pairCount());
        assertEquals(0.5, vertical.lagClasses().get(0).semivarianceMgPerKgSquared(), TOLERANCE);
        // pairs beyond the last class are left out: with one class of 1 m only the three 1 m pairs remain
        assertEquals(3, ExperimentalVariogram.compute(fourSamples(), 1.0, 1).pairCount());
    }

    @Test
    void badExperimentalVariogramInputsNameTheField() {
        SampleSet samples = fourSamples();
        assertRejects("lagWidthMetres", "greater than 0", () -> ExperimentalVariogram.compute(samples, 0, 4));
        assertRejects("lagCount", "1 to 1000", () -> ExperimentalVariogram.compute(samples, 1, 0));
        assertRejects("lagCount", "1 to 1000", () -> ExperimentalVariogram.compute(samples, 1, 1001));
        assertRejects("samples", "not null", () -> ExperimentalVariogram.compute(null, 1, 4));
        assertRejects("pair direction", "not null", () -> ExperimentalVariogram.compute(samples, 1, 4, null));
        SampleSet one = SampleSet.of(List.of(SoilSample.detected(0, 0, 0, 1, 1), SoilSample.detected(0, 0, 0, 1, 3)),
                NonDetectRule.ZERO);
        assertRejects("number of distinct sample locations", "2 or more", () -> ExperimentalVariogram.compute(one, 1, 4));
    }
}
