package eluvia.site.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.model.Project;
import eluvia.site.model.Revision;
import eluvia.site.tests.TestProjects;

/** Revision entries: who, when, what; kept through save and load. */
final class RevisionHistoryTest {

    @TempDir
    Path folder;

    @Test
    void anEntryIsAddedAndSurvivesSaving() throws Exception {
        Project project = TestProjects.example();
        Instant when = Instant.parse("2026-11-30T08:15:30.123Z");

        Revision revision = RevisionHistory.add(project, "  A. Engineer ", "Raised the flux of alternative 2 to 0.3 m/d ", when);
        Path file = folder.resolve("history.eluvia");
        ProjectFiles.save(project, file);
        Project loaded = ProjectFiles.load(file);

        assertEquals("A. Engineer", revision.getAuthor());
        Revision last = loaded.getRevisions().get(loaded.getRevisions().size() - 1);
        assertEquals("Raised the flux of alternative 2 to 0.3 m/d", last.getSummary());
        assertEquals(when, last.getTimestamp().toInstant(), "to the millisecond, time zone kept");
        assertEquals(2, loaded.getRevisions().size());
    }

    @Test
    void blankAuthorsAndSummariesAreRefused() {
        Project project = TestProjects.example();
        IllegalArgumentException author = assertThrows(IllegalArgumentException.class,
                () -> RevisionHistory.add(project, " ", "x", Instant.now()));
        assertTrue(author.getMessage().contains("revision author"), author.getMessage());
        assertThrows(IllegalArgumentException.class, () -> RevisionHistory.add(project, "me", null, Instant.now()));
        assertThrows(NullPointerException.class, () -> RevisionHistory.add(null, "me", "x", Instant.now()));
        assertThrows(NullPointerException.class, () -> RevisionHistory.add(project, "me", "x", null));
    }
}
