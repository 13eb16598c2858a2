package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Flushing take-off on an invented scenario, against hand calculations and the pore-volume
 * definition T = q t / (theta L) of REFERENCES.md [Symbols].
 */
final class FlushingQuantitiesTest {
    private static final double RELATIVE = 1e-12;

    // Invented scenario: layer theta = 0.30, L = 2.0 m, area 2000 m2 -> one pore volume = 0.3 x 2 x 2000 = 1200 m3.
    private static final double THETA = 0.30;
    private static final double LAYER_METRES = 2.0;
    private static final double AREA = 2000;
    private static final double PORE_VOLUME = THETA * LAYER_METRES * AREA;

    private static FlushingInput input(double poreVolumes, double daysPerWeek, double efficiency,
            MonitoringPlan monitoring) {
        return new FlushingInput(poreVolumes, PORE_VOLUME, 0.05, AREA, daysPerWeek, efficiency, 1.2, monitoring, 5.0);
    }

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, RELATIVE * Math.max(1.0, Math.abs(expected)));
    }

    @Test
    void volumesDurationSamplesAndAmendmentByHand() {
        FlushingQuantities q = FlushingQuantities.of(input(3.5, 5, 0.9, MonitoringPlan.perWeek(2)));
        // Hand calculation: applied = 3.5 x 1200 = 4200 m3; captured = 0.9 x 4200 = 3780; escaping 420;
        // treated = 1.2 x 4200 = 5040 m3.
        assertClose(4200, q.appliedWaterCubicMetres());
        assertClose(3780, q.capturedWaterCubicMetres());
        assertClose(420, q.escapingWaterCubicMetres());
        assertClose(5040, q.treatedWaterCubicMetres());
        // Operating days = 4200 / (0.05 x 2000) = 42 d; calendar = 42 x 7/5 = 58.8 d.
        assertClose(42, q.operatingDays());
        assertClose(58.8, q.calendarDays());
        // Samples: 2 per week x 58.8 / 7 = 16.8 -> 17.
        assertEquals(17, q.monitoringSamples());
        // Amendment: 5 kg/m3 x 4200 m3 = 21000 kg.
        assertClose(21000, q.amendmentMassKilograms());
        assertEquals(1, q.operatingYears());
    }

    @Test
    void durationMatchesThePoreVolumeDefinition() {
        // REFERENCES.md [Symbols]: T = q t / (theta L), so t = T theta L / q, independent of the area.
        double poreVolumes = 7.25;
        FlushingQuantities q = FlushingQuantities.of(input(poreVolumes, 7, 1.0, MonitoringPlan.perWeek(1)));
        assertClose(poreVolumes * THETA * LAYER_METRES / 0.05, q.operatingDays());
        assertClose(q.operatingDays(), q.calendarDays());
    }

    @Test
    void samplingByPoreVolumes() {
        // 3.5 PV every 0.5 PV = 7 events x 3 samples = 21 (hand calculation).
        assertEquals(21, FlushingQuantities.of(input(3.5, 5, 0.9, MonitoringPlan.perPoreVolumes(3, 0.5)))
                .monitoringSamples());
        // 3.5 PV every 1 PV: 4 events, the last partial interval counted.
        assertEquals(4, FlushingQuantities.of(input(3.5, 5, 0.9, MonitoringPlan.perPoreVolumes(1, 1)))
                .monitoringSamples());
        // 0.3 PV every 0.1 PV: exactly 3 events although 0.3 / 0.1 = 2.9999999999999996 in floating point.
        assertEquals(3, FlushingQuantities.of(input(0.3, 5, 0.9, MonitoringPlan.perPoreVolumes(1, 0.1)))
                .monitoringSamples());
    }

    @Test
    void operatingYearsRoundUpAndPerYearQuantitiesKeepTheTotal() {
        // 40 PV x 1200 m3 / 100 m3/d = 480 operating days, x 7/5 = 672 calendar days = 1.84 years -> 2.
        FlushingQuantities q = FlushingQuantities.of(input(40, 5, 0.95, MonitoringPlan.perWeek(1)));
        assertClose(672, q.calendarDays());
        assertClose(672 / 365.25, q.calendarYears());
        assertEquals(2, q.operatingYears());
        QuantitySet s = q.toQuantitySet();
        assertClose(q.treatedWaterCubicMetres(), 2 * s.get(FlushingQuantities.TREATED_WATER_PER_YEAR).amount());
        assertClose(q.amendmentMassKilograms(), 2 * s.get(FlushingQuantities.AMENDMENT_MASS_PER_YEAR).amount());
        assertEquals(CostUnit.YEAR, s.get(FlushingQuantities.OPERATING_YEARS).unit());
        assertEquals(2.0, s.get(FlushingQuantities.OPERATING_YEARS).amount());
        assertTrue(s.get(FlushingQuantities.APPLIED_WATER).source().contains("pore volumes"));
    }

    @Test
    void cautionsOnMobilisationAndEscapingWater() {
        FlushingQuantities leaky = FlushingQuantities.of(input(3.5, 5, 0.9, MonitoringPlan.perWeek(2)));
        assertTrue(leaky.cautions().stream().anyMatch(c -> c.code().equals(Caution.UNCAPTURED_WATER)));
        assertTrue(leaky.cautions().stream().anyMatch(c -> c.code().equals(Caution.FLUSHING_MOBILISES)));
        FlushingQuantities tight = FlushingQuantities.of(input(3.5, 5, 1.0, MonitoringPlan.perWeek(2)));
        assertFalse(tight.cautions().stream().anyMatch(c -> c.code().equals(Caution.UNCAPTURED_WATER)));
        assertEquals(0.0, tight.escapingWaterCubicMetres());
    }

    @Test
    void badInputsThrowNamingFieldAndRange() {
        MonitoringPlan m = MonitoringPlan.perWeek(1);
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(0, 1200, 0.05, 2000, 5, 0.9, 1, m, 0)), "poreVolumes");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, -1, 0.05, 2000, 5, 0.9, 1, m, 0)), "poreVolumeCubicMetres");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0, 2000, 5, 0.9, 1, m, 0)), "darcyFluxMetresPerDay");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, Double.POSITIVE_INFINITY, 5, 0.9, 1, m, 0)), "areaSquareMetres");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, 2000, 8, 0.9, 1, m, 0)), "operatingDaysPerWeek");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, 2000, 0, 0.9, 1, m, 0)), "operatingDaysPerWeek");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, 2000, 5, 90, 1, m, 0)), "captureEfficiencyFraction");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, 2000, 5, 0.9, 0.8, m, 0)), "extractionToInjectionRatio");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, 2000, 5, 0.9, 1, null, 0)), "monitoring plan");
        assertMessage(assertThrows(CostInputException.class,
                () -> new FlushingInput(3, 1200, 0.05, 2000, 5, 0.9, 1, m, -1)), "amendmentDoseKilogramsPerCubicMetre");
        assertMessage(assertThrows(CostInputException.class, () -> MonitoringPlan.perWeek(0)), "samplesPerWeek");
        assertMessage(assertThrows(CostInputException.class, () -> MonitoringPlan.perPoreVolumes(0, 1)),
                "samplesPerEvent");
        assertMessage(assertThrows(CostInputException.class, () -> MonitoringPlan.perPoreVolumes(1, 0)),
                "poreVolumesBetweenEvents");
    }
}
