package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;

import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.tests.TestProjects;

/** The schema version is an attribute of the root element, written on save and checked on load. */
final class SchemaVersionTest {

    @TempDir
    Path folder;

    @Test
    void saveWritesTheCurrentVersionOnTheRootElement() throws Exception {
        Project project = SiteFactory.eINSTANCE.createProject();
        project.setName("new");
        project.setSite(SiteFactory.eINSTANCE.createSite());
        Path file = folder.resolve("v." + ProjectFiles.EXTENSION);

        ProjectFiles.save(project, file);

        // Read back with the JDK's DOM parser, independently of EMF.
        DocumentBuilderFactory factory = DocumentBuilderFactory.newDefaultInstance();
        factory.setNamespaceAware(true);
        Element root = factory.newDocumentBuilder().parse(file.toFile()).getDocumentElement();
        assertEquals("Project", root.getLocalName());
        assertEquals(SitePackage.eNS_URI, root.getNamespaceURI());
        assertEquals(Integer.toString(ProjectFiles.CURRENT_SCHEMA_VERSION), root.getAttribute("schemaVersion"));
        // The project in memory is not changed by saving: a copy is written.
        assertEquals(0, project.getSchemaVersion());
    }

    @Test
    void loadReadsTheVersion() throws Exception {
        Project loaded = load("<site:Project xmlns:site=\"urn:eluvia:site\" xmlns:xmi=\"http://www.omg.org/XMI\" xmi:version=\"2.0\""
                + " name=\"p\" schemaVersion=\"" + ProjectFiles.CURRENT_SCHEMA_VERSION + "\"><site name=\"s\"/></site:Project>");

        assertEquals(ProjectFiles.CURRENT_SCHEMA_VERSION, loaded.getSchemaVersion());
        assertEquals("s", loaded.getSite().getName());
    }

    @Test
    void aNewerVersionIsRefusedWithAClearMessage() {
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> load("<?xml version=\"1.0\"?>\n<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\""
                        + (ProjectFiles.CURRENT_SCHEMA_VERSION + 1) + "\"/>"));

        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("newer version of Eluvia"), e.getMessage());
        assertTrue(e.getMessage().contains("schema version " + (ProjectFiles.CURRENT_SCHEMA_VERSION + 1)), e.getMessage());
    }

    @Test
    void aMissingZeroOrNonNumericVersionIsRefused() {
        ProjectFileException missing = assertThrows(ProjectFileException.class,
                () -> load("<site:Project xmlns:site=\"urn:eluvia:site\" name=\"p\"/>"));
        assertTrue(missing.getMessage().contains("no schemaVersion attribute"), missing.getMessage());

        ProjectFileException zero = assertThrows(ProjectFileException.class,
                () -> load("<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"0\"/>"));
        assertTrue(zero.getMessage().contains("schemaVersion = 0"), zero.getMessage());

        ProjectFileException text = assertThrows(ProjectFileException.class,
                () -> load("<site:Project xmlns:site=\"urn:eluvia:site\" schemaVersion=\"one\"/>"));
        assertTrue(text.getMessage().contains("'one' is not a whole number"), text.getMessage());
        assertEquals(1, text.line());
    }

    @Test
    void theShippedExampleIsOfTheCurrentVersion() {
        assertEquals(ProjectFiles.CURRENT_SCHEMA_VERSION, TestProjects.example().getSchemaVersion());
    }

    private static Project load(String xml) throws ProjectFileException {
        return ProjectFiles.load(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)), "test.eluvia");
    }
}
