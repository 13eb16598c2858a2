package eluvia.report;

import java.util.List;
import java.util.Set;

import eluvia.design.UncertaintyResults;

/**
 * What a design package contains beyond its fixed parts.
 *
 * @param writePdf whether to write {@code design-package.pdf} beside the HTML
 * @param alternatives names of the alternatives to report (flushing designs and priced alternatives),
 *        or null for all of them
 * @param verificationCases the verification cases to run (null for
 *        {@link VerificationAppendix#standardCases()}); set only through {@link #withVerificationCases}
 * @param uncertainty the Monte Carlo results of the same project and settings to report (P10 / P50 /
 *        P90, histograms, tornado charts), or null when the analysis was not run
 */
public record PackageOptions(boolean writePdf, Set<String> alternatives, List<VerificationAppendix.Case> verificationCases,
        UncertaintyResults uncertainty) {

    /** Copies the collections. */
    public PackageOptions {
        alternatives = alternatives == null ? null : Set.copyOf(alternatives);
        verificationCases = verificationCases == null ? null : List.copyOf(verificationCases);
    }

    /** Everything: the PDF and every alternative, with the standard verification cases. */
    public static PackageOptions defaults() {
        return new PackageOptions(true, null, null, null);
    }

    /** The same options with or without the PDF. */
    public PackageOptions withPdf(boolean pdf) {
        return new PackageOptions(pdf, alternatives, verificationCases, uncertainty);
    }

    /** The same options reporting only the alternatives (and flushing designs) of these names. */
    public PackageOptions withAlternatives(Set<String> names) {
        if (names == null || names.isEmpty()) {
            throw new IllegalArgumentException("alternatives to report are " + (names == null ? "missing (null)" : "empty")
                    + "; allowed: at least one name (use defaults() for all alternatives)");
        }
        return new PackageOptions(writePdf, names, verificationCases, uncertainty);
    }

    /** The same options with other verification cases: for testing how a failing case is reported. */
    PackageOptions withVerificationCases(List<VerificationAppendix.Case> cases) {
        return new PackageOptions(writePdf, alternatives, cases, uncertainty);
    }

    /**
     * The same options reporting these uncertainty results (from
     * {@code UncertaintyAnalysis.run} on the same project with the same design settings).
     */
    public PackageOptions withUncertainty(UncertaintyResults results) {
        return new PackageOptions(writePdf, alternatives, verificationCases, results);
    }

    /** Whether an alternative or design of this name is reported. */
    public boolean reports(String name) {
        return alternatives == null || alternatives.contains(name);
    }

    /** The cases to run. */
    List<VerificationAppendix.Case> casesToRun() {
        return verificationCases == null ? VerificationAppendix.standardCases() : verificationCases;
    }
}
