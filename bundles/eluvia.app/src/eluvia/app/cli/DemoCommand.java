package eluvia.app.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/** {@code demo}: runs {@code design} on the shipped (invented) example project. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = { "Runs the design pipeline on the shipped example project and writes its design package.",
                "The example site, its numbers and its unit rates are invented for demonstration." })
final class DemoCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "eluvia-demo-output",
            description = "folder for the design package, under the current folder (default: ${DEFAULT-VALUE})")
    Path out;

    @Override
    public Integer call() {
        Environment env = parent.environment;
        byte[] bytes;
        try {
            bytes = env.exampleProjectBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the shipped example project: " + e.getMessage(), e);
        }
        var o = parent.spec.commandLine().getOut();
        o.println("Example project " + env.exampleProjectName() + " (an invented site; invented numbers)");
        return ProjectRun.designAndWrite(bytes, env.exampleProjectName(), env.workingDirectory().resolve(out), o,
                parent.spec.commandLine().getErr());
    }
}
