package eluvia.app.cli;

import java.io.IOException;
import java.nio.file.Path;

/**
 * What the command line needs from where it runs: the shipped example project and the working
 * folder. The OSGi application reads the example from the site bundle; tests may supply their own.
 */
public interface Environment {

    /** The bytes of the shipped example project file. */
    byte[] exampleProjectBytes() throws IOException;

    /** The file name of the shipped example project. */
    String exampleProjectName();

    /** The folder relative paths are resolved against. */
    Path workingDirectory();

    /** The product version, from the app bundle's manifest when running in OSGi. */
    static String productVersion() {
        org.osgi.framework.Bundle b = org.osgi.framework.FrameworkUtil.getBundle(Environment.class);
        return b == null ? "development" : b.getVersion().toString();
    }
}
