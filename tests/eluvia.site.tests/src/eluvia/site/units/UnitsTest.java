package eluvia.site.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.EnumSet;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import eluvia.site.model.UnitSystem;

/** Conversion factors against their exact definitions. */
final class UnitsTest {

    /** Relative tolerance for a factor computed in doubles from exact definitions: a few ulps. */
    private static final double RELATIVE = 4e-16;

    private static void assertFactor(String exactDecimal, DisplayUnit unit) {
        double exact = new BigDecimal(exactDecimal).doubleValue();
        assertEquals(exact, unit.storageUnitsPerUnit(), Math.abs(exact) * RELATIVE, unit.name());
    }

    @Test
    void factorsMatchTheExactDefinitions() {
        // REFERENCES.md, Units (exact definitions): 1 ft = 0.3048 m; 1 yd3 = 0.764554857984 m3;
        // 1 US gal = 3.785411784 L; 1 US ton = 907.18474 kg; 1 acre = 4046.8564224 m2; 1 cm/s = 864 m/d.
        assertFactor("0.3048", DisplayUnit.FOOT);
        assertFactor("0.764554857984", DisplayUnit.CUBIC_YARD);
        assertFactor("0.003785411784", DisplayUnit.US_GALLON);
        assertFactor("907.18474", DisplayUnit.US_TON);
        assertFactor("4046.8564224", DisplayUnit.ACRE);
        assertFactor("864", DisplayUnit.CENTIMETRE_PER_SECOND);
        // Exact products of the definitions, computed here in BigDecimal:
        // ft2 = 0.3048^2, ft3 = 0.3048^3, ft/d = 0.3048 m/d, in = 0.0254 m, lb = 0.45359237 kg (1959 definition, from memory).
        assertFactor(new BigDecimal("0.3048").pow(2).toPlainString(), DisplayUnit.SQUARE_FOOT);
        assertFactor(new BigDecimal("0.3048").pow(3).toPlainString(), DisplayUnit.CUBIC_FOOT);
        assertFactor("0.3048", DisplayUnit.FOOT_PER_DAY);
        assertFactor("0.0254", DisplayUnit.INCH);
        assertFactor("0.45359237", DisplayUnit.POUND);
        assertFactor(new BigDecimal("0.45359237").divide(new BigDecimal("0.3048").pow(3), java.math.MathContext.DECIMAL128)
                .toPlainString(), DisplayUnit.POUND_PER_CUBIC_FOOT);
        assertFactor(new BigDecimal("0.003785411784").multiply(new BigDecimal(1440)).toPlainString(), DisplayUnit.US_GALLON_PER_MINUTE);
        assertFactor("86.4", DisplayUnit.LITRE_PER_SECOND);
        assertFactor("1000", DisplayUnit.GRAM_PER_CUBIC_CENTIMETRE);
    }

    @Test
    void unitsRelateAsTheTradeKnowsThem() {
        // Facts of the trade: 27 ft3 in a cubic yard, 43560 ft2 in an acre, 2000 lb in a US ton, 12 in in a foot.
        assertEquals(27.0, Units.convert(1.0, DisplayUnit.CUBIC_YARD, DisplayUnit.CUBIC_FOOT), 27.0 * RELATIVE);
        assertEquals(43560.0, Units.convert(1.0, DisplayUnit.ACRE, DisplayUnit.SQUARE_FOOT), 43560.0 * RELATIVE);
        assertEquals(2000.0, Units.convert(1.0, DisplayUnit.US_TON, DisplayUnit.POUND), 2000.0 * RELATIVE);
        assertEquals(12.0, Units.convert(1.0, DisplayUnit.FOOT, DisplayUnit.INCH), 12.0 * RELATIVE);
        // Water: 1 g/cm3 = 62.43 lb/ft3 (common practice, from memory; 1000 / 16.0185 computed from the definitions).
        assertEquals(62.43, Units.convert(1.0, DisplayUnit.GRAM_PER_CUBIC_CENTIMETRE, DisplayUnit.POUND_PER_CUBIC_FOOT), 0.005);
    }

    @ParameterizedTest
    @EnumSource(DisplayUnit.class)
    void aRoundTripReturnsTheValue(DisplayUnit unit) {
        double value = 123.456789;
        assertEquals(value, Units.fromStorage(Units.toStorage(value, unit), unit), value * 4e-16);
    }

    @Test
    void everyDimensionHasADisplayUnitInBothSystemsAndTheSiOneIsTheStorageUnit() {
        for (Dimension dimension : Dimension.values()) {
            assertEquals(dimension, Units.displayUnit(dimension, UnitSystem.US_CUSTOMARY).dimension());
            DisplayUnit si = Units.displayUnit(dimension, UnitSystem.SI);
            assertEquals(dimension, si.dimension());
        }
        Set<DisplayUnit> storageUnits = EnumSet.of(DisplayUnit.METRE, DisplayUnit.SQUARE_METRE, DisplayUnit.CUBIC_METRE,
                DisplayUnit.KILOGRAM, DisplayUnit.KILOGRAM_PER_CUBIC_METRE, DisplayUnit.METRE_PER_DAY, DisplayUnit.CUBIC_METRE_PER_DAY);
        for (DisplayUnit unit : storageUnits) {
            assertEquals(1.0, unit.storageUnitsPerUnit(), 0.0);
            assertEquals(unit.dimension().storageSymbol(), unit.symbol());
        }
    }

    @Test
    void formatShowsTheSystemsUnit() {
        // 3 m = 9.8425 ft (3 / 0.3048, computed); 1 m3 = 1.30795 yd3 (1 / 0.764554857984, computed).
        assertEquals("9.84 ft", Units.format(3.0, Dimension.LENGTH, UnitSystem.US_CUSTOMARY, 3));
        assertEquals("1.308 yd3", Units.format(1.0, Dimension.VOLUME, UnitSystem.US_CUSTOMARY, 4));
        assertEquals("3 m", Units.format(3.0, Dimension.LENGTH, UnitSystem.SI, 3));
        assertTrue(Units.format(Double.NaN, Dimension.LENGTH, UnitSystem.SI, 3).startsWith("NaN"));
    }

    @Test
    void badInputsAreRefusedWithTheirValues() {
        IllegalArgumentException mixed = assertThrows(IllegalArgumentException.class,
                () -> Units.convert(1.0, DisplayUnit.FOOT, DisplayUnit.CUBIC_YARD));
        assertTrue(mixed.getMessage().contains("ft (LENGTH) to yd3 (VOLUME)"), mixed.getMessage());
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class, () -> Units.toStorage(Double.NaN, DisplayUnit.FOOT));
        assertTrue(nan.getMessage().contains("NaN ft"), nan.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Units.fromStorage(Double.POSITIVE_INFINITY, DisplayUnit.FOOT));
        assertThrows(IllegalArgumentException.class, () -> Units.format(1.0, Dimension.LENGTH, UnitSystem.SI, 0));
        assertThrows(NullPointerException.class, () -> Units.toStorage(1.0, null));
        assertThrows(NullPointerException.class, () -> Units.displayUnit(null, UnitSystem.SI));
    }
}
