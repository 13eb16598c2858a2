package eluvia.design.uncertainty;

import java.util.Optional;

/**
 * One bar of a tornado: an output evaluated with one input at its P10 and at its P90, every other
 * input at its base value.
 *
 * @param inputName         the input moved
 * @param inputUnit         its unit
 * @param lowInputValue     the input's P10, in {@code inputUnit}
 * @param highInputValue    the input's P90, in {@code inputUnit}
 * @param outputAtLowInput  the output with the input at its P10, in the output's unit (NaN if that
 *                          evaluation failed)
 * @param outputAtHighInput the output with the input at its P90, in the output's unit (NaN if that
 *                          evaluation failed)
 * @param failure           why an evaluation failed or was not made, if one did
 */
public record TornadoBar(String inputName, String inputUnit, double lowInputValue, double highInputValue,
        double outputAtLowInput, double outputAtHighInput, Optional<String> failure) {

    /** |output at P90 - output at P10|, in the output's unit; NaN if an evaluation failed. */
    public double swing() {
        return Math.abs(outputAtHighInput - outputAtLowInput);
    }
}
