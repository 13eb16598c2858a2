package eluvia.design.uncertainty;

import java.util.Map;

/**
 * The model an uncertainty study evaluates: a function from named input values to named output
 * values (each in the unit declared for it in the study).
 *
 * <p>The engine calls it concurrently from several threads, so it must not change shared state.
 * Whatever it throws (a solver that does not converge, an input combination outside a method's
 * range) is recorded as a failed run with the reason and the simulation goes on; so is a result
 * that lacks a declared output or gives a value that is not finite. Outputs it returns that the
 * study does not declare are ignored.
 */
@FunctionalInterface
public interface UncertaintyModel {

    /**
     * Evaluates the model once.
     *
     * @param inputs the value of every input of the study, in the inputs' units
     * @return a finite value for every output the study declares, by output name
     * @throws Exception when this combination of inputs cannot be evaluated
     */
    Map<String, Double> evaluate(InputValues inputs) throws Exception;
}
