package eluvia.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.PoreVolumeResult;

/**
 * The numerical run's independent check on the same layered profile: the spectral-element
 * solution, exact in time ({@code SpectralElementFlushingSolution} of the transport bundle), a
 * different discretisation of the same equations, computed whenever every layer has linear
 * equilibrium sorption and the profile's Peclet numbers allow it.
 *
 * @param available whether the check was computed
 * @param unavailableReason why not, in words (empty when available)
 * @param degree degree of the element polynomials (0 when unavailable)
 * @param pointCount unknowns of the spectral-element solution (0 when unavailable)
 * @param byCriterion pore volumes to the target per criterion (empty when unavailable)
 */
public record SpectralCheck(boolean available, String unavailableReason, int degree, int pointCount,
        Map<CleanupCriterion, PoreVolumeResult> byCriterion) {

    /** Difference above which the design notes tell the user to refine the numerical run (relative). */
    public static final double NOTE_ABOVE_RELATIVE_DIFFERENCE = 0.01;

    /** Copies the map. */
    public SpectralCheck {
        byCriterion = Map.copyOf(byCriterion);
    }

    /** A check that could not be computed, with the reason. */
    public static SpectralCheck notAvailable(String reason) {
        return new SpectralCheck(false, reason, 0, 0, Map.of());
    }

    /**
     * The check in words beside the numerical run {@code numerical} (its pore volumes per
     * criterion and the run's relative difference from them), or the reason it was not computed.
     */
    public String describe(MethodEstimate numerical) {
        if (!available) {
            return unavailableReason;
        }
        List<String> byWord = new ArrayList<>();
        for (CleanupCriterion k : CleanupCriterion.values()) {
            PoreVolumeResult pv = byCriterion.get(k);
            double diff = relativeDifference(k, numerical == null ? null : numerical.result(k));
            byWord.add(k.description() + " " + (pv.reachable() ? String.format(Locale.ROOT, "%.4g", pv.poreVolumes())
                    : "not reached") + (Double.isNaN(diff) ? "" : String.format(Locale.ROOT, " (numerical run %+.1e relative)", diff)));
        }
        return "spectral elements of degree " + degree + " (" + pointCount + " points, exact in time) give "
                + String.join(", ", byWord) + " pore volumes";
    }

    /**
     * (numerical - check) / check for one criterion (dimensionless); NaN when the check is
     * unavailable or either side does not reach the target.
     */
    public double relativeDifference(CleanupCriterion criterion, PoreVolumeResult numerical) {
        PoreVolumeResult check = byCriterion.get(criterion);
        if (!available || check == null || !check.reachable() || numerical == null || !numerical.reachable()) {
            return Double.NaN;
        }
        return numerical.poreVolumes() / check.poreVolumes() - 1;
    }
}
