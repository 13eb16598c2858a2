package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

import eluvia.report.document.Table;

/** The verification appendix runs the program's cases and fails loudly when one is outside its tolerance. */
final class VerificationAppendixTest {

    @Test
    void everyStandardCasePassesAndNamesItsSource() {
        VerificationAppendix.Outcome o = VerificationAppendix.runStandard();
        assertTrue(o.passed(), () -> "failures: " + o.failures());
        // 4 semi-infinite, 3 batch flush, 2 tortuosity, retardation, P/A, two limits, numerical against Brenner,
        // modal against Brenner, numerical against modal (time error alone), spectral elements against Brenner,
        // numerical against spectral elements for two layers
        assertEquals(18, o.rows().size());
        for (VerificationAppendix.Row r : o.rows()) {
            assertFalse(r.verificationCase().source().isBlank(), r.verificationCase().name());
            assertTrue(Math.abs(r.difference()) <= r.verificationCase().tolerance(), r.verificationCase().name());
        }
    }

    @Test
    void referenceValuesAreThoseOfReferencesMd() {
        // REFERENCES.md [COMP] check values, typed here from that file
        double[] expected = { 0.585289, 0.493058, 0.585289, 0.493058, 4.6052, 17.2694, 14.9787, 0.7368, 0.2461, 1.6293,
                12.4090 };
        List<VerificationAppendix.Case> cases = VerificationAppendix.standardCases();
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], cases.get(i).referenceValue(), 0.0, cases.get(i).name());
        }
    }

    @Test
    void ogataBanksCaseAgreesWithAnIndependentEvaluation() {
        // Ogata and Banks (1961) evaluated here with Commons Math 3.6.1 Erf.erfc: X = 1, T = 1, P = 10, R = 1
        double p = 10;
        double t = 1;
        double expected = 0.5 * Erf.erfc((1 - t) / (2 * Math.sqrt(t / p)))
                + 0.5 * Math.exp(p) * Erf.erfc((1 + t) / (2 * Math.sqrt(t / p)));
        VerificationAppendix.Row row = VerificationAppendix.runStandard().rows().get(0);
        assertEquals(expected, row.computedValue(), 1e-9);
        // the batch-flush case against T = -R ln(C/C0) evaluated here (US EPA pump-and-treat guidance)
        VerificationAppendix.Row batch = VerificationAppendix.runStandard().rows().get(5);
        assertEquals(-2.5 * Math.log(0.001), batch.computedValue(), 1e-8);
    }

    @Test
    void aWrongReferenceOrATightToleranceFails() {
        List<VerificationAppendix.Case> cases = new ArrayList<>(VerificationAppendix.standardCases());
        // deliberately wrong: the P/A factor at 7 %, 30 years is 12.4090 (REFERENCES.md), not 12.5
        cases.set(10, cases.get(10).withReferenceValue(12.5));
        // a tolerance far below the 6-digit rounding of the reference 0.585289 must fail
        cases.set(0, cases.get(0).withTolerance(1e-12));
        VerificationAppendix.Outcome o = VerificationAppendix.run(cases);
        assertFalse(o.passed());
        assertEquals(2, o.failures().size());
        Table t = DesignReport.verificationTables(o).get(0);
        assertEquals(DesignReport.FAILED, t.rows().get(0).get(5));
        assertEquals(DesignReport.FAILED, t.rows().get(10).get(5));
        assertEquals(DesignReport.PASSED, t.rows().get(1).get(5));
    }

    @Test
    void aCaseWhoseComputationThrowsOrGivesNaNFails() {
        VerificationAppendix.Case throwing = new VerificationAppendix.Case("throws", "-", 1, "test", 0.1, "test", () -> {
            throw new IllegalStateException("broken solver");
        });
        VerificationAppendix.Case nan = new VerificationAppendix.Case("nan", "-", 1, "test", 0.1, "test", () -> Double.NaN);
        VerificationAppendix.Outcome o = VerificationAppendix.run(List.of(throwing, nan));
        assertFalse(o.passed());
        assertTrue(o.rows().get(0).error().contains("broken solver"));
        assertFalse(o.rows().get(1).passed());
    }

    @Test
    void badCasesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> VerificationAppendix.run(List.of()));
        assertThrows(IllegalArgumentException.class, () -> VerificationAppendix.run(null));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new VerificationAppendix.Case("x", "-", 1, "s", 0, "b", () -> 1));
        assertTrue(e.getMessage().contains("tolerance") && e.getMessage().contains("greater than 0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new VerificationAppendix.Case("x", "-", Double.NaN, "s", 1, "b", () -> 1));
        assertThrows(IllegalArgumentException.class, () -> new VerificationAppendix.Case(" ", "-", 1, "s", 1, "b", () -> 1));
        assertThrows(IllegalArgumentException.class, () -> new VerificationAppendix.Case("x", "-", 1, "s", 1, "b", null));
    }
}
