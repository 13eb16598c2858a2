package eluvia.transport;

import java.util.List;

/**
 * Result of a column-test calibration ({@link ColumnTestFit}).
 *
 * @param curve breakthrough or elution
 * @param model the model fitted
 * @param parameters the fitted parameters in the model's order, with standard errors and 95 % intervals
 * @param residuals measured minus fitted C/C0 at each observation, in the order given
 * @param rootMeanSquareResidual sqrt(sum of squared residuals / n), dimensionless
 * @param degreesOfFreedom n minus the number of parameters
 * @param evaluations model evaluations of the optimizer (each a whole curve)
 * @param warnings plain-words warnings: parameters the data do not determine, ill-conditioning, bounds reached
 */
public record ColumnFitResult(ColumnTestFit.Curve curve, ColumnTestFit.Model model, List<FittedParameter> parameters,
        List<Double> residuals, double rootMeanSquareResidual, int degreesOfFreedom, int evaluations,
        List<String> warnings) {

    public ColumnFitResult {
        parameters = List.copyOf(parameters);
        residuals = List.copyOf(residuals);
        warnings = List.copyOf(warnings);
    }

    /** The parameter with this name (R, P, beta, omega). */
    public FittedParameter parameter(String name) {
        for (FittedParameter p : parameters) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        throw new TransportInputException("parameter name", name, "one of the model's parameters " + model.parameterNames());
    }

    /**
     * One fitted parameter.
     *
     * @param name R, P, beta or omega (all dimensionless)
     * @param value the least-squares estimate
     * @param standardError from the covariance s^2 (J^T J)^-1, s^2 = sum of squared residuals / degrees of freedom;
     *        NaN when the covariance is singular
     * @param lower95 value - t(0.975, dof) standard error
     * @param upper95 value + t(0.975, dof) standard error
     * @param identifiable false when the covariance is singular or the 95 % interval is wider than the value
     */
    public record FittedParameter(String name, double value, double standardError, double lower95, double upper95,
            boolean identifiable) {
    }
}
