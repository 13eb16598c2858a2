package eluvia.cost;

/**
 * Soil and rock classes for excavation side slopes, with the published maximum allowable slope.
 *
 * <p>Slopes are horizontal per vertical (m in "m H : 1 V"); 0 is a vertical wall. The values are
 * those of US OSHA 29 CFR 1926 Subpart P, Appendix B, Table B-1 (maximum allowable slopes for
 * excavations less than 20 ft deep): stable rock vertical, Type A 3/4 : 1, Type B 1 : 1,
 * Type C 1-1/2 : 1. They are a default to start from: a competent person classifies the soil on
 * site, and the rules where the site is govern. Override them with {@link SideSlopeTable#with}.
 */
public enum SoilSlopeClass {
    /** Stable rock: vertical sides allowed (slope 0). */
    STABLE_ROCK(0.0, "stable rock"),
    /** Type A soil (e.g. cohesive soil of unconfined compressive strength 1.5 tsf or more): 3/4 : 1. */
    TYPE_A(0.75, "Type A soil"),
    /** Type B soil: 1 : 1. */
    TYPE_B(1.0, "Type B soil"),
    /** Type C soil (e.g. granular soil, submerged soil, soil from which water seeps): 1-1/2 : 1. */
    TYPE_C(1.5, "Type C soil");

    /** Where the default slopes come from. */
    public static final String SOURCE = "US OSHA 29 CFR 1926 Subpart P, App. B, Table B-1 "
            + "(maximum allowable slopes, excavations less than 20 ft deep)";

    private final double publishedMaximumSlopeHorizontalPerVertical;
    private final String label;

    SoilSlopeClass(double slope, String label) {
        this.publishedMaximumSlopeHorizontalPerVertical = slope;
        this.label = label;
    }

    /**
     * The maximum allowable slope of Table B-1 for this class, horizontal per vertical
     * (dimensionless): the steepest side this class may have without an engineered design.
     */
    public double publishedMaximumSlopeHorizontalPerVertical() {
        return publishedMaximumSlopeHorizontalPerVertical;
    }

    /** Plain label, e.g. {@code "Type B soil"}. */
    public String label() {
        return label;
    }
}
