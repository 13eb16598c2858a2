package eluvia.design.uncertainty;

import java.util.List;
import java.util.Optional;

/**
 * The tornado of one output: a bar per uncertain input (fixed inputs have none), sorted by
 * swing, largest first (bars whose evaluations failed come last; equal swings keep the order of
 * the inputs).
 *
 * @param outputName      the output
 * @param outputUnit      its unit
 * @param baseOutputValue the output with every input at its base value, in {@code outputUnit}
 *                        (NaN if that evaluation failed)
 * @param baseFailure     why the base case failed or was not evaluated, if it did
 * @param bars            the bars, largest swing first
 */
public record Tornado(String outputName, String outputUnit, double baseOutputValue, Optional<String> baseFailure,
        List<TornadoBar> bars) {
    /** Copies the bars. */
    public Tornado {
        bars = List.copyOf(bars);
    }
}
