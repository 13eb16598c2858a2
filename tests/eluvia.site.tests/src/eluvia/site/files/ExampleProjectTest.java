package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.tests.TestProjects;
import eluvia.site.validation.Problem;
import eluvia.site.validation.SiteValidator;

/** The shipped example: readable, valid, marked as invented, with published Koc values. */
final class ExampleProjectTest {

    @Test
    void loadsAndValidatesWithoutProblems() {
        Project project = TestProjects.example();

        List<Problem> problems = SiteValidator.validate(project);

        assertEquals(List.of(), problems);
        assertFalse(project.getSite().getLayers().isEmpty());
        assertFalse(project.getFlushingDesigns().isEmpty());
    }

    @Test
    void saysItIsInvented() {
        Project project = TestProjects.example();

        assertTrue(project.getDescription().contains("INVENTED"), project.getDescription());
        assertTrue(project.getSite().getDescription().toLowerCase().contains("invented"));
        project.getCleanupLevels().forEach(level -> assertEquals("invented for the example", level.getBasis()));
    }

    @Test
    void usesTheMeasuredKocOfEpa1996TableK1() {
        Project project = TestProjects.example();

        // REFERENCES.md [PUB]: US EPA (1996) EPA/540/R-95/128 App. K Table K-1, measured Koc, benzene 61.7 L/kg
        assertEquals(61.7, contaminant(project, "Benzene").getKocLitresPerKg(), 0.0);
        // REFERENCES.md [PUB]: US EPA (1996) EPA/540/R-95/128 App. K Table K-1, measured Koc, TCE 94.3 L/kg
        assertEquals(94.3, contaminant(project, "Trichloroethylene").getKocLitresPerKg(), 0.0);
        // CAS registry numbers, from memory; their check digits are verified by the validator.
        assertEquals("71-43-2", contaminant(project, "Benzene").getCasNumber());
        assertEquals("79-01-6", contaminant(project, "Trichloroethylene").getCasNumber());
    }

    @Test
    void anUnknownExampleNameIsAnIoExceptionNamingTheChoices() {
        IOException e = assertThrows(IOException.class, () -> ExampleProjects.open("nothing.eluvia"));

        assertTrue(e.getMessage().contains(ExampleProjects.RIVERSIDE_DEPOT), e.getMessage());
    }

    private static Contaminant contaminant(Project project, String name) {
        return project.getContaminants().stream().filter(c -> name.equals(c.getName())).findFirst()
                .orElseThrow(() -> new AssertionError("no contaminant " + name));
    }
}
