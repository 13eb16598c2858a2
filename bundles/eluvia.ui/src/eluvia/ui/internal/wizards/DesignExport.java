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

import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.report.DesignPackage;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;

/**
 * Writes the design package of a saved project through the report bundle: the design pipeline
 * runs on a copy of the project that keeps only the chosen alternatives, and
 * {@link DesignPackage#write} writes its files (with the cautions the run carries).
 */
public final class DesignExport {

    private DesignExport() {
    }

    /** The alternatives a project offers for export: its flushing and excavation designs, by name. */
    public static List<String> alternatives(Project project) {
        List<String> names = new ArrayList<>();
        project.getFlushingDesigns().forEach(d -> names.add(d.getName()));
        project.getExcavationDesigns().forEach(d -> names.add(d.getName()));
        return names;
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
    public static List<Path> export(ProjectDocument document, Path folder, Set<String> chosen, boolean pdf,
            IProgressMonitor monitor) throws IOException {
        if (document.isDirty()) {
            throw new IllegalStateException(Messages.Export_unsaved);
        }
        monitor.beginTask(Messages.Export_task, 3);
        Project copy = document.snapshot();
        List<FlushingDesign> dropF = copy.getFlushingDesigns().stream().filter(d -> !chosen.contains(d.getName())).toList();
        List<ExcavationDesign> dropE = copy.getExcavationDesigns().stream().filter(d -> !chosen.contains(d.getName()))
                .toList();
        copy.getFlushingDesigns().removeAll(dropF);
        copy.getExcavationDesigns().removeAll(dropE);
        monitor.subTask(Messages.Export_running);
        DesignRun run = DesignPipeline.run(copy);
        monitor.worked(1);
        if (monitor.isCanceled()) {
            throw new OperationCanceledException();
        }
        monitor.subTask(Messages.Export_writing);
        List<Path> written = DesignPackage.write(copy, run, document.fileBytes(), productVersion(), folder);
        monitor.worked(2);
        monitor.done();
        return written;
    }

    /** The version of this bundle, or "development build" outside OSGi. */
    static String productVersion() {
        Bundle b = FrameworkUtil.getBundle(DesignExport.class);
        return b == null ? Messages.Export_developmentVersion : b.getVersion().toString();
    }
}
