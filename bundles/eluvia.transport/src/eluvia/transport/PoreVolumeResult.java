package eluvia.transport;

/**
 * Result of a pore-volume search ({@link PoreVolumeSearch}).
 *
 * @param criterion the cleanup criterion searched for
 * @param targetFraction the target as a fraction of the initial concentration, dimensionless, in (0, 1)
 * @param reachable whether the target is met within {@code maxPoreVolumes}
 * @param poreVolumes pore volumes (dimensionless) at which the criterion first meets the target;
 *        NaN when not reachable
 * @param remainingAtLimit the remaining fraction (dimensionless) after {@code maxPoreVolumes}:
 *        what is reached when the target is not
 * @param maxPoreVolumes the search limit, pore volumes (dimensionless)
 * @param evaluations number of model evaluations the search used
 */
public record PoreVolumeResult(CleanupCriterion criterion, double targetFraction, boolean reachable,
        double poreVolumes, double remainingAtLimit, double maxPoreVolumes, int evaluations) {

    /** A plain-words statement of the result, e.g. for a report or a log line. */
    public String describe() {
        if (reachable) {
            return "the " + criterion.description() + " reaches " + plain(targetFraction, 4)
                    + " of the initial concentration after " + plain(poreVolumes, 6) + " pore volumes";
        }
        return "the " + criterion.description() + " does not reach " + plain(targetFraction, 4)
                + " of the initial concentration within " + plain(maxPoreVolumes, 6) + " pore volumes (it is still "
                + plain(remainingAtLimit, 4) + " there)";
    }

    private static String plain(double value, int digits) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            return String.valueOf(value);
        }
        String s = new java.math.BigDecimal(value).round(new java.math.MathContext(digits)).stripTrailingZeros()
                .toString();
        return s.replace("E", "e").replace("e+", "e");
    }
}
