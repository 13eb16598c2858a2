package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Estimate classes and accuracy ranges (AACE 18R-97, from memory; EPA 540-R-00-002 [PUB]). */
final class AccuracyRangeTest {

    @Test
    void feasibilityStudyRangeIsPublished() {
        // REFERENCES.md [Cost]: feasibility-study accuracy -30 % / +50 % [PUB], US EPA/USACE (2000) EPA 540-R-00-002.
        assertEquals(-30, AccuracyRange.FEASIBILITY_STUDY.lowPercent());
        assertEquals(50, AccuracyRange.FEASIBILITY_STUDY.highPercent());
        assertEquals(SourceStatus.PUBLISHED, AccuracyRange.FEASIBILITY_STUDY.status());
        // 1,000,000 -> 700,000 to 1,500,000 (hand arithmetic).
        Money m = new Money(1_000_000, "USD");
        assertEquals(700_000, AccuracyRange.FEASIBILITY_STUDY.low(m).amount(), 1e-6);
        assertEquals(1_500_000, AccuracyRange.FEASIBILITY_STUDY.high(m).amount(), 1e-6);
    }

    @Test
    void classRangesFromMemory() {
        // AACE 18R-97 typical ranges, from memory (not checked against the recommended practice):
        // Class 5 -20..-50 / +30..+100; Class 4 -15..-30 / +20..+50; Class 3 -10..-20 / +10..+30;
        // Class 2 -5..-15 / +5..+20; Class 1 -3..-10 / +3..+15.
        assertEquals(-50, EstimateClass.CLASS_5.lowPercentWide());
        assertEquals(100, EstimateClass.CLASS_5.highPercentWide());
        assertEquals(-15, EstimateClass.CLASS_4.lowPercentNarrow());
        assertEquals(20, EstimateClass.CLASS_4.highPercentNarrow());
        assertEquals(-3, EstimateClass.CLASS_1.lowPercentNarrow());
        assertEquals(15, EstimateClass.CLASS_1.highPercentWide());
        for (EstimateClass c : EstimateClass.values()) {
            assertEquals(SourceStatus.FROM_MEMORY, c.widestRange().status());
            assertTrue(c.lowPercentWide() <= c.lowPercentNarrow() && c.highPercentNarrow() <= c.highPercentWide());
        }
    }

    @Test
    void rangesNarrowAsDefinitionMatures() {
        // Facts of the classification (AACE 18R-97, from memory): each class number is better defined and
        // narrower than the one before, and consecutive maturity ranges overlap.
        EstimateClass[] c = EstimateClass.values();
        for (int k = 1; k < c.length; k++) {
            assertEquals(c[k - 1].number() - 1, c[k].number());
            assertTrue(c[k].lowPercentWide() > c[k - 1].lowPercentWide());
            assertTrue(c[k].highPercentWide() < c[k - 1].highPercentWide());
            assertTrue(c[k].maturityLowPercent() < c[k - 1].maturityHighPercent());
        }
    }

    @Test
    void classFourWideEndAgreesWithThePublishedFeasibilityRange() {
        // Cross-check of the recalled Class 4 wide end against the published EPA 540-R-00-002 range.
        EstimateClass fs = EstimateClass.forFeasibilityStudy();
        assertEquals(EstimateClass.CLASS_4, fs);
        assertEquals(AccuracyRange.FEASIBILITY_STUDY.lowPercent(), fs.widestRange().lowPercent());
        assertEquals(AccuracyRange.FEASIBILITY_STUDY.highPercent(), fs.widestRange().highPercent());
    }

    @Test
    void badRangesThrow() {
        assertMessage(assertThrows(CostInputException.class, () -> AccuracyRange.userRange(30, 50, "x")), "lowPercent");
        assertMessage(assertThrows(CostInputException.class, () -> AccuracyRange.userRange(-100, 50, "x")), "lowPercent");
        assertMessage(assertThrows(CostInputException.class, () -> AccuracyRange.userRange(-30, -5, "x")), "highPercent");
        assertMessage(assertThrows(CostInputException.class, () -> AccuracyRange.userRange(-30, 50, "")), "source");
    }
}
