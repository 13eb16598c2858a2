package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Line items, markups, present value and range on an invented price book, against hand arithmetic
 * and a year-by-year discounted cash flow computed in the test (US EPA/USACE 2000, EPA 540-R-00-002).
 */
final class CostEstimateTest {
    private static final String EUR = "EUR";
    // Invented user book (not flagged invented: it stands for a user's own rates in the tests).
    private static final PriceBook BOOK = new PriceBook("test book", EUR, List.of(
            new PriceItem("dig", "Excavate", CostUnit.CUBIC_METRE, 10, EUR, "invented test rate", false),
            new PriceItem("dispose", "Disposal", CostUnit.TONNE, 50, EUR, "invented test rate", false),
            new PriceItem("operate", "Operate one year", CostUnit.LUMP_SUM, 100_000, EUR, "invented test rate", false),
            new PriceItem("review", "Review", CostUnit.LUMP_SUM, 20_000, EUR, "invented test rate", false),
            new PriceItem("sample", "Sample", CostUnit.SAMPLE, 200, EUR, "invented test rate", false)));
    private static final QuantitySet QUANTITIES = QuantitySet.of(
            new Quantity("bank", 60_000, CostUnit.CUBIC_METRE, "bank volume, prismoidal formula (test)"),
            new Quantity("mass", 8_000, CostUnit.TONNE, "bank x density (test)"),
            Quantity.lumpSum("operation", "one per year (test)"),
            Quantity.lumpSum("review", "one (test)"),
            new Quantity("samples", 25, CostUnit.SAMPLE, "per year (test)"));
    private static final double CENT = 1e-6;

    private static EstimateRecipe.Builder recipe() {
        // Capital 60000 x 10 + 8000 x 50 = 600000 + 400000 = 1,000,000 (hand arithmetic).
        return EstimateRecipe.builder("test", BOOK).capital("dig", "bank").capital("dispose", "mass")
                // Annual 100000 + 25 x 200 = 105,000.
                .annual("operate", "operation").annual("sample", "samples")
                // Periodic: two reviews in year 5 (40,000) and one in year 10 (20,000).
                .periodic("review", "review", 5).periodic("review", "review", 5).periodic("review", "review", 10)
                .operatingPeriod(OperatingPeriod.fixed(10));
    }

    @Test
    void capitalMarkupsByHand() {
        CostEstimate e = recipe().capitalMarkups(new CapitalMarkups(15, 10, 5, 8, 6)).build().price(QUANTITIES);
        CapitalCost c = e.capital();
        // Hand arithmetic: subtotal 1,000,000; scope 15 % = 150,000; bid 10 % = 100,000 (both of the subtotal);
        // base 1,250,000; PM 5 % = 62,500; RD 8 % = 100,000; CM 6 % = 75,000; total 1,487,500.
        assertEquals(1_000_000, c.subtotal().amount(), CENT);
        assertEquals(150_000, c.scopeContingency().amount(), CENT);
        assertEquals(100_000, c.bidContingency().amount(), CENT);
        assertEquals(1_250_000, c.subtotalWithContingency().amount(), CENT);
        assertEquals(62_500, c.projectManagement().amount(), CENT);
        assertEquals(100_000, c.remedialDesign().amount(), CENT);
        assertEquals(75_000, c.constructionManagement().amount(), CENT);
        assertEquals(237_500, c.professionalServices().amount(), CENT);
        assertEquals(1_487_500, c.total().amount(), CENT);
        assertEquals(EUR, c.total().currency());
    }

    @Test
    void operatingMarkupsByHand() {
        CostEstimate e = recipe().operatingMarkups(new OperatingMarkups(10, 5, 5)).build().price(QUANTITIES);
        // Hand arithmetic: 105,000 + 10 % = 115,500; PM 5 % = 5,775; TS 5 % = 5,775; total 127,050.
        assertEquals(105_000, e.annual().subtotal().amount(), CENT);
        assertEquals(10_500, e.annual().contingency().amount(), CENT);
        assertEquals(5_775, e.annual().projectManagement().amount(), CENT);
        assertEquals(127_050, e.annual().total().amount(), CENT);
        // Periodic year 5: 40,000 x 1.1 x 1.1 = 48,400; year 10: 20,000 x 1.21 = 24,200.
        assertEquals(48_400, e.periodic().get(5).total().amount(), CENT);
        assertEquals(24_200, e.periodic().get(10).total().amount(), CENT);
        assertEquals(72_600, e.periodicTotal().amount(), CENT);
    }

    @Test
    void presentValueEqualsTheDiscountedCashFlow() {
        CostEstimate e = recipe().capitalMarkups(new CapitalMarkups(15, 10, 5, 8, 6))
                .operatingMarkups(new OperatingMarkups(10, 5, 5)).build().price(QUANTITIES);
        // Cash flow by year, discounted year by year at 7 % here (definition of present value, US EPA/USACE 2000):
        // year 0 capital 1,487,500; years 1..10 annual 127,050; year 5 48,400; year 10 24,200.
        double pv = 1_487_500;
        for (int k = 1; k <= 10; k++) {
            pv += 127_050 / Math.pow(1.07, k);
        }
        pv += 48_400 / Math.pow(1.07, 5) + 24_200 / Math.pow(1.07, 10);
        assertEquals(pv, e.presentValue().amount(), 1e-6);
        assertEquals(10, e.operatingYears());
        // Feasibility-study range -30 % / +50 % (EPA 540-R-00-002 [PUB]).
        assertEquals(0.7 * pv, e.presentValueLow().amount(), 1e-6);
        assertEquals(1.5 * pv, e.presentValueHigh().amount(), 1e-6);
    }

    @Test
    void zeroRateAddsTheCashFlow() {
        CostEstimate e = recipe().discountRatePercent(0).build().price(QUANTITIES);
        // No markups, no discounting: 1,000,000 + 10 x 105,000 + 60,000 = 2,110,000 (hand arithmetic).
        assertEquals(2_110_000, e.presentValue().amount(), CENT);
        assertTrue(e.trace().stream().anyMatch(t -> t.contains("user input")));
    }

    @Test
    void everyLineTracesToItsQuantityAndSource() {
        CostEstimate e = recipe().build().price(QUANTITIES);
        LineItem dig = e.lines().get(0);
        assertEquals("bank", dig.quantity().name());
        assertEquals(600_000, dig.cost().amount(), CENT);
        assertTrue(dig.trace().contains("bank volume, prismoidal formula (test)"), dig::trace);
        assertTrue(dig.trace().contains("invented test rate"), dig::trace);
        List<String> trace = e.trace();
        assertTrue(trace.stream().anyMatch(t -> t.contains(PresentValue.DEFAULT_RATE_RULE)));
        assertTrue(trace.stream().anyMatch(t -> t.contains("EPA 540-R-00-002")));
        assertTrue(e.cautions().isEmpty());
    }

    @Test
    void inventedRatesRaiseACaution() {
        ExcavationQuantities x = ExcavationSizing.size(new ExcavationPlan(new ExcavationDesign(
                PitFootprint.rectangle(10, 8), 1, 3, 0.5, SoilSlopeClass.TYPE_B, 1),
                new EarthworkFactors(0.25, 0.1, 1.9, "invented"), new EarthworkFactors(0.2, 0.15, 2.0, "invented"),
                new HaulTruck(12, 20), true));
        CostEstimate e = ExamplePriceBook.excavationRecipe().price(x.toQuantitySet().merge(ExamplePriceBook.lumpSums()));
        assertTrue(e.cautions().stream().anyMatch(c -> c.code().equals(Caution.INVENTED_RATES)));
        assertTrue(ExamplePriceBook.create().items().stream()
                .allMatch(i -> i.invented() && i.sourceNote().contains("INVENTED")));
        // Hand check of one line: contaminated loads 41 (ExcavationSizingTest) x 450 invented rate = 18,450.
        LineItem haul = e.lines().get(2);
        assertEquals(41 * 450.0, haul.cost().amount(), CENT);
    }

    @Test
    void badEstimatesThrow() {
        // Unit mismatch: a rate per tonne on cubic metres.
        EstimateRecipe wrongUnit = EstimateRecipe.builder("x", BOOK).capital("dispose", "bank").build();
        assertMessage(assertThrows(CostInputException.class, () -> wrongUnit.price(QUANTITIES)), "unit of quantity 'bank'");
        // Missing quantity: the message lists the names there are.
        EstimateRecipe missing = EstimateRecipe.builder("x", BOOK).capital("dig", "volume").build();
        assertMessage(assertThrows(CostInputException.class, () -> missing.price(QUANTITIES)), "bank");
        // Missing price item, found when the recipe is built.
        assertMessage(assertThrows(CostInputException.class,
                () -> EstimateRecipe.builder("x", BOOK).capital("haul", "bank").build()), "price item id");
        assertMessage(assertThrows(CostInputException.class, () -> EstimateRecipe.builder("x", BOOK).build()),
                "number of estimate lines");
        assertMessage(assertThrows(CostInputException.class,
                () -> EstimateRecipe.builder("x", BOOK).capital("dig", "bank").discountRatePercent(-100).build()),
                "discount rate");
        assertMessage(assertThrows(CostInputException.class, () -> new CapitalMarkups(-1, 0, 0, 0, 0)),
                "scopeContingencyPercent");
        assertMessage(assertThrows(CostInputException.class, () -> new CapitalMarkups(0, 101, 0, 0, 0)),
                "bidContingencyPercent");
        assertMessage(assertThrows(CostInputException.class, () -> new OperatingMarkups(0, 0, -5)),
                "technicalSupportPercent");
        assertMessage(assertThrows(CostInputException.class, () -> new LineSpec("dig", "bank", CostCategory.CAPITAL, 3)),
                "year of CAPITAL line");
        assertMessage(assertThrows(CostInputException.class, () -> LineSpec.periodic("dig", "bank", -1)),
                "year of periodic line");
        assertMessage(assertThrows(CostInputException.class, () -> OperatingPeriod.fixed(-1)), "operatingYears");
        assertMessage(assertThrows(CostInputException.class,
                () -> new PriceItem("p", "d", CostUnit.EACH, -3, EUR, "n", false)), "ratePerUnit");
        assertMessage(assertThrows(CostInputException.class, () -> new PriceBook("b", "USD", BOOK.items())),
                "currency of price item");
        assertMessage(assertThrows(CostInputException.class,
                () -> new PriceBook("b", EUR, List.of(BOOK.item("dig"), BOOK.item("dig")))), "unique");
        assertMessage(assertThrows(CostInputException.class,
                () -> new Money(1, "EUR").plus(new Money(1, "USD"))), "currency");
        assertMessage(assertThrows(CostInputException.class, () -> new Quantity("q", -1, CostUnit.DAY, "s")),
                "amount of quantity 'q'");
        assertMessage(assertThrows(CostInputException.class, () -> QUANTITIES.with(Quantity.lumpSum("bank", "again"))),
                "unique");
        // A year quantity that is not whole.
        QuantitySet fractional = QUANTITIES.with(new Quantity("years", 2.5, CostUnit.YEAR, "test"));
        EstimateRecipe byQuantity = EstimateRecipe.builder("x", BOOK).capital("dig", "bank")
                .operatingPeriod(OperatingPeriod.fromQuantity("years")).build();
        assertMessage(assertThrows(CostInputException.class, () -> byQuantity.price(fractional)), "whole number");
        EstimateRecipe byWrongUnit = EstimateRecipe.builder("x", BOOK).capital("dig", "bank")
                .operatingPeriod(OperatingPeriod.fromQuantity("samples")).build();
        assertMessage(assertThrows(CostInputException.class, () -> byWrongUnit.price(QUANTITIES)), "unit of quantity");
    }

    @Test
    void userBookHasNoInventedCaution() {
        assertFalse(BOOK.hasInventedRates());
        assertTrue(ExamplePriceBook.create().hasInventedRates());
    }
}
