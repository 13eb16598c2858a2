package eluvia.app.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import eluvia.site.files.ExampleProjects;

/** Runs the command line in-process against a working folder, as the tests of the commands do. */
final class InProcess {

    /** Exit code and what the command printed. */
    record Result(int code, String out, String err) {
    }

    private InProcess() {
    }

    /** Runs {@code args} with {@code dir} as the working folder and the shipped example as the example. */
    static Result run(Path dir, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Environment env = new Environment() {
            @Override
            public byte[] exampleProjectBytes() throws IOException {
                try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
                    return in.readAllBytes();
                }
            }

            @Override
            public String exampleProjectName() {
                return ExampleProjects.RIVERSIDE_DEPOT;
            }

            @Override
            public Path workingDirectory() {
                return dir;
            }
        };
        int code = EluviaCommand.run(args, env, new PrintWriter(out), new PrintWriter(err));
        return new Result(code, out.toString(), err.toString());
    }
}
