package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Alternatives side by side and the cost of delay, on an invented scenario priced with the invented
 * example book; present values checked against P/A and P/F evaluated in the test (US EPA/USACE 2000).
 */
final class AlternativesTest {
    private static final EarthworkFactors SOIL = new EarthworkFactors(0.25, 0.1, 1.9, "invented scenario");
    private static final EarthworkFactors BORROW = new EarthworkFactors(0.2, 0.15, 2.0, "invented scenario");
    private static final HaulTruck TRUCK = new HaulTruck(12, 20);

    /** Invented scenario: a square zone of side s m, 1 m to 3 m deep, Type B soil. */
    private static ExcavationQuantities excavation(double sideMetres) {
        return ExcavationSizing.size(new ExcavationPlan(new ExcavationDesign(PitFootprint.rectangle(sideMetres,
                sideMetres), 1, 3, 0.5, SoilSlopeClass.TYPE_B, 1), SOIL, BORROW, TRUCK, true));
    }

    /** Invented scenario: flushing a zone of this area, 0.3 x 2 m of pore water per m2, 25 pore volumes. */
    private static FlushingQuantities flushing(double areaSquareMetres) {
        return FlushingQuantities.of(new FlushingInput(25, 0.6 * areaSquareMetres, 0.05, areaSquareMetres, 5, 0.9, 1.1,
                MonitoringPlan.perWeek(2), 2.0));
    }

    @Test
    void threeAlternativesSideBySide() {
        FlushingQuantities f = flushing(400);
        ExcavationQuantities x = excavation(20);
        CostEstimate fe = ExamplePriceBook.flushingRecipe().price(f.toQuantitySet().merge(ExamplePriceBook.lumpSums()));
        CostEstimate xe = ExamplePriceBook.excavationRecipe().price(x.toQuantitySet().merge(ExamplePriceBook.lumpSums()));
        // Hybrid: a 10 m x 10 m hot spot dug out, the remaining 300 m2 flushed.
        CostEstimate he = ExamplePriceBook.hybridRecipe().price(excavation(10).toQuantitySet()
                .merge(flushing(300).toQuantitySet()).merge(ExamplePriceBook.lumpSums()));
        AlternativeComparison c = new AlternativeComparison(List.of(
                new AlternativeSummary(AlternativeKind.FLUSHING, f.calendarDays(), fe),
                new AlternativeSummary(AlternativeKind.EXCAVATION, 30, xe),
                new AlternativeSummary(AlternativeKind.HYBRID, 60, he)));
        // Flushing: 25 PV x 240 m3 / (0.05 x 400) = 300 operating days, x 7/5 = 420 calendar days -> 2 years
        // of O&M (hand calculation); its PV is capital + annual x P/A(7 %, 2), P/A evaluated here.
        assertEquals(2, fe.operatingYears());
        double pa = (Math.pow(1.07, 2) - 1) / (0.07 * Math.pow(1.07, 2));
        AlternativeSummary fa = c.alternatives().get(0);
        assertEquals(fa.capital().amount() + fa.annualOperationAndMaintenance().amount() * pa,
                fa.presentValue().amount(), 1e-6);
        // Excavation has no O&M: PV = capital.
        AlternativeSummary xa = c.alternatives().get(1);
        assertEquals(xa.capital().amount(), xa.presentValue().amount(), 1e-6);
        assertEquals(0.0, xa.annualOperationAndMaintenance().amount());
        // The lowest PV is the minimum over the three (computed here).
        double min = Math.min(fa.presentValue().amount(),
                Math.min(xa.presentValue().amount(), c.alternatives().get(2).presentValue().amount()));
        assertEquals(min, c.lowestPresentValue().presentValue().amount());
        assertSame(xa, c.shortestDuration());
        assertEquals(1.5 * xa.presentValue().amount(), xa.presentValueHigh().amount(), 1e-6);
        assertTrue(xa.quantities().contains(ExcavationQuantities.CONTAMINATED_LOADS));
        assertEquals("Excavation (invented example)", xa.name());
    }

    @Test
    void comparisonRefusesMixedRates() {
        QuantitySet q = excavation(20).toQuantitySet().merge(ExamplePriceBook.lumpSums());
        CostEstimate at7 = ExamplePriceBook.excavationRecipe().price(q);
        CostEstimate at3 = ExamplePriceBook.excavationRecipe().withDiscountRatePercent(3).price(q);
        assertMessage(assertThrows(CostInputException.class, () -> new AlternativeComparison(List.of(
                new AlternativeSummary(AlternativeKind.EXCAVATION, 30, at7),
                new AlternativeSummary(AlternativeKind.EXCAVATION, 30, at3)))), "discount rate");
        assertMessage(assertThrows(CostInputException.class, () -> new AlternativeComparison(List.of())),
                "number of alternatives");
        assertMessage(assertThrows(CostInputException.class,
                () -> new AlternativeSummary(AlternativeKind.FLUSHING, -1, at7)), "durationCalendarDays");
    }

    @Test
    void costOfDelayGrowsAtStartOfWorkAndIsDiscountedToday() {
        // Invented growth: the zone side grows from 20 m by 2 m per year of delay (the pipeline supplies the
        // real enlarged zone from the dispersion solution).
        EstimateRecipe recipe = ExamplePriceBook.excavationRecipe();
        CostOfDelay c = CostOfDelay.of(recipe,
                d -> excavation(20 + 2 * d).toQuantitySet().merge(ExamplePriceBook.lumpSums()), 0, 2, 5);
        assertEquals(3, c.points().size());
        assertEquals(0.0, c.points().get(0).increaseAtStartOfWork().amount(), 1e-9);
        double previous = 0;
        for (CostOfDelay.Point p : c.points()) {
            assertTrue(p.presentValueAtStartOfWork().amount() >= previous);
            previous = p.presentValueAtStartOfWork().amount();
            // Today = at start of work x (1.07)^-d (P/F, US EPA/USACE 2000, evaluated here).
            assertEquals(p.presentValueAtStartOfWork().amount() * Math.pow(1.07, -p.delayYears()),
                    p.presentValueToday().amount(), 1e-6);
            assertEquals(p.presentValueAtStartOfWork().amount() - c.baseline().presentValueAtStartOfWork().amount(),
                    p.increaseAtStartOfWork().amount(), 1e-6);
        }
        // The 5-year point is priced on the 30 m zone: same estimate as pricing it directly.
        assertEquals(recipe.price(excavation(30).toQuantitySet().merge(ExamplePriceBook.lumpSums())).presentValue()
                .amount(), c.points().get(2).presentValueAtStartOfWork().amount(), 1e-9);
        assertMessage(assertThrows(CostInputException.class,
                () -> CostOfDelay.of(recipe, d -> excavation(20).toQuantitySet(), -1)), "delay");
    }
}
