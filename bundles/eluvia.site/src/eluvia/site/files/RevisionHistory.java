package eluvia.site.files;

import java.time.Instant;
import java.util.Date;
import java.util.Objects;

import eluvia.site.model.Project;
import eluvia.site.model.Revision;
import eluvia.site.model.SiteFactory;

/** Adds entries to a project's revision history (who, when, what changed). */
public final class RevisionHistory {

    private RevisionHistory() {
    }

    /**
     * Appends a revision entry.
     *
     * @param project the project
     * @param author who made the change; not blank
     * @param summary what changed; not blank
     * @param when when the change was made
     * @return the new entry (already added)
     * @throws IllegalArgumentException for a blank author or summary
     */
    public static Revision add(Project project, String author, String summary, Instant when) {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(when, "when");
        if (author == null || author.isBlank()) {
            throw new IllegalArgumentException("revision author = '" + author + "': allowed a non-blank name; say who made the change");
        }
        if (summary == null || summary.isBlank()) {
            throw new IllegalArgumentException("revision summary = '" + summary + "': allowed a non-blank text; say what changed");
        }
        Revision revision = SiteFactory.eINSTANCE.createRevision();
        revision.setAuthor(author.trim());
        revision.setSummary(summary.trim());
        revision.setTimestamp(Date.from(when));
        project.getRevisions().add(revision);
        return revision;
    }
}
