package eluvia.app.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code design <project.eluvia> --out <dir>}: validate, run the pipeline, write the design package. */
@Command(name = "design", mixinStandardHelpOptions = true,
        description = "Validates a project, runs the design pipeline and writes the design package (results.json, index.html).")
final class DesignCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "the project file (.eluvia)")
    Path project;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the design package (created if missing)")
    Path out;

    @Override
    public Integer call() {
        Path file = parent.environment.workingDirectory().resolve(project);
        var err = parent.spec.commandLine().getErr();
        if (ProjectRun.load(file, err) == null) {
            return EluviaCommand.INVALID_PROJECT;
        }
        return ProjectRun.designAndWrite(ProjectRun.read(file), file.getFileName().toString(),
                parent.environment.workingDirectory().resolve(out), parent.spec.commandLine().getOut(), err);
    }
}
