package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.LogNormalDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TriangularDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Quantiles, moments and parameter checks of the uncertain inputs. */
final class UncertainInputTest {

    /** Standard normal quantile at 0.9 (standard normal table, from memory). */
    private static final double Z_90 = 1.2815515655446004;

    @Test
    void normalQuantilesAreMeanPlusZTimesStandardDeviation() {
        UncertainInput flux = UncertainInput.normal("flux", "m/d", 0.30, 0.05);
        NormalDistribution reference = new NormalDistribution(0.30, 0.05);
        assertAll(
                // hand: mean -/+ z_0.9 sd, z_0.9 = 1.2815515655446004 from the standard normal table (from memory)
                () -> assertEquals(0.30 - Z_90 * 0.05, flux.p10(), 1e-15),
                () -> assertEquals(0.30, flux.p50(), 1e-15),
                () -> assertEquals(0.30 + Z_90 * 0.05, flux.p90(), 1e-15),
                // computed in the test with Commons Math 3.6.1 NormalDistribution
                () -> assertEquals(reference.inverseCumulativeProbability(0.025), flux.quantile(0.025), 1e-15),
                () -> assertEquals(reference.getNumericalMean(), flux.mean(), 1e-15),
                () -> assertEquals(0.05, flux.standardDeviation(), 1e-15),
                () -> assertEquals(0.30, flux.baseValue(), 1e-15),
                () -> assertFalse(flux.isFixed()));
    }

    @Test
    void lognormalFromMedianHasClosedFormQuantilesAndMoments() {
        UncertainInput koc = UncertainInput.lognormal("Koc", "L/kg", 60, 2.0);
        double sigma = Math.log(2.0);
        // computed in the test with Commons Math 3.6.1 LogNormalDistribution(scale ln 60, shape ln 2)
        LogNormalDistribution reference = new LogNormalDistribution(Math.log(60), sigma);
        assertAll(
                // closed form: P50 = median, Pp = median gsd^z_p (lognormal quantile, common result)
                () -> assertEquals(60, koc.p50(), 1e-12),
                () -> assertEquals(60 * Math.pow(2.0, Z_90), koc.p90(), 1e-11),
                () -> assertEquals(60 / Math.pow(2.0, Z_90), koc.p10(), 1e-11),
                () -> assertEquals(reference.getNumericalMean(), koc.mean(), 1e-11),
                () -> assertEquals(Math.sqrt(reference.getNumericalVariance()), koc.standardDeviation(), 1e-10),
                // Commons Math inverts its lognormal numerically to 1e-9 absolute
                () -> assertEquals(reference.inverseCumulativeProbability(0.3), koc.quantile(0.3), 1e-7),
                () -> assertEquals(0.3, koc.cumulativeProbability(koc.quantile(0.3)), 1e-12));
    }

    @Test
    void lognormalFromMeanAndStandardDeviationConvertsExactly() {
        UncertainInput k = UncertainInput.lognormalFromMeanAndStandardDeviation("conductivity", "m/d", 2.5, 4.0);
        InputDistribution.LogNormal lognormal = (InputDistribution.LogNormal) k.distribution();
        // computed in the test with Commons Math 3.6.1 LogNormalDistribution from the converted parameters
        LogNormalDistribution reference = new LogNormalDistribution(lognormal.logMedian(),
                lognormal.logStandardDeviation());
        assertAll(
                // the given mean and standard deviation (definition of the conversion)
                () -> assertEquals(2.5, reference.getNumericalMean(), 1e-13),
                () -> assertEquals(4.0 * 4.0, reference.getNumericalVariance(), 1e-12),
                () -> assertEquals(2.5, k.mean(), 1e-13),
                () -> assertEquals(4.0, k.standardDeviation(), 1e-13),
                () -> assertEquals(2.5, lognormal.mean(), 1e-13),
                () -> assertEquals(4.0, lognormal.standardDeviation(), 1e-13),
                // hand: median = m / sqrt(1 + cv^2), cv = 1.6 (lognormal moments, common result)
                () -> assertEquals(2.5 / Math.sqrt(1 + 1.6 * 1.6), lognormal.median(), 1e-14),
                () -> assertEquals(Math.exp(Math.sqrt(Math.log(1 + 1.6 * 1.6))),
                        lognormal.geometricStandardDeviation(), 1e-14));
    }

    @Test
    void lognormalQuantileStaysAccurateForSmallValues() {
        UncertainInput conductivity = UncertainInput.lognormal("hydraulic conductivity", "m/s", 1e-6, 3.0);
        // closed form median gsd^z_p (common result); relative accuracy, where Commons Math's own
        // inversion (absolute accuracy 1e-9) would be wrong by a factor
        assertEquals(1e-6 * Math.pow(3.0, Z_90), conductivity.p90(), 1e-6 * 1e-12);
        assertEquals(1e-6 / Math.pow(3.0, Z_90), conductivity.p10(), 1e-6 * 1e-12);
    }

    @Test
    void uniformQuantilesAreLinear() {
        UncertainInput depth = UncertainInput.uniform("depth", "m", 2.0, 5.0);
        // computed in the test with Commons Math 3.6.1 UniformRealDistribution
        UniformRealDistribution reference = new UniformRealDistribution(2.0, 5.0);
        assertAll(
                // hand: min + p (max - min)
                () -> assertEquals(2.3, depth.p10(), 1e-15),
                () -> assertEquals(3.5, depth.p50(), 1e-15),
                () -> assertEquals(4.7, depth.p90(), 1e-15),
                // hand: (min + max) / 2 and (max - min) / sqrt(12)
                () -> assertEquals(3.5, depth.mean(), 1e-15),
                () -> assertEquals(3.0 / Math.sqrt(12), depth.standardDeviation(), 1e-15),
                () -> assertEquals(reference.getNumericalVariance(), Math.pow(depth.standardDeviation(), 2), 1e-15));
    }

    @Test
    void triangularQuantilesAndMomentsFollowTheClosedForm() {
        double a = 0.25;
        double c = 0.30;
        double b = 0.40;
        UncertainInput theta = UncertainInput.triangular("water content", "1", a, c, b);
        // computed in the test with Commons Math 3.6.1 TriangularDistribution
        TriangularDistribution reference = new TriangularDistribution(a, c, b);
        assertAll(
                // hand: a + sqrt(p (b - a)(c - a)) for p <= (c - a)/(b - a) = 1/3, b - sqrt((1 - p)(b - a)(b - c)) above
                () -> assertEquals(a + Math.sqrt(0.1 * (b - a) * (c - a)), theta.p10(), 1e-15),
                () -> assertEquals(b - Math.sqrt(0.5 * (b - a) * (b - c)), theta.p50(), 1e-15),
                () -> assertEquals(b - Math.sqrt(0.1 * (b - a) * (b - c)), theta.p90(), 1e-15),
                // hand: (a + b + c) / 3, (a^2 + b^2 + c^2 - ab - ac - bc) / 18
                () -> assertEquals((a + b + c) / 3, theta.mean(), 1e-15),
                () -> assertEquals(Math.sqrt((a * a + b * b + c * c - a * b - a * c - b * c) / 18),
                        theta.standardDeviation(), 1e-15),
                () -> assertEquals(reference.inverseCumulativeProbability(0.77), theta.quantile(0.77), 1e-15));
    }

    @Test
    void fixedInputHasOneValue() {
        UncertainInput ratio = UncertainInput.fixed("cleanup ratio", "1", 0.01);
        assertAll(
                // the value itself (a fixed input)
                () -> assertEquals(0.01, ratio.p10(), 0),
                () -> assertEquals(0.01, ratio.p90(), 0),
                () -> assertEquals(0.01, ratio.baseValue(), 0),
                () -> assertEquals(0.0, ratio.standardDeviation(), 0),
                () -> assertTrue(ratio.isFixed()));
    }

    @Test
    void baseValueDefaultsToTheMedianAndCanBeSet() {
        UncertainInput depth = UncertainInput.uniform("depth", "m", 2.0, 5.0);
        UncertainInput designDepth = depth.withBaseValue(4.0);
        // hand: P50 of uniform(2, 5) is 3.5; the value set
        assertEquals(3.5, depth.baseValue(), 1e-15);
        assertFalse(depth.hasExplicitBaseValue());
        assertEquals(4.0, designDepth.baseValue(), 0);
        assertTrue(designDepth.hasExplicitBaseValue());
        assertEquals(depth.p10(), designDepth.p10(), 0);
        assertFalse(depth.equals(designDepth));
        assertEquals(depth, UncertainInput.uniform("depth", "m", 2.0, 5.0));
        assertEquals(depth.hashCode(), UncertainInput.uniform("depth", "m", 2.0, 5.0).hashCode());
    }

    @Test
    void descriptionsNameTheDistributionAndItsParameters() {
        assertEquals("normal (mean 0.3, standard deviation 0.05)",
                UncertainInput.normal("flux", "m/d", 0.3, 0.05).distribution().describe());
        assertEquals("triangular (minimum 1, mode 2, maximum 4.5)",
                UncertainInput.triangular("t", "m", 1, 2, 4.5).distribution().describe());
        assertEquals("uniform (minimum 1E-7, maximum 0.000002)",
                UncertainInput.uniform("u", "m/s", 1e-7, 2e-6).distribution().describe());
        assertEquals("fixed 7", UncertainInput.fixed("f", "1", 7).distribution().describe());
        assertTrue(UncertainInput.lognormal("k", "L/kg", 60, 2).distribution().describe()
                .startsWith("lognormal (median 60, geometric standard deviation 2; mean "));
        assertTrue(UncertainInput.normal("flux", "m/d", 0.3, 0.05).toString().startsWith("flux [m/d]: normal"));
    }

    @Test
    void badParametersNameTheInputTheParameterAndTheRange() {
        UncertaintyInputException e = assertThrows(UncertaintyInputException.class,
                () -> UncertainInput.normal("porosity", "1", 0.3, -0.1));
        assertEquals("standard deviation of input 'porosity'", e.quantity());
        assertEquals("-0.1", e.value());
        assertTrue(e.getMessage().contains("greater than 0"), e.getMessage());
        assertTrue(e.getMessage().contains("fixed input"), e.getMessage());

        UncertaintyInputException mode = assertThrows(UncertaintyInputException.class,
                () -> UncertainInput.triangular("thickness", "m", 1, 5, 4));
        assertEquals("mode of input 'thickness' = 5.0 is outside the allowed range: from the minimum 1.0 to the"
                + " maximum 4.0", mode.getMessage());
    }

    @Test
    void everyBadParameterIsRejected() {
        assertAll(
                () -> rejects(() -> UncertainInput.normal("x", "m", Double.NaN, 1), "mean of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", Double.POSITIVE_INFINITY, 1), "mean of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, 0), "standard deviation of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, Double.NaN), "standard deviation of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, Double.POSITIVE_INFINITY),
                        "standard deviation of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", 0, 2), "median of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", -1, 2), "median of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", Double.NaN, 2), "median of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", 1, 1),
                        "geometric standard deviation (dimensionless) of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", 1, 0.5),
                        "geometric standard deviation (dimensionless) of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", 1, Double.POSITIVE_INFINITY),
                        "geometric standard deviation (dimensionless) of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormalFromMeanAndStandardDeviation("x", "m", 0, 1),
                        "mean of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormalFromMeanAndStandardDeviation("x", "m", 1, 0),
                        "standard deviation of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormalFromMeanAndStandardDeviation("x", "m", 1, Double.NaN),
                        "standard deviation of input 'x'"),
                () -> rejects(() -> UncertainInput.uniform("x", "m", 2, 2), "maximum of input 'x'"),
                () -> rejects(() -> UncertainInput.uniform("x", "m", 3, 2), "maximum of input 'x'"),
                () -> rejects(() -> UncertainInput.uniform("x", "m", Double.NaN, 2), "minimum of input 'x'"),
                () -> rejects(() -> UncertainInput.uniform("x", "m", 1, Double.POSITIVE_INFINITY),
                        "maximum of input 'x'"),
                () -> rejects(() -> UncertainInput.triangular("x", "m", 1, 1, 1), "maximum of input 'x'"),
                () -> rejects(() -> UncertainInput.triangular("x", "m", 1, 0.5, 2), "mode of input 'x'"),
                () -> rejects(() -> UncertainInput.triangular("x", "m", 1, Double.NaN, 2), "mode of input 'x'"),
                () -> rejects(() -> UncertainInput.triangular("x", "m", Double.NEGATIVE_INFINITY, 0, 2),
                        "minimum of input 'x'"),
                () -> rejects(() -> UncertainInput.triangular("x", "m", 0, 1, Double.NaN), "maximum of input 'x'"),
                () -> rejects(() -> UncertainInput.fixed("x", "m", Double.NaN), "fixed value of input 'x'"),
                () -> rejects(() -> UncertainInput.fixed(null, "m", 1), "name of an uncertain input"),
                () -> rejects(() -> UncertainInput.fixed(" ", "m", 1), "name of an uncertain input"),
                () -> rejects(() -> UncertainInput.fixed("x", null, 1), "unit of input 'x'"),
                () -> rejects(() -> UncertainInput.fixed("x", "", 1), "unit of input 'x'"),
                () -> rejects(() -> UncertainInput.of("x", "m", null), "distribution of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, 1).quantile(1.5),
                        "probability for a quantile of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, 1).quantile(-0.1),
                        "probability for a quantile of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, 1).quantile(Double.NaN),
                        "probability for a quantile of input 'x'"),
                () -> rejects(() -> UncertainInput.uniform("x", "m", 1, 2).withBaseValue(2.5),
                        "base value of input 'x'"),
                () -> rejects(() -> UncertainInput.lognormal("x", "m", 1, 2).withBaseValue(0),
                        "base value of input 'x'"),
                () -> rejects(() -> UncertainInput.normal("x", "m", 1, 2).withBaseValue(Double.NaN),
                        "base value of input 'x'"),
                () -> rejects(() -> new InputDistribution.Normal(0, -1), "standard deviation"),
                () -> rejects(() -> InputDistribution.LogNormal.fromMeanAndStandardDeviation(-1, 1), "mean"));
    }

    private static void rejects(Executable executable, String quantity) {
        UncertaintyInputException e = assertThrows(UncertaintyInputException.class, executable);
        assertEquals(quantity, e.quantity(), e.getMessage());
        assertTrue(e.getMessage().contains(" is outside the allowed range: "), e.getMessage());
    }
}
