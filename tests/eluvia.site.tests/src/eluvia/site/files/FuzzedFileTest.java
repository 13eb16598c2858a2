package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.Random;

import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;

import eluvia.site.model.Project;
import eluvia.site.validation.SiteValidator;

/**
 * Thousands of mutated copies of the shipped example (seeded, so a failure can be replayed): each
 * must load or be refused with a ProjectFileException; nothing else may escape, nothing may hang,
 * and whatever loads must survive validation.
 */
final class FuzzedFileTest {

    private static final long SEED = 4_2026_12_01L;
    private static final int CASES = 4000;
    private static final String[] TOKENS = {"<", ">", "/>", "&", "&amp;", "&#0;", "&#x110000;", "\"", "'", "=", "<!DOCTYPE x>",
        "<!ENTITY e \"x\">", "<![CDATA[", "]]>", "<?xml version=\"1.0\"?>", "xsi:type=\"site:Site\"", " xmlns:q=\"urn:q\"",
        "NaN", "-Infinity", "1e999", "-0", "//@contaminants.99", "//@site/@zones.-1", "#//", "href=\"x.eluvia#/\"",
        "schemaVersion=\"99\"", "<layers/>", "<site/>", "</site>", "\u0000", "\uFEFF", "\u00e9", "\ud83d\ude00", "\n", " "};

    @Test
    void mutatedFilesNeverEscapeAsAnythingButProjectFileExceptions() throws Exception {
        byte[] original;
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            original = in.readAllBytes();
        }
        Random random = new Random(SEED);
        int[] counts = new int[2]; // loaded, refused
        long start = System.nanoTime();
        // One bound for the whole run: a hang anywhere fails the test instead of stalling the build.
        Assertions.assertTimeoutPreemptively(Duration.ofSeconds(120), () -> {
            for (int i = 0; i < CASES; i++) {
                byte[] mutated = mutate(original, random);
                try {
                    Project project = ProjectFiles.load(new ByteArrayInputStream(mutated), "fuzz.eluvia");
                    SiteValidator.validate(project);
                    readDerivedFeatures(project);
                    counts[0]++;
                } catch (ProjectFileException e) {
                    assertTrue(e.getMessage().startsWith("fuzz.eluvia"), e.getMessage());
                    counts[1]++;
                } catch (Throwable t) {
                    fail("case " + i + " (seed " + SEED + ") escaped with " + t + " for input:\n"
                            + new String(mutated, StandardCharsets.UTF_8), t);
                }
            }
        });
        int loaded = counts[0];
        int refused = counts[1];
        assertEquals(CASES, loaded + refused);
        // At least 1 % must load, so that the loader and not only the parser is exercised; the share
        // depends on the example file, so the bound keeps a wide margin.
        assertTrue(refused > CASES / 10 && loaded > CASES / 100, "mutations too weak or too strong: loaded " + loaded
                + ", refused " + refused);
        assertTrue(System.nanoTime() - start < Duration.ofSeconds(90).toNanos(), "the fuzz run is too slow");
    }

    /** Derived values (areas, volumes, dispersivities) are computed on demand; they must not throw either. */
    private static void readDerivedFeatures(Project project) {
        project.eAllContents().forEachRemaining(object -> {
            for (org.eclipse.emf.ecore.EStructuralFeature feature : object.eClass().getEAllStructuralFeatures()) {
                if (feature.isDerived()) {
                    object.eGet(feature);
                }
            }
        });
    }

    private static byte[] mutate(byte[] original, Random random) {
        String text = new String(original, StandardCharsets.UTF_8);
        StringBuilder b = new StringBuilder(text);
        int edits = 1 + random.nextInt(4);
        for (int e = 0; e < edits; e++) {
            int at = random.nextInt(b.length() + 1);
            switch (random.nextInt(7)) {
                case 0 -> b.insert(at, TOKENS[random.nextInt(TOKENS.length)]);
                case 1 -> b.delete(at, Math.min(b.length(), at + 1 + random.nextInt(40)));
                case 2 -> {
                    if (at < b.length()) {
                        b.setCharAt(at, (char) (32 + random.nextInt(95)));
                    }
                }
                case 3 -> {
                    int from = random.nextInt(b.length());
                    int to = Math.min(b.length(), from + random.nextInt(200));
                    b.insert(at, b.substring(from, to));
                }
                case 4 -> b.setLength(Math.max(0, Math.min(b.length(), at)));
                case 5 -> replaceNumber(b, random);
                default -> {
                    int quote = b.indexOf("\"", at);
                    if (quote >= 0) {
                        b.deleteCharAt(quote);
                    }
                }
            }
        }
        byte[] bytes = b.toString().getBytes(StandardCharsets.UTF_8);
        if (random.nextInt(20) == 0 && bytes.length > 0) {
            bytes[random.nextInt(bytes.length)] = (byte) random.nextInt(256); // raw byte damage, maybe bad UTF-8
        }
        return bytes;
    }

    private static void replaceNumber(StringBuilder b, Random random) {
        String[] values = {"-1", "0", "1e308", "NaN", "abc", "", "1.5.5", "99999999999", "-0.0", "Infinity"};
        int at = b.indexOf("=\"", random.nextInt(b.length()));
        if (at >= 0) {
            int end = b.indexOf("\"", at + 2);
            if (end > at) {
                b.replace(at + 2, end, values[random.nextInt(values.length)]);
            }
        }
    }
}
