package eluvia.cost;

import java.util.EnumMap;
import java.util.Map;

import eluvia.cost.internal.Checks;

/**
 * The side slope to design with for each {@link SoilSlopeClass}: the published default of
 * {@link SoilSlopeClass#SOURCE} unless the user overrides it (for a site-specific geotechnical
 * recommendation, or a jurisdiction with other rules). Immutable.
 *
 * <p>Slopes are horizontal per vertical (dimensionless), 0 for a vertical side. An override steeper
 * than the published maximum is accepted (the rules allow engineered designs) but the sizing then
 * raises a {@link Caution#SLOPE_STEEPER_THAN_TABLE} caution.
 */
public final class SideSlopeTable {
    /** Largest slope accepted, horizontal per vertical; flatter sides are not a pit any more. */
    public static final double MAXIMUM_SLOPE_HORIZONTAL_PER_VERTICAL = 10.0;

    private final Map<SoilSlopeClass, Double> overrides;

    private SideSlopeTable(Map<SoilSlopeClass, Double> overrides) {
        this.overrides = overrides;
    }

    /** The published defaults, no overrides. */
    public static SideSlopeTable defaults() {
        return new SideSlopeTable(new EnumMap<>(SoilSlopeClass.class));
    }

    /** A copy of this table with the slope for {@code soilClass} overridden. */
    public SideSlopeTable with(SoilSlopeClass soilClass, double slopeHorizontalPerVertical) {
        Checks.notNull("soil class", soilClass);
        checkSlope("side slope for " + soilClass.label() + " (horizontal per vertical)", slopeHorizontalPerVertical);
        EnumMap<SoilSlopeClass, Double> copy = new EnumMap<>(SoilSlopeClass.class);
        copy.putAll(overrides);
        copy.put(soilClass, slopeHorizontalPerVertical);
        return new SideSlopeTable(copy);
    }

    /** The slope to design with, horizontal per vertical (dimensionless). */
    public double slopeHorizontalPerVertical(SoilSlopeClass soilClass) {
        Checks.notNull("soil class", soilClass);
        Double o = overrides.get(soilClass);
        return o != null ? o : soilClass.publishedMaximumSlopeHorizontalPerVertical();
    }

    /** Whether the user has overridden the published slope for this class. */
    public boolean isOverridden(SoilSlopeClass soilClass) {
        return overrides.containsKey(soilClass);
    }

    /** Where the slope for this class comes from, for the trace. */
    public String source(SoilSlopeClass soilClass) {
        return isOverridden(soilClass) ? "user override of " + SoilSlopeClass.SOURCE : SoilSlopeClass.SOURCE;
    }

    static double checkSlope(String quantity, double slope) {
        return Checks.closed(quantity, slope, 0.0, MAXIMUM_SLOPE_HORIZONTAL_PER_VERTICAL,
                "enter horizontal distance per unit depth (1.5 for 1-1/2 : 1); 0 is a vertical side");
    }
}
