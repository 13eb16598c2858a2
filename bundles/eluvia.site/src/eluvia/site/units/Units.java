package eluvia.site.units;

import java.util.Locale;
import java.util.Objects;

import eluvia.site.model.UnitSystem;

/**
 * Conversion between the storage units of the project (see {@link Dimension}) and the units shown
 * to the user, SI or US customary. Every quantity in the model is stored in SI; conversion happens
 * only at entry and display.
 */
public final class Units {

    private Units() {
    }

    /**
     * A value in {@code unit} expressed in the storage unit of its dimension.
     *
     * @throws IllegalArgumentException for a value that is not finite
     */
    public static double toStorage(double value, DisplayUnit unit) {
        Objects.requireNonNull(unit, "unit");
        requireFinite(value, unit);
        return value * unit.storageUnitsPerUnit();
    }

    /**
     * A stored value expressed in {@code unit}.
     *
     * @throws IllegalArgumentException for a value that is not finite
     */
    public static double fromStorage(double storedValue, DisplayUnit unit) {
        Objects.requireNonNull(unit, "unit");
        if (!Double.isFinite(storedValue)) {
            throw new IllegalArgumentException("value = " + storedValue + " " + unit.dimension().storageSymbol()
                    + ": allowed a finite number");
        }
        return storedValue / unit.storageUnitsPerUnit();
    }

    /**
     * Converts between two units of one dimension.
     *
     * @throws IllegalArgumentException for units of different dimensions or a value that is not finite
     */
    public static double convert(double value, DisplayUnit from, DisplayUnit to) {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        if (from.dimension() != to.dimension()) {
            throw new IllegalArgumentException("cannot convert " + from.symbol() + " (" + from.dimension() + ") to "
                    + to.symbol() + " (" + to.dimension() + "): allowed units of the same dimension");
        }
        return fromStorage(toStorage(value, from), to);
    }

    /** The unit a dimension is shown in under a unit system. */
    public static DisplayUnit displayUnit(Dimension dimension, UnitSystem system) {
        Objects.requireNonNull(dimension, "dimension");
        boolean us = system == UnitSystem.US_CUSTOMARY;
        return switch (dimension) {
            case LENGTH -> us ? DisplayUnit.FOOT : DisplayUnit.METRE;
            case AREA -> us ? DisplayUnit.SQUARE_FOOT : DisplayUnit.SQUARE_METRE;
            case VOLUME -> us ? DisplayUnit.CUBIC_YARD : DisplayUnit.CUBIC_METRE;
            case MASS -> us ? DisplayUnit.US_TON : DisplayUnit.TONNE;
            case DENSITY -> us ? DisplayUnit.POUND_PER_CUBIC_FOOT : DisplayUnit.KILOGRAM_PER_CUBIC_METRE;
            case VELOCITY -> us ? DisplayUnit.FOOT_PER_DAY : DisplayUnit.METRE_PER_DAY;
            case FLOW_RATE -> us ? DisplayUnit.US_GALLON_PER_MINUTE : DisplayUnit.CUBIC_METRE_PER_DAY;
        };
    }

    /**
     * A stored value shown in the unit system's unit with the given number of significant digits,
     * e.g. {@code 9.84 ft}.
     */
    public static String format(double storedValue, Dimension dimension, UnitSystem system, int significantDigits) {
        if (significantDigits < 1 || significantDigits > 17) {
            throw new IllegalArgumentException("significantDigits = " + significantDigits + ": allowed 1 to 17");
        }
        DisplayUnit unit = displayUnit(dimension, system);
        if (!Double.isFinite(storedValue)) {
            return storedValue + " " + unit.symbol();
        }
        double shown = fromStorage(storedValue, unit);
        String number = new java.math.BigDecimal(shown).round(new java.math.MathContext(significantDigits))
                .stripTrailingZeros().toPlainString();
        return String.format(Locale.ROOT, "%s %s", number, unit.symbol());
    }

    private static void requireFinite(double value, DisplayUnit unit) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value = " + value + " " + unit.symbol() + ": allowed a finite number");
        }
    }
}
