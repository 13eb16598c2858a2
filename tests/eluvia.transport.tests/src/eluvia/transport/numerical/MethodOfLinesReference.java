package eluvia.transport.numerical;

import java.util.List;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

import eluvia.transport.CleanupCriterion;

/**
 * Slow, obviously-right reference for the tests: the same finite-volume semi-discretisation in
 * space (written again here, independently of the solver), integrated in time by the Commons Math
 * 3.6.1 {@link DormandPrince853Integrator} with tight tolerances, crossing times found by its
 * event locator. The unknowns are the conserved amounts per bulk volume (mobile and immobile);
 * pore-water concentrations come from inverting the isotherm by bisection in every evaluation.
 */
final class MethodOfLinesReference implements FirstOrderDifferentialEquations {
    private final int n;
    private final double q;
    private final double inflowMilligramsPerLitre;
    private final double[] dzMetres;
    private final double[] thetaM;
    private final double[] thetaIm;
    private final double[] rhoMKilogramsPerLitre;
    private final double[] rhoImKilogramsPerLitre;
    private final double[] rhoBKilogramsPerLitre;
    private final double[] decayWaterPerDay;
    private final double[] decaySolidsPerDay;
    private final double[] exchangePerDay;
    private final SorptionIsotherm[] isotherm;
    private final double[] faceLeftPerDay;
    private final double[] faceRightPerDay;
    private final double[] cm;
    private final double[] ci;
    private long evaluations;

    MethodOfLinesReference(List<SoilLayer> layers, int cellsPerLayer, double darcyFluxMetresPerDay,
            double inflowMilligramsPerLitre) {
        this.n = layers.size() * cellsPerLayer;
        this.q = darcyFluxMetresPerDay;
        this.inflowMilligramsPerLitre = inflowMilligramsPerLitre;
        dzMetres = new double[n];
        thetaM = new double[n];
        thetaIm = new double[n];
        rhoMKilogramsPerLitre = new double[n];
        rhoImKilogramsPerLitre = new double[n];
        rhoBKilogramsPerLitre = new double[n];
        decayWaterPerDay = new double[n];
        decaySolidsPerDay = new double[n];
        exchangePerDay = new double[n];
        isotherm = new SorptionIsotherm[n];
        double[] dispersion = new double[n];
        for (int l = 0; l < layers.size(); l++) {
            SoilLayer s = layers.get(l);
            double rho = s.bulkDensityKilogramsPerCubicMetre() / 1000;
            double tau = Math.pow(s.waterContent(), 7.0 / 3.0) / (s.porosity() * s.porosity());
            double tm = s.mobileWaterFraction() * s.waterContent();
            for (int j = 0; j < cellsPerLayer; j++) {
                int i = l * cellsPerLayer + j;
                dzMetres[i] = s.thicknessMetres() / cellsPerLayer;
                thetaM[i] = tm;
                thetaIm[i] = s.waterContent() - tm;
                rhoMKilogramsPerLitre[i] = s.mobileSorbingSiteFraction() * rho;
                rhoImKilogramsPerLitre[i] = rho - rhoMKilogramsPerLitre[i];
                rhoBKilogramsPerLitre[i] = rho;
                decayWaterPerDay[i] = s.decayInWaterPerDay();
                decaySolidsPerDay[i] = s.decayOnSolidsPerDay();
                exchangePerDay[i] = s.massTransferRatePerDay();
                isotherm[i] = s.isotherm();
                // theta_m D_m = alpha_L q + theta_m tau D0 (D0 from m2/s to m2/day)
                dispersion[i] = s.dispersivityMetres() * q + tm * tau * s.freeWaterDiffusionSquareMetresPerSecond() * 86400;
            }
        }
        faceLeftPerDay = new double[n];
        faceRightPerDay = new double[n];
        for (int i = 0; i + 1 < n; i++) {
            double conductance = 1 / (dzMetres[i] / (2 * dispersion[i]) + dzMetres[i + 1] / (2 * dispersion[i + 1]));
            double wRight = dzMetres[i] / (dzMetres[i] + dzMetres[i + 1]);
            // flux through face i+1/2 = faceLeft * c_i + faceRight * c_{i+1}
            faceLeftPerDay[i] = q * (1 - wRight) + conductance;
            faceRightPerDay[i] = q * wRight - conductance;
        }
        cm = new double[n];
        ci = new double[n];
    }

    @Override
    public int getDimension() {
        return 2 * n;
    }

    /** Total (dissolved plus sorbed) amount per bulk volume for water concentration c. */
    private static double stored(double theta, double rho, SorptionIsotherm s, double c) {
        return theta * c + rho * s.sorbedMilligramsPerKilogram(c);
    }

    /**
     * Water concentration holding {@code amount} per bulk volume: Newton from {@code guess},
     * kept inside the bracket [0, amount / theta] by bisection.
     */
    private static double invert(double theta, double rho, SorptionIsotherm s, double amount, double guess) {
        if (s.isLinear()) {
            return amount / (theta + rho * s.slopeLitresPerKilogram(0));
        }
        double sign = amount < 0 ? -1 : 1;
        double a = Math.abs(amount);
        double lo = 0;
        double hi = a / theta;
        double x = Math.min(hi, Math.max(lo, Math.abs(guess)));
        if (x <= 0) {
            x = 0.5 * hi;
        }
        for (int k = 0; k < 300 && hi > lo; k++) {
            double f = stored(theta, rho, s, x) - a;
            if (f == 0) {
                break;
            }
            if (f < 0) {
                lo = x;
            } else {
                hi = x;
            }
            double slope = theta + rho * s.slopeLitresPerKilogram(x);
            double next = x - f / slope;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) <= 1e-15 * x) {
                x = next;
                break;
            }
            x = next;
        }
        return sign * x;
    }

    private void concentrations(double[] y) {
        for (int i = 0; i < n; i++) {
            cm[i] = invert(thetaM[i], rhoMKilogramsPerLitre[i], isotherm[i], y[i], cm[i]);
            double cap = thetaIm[i] + rhoImKilogramsPerLitre[i];
            ci[i] = cap > 0 ? invert(thetaIm[i], rhoImKilogramsPerLitre[i], isotherm[i], y[n + i], ci[i]) : 0;
        }
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        evaluations++;
        concentrations(y);
        double fluxIn = q * inflowMilligramsPerLitre;
        for (int i = 0; i < n; i++) {
            double fluxOut = i + 1 < n ? faceLeftPerDay[i] * cm[i] + faceRightPerDay[i] * cm[i + 1] : q * cm[i];
            double imCap = thetaIm[i] + rhoImKilogramsPerLitre[i];
            double exchange = imCap > 0 ? exchangePerDay[i] * (cm[i] - ci[i]) : 0;
            double decayM = decayWaterPerDay[i] * thetaM[i] * cm[i]
                    + decaySolidsPerDay[i] * rhoMKilogramsPerLitre[i] * isotherm[i].sorbedMilligramsPerKilogram(cm[i]);
            double decayI = imCap > 0 ? decayWaterPerDay[i] * thetaIm[i] * ci[i]
                    + decaySolidsPerDay[i] * rhoImKilogramsPerLitre[i] * isotherm[i].sorbedMilligramsPerKilogram(ci[i]) : 0;
            yDot[i] = (fluxIn - fluxOut) / dzMetres[i] - exchange - decayM;
            yDot[n + i] = exchange - decayI;
            fluxIn = fluxOut;
        }
    }

    /** State for uniform pore water {@code c0} per layer (cells in layer order). */
    double[] initialState(double[] poreWaterPerCell) {
        double[] y = new double[2 * n];
        for (int i = 0; i < n; i++) {
            y[i] = stored(thetaM[i], rhoMKilogramsPerLitre[i], isotherm[i], poreWaterPerCell[i]);
            double cap = thetaIm[i] + rhoImKilogramsPerLitre[i];
            y[n + i] = cap > 0 ? stored(thetaIm[i], rhoImKilogramsPerLitre[i], isotherm[i], poreWaterPerCell[i]) : 0;
        }
        return y;
    }

    int cellCount() {
        return n;
    }

    long evaluations() {
        return evaluations;
    }

    private double massPerArea(double[] y) {
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += (y[i] + y[n + i]) * dzMetres[i];
        }
        return sum;
    }

    private double maxSoil(double[] y) {
        double max = 0;
        for (int i = 0; i < n; i++) {
            max = Math.max(max, (y[i] + y[n + i]) / rhoBKilogramsPerLitre[i]);
        }
        return max;
    }

    private static DormandPrince853Integrator integrator(double relTol) {
        return new DormandPrince853Integrator(1e-12, 1.0, relTol * 1e-3, relTol);
    }

    /** Mobile pore-water concentration in the last cell (the effluent) at {@code days}. */
    double effluentAtDays(double[] y0, double days, double relTol) {
        double[] y = y0.clone();
        integrator(relTol).integrate(this, 0, y0, days, y);
        concentrations(y);
        return cm[n - 1];
    }

    /** The whole state at {@code days}. */
    double[] stateAtDays(double[] y0, double days, double relTol) {
        double[] y = y0.clone();
        integrator(relTol).integrate(this, 0, y0, days, y);
        return y;
    }

    /** Mobile concentrations of a state. */
    double[] mobileConcentrations(double[] y) {
        concentrations(y);
        return cm.clone();
    }

    /**
     * Days until {@code criterion} falls to {@code fraction} of its initial value (effluent
     * against {@code effluentReference}), or NaN if not within {@code maxDays}.
     */
    double daysToTarget(double[] y0, CleanupCriterion criterion, double fraction, double effluentReference,
            double maxDays, double relTol) {
        double mass0 = massPerArea(y0);
        double soil0 = maxSoil(y0);
        double[] found = { Double.NaN };
        EventHandler handler = new EventHandler() {
            @Override
            public void init(double t0, double[] y, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                switch (criterion) {
                    case EFFLUENT:
                        return invert(thetaM[n - 1], rhoMKilogramsPerLitre[n - 1], isotherm[n - 1], y[n - 1],
                                cm[n - 1]) / effluentReference - fraction;
                    case MEAN_RESIDUAL:
                        return massPerArea(y) / mass0 - fraction;
                    default:
                        return maxSoil(y) / soil0 - fraction;
                }
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                found[0] = t;
                return Action.STOP;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        };
        DormandPrince853Integrator integ = integrator(relTol);
        integ.addEventHandler(handler, maxDays / 2000, 1e-10 * maxDays, 1000);
        double[] y = y0.clone();
        integ.integrate(this, 0, y0, maxDays, y);
        return found[0];
    }
}
