package eluvia.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DesignPipeline;
import eluvia.design.DesignProgress;
import eluvia.design.DesignRun;
import eluvia.design.DesignSettings;
import eluvia.design.UncertaintyAnalysis;
import eluvia.site.files.ExampleProjects;
import eluvia.site.model.Project;

/** The {@code uncertainty} command on the shipped (invented) example, in-process. */
final class UncertaintyCommandTest {

    private static InProcess.Result run(Path dir, String... args) {
        return InProcess.run(dir, args);
    }

    private static Path example(Path dir) throws IOException {
        Path file = dir.resolve("example.eluvia");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            Files.write(file, in.readAllBytes());
        }
        return file;
    }

    @Test
    void printsThePercentilesOfTheAnalysis(@TempDir Path dir) throws Exception {
        Path file = example(dir);

        InProcess.Result r = run(dir, "uncertainty", "example.eluvia", "--runs", "8", "--seed", "11");

        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("8 runs (LATIN_HYPERCUBE, seed 11)"), r.out());
        // the deterministic column is the design pipeline's own figure (every input at its entered value),
        // to the 4 significant digits printed; percentiles are ordered (P10 <= P50 <= P90 by definition).
        // That the percentiles are those of the analysis is tested in eluvia.design.tests.
        Project p = ExampleProjects.loadRiversideDepot();
        DesignRun base = DesignPipeline.run(p, DesignSettings.builder().pushDownBelowColumn(false).build(), DesignProgress.NONE);
        double days = base.flushing().get(0).calendarDays();
        String name = "flushing design '" + base.flushing().get(0).designName() + "': " + UncertaintyAnalysis.DURATION;
        Matcher m = Pattern.compile(Pattern.quote(name) + "\\s+d\\s+(\\S+)\\s+(\\S+)\\s+(\\S+)\\s+(\\S+)").matcher(r.out());
        assertTrue(m.find(), r.out());
        assertEquals(days, Double.parseDouble(m.group(4)), 5e-4 * days);
        assertTrue(Double.parseDouble(m.group(1)) <= Double.parseDouble(m.group(2)), r.out());
        assertTrue(Double.parseDouble(m.group(2)) <= Double.parseDouble(m.group(3)), r.out());
        assertTrue(Files.exists(file));
    }

    @Test
    void aBadRunCountIsRefusedWithTheOptionNamed(@TempDir Path dir) throws Exception {
        example(dir);
        InProcess.Result r = run(dir, "uncertainty", "example.eluvia", "--runs", "1");
        assertEquals(EluviaCommand.BAD_OPTION, r.code());
        assertTrue(r.err().toLowerCase(Locale.ROOT).contains("--runs"), r.err());
        assertTrue(r.err().contains("2 to 10000000"), r.err());
    }

    @Test
    void aProjectWithoutUncertainInputsSaysSo(@TempDir Path dir) throws Exception {
        Path file = example(dir);
        String text = Files.readString(file);
        Files.writeString(file, text.substring(0, text.indexOf("  <uncertainty ")) + "</site:Project>\n");
        InProcess.Result r = run(dir, "uncertainty", "example.eluvia");
        assertEquals(EluviaCommand.INVALID_PROJECT, r.code(), r.out());
        assertTrue(r.err().contains("uncertainty settings"), r.err());
    }
}
