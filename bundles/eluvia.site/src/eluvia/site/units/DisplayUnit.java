package eluvia.site.units;

/**
 * A unit in which a quantity may be shown or entered, with its exact factor to the storage unit of
 * its {@link Dimension}.
 *
 * <p>Factors follow from exact definitions: 1 ft = 0.3048 m and 1 lb = 0.45359237 kg
 * (international yard and pound, 1959); 1 yd3 = 27 ft3 = 0.764554857984 m3; 1 US gal = 231 in3
 * = 3.785411784 L; 1 US ton = 2000 lb = 907.18474 kg; 1 acre = 43560 ft2 = 4046.8564224 m2;
 * 1 cm/s = 864 m/d (REFERENCES.md, Units). Each factor is computed from these definitions in
 * double precision, so it is the nearest double to the exact value (or within one rounding).
 */
public enum DisplayUnit {
    METRE("m", Dimension.LENGTH, 1.0),
    FOOT("ft", Dimension.LENGTH, Definitions.FOOT_METRES),
    INCH("in", Dimension.LENGTH, Definitions.FOOT_METRES / 12.0),

    SQUARE_METRE("m2", Dimension.AREA, 1.0),
    HECTARE("ha", Dimension.AREA, 1.0e4),
    SQUARE_FOOT("ft2", Dimension.AREA, Definitions.FOOT_METRES * Definitions.FOOT_METRES),
    ACRE("acre", Dimension.AREA, 43560.0 * Definitions.FOOT_METRES * Definitions.FOOT_METRES),

    CUBIC_METRE("m3", Dimension.VOLUME, 1.0),
    LITRE("L", Dimension.VOLUME, 1.0e-3),
    CUBIC_FOOT("ft3", Dimension.VOLUME, Definitions.CUBIC_FOOT_CUBIC_METRES),
    CUBIC_YARD("yd3", Dimension.VOLUME, 27.0 * Definitions.CUBIC_FOOT_CUBIC_METRES),
    US_GALLON("US gal", Dimension.VOLUME, Definitions.US_GALLON_CUBIC_METRES),

    KILOGRAM("kg", Dimension.MASS, 1.0),
    TONNE("t", Dimension.MASS, 1000.0),
    POUND("lb", Dimension.MASS, Definitions.POUND_KILOGRAMS),
    US_TON("US ton", Dimension.MASS, 2000.0 * Definitions.POUND_KILOGRAMS),

    KILOGRAM_PER_CUBIC_METRE("kg/m3", Dimension.DENSITY, 1.0),
    GRAM_PER_CUBIC_CENTIMETRE("g/cm3", Dimension.DENSITY, 1000.0),
    POUND_PER_CUBIC_FOOT("lb/ft3", Dimension.DENSITY, Definitions.POUND_KILOGRAMS / Definitions.CUBIC_FOOT_CUBIC_METRES),

    METRE_PER_DAY("m/d", Dimension.VELOCITY, 1.0),
    CENTIMETRE_PER_SECOND("cm/s", Dimension.VELOCITY, 0.01 * Definitions.SECONDS_PER_DAY),
    FOOT_PER_DAY("ft/d", Dimension.VELOCITY, Definitions.FOOT_METRES),

    CUBIC_METRE_PER_DAY("m3/d", Dimension.FLOW_RATE, 1.0),
    LITRE_PER_SECOND("L/s", Dimension.FLOW_RATE, 1.0e-3 * Definitions.SECONDS_PER_DAY),
    US_GALLON_PER_MINUTE("US gal/min", Dimension.FLOW_RATE, Definitions.US_GALLON_CUBIC_METRES * Definitions.MINUTES_PER_DAY),
    US_GALLON_PER_DAY("US gal/d", Dimension.FLOW_RATE, Definitions.US_GALLON_CUBIC_METRES);

    private final String symbol;
    private final Dimension dimension;
    private final double storageUnitsPerUnit;

    DisplayUnit(String symbol, Dimension dimension, double storageUnitsPerUnit) {
        this.symbol = symbol;
        this.dimension = dimension;
        this.storageUnitsPerUnit = storageUnitsPerUnit;
    }

    /** The symbol shown after numbers, e.g. {@code yd3}. */
    public String symbol() {
        return symbol;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** How many storage units (see {@link Dimension#storageSymbol()}) one of this unit is. */
    public double storageUnitsPerUnit() {
        return storageUnitsPerUnit;
    }

    /** Exact definitions the factors are built from. */
    private static final class Definitions {
        static final double FOOT_METRES = 0.3048;
        static final double CUBIC_FOOT_CUBIC_METRES = FOOT_METRES * FOOT_METRES * FOOT_METRES;
        static final double POUND_KILOGRAMS = 0.45359237;
        /** 231 cubic inches. */
        static final double US_GALLON_CUBIC_METRES = 231.0 * 0.0254 * 0.0254 * 0.0254;
        static final double SECONDS_PER_DAY = 86400.0;
        static final double MINUTES_PER_DAY = 1440.0;
    }
}
