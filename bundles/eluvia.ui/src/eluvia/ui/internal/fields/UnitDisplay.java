package eluvia.ui.internal.fields;

import eluvia.site.model.UnitSystem;
import eluvia.site.units.Dimension;
import eluvia.site.units.DisplayUnit;
import eluvia.site.units.Units;

/**
 * Conversion for display through {@link Units}: the model stores SI, the user sees and types the
 * units of the chosen {@link UnitSystem}. Quantities without a {@link Dimension} (concentrations in
 * mg/kg, Koc in L/kg, fractions) are shown in their storage unit under both systems.
 */
public final class UnitDisplay {

    private final UnitSystem system;

    public UnitDisplay(UnitSystem system) {
        this.system = system == null ? UnitSystem.SI : system;
    }

    public UnitSystem system() {
        return system;
    }

    /** The unit a dimension is shown in. */
    public DisplayUnit unit(Dimension dimension) {
        return Units.displayUnit(dimension, system);
    }

    /** The symbol shown for a dimension, with superscripts, e.g. {@code m³} or {@code yd³}. */
    public String symbol(Dimension dimension) {
        return pretty(unit(dimension).symbol());
    }

    /** A stored value in display units. */
    public double toDisplay(double storedValue, Dimension dimension) {
        if (dimension == null || !Double.isFinite(storedValue)) {
            return storedValue;
        }
        return Units.fromStorage(storedValue, unit(dimension));
    }

    /** A value typed in display units, in storage units. */
    public double toStorage(double displayedValue, Dimension dimension) {
        if (dimension == null || !Double.isFinite(displayedValue)) {
            return displayedValue;
        }
        return Units.toStorage(displayedValue, unit(dimension));
    }

    /** A stored value with its display unit, e.g. {@code 9.84 ft}, to the given significant figures. */
    public String format(double storedValue, Dimension dimension, int significantDigits) {
        return Numbers.format(toDisplay(storedValue, dimension), significantDigits) + " " + symbol(dimension);
    }

    /** The same unit system for the report bundle's figures (charts in the chosen units). */
    public eluvia.report.content.FigureUnits figureUnits() {
        return eluvia.report.content.FigureUnits.of(system);
    }

    /** A unit symbol with the exponents 2 and 3 written as superscripts ({@code m3} to {@code m³}). */
    public static String pretty(String symbol) {
        return eluvia.report.content.FigureUnits.pretty(symbol);
    }
}
