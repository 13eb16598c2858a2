package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Path;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Attr;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;

import eluvia.site.internal.files.SchemaMigrations;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ComplianceStatistic;
import eluvia.site.model.Contaminant;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.Project;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SorptionIsotherm;
import eluvia.site.model.UnitSystem;
import eluvia.site.validation.SiteValidator;

/**
 * Older schema versions are migrated on load, one test per step. The version-1 file is the shipped
 * example exactly as version 1 of this code wrote it (kept under data/schema-1).
 */
final class MigrationTest {

    private static final String V1_FILE = "/data/schema-1/riverside-depot-v1.eluvia";

    @TempDir
    Path folder;

    @Test
    void theStepsGoOneVersionAtATimeUpToTheCurrentOne() {
        List<SchemaMigrations.Step> steps = SchemaMigrations.steps();

        assertEquals(ProjectFiles.CURRENT_SCHEMA_VERSION - 1, steps.size());
        for (int i = 0; i < steps.size(); i++) {
            assertEquals(i + 1, steps.get(i).fromVersion());
        }
    }

    @Test
    void step1To2KeepsEveryVersion1ValueAndRecordsTheConversion() throws Exception {
        Project project = loadV1();

        assertEquals(ProjectFiles.CURRENT_SCHEMA_VERSION, project.getSchemaVersion());
        // Every attribute written in the version-1 file, element by element, read independently with
        // the JDK's DOM parser, has the same value in the migrated model.
        Element root = v1Document();
        int compared = compareAttributes(root, project);
        assertTrue(compared > 60, "compared only " + compared + " attributes");
        assertEquals(1, project.getRevisions().size());
        assertEquals(SchemaMigrations.CONVERSION_AUTHOR, project.getRevisions().get(0).getAuthor());
        assertTrue(project.getRevisions().get(0).getSummary().contains("schema version 1 to 2"));
        assertNotNull(project.getRevisions().get(0).getTimestamp());
    }

    @Test
    void step1To2LeavesTheNewFieldsAtDefaultsThatKeepTheOldMeaning() throws Exception {
        Project project = loadV1();

        assertEquals(UnitSystem.SI, project.getUnitSystem());
        for (SoilLayer layer : project.getSite().getLayers()) {
            assertEquals(DispersivityRule.ENTERED, layer.getDispersivityRule());
            assertEquals(layer.getDispersivityMetres(), layer.getEffectiveDispersivityMetres(), 0.0);
        }
        for (Contaminant c : project.getContaminants()) {
            assertEquals(SorptionIsotherm.LINEAR, c.getIsotherm());
            assertEquals(NonequilibriumEntry.EQUILIBRIUM, c.getNonequilibrium());
        }
        for (CleanupLevel level : project.getCleanupLevels()) {
            assertTrue(level.isSoilLevelEntered());
            assertTrue(!level.isPorewaterLevelEntered());
            assertEquals(ComplianceStatistic.NOT_TO_EXCEED, level.getStatistic());
        }
        // Without a footprint polygon the entered area is used.
        assertEquals(450.0, project.getSite().getZones().get(0).getEffectiveAreaSquareMetres(), 0.0);
        assertEquals(List.of(), SiteValidator.validate(project).stream()
                .filter(p -> p.severity() == eluvia.site.validation.Severity.ERROR).toList());
    }

    @Test
    void aMigratedProjectIsSavedAsTheCurrentVersionAndReadsBackUnchanged() throws Exception {
        Project project = loadV1();
        Path file = folder.resolve("migrated.eluvia");

        ProjectFiles.save(project, file);
        Project again = ProjectFiles.load(file);

        assertTrue(EcoreUtil.equals(project, again));
        assertEquals(1, again.getRevisions().size(), "loading a current file adds no conversion entry");
    }

    private static Project loadV1() throws ProjectFileException, java.io.IOException {
        try (InputStream in = MigrationTest.class.getResourceAsStream(V1_FILE)) {
            assertNotNull(in, V1_FILE);
            return ProjectFiles.load(in, "riverside-depot-v1.eluvia");
        }
    }

    private static Element v1Document() throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newDefaultInstance();
        factory.setNamespaceAware(true);
        try (InputStream in = MigrationTest.class.getResourceAsStream(V1_FILE)) {
            return factory.newDocumentBuilder().parse(in).getDocumentElement();
        }
    }

    /** Walks the XML and the model together; returns how many attribute values were compared. */
    private static int compareAttributes(Element element, EObject object) {
        int compared = 0;
        NamedNodeMap attributes = element.getAttributes();
        for (int i = 0; i < attributes.getLength(); i++) {
            Attr attribute = (Attr) attributes.item(i);
            if (attribute.getNamespaceURI() != null) {
                continue; // xmi:version, xmlns:*
            }
            EStructuralFeature feature = object.eClass().getEStructuralFeature(attribute.getLocalName());
            assertNotNull(feature, object.eClass().getName() + " has no feature " + attribute.getLocalName());
            if (feature instanceof EAttribute eAttribute) {
                if (eAttribute.getName().equals("schemaVersion")) {
                    continue;
                }
                Object expected = EcoreUtil.createFromString(eAttribute.getEAttributeType(), attribute.getValue());
                assertEquals(expected, object.eGet(eAttribute), object.eClass().getName() + "." + eAttribute.getName());
            } else {
                EObject target = (EObject) object.eGet(feature);
                assertEquals(attribute.getValue(),
                        "//" + EcoreUtil.getRelativeURIFragmentPath(EcoreUtil.getRootContainer(target), target),
                        object.eClass().getName() + "." + feature.getName());
            }
            compared++;
        }
        java.util.Map<String, Integer> seen = new java.util.HashMap<>();
        for (Node child = element.getFirstChild(); child != null; child = child.getNextSibling()) {
            if (child instanceof Element childElement) {
                EReference containment = (EReference) object.eClass().getEStructuralFeature(childElement.getLocalName());
                assertNotNull(containment, object.eClass().getName() + " has no feature " + childElement.getLocalName());
                int index = seen.merge(childElement.getLocalName(), 1, Integer::sum) - 1;
                EObject childObject = containment.isMany()
                        ? ((List<?>) object.eGet(containment)).get(index) instanceof EObject e ? e : null
                        : (EObject) object.eGet(containment);
                compared += compareAttributes(childElement, childObject);
            }
        }
        return compared;
    }
}
