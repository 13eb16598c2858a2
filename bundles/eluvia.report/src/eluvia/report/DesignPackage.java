package eluvia.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

import eluvia.design.DesignRun;
import eluvia.report.document.Document;
import eluvia.report.html.HtmlDocumentWriter;
import eluvia.report.pdf.PdfDocumentWriter;
import eluvia.site.model.Project;

/**
 * Writes the design package of a run into a folder: {@code results.json} (machine-readable, every
 * number; {@link ResultsJson}), {@code index.html} with a PNG and a CSV per figure, and
 * {@code design-package.pdf} with the same content (both rendered from the one {@link Document}
 * of {@link DesignReport}). Each package runs the verification cases of
 * {@link VerificationAppendix} and reports their outcome to the caller ({@link PackageResult#verificationPassed()});
 * a failing case also puts a FAILED banner on the cover and in the appendix.
 */
public final class DesignPackage {

    /** Names of the files a package contains. */
    public static final String RESULTS_JSON = "results.json";
    public static final String INDEX_HTML = HtmlDocumentWriter.INDEX_HTML;
    public static final String PDF = "design-package.pdf";

    private DesignPackage() {
    }

    /**
     * Writes the whole package with {@link PackageOptions#defaults()}.
     *
     * @param projectFileBytes the bytes of the project file the run came from, for its SHA-256 (may be null)
     * @return the files written; callers that must know whether the verification passed use
     *         {@link #write(Project, DesignRun, byte[], String, Path, PackageOptions)}
     */
    public static List<Path> write(Project project, DesignRun run, byte[] projectFileBytes, String productVersion,
            Path outDir) throws IOException {
        return write(project, run, projectFileBytes, productVersion, outDir, PackageOptions.defaults()).files();
    }

    /**
     * Writes the package.
     *
     * @param projectFileBytes the bytes of the project file the run came from, for its SHA-256 (may be null)
     * @param options PDF on or off, which alternatives
     * @return the files written and the outcome of the verification cases
     */
    public static PackageResult write(Project project, DesignRun run, byte[] projectFileBytes, String productVersion,
            Path outDir, PackageOptions options) throws IOException {
        if (project == null || run == null || outDir == null || options == null) {
            throw new IllegalArgumentException("design package input is missing (null): "
                    + (project == null ? "project " : "") + (run == null ? "run " : "") + (outDir == null ? "output folder " : "")
                    + (options == null ? "options (use PackageOptions.defaults())" : ""));
        }
        Files.createDirectories(outDir);
        String sha = projectFileBytes == null ? null : sha256(projectFileBytes);
        VerificationAppendix.Outcome verification = VerificationAppendix.run(options.casesToRun());
        List<Path> files = new ArrayList<>();
        Path json = outDir.resolve(RESULTS_JSON);
        Files.writeString(json, ResultsJson.of(run, sha, productVersion, verification, options.uncertainty()), StandardCharsets.UTF_8);
        files.add(json);
        Document document = DesignReport.build(project, run, sha, productVersion,
                LocalDate.ofInstant(run.startedAt(), ZoneOffset.UTC), options, verification);
        files.addAll(HtmlDocumentWriter.write(document, outDir));
        if (options.writePdf()) {
            Path pdf = outDir.resolve(PDF);
            PdfDocumentWriter.write(document, pdf);
            files.add(pdf);
        }
        return new PackageResult(files, verification);
    }

    /** Lower-case hexadecimal SHA-256 of the bytes. */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
        }
    }
}
