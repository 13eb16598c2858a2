package eluvia.design.uncertainty;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A Monte Carlo run the model could not evaluate.
 *
 * @param runIndex    the run's index in the sample, from 0
 * @param inputValues the run's input values by name, each in its input's unit
 * @param reason      why it failed: the exception's type and message, or the missing or
 *                    non-finite output
 */
public record FailedRun(int runIndex, Map<String, Double> inputValues, String reason) {
    /** Copies the map, keeping its order. */
    public FailedRun {
        inputValues = Collections.unmodifiableMap(new LinkedHashMap<>(inputValues));
    }
}
