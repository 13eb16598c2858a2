package eluvia.cost;

/**
 * The unit in which a {@link Quantity} is counted and a {@link PriceItem} is priced.
 *
 * <p>A line item multiplies a quantity by a unit rate only when both carry the same unit, so a
 * rate per tonne is never applied to cubic metres by mistake.
 */
public enum CostUnit {
    /** Cubic metre (bank, loose, compacted or water volume: the quantity name says which). */
    CUBIC_METRE("m3"),
    /** Square metre. */
    SQUARE_METRE("m2"),
    /** Metre. */
    METRE("m"),
    /** Metric tonne, 1000 kg. */
    TONNE("t"),
    /** Kilogram. */
    KILOGRAM("kg"),
    /** One truckload. */
    LOAD("load"),
    /** One analysed sample. */
    SAMPLE("sample"),
    /** One day (operating or calendar: the quantity name says which). */
    DAY("d"),
    /** One year. */
    YEAR("yr"),
    /** One item of anything counted. */
    EACH("ea"),
    /** A lump sum: quantity 1 for the whole job. */
    LUMP_SUM("LS");

    private final String symbol;

    CostUnit(String symbol) {
        this.symbol = symbol;
    }

    /** Short symbol for tables and reports, e.g. {@code m3}. */
    public String symbol() {
        return symbol;
    }
}
