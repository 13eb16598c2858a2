package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;

import org.apache.commons.math3.distribution.LogNormalDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.RealDistribution;
import org.apache.commons.math3.distribution.TriangularDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The sample matrix: moments of each sampled input against the distribution's closed-form mean
 * and variance (Commons Math 3.6.1 distribution classes, built in the test from the parameters),
 * Latin hypercube strata, independence and reproducibility.
 */
final class SampleGeneratorTest {
    private static final int RUNS = 10_000;
    /** Four standard errors: a correct sampler fails with probability below 1e-4 per check. */
    private static final double STANDARD_ERRORS = 4;

    static Stream<Arguments> distributions() {
        // references: Commons Math 3.6.1 distributions with the same parameters, built independently
        return Stream.of(
                Arguments.of(UncertainInput.normal("flux", "m/d", 0.3, 0.05), new NormalDistribution(0.3, 0.05)),
                Arguments.of(UncertainInput.lognormal("Koc", "L/kg", 60, 1.8),
                        new LogNormalDistribution(Math.log(60), Math.log(1.8))),
                Arguments.of(UncertainInput.lognormalFromMeanAndStandardDeviation("foc", "1", 0.002, 0.001),
                        lognormalWithMeanAndSd(0.002, 0.001)),
                Arguments.of(UncertainInput.uniform("depth", "m", 2, 5), new UniformRealDistribution(2, 5)),
                Arguments.of(UncertainInput.triangular("theta", "1", 0.25, 0.30, 0.40),
                        new TriangularDistribution(0.25, 0.30, 0.40)));
    }

    /** Lognormal with the given mean and sd: sigma^2 = ln(1 + cv^2), mu = ln m - sigma^2 / 2 (common result). */
    private static RealDistribution lognormalWithMeanAndSd(double mean, double sd) {
        double sigmaSquared = Math.log(1 + (sd / mean) * (sd / mean));
        return new LogNormalDistribution(Math.log(mean) - sigmaSquared / 2, Math.sqrt(sigmaSquared));
    }

    static Stream<Arguments> distributionsAndMethods() {
        return distributions().flatMap(arguments -> Stream.of(SamplingMethod.values())
                .map(method -> Arguments.of(arguments.get()[0], arguments.get()[1], method)));
    }

    @ParameterizedTest
    @MethodSource("distributionsAndMethods")
    void sampleMomentsMatchTheDistribution(UncertainInput input, RealDistribution reference, SamplingMethod method) {
        double[] sample = SampleGenerator.generate(List.of(input), null, method, RUNS, 11)[0];
        // closed-form mean and variance of the Commons Math 3.6.1 reference distribution; tolerance
        // four standard errors of the plain Monte Carlo estimate (Latin hypercube does better)
        assertEquals(reference.getNumericalMean(), SampleMoments.mean(sample),
                STANDARD_ERRORS * SampleMoments.standardErrorOfMean(sample), "mean of " + input);
        assertEquals(reference.getNumericalVariance(), SampleMoments.variance(sample),
                STANDARD_ERRORS * SampleMoments.standardErrorOfVariance(sample), "variance of " + input);
        for (double value : sample) {
            assertTrue(value >= input.distribution().lowerBound() && value <= input.distribution().upperBound(),
                    value + " outside the range of " + input);
        }
    }

    @ParameterizedTest
    @MethodSource("distributions")
    void latinHypercubeSamplesEveryStratumOnce(UncertainInput input, RealDistribution reference) {
        int runs = 1_000;
        double[] sample = SampleGenerator.generate(List.of(input), null, SamplingMethod.LATIN_HYPERCUBE, runs, 5)[0];
        boolean[] seen = new boolean[runs];
        for (double value : sample) {
            // stratum of each value from the reference cumulative distribution (Commons Math 3.6.1)
            int stratum = (int) Math.floor(reference.cumulativeProbability(value) * runs);
            assertFalse(seen[stratum], "stratum " + stratum + " sampled twice for " + input);
            seen[stratum] = true;
        }
    }

    @Test
    void uncorrelatedInputsAreIndependent() {
        List<UncertainInput> inputs = List.of(UncertainInput.normal("a", "m", 0, 1),
                UncertainInput.uniform("b", "m", 0, 1), UncertainInput.triangular("c", "m", 0, 1, 3));
        for (SamplingMethod method : SamplingMethod.values()) {
            double[][] columns = SampleGenerator.generate(inputs, null, method, RUNS, 3);
            for (int i = 0; i < 3; i++) {
                for (int j = i + 1; j < 3; j++) {
                    // Spearman 0 for independent inputs, within four standard errors (Fieller et al. 1957)
                    assertEquals(0, new SpearmansCorrelation().correlation(columns[i], columns[j]),
                            STANDARD_ERRORS * SampleMoments.standardErrorOfSpearman(0, RUNS), method + " " + i + j);
                }
            }
        }
    }

    @ParameterizedTest
    @EnumSource(SamplingMethod.class)
    void fixedInputsKeepTheirValueAndDoNotUseTheGenerator(SamplingMethod method) {
        UncertainInput x = UncertainInput.normal("x", "m", 0, 1);
        double[][] withFixed = SampleGenerator.generate(List.of(UncertainInput.fixed("f", "m", 7.5), x), null, method,
                100, 9);
        double[][] without = SampleGenerator.generate(List.of(x), null, method, 100, 9);
        double[] sevens = new double[100];
        Arrays.fill(sevens, 7.5);
        // the fixed value itself
        assertArrayEquals(sevens, withFixed[0], 0);
        assertArrayEquals(without[0], withFixed[1], 0);
    }

    @ParameterizedTest
    @EnumSource(SamplingMethod.class)
    void theSameSeedGivesTheSameSample(SamplingMethod method) {
        List<UncertainInput> inputs = List.of(UncertainInput.normal("a", "m", 0, 1),
                UncertainInput.lognormal("b", "m", 1, 2));
        double[][] first = SampleGenerator.generate(inputs, null, method, 500, 42);
        double[][] second = SampleGenerator.generate(inputs, null, method, 500, 42);
        double[][] other = SampleGenerator.generate(inputs, null, method, 500, 43);
        assertArrayEquals(first[0], second[0], 0);
        assertArrayEquals(first[1], second[1], 0);
        assertFalse(Arrays.equals(first[0], other[0]));
    }

    @Test
    void permutationIsUniformOverPositions() {
        Well19937c random = new Well19937c(1);
        int trials = 30_000;
        int[][] counts = new int[3][3];
        for (int t = 0; t < trials; t++) {
            int[] p = SampleGenerator.permutation(3, random);
            for (int position = 0; position < 3; position++) {
                counts[position][p[position]]++;
            }
        }
        double expected = trials / 3.0;
        // each value lands in each position with probability 1/3: binomial standard error
        double tolerance = STANDARD_ERRORS * Math.sqrt(trials * (1 / 3.0) * (2 / 3.0));
        for (int[] row : counts) {
            for (int count : row) {
                assertEquals(expected, count, tolerance);
            }
        }
        int[] sorted = SampleGenerator.permutation(50, random).clone();
        Arrays.sort(sorted);
        for (int i = 0; i < 50; i++) {
            assertEquals(i, sorted[i]);
        }
    }

    @Test
    void extremeUniformsStayFinite() {
        UncertainInput normal = UncertainInput.normal("x", "m", 0, 1);
        assertAll(
                () -> assertTrue(Double.isFinite(normal.valueAt(SampleGenerator.SMALLEST_PROBABILITY))),
                () -> assertTrue(Double.isFinite(normal.valueAt(1 - SampleGenerator.SMALLEST_PROBABILITY))),
                () -> assertTrue(UncertainInput.lognormal("y", "m", 1, 3).valueAt(SampleGenerator.SMALLEST_PROBABILITY) > 0));
    }
}
