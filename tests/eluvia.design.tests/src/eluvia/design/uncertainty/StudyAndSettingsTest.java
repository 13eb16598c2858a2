package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Checks of the study, the settings and the input values. */
final class StudyAndSettingsTest {

    private static UncertaintyStudy.Builder valid() {
        return UncertaintyStudy.builder().input(UncertainInput.uniform("a", "m", 0, 1))
                .input(UncertainInput.normal("b", "m", 0, 1)).input(UncertainInput.fixed("f", "m", 2))
                .output("y", "m").model(in -> Map.of("y", in.get("a")));
    }

    @Test
    void aValidStudyKeepsItsParts() {
        UncertaintyStudy study = valid().build();
        assertEquals(List.of("a", "b", "f"), study.inputNames());
        assertEquals(List.of("y"), study.outputNames());
        assertTrue(study.rankCorrelation().isEmpty());
        // base values: the medians 0.5 and 0 and the fixed 2
        assertEquals(Map.of("a", 0.5, "b", 0.0, "f", 2.0), study.baseCase().asMap());
    }

    @Test
    void badStudiesAreRejected() {
        assertAll(
                () -> rejects(() -> UncertaintyStudy.builder().output("y", "m").model(in -> Map.of()).build(),
                        "number of uncertain inputs"),
                () -> rejects(() -> UncertaintyStudy.builder().input(UncertainInput.fixed("a", "m", 1))
                        .model(in -> Map.of()).build(), "number of outputs"),
                () -> rejects(() -> valid().model(null).build(), "model of the uncertainty study"),
                () -> rejects(() -> valid().input(UncertainInput.fixed("a", "m", 1)).build(), "input name"),
                () -> rejects(() -> valid().output("y", "d").build(), "output name"),
                () -> rejects(() -> valid().input(null), "uncertain input"),
                () -> rejects(() -> valid().inputs(null), "uncertain inputs"),
                () -> rejects(() -> valid().output(null), "output"),
                () -> rejects(() -> valid().rankCorrelation(RankCorrelationMatrix.builder().pair("a", "z", 0.3).build())
                        .build(), "input name in the rank correlation matrix"),
                () -> rejects(() -> valid().rankCorrelation(RankCorrelationMatrix.builder().pair("a", "f", 0.3).build())
                        .build(), "input in the rank correlation matrix"),
                () -> rejects(() -> new OutputDefinition(" ", "m"), "name of an output"),
                () -> rejects(() -> new OutputDefinition("y", null), "unit of output 'y'"),
                () -> rejects(() -> new OutputDefinition("y", " "), "unit of output 'y'"));
    }

    @Test
    void badSettingsAreRejected() {
        SimulationSettings settings = SimulationSettings.defaults();
        assertAll(
                () -> rejects(() -> settings.withRunCount(1), "number of Monte Carlo runs"),
                () -> rejects(() -> settings.withRunCount(SimulationSettings.MAX_RUNS + 1), "number of Monte Carlo runs"),
                () -> rejects(() -> settings.withThreadCount(0), "number of worker threads"),
                () -> rejects(() -> settings.withThreadCount(SimulationSettings.MAX_THREADS + 1), "number of worker threads"),
                () -> rejects(() -> settings.withHistogramBinCount(-1), "number of histogram bins"),
                () -> rejects(() -> settings.withHistogramBinCount(SimulationSettings.MAX_BINS + 1),
                        "number of histogram bins"),
                () -> rejects(() -> settings.withSamplingMethod(null), "sampling method"));
    }

    @Test
    void defaultsAreLatinHypercubeWithSturgesBins() {
        SimulationSettings settings = SimulationSettings.defaults();
        assertEquals(SamplingMethod.LATIN_HYPERCUBE, settings.samplingMethod());
        assertEquals(SimulationSettings.DEFAULT_RUNS, settings.runCount());
        assertEquals(SimulationSettings.DEFAULT_SEED, settings.seed());
        assertTrue(settings.threadCount() >= 1);
        // Sturges (1926): ceil(log2 n) + 1
        assertEquals(12, settings.binsFor(2_000));
        assertEquals(11, settings.binsFor(1_024));
        assertEquals(12, settings.binsFor(1_025));
        assertEquals(2, settings.binsFor(2));
        assertEquals(1, settings.binsFor(0));
        assertEquals(40, settings.withHistogramBinCount(40).binsFor(2_000));
    }

    @Test
    void inputValuesByName() {
        Map<String, Double> map = new LinkedHashMap<>();
        map.put("q", 0.2);
        map.put("theta", 0.3);
        InputValues values = InputValues.of(map);
        assertEquals(0.3, values.get("theta"), 0);
        assertEquals(List.of("q", "theta"), values.names());
        assertTrue(values.contains("q"));
        assertEquals(map, values.asMap());
        UncertaintyInputException unknown = assertThrows(UncertaintyInputException.class, () -> values.get("L"));
        assertEquals("input name = L is outside the allowed range: one of [q, theta]", unknown.getMessage());
        Map<String, Double> withNull = new LinkedHashMap<>();
        withNull.put("q", null);
        assertAll(
                () -> rejects(() -> InputValues.of(Map.of("q", Double.NaN)), "value of input 'q'"),
                () -> rejects(() -> InputValues.of(withNull), "value of input 'q'"),
                () -> rejects(() -> InputValues.of(null), "input values"));
    }

    private static void rejects(Executable executable, String quantity) {
        UncertaintyInputException e = assertThrows(UncertaintyInputException.class, executable);
        assertEquals(quantity, e.quantity(), e.getMessage());
    }
}
