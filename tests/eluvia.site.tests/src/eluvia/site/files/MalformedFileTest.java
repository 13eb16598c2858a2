package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Malformed files give a ProjectFileException naming the line and the problem, never a stack trace. */
final class MalformedFileTest {

    private static final String HEAD = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
            + "<site:Project xmlns:site=\"urn:eluvia:site\" xmlns:xmi=\"http://www.omg.org/XMI\" xmi:version=\"2.0\" schemaVersion=\"1\">\n";

    @TempDir
    Path folder;

    /** The expected line is where the parser finds the fault: an unclosed element is found at the next end tag. */
    static Stream<Arguments> malformed() {
        return Stream.of(
                Arguments.of("unclosed element", HEAD + "  <site>\n    <layers name=\"a\">\n  </site>\n</site:Project>", 5,
                        "not well-formed"),
                Arguments.of("not a number", HEAD + "  <site>\n    <layers porosity=\"0,35\"/>\n  </site>\n</site:Project>", 4,
                        "porosity = '0,35' is not a valid number"),
                Arguments.of("unknown field", HEAD + "  <site>\n\n    <layers colour=\"red\"/>\n  </site>\n</site:Project>", 5,
                        "unknown field 'colour'"),
                Arguments.of("unknown choice", HEAD + "  <flushingDesigns criterion=\"MEDIAN\"/>\n</site:Project>", 3,
                        "criterion = 'MEDIAN' is not a valid choice"),
                Arguments.of("dangling reference", HEAD + "  <contaminants name=\"a\"/>\n  <cleanupLevels contaminant=\"//@contaminants.3\"/>\n</site:Project>",
                        4, "refers to '//@contaminants.3'"),
                Arguments.of("wrong element type", HEAD.replace("schemaVersion", "xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\" schemaVersion")
                        + "  <contaminants xsi:type=\"site:Site\"/>\n</site:Project>", 3, "element of type Site"),
                Arguments.of("text after the root", HEAD + "</site:Project>\n<more/>", 4, "not well-formed"),
                Arguments.of("not XML at all", "name,porosity\nsand,0.35\n", 1, "not well-formed"),
                Arguments.of("another root element", "<?xml version=\"1.0\"?>\n<project schemaVersion=\"1\"/>", 2,
                        "not an Eluvia project file"),
                Arguments.of("bad date", HEAD + "  <revisions author=\"a\" timestamp=\"yesterday\"/>\n</site:Project>", 3,
                        "timestamp = 'yesterday' is not a valid date and time"),
                Arguments.of("truncated inside an attribute", HEAD + "  <contaminants name=\"Benz", 3, "not well-formed"),
                Arguments.of("bad boolean", HEAD + "  <contaminants kdEntered=\"yes please\"/>\n</site:Project>", 3,
                        "not a valid true/false value"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("malformed")
    void givesTheLineAndTheProblem(String what, String xml, int expectedLine, String expectedText) {
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> ProjectFiles.load(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)), "broken.eluvia"));

        assertEquals(expectedLine, e.line(), e.getMessage());
        assertTrue(e.getMessage().startsWith("broken.eluvia, line " + expectedLine + ": "), e.getMessage());
        assertTrue(e.getMessage().contains(expectedText), e.getMessage());
        assertFalse(e.getMessage().contains("\tat "), "no stack trace in the message");
        assertFalse(e.getMessage().contains("Exception"), "no exception class names in the message: " + e.getMessage());
    }

    @Test
    void anEmptyFileIsRefused() {
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> ProjectFiles.load(new ByteArrayInputStream(new byte[0]), "empty.eluvia"));

        assertEquals("empty.eluvia: the file is empty", e.getMessage());
        assertEquals(0, e.line());
    }

    @Test
    void aMissingFileIsReportedByName() {
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> ProjectFiles.load(folder.resolve("absent.eluvia")));

        assertEquals("absent.eluvia: the file does not exist", e.getMessage());
    }

    @Test
    void nullArgumentsAreRefused() {
        assertThrows(NullPointerException.class, () -> ProjectFiles.load((Path) null));
        assertThrows(NullPointerException.class, () -> ProjectFiles.load(null, "x"));
    }
}
