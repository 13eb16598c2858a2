package eluvia.ui.internal.editor;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.di.Persist;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;

import eluvia.site.files.ProjectFileException;
import eluvia.site.library.PropertyLibrary;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.Autosave;
import eluvia.ui.internal.document.DesignComputation;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.preferences.UiPreferences;
import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * The project editor: one per open {@code .eluvia} file (its path is in the part's persisted
 * state under {@link #FILE_KEY}). Opens the file (offering to recover an autosave left by a
 * crash), registers the document with {@link OpenDocuments} so that the views follow it, keeps
 * its results current with a {@link DesignComputation}, autosaves it while dirty and saves it on
 * request.
 */
public final class ProjectEditorPart {

    /** Id of the part descriptor in the application model. */
    public static final String DESCRIPTOR_ID = "eluvia.ui.partdescriptor.projectEditor";
    /** Persisted-state key holding the absolute path of the project file. */
    public static final String FILE_KEY = "eluvia.ui.file";

    @Inject
    private OpenDocuments documents;

    private MPart part;
    private ProjectDocument document;
    private ProjectEditorComposite content;
    private DesignComputation computation;
    private IPropertyChangeListener unitListener;
    private long autosavedAt = -1;
    private Runnable autosaveTick;

    @PostConstruct
    public void createControls(Composite parent, MPart part) {
        this.part = part;
        parent.setLayout(new FillLayout());
        Path file = Path.of(part.getPersistedState().get(FILE_KEY));
        try {
            document = openOrRecover(parent, file);
        } catch (ProjectFileException e) {
            Label l = new Label(parent, SWT.WRAP);
            l.setText(Messages.bind(Messages.Editor_cannotOpen, file, e.getMessage()));
            return;
        }
        UiPreferences.addRecentFile(file);
        part.setLabel(document.file().getFileName().toString());
        part.setTooltip(document.file().toString());
        part.setDirty(document.isDirty());
        content = new ProjectEditorComposite(parent, document, UiPreferences.unitSystem(), PropertyLibrary.shipped());
        document.addListener(new ProjectDocument.Listener() {
            @Override
            public void dirtyChanged(ProjectDocument d) {
                part.setDirty(d.isDirty());
            }

            @Override
            public void fileChanged(ProjectDocument d) {
                part.getPersistedState().put(FILE_KEY, d.file().toString());
                part.setLabel(d.file().getFileName().toString());
                part.setTooltip(d.file().toString());
                UiPreferences.addRecentFile(d.file());
            }
        });
        documents.register(document, content);
        computation = new DesignComputation(document, parent.getDisplay(), s -> documents.publish(document, s));
        computation.start();
        unitListener = e -> {
            if (UiPreferences.UNIT_SYSTEM.equals(e.getProperty()) && !content.isDisposed()) {
                content.setUnits(UiPreferences.unitSystem());
            }
        };
        UiPreferences.store().addPropertyChangeListener(unitListener);
        scheduleAutosave(parent.getDisplay());
    }

    private static ProjectDocument openOrRecover(Composite parent, Path file) throws ProjectFileException {
        Optional<Path> pending = Autosave.pending(file);
        if (pending.isPresent()) {
            MessageDialog ask = new MessageDialog(parent.getShell(), Messages.Editor_recoverTitle, null,
                    Messages.bind(Messages.Editor_recoverQuestion, file.getFileName()), MessageDialog.QUESTION,
                    0, Messages.Editor_recoverYes, Messages.Editor_recoverNo);
            if (ask.open() == 0) {
                try {
                    return ProjectDocument.recover(file, pending.get());
                } catch (ProjectFileException e) {
                    MessageDialog.openError(parent.getShell(), Messages.Editor_recoverTitle,
                            Messages.bind(Messages.Editor_recoverFailed, e.getMessage()));
                }
            }
            Autosave.discard(file);
        }
        return ProjectDocument.open(file);
    }

    private void scheduleAutosave(Display display) {
        int seconds = UiPreferences.autosaveSeconds();
        if (seconds <= 0) {
            return;
        }
        autosaveTick = () -> {
            if (content == null || content.isDisposed()) {
                return;
            }
            if (document.isDirty() && document.changeCount() != autosavedAt) {
                try {
                    Autosave.write(document);
                    autosavedAt = document.changeCount();
                } catch (IOException | RuntimeException e) {
                    // the autosave is a safety net only; the next tick tries again
                }
            }
            display.timerExec(seconds * 1000, autosaveTick);
        };
        display.timerExec(seconds * 1000, autosaveTick);
    }

    /** The document, or null when the file could not be opened. */
    public ProjectDocument document() {
        return document;
    }

    /** The editor's content, or null when the file could not be opened. */
    public ProjectEditorComposite content() {
        return content;
    }

    @Focus
    public void focus() {
        if (content != null) {
            documents.activate(document);
            content.setFocus();
        }
    }

    @Persist
    public void save() {
        if (document == null) {
            return;
        }
        try {
            document.save();
        } catch (IOException | RuntimeException e) {
            MessageDialog.openError(content.getShell(), Messages.Editor_saveFailedTitle,
                    Messages.bind(Messages.Editor_saveFailed, document.file(), e.getMessage()));
        }
    }

    @PreDestroy
    public void close() {
        if (document == null) {
            return;
        }
        if (autosaveTick != null && !Display.getCurrent().isDisposed()) {
            Display.getCurrent().timerExec(-1, autosaveTick);
        }
        UiPreferences.store().removePropertyChangeListener(unitListener);
        computation.dispose();
        documents.unregister(document);
        // Closed on purpose: an unsaved change was declined, so its autosave is not a crash's leftover.
        Autosave.discard(document.file());
        document.dispose();
    }

    MPart part() {
        return part;
    }
}
