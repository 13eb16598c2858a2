package eluvia.report;

import java.nio.file.Path;
import java.util.List;

/**
 * What {@link DesignPackage#write(eluvia.site.model.Project, eluvia.design.DesignRun, byte[], String, Path, PackageOptions)}
 * wrote and whether the verification cases it ran all passed. A caller that exits (the command
 * line) should exit non-zero when {@link #verificationPassed()} is false: the package then says
 * FAILED on its cover and in its appendix, and its numbers must not be relied on.
 *
 * @param files the files written: results.json, index.html, then a PNG and a CSV per figure, then the PDF
 * @param verification the verification cases and their outcome
 */
public record PackageResult(List<Path> files, VerificationAppendix.Outcome verification) {

    /** Copies the list. */
    public PackageResult {
        files = List.copyOf(files);
    }

    /** Whether every verification case was within its tolerance. */
    public boolean verificationPassed() {
        return verification.passed();
    }
}
