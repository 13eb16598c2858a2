package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.cost.internal.Counts;

/** Quantity sets and whole-number rounding (facts of arithmetic, checked by hand). */
final class QuantitySetTest {

    @Test
    void mergeKeepsOrderAndRefusesDuplicates() {
        QuantitySet a = QuantitySet.of(Quantity.lumpSum("a", "s"), new Quantity("b", 2, CostUnit.DAY, "s"));
        QuantitySet b = QuantitySet.of(new Quantity("c", 3, CostUnit.TONNE, "s"));
        assertEquals(List.of("a", "b", "c"), a.merge(b).all().stream().map(Quantity::name).toList());
        assertMessage(assertThrows(CostInputException.class, () -> a.merge(a)), "unique");
        assertMessage(assertThrows(CostInputException.class, () -> a.get("z")), "[a, b]");
        assertMessage(assertThrows(CostInputException.class, () -> new Quantity(" ", 1, CostUnit.DAY, "s")), "name");
        assertMessage(assertThrows(CostInputException.class, () -> new Quantity("q", 1, null, "s")), "unit");
    }

    @Test
    void roundUpTakesNearWholeNumbersAsWhole() {
        // 0.1 + 0.2 = 0.30000000000000004 in doubles; / 0.1 = 3.0000000000000004: three, not four.
        assertEquals(3, Counts.roundUp((0.1 + 0.2) / 0.1));
        assertEquals(4, Counts.roundUp(3.001));
        assertEquals(0, Counts.roundUp(0));
        assertEquals(1, Counts.roundUp(1e-6));
        assertThrows(IllegalArgumentException.class, () -> Counts.roundUp(-1));
        assertThrows(IllegalArgumentException.class, () -> Counts.roundUp(Double.NaN));
    }
}
