package eluvia.ui.internal.fields;

/**
 * What a number field holds: its name, its unit (a dimension converted for display, or a fixed
 * unit shown as it is stored) and its allowed range in storage units.
 *
 * @param name the field's name without unit, e.g. "Darcy flux"
 * @param dimension the dimension converted for display, or null for a fixed unit
 * @param fixedUnit the unit shown when {@code dimension} is null, e.g. "mg/kg"; "-" for dimensionless
 * @param range allowed values in storage units
 */
public record NumberSpec(String name, eluvia.site.units.Dimension dimension, String fixedUnit, Range range) {

    /** A quantity of a dimension that follows the unit system. */
    public static NumberSpec of(String name, eluvia.site.units.Dimension dimension, Range range) {
        return new NumberSpec(name, dimension, null, range);
    }

    /** A quantity shown in the unit it is stored in under every unit system. */
    public static NumberSpec fixed(String name, String unit, Range range) {
        return new NumberSpec(name, null, unit, range);
    }

    /** The unit symbol shown under a unit system. */
    public String unitSymbol(UnitDisplay units) {
        return dimension == null ? UnitDisplay.pretty(fixedUnit) : units.symbol(dimension);
    }

    /** The label with its unit, e.g. "Darcy flux (ft/d)". */
    public String label(UnitDisplay units) {
        return name + " (" + unitSymbol(units) + ")";
    }

    /** The allowed range in words in the units shown. */
    public String allowed(UnitDisplay units) {
        String unit = unitSymbol(units);
        String suffix = unit.equals("-") ? "" : " " + unit;
        return range.describe(v -> units.toDisplay(v, dimension), suffix);
    }
}
