package eluvia.app;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;

import eluvia.app.cli.Environment;
import eluvia.app.cli.EluviaCommand;
import eluvia.site.files.ExampleProjects;

/**
 * The headless command-line application ({@code -application eluvia.app.cli}). Its exit code is
 * the command's (see {@link EluviaCommand}).
 */
public final class HeadlessApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        String[] args = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = EluviaCommand.run(args == null ? new String[0] : args, new BundleEnvironment(), out, err);
        return code == 0 ? IApplication.EXIT_OK : Integer.valueOf(code);
    }

    @Override
    public void stop() {
        // the command runs to completion on the main thread; nothing to interrupt
    }

    /** Reads the example from the site bundle; relative paths against the launch folder. */
    private static final class BundleEnvironment implements Environment {
        @Override
        public byte[] exampleProjectBytes() throws IOException {
            try (var in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
                return in.readAllBytes();
            }
        }

        @Override
        public String exampleProjectName() {
            return ExampleProjects.RIVERSIDE_DEPOT;
        }

        @Override
        public Path workingDirectory() {
            String dir = System.getProperty("eluvia.workingDirectory");
            return Path.of(dir != null ? dir : System.getProperty("user.dir")).toAbsolutePath();
        }
    }
}
