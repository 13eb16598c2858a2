package eluvia.design;

/**
 * How the pipeline estimates soil concentrations on the block model from the samples.
 *
 * <p>Inverse-distance weighting is the default: it needs no variogram. Ordinary kriging needs one;
 * when none is given the pipeline states the default it used (see {@link DesignSettings#variogram()}).
 * Methods: Shepard (1968) for inverse-distance weighting; Matheron (1963) and Isaaks and
 * Srivastava (1989) for ordinary kriging (eluvia.zone).
 */
public enum ZoneEstimator {
    /** Inverse-distance weighting, power 2, 16 nearest samples (common practice). */
    INVERSE_DISTANCE("inverse-distance weighting"),
    /** Ordinary kriging with the settings' variogram model. */
    ORDINARY_KRIGING("ordinary kriging");

    private final String label;

    ZoneEstimator(String label) {
        this.label = label;
    }

    /** Words for results. */
    public String label() {
        return label;
    }
}
