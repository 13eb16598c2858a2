package eluvia.ui.internal.document;

import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.widgets.Display;

import eluvia.design.DesignCancelledException;
import eluvia.design.DesignInputException;
import eluvia.design.DesignPipeline;
import eluvia.design.DesignProgress;
import eluvia.design.DesignRun;
import eluvia.design.DesignSettings;
import eluvia.site.model.Project;
import eluvia.ui.internal.Messages;

/**
 * Keeps a document's results current: after every change (debounced), runs the design pipeline
 * on a copy of the project in a cancellable Eclipse job (the pipeline's progress goes to the job's
 * monitor, the monitor's cancel flag stops the pipeline) and hands the outcome to a consumer on the
 * UI thread. A newer change cancels a run in progress; results of a superseded run are dropped.
 */
public final class DesignComputation {

    /** Quiet time after the last change before a run starts, milliseconds. */
    public static final int DEBOUNCE_MILLISECONDS = 300;

    private final ProjectDocument document;
    private final Display display;
    private final Consumer<ResultState> sink;
    private final ProjectDocument.Listener listener;
    private final Runnable start = this::start;
    private long generation;
    /** A run is scheduled behind the debounce timer (UI thread only). */
    private volatile boolean pending;
    private Job job;
    private DesignRun lastRun;
    private boolean disposed;

    public DesignComputation(ProjectDocument document, Display display, Consumer<ResultState> sink) {
        this.document = document;
        this.display = display;
        this.sink = sink;
        listener = new ProjectDocument.Listener() {
            @Override
            public void modelChanged(ProjectDocument d, org.eclipse.emf.common.notify.Notification n) {
                schedule();
            }
        };
        document.addListener(listener);
    }

    /** Starts a run after the debounce delay (restarting the delay when one is pending). */
    public void schedule() {
        if (disposed) {
            return;
        }
        pending = true;
        display.timerExec(-1, start);
        display.timerExec(DEBOUNCE_MILLISECONDS, start);
    }

    /** Starts a run now. */
    public void start() {
        if (disposed) {
            return;
        }
        display.timerExec(-1, start);
        pending = false;
        if (job != null) {
            job.cancel();
        }
        long mine = ++generation;
        Project copy = document.snapshot();
        sink.accept(new ResultState(ResultState.Status.COMPUTING, lastRun, null, null, mine));
        Job j = new Job(Messages.DesignComputation_jobName) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                monitor.beginTask(Messages.DesignComputation_jobName, PROGRESS_TICKS);
                ResultState state;
                try {
                    DesignRun run = DesignPipeline.run(copy, DesignSettings.defaults(), progress(monitor));
                    state = new ResultState(ResultState.Status.READY, run, null, null, mine);
                } catch (DesignCancelledException e) {
                    return Status.CANCEL_STATUS;
                } catch (DesignInputException e) {
                    state = new ResultState(ResultState.Status.INPUT_ERRORS, null, e.problems(), null, mine);
                } catch (RuntimeException e) {
                    state = new ResultState(ResultState.Status.FAILED, null, null,
                            e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage(), mine);
                } finally {
                    monitor.done();
                }
                if (monitor.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                ResultState done = state;
                if (!display.isDisposed()) {
                    display.asyncExec(() -> deliver(done));
                }
                return Status.OK_STATUS;
            }
        };
        j.setSystem(true);
        job = j;
        j.schedule();
    }

    /** Ticks of the job's progress monitor for a whole run. */
    static final int PROGRESS_TICKS = 1000;

    /** The pipeline's progress forwarded to a job's monitor, and the monitor's cancel flag back to the pipeline. */
    static DesignProgress progress(IProgressMonitor monitor) {
        int[] done = { 0 };
        return new DesignProgress() {
            @Override
            public void advanced(String stage, double fractionDone) {
                int ticks = (int) Math.round(Math.max(0, Math.min(1, fractionDone)) * PROGRESS_TICKS);
                if (ticks > done[0]) {
                    monitor.worked(ticks - done[0]);
                    done[0] = ticks;
                }
                monitor.subTask(stage);
            }

            @Override
            public boolean cancelRequested() {
                return monitor.isCanceled();
            }
        };
    }

    private void deliver(ResultState state) {
        if (disposed || state.generation() != generation) {
            return;
        }
        if (state.run() != null) {
            lastRun = state.run();
        }
        sink.accept(state);
    }

    /** True while a run is scheduled or in progress. */
    public boolean busy() {
        if (pending) {
            return true; // the debounce timer has not started the run yet
        }
        Job j = job;
        return j != null && j.getState() != Job.NONE;
    }

    /** Stops listening and cancels a run in progress. */
    public void dispose() {
        disposed = true;
        document.removeListener(listener);
        if (!display.isDisposed()) {
            display.timerExec(-1, start);
        }
        if (job != null) {
            job.cancel();
        }
    }
}
