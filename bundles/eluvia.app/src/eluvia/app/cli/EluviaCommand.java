package eluvia.app.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The headless command line: {@code demo}, {@code design}, {@code check} and {@code flush}.
 *
 * Commands: {@code demo}, {@code design}, {@code check}, {@code flush}, {@code fit} and {@code uncertainty}.
 *
 * <p>Exit codes: 0 success; 1 the project is not valid (its problems are printed, one a line);
 * 2 a bad command-line option or value (the message names the option and the allowed range);
 * 3 a file could not be read or written; 4 the solver's verification cases failed (the package says so).
 */
@Command(name = "eluvia", mixinStandardHelpOptions = true, versionProvider = EluviaCommand.Version.class,
        description = { "Eluvia: soil flushing and excavation design estimates.",
                "Results are planning estimates; a licensed professional engineer must review them." },
        subcommands = { DemoCommand.class, DesignCommand.class, CheckCommand.class, FlushCommand.class, FitCommand.class,
                UncertaintyCommand.class },
        synopsisSubcommandLabel = "COMMAND")
public final class EluviaCommand implements Callable<Integer> {

    public static final int OK = 0;
    public static final int INVALID_PROJECT = 1;
    public static final int BAD_OPTION = 2;
    public static final int FILE_ERROR = 3;
    public static final int VERIFICATION_FAILED = 4;

    final Environment environment;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    EluviaCommand(Environment environment) {
        this.environment = environment;
    }

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return BAD_OPTION;
    }

    /**
     * Runs the command line.
     *
     * @return the exit code
     */
    public static int run(String[] args, Environment environment, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new EluviaCommand(environment));
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            if (ex instanceof OptionCheck) {
                err.println(ex.getMessage());
                return BAD_OPTION;
            }
            if (ex instanceof IllegalArgumentException) {
                // the numerics refuse an input (TransportInputException and the like name the quantity and range)
                err.println("input not accepted: " + ex.getMessage());
                return BAD_OPTION;
            }
            if (ex instanceof java.io.IOException || ex instanceof java.io.UncheckedIOException) {
                err.println("file error: " + ex.getMessage());
                return FILE_ERROR;
            }
            throw ex;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /** Prints the product version. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] { "Eluvia " + Environment.productVersion() };
        }
    }
}
