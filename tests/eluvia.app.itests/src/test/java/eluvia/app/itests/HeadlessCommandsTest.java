package eluvia.app.itests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs the built product's headless commands as separate processes through {@code releng/eluvia},
 * the way a user does, and checks exit codes, output and written files.
 */
final class HeadlessCommandsTest {

    private static Path repository;
    private static Path configuration;

    @BeforeAll
    static void locate(@TempDir Path tmp) {
        repository = Path.of(System.getProperty("eluvia.repository")).toAbsolutePath();
        configuration = tmp.resolve("configuration");
        assertTrue(Files.isDirectory(repository.resolve(
                "releng/eluvia.product/target/products/eluvia.product/linux/gtk/x86_64/eluvia/plugins")),
                "the product must be materialised before these tests run (releng/eluvia.product)");
    }

    private record Run(int code, String out, String err) {
    }

    private static Run eluvia(Path workDir, String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(repository.resolve("releng/eluvia").toString());
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(workDir.toFile());
        pb.environment().put("ELUVIA_NO_BUILD", "1");
        pb.environment().put("ELUVIA_CONFIGURATION", configuration.toString());
        Path out = Files.createTempFile(workDir, "out", ".txt");
        Path err = Files.createTempFile(workDir, "err", ".txt");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        Process p = pb.start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("eluvia " + String.join(" ", args) + " did not finish in 120 s");
        }
        return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
    }

    private static double number(String json, String key) {
        Matcher m = Pattern.compile("\"" + key + "\": ([-0-9.eE+]+)").matcher(json);
        assertTrue(m.find(), key + " missing in " + json);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void flushJsonFromTheProduct(@TempDir Path dir) throws Exception {
        Run r = eluvia(dir, "flush", "--thickness-m", "1", "--water-content", "0.3", "--porosity", "0.4",
                "--bulk-density-kg-m3", "1600", "--kd-l-kg", "0.118", "--darcy-flux-m-d", "0.3",
                "--dispersivity-m", "0.001", "--diffusion-m2-s", "0", "--target-fraction", "0.01",
                "--criterion", "effluent", "--json");
        assertEquals(0, r.code(), r.err());
        // REFERENCES.md [COMP]: rho_b 1.6 kg/L, theta 0.3, Kd 0.118 L/kg -> R = 1.6293
        assertEquals(1.6293, number(r.out(), "retardation"), 5e-5);
        // P = v L / D = L / alpha = 1000: close to plug flow, where the effluent is clean after R pore
        // volumes (REFERENCES.md: P -> infinity gives T -> R); dispersion adds a little.
        double pv = number(r.out(), "poreVolumes");
        assertTrue(pv > 1.6293 && pv < 1.6293 * 1.3, "pore volumes " + pv);
        assertTrue(r.out().contains("\"waterVolumeM3\": null"), r.out());
    }

    @Test
    void badOptionExitsWithTwoAndNamesIt(@TempDir Path dir) throws Exception {
        Run r = eluvia(dir, "flush", "--thickness-m", "-1", "--water-content", "0.3", "--porosity", "0.4",
                "--bulk-density-kg-m3", "1600", "--kd-l-kg", "0.1", "--darcy-flux-m-d", "0.3", "--dispersivity-m",
                "0.1", "--target-fraction", "0.01");
        assertEquals(2, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("--thickness-m"), r.err());
    }

    @Test
    void demoThenCheckAndDesignOfItsProject(@TempDir Path dir) throws Exception {
        Run demo = eluvia(dir, "demo");
        assertEquals(0, demo.code(), demo.err());
        Path pkg = dir.resolve("eluvia-demo-output");
        assertTrue(Files.isRegularFile(pkg.resolve("results.json")), demo.out());
        assertTrue(Files.isRegularFile(pkg.resolve("index.html")), demo.out());
        assertTrue(demo.out().contains("pore volumes"), demo.out());

        Path example = repository.resolve("bundles/eluvia.site/examples/riverside-depot.eluvia");
        Run check = eluvia(dir, "check", example.toString());
        assertEquals(0, check.code(), check.out() + check.err());

        Run design = eluvia(dir, "design", example.toString(), "--out", "pkg2");
        assertEquals(0, design.code(), design.err());
        // the same project gives the same numbers whichever way it is run
        String a = Files.readString(pkg.resolve("results.json"));
        String b = Files.readString(dir.resolve("pkg2/results.json"));
        assertEquals(number(a, "poreVolumes"), number(b, "poreVolumes"));
    }

    @Test
    void checkOfABrokenProjectExitsWithOne(@TempDir Path dir) throws Exception {
        Path example = repository.resolve("bundles/eluvia.site/examples/riverside-depot.eluvia");
        String text = Files.readString(example).replaceFirst("waterContent=\"[0-9.]+\"", "waterContent=\"0.99\"");
        Path bad = dir.resolve("bad.eluvia");
        Files.writeString(bad, text);
        Run check = eluvia(dir, "check", bad.toString());
        assertEquals(1, check.code(), check.out() + check.err());
        assertTrue(check.out().contains("waterContent"), check.out());
    }
}
