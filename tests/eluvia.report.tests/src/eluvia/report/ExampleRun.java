package eluvia.report;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;

/**
 * The shipped example (an invented site, see ExampleProjects) loaded from its bytes and run once
 * through the design pipeline, shared by the tests of this fragment to keep them fast.
 */
final class ExampleRun {

    /** The project file bytes as shipped. */
    static final byte[] BYTES;
    /** The project loaded from them. */
    static final Project PROJECT;
    /** Its design run. */
    static final DesignRun RUN;

    static {
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            BYTES = in.readAllBytes();
            PROJECT = ProjectFiles.load(new ByteArrayInputStream(BYTES), "example");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (ProjectFileException e) {
            throw new IllegalStateException(e);
        }
        RUN = DesignPipeline.run(PROJECT);
    }

    private ExampleRun() {
    }
}
