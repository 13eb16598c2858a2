package eluvia.cost;

import java.util.ArrayList;
import java.util.List;

/**
 * The shipped example price book and example recipes for an invented scenario.
 *
 * <p><b>Every rate and every markup here is invented for the example.</b> They are round numbers
 * chosen only so the example runs and reads plausibly; they come from no quote, database or
 * project, every item is flagged {@link PriceItem#invented()}, and any estimate using one carries an
 * {@link Caution#INVENTED_RATES} caution. Users must supply their own rates.
 */
public final class ExamplePriceBook {
    /** Currency label of the example (the amounts are invented all the same). */
    public static final String CURRENCY = "USD";
    /** Source note on every example item. */
    public static final String INVENTED_NOTE = "INVENTED for the example price book: not a market rate; supply your own";

    /** Lump-sum quantity name: mobilisation and demobilisation. */
    public static final String MOBILISATION = "mobilisation";
    /** Lump-sum quantity name: flushing wells, piping and treatment plant installed. */
    public static final String FLUSHING_SYSTEM = "flushing system";
    /** Lump-sum quantity name: one year of system operation (labour, power, upkeep). */
    public static final String SYSTEM_OPERATION_PER_YEAR = "system operation per year";

    private ExamplePriceBook() {
    }

    /** The example book; every item invented. */
    public static PriceBook create() {
        List<PriceItem> items = new ArrayList<>();
        items.add(item("mobilisation", "Mobilisation and demobilisation", CostUnit.LUMP_SUM, 25_000));
        items.add(item("excavate-bank", "Excavate and load, per bank m3", CostUnit.CUBIC_METRE, 12));
        items.add(item("haul-load", "Haul one truckload", CostUnit.LOAD, 450));
        items.add(item("dispose-contaminated", "Disposal of contaminated soil at a permitted facility", CostUnit.TONNE, 70));
        items.add(item("stockpile-overburden", "Stockpile and cover clean overburden, per loose m3", CostUnit.CUBIC_METRE, 4));
        items.add(item("borrow-purchase", "Borrow fill at the source, per bank m3", CostUnit.CUBIC_METRE, 14));
        items.add(item("place-compact", "Place and compact backfill, per compacted m3", CostUnit.CUBIC_METRE, 9));
        items.add(item("site-restoration", "Grade, topsoil and seed", CostUnit.SQUARE_METRE, 6));
        items.add(item("flushing-system", "Flushing wells, piping and treatment plant, installed", CostUnit.LUMP_SUM, 180_000));
        items.add(item("system-operation", "System operation for one year", CostUnit.LUMP_SUM, 60_000));
        items.add(item("water-treatment", "Treat extracted water", CostUnit.CUBIC_METRE, 3.5));
        items.add(item("amendment", "Flushing amendment", CostUnit.KILOGRAM, 2.2));
        items.add(item("monitoring-sample", "Collect and analyse one sample", CostUnit.SAMPLE, 250));
        return new PriceBook("Example price book (invented rates)", CURRENCY, items);
    }

    /** Example capital markups (invented values). */
    public static CapitalMarkups capitalMarkups() {
        return new CapitalMarkups(15, 10, 5, 8, 6);
    }

    /** Example O&amp;M markups (invented values). */
    public static OperatingMarkups operatingMarkups() {
        return new OperatingMarkups(10, 5, 5);
    }

    /** The lump-sum quantities the example recipes use. */
    public static QuantitySet lumpSums() {
        return QuantitySet.of(Quantity.lumpSum(MOBILISATION, "one per project (invented scenario)"),
                Quantity.lumpSum(FLUSHING_SYSTEM, "one system (invented scenario)"),
                Quantity.lumpSum(SYSTEM_OPERATION_PER_YEAR, "one per operating year (invented scenario)"));
    }

    /** Example recipe for excavation; price {@code excavation.toQuantitySet().merge(lumpSums())}. */
    public static EstimateRecipe excavationRecipe() {
        return excavationLines(EstimateRecipe.builder("Excavation (invented example)", create()))
                .capitalMarkups(capitalMarkups()).operatingMarkups(operatingMarkups()).build();
    }

    /**
     * Example recipe for flushing; price {@code flushing.toQuantitySet().merge(lumpSums())}. Annual
     * O&amp;M runs for {@link FlushingQuantities#OPERATING_YEARS}.
     */
    public static EstimateRecipe flushingRecipe() {
        return flushingLines(EstimateRecipe.builder("Flushing (invented example)", create()))
                .capitalMarkups(capitalMarkups()).operatingMarkups(operatingMarkups())
                .operatingPeriod(OperatingPeriod.fromQuantity(FlushingQuantities.OPERATING_YEARS)).build();
    }

    /**
     * Example recipe for the hybrid (excavate the hot spot, flush the rest); price
     * {@code excavation.toQuantitySet().merge(flushing.toQuantitySet()).merge(lumpSums())}.
     */
    public static EstimateRecipe hybridRecipe() {
        EstimateRecipe.Builder b = EstimateRecipe.builder("Hybrid (invented example)", create());
        excavationLines(b);
        b.capital("flushing-system", FLUSHING_SYSTEM);
        annualFlushingLines(b);
        return b.capitalMarkups(capitalMarkups()).operatingMarkups(operatingMarkups())
                .operatingPeriod(OperatingPeriod.fromQuantity(FlushingQuantities.OPERATING_YEARS)).build();
    }

    private static EstimateRecipe.Builder excavationLines(EstimateRecipe.Builder b) {
        return b.capital("mobilisation", MOBILISATION)
                .capital("excavate-bank", ExcavationQuantities.PIT_BANK_VOLUME)
                .capital("haul-load", ExcavationQuantities.CONTAMINATED_LOADS)
                .capital("dispose-contaminated", ExcavationQuantities.CONTAMINATED_MASS)
                .capital("stockpile-overburden", ExcavationQuantities.OVERBURDEN_LOOSE_VOLUME)
                .capital("haul-load", ExcavationQuantities.OVERBURDEN_OFF_SITE_LOADS)
                .capital("borrow-purchase", ExcavationQuantities.IMPORT_BANK_VOLUME)
                .capital("haul-load", ExcavationQuantities.IMPORT_LOADS)
                .capital("place-compact", ExcavationQuantities.BACKFILL_COMPACTED_VOLUME)
                .capital("site-restoration", ExcavationQuantities.PIT_TOP_AREA);
    }

    private static EstimateRecipe.Builder flushingLines(EstimateRecipe.Builder b) {
        b.capital("mobilisation", MOBILISATION).capital("flushing-system", FLUSHING_SYSTEM);
        return annualFlushingLines(b);
    }

    private static EstimateRecipe.Builder annualFlushingLines(EstimateRecipe.Builder b) {
        return b.annual("system-operation", SYSTEM_OPERATION_PER_YEAR)
                .annual("water-treatment", FlushingQuantities.TREATED_WATER_PER_YEAR)
                .annual("amendment", FlushingQuantities.AMENDMENT_MASS_PER_YEAR)
                .annual("monitoring-sample", FlushingQuantities.MONITORING_SAMPLES_PER_YEAR);
    }

    private static PriceItem item(String id, String description, CostUnit unit, double rate) {
        return new PriceItem(id, description, unit, rate, CURRENCY, INVENTED_NOTE, true);
    }
}
