package eluvia.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.files.ExampleProjects;

/** The command line run in-process; the product's processes are tested in eluvia.app.itests. */
final class CommandLineTest {

    private static InProcess.Result run(Path dir, String... args) {
        return InProcess.run(dir, args);
    }

    private static double number(String json, String key) {
        Matcher m = Pattern.compile("\"" + key + "\": ([-0-9.eE+]+)").matcher(json);
        assertTrue(m.find(), key + " missing in " + json);
        return Double.parseDouble(m.group(1));
    }

    private static final String[] CHECK_CASE = { "flush", "--thickness-m", "2", "--water-content", "0.3",
            "--porosity", "0.35", "--bulk-density-kg-m3", "1600", "--kd-l-kg", "0.118", "--darcy-flux-m-d", "0.05",
            "--dispersivity-m", "200", "--target-fraction", "0.01", "--area-m2", "100", "--json" };

    @Test
    void flushJsonGivesThePublishedRetardationAndTheWellMixedLimit(@TempDir Path dir) {
        InProcess.Result r = run(dir, CHECK_CASE);
        assertEquals(0, r.code(), r.err());
        // REFERENCES.md [COMP]: rho_b 1.6 kg/L, theta 0.3, Kd = 59 x 0.002 L/kg -> R = 1.6293
        assertEquals(1.6293, number(r.out(), "retardation"), 5e-5);
        // batch flush T = -R ln(C/C0) (US EPA pump-and-treat guidance), the P -> 0 limit (P = 0.01 here)
        assertEquals(-1.6293 * Math.log(0.01), number(r.out(), "wellMixedPoreVolumes"), 1e-3);
        assertEquals(-1.6293 * Math.log(0.01), number(r.out(), "poreVolumes"), 0.08);
        double pv = number(r.out(), "poreVolumes");
        // duration t = T theta L / q; water = T theta L A (REFERENCES.md symbols)
        assertEquals(pv * 0.3 * 2 / 0.05, number(r.out(), "durationDays"), 1e-6 * pv * 12);
        assertEquals(pv * 0.3 * 2 * 100, number(r.out(), "waterVolumeM3"), 1e-6 * pv * 60);
        for (String key : new String[] { "peclet", "criterion", "model" }) {
            assertTrue(r.out().contains("\"" + key + "\""), key);
        }
    }

    @Test
    void withoutAreaTheWaterVolumeIsNull(@TempDir Path dir) {
        String[] args = java.util.Arrays.stream(CHECK_CASE).filter(a -> !a.equals("--area-m2") && !a.equals("100"))
                .toArray(String[]::new);
        InProcess.Result r = run(dir, args);
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("\"waterVolumeM3\": null"), r.out());
    }

    @Test
    void badValuesExitWithCodeTwoNamingTheOptionAndTheRange(@TempDir Path dir) {
        String[][] cases = { { "--water-content", "0.5", "porosity" }, { "--porosity", "1.2", "between 0 and 1" },
                { "--darcy-flux-m-d", "-1", "greater than 0" }, { "--target-fraction", "1", "between 0 and 1" },
                { "--kd-l-kg", "-0.1", "0 or greater" }, { "--thickness-m", "0", "greater than 0" },
                { "--criterion", "median", "effluent, mean or max" }, { "--darcy-flux-m-d", "fast", "" } };
        for (String[] c : cases) {
            String[] args = CHECK_CASE.clone();
            boolean replaced = false;
            for (int i = 0; i < args.length - 1; i++) {
                if (args[i].equals(c[0])) {
                    args[i + 1] = c[1];
                    replaced = true;
                }
            }
            if (!replaced) {
                args = java.util.stream.Stream.concat(java.util.Arrays.stream(args), java.util.stream.Stream.of(c[0], c[1]))
                        .toArray(String[]::new);
            }
            InProcess.Result r = run(dir, args);
            assertEquals(2, r.code(), c[0] + " " + c[1] + ": " + r.out() + r.err());
            assertTrue(r.err().contains(c[0]), "message must name " + c[0] + ": " + r.err());
            assertTrue(r.err().contains(c[2]), "message must give the range '" + c[2] + "': " + r.err());
        }
    }

    @Test
    void missingRequiredOptionExitsWithCodeTwo(@TempDir Path dir) {
        InProcess.Result r = run(dir, "flush", "--thickness-m", "2");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--water-content"), r.err());
    }

    @Test
    void checkAndDesignOfTheExample(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("example.eluvia");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            Files.copy(in, file);
        }
        InProcess.Result check = run(dir, "check", "example.eluvia");
        assertEquals(0, check.code(), check.out() + check.err());
        InProcess.Result design = run(dir, "design", "example.eluvia", "--out", "package");
        assertEquals(0, design.code(), design.err());
        assertTrue(Files.isRegularFile(dir.resolve("package/results.json")));
        assertTrue(Files.isRegularFile(dir.resolve("package/index.html")));
        assertTrue(design.out().contains("pore volumes"), design.out());
    }

    @Test
    void checkOfAnInvalidProjectExitsWithOneAndNamesTheField(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("bad.eluvia");
        String text;
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            text = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
        // make the first porosity impossible
        text = text.replaceFirst("porosity=\"[0-9.]+\"", "porosity=\"1.7\"");
        Files.writeString(file, text);
        InProcess.Result check = run(dir, "check", "bad.eluvia");
        assertEquals(1, check.code(), check.out() + check.err());
        assertTrue(check.out().contains("porosity"), check.out());
        InProcess.Result design = run(dir, "design", "bad.eluvia", "--out", "package");
        assertEquals(1, design.code());
        assertTrue(!Files.exists(dir.resolve("package/results.json")), "nothing is written for an invalid project");
    }

    @Test
    void demoWritesThePackageUnderTheWorkingFolder(@TempDir Path dir) {
        InProcess.Result r = run(dir, "demo");
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.isRegularFile(dir.resolve("eluvia-demo-output/results.json")));
        assertTrue(r.out().contains("invented"), r.out());
    }

    private static final String[] LAYER = { "--water-content", "0.3", "--porosity", "0.35", "--bulk-density-kg-m3",
            "1600", "--darcy-flux-m-d", "0.1", "--dispersivity-m", "0.1", "--target-fraction", "0.01", "--json" };

    /** "flush", the common layer options, then the case's own. */
    private static String[] flushArgs(String... more) {
        return java.util.stream.Stream.of(java.util.stream.Stream.of("flush"), java.util.Arrays.stream(LAYER),
                java.util.Arrays.stream(more)).flatMap(x -> x).toArray(String[]::new);
    }

    @Test
    void numericalSolverAgreesWithTheFiniteLayerSeries(@TempDir Path dir) {
        // Two independent methods for the same linear problem: the Brenner (1962) series and finite volumes.
        InProcess.Result series = run(dir, flushArgs("--thickness-m", "1", "--kd-l-kg", "0.2", "--criterion", "mean"));
        InProcess.Result fv = run(dir, flushArgs("--model", "numerical", "--thickness-m", "1", "--kd-l-kg", "0.2",
                "--criterion", "mean"));
        assertEquals(0, series.code(), series.err());
        assertEquals(0, fv.code(), fv.err());
        double a = number(series.out(), "poreVolumes");
        assertEquals(a, number(fv.out(), "poreVolumes"), a * 0.005);
        // mass balance of the numerical run (in, out, stored) closes to machine level
        assertTrue(Math.abs(number(fv.out(), "massBalanceError")) < 1e-8, fv.out());
    }

    @Test
    void freundlichWithUnitExponentIsLinearSorption(@TempDir Path dir) {
        // S = Kf C^n with n = 1 is the linear isotherm S = Kd C with Kd = Kf (definition of the Freundlich form)
        InProcess.Result linear = run(dir, flushArgs("--model", "numerical", "--thickness-m", "1", "--kd-l-kg", "0.5"));
        InProcess.Result freundlich = run(dir, flushArgs("--model", "numerical", "--thickness-m", "1",
                "--freundlich-kf", "0.5", "--freundlich-n", "1", "--initial-soil-mg-kg", "50"));
        assertEquals(0, freundlich.code(), freundlich.err());
        double a = number(linear.out(), "poreVolumes");
        assertEquals(a, number(freundlich.out(), "poreVolumes"), a * 1e-6);
    }

    @Test
    void nonlinearSorptionNeedsTheInitialConcentration(@TempDir Path dir) {
        InProcess.Result r = run(dir, flushArgs("--model", "numerical", "--thickness-m", "1", "--langmuir-smax", "100",
                "--langmuir-k", "0.1"));
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--initial-soil-mg-kg"), r.err());
        InProcess.Result wrongModel = run(dir, flushArgs("--thickness-m", "1", "--freundlich-kf", "1", "--freundlich-n", "0.8"));
        assertEquals(2, wrongModel.code());
        assertTrue(wrongModel.err().contains("--model numerical"), wrongModel.err());
    }

    @Test
    void twoLayersOfTheSameSoilAreOneLayer(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("layers.csv"), "thickness_m,water_content,porosity,bulk_density_kg_m3,kd_l_kg,dispersivity_m\n"
                + "0.5,0.3,0.35,1600,0.2,0.1\n0.5,0.3,0.35,1600,0.2,0.1\n");
        InProcess.Result layered = run(dir, flushArgs("--model", "numerical", "--layers", "layers.csv"));
        InProcess.Result single = run(dir, flushArgs("--model", "numerical", "--thickness-m", "1", "--kd-l-kg", "0.2"));
        assertEquals(0, layered.code(), layered.err());
        double a = number(single.out(), "poreVolumes");
        assertEquals(a, number(layered.out(), "poreVolumes"), a * 0.005);
        Files.writeString(dir.resolve("bad.csv"), "thickness_m,water_content,porosity,bulk_density_kg_m3,kd_l_kg,dispersivity_m\n"
                + "0.5,0.5,0.35,1600,0.2,0.1\n");
        InProcess.Result bad = run(dir, flushArgs("--model", "numerical", "--layers", "bad.csv"));
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("bad.csv line 2"), bad.err());
    }

    @Test
    void spectralElementsAgreeWithTheSeriesAndWithFiniteVolumesOnLayers(@TempDir Path dir) throws IOException {
        // one layer: the Brenner (1962) series; spectral elements converge to it exponentially in the degree
        InProcess.Result series = run(dir, flushArgs("--thickness-m", "1", "--kd-l-kg", "0.2", "--criterion", "mean"));
        InProcess.Result sem = run(dir, flushArgs("--model", "spectral", "--thickness-m", "1", "--kd-l-kg", "0.2",
                "--criterion", "mean"));
        assertEquals(0, sem.code(), sem.err());
        double a = number(series.out(), "poreVolumes");
        assertEquals(a, number(sem.out(), "poreVolumes"), a * 1e-7);
        assertTrue(number(sem.out(), "degreeCheckRelativeDifference") < 1e-7, sem.out());
        assertTrue(sem.out().contains("\"model\": \"spectral\""), sem.out());
        // two different layers, which no series describes: the finite-volume solver at its defaults (0.5 %)
        Files.writeString(dir.resolve("layers.csv"), "thickness_m,water_content,porosity,bulk_density_kg_m3,kd_l_kg,dispersivity_m\n"
                + "0.6,0.3,0.35,1600,0.4,0.05\n0.9,0.25,0.3,1700,0.1,0.15\n");
        InProcess.Result fv = run(dir, flushArgs("--model", "numerical", "--layers", "layers.csv", "--criterion", "max"));
        InProcess.Result layered = run(dir, flushArgs("--model", "spectral", "--layers", "layers.csv", "--criterion", "max"));
        assertEquals(0, layered.code(), layered.err());
        double b = number(layered.out(), "poreVolumes");
        assertEquals(b, number(fv.out(), "poreVolumes"), b * 0.005);
        // text output states the answer, the degree check and the caution
        InProcess.Result text = run(dir, "flush", "--model", "spectral", "--layers", "layers.csv", "--darcy-flux-m-d", "0.1",
                "--target-fraction", "0.01");
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("degree 8 against degree 10"), text.out());
        assertTrue(text.out().contains("licensed engineer"), text.out());
    }

    @Test
    void spectralElementsRefuseNonlinearLayersNamingTheFix(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("layers.csv"), "thickness_m,water_content,porosity,bulk_density_kg_m3,freundlich_kf,freundlich_n,dispersivity_m\n"
                + "1,0.3,0.35,1600,0.5,0.8,0.1\n");
        InProcess.Result r = run(dir, flushArgs("--model", "spectral", "--layers", "layers.csv", "--initial-soil-mg-kg", "10"));
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--model") && r.err().contains("numerical"), r.err());
        // a layer of Peclet number 150 is beyond the spectral elements' range: the message names the fix
        InProcess.Result wide = run(dir, "flush", "--model", "spectral", "--thickness-m", "3", "--water-content", "0.3",
                "--porosity", "0.35", "--bulk-density-kg-m3", "1600", "--kd-l-kg", "0.2", "--darcy-flux-m-d", "0.1",
                "--dispersivity-m", "0.02", "--target-fraction", "0.01");
        assertEquals(2, wide.code());
        assertTrue(wide.err().contains("option --model") && wide.err().contains("numerical for this column"), wide.err());
    }

    @Test
    void twoRegionWithBetaOneIsEquilibriumAndReportsRebound(@TempDir Path dir) {
        // beta = 1 puts all sorption capacity in equilibrium (van Genuchten and Wierenga 1976): the equilibrium result
        InProcess.Result eq = run(dir, flushArgs("--thickness-m", "1", "--kd-l-kg", "0.5"));
        InProcess.Result tr1 = run(dir, flushArgs("--model", "two-region", "--beta", "1", "--omega", "1",
                "--thickness-m", "1", "--kd-l-kg", "0.5"));
        assertEquals(0, tr1.code(), tr1.err());
        double a = number(eq.out(), "poreVolumes");
        assertEquals(a, number(tr1.out(), "poreVolumes"), a * 1e-4);
        // with slow exchange, water meets the target before the soil does, and the water rebounds above it
        InProcess.Result tail = run(dir, flushArgs("--model", "two-region", "--beta", "0.4", "--omega", "0.2",
                "--thickness-m", "1", "--kd-l-kg", "0.5"));
        assertEquals(0, tail.code(), tail.err());
        assertTrue(number(tail.out(), "poreVolumes") > a, "nonequilibrium tails need more pore volumes");
        assertTrue(number(tail.out(), "reboundFraction") > 0.01, tail.out());
        assertTrue(tail.out().contains("\"waterMeetsButSoilDoesNot\": true"), tail.out());
    }

    @Test
    void fitRecoversRetardationAndPecletFromAnOgataBanksCurve(@TempDir Path dir) throws IOException {
        // Breakthrough at the outlet of a semi-infinite column, Ogata and Banks (1961) with R = 2, P = 20,
        // evaluated here with Commons Math 3.6.1 Erf (the flux-averaged concentration of the flux-inlet problem
        // equals this first-type form, Parker and van Genuchten 1984)
        double rr = 2;
        double pp = 20;
        StringBuilder csv = new StringBuilder("pore_volumes,relative_concentration\n");
        for (double t = 0.5; t <= 5; t += 0.1) {
            double s = 2 * Math.sqrt(rr * t / pp);
            double c = 0.5 * org.apache.commons.math3.special.Erf.erfc((rr - t) / s)
                    + 0.5 * Math.exp(pp) * org.apache.commons.math3.special.Erf.erfc((rr + t) / s);
            csv.append(t).append(',').append(c).append('\n');
        }
        Files.writeString(dir.resolve("curve.csv"), csv.toString());
        InProcess.Result r = run(dir, "fit", "curve.csv", "--curve", "breakthrough", "--model", "semi-infinite", "--json");
        assertEquals(0, r.code(), r.err());
        Matcher m = Pattern.compile("\"name\": \"R\",\\s*\"value\": ([-0-9.eE+]+)").matcher(r.out());
        assertTrue(m.find(), r.out());
        assertEquals(rr, Double.parseDouble(m.group(1)), 1e-3);
        Matcher p = Pattern.compile("\"name\": \"P\",\\s*\"value\": ([-0-9.eE+]+)").matcher(r.out());
        assertTrue(p.find(), r.out());
        assertEquals(pp, Double.parseDouble(p.group(1)), 0.05);
        InProcess.Result bad = run(dir, "fit", "curve.csv", "--curve", "sideways");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--curve"), bad.err());
    }

    @Test
    void designRecordsTheVerificationAndTheUncertaintyInResultsJson(@TempDir Path dir) throws IOException {
        String text;
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            text = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
        // switch the example's uncertainty analysis on, with few runs to keep the test short
        text = text.replace("<uncertainty runCount=\"100\"", "<uncertainty enabled=\"true\" runCount=\"12\"");
        Files.writeString(dir.resolve("mc.eluvia"), text);
        InProcess.Result r = run(dir, "design", "mc.eluvia", "--out", "pkg");
        assertEquals(0, r.code(), r.err());
        String json = Files.readString(dir.resolve("pkg/results.json"));
        assertTrue(json.contains("\"verification\": {\n    \"passed\": true"), "verification outcome in results.json");
        assertTrue(json.contains("\"uncertainty\": {"), "uncertainty section in results.json");
        assertEquals(12, number(json, "requestedRuns"), 0);
        assertTrue(Files.isRegularFile(dir.resolve("pkg/design-package.pdf")));
    }
}
