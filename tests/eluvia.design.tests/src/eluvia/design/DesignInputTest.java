package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Consumer;

import org.junit.jupiter.api.Test;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.Project;
import eluvia.site.model.SolutionMethod;
import eluvia.site.validation.Problem;

final class DesignInputTest {

    private static Project project() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        p.getExcavationDesigns().add(TestProjects.excavation("dig", p.getSite().getZones().get(0),
                ExcavationSoilType.TYPE_C, 0.2));
        p.getPriceBooks().add(TestProjects.fullPriceBook());
        return p;
    }

    /** Runs a broken project and returns the problem naming {@code field}. */
    private static Problem refused(Consumer<Project> breakIt, String field) {
        Project p = project();
        breakIt.accept(p);
        DesignInputException e = assertThrows(DesignInputException.class,
                () -> DesignPipeline.run(p, DesignSettings.builder().pushDownBelowColumn(false).build(),
                        DesignProgress.NONE));
        Problem problem = e.problems().stream().filter(x -> x.field().equals(field)).findFirst()
                .orElseThrow(() -> new AssertionError("no problem names " + field + ": " + e.getMessage()));
        assertTrue(e.getMessage().contains(field), e.getMessage());
        assertTrue(!problem.allowedRange().isBlank(), problem.message());
        return problem;
    }

    @Test
    void designFieldsTheSiteValidatorLeavesAreChecked() {
        refused(p -> p.getFlushingDesigns().get(0).setMonitoringIntervalDays(0), "monitoringIntervalDays");
        refused(p -> p.getFlushingDesigns().get(0).setAmendmentDoseKilogramsPerCubicMetre(-1),
                "amendmentDoseKilogramsPerCubicMetre");
        refused(p -> {
            p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
            p.getFlushingDesigns().get(0).setNumericalCellCount(0);
        }, "numericalCellCount");
        refused(p -> {
            p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
            p.getFlushingDesigns().get(0).setNumericalRelativeTolerance(0.5);
        }, "numericalRelativeTolerance");
    }

    @Test
    void excavationFieldsAreChecked() {
        refused(p -> p.getExcavationDesigns().get(0).setOverdigMetres(-1), "overdigMetres");
        refused(p -> p.getExcavationDesigns().get(0).setTruckPayloadKilograms(0), "truckPayloadKilograms");
        refused(p -> p.getExcavationDesigns().get(0).setTruckHeapedCapacityCubicMetres(-3),
                "truckHeapedCapacityCubicMetres");
        refused(p -> p.getExcavationDesigns().get(0).setSideSlopeHorizontalPerVertical(-1),
                "sideSlopeHorizontalPerVertical");
        refused(p -> p.getExcavationDesigns().get(0).setZone(null), "zone");
    }

    @Test
    void priceBookFieldsAreChecked() {
        refused(p -> p.getPriceBooks().get(0).getItems().get(0).setRatePerUnit(-5), "ratePerUnit");
        refused(p -> p.getPriceBooks().get(0).getItems().get(0).setCurrency("USD"), "currency");
        refused(p -> p.getPriceBooks().get(0).setCurrency(""), "currency");
        refused(p -> p.getPriceBooks().get(0).getItems().get(1).setCode("mobilisation"), "code");
    }

    @Test
    void sampleAndNonequilibriumFieldsAreChecked() {
        refused(p -> {
            var l = TestProjects.location("B-1", 1, 1);
            l.getSamples().add(TestProjects.sample(p.getContaminants().get(0), 2, 1, 5));
            p.getSite().getSamplingLocations().add(l);
        }, "bottomDepthMetres");
        refused(p -> {
            var l = TestProjects.location("B-1", 1, 1);
            var s = TestProjects.sample(p.getContaminants().get(0), 1, 2, 5);
            s.setNonDetect(true);
            s.setDetectionLimitMilligramsPerKg(0);
            l.getSamples().add(s);
            p.getSite().getSamplingLocations().add(l);
        }, "detectionLimitMilligramsPerKg");
        refused(p -> {
            p.getContaminants().get(0).setNonequilibrium(NonequilibriumEntry.DIMENSIONLESS);
            p.getContaminants().get(0).setBeta(1.5);
        }, "beta");
        refused(p -> {
            p.getContaminants().get(0).setNonequilibrium(NonequilibriumEntry.PHYSICAL);
            p.getContaminants().get(0).setMobileWaterFraction(0);
        }, "mobileWaterFraction");
    }

    @Test
    void settingsAreCheckedNamingTheSetting() {
        DesignInputException e = assertThrows(DesignInputException.class,
                () -> DesignSettings.builder().hotSpotMultiple(0.5).build());
        assertEquals("hotSpotMultiple", e.problems().get(0).field());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().delayYears(5, 2).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().delayYears().build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().discountRatePercent(-100).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().transverseDispersivityFraction(0).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().extractionToInjectionRatio(0.5).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().blockPlanSizeMetres(-1).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().blockDepthMetres(0).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().searchRadiusMetres(0).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().enlargementCellsPerAxis(2).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().delayDarcyFluxMetresPerDay(-1).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().verticalDistanceFactor(0).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().sampleMarginMetres(-1).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().zoneEstimator(null).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().nonDetectRule(null).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().accuracy(null).build());
        assertThrows(DesignInputException.class, () -> DesignSettings.builder().borrowSoil(null).build());
        assertThrows(DesignInputException.class, () -> DesignPipeline.run(project(), null, DesignProgress.NONE));
    }
}
