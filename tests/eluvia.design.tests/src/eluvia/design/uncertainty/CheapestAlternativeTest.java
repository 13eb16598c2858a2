package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/** Probability that each alternative is the cheapest. */
final class CheapestAlternativeTest {
    private static final double STANDARD_ERRORS = 4;

    @Test
    void twoIndependentNormalCostsMatchTheClosedForm() {
        int runs = 20_000;
        UncertaintyStudy study = UncertaintyStudy.builder()
                .input(UncertainInput.normal("cost X", "CU", 100, 10))
                .input(UncertainInput.normal("cost Y", "CU", 110, 20))
                .output("X", "CU").output("Y", "CU")
                .compareAlternatives("X or Y", List.of("X", "Y"))
                .model(in -> Map.of("X", in.get("cost X"), "Y", in.get("cost Y")))
                .build();
        CheapestAlternative cheapest = new MonteCarloRunner(
                new SimulationSettings(runs, SamplingMethod.PLAIN_MONTE_CARLO, 5, 2, 0)).run(study).cheapest("X or Y");
        // P(X < Y) = Phi((muY - muX) / sqrt(sX^2 + sY^2)) for independent normals (exact), Phi from
        // Commons Math 3.6.1 NormalDistribution; four binomial standard errors sqrt(p (1 - p) / n)
        double p = new NormalDistribution(0, 1).cumulativeProbability((110 - 100) / Math.sqrt(10 * 10 + 20 * 20));
        assertEquals(p, cheapest.probability("X"), STANDARD_ERRORS * Math.sqrt(p * (1 - p) / runs));
        // the probabilities of all alternatives sum to 1 (one cheapest per run)
        assertEquals(1.0, cheapest.probability("X") + cheapest.probability("Y"), 1e-12);
        assertEquals(runs, cheapest.runCount());
    }

    @Test
    void threeAlternativesSumToOne() {
        UncertaintyStudy study = UncertaintyStudy.builder()
                .input(UncertainInput.triangular("a", "CU", 80, 100, 150))
                .input(UncertainInput.lognormal("b", "CU", 105, 1.3))
                .input(UncertainInput.uniform("c", "CU", 90, 140))
                .output("A", "CU").output("B", "CU").output("C", "CU")
                .compareAlternatives("remedy", List.of("A", "B", "C"))
                .model(in -> Map.of("A", in.get("a"), "B", in.get("b"), "C", in.get("c")))
                .build();
        CheapestAlternative cheapest = new MonteCarloRunner(SimulationSettings.defaults().withRunCount(3_000)).run(study)
                .cheapest("remedy");
        // one cheapest per run: the probabilities sum to 1
        assertEquals(1.0, cheapest.probabilities().stream().mapToDouble(Double::doubleValue).sum(), 1e-12);
    }

    @Test
    void tiesAreSplitEvenly() {
        UncertaintyStudy study = UncertaintyStudy.builder()
                .input(UncertainInput.uniform("u", "1", 0, 1))
                .output("A", "CU").output("B", "CU").output("C", "CU")
                .compareAlternatives("tied", List.of("A", "B", "C"))
                .model(in -> {
                    // A and B tie below u = 0.5; above it C is cheapest
                    double u = in.get("u");
                    return u < 0.5 ? Map.of("A", 10.0, "B", 10.0, "C", 20.0) : Map.of("A", 10.0, "B", 30.0, "C", 5.0);
                })
                .build();
        UncertaintyResult result = new MonteCarloRunner(
                new SimulationSettings(1_000, SamplingMethod.LATIN_HYPERCUBE, 1, 2, 0)).run(study);
        long below = java.util.Arrays.stream(result.runs().inputColumn("u")).filter(u -> u < 0.5).count();
        CheapestAlternative cheapest = result.cheapest("tied");
        // counted in the test: each tie gives 1/2 to A and to B; Latin hypercube puts exactly 500 of 1,000 below 0.5
        assertEquals(500, below);
        assertEquals(0.5 * below / 1_000, cheapest.probability("A"), 1e-15);
        assertEquals(0.5 * below / 1_000, cheapest.probability("B"), 1e-15);
        assertEquals((1_000 - below) / 1_000.0, cheapest.probability("C"), 1e-15);
        assertThrows(UncertaintyInputException.class, () -> cheapest.probability("D"));
    }

    @Test
    void badComparisonsAreRejected() {
        UncertaintyStudy.Builder builder = UncertaintyStudy.builder().input(UncertainInput.uniform("u", "1", 0, 1))
                .output("A", "CU").output("B", "CU").output("M", "m3").model(in -> Map.of());
        assertThrows(UncertaintyInputException.class, () -> new AlternativeComparison("one", List.of("A")));
        assertThrows(UncertaintyInputException.class, () -> new AlternativeComparison("twice", List.of("A", "A")));
        assertThrows(UncertaintyInputException.class, () -> new AlternativeComparison(" ", List.of("A", "B")));
        assertThrows(UncertaintyInputException.class, () -> new AlternativeComparison("null", null));
        UncertaintyInputException unknown = assertThrows(UncertaintyInputException.class,
                () -> UncertaintyStudy.builder().input(UncertainInput.uniform("u", "1", 0, 1)).output("A", "CU")
                        .compareAlternatives("x", List.of("A", "Z")).model(in -> Map.of()).build());
        assertEquals("output name in comparison 'x'", unknown.quantity());
        UncertaintyInputException units = assertThrows(UncertaintyInputException.class,
                () -> builder.compareAlternatives("mixed", List.of("A", "M")).build());
        assertEquals("unit of output 'M' in comparison 'mixed'", units.quantity());
        UncertaintyInputException label = assertThrows(UncertaintyInputException.class,
                () -> UncertaintyStudy.builder().input(UncertainInput.uniform("u", "1", 0, 1)).output("A", "CU")
                        .output("B", "CU").compareAlternatives("same", List.of("A", "B"))
                        .compareAlternatives("same", List.of("B", "A")).model(in -> Map.of()).build());
        assertEquals("label of a comparison of alternatives", label.quantity());
    }
}
