package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.cost.AlternativeKind;
import eluvia.cost.CapitalMarkups;
import eluvia.cost.CostEstimate;
import eluvia.cost.CostOfDelay;
import eluvia.cost.FlushingQuantities;
import eluvia.cost.LineItem;
import eluvia.cost.OperatingMarkups;
import eluvia.cost.Quantity;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.TreatmentZone;

final class QuantitiesAndCostsTest {

    /**
     * The single-layer test project (2 m column, theta 0.3, 100 m2 zone, 5 operating days a week,
     * capture 0.9) at a slow flux of 0.005 m/d so that flushing runs for more than a year, with a
     * 10 m x 10 m footprint, monitoring every 14 days, 2 kg/m3 of amendment and the full test
     * price book; an excavation of the same zone.
     */
    private static Project project() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        FlushingDesign d = p.getFlushingDesigns().get(0);
        d.setDarcyFluxMetresPerDay(0.005);
        d.setMonitoringIntervalDays(14);
        d.setAmendmentDoseKilogramsPerCubicMetre(2);
        TreatmentZone z = p.getSite().getZones().get(0);
        TestProjects.rectangle(z, 0, 0, 10, 10);
        p.getPriceBooks().add(TestProjects.fullPriceBook());
        p.getExcavationDesigns().add(TestProjects.excavation("dig", z, ExcavationSoilType.TYPE_C, 0.0));
        return p;
    }

    private static DesignSettings settings() {
        return DesignSettings.builder().pushDownBelowColumn(false).extractionToInjectionRatio(1.2)
                .capitalMarkups(new CapitalMarkups(10, 5, 5, 8, 6)).operatingMarkups(new OperatingMarkups(10, 5, 5))
                .build();
    }

    @Test
    void flushingQuantitiesFollowFromThePoreVolumesByHand() {
        FlushingDesignResult r = DesignPipeline.run(project(), settings(), DesignProgress.NONE).flushing().get(0);
        FlushingQuantities q = r.quantities();
        double pv = r.poreVolumes();
        // one pore volume theta L A = 0.3 x 2 x 100 = 60 m3; applied = T x 60 (REFERENCES.md: T = q t / (theta L))
        assertEquals(pv * 60, q.appliedWaterCubicMetres(), 1e-9 * pv * 60);
        assertEquals(0.9 * pv * 60, q.capturedWaterCubicMetres(), 1e-9 * pv * 60);
        assertEquals(0.1 * pv * 60, q.escapingWaterCubicMetres(), 1e-9 * pv * 60);
        // treated = applied x extraction-to-injection ratio 1.2 (the setting of this run)
        assertEquals(1.2 * pv * 60, q.treatedWaterCubicMetres(), 1e-9 * pv * 60);
        // operating days = applied / (q A) = T x 60 / (0.005 x 100); calendar = operating x 7 / 5
        double operating = pv * 60 / 0.5;
        assertEquals(operating, q.operatingDays(), 1e-9 * operating);
        assertEquals(operating * 7 / 5, q.calendarDays(), 1e-9 * operating);
        assertEquals(r.calendarDays(), q.calendarDays(), 1e-9 * operating);
        // one sample per 14-day interval: calendar days / 14, rounded up
        assertEquals((long) Math.ceil((7.0 / 14) * (operating * 7 / 5) / 7.0), q.monitoringSamples());
        // amendment = dose x applied = 2 kg/m3 x T x 60 m3
        assertEquals(2 * pv * 60, q.amendmentMassKilograms(), 1e-9 * pv * 60);
        // whole operating years: calendar days / 365.25 rounded up (Julian year)
        assertEquals((int) Math.ceil(operating * 7 / 5 / 365.25), q.operatingYears());
        assertTrue(q.operatingYears() >= 2, "the test wants a present value over several years: " + q.operatingYears());
    }

    @Test
    void presentValueOfTheFlushingAlternativeByHandFromItsLinesAndPA() {
        DesignRun run = DesignPipeline.run(project(), settings(), DesignProgress.NONE);
        AlternativeResult a = run.alternatives().stream().filter(x -> x.kind() == AlternativeKind.FLUSHING).findFirst()
                .orElseThrow();
        assertTrue(a.available(), a.unavailableReason());
        assertFalse(a.inventedRates());
        assertTrue(a.unpriced().isEmpty(), a.unpriced().toString());
        FlushingQuantities q = run.flushing().get(0).quantities();
        int n = q.operatingYears();
        // capital lines: mobilisation 10000 x 1 + flushing system 100000 x 1 (test book)
        double capitalSubtotal = 10_000 + 100_000;
        // scope 10 % + bid 5 % of the subtotal; services 5 + 8 + 6 % of subtotal with contingency
        // (US EPA/USACE 2000 layout, as the cost bundle documents it)
        double capital = capitalSubtotal * 1.15 * 1.19;
        // annual lines per operating year: operation 40000 x 1, treatment 3 x treated/n, amendment 2 x kg/n,
        // monitoring 200 x samples/n
        double annualSubtotal = 40_000 + 3 * q.treatedWaterCubicMetres() / n + 2 * q.amendmentMassKilograms() / n
                + 200.0 * q.monitoringSamples() / n;
        // contingency 10 %, then project management 5 % and technical support 5 % of subtotal with contingency
        double annual = annualSubtotal * 1.10 * 1.10;
        // P/A = [(1 + i)^n - 1] / [i (1 + i)^n] at i = 7 % (REFERENCES.md, Cost)
        double i = 0.07;
        double pa = (Math.pow(1 + i, n) - 1) / (i * Math.pow(1 + i, n));
        CostEstimate e = a.estimate();
        assertEquals(capital, e.capital().total().amount(), 1e-9 * capital);
        assertEquals(annual, e.annual().total().amount(), 1e-9 * annual);
        assertEquals(capital + annual * pa, e.presentValue().amount(), 1e-9 * (capital + annual * pa));
        // accuracy range of a feasibility study, -30 % / +50 % (EPA 540-R-00-002; REFERENCES.md [PUB])
        assertEquals(0.7 * (capital + annual * pa), e.presentValueLow().amount(), 1e-6 * capital);
        assertEquals(1.5 * (capital + annual * pa), e.presentValueHigh().amount(), 1e-6 * capital);
        assertEquals("EUR", e.currency());
    }

    @Test
    void everyCostLineNamesItsQuantityAndEveryQuantityItsSource() {
        DesignRun run = DesignPipeline.run(project(), settings(), DesignProgress.NONE);
        for (AlternativeResult a : run.alternatives()) {
            if (!a.available()) {
                continue;
            }
            for (LineItem line : a.estimate().lines()) {
                Quantity q = a.quantities().get(line.quantity().name());
                assertEquals(q, line.quantity());
                assertFalse(q.source().isBlank());
                // cost = amount x rate, in the book's currency (by hand)
                assertEquals(q.amount() * line.item().ratePerUnit(), line.cost().amount(),
                        1e-9 * Math.max(1, line.cost().amount()));
            }
        }
    }

    @Test
    void excavationHasCapitalOnlyAndItsPresentValueIsTheCapitalTotal() {
        DesignRun run = DesignPipeline.run(project(), settings(), DesignProgress.NONE);
        AlternativeResult x = run.alternatives().stream().filter(a -> a.kind() == AlternativeKind.EXCAVATION)
                .findFirst().orElseThrow();
        double lines = x.estimate().lines().stream().mapToDouble(l -> l.cost().amount()).sum();
        // no annual O&M: present value = capital subtotal x 1.15 x 1.19 (markups of the run, by hand)
        assertEquals(lines * 1.15 * 1.19, x.estimate().presentValue().amount(), 1e-9 * lines);
        assertEquals(0, x.estimate().operatingYears());
        assertTrue(Double.isNaN(x.durationCalendarDays()));
        assertNotNull(run.lowestPresentValue());
    }

    @Test
    void costOfDelayStartsAtTheAlternativeAndDiscountsByPF() {
        DesignRun run = DesignPipeline.run(project(), settings(), DesignProgress.NONE);
        CostOfDelayResult c = run.costOfDelay().get(0);
        assertTrue(c.available(), c.unavailableReason());
        AlternativeResult a = run.alternative(c.alternativeName()).orElseThrow();
        CostOfDelay cod = c.costOfDelay();
        assertEquals(a.estimate().presentValue().amount(), cod.baseline().presentValueAtStartOfWork().amount(), 1e-9);
        for (CostOfDelay.Point p : cod.points()) {
            // today = at start of work x P/F, P/F = (1 + i)^-n at 7 % (REFERENCES.md, Cost)
            assertEquals(p.presentValueAtStartOfWork().amount() * Math.pow(1.07, -p.delayYears()),
                    p.presentValueToday().amount(), 1e-9 * p.presentValueAtStartOfWork().amount());
        }
        // the zone only grows with delay, so the work does too (Crank 1975 spreading: REFERENCES.md)
        List<CostOfDelay.Point> points = cod.points();
        for (int k = 1; k < points.size(); k++) {
            assertTrue(points.get(k).presentValueAtStartOfWork().amount()
                    >= points.get(k - 1).presentValueAtStartOfWork().amount());
        }
    }

    @Test
    void withoutAPriceBookTheInventedExampleBookIsUsedAndSaidToBeInvented() {
        Project p = project();
        p.getPriceBooks().clear();
        DesignRun run = DesignPipeline.run(p, settings(), DesignProgress.NONE);
        for (AlternativeResult a : run.alternatives()) {
            if (a.available()) {
                assertTrue(a.inventedRates(), a.name());
                assertTrue(a.estimate().cautions().stream().anyMatch(c -> c.text().contains("invented")), a.name());
            }
        }
        assertTrue(run.cautions().contains(Cautions.INVENTED_EXAMPLE));
    }

    @Test
    void aMissingRateIsListedAsUnpricedNotInvented() {
        Project p = project();
        p.getPriceBooks().get(0).getItems().removeIf(i -> i.getCode().equals("water.treatment"));
        AlternativeResult a = DesignPipeline.run(p, settings(), DesignProgress.NONE).alternatives().get(0);
        assertTrue(a.available());
        assertEquals(1, a.unpriced().size());
        assertTrue(a.unpriced().get(0).contains("water.treatment"), a.unpriced().get(0));
    }

    @Test
    void aRateInTheWrongUnitIsRefusedNamingTheField() {
        Project p = project();
        p.getPriceBooks().get(0).getItems().stream().filter(i -> i.getCode().equals("water.treatment")).findFirst()
                .orElseThrow().setUnit("t");
        DesignInputException e = assertThrows(DesignInputException.class,
                () -> DesignPipeline.run(p, settings(), DesignProgress.NONE));
        assertEquals("unit", e.problems().get(0).field());
        Project q = project();
        q.getPriceBooks().get(0).getItems().get(0).setUnit("furlong");
        DesignInputException f = assertThrows(DesignInputException.class,
                () -> DesignPipeline.run(q, settings(), DesignProgress.NONE));
        assertEquals("unit", f.problems().get(0).field());
        assertTrue(f.getMessage().contains("furlong"), f.getMessage());
    }
}
