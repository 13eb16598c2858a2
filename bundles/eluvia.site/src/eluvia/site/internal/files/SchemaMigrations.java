package eluvia.site.internal.files;

import java.util.ArrayList;
import java.util.Date;
import java.util.List;

import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;
import eluvia.site.model.Revision;
import eluvia.site.model.SiteFactory;

/**
 * Checks a file's schema version and brings files of older versions up to
 * {@link ProjectFiles#CURRENT_SCHEMA_VERSION}, one step per version. A step may rewrite the XML
 * before EMF reads it (for renamed or restructured content) and may complete the model after
 * reading (for content the older schema did not have).
 *
 * <p>Steps:
 * <ul>
 * <li>1 to 2: version 2 only adds content (site frame and boundary, samples, nonlinear sorption,
 * nonequilibrium, excavation designs, price books, column tests, revision history, ...), with
 * defaults that keep every version-1 value meaning what it meant; the step records the conversion
 * in the new revision history.</li>
 * </ul>
 */
public final class SchemaMigrations {

    /** Author written in the revision entry of an automatic conversion. */
    public static final String CONVERSION_AUTHOR = "Eluvia (automatic conversion)";

    /** One step from {@code fromVersion} to {@code fromVersion + 1}. */
    public interface Step {
        int fromVersion();

        /** Rewrites the file's bytes before EMF reads them; the default keeps them. */
        default byte[] beforeLoad(byte[] bytes, String name) throws ProjectFileException {
            return bytes;
        }

        /** Completes the model after reading. */
        void afterLoad(Project project);
    }

    private static final List<Step> STEPS = List.of(new Step() {
        @Override
        public int fromVersion() {
            return 1;
        }

        @Override
        public void afterLoad(Project project) {
            Revision revision = SiteFactory.eINSTANCE.createRevision();
            revision.setAuthor(CONVERSION_AUTHOR);
            revision.setTimestamp(new Date());
            revision.setSummary("Converted from schema version 1 to 2 on opening; no value changed. "
                    + "New in version 2 and left at their defaults: unit system SI, dispersivity rule 'entered', "
                    + "linear sorption, equilibrium, soil cleanup levels only.");
            project.getRevisions().add(revision);
        }
    });

    private SchemaMigrations() {
    }

    /** The steps, in order; step i goes from version i + 1 to i + 2. */
    public static List<Step> steps() {
        return STEPS;
    }

    /** The steps a file of the given root needs. */
    public static Plan plan(HostileInputGuard.RootInfo root, String name) throws ProjectFileException {
        int version = version(root, name);
        if (version > ProjectFiles.CURRENT_SCHEMA_VERSION) {
            throw new ProjectFileException(name, root.line(), "the file was written by a newer version of Eluvia "
                    + "(schema version " + version + "; this version reads schema versions 1 to "
                    + ProjectFiles.CURRENT_SCHEMA_VERSION + "); open it with a newer Eluvia");
        }
        List<Step> needed = new ArrayList<>();
        for (Step step : STEPS) {
            if (step.fromVersion() >= version) {
                needed.add(step);
            }
        }
        return new Plan(version, needed);
    }

    /** The migration of one file: the version found and the steps to run. */
    public record Plan(int fromVersion, List<Step> steps) {

        public byte[] beforeLoad(byte[] bytes, String name) throws ProjectFileException {
            byte[] current = bytes;
            for (Step step : steps) {
                current = step.beforeLoad(current, name);
            }
            return current;
        }

        public void afterLoad(Project project) {
            for (Step step : steps) {
                step.afterLoad(project);
            }
        }
    }

    /** The schema version named on the root element. */
    public static int version(HostileInputGuard.RootInfo root, String name) throws ProjectFileException {
        String text = root.schemaVersionText();
        if (text == null) {
            throw new ProjectFileException(name, root.line(), "the project element has no schemaVersion attribute, "
                    + "which every project file has; the file is damaged or was not written by Eluvia");
        }
        int version;
        try {
            version = Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw new ProjectFileException(name, root.line(), "schemaVersion = '" + text
                    + "' is not a whole number; allowed 1 to " + ProjectFiles.CURRENT_SCHEMA_VERSION, e);
        }
        if (version < 1) {
            throw new ProjectFileException(name, root.line(), "schemaVersion = " + version
                    + " is not a schema version; allowed 1 to " + ProjectFiles.CURRENT_SCHEMA_VERSION);
        }
        return version;
    }
}
