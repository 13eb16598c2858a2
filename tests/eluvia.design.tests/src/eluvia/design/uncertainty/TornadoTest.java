package eluvia.design.uncertainty;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** Tornado of a linear model against values worked by hand. */
final class TornadoTest {

    /** y = 3 x1 - 20 x2 + c; x1 uniform(0, 10), x2 uniform(2, 4), c fixed 7. */
    private static UncertaintyStudy linear(UncertainInput x1) {
        return UncertaintyStudy.builder()
                .input(x1)
                .input(UncertainInput.uniform("x2", "m", 2, 4))
                .input(UncertainInput.fixed("c", "m", 7))
                .output("y", "m").output("x1 copy", "m")
                .model(in -> {
                    if (in.get("x1") < 0.5) {
                        throw new IllegalArgumentException("x1 below 0.5");
                    }
                    return Map.of("y", 3 * in.get("x1") - 20 * in.get("x2") + in.get("c"), "x1 copy", in.get("x1"));
                })
                .build();
    }

    private static UncertaintyResult run(UncertaintyStudy study) {
        return new MonteCarloRunner(new SimulationSettings(50, SamplingMethod.LATIN_HYPERCUBE, 1, 2, 0)).run(study);
    }

    @Test
    void barsMatchHandValuesAndAreSortedBySwing() {
        Tornado tornado = run(linear(UncertainInput.uniform("x1", "m", 0, 10))).tornado("y");
        // hand: base x1 = 5, x2 = 3: 15 - 60 + 7 = -38; x2 at P10 2.2 / P90 3.8: 15 - 44 + 7 = -22 and
        // 15 - 76 + 7 = -54 (swing 32); x1 at P10 1 / P90 9: 3 - 60 + 7 = -50 and 27 - 60 + 7 = -26 (swing 24)
        TornadoBar first = tornado.bars().get(0);
        TornadoBar second = tornado.bars().get(1);
        assertAll(
                () -> assertEquals(-38, tornado.baseOutputValue(), 1e-12),
                () -> assertEquals(2, tornado.bars().size()),
                () -> assertEquals("x2", first.inputName()),
                () -> assertEquals(2.2, first.lowInputValue(), 1e-12),
                () -> assertEquals(3.8, first.highInputValue(), 1e-12),
                () -> assertEquals(-22, first.outputAtLowInput(), 1e-12),
                () -> assertEquals(-54, first.outputAtHighInput(), 1e-12),
                () -> assertEquals(32, first.swing(), 1e-12),
                () -> assertEquals("x1", second.inputName()),
                () -> assertEquals(-50, second.outputAtLowInput(), 1e-12),
                () -> assertEquals(-26, second.outputAtHighInput(), 1e-12),
                () -> assertEquals(24, second.swing(), 1e-12),
                () -> assertTrue(first.failure().isEmpty()),
                () -> assertEquals("m", tornado.outputUnit()));
    }

    @Test
    void anInputWithoutEffectHasZeroSwing() {
        Tornado copy = run(linear(UncertainInput.uniform("x1", "m", 0, 10))).tornado("x1 copy");
        // hand: x1 copy moves from 1 to 9 with x1 (swing 8) and does not move with x2 (swing 0)
        assertEquals("x1", copy.bars().get(0).inputName());
        assertEquals(8, copy.bars().get(0).swing(), 1e-12);
        assertEquals(0, copy.bars().get(1).swing(), 0);
        assertEquals(5, copy.baseOutputValue(), 1e-12);
    }

    @Test
    void explicitBaseValuesHoldTheOtherInputs() {
        Tornado tornado = run(linear(UncertainInput.uniform("x1", "m", 0, 10).withBaseValue(4))).tornado("y");
        TornadoBar x2 = tornado.bars().stream().filter(b -> b.inputName().equals("x2")).findFirst().orElseThrow();
        // hand: base 12 - 60 + 7 = -41; x2 at 2.2 / 3.8 with x1 at 4: 12 - 44 + 7 = -25, 12 - 76 + 7 = -57
        assertEquals(-41, tornado.baseOutputValue(), 1e-12);
        assertEquals(-25, x2.outputAtLowInput(), 1e-12);
        assertEquals(-57, x2.outputAtHighInput(), 1e-12);
    }

    @Test
    void normalInputMovesToItsTenthAndNinetiethPercentiles() {
        UncertaintyStudy study = UncertaintyStudy.builder().input(UncertainInput.normal("x", "m", 10, 2))
                .output("y", "m").model(in -> Map.of("y", 2 * in.get("x"))).build();
        TornadoBar bar = run(study).tornado("y").bars().get(0);
        // hand: 2 (10 -/+ 1.2815515655446004 x 2), z_0.9 from the standard normal table (from memory)
        assertEquals(2 * (10 - 1.2815515655446004 * 2), bar.outputAtLowInput(), 1e-12);
        assertEquals(2 * (10 + 1.2815515655446004 * 2), bar.outputAtHighInput(), 1e-12);
    }

    @Test
    void aFailedEvaluationIsReportedAndSortedLast() {
        // x1 uniform(0, 4): P10 = 0.4 fails (below 0.5), P90 = 3.6
        Tornado tornado = run(linear(UncertainInput.uniform("x1", "m", 0, 4))).tornado("y");
        TornadoBar last = tornado.bars().get(tornado.bars().size() - 1);
        assertEquals("x1", last.inputName());
        assertTrue(Double.isNaN(last.outputAtLowInput()));
        assertTrue(Double.isNaN(last.swing()));
        assertEquals("at the P10: IllegalArgumentException: x1 below 0.5", last.failure().orElseThrow());
        // hand: x1 at its P90 3.6 with x2 at 3: 10.8 - 60 + 7
        assertEquals(10.8 - 60 + 7, last.outputAtHighInput(), 1e-12);
        assertEquals(List.of("x2", "x1"), tornado.bars().stream().map(TornadoBar::inputName).toList());
    }
}
