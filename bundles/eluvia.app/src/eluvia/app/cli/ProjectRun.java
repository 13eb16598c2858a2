package eluvia.app.cli;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import eluvia.design.DesignInputException;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.design.UncertaintyAnalysis;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.ProgressSink;
import eluvia.report.DesignPackage;
import eluvia.report.PackageOptions;
import eluvia.report.PackageResult;
import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;
import eluvia.site.validation.Problem;

/** Loading, running and writing shared by {@code design} and {@code demo}. */
final class ProjectRun {

    private ProjectRun() {
    }

    /** Loads a project file, printing a message and returning null when it cannot be read. */
    static Project load(Path file, PrintWriter err) {
        if (!Files.isRegularFile(file)) {
            err.println("project file " + file + " does not exist or is not a file");
            return null;
        }
        try {
            return ProjectFiles.load(file);
        } catch (ProjectFileException e) {
            err.println(file.getFileName() + ": " + e.getMessage());
            return null;
        }
    }

    /**
     * Validates and runs a project and writes its design package.
     *
     * @return the exit code
     */
    static int designAndWrite(byte[] bytes, String name, Path outDir, PrintWriter out, PrintWriter err) {
        Project project;
        try {
            project = ProjectFiles.load(new ByteArrayInputStream(bytes), name);
        } catch (ProjectFileException e) {
            err.println(name + ": " + e.getMessage());
            return EluviaCommand.INVALID_PROJECT;
        }
        DesignRun run;
        try {
            run = DesignPipeline.run(project);
        } catch (DesignInputException e) {
            err.println(name + " has errors; nothing was written. Fix these and run again:");
            for (Problem p : e.problems()) {
                err.println("error: " + p.message());
            }
            return EluviaCommand.INVALID_PROJECT;
        }
        PackageOptions options = PackageOptions.defaults();
        if (UncertaintyAnalysis.enabled(project)) {
            err.println("Running the uncertainty analysis of " + name + " (Monte Carlo over the whole pipeline)...");
            UncertaintyResults u = UncertaintyAnalysis.run(project, null, new ProgressSink() {
                private int lastTenth = -1;

                @Override
                public void worked(int done, int total) {
                    int tenth = total == 0 ? 10 : done * 10 / total;
                    if (tenth != lastTenth) {
                        lastTenth = tenth;
                        err.println("  " + done + " of " + total + " runs");
                        err.flush();
                    }
                }

                @Override
                public boolean cancelled() {
                    return false;
                }
            });
            options = options.withUncertainty(u);
        }
        PackageResult written;
        try {
            written = DesignPackage.write(project, run, bytes, Environment.productVersion(), outDir, options);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the design package to " + outDir + ": " + e.getMessage(), e);
        }
        List<Path> files = written.files();
        printHeadlines(run, out);
        out.println();
        out.println("Design package written to " + outDir + ":");
        files.forEach(f -> out.println("  " + f));
        out.println();
        run.cautions().forEach(c -> out.println("CAUTION: " + c));
        if (!written.verificationPassed()) {
            err.println("VERIFICATION FAILED: the solver's verification cases did not all reproduce their reference values;"
                    + " do not use these results. See the verification appendix of the package.");
            return EluviaCommand.VERIFICATION_FAILED;
        }
        return EluviaCommand.OK;
    }

    static byte[] read(Path file) {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    private static void printHeadlines(DesignRun run, PrintWriter out) {
        out.println("Project: " + run.projectName());
        for (FlushingDesignResult r : run.flushing()) {
            out.println();
            out.println("Flushing design '" + r.designName() + "' (zone '" + r.zoneName() + "', criterion: "
                    + r.criterion().description() + ")");
            if (!r.allReachable()) {
                out.println("  cleanup level NOT reached within the pore-volume limit; see the notes in the package");
            } else {
                out.printf(java.util.Locale.ROOT, "  controlling contaminant   %s%n", r.controllingContaminant());
                out.printf(java.util.Locale.ROOT, "  pore volumes              %.4g PV%n", r.poreVolumes());
                out.printf(java.util.Locale.ROOT, "  duration                  %.4g calendar days (%.4g operating days)%n",
                        r.calendarDays(), r.operatingDays());
                out.printf(java.util.Locale.ROOT, "  water applied             %.4g m3%n", r.waterAppliedCubicMetres());
                out.printf(java.util.Locale.ROOT, "  water to capture, treat   %.4g m3%n", r.waterCapturedCubicMetres());
            }
        }
        var zone = run.zoneAnalysis();
        if (zone != null && zone.available() && zone.exceedance() != null) {
            out.println();
            out.printf(java.util.Locale.ROOT, "Soil above the cleanup level (from the samples, %s): %.4g m3%n",
                    zone.estimator().label(), zone.exceedance().volumeCubicMetres());
        }
        for (var e : run.enlargements()) {
            if (!e.available() || e.envelope().isEmpty()) {
                continue;
            }
            var last = e.envelope().get(e.envelope().size() - 1);
            out.printf(java.util.Locale.ROOT, "Zone '%s' grows by dispersion from %.4g m3 to %.4g m3 (x%.3g) if the remedy waits %.3g years%n",
                    e.zoneName(), e.sourceVolumeCubicMetres(), last.volumeAboveLevelCubicMetres(), last.ratio(),
                    last.delayYears());
        }
        if (!run.alternatives().isEmpty()) {
            out.println();
            out.println("Alternatives (present value, accuracy range):");
            for (var a : run.alternatives()) {
                if (!a.available() || a.estimate() == null) {
                    out.printf(java.util.Locale.ROOT, "  %-40s not available: %s%n", a.name(), a.unavailableReason());
                    continue;
                }
                var est = a.estimate();
                out.printf(java.util.Locale.ROOT, "  %-40s %,.0f %s (%,.0f to %,.0f)%s%n", a.name(), est.presentValue().amount(),
                        est.currency(), est.presentValueLow().amount(), est.presentValueHigh().amount(),
                        a.inventedRates() ? "  [INVENTED example rates]" : "");
            }
            if (run.lowestPresentValue() != null) {
                out.println("  lowest present value: " + run.lowestPresentValue());
            }
        }
    }
}
