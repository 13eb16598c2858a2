package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import eluvia.cost.AlternativeKind;
import eluvia.cost.CapitalMarkups;
import eluvia.cost.CostCategory;
import eluvia.cost.CostEstimate;
import eluvia.cost.LineItem;
import eluvia.cost.OperatingMarkups;
import eluvia.design.internal.CostRecipes;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.PriceBook;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.TreatmentZone;

/**
 * The markups and the discount rate of a project's price book price its alternatives. Check
 * values are worked by hand from the estimate's own lines with the layout of US EPA/USACE (2000),
 * EPA 540-R-00-002 (contingency on the subtotal, professional and technical services on the
 * subtotal plus contingency, as {@link eluvia.cost.CostEstimate} documents it) and the uniform
 * series present-worth factor P/A = [(1 + i)^n - 1] / [i (1 + i)^n] (REFERENCES.md, Cost). The
 * percentages and the rate are test values, not recommendations.
 */
final class PriceBookMarkupsTest {

    private static final String BASIS = "rate chosen for the test";

    /** The single-layer test project of {@link QuantitiesAndCostsTest}, priced by a book with markups. */
    private static Project project() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.MEAN_RESIDUAL);
        FlushingDesign d = p.getFlushingDesigns().get(0);
        d.setDarcyFluxMetresPerDay(0.005);
        d.setMonitoringIntervalDays(14);
        d.setAmendmentDoseKilogramsPerCubicMetre(2);
        TreatmentZone z = p.getSite().getZones().get(0);
        TestProjects.rectangle(z, 0, 0, 10, 10);
        PriceBook b = TestProjects.fullPriceBook();
        b.setScopeContingencyPercent(12);
        b.setBidContingencyPercent(8);
        b.setProjectManagementPercent(4);
        b.setRemedialDesignPercent(7);
        b.setConstructionManagementPercent(5);
        b.setOperatingContingencyPercent(9);
        b.setOperatingProjectManagementPercent(4);
        b.setTechnicalSupportPercent(6);
        b.setDiscountRatePercent(5);
        b.setDiscountRateBasis(BASIS);
        p.getPriceBooks().add(b);
        p.getExcavationDesigns().add(TestProjects.excavation("dig", z, ExcavationSoilType.TYPE_C, 0.0));
        return p;
    }

    /** The run's settings: no markups and no rate set, so the book's apply. */
    private static DesignSettings settings() {
        return DesignSettings.builder().pushDownBelowColumn(false).extractionToInjectionRatio(1.2).build();
    }

    private static AlternativeResult alternative(DesignRun run, AlternativeKind kind) {
        AlternativeResult a = run.alternatives().stream().filter(x -> x.kind() == kind).findFirst().orElseThrow();
        assertTrue(a.available(), a.unavailableReason());
        assertTrue(a.unpriced().isEmpty(), a.unpriced().toString());
        return a;
    }

    private static double subtotal(CostEstimate e, CostCategory category) {
        return e.lines().stream().filter(l -> l.spec().category() == category).mapToDouble(l -> l.cost().amount()).sum();
    }

    private static double seriesFactor(double ratePercent, int years) {
        // P/A = [(1 + i)^n - 1] / [i (1 + i)^n] (REFERENCES.md, Cost)
        double i = ratePercent / 100;
        return (Math.pow(1 + i, years) - 1) / (i * Math.pow(1 + i, years));
    }

    @Test
    void flushingIsPricedWithTheBooksMarkupsAndRateByHand() {
        DesignRun run = DesignPipeline.run(project(), settings(), DesignProgress.NONE);
        AlternativeResult a = alternative(run, AlternativeKind.FLUSHING);
        CostEstimate e = a.estimate();
        int n = e.operatingYears();
        assertTrue(n >= 2, "the test wants a present value over several years: " + n);
        double capitalLines = subtotal(e, CostCategory.CAPITAL);
        // capital lines of the test book: mobilisation 10000 x 1 + flushing system 100000 x 1
        assertEquals(110_000, capitalLines, 1e-9 * 110_000);
        // scope 12 % + bid 8 % of the subtotal; services 4 + 7 + 5 % of subtotal plus contingency
        // (EPA 540-R-00-002 layout)
        double capital = capitalLines * 1.20 * 1.16;
        double annualLines = subtotal(e, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE);
        // O&M contingency 9 %, then project management 4 % and technical support 6 % of subtotal plus contingency
        double annual = annualLines * 1.09 * 1.10;
        double presentValue = capital + annual * seriesFactor(5, n);
        assertEquals(capital, e.capital().total().amount(), 1e-9 * capital);
        assertEquals(annual, e.annual().total().amount(), 1e-9 * annual);
        assertEquals(5.0, e.discountRatePercent(), 0.0); // the book's rate, set in the test
        assertEquals(presentValue, e.presentValue().amount(), 1e-9 * presentValue);
        assertTrue(a.notes().stream().anyMatch(t -> t.contains("Discount rate: 5.0 % per year (real) from price book 'test book'")
                && t.contains(BASIS)), a.notes().toString());
        assertTrue(a.notes().stream().anyMatch(t -> t.startsWith("Capital markups: from price book 'test book'")), a.notes().toString());
        assertTrue(a.notes().stream().anyMatch(t -> t.startsWith("O&M markups: from price book 'test book'")), a.notes().toString());
    }

    @Test
    void excavationPresentValueIsItsCapitalWithTheBooksMarkups() {
        DesignRun run = DesignPipeline.run(project(), settings(), DesignProgress.NONE);
        AlternativeResult x = alternative(run, AlternativeKind.EXCAVATION);
        double lines = x.estimate().lines().stream().mapToDouble(l -> l.cost().amount()).sum();
        // no annual O&M: present value = capital subtotal x 1.20 x 1.16 (the book's markups, by hand)
        assertEquals(lines * 1.20 * 1.16, x.estimate().presentValue().amount(), 1e-9 * lines);
    }

    @Test
    void markupsAndRateSetForTheRunWinOverTheBooks() {
        DesignSettings s = DesignSettings.builder().pushDownBelowColumn(false).extractionToInjectionRatio(1.2)
                .capitalMarkups(new CapitalMarkups(10, 5, 5, 8, 6)).operatingMarkups(new OperatingMarkups(10, 5, 5))
                .discountRatePercent(3).build();
        CostEstimate e = alternative(DesignPipeline.run(project(), s, DesignProgress.NONE), AlternativeKind.FLUSHING).estimate();
        int n = e.operatingYears();
        // scope 10 + bid 5 %, services 5 + 8 + 6 %; O&M 10 %, then 5 + 5 % (the run's markups, by hand)
        double capital = subtotal(e, CostCategory.CAPITAL) * 1.15 * 1.19;
        double annual = subtotal(e, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE) * 1.10 * 1.10;
        double presentValue = capital + annual * seriesFactor(3, n);
        assertEquals(capital, e.capital().total().amount(), 1e-9 * capital);
        assertEquals(annual, e.annual().total().amount(), 1e-9 * annual);
        assertEquals(presentValue, e.presentValue().amount(), 1e-9 * presentValue);
    }

    @Test
    void aRateSetForTheRunWinsEvenWhenItIsTheDefault() {
        DesignSettings s = DesignSettings.builder().pushDownBelowColumn(false).extractionToInjectionRatio(1.2)
                .discountRatePercent(7).build();
        AlternativeResult a = alternative(DesignPipeline.run(project(), s, DesignProgress.NONE), AlternativeKind.FLUSHING);
        CostEstimate e = a.estimate();
        // the book's markups (no markups set for the run), discounted at the run's 7 % (by hand)
        double capital = subtotal(e, CostCategory.CAPITAL) * 1.20 * 1.16;
        double annual = subtotal(e, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE) * 1.09 * 1.10;
        double presentValue = capital + annual * seriesFactor(7, e.operatingYears());
        assertEquals(presentValue, e.presentValue().amount(), 1e-9 * presentValue);
        assertTrue(a.notes().stream().anyMatch(t -> t.contains("set for this run, not the rate of price book 'test book'")),
                a.notes().toString());
    }

    @Test
    void aNewBookHasNoMarkupsAndTheDefaultRate() {
        Project p = project();
        p.getPriceBooks().set(0, TestProjects.fullPriceBook());
        p.getFlushingDesigns().get(0).setPriceBook(p.getPriceBooks().get(0));
        AlternativeResult a = alternative(DesignPipeline.run(p, settings(), DesignProgress.NONE), AlternativeKind.FLUSHING);
        CostEstimate e = a.estimate();
        // no markups: totals are the line subtotals; 7 % per year, the model's default (OMB Circular A-94 (1992))
        double capital = subtotal(e, CostCategory.CAPITAL);
        double annual = subtotal(e, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE);
        assertEquals(capital, e.capital().total().amount(), 1e-9 * capital);
        assertEquals(annual, e.annual().total().amount(), 1e-9 * annual);
        double presentValue = capital + annual * seriesFactor(7, e.operatingYears());
        assertEquals(presentValue, e.presentValue().amount(), 1e-9 * presentValue);
        assertTrue(a.notes().stream().anyMatch(t -> t.startsWith("Capital markups: none (price book 'test book'")),
                a.notes().toString());
        for (LineItem line : e.lines()) {
            // cost = amount x rate (by hand): the markups never touch the lines
            assertEquals(line.quantity().amount() * line.item().ratePerUnit(), line.cost().amount(),
                    1e-9 * Math.max(1, line.cost().amount()));
        }
    }

    @Test
    void theModelDefaultsAreNoMarkupsAndSevenPercent() {
        PriceBook b = SiteFactory.eINSTANCE.createPriceBook();
        // defaults of the model: 0 % markups, 7 % real per year (OMB Circular A-94 (1992), EPA 540-R-00-002)
        assertEquals(0.0, b.getScopeContingencyPercent(), 0.0);
        assertEquals(0.0, b.getTechnicalSupportPercent(), 0.0);
        assertEquals(7.0, b.getDiscountRatePercent(), 0.0);
    }

    @Test
    void aBookPercentageOutOfRangeIsRefusedNamingTheField() {
        Project p = project();
        p.getPriceBooks().get(0).setBidContingencyPercent(120);
        DesignInputException e = assertThrows(DesignInputException.class,
                () -> DesignPipeline.run(p, settings(), DesignProgress.NONE));
        assertTrue(e.problems().stream().anyMatch(x -> x.field().equals("bidContingencyPercent") && x.value().equals("120")),
                e.getMessage());
        PriceBook direct = TestProjects.fullPriceBook();
        direct.setOperatingContingencyPercent(-1);
        DesignInputException m = assertThrows(DesignInputException.class, () -> CostRecipes.map(direct));
        assertEquals("operatingContingencyPercent", m.problems().get(0).field());
        assertTrue(m.getMessage().contains("test book") && m.getMessage().contains("0 to 100 %"), m.getMessage());
    }

    @Test
    void aBookDiscountRateOutOfRangeIsRefusedNamingTheField() {
        Project p = project();
        p.getPriceBooks().get(0).setDiscountRatePercent(35);
        DesignInputException e = assertThrows(DesignInputException.class,
                () -> DesignPipeline.run(p, settings(), DesignProgress.NONE));
        assertTrue(e.problems().stream().anyMatch(x -> x.field().equals("discountRatePercent")), e.getMessage());
        PriceBook direct = TestProjects.fullPriceBook();
        direct.setDiscountRatePercent(-6);
        DesignInputException m = assertThrows(DesignInputException.class, () -> CostRecipes.map(direct));
        assertEquals("discountRatePercent", m.problems().get(0).field());
        assertTrue(m.getMessage().contains("-5 to 30 % per year"), m.getMessage());
    }
}
