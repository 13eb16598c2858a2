package eluvia.ui.internal.wizards;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.OperationCanceledException;
import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;

import eluvia.design.DesignCancelledException;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignProgress;
import eluvia.design.DesignRun;
import eluvia.design.DesignSettings;
import eluvia.report.DesignPackage;
import eluvia.report.PackageOptions;
import eluvia.report.PackageResult;
import eluvia.site.model.Project;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;

/**
 * Writes the design package of a saved project through the report bundle: the design pipeline
 * runs on a copy of the project (progress to the monitor, cancellable), and
 * {@link DesignPackage#write} writes the HTML, the PDF when asked, results.json and a CSV per
 * chart, reporting only the chosen alternatives; every package carries the cautions.
 */
public final class DesignExport {

    private DesignExport() {
    }

    /**
     * The alternatives a package can report: the flushing designs and the priced alternatives of a
     * run, by name; without a run, the project's flushing and excavation designs.
     */
    public static List<String> alternatives(Project project, DesignRun runOrNull) {
        List<String> names = new ArrayList<>();
        if (runOrNull != null) {
            runOrNull.flushing().forEach(r -> add(names, r.designName()));
            runOrNull.alternatives().forEach(a -> add(names, a.name()));
        } else {
            project.getFlushingDesigns().forEach(d -> add(names, d.getName()));
            project.getExcavationDesigns().forEach(d -> add(names, d.getName()));
        }
        return names;
    }

    private static void add(List<String> names, String name) {
        if (name != null && !names.contains(name)) {
            names.add(name);
        }
    }

    /**
     * Runs the pipeline on the chosen alternatives and writes the package.
     *
     * @param document a saved document (its file's bytes are fingerprinted into the package)
     * @param chosen names of the alternatives to include
     * @param pdf whether to write the PDF as well (when the report bundle can)
     * @return the files written
     * @throws IllegalStateException when the document has unsaved changes
     * @throws OperationCanceledException when the monitor was cancelled
     */
    public static PackageResult export(ProjectDocument document, Path folder, Set<String> chosen, boolean pdf,
            IProgressMonitor monitor) throws IOException {
        if (document.isDirty()) {
            throw new IllegalStateException(Messages.Export_unsaved);
        }
        monitor.beginTask(Messages.Export_task, 2 * WORK);
        Project copy = document.snapshot();
        monitor.subTask(Messages.Export_running);
        DesignRun run;
        try {
            run = DesignPipeline.run(copy, DesignSettings.defaults(), new DesignProgress() {
                int done;

                @Override
                public void advanced(String stage, double fractionDone) {
                    int ticks = (int) Math.round(Math.max(0, Math.min(1, fractionDone)) * WORK);
                    if (ticks > done) {
                        monitor.worked(ticks - done);
                        done = ticks;
                    }
                    monitor.subTask(stage);
                }

                @Override
                public boolean cancelRequested() {
                    return monitor.isCanceled();
                }
            });
        } catch (DesignCancelledException e) {
            throw new OperationCanceledException();
        }
        if (monitor.isCanceled()) {
            throw new OperationCanceledException();
        }
        monitor.subTask(Messages.Export_writing);
        PackageOptions options = PackageOptions.defaults().withPdf(pdf);
        if (chosen != null && !chosen.isEmpty()) {
            options = options.withAlternatives(chosen);
        }
        PackageResult written = DesignPackage.write(copy, run, document.fileBytes(), productVersion(), folder, options);
        monitor.worked(WORK);
        monitor.done();
        return written;
    }

    /** Ticks of each of the export's two steps. */
    static final int WORK = 1000;

    /** The version of this bundle, or "development build" outside OSGi. */
    static String productVersion() {
        Bundle b = FrameworkUtil.getBundle(DesignExport.class);
        return b == null ? Messages.Export_developmentVersion : b.getVersion().toString();
    }
}
