package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.model.Project;
import eluvia.site.model.SitePackage;
import eluvia.site.tests.TestProjects;

/** Save and load give back the same project, feature for feature. */
final class ProjectFilesRoundTripTest {

    @TempDir
    Path folder;

    @Test
    void everyFeatureSurvivesSaveAndLoad() throws Exception {
        Project original = TestProjects.everyFeatureSet();
        Path file = folder.resolve("all-features." + ProjectFiles.EXTENSION);

        ProjectFiles.save(original, file);
        Project loaded = ProjectFiles.load(file);

        assertNotSame(original, loaded);
        original.setSchemaVersion(ProjectFiles.CURRENT_SCHEMA_VERSION);
        // EMF's EqualityHelper (a general-purpose structural comparison of two object trees,
        // references included) stands in for a field-by-field comparison.
        assertTrue(EcoreUtil.equals(original, loaded), "the loaded project differs from the one saved");
    }

    @Test
    void theRoundTripProjectReallyHasEveryFeatureSet() {
        // Guards the test above: a feature left at its default would be saved and compared trivially.
        Project project = TestProjects.everyFeatureSet();
        Set<EClass> seen = new HashSet<>();
        List<EObject> objects = new java.util.ArrayList<>();
        objects.add(project);
        project.eAllContents().forEachRemaining(objects::add);
        for (EObject object : objects) {
            seen.add(object.eClass());
            for (EAttribute attribute : object.eClass().getEAllAttributes()) {
                if (attribute != SitePackage.Literals.PROJECT__SCHEMA_VERSION && !attribute.isTransient()
                        && !attribute.isDerived()) {
                    assertTrue(object.eIsSet(attribute), object.eClass().getName() + "." + attribute.getName() + " not set");
                }
            }
            for (EReference reference : object.eClass().getEAllReferences()) {
                if (!reference.isTransient() && !reference.isDerived() && !reference.isContainer()) {
                    assertTrue(object.eIsSet(reference), object.eClass().getName() + "." + reference.getName() + " not set");
                }
            }
        }
        assertEquals(new HashSet<>(TestProjects.modelClasses()), seen, "every model class must occur in the test project");
    }

    @Test
    void specialNumbersAndTextSurvive() throws Exception {
        Project project = TestProjects.example();
        project.setDescription("line one\nline two\t<tag> & \"quotes\" \u2264 \ud83d\ude00");
        project.getSite().getLayers().get(0).setPorosity(Double.NaN);
        project.getSite().getLayers().get(1).setPorosity(Double.POSITIVE_INFINITY);
        project.getContaminants().get(0).setDiffusionSquareMetresPerSecond(Double.MIN_VALUE);
        project.getSite().getZones().get(0).setAreaSquareMetres(0.1 + 0.2);
        Path file = folder.resolve("special." + ProjectFiles.EXTENSION);

        ProjectFiles.save(project, file);
        Project loaded = ProjectFiles.load(file);

        assertEquals(project.getDescription(), loaded.getDescription());
        assertTrue(Double.isNaN(loaded.getSite().getLayers().get(0).getPorosity()));
        assertEquals(Double.POSITIVE_INFINITY, loaded.getSite().getLayers().get(1).getPorosity());
        assertEquals(Double.MIN_VALUE, loaded.getContaminants().get(0).getDiffusionSquareMetresPerSecond());
        // 0.1 + 0.2 = 0.30000000000000004 in IEEE 754 doubles: written and read back to the last bit.
        assertEquals(0.1 + 0.2, loaded.getSite().getZones().get(0).getAreaSquareMetres());
    }

    @Test
    void referencesPointAtTheLoadedObjectsNotCopies() throws Exception {
        Path file = folder.resolve("refs." + ProjectFiles.EXTENSION);
        ProjectFiles.save(TestProjects.example(), file);

        Project loaded = ProjectFiles.load(file);

        assertTrue(loaded.getFlushingDesigns().get(0).getZone() == loaded.getSite().getZones().get(0));
        assertTrue(loaded.getCleanupLevels().get(1).getContaminant() == loaded.getContaminants().get(1));
    }

    @Test
    void loadingFromAStreamGivesTheSameAsFromAFile() throws Exception {
        Path file = folder.resolve("stream." + ProjectFiles.EXTENSION);
        ProjectFiles.save(TestProjects.everyFeatureSet(), file);

        Project fromFile = ProjectFiles.load(file);
        Project fromStream;
        try (var in = Files.newInputStream(file)) {
            fromStream = ProjectFiles.load(in, "stream.eluvia");
        }

        assertTrue(EcoreUtil.equals(fromFile, fromStream));
    }
}
