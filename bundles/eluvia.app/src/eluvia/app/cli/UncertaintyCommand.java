package eluvia.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import eluvia.design.DesignInputException;
import eluvia.design.DesignSettings;
import eluvia.design.UncertaintyAnalysis;
import eluvia.design.UncertaintyHeadline;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.CheapestAlternative;
import eluvia.design.uncertainty.InputSummary;
import eluvia.design.uncertainty.ProgressSink;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.design.uncertainty.UncertaintyInputException;
import eluvia.site.model.Project;
import eluvia.site.validation.Problem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code uncertainty <project.eluvia> [--runs N] [--seed S]}: the Monte Carlo uncertainty of the
 * headline figures (eluvia.design UncertaintyAnalysis) with the project's uncertain inputs, printed
 * as P10 / P50 / P90 beside the deterministic value, with the chance that each priced alternative
 * has the lowest present value and the failed runs by reason. Writes no files.
 */
@Command(name = "uncertainty", mixinStandardHelpOptions = true,
        description = { "Runs the Monte Carlo uncertainty analysis of a project's uncertain inputs and prints",
                "P10 / P50 / P90 of every headline figure (P10: not exceeded in 10 % of the runs)." })
final class UncertaintyCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "the project file (.eluvia) with uncertain inputs")
    Path project;

    @Option(names = "--runs", paramLabel = "N",
            description = "number of Monte Carlo runs (default: the project's setting), 2 to 10000000")
    Integer runs;

    @Option(names = "--seed", paramLabel = "S", description = "seed of the random generator (default: the project's setting)")
    Long seed;

    @Override
    public Integer call() {
        if (runs != null && (runs < SimulationSettings.MIN_RUNS || runs > SimulationSettings.MAX_RUNS)) {
            throw new OptionCheck("--runs", runs, SimulationSettings.MIN_RUNS + " to " + SimulationSettings.MAX_RUNS);
        }
        Path file = parent.environment.workingDirectory().resolve(project);
        PrintWriter err = parent.spec.commandLine().getErr();
        PrintWriter out = parent.spec.commandLine().getOut();
        Project p = ProjectRun.load(file, err);
        if (p == null) {
            return EluviaCommand.INVALID_PROJECT;
        }
        UncertaintyResults r;
        try {
            SimulationSettings settings = UncertaintyAnalysis.settingsOf(p);
            if (runs != null) {
                settings = settings.withRunCount(runs);
            }
            if (seed != null) {
                settings = settings.withSeed(seed);
            }
            r = UncertaintyAnalysis.run(p, DesignSettings.defaults(), settings, ProgressSink.NONE);
        } catch (DesignInputException e) {
            err.println(file.getFileName() + " has errors. Fix these and run again:");
            for (Problem x : e.problems()) {
                err.println("error: " + x.message());
            }
            return EluviaCommand.INVALID_PROJECT;
        } catch (UncertaintyInputException e) {
            err.println(file.getFileName() + ": " + e.getMessage());
            return EluviaCommand.INVALID_PROJECT;
        }
        print(r, out);
        return EluviaCommand.OK;
    }

    static void print(UncertaintyResults r, PrintWriter out) {
        var s = r.simulation().settings();
        out.printf(Locale.ROOT, "Uncertainty of '%s': %d runs (%s, seed %d): %d completed, %d failed%s%n",
                r.projectName(), r.requestedRunCount(), s.samplingMethod(), s.seed(), r.completedRunCount(),
                r.failedRunCount(), r.cancelled() ? " (cancelled)" : "");
        out.println();
        out.println("Uncertain inputs (P10 / P50 / P90 of the distribution):");
        for (InputSummary i : r.inputs()) {
            out.printf(Locale.ROOT, "  %-60s %-10s %.4g / %.4g / %.4g  %s%n", i.name(), i.unit(), i.p10(), i.p50(), i.p90(),
                    i.distribution());
        }
        out.println();
        out.printf(Locale.ROOT, "  %-70s %-8s %11s %11s %11s %13s%n", "headline figure", "unit", "P10", "P50", "P90",
                "deterministic");
        for (UncertaintyHeadline h : r.headlines()) {
            out.printf(Locale.ROOT, "  %-70s %-8s %11.4g %11.4g %11.4g %13.4g%n", h.outputName(), h.unit(),
                    h.statistics().p10(), h.statistics().p50(), h.statistics().p90(), h.baseValue());
        }
        for (CheapestAlternative c : r.cheapest()) {
            out.println();
            out.println("Chance of the " + c.label() + ":");
            for (int i = 0; i < c.outputNames().size(); i++) {
                out.printf(Locale.ROOT, "  %-70s %5.1f %%%n", c.outputNames().get(i), 100 * c.probabilities().get(i));
            }
        }
        if (!r.failureCounts().isEmpty()) {
            out.println();
            out.println("Failed runs by reason (left out of the statistics):");
            for (Map.Entry<String, Integer> e : r.failureCounts().entrySet()) {
                out.printf(Locale.ROOT, "  %6d  %s%n", e.getValue(), e.getKey());
            }
        }
        out.println();
        out.println("Percentiles: " + eluvia.design.uncertainty.OutputStatistics.PERCENTILE_DEFINITION + ".");
    }
}
