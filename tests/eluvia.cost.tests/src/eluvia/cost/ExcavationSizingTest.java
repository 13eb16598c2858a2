package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Excavation take-off on an invented scenario, against hand calculations with the relations of
 * REFERENCES.md [Excavation]: loose = bank (1 + swell); compacted = bank (1 - shrinkage);
 * loads = larger of loose / heaped capacity and mass / legal payload, rounded up; slopes and the
 * protective-system depth from US OSHA 29 CFR 1926 Subpart P [PUB].
 */
final class ExcavationSizingTest {
    private static final double RELATIVE = 1e-12;

    /** Invented scenario: a 10 m x 8 m zone from 1.0 m to 3.0 m deep, 0.5 m overdig, Type B soil. */
    private static final ExcavationDesign DESIGN = ExcavationDesign.withTableSlope(PitFootprint.rectangle(10, 8),
            1.0, 3.0, 0.5, SoilSlopeClass.TYPE_B, SideSlopeTable.defaults());
    private static final EarthworkFactors SOIL = new EarthworkFactors(0.25, 0.10, 1.9, "invented scenario soil");
    private static final EarthworkFactors BORROW = new EarthworkFactors(0.20, 0.15, 2.0, "invented scenario borrow");
    private static final HaulTruck TRUCK = new HaulTruck(12, 20);

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, RELATIVE * Math.max(1.0, Math.abs(expected)));
    }

    @Test
    void pitVolumesAndSplitByHand() {
        ExcavationQuantities q = ExcavationSizing.size(new ExcavationPlan(DESIGN, SOIL, BORROW, TRUCK, true));
        // Hand calculation. Pit bottom: zone 10 x 8 plus 0.5 m overdig each side = 11 x 9, at 3.0 + 0.5 = 3.5 m;
        // Type B slope 1:1 (OSHA Table B-1 [PUB]).
        assertClose(3.5, q.pitDepthMetres());
        assertClose(99, q.pitBottom().areaSquareMetres());
        // Pit top: 11 + 2*3.5 = 18 by 9 + 2*3.5 = 16 = 288 m2.
        assertClose(288, q.pitTop().areaSquareMetres());
        // Whole pit, rectangle formula: 3.5 [99 + 3.5*20 + (4/3) 3.5^2] = 3.5 [99 + 70 + 49/3] = 1946/3 m3.
        assertClose(1946.0 / 3.0, q.pitBankVolumeCubicMetres());
        // Below the zone top (h = 2.5): 2.5 [99 + 2.5*20 + (4/3) 6.25] = 2.5 [149 + 25/3] = 1180/3 m3.
        assertClose(1180.0 / 3.0, q.contaminatedBankVolumeCubicMetres());
        // Overburden: a 1.0 m pit on the outline at the zone top, 11+5 = 16 by 9+5 = 14:
        // 1 [224 + 1*30 + 4/3] = 766/3 m3; and 1180/3 + 766/3 = 1946/3, the whole pit.
        assertClose(766.0 / 3.0, q.overburdenBankVolumeCubicMetres());
        assertClose(q.pitBankVolumeCubicMetres(), q.contaminatedBankVolumeCubicMetres() + q.overburdenBankVolumeCubicMetres());
        // Zone in place: 80 m2 x 2 m = 160 m3.
        assertClose(160, q.zoneVolumeCubicMetres());
    }

    @Test
    void swellMassLoadsAndBackfillWithReuse() {
        ExcavationQuantities q = ExcavationSizing.size(new ExcavationPlan(DESIGN, SOIL, BORROW, TRUCK, true));
        double contaminated = 1180.0 / 3.0; // hand calculation above
        double overburden = 766.0 / 3.0;
        double pit = 1946.0 / 3.0;
        // loose = bank (1 + swell) (REFERENCES.md [Excavation]): 393.333 x 1.25 = 491.667 m3
        assertClose(contaminated * 1.25, q.contaminatedLooseVolumeCubicMetres());
        // mass = bank x density: 393.333 x 1.9 = 747.333 t
        assertClose(contaminated * 1.9, q.contaminatedMassTonnes());
        // loads: 491.667 / 12 = 40.97 -> 41; 747.333 / 20 = 37.37 -> 38; larger = 41 (REFERENCES.md [Excavation])
        assertEquals(41, q.contaminatedLoads());
        assertEquals(0, q.overburdenOffSiteLoads());
        assertClose(overburden * 1.25, q.overburdenLooseVolumeCubicMetres());
        // Backfill to grade = pit bank volume; reused overburden compacted = bank (1 - shrinkage)
        // (REFERENCES.md [Excavation]) = 255.333 x 0.9 = 229.8 m3; import compacted = 648.667 - 229.8 = 418.867 m3.
        assertClose(pit, q.backfillCompactedVolumeCubicMetres());
        assertClose(overburden * 0.9, q.reusedOverburdenCompactedVolumeCubicMetres());
        assertClose(pit - overburden * 0.9, q.importCompactedVolumeCubicMetres());
        // Borrow bank = compacted / (1 - 0.15) = 492.78 m3; loose x 1.2 = 591.34 m3; mass x 2.0 = 985.57 t.
        double importBank = (pit - overburden * 0.9) / 0.85;
        assertClose(importBank, q.importBankVolumeCubicMetres());
        assertClose(importBank * 1.2, q.importLooseVolumeCubicMetres());
        assertClose(importBank * 2.0, q.importMassTonnes());
        // Loads: 591.34 / 12 = 49.28 -> 50; 985.57 / 20 = 49.28 -> 50.
        assertEquals(50, q.importLoads());
        // Placing the borrow bank volume compacts back to the import compacted volume (round trip).
        assertClose(q.importCompactedVolumeCubicMetres(), BORROW.compactedCubicMetres(q.importBankVolumeCubicMetres()));
    }

    @Test
    void withoutReuseTheOverburdenIsHauledAndAllFillImported() {
        ExcavationQuantities q = ExcavationSizing.size(new ExcavationPlan(DESIGN, SOIL, BORROW, TRUCK, false));
        double overburden = 766.0 / 3.0; // hand calculation in pitVolumesAndSplitByHand
        double pit = 1946.0 / 3.0;
        // 255.333 x 1.25 = 319.17 m3 loose / 12 = 26.6 -> 27; 255.333 x 1.9 = 485.13 t / 20 = 24.3 -> 25; 27 loads.
        assertEquals(27, q.overburdenOffSiteLoads());
        assertClose(0, q.reusedOverburdenCompactedVolumeCubicMetres());
        assertClose(pit, q.importCompactedVolumeCubicMetres());
        assertClose(pit / 0.85, q.importBankVolumeCubicMetres());
        assertTrue(q.assumptions().stream().anyMatch(a -> a.contains("hauled off site")));
        assertClose(overburden * 1.9, q.overburdenMassTonnes());
    }

    @Test
    void zoneAtTheSurfaceHasNoOverburden() {
        ExcavationDesign d = new ExcavationDesign(PitFootprint.rectangle(10, 8), 0, 2, 0, SoilSlopeClass.TYPE_A, 0.75);
        ExcavationQuantities q = ExcavationSizing.size(new ExcavationPlan(d, SOIL, BORROW, TRUCK, true));
        assertEquals(0.0, q.overburdenBankVolumeCubicMetres());
        // Hand calculation: 2 [80 + 0.75*2*18 + (4/3) 0.5625*4] = 2 [80 + 27 + 3] = 220 m3.
        assertClose(220, q.contaminatedBankVolumeCubicMetres());
        assertClose(220, q.pitBankVolumeCubicMetres());
    }

    @Test
    void loadsAreMassLimitedForDenseSoilAndExactCountsDoNotRoundUp() {
        // 120 m3 of bank soil with no swell: 120 / 12 = 10 loads exactly, not 11 (hand calculation).
        ExcavationDesign d = new ExcavationDesign(PitFootprint.rectangle(10, 10), 0, 1.2, 0, SoilSlopeClass.STABLE_ROCK,
                0);
        EarthworkFactors light = new EarthworkFactors(0, 0, 1.0, "invented");
        assertEquals(10, ExcavationSizing.size(new ExcavationPlan(d, light, BORROW, TRUCK, true)).contaminatedLoads());
        // Dense soil, 2.4 t/m3: 120 x 2.4 = 288 t / 20 t = 14.4 -> 15 loads, more than 10 by volume.
        EarthworkFactors dense = new EarthworkFactors(0, 0, 2.4, "invented");
        assertEquals(15, ExcavationSizing.size(new ExcavationPlan(d, dense, BORROW, TRUCK, true)).contaminatedLoads());
        // Direct: one cubic metre more than 10 loads' worth needs an 11th load.
        assertEquals(11, TRUCK.loadsFor(121, 0));
        assertEquals(0, TRUCK.loadsFor(0, 0));
    }

    @Test
    void protectiveSystemCautionAboveFiveFeet() {
        // US OSHA 29 CFR 1926 Subpart P [PUB]: protective systems unless under 5 ft (1.52 m) deep or in stable rock.
        assertFalse(hasCaution(pitOfDepth(1.50, SoilSlopeClass.TYPE_C, 1.5), Caution.PROTECTIVE_SYSTEM));
        assertTrue(hasCaution(pitOfDepth(1.53, SoilSlopeClass.TYPE_C, 1.5), Caution.PROTECTIVE_SYSTEM));
        List<Caution> rock = ExcavationSizing.cautions(pitOfDepth(3, SoilSlopeClass.STABLE_ROCK, 0));
        assertTrue(rock.stream().anyMatch(c -> c.text().contains("stable rock is assumed")));
        assertTrue(rock.stream().allMatch(c -> c.text().contains("Follow the rules where the site is")));
        // Table B-1 applies under 20 ft (6.1 m) deep [PUB].
        assertFalse(hasCaution(pitOfDepth(6.0, SoilSlopeClass.TYPE_B, 1), Caution.ENGINEERED_PROTECTIVE_SYSTEM));
        assertTrue(hasCaution(pitOfDepth(6.2, SoilSlopeClass.TYPE_B, 1), Caution.ENGINEERED_PROTECTIVE_SYSTEM));
    }

    @Test
    void steeperThanTableSlopeIsFlagged() {
        // Type B maximum 1:1 (OSHA Table B-1 [PUB]); 0.5:1 is steeper, 1.5:1 flatter.
        assertTrue(hasCaution(pitOfDepth(3, SoilSlopeClass.TYPE_B, 0.5), Caution.SLOPE_STEEPER_THAN_TABLE));
        assertFalse(hasCaution(pitOfDepth(3, SoilSlopeClass.TYPE_B, 1.5), Caution.SLOPE_STEEPER_THAN_TABLE));
        assertFalse(hasCaution(pitOfDepth(3, SoilSlopeClass.TYPE_B, 1.0), Caution.SLOPE_STEEPER_THAN_TABLE));
    }

    @Test
    void slopeTableDefaultsAndOverrides() {
        // US OSHA 29 CFR 1926 Subpart P App. B Table B-1 [PUB]: rock vertical, A 3/4:1, B 1:1, C 1-1/2:1.
        SideSlopeTable t = SideSlopeTable.defaults();
        assertEquals(0.0, t.slopeHorizontalPerVertical(SoilSlopeClass.STABLE_ROCK));
        assertEquals(0.75, t.slopeHorizontalPerVertical(SoilSlopeClass.TYPE_A));
        assertEquals(1.0, t.slopeHorizontalPerVertical(SoilSlopeClass.TYPE_B));
        assertEquals(1.5, t.slopeHorizontalPerVertical(SoilSlopeClass.TYPE_C));
        SideSlopeTable o = t.with(SoilSlopeClass.TYPE_C, 2.0);
        assertEquals(2.0, o.slopeHorizontalPerVertical(SoilSlopeClass.TYPE_C));
        assertTrue(o.isOverridden(SoilSlopeClass.TYPE_C));
        assertFalse(t.isOverridden(SoilSlopeClass.TYPE_C));
        assertTrue(o.source(SoilSlopeClass.TYPE_C).startsWith("user override"));
        assertMessage(assertThrows(CostInputException.class, () -> t.with(SoilSlopeClass.TYPE_A, -0.1)),
                "side slope for Type A soil");
    }

    @Test
    void quantitySetCarriesUnitsAndSources() {
        ExcavationQuantities q = ExcavationSizing.size(new ExcavationPlan(DESIGN, SOIL, BORROW, TRUCK, true));
        QuantitySet s = q.toQuantitySet();
        Quantity bank = s.get(ExcavationQuantities.CONTAMINATED_BANK_VOLUME);
        assertEquals(CostUnit.CUBIC_METRE, bank.unit());
        assertEquals(q.contaminatedBankVolumeCubicMetres(), bank.amount());
        assertTrue(bank.source().contains("prismoidal"));
        assertEquals(CostUnit.TONNE, s.get(ExcavationQuantities.CONTAMINATED_MASS).unit());
        assertEquals(41.0, s.get(ExcavationQuantities.CONTAMINATED_LOADS).amount());
        assertEquals(CostUnit.LOAD, s.get(ExcavationQuantities.IMPORT_LOADS).unit());
        assertEquals(18, s.all().size());
    }

    @Test
    void badInputsThrowNamingFieldAndRange() {
        PitFootprint f = PitFootprint.rectangle(10, 8);
        SoilSlopeClass b = SoilSlopeClass.TYPE_B;
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationDesign(f, -1, 3, 0, b, 1)),
                "zoneTopDepthMetres");
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationDesign(f, 2, 2, 0, b, 1)),
                "zoneBottomDepthMetres");
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationDesign(f, 0, -3, 0, b, 1)),
                "zoneBottomDepthMetres");
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationDesign(f, 0, 3, -0.2, b, 1)),
                "overdigMetres");
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationDesign(f, 0, 3, 0, b, -1)),
                "sideSlopeHorizontalPerVertical");
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationDesign(null, 0, 3, 0, b, 1)),
                "zone footprint");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(-0.1, 0.1, 1.9, "x")),
                "swellFraction");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(25, 0.1, 1.9, "x")),
                "as a fraction");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(0.2, 1.0, 1.9, "x")),
                "shrinkageFraction");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(0.2, -0.1, 1.9, "x")),
                "shrinkageFraction");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(0.2, 0.1, 0, "x")),
                "bankDensityTonnesPerCubicMetre");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(0.2, 0.1, 1900, "x")),
                "not kg/m3");
        assertMessage(assertThrows(CostInputException.class, () -> new EarthworkFactors(0.2, 0.1, 1.9, " ")),
                "source");
        assertMessage(assertThrows(CostInputException.class, () -> new HaulTruck(12, 0)), "legalPayloadTonnes");
        assertMessage(assertThrows(CostInputException.class, () -> new HaulTruck(12, -5)), "legalPayloadTonnes");
        assertMessage(assertThrows(CostInputException.class, () -> new HaulTruck(12, 20_000)), "not kg");
        assertMessage(assertThrows(CostInputException.class, () -> new HaulTruck(0, 20)), "heapedCapacityCubicMetres");
        assertMessage(assertThrows(CostInputException.class, () -> new ExcavationPlan(DESIGN, SOIL, null, TRUCK, true)),
                "borrow soil factors");
        assertMessage(assertThrows(CostInputException.class, () -> TRUCK.loadsFor(-1, 0)), "loose volume");
    }

    private static ExcavationDesign pitOfDepth(double pitDepthMetres, SoilSlopeClass soil, double slope) {
        return new ExcavationDesign(PitFootprint.rectangle(5, 5), 0, pitDepthMetres, 0, soil, slope);
    }

    private static boolean hasCaution(ExcavationDesign d, String code) {
        return ExcavationSizing.cautions(d).stream().anyMatch(c -> c.code().equals(code));
    }
}
