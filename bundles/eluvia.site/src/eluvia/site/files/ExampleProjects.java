package eluvia.site.files;

import java.io.IOException;
import java.io.InputStream;

import eluvia.site.model.Project;

/**
 * The example project shipped inside this bundle (folder {@code examples/}). It describes an
 * invented site with invented numbers (only its Koc values are published, see its description);
 * it is there to show the workbench and the command line at work, never for design.
 */
public final class ExampleProjects {

    /** File name of the shipped example, inside the bundle's {@code examples/} folder. */
    public static final String RIVERSIDE_DEPOT = "riverside-depot." + ProjectFiles.EXTENSION;

    /** File name of invented sample results for the Riverside Depot example, in the sample-import CSV format. */
    public static final String RIVERSIDE_DEPOT_SAMPLES = "riverside-depot-samples.csv";

    private ExampleProjects() {
    }

    /** Opens a shipped example's bytes; the caller closes the stream. */
    public static InputStream open(String fileName) throws IOException {
        InputStream in = ExampleProjects.class.getResourceAsStream("/examples/" + fileName);
        if (in == null) {
            throw new IOException("no example named '" + fileName + "' in bundle eluvia.site (expected examples/"
                    + fileName + "); allowed: " + RIVERSIDE_DEPOT + ", " + RIVERSIDE_DEPOT_SAMPLES);
        }
        return in;
    }

    /** Reads the shipped Riverside Depot example through {@link ProjectFiles#load(InputStream, String)}. */
    public static Project loadRiversideDepot() throws ProjectFileException {
        try (InputStream in = open(RIVERSIDE_DEPOT)) {
            return ProjectFiles.load(in, RIVERSIDE_DEPOT);
        } catch (IOException e) {
            throw new ProjectFileException(RIVERSIDE_DEPOT, 0, "the shipped example could not be read ("
                    + e.getMessage() + ")", e);
        }
    }
}
