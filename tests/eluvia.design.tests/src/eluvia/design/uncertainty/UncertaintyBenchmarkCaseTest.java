package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** The benchmark case: its model against a hand calculation and a short run (never timed here). */
final class UncertaintyBenchmarkCaseTest {

    @Test
    void modelMatchesAHandCalculation() {
        Map<String, Double> inputs = new LinkedHashMap<>();
        inputs.put(UncertaintyBenchmarkCase.FLUX, 0.05);
        inputs.put(UncertaintyBenchmarkCase.WATER_CONTENT, 0.3);
        inputs.put(UncertaintyBenchmarkCase.BULK_DENSITY, 1.65);
        inputs.put(UncertaintyBenchmarkCase.KOC, 80.0);
        inputs.put(UncertaintyBenchmarkCase.FOC, 0.0025);
        inputs.put(UncertaintyBenchmarkCase.THICKNESS, 3.0);
        inputs.put(UncertaintyBenchmarkCase.CLEANUP_RATIO, 0.01);
        inputs.put(UncertaintyBenchmarkCase.SWELL, 0.2);
        inputs.put(UncertaintyBenchmarkCase.HAUL_RATE, 100.0);
        Map<String, Double> out = UncertaintyBenchmarkCase.evaluate(InputValues.of(inputs));
        // hand: Kd = 80 x 0.0025 = 0.2 L/kg; R = 1 + 1.65 x 0.2 / 0.3 = 2.1; T = 2.1 ln 100 = 9.67085739 PV
        // (well-mixed estimate, US EPA pump-and-treat guidance); t = T 0.3 x 3 / 0.05 = 174.075433 d;
        // water = T 0.9 x 2000 = 17407.5433 m3; flushing = 150000 + 25 water + 350 t = 646114.985 CU;
        // excavation = 40000 + 3 x 2000 x 1.2 x 100 = 760000 CU
        assertAll(
                () -> assertEquals(9.67085739, out.get(UncertaintyBenchmarkCase.PORE_VOLUMES), 1e-8),
                () -> assertEquals(174.075433, out.get(UncertaintyBenchmarkCase.DURATION), 1e-6),
                () -> assertEquals(17407.5433, out.get(UncertaintyBenchmarkCase.WATER), 1e-4),
                () -> assertEquals(646114.985, out.get(UncertaintyBenchmarkCase.FLUSHING_COST), 1e-3),
                () -> assertEquals(760000, out.get(UncertaintyBenchmarkCase.EXCAVATION_COST), 1e-6));
    }

    @Test
    void caseIsTheDocumentedSizeAndRunsCleanly() {
        UncertaintyBenchmarkCase benchmark = UncertaintyBenchmarkCase.create();
        assertEquals(UncertaintyBenchmarkCase.RUNS, benchmark.settings().runCount());
        assertEquals(SamplingMethod.LATIN_HYPERCUBE, benchmark.settings().samplingMethod());
        assertEquals(9, benchmark.uncertaintyStudy().inputs().size());
        UncertaintyResult result = new MonteCarloRunner(benchmark.settings().withRunCount(500))
                .run(benchmark.uncertaintyStudy());
        assertEquals(0, result.failedRunCount());
        assertEquals(8, result.tornado(UncertaintyBenchmarkCase.FLUSHING_COST).bars().size());
        CheapestAlternative cheapest = result.cheapest(UncertaintyBenchmarkCase.COMPARISON);
        // one cheapest per run: the probabilities sum to 1
        assertEquals(1.0, cheapest.probabilities().get(0) + cheapest.probabilities().get(1), 1e-12);
        // the well-mixed estimate is at least -ln(0.01) = 4.61 pore volumes since R >= 1
        assertTrue(result.statistics(UncertaintyBenchmarkCase.PORE_VOLUMES).min() >= -Math.log(0.01));
    }
}
