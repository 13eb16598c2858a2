package eluvia.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

import eluvia.design.DesignRun;
import eluvia.site.model.Project;

/**
 * Writes the design package of a run into a folder: {@code results.json} (machine-readable, every
 * number) and {@code index.html} (the readable summary).
 */
public final class DesignPackage {

    /** Names of the files a package contains. */
    public static final String RESULTS_JSON = "results.json";
    public static final String INDEX_HTML = "index.html";

    private DesignPackage() {
    }

    /**
     * Writes the package.
     *
     * @param projectFileBytes the bytes of the project file the run came from, for its SHA-256 (may be null)
     * @return the files written
     */
    public static List<Path> write(Project project, DesignRun run, byte[] projectFileBytes, String productVersion,
            Path outDir) throws IOException {
        Files.createDirectories(outDir);
        String sha = projectFileBytes == null ? null : sha256(projectFileBytes);
        Path json = outDir.resolve(RESULTS_JSON);
        Files.writeString(json, ResultsJson.of(run, sha, productVersion), StandardCharsets.UTF_8);
        Path html = outDir.resolve(INDEX_HTML);
        Files.writeString(html, SummaryHtml.of(project, run, sha, productVersion), StandardCharsets.UTF_8);
        return List.of(json, html);
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
