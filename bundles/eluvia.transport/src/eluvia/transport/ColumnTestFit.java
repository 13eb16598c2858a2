package eluvia.transport;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.Pair;

import eluvia.transport.internal.FiniteLayerSolution;
import eluvia.transport.internal.SemiInfiniteForms;
import eluvia.transport.internal.TwoRegionSolution;

/**
 * Calibration of transport parameters to a column test: the retardation factor R and Peclet
 * number P (equilibrium), or R, P, beta and omega (two-region nonequilibrium), fitted to measured
 * (pore volumes, C/C0) pairs of a breakthrough curve (clean column fed with a step of C0) or an
 * elution curve (contaminated column flushed with clean water).
 *
 * <p>Models of the effluent: the flux-averaged outlet concentration of the finite column with a
 * flux inlet and a zero-gradient outlet (Brenner 1962, {@link FlushingModels#finiteLayer}), of a
 * semi-infinite column (Ogata and Banks 1961 at X = 1, the flux-averaged concentration of the
 * flux-inlet problem, Parker and van Genuchten 1984), or of the finite two-region column
 * ({@link FlushingModels#twoRegion}). For these linear problems the breakthrough curve is 1 minus
 * the elution curve.
 *
 * <p>Method: Levenberg-Marquardt (Commons Math 3.6.1 {@link LevenbergMarquardtOptimizer}; Moré
 * 1978) on the unweighted residuals, with the Jacobian by central differences (relative step
 * 1e-5) and the parameters kept inside R in [1, 1e4], P in [0.01, 1e4], beta in [0.01, 0.999],
 * omega in [1e-6, 1e3]. Standard errors from the covariance s^2 (J^T J)^-1 with
 * s^2 = SSR / (n - p); 95 % intervals value &plusmn; t(0.975, n - p) SE (Student t, Commons Math
 * {@link TDistribution}). A parameter is reported as not identifiable when the covariance is
 * singular, or its interval is wider than its value; J^T J with a condition number above 1e12 is
 * reported as ill-conditioned.
 */
public final class ColumnTestFit {
    /** The kind of column curve. */
    public enum Curve {
        /** A clean column fed with a step of C0 from T = 0: C/C0 rises from 0 to 1. */
        BREAKTHROUGH,
        /** A column initially at C0 flushed with clean water: C/C0 falls from 1 to 0. */
        ELUTION
    }

    /** The model fitted and its parameters. */
    public enum Model {
        /** Finite column, equilibrium: R, P. */
        FINITE_EQUILIBRIUM(List.of("R", "P")),
        /** Semi-infinite column (flux-averaged), equilibrium: R, P. */
        SEMI_INFINITE_EQUILIBRIUM(List.of("R", "P")),
        /** Finite column, two-region or two-site nonequilibrium: R, P, beta, omega. */
        FINITE_TWO_REGION(List.of("R", "P", "beta", "omega"));

        private final List<String> names;

        Model(List<String> names) {
            this.names = names;
        }

        /** The parameter names in order. */
        public List<String> parameterNames() {
            return names;
        }
    }

    private static final double[] LOWER = {1, 0.01, 0.01, 1e-6};
    private static final double[] UPPER = {1e4, 1e4, 0.999, 1e3};
    private static final int MAX_EVALUATIONS = 2000;

    private ColumnTestFit() {
    }

    /**
     * The model's effluent C/C0 (dimensionless) after T pore volumes for parameters
     * (R, P[, beta, omega]).
     */
    public static double predict(Curve curve, Model model, double[] parameters, double poreVolumes) {
        checkParameters(model, parameters);
        TransportInputException.requireNonNegative("pore volumes (-)", poreVolumes);
        return evaluator(curve, model, parameters).value(poreVolumes);
    }

    /** Fits from a start derived from the data (R from the first moment of the curve, P = 10, beta = 0.6, omega = 0.5). */
    public static ColumnFitResult fit(List<ColumnObservation> data, Curve curve, Model model) {
        checkData(data, curve, model);
        double r = firstMomentRetardation(data, curve);
        double[] start = model == Model.FINITE_TWO_REGION ? new double[] {r, 10, 0.6, 0.5} : new double[] {r, 10};
        return fit(data, curve, model, start);
    }

    /**
     * Fits from a given start.
     *
     * @param data at least one more observation than parameters
     * @param start R, P (and beta, omega for the two-region model)
     */
    public static ColumnFitResult fit(List<ColumnObservation> data, Curve curve, Model model, double[] start) {
        checkData(data, curve, model);
        checkParameters(model, start);
        int n = data.size();
        int p = model.parameterNames().size();
        double[] target = new double[n];
        double[] pv = new double[n];
        for (int i = 0; i < n; i++) {
            target[i] = data.get(i).relativeConcentration();
            pv[i] = data.get(i).poreVolumes();
        }
        double[] clampedStart = clamp(start.clone());
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(clampedStart)
                .target(target)
                .model(point -> valueAndJacobian(curve, model, point, pv))
                .parameterValidator(point -> new ArrayRealVector(clamp(point.toArray()), false))
                .maxEvaluations(MAX_EVALUATIONS)
                .maxIterations(MAX_EVALUATIONS)
                .lazyEvaluation(false)
                .build();
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(problem);
        } catch (org.apache.commons.math3.exception.TooManyEvaluationsException
                | org.apache.commons.math3.exception.ConvergenceException e) {
            throw new IllegalStateException("the column fit (" + model + ", " + curve + ") did not converge in "
                    + MAX_EVALUATIONS + " evaluations from R, P... = " + java.util.Arrays.toString(start)
                    + ": give a better start", e);
        }
        double[] value = optimum.getPoint().toArray();
        double[] residuals = optimum.getResiduals().toArray();
        double ssr = 0;
        for (double r : residuals) {
            ssr += r * r;
        }
        int dof = n - p;
        double s2 = ssr / dof;
        List<String> warnings = new ArrayList<>();
        double[] se = new double[p];
        boolean singular = false;
        RealMatrix jacobian = optimum.getJacobian();
        RealMatrix normal = jacobian.transpose().multiply(jacobian);
        double[] sv = new SingularValueDecomposition(normal).getSingularValues();
        double condition = sv[sv.length - 1] > 0 ? sv[0] / sv[sv.length - 1] : Double.POSITIVE_INFINITY;
        try {
            RealMatrix cov = optimum.getCovariances(1e-14).scalarMultiply(s2);
            for (int j = 0; j < p; j++) {
                se[j] = Math.sqrt(Math.max(0, cov.getEntry(j, j)));
            }
        } catch (SingularMatrixException e) {
            singular = true;
            java.util.Arrays.fill(se, Double.NaN);
            warnings.add("the data do not determine " + model.parameterNames()
                    + " together: the covariance matrix is singular (more data over the breakthrough or the tail are needed)");
        }
        if (!singular && condition > 1e12) {
            warnings.add(String.format(java.util.Locale.ROOT,
                    "the fit is ill-conditioned (condition number of J^T J %.3g): the parameters are strongly correlated",
                    condition));
        }
        double t = new TDistribution(dof).inverseCumulativeProbability(0.975);
        List<ColumnFitResult.FittedParameter> out = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            String name = model.parameterNames().get(j);
            double half = t * se[j];
            boolean identifiable = !singular && half <= Math.abs(value[j]);
            if (!singular && !identifiable) {
                warnings.add(String.format(java.util.Locale.ROOT,
                        "%s = %.4g is not identifiable from these data: its 95 %% interval (+/- %.3g) is wider than the value",
                        name, value[j], half));
            }
            if (value[j] <= LOWER[j] * (1 + 1e-9) || value[j] >= UPPER[j] * (1 - 1e-9)) {
                warnings.add(name + " = " + value[j] + " is at the edge of its allowed range [" + LOWER[j] + ", "
                        + UPPER[j] + "]");
            }
            out.add(new ColumnFitResult.FittedParameter(name, value[j], se[j], value[j] - half, value[j] + half,
                    identifiable));
        }
        List<Double> res = new ArrayList<>();
        for (double r : residuals) {
            res.add(r);
        }
        return new ColumnFitResult(curve, model, out, res, Math.sqrt(ssr / n), dof, optimum.getEvaluations(), warnings);
    }

    private static Pair<RealVector, RealMatrix> valueAndJacobian(Curve curve, Model model, RealVector point,
            double[] pv) {
        double[] x = clamp(point.toArray());
        int n = pv.length;
        int p = x.length;
        double[] f = values(curve, model, x, pv);
        RealMatrix jac = new Array2DRowRealMatrix(n, p);
        for (int j = 0; j < p; j++) {
            double h = 1e-5 * Math.abs(x[j]);
            double[] up = x.clone();
            double[] down = x.clone();
            up[j] = Math.min(UPPER[j], x[j] + h);
            down[j] = Math.max(LOWER[j], x[j] - h);
            double[] fu = values(curve, model, up, pv);
            double[] fd = values(curve, model, down, pv);
            for (int i = 0; i < n; i++) {
                jac.setEntry(i, j, (fu[i] - fd[i]) / (up[j] - down[j]));
            }
        }
        return new Pair<>(new ArrayRealVector(f, false), jac);
    }

    private static double[] values(Curve curve, Model model, double[] x, double[] pv) {
        Evaluator e = evaluator(curve, model, x);
        double[] f = new double[pv.length];
        for (int i = 0; i < pv.length; i++) {
            f[i] = e.value(pv[i]);
        }
        return f;
    }

    private interface Evaluator {
        double value(double poreVolumes);
    }

    private static Evaluator evaluator(Curve curve, Model model, double[] x) {
        double r = x[0];
        double peclet = x[1];
        Evaluator elution;
        switch (model) {
            case FINITE_EQUILIBRIUM -> {
                FiniteLayerSolution s = new FiniteLayerSolution(peclet);
                elution = t -> s.effluent(t / r);
            }
            case SEMI_INFINITE_EQUILIBRIUM -> elution = t -> 1 - SemiInfiniteForms.firstTypeInletStep(1, t / r, peclet);
            default -> {
                TwoRegionSolution s = new TwoRegionSolution(r, peclet, x[2], x[3]);
                elution = s::effluent;
            }
        }
        return curve == Curve.ELUTION ? elution : t -> 1 - elution.value(t);
    }

    private static double[] clamp(double[] x) {
        for (int j = 0; j < x.length; j++) {
            x[j] = Double.isNaN(x[j]) ? LOWER[j] : Math.min(UPPER[j], Math.max(LOWER[j], x[j]));
        }
        return x;
    }

    /** R from the first moment of the curve: integral of (1 - C/C0) for breakthrough, of C/C0 for elution. */
    private static double firstMomentRetardation(List<ColumnObservation> data, Curve curve) {
        List<ColumnObservation> sorted = new ArrayList<>(data);
        sorted.sort((a, b) -> Double.compare(a.poreVolumes(), b.poreVolumes()));
        double previousT = 0;
        double previousF = 1;
        double sum = 0;
        for (ColumnObservation o : sorted) {
            double f = curve == Curve.ELUTION ? o.relativeConcentration() : 1 - o.relativeConcentration();
            sum += 0.5 * (f + previousF) * (o.poreVolumes() - previousT);
            previousT = o.poreVolumes();
            previousF = f;
        }
        return Math.max(1, sum);
    }

    private static void checkData(List<ColumnObservation> data, Curve curve, Model model) {
        if (curve == null || model == null) {
            throw new TransportInputException(curve == null ? "column curve" : "column model", null,
                    curve == null ? "BREAKTHROUGH or ELUTION" : "one of " + java.util.Arrays.toString(Model.values()));
        }
        int p = model.parameterNames().size();
        if (data == null || data.size() <= p) {
            throw new TransportInputException("number of column observations", data == null ? 0 : data.size(),
                    "more than the " + p + " parameters of " + model);
        }
        for (int i = 0; i < data.size(); i++) {
            if (data.get(i) == null) {
                throw new TransportInputException("column observation [" + i + "]", null, "a (pore volumes, C/C0) pair");
            }
        }
    }

    private static void checkParameters(Model model, double[] x) {
        if (model == null) {
            throw new TransportInputException("column model", null, "one of " + java.util.Arrays.toString(Model.values()));
        }
        int p = model.parameterNames().size();
        if (x == null || x.length != p) {
            throw new TransportInputException("number of parameters", x == null ? 0 : x.length,
                    "exactly " + p + " (" + model.parameterNames() + ")");
        }
        for (int j = 0; j < p; j++) {
            if (!(x[j] >= LOWER[j] && x[j] <= UPPER[j])) {
                throw new TransportInputException(model.parameterNames().get(j) + " (-)", x[j],
                        LOWER[j] + " to " + UPPER[j]);
            }
        }
    }
}
