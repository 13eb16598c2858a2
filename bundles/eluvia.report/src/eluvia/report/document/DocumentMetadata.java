package eluvia.report.document;

import java.time.LocalDate;
import java.util.regex.Pattern;

/**
 * What identifies a document: the project it is about, its revision and date, the version of the
 * program that wrote it and the SHA-256 of the project file it was computed from, so a reviewer can
 * tie every page to one exact input.
 *
 * @param projectName    the project, printed in the running header of every page
 * @param revision       the revision, e.g. "A" or "2 (for review)"
 * @param date           the date of issue
 * @param productVersion the version of the program that wrote it
 * @param projectSha256  64 lower-case hexadecimal digits, or null when the input was not a saved file
 */
public record DocumentMetadata(String projectName, String revision, LocalDate date, String productVersion,
        String projectSha256) {

    private static final Pattern SHA256 = Pattern.compile("[0-9a-f]{64}");

    public DocumentMetadata {
        ReportContentException.requireText("project name", projectName);
        ReportContentException.requireText("revision", revision);
        ReportContentException.requireNonNull("date of issue", date);
        ReportContentException.requireText("product version", productVersion);
        if (projectSha256 != null && !SHA256.matcher(projectSha256).matches()) {
            throw new ReportContentException("project file SHA-256", "\"" + projectSha256 + "\"",
                    "64 lower-case hexadecimal digits, or null", "pass the digest of the project file bytes in lower case");
        }
    }
}
