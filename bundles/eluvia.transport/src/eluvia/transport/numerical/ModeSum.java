package eluvia.transport.numerical;

import java.util.function.Supplier;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;

/**
 * A linear column's solution as a steady part plus a sum of decaying modes, a_k exp(-lambda_k t),
 * for the effluent, the stored mass and the pore water at each point of a discretisation: what
 * {@link ModalFlushingSolution} (finite volumes) and {@link SpectralElementFlushingSolution}
 * (spectral elements) both produce once their symmetric eigenproblem is solved, and the three
 * cleanup criteria read from it.
 *
 * <p>Immutable and thread-safe; the per-point coefficients are computed at first use (only the
 * maximum residual needs them).
 */
final class ModeSum {
    private static final double LOG_SMALLEST = -745;

    /** Mode decay rates, 1/day, ascending. */
    private final double[] ratesPerDay;
    /** Per mode: effluent coefficient (mg/L) and stored-mass coefficient (mg/m2). */
    private final double[] effluentCoefficients;
    private final double[] massCoefficients;
    private final double steadyEffluentMilligramsPerLitre;
    private final double steadyMassMilligramsPerSquareMetre;
    /** References of the three criteria: largest initial pore water (mg/L), initial mass (mg/m2), largest initial soil (mg/kg). */
    private final double initialMaxWaterMilligramsPerLitre;
    private final double initialMassMilligramsPerSquareMetre;
    private final double initialMaxSoilMilligramsPerKilogram;
    /** Per point: steady pore water (mg/L) and the soil concentration per unit pore water (L/kg). */
    private final double[] steadyPointMilligramsPerLitre;
    private final double[] soilPerWaterLitresPerKilogram;
    private final double daysPerPoreVolume;
    private final Supplier<double[][]> pointCoefficientSource;
    private volatile double[][] pointCoefficients;

    /**
     * @param ratesPerDay mode decay rates, 1/day, ascending (kept, not copied)
     * @param effluentCoefficients effluent coefficient per mode, mg/L (kept)
     * @param massCoefficients stored-mass coefficient per mode, mg/m2 (kept)
     * @param steadyPointMilligramsPerLitre the steady pore water at each point, mg/L (kept)
     * @param soilPerWaterLitresPerKilogram soil concentration per unit pore water at each point,
     *        (theta + rho_b Kd) / rho_b, L/kg (kept)
     * @param pointCoefficientSource at first use, the coefficients c_i(t) = steady_i + sum_k
     *        row_i[k] exp(-lambda_k t) of every point, in the order of the rates
     */
    ModeSum(double[] ratesPerDay, double[] effluentCoefficients, double[] massCoefficients,
            double steadyEffluentMilligramsPerLitre, double steadyMassMilligramsPerSquareMetre,
            double initialMaxWaterMilligramsPerLitre, double initialMassMilligramsPerSquareMetre,
            double initialMaxSoilMilligramsPerKilogram, double[] steadyPointMilligramsPerLitre,
            double[] soilPerWaterLitresPerKilogram, double daysPerPoreVolume, Supplier<double[][]> pointCoefficientSource) {
        this.ratesPerDay = ratesPerDay;
        this.effluentCoefficients = effluentCoefficients;
        this.massCoefficients = massCoefficients;
        this.steadyEffluentMilligramsPerLitre = steadyEffluentMilligramsPerLitre;
        this.steadyMassMilligramsPerSquareMetre = steadyMassMilligramsPerSquareMetre;
        this.initialMaxWaterMilligramsPerLitre = initialMaxWaterMilligramsPerLitre;
        this.initialMassMilligramsPerSquareMetre = initialMassMilligramsPerSquareMetre;
        this.initialMaxSoilMilligramsPerKilogram = initialMaxSoilMilligramsPerKilogram;
        this.steadyPointMilligramsPerLitre = steadyPointMilligramsPerLitre;
        this.soilPerWaterLitresPerKilogram = soilPerWaterLitresPerKilogram;
        this.daysPerPoreVolume = daysPerPoreVolume;
        this.pointCoefficientSource = pointCoefficientSource;
    }

    /**
     * Indices of {@code values} in ascending order of value (insertion sort: n is small, often
     * nearly sorted).
     */
    static int[] ascendingOrder(double[] values) {
        int[] out = new int[values.length];
        for (int i = 0; i < out.length; i++) {
            int j = i;
            while (j > 0 && values[out[j - 1]] > values[i]) {
                out[j] = out[j - 1];
                j--;
            }
            out[j] = i;
        }
        return out;
    }

    private static double sum(double[] coefficients, double[] rates, double t) {
        double s = 0;
        for (int k = 0; k < coefficients.length; k++) {
            double exponent = -rates[k] * t;
            if (exponent < LOG_SMALLEST) {
                break; // rates ascend: every later term is smaller still
            }
            s += coefficients[k] * Math.exp(exponent);
        }
        return s;
    }

    double[] ratesPerDay() {
        return ratesPerDay.clone();
    }

    double effluentMilligramsPerLitre(double days) {
        TransportInputException.requireNonNegative("time (days)", days);
        return steadyEffluentMilligramsPerLitre + sum(effluentCoefficients, ratesPerDay, days);
    }

    double storedMilligramsPerSquareMetre(double days) {
        TransportInputException.requireNonNegative("time (days)", days);
        return steadyMassMilligramsPerSquareMetre + sum(massCoefficients, ratesPerDay, days);
    }

    double[] pointMilligramsPerLitre(double days) {
        TransportInputException.requireNonNegative("time (days)", days);
        double[][] cc = pointCoefficients();
        int modes = ratesPerDay.length;
        double[] e = new double[modes];
        for (int k = 0; k < modes; k++) {
            double exponent = -ratesPerDay[k] * days;
            e[k] = exponent < LOG_SMALLEST ? 0 : Math.exp(exponent);
        }
        double[] c = new double[cc.length];
        for (int i = 0; i < cc.length; i++) {
            double s = steadyPointMilligramsPerLitre[i];
            double[] row = cc[i];
            for (int k = 0; k < modes; k++) {
                s += row[k] * e[k];
            }
            c[i] = s;
        }
        return c;
    }

    private double[][] pointCoefficients() {
        double[][] cc = pointCoefficients;
        if (cc != null) {
            return cc;
        }
        synchronized (this) {
            if (pointCoefficients == null) {
                pointCoefficients = pointCoefficientSource.get();
            }
            return pointCoefficients;
        }
    }

    /** The criterion's value over its initial value, clipped to [0, 1]. */
    double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        if (criterion == null) {
            throw new TransportInputException("cleanup criterion", null, "one of effluent, mean, max");
        }
        TransportInputException.requireNonNegative("pore volumes (dimensionless)", poreVolumes);
        double days = poreVolumes * daysPerPoreVolume;
        double f;
        switch (criterion) {
            case EFFLUENT:
                f = effluentMilligramsPerLitre(days) / reference(initialMaxWaterMilligramsPerLitre);
                break;
            case MEAN_RESIDUAL:
                f = storedMilligramsPerSquareMetre(days) / reference(initialMassMilligramsPerSquareMetre);
                break;
            default: {
                double[] c = pointMilligramsPerLitre(days);
                double max = 0;
                for (int i = 0; i < c.length; i++) {
                    max = Math.max(max, soilPerWaterLitresPerKilogram[i] * c[i]);
                }
                f = max / reference(initialMaxSoilMilligramsPerKilogram);
            }
        }
        return Math.min(1, Math.max(0, f));
    }

    private static double reference(double initial) {
        return initial > 0 ? initial : 1;
    }

    /**
     * From the slowest mode alone: a_1 exp(-lambda_1 t) = target, which the late-time tail
     * follows (for the maximum, the effluent's estimate).
     */
    double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        boolean mean = criterion == CleanupCriterion.MEAN_RESIDUAL;
        double[] a = mean ? massCoefficients : effluentCoefficients;
        double lead = a.length == 0 ? 0
                : a[0] / reference(mean ? initialMassMilligramsPerSquareMetre : initialMaxWaterMilligramsPerLitre);
        if (!(lead > targetFraction) || !(ratesPerDay[0] > 0)) {
            return 1;
        }
        return Math.log(lead / targetFraction) / ratesPerDay[0] / daysPerPoreVolume;
    }
}
