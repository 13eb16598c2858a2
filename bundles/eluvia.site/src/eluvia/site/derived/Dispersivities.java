package eluvia.site.derived;

import eluvia.site.model.DispersivityRule;
import eluvia.site.model.SoilLayer;

/**
 * The longitudinal dispersivity a calculation uses for a soil layer, and the words that state the
 * rule in results.
 *
 * <p>Rules (lengths in metres):
 * <ul>
 * <li>{@link DispersivityRule#ENTERED}: the layer's {@code dispersivityMetres};</li>
 * <li>{@link DispersivityRule#TENTH_OF_SCALE}: alpha_L = 0.1 L (common practice, no published source);</li>
 * <li>{@link DispersivityRule#XU_ECKSTEIN_1995}: alpha_L = 0.83 (log10 L)^2.414 (Xu, M., Eckstein, Y.
 * 1995, Ground Water 33:905), defined for L above 1 m only.</li>
 * </ul>
 * L is the layer's {@code dispersivityScaleMetres}, or its thickness when that is 0. Gelhar, Welty
 * and Rehfeldt (1992) show field dispersivities scattering over 2-3 orders of magnitude at a given
 * scale: every rule is a screening estimate.
 */
public final class Dispersivities {

    /** Factor of the common-practice rule alpha_L = 0.1 L (dimensionless). */
    public static final double TENTH_OF_SCALE_FACTOR = 0.1;
    /** Coefficient of Xu and Eckstein (1995), in metres. */
    public static final double XU_ECKSTEIN_COEFFICIENT_METRES = 0.83;
    /** Exponent of Xu and Eckstein (1995), dimensionless. */
    public static final double XU_ECKSTEIN_EXPONENT = 2.414;

    private Dispersivities() {
    }

    /**
     * The flow length L in metres for the layer's scale rule: {@code dispersivityScaleMetres} when
     * positive, else the layer thickness.
     */
    public static double scaleMetres(SoilLayer layer) {
        double scale = layer.getDispersivityScaleMetres();
        return scale > 0 ? scale : layer.getBottomDepthMetres() - layer.getTopDepthMetres();
    }

    /**
     * The dispersivity in metres that calculations use for the layer; NaN when a scale rule cannot
     * be applied (non-positive flow length, or L at most 1 m for Xu and Eckstein), which the
     * validator reports.
     */
    public static double effectiveDispersivityMetres(SoilLayer layer) {
        DispersivityRule rule = layer.getDispersivityRule();
        if (rule == null || rule == DispersivityRule.ENTERED) {
            return layer.getDispersivityMetres();
        }
        double scale = scaleMetres(layer);
        if (!(Double.isFinite(scale) && scale > 0) || (rule == DispersivityRule.XU_ECKSTEIN_1995 && scale <= 1)) {
            return Double.NaN;
        }
        return rule == DispersivityRule.TENTH_OF_SCALE ? tenthOfScaleMetres(scale) : xuEckstein1995Metres(scale);
    }

    /**
     * alpha_L = 0.1 L (common practice).
     *
     * @param scaleMetres flow length L in metres, greater than 0
     * @throws IllegalArgumentException for L not greater than 0
     */
    public static double tenthOfScaleMetres(double scaleMetres) {
        if (!(Double.isFinite(scaleMetres) && scaleMetres > 0)) {
            throw new IllegalArgumentException("flow length L = " + scaleMetres + " m: allowed (0, infinity) m");
        }
        return TENTH_OF_SCALE_FACTOR * scaleMetres;
    }

    /**
     * alpha_L = 0.83 (log10 L)^2.414 (Xu and Eckstein 1995).
     *
     * @param scaleMetres flow length L in metres, greater than 1
     * @throws IllegalArgumentException for L at most 1 m, where log10 L is not positive and the fit
     *     does not apply (use 0.1 L or enter the dispersivity)
     */
    public static double xuEckstein1995Metres(double scaleMetres) {
        if (!(Double.isFinite(scaleMetres) && scaleMetres > 1)) {
            throw new IllegalArgumentException("flow length L = " + scaleMetres
                    + " m: allowed (1, infinity) m for Xu and Eckstein (1995); below 1 m use alpha_L = 0.1 L or enter the dispersivity");
        }
        return XU_ECKSTEIN_COEFFICIENT_METRES * Math.pow(Math.log10(scaleMetres), XU_ECKSTEIN_EXPONENT);
    }

    /** How the layer's dispersivity was obtained, for results and the design package. */
    public static String describe(SoilLayer layer) {
        DispersivityRule rule = layer.getDispersivityRule();
        if (rule == null || rule == DispersivityRule.ENTERED) {
            return "dispersivity entered: " + layer.getDispersivityMetres() + " m";
        }
        String formula = rule == DispersivityRule.TENTH_OF_SCALE
                ? "alpha_L = 0.1 L (common practice, no published source)"
                : "alpha_L = 0.83 (log10 L)^2.414 (Xu and Eckstein 1995, Ground Water 33:905)";
        return "dispersivity from " + formula + " with L = " + scaleMetres(layer) + " m: "
                + effectiveDispersivityMetres(layer) + " m";
    }
}
