package eluvia.cost;

import static eluvia.cost.PitVolumeTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Present-value factors against REFERENCES.md [Cost] and the published formulas evaluated here. */
final class PresentValueTest {

    @Test
    void publishedCheckValue() {
        // REFERENCES.md [Cost] [COMP]: i = 7 %, n = 30 -> P/A = 12.4090 (computed from
        // P/A = [(1+i)^n - 1]/[i(1+i)^n], US EPA/USACE 2000); 4 decimals given, so half a unit of the 4th.
        assertEquals(12.4090, PresentValue.seriesFactor(7, 30), 0.5e-4);
    }

    @ParameterizedTest
    @CsvSource({ "7,30", "7,1", "3,10", "2.5,100", "12,5", "0.5,50", "-1,20", "7,0" })
    void seriesFactorEqualsTheTextbookFormulaAndTheSumOfSingleFactors(double ratePercent, int years) {
        double i = ratePercent / 100;
        // P/A = [(1+i)^n - 1]/[i(1+i)^n] (US EPA/USACE 2000), evaluated literally here.
        double literal = (Math.pow(1 + i, years) - 1) / (i * Math.pow(1 + i, years));
        // Sum of P/F = (1+i)^-k for k = 1..n: the definition of the end-of-year uniform series.
        double sum = 0;
        for (int k = 1; k <= years; k++) {
            sum += Math.pow(1 + i, -k);
        }
        double tolerance = 1e-12 * Math.max(1, years);
        assertEquals(literal, PresentValue.seriesFactor(ratePercent, years), tolerance);
        assertEquals(sum, PresentValue.seriesFactor(ratePercent, years), tolerance);
    }

    @Test
    void zeroRateIsTheLimitN() {
        // lim i->0 of [(1+i)^n - 1]/[i(1+i)^n] = n; P/F = 1 (exact formulas).
        assertEquals(30.0, PresentValue.seriesFactor(0, 30));
        assertEquals(1.0, PresentValue.singleFactor(0, 30));
        // A tiny rate: n (1 - (n+1) i / 2) to first order (series expansion of the formula, by hand);
        // the literal formula would lose about 6 digits to cancellation here.
        double i = 1e-10;
        assertEquals(30 * (1 - 31 * i / 2), PresentValue.seriesFactor(i * 100, 30), 1e-13);
    }

    @Test
    void singleFactor() {
        // P/F = (1+i)^-n (US EPA/USACE 2000), evaluated here: 1.07^-10.
        assertEquals(Math.pow(1.07, -10), PresentValue.singleFactor(7, 10), 1e-15);
        assertEquals(1.0, PresentValue.singleFactor(7, 0));
    }

    @Test
    void defaultRateAndItsRule() {
        // REFERENCES.md [Cost]: default 7 % real, OMB Circular A-94 (1992).
        assertEquals(7.0, PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT);
        assertTrue(PresentValue.DEFAULT_RATE_RULE.contains("OMB Circular A-94 (1992)"));
        assertTrue(PresentValue.DEFAULT_RATE_RULE.contains("revised later"));
    }

    @Test
    void badInputsThrow() {
        assertMessage(assertThrows(CostInputException.class, () -> PresentValue.seriesFactor(-100, 5)),
                "discount rate");
        assertMessage(assertThrows(CostInputException.class, () -> PresentValue.seriesFactor(150, 5)),
                "7 for 7 %");
        assertMessage(assertThrows(CostInputException.class, () -> PresentValue.seriesFactor(Double.NaN, 5)),
                "discount rate");
        assertMessage(assertThrows(CostInputException.class, () -> PresentValue.seriesFactor(7, -1)), "years");
        assertMessage(assertThrows(CostInputException.class, () -> PresentValue.singleFactor(7, -1)), "year");
    }
}
