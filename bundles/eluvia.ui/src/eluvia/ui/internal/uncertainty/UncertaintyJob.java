package eluvia.ui.internal.uncertainty;

import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.widgets.Display;

import eluvia.design.DesignSettings;
import eluvia.design.UncertaintyAnalysis;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.ProgressSink;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.site.model.Project;
import eluvia.ui.internal.Messages;

/**
 * The project's uncertainty analysis (eluvia.design {@link UncertaintyAnalysis}: Monte Carlo runs
 * of the whole design pipeline) as a cancellable Eclipse job: the engine's progress goes to the
 * job's monitor and to a listener on the UI thread; cancelling the job makes the engine stop and
 * return its partial result, marked cancelled.
 */
public final class UncertaintyJob extends Job {

    /** Progress seen on the UI thread. */
    public interface Listener {
        /** Called on the UI thread as runs complete. */
        void progress(int done, int total);

        /** Called on the UI thread with the result (partial and marked cancelled after a cancel), or the failure. */
        void finished(UncertaintyResults resultOrNull, String failureOrNull);
    }

    private final Project project;
    private final SimulationSettings settings;
    private final Display display;
    private final Listener listener;
    private volatile UncertaintyResults result;

    /**
     * @param project a copy of the project to analyse (the job must not share it with the UI thread)
     */
    public UncertaintyJob(Project project, Display display, Listener listener) {
        super(Messages.Uncertainty_jobName);
        this.project = project;
        this.settings = UncertaintyAnalysis.settingsOf(project);
        this.display = display;
        this.listener = listener;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        int[] reported = { 0 };
        monitor.beginTask(Messages.Uncertainty_jobName, settings.runCount());
        ProgressSink sink = new ProgressSink() {
            @Override
            public void worked(int done, int total) {
                int scaled = (int) Math.round((double) done * settings.runCount() / Math.max(1, total));
                if (scaled > reported[0]) {
                    monitor.worked(scaled - reported[0]);
                    reported[0] = scaled;
                }
                monitor.subTask(Messages.bind(Messages.Uncertainty_progress, done, total));
                post(() -> listener.progress(done, total));
            }

            @Override
            public boolean cancelled() {
                return monitor.isCanceled();
            }
        };
        String failure = null;
        try {
            result = UncertaintyAnalysis.run(project, DesignSettings.defaults(), settings, sink);
        } catch (RuntimeException e) {
            failure = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        } finally {
            monitor.done();
        }
        UncertaintyResults r = result;
        String f = failure;
        post(() -> listener.finished(r, f));
        return monitor.isCanceled() ? Status.CANCEL_STATUS : Status.OK_STATUS;
    }

    /** The runs the job was asked for. */
    public int requestedRuns() {
        return settings.runCount();
    }

    /** The result once the job has finished (partial after a cancel), or null. */
    public UncertaintyResults result() {
        return result;
    }

    private void post(Runnable r) {
        if (!display.isDisposed()) {
            display.asyncExec(r);
        }
    }
}
