package eluvia.app.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import eluvia.site.model.Project;
import eluvia.site.validation.Problem;
import eluvia.site.validation.Severity;
import eluvia.site.validation.SiteValidator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code check <project.eluvia>}: validation only. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = { "Checks a project file: every field against its allowed range and the others.",
                "Exit code 0 when it has no errors, 1 with one message a line otherwise." })
final class CheckCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "the project file (.eluvia)")
    Path project;

    @Override
    public Integer call() {
        Path file = parent.environment.workingDirectory().resolve(project);
        Project p = ProjectRun.load(file, parent.spec.commandLine().getErr());
        if (p == null) {
            return EluviaCommand.INVALID_PROJECT;
        }
        List<Problem> problems = SiteValidator.validate(p);
        var out = parent.spec.commandLine().getOut();
        long errors = problems.stream().filter(x -> x.severity() == Severity.ERROR).count();
        for (Problem x : problems) {
            out.println((x.severity() == Severity.ERROR ? "error: " : "warning: ") + x.message());
        }
        if (errors > 0) {
            out.println(file.getFileName() + ": " + errors + " error(s), " + (problems.size() - errors) + " warning(s)");
            return EluviaCommand.INVALID_PROJECT;
        }
        out.println(file.getFileName() + ": valid (" + problems.size() + " warning(s))");
        return EluviaCommand.OK;
    }
}
