package eluvia.ui.internal.wizards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.emf.edit.command.SetCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.Cautions;
import eluvia.report.DesignPackage;
import eluvia.report.PackageResult;
import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;
import eluvia.site.model.SitePackage;
import eluvia.site.validation.Problem;
import eluvia.site.validation.Severity;
import eluvia.site.validation.SiteValidator;
import eluvia.ui.internal.document.ProjectDocument;

/** New Project and Export Design Package: what they write. */
final class WizardsTest {

    @TempDir
    Path dir;

    @Test
    void aBlankProjectHasASiteAndTheProblemsSayWhatToEnter() throws Exception {
        Path file = NewProjectWizard.create("Test site", false, dir.resolve("a").resolve("test-site.eluvia"));
        Project p = ProjectFiles.load(file);
        assertEquals("Test site", p.getName());
        assertEquals("Test site", p.getSite().getName());
        List<Problem> problems = SiteValidator.validate(p);
        assertTrue(problems.stream().anyMatch(x -> x.severity() == Severity.ERROR && x.field().equals("layers")),
                problems.toString());
        assertThrows(IOException.class, () -> NewProjectWizard.create("Again", false, file), "never overwrites");
    }

    @Test
    void aProjectFromTheExampleIsACopyUnderTheNewName() throws Exception {
        Path file = NewProjectWizard.create("My copy", true, dir.resolve("copy.eluvia"));
        Project p = ProjectFiles.load(file);
        assertEquals("My copy", p.getName());
        assertEquals(ExampleProjects.loadRiversideDepot().getSite().getLayers().size(), p.getSite().getLayers().size());
    }

    @Test
    void theExportWritesTheChosenAlternativesWithTheCautionsAndThePdf() throws Exception {
        Path file = dir.resolve("example.eluvia");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            Files.copy(in, file);
        }
        ProjectDocument d = ProjectDocument.open(file);
        String chosen = d.project().getFlushingDesigns().get(0).getName();
        String other = d.project().getFlushingDesigns().get(1).getName();
        assertTrue(DesignExport.alternatives(d.project(), null).containsAll(List.of(chosen, other)));

        d.execute(SetCommand.create(d.domain(), d.project(), SitePackage.eINSTANCE.getProject_Description(), "edited"));
        Path out = dir.resolve("package");
        IllegalStateException unsaved = assertThrows(IllegalStateException.class,
                () -> DesignExport.export(d, out, Set.of(chosen), false, new NullProgressMonitor()));
        assertTrue(unsaved.getMessage().contains("unsaved"), unsaved.getMessage());
        d.save();

        PackageResult result = DesignExport.export(d, out, Set.of(chosen), true, new NullProgressMonitor());
        assertTrue(Files.isRegularFile(out.resolve(DesignPackage.RESULTS_JSON)));
        assertTrue(Files.isRegularFile(out.resolve(DesignPackage.INDEX_HTML)));
        assertTrue(Files.isRegularFile(out.resolve(DesignPackage.PDF)));
        assertTrue(result.files().contains(out.resolve(DesignPackage.PDF)));
        String html = Files.readString(out.resolve(DesignPackage.INDEX_HTML), StandardCharsets.UTF_8);
        for (String caution : List.of(Cautions.LICENSED_REVIEW, Cautions.CAPTURE_FLUSHED_WATER)) {
            assertTrue(html.contains(caution.substring(0, 40)), "every package carries the cautions: " + caution);
        }
        assertTrue(html.contains(chosen), "the chosen alternative is reported");
        // the package names the file it comes from by its SHA-256 (computed here with the JDK)
        String sha = java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(Files.readAllBytes(file)));
        assertTrue(Files.readString(out.resolve(DesignPackage.RESULTS_JSON)).contains(sha));
        assertFalse(d.isDirty());
    }
}
