package eluvia.ui.internal.document;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.util.EContentAdapter;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;
import org.eclipse.emf.edit.provider.resource.ResourceItemProviderAdapterFactory;

import eluvia.site.edit.command.SiteEditingDomain;
import eluvia.site.edit.provider.SiteItemProviderAdapterFactory;
import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;

/**
 * One open project: the model, the file it belongs to, and the EMF.Edit editing domain whose
 * command stack records every edit for undo and redo. The document is dirty while the command
 * stack is away from its save point, or while it holds content recovered from an autosave that
 * has not been saved yet.
 *
 * <p>Used on the UI thread only; background jobs work on copies of the project
 * ({@link #snapshot()}).
 */
public final class ProjectDocument {

    /** What a document tells its observers. Every method runs on the thread that changed the document. */
    public interface Listener {
        /** The dirty state may have changed (after every command, undo, redo and save). */
        default void dirtyChanged(ProjectDocument document) {
        }

        /** Something in the project changed (one notification of the EMF model). */
        default void modelChanged(ProjectDocument document, Notification notification) {
        }

        /** The document now belongs to another file (Save As). */
        default void fileChanged(ProjectDocument document) {
        }
    }

    private final ComposedAdapterFactory adapterFactory;
    private final BasicCommandStack commandStack;
    private final AdapterFactoryEditingDomain domain;
    private final Project project;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private Path file;
    private boolean recoveredUnsaved;
    private long changeCount;
    private final EContentAdapter contentAdapter;

    private ProjectDocument(Project project, Path file, boolean recoveredUnsaved) {
        this.project = Objects.requireNonNull(project, "project");
        this.file = file.toAbsolutePath().normalize();
        this.recoveredUnsaved = recoveredUnsaved;
        adapterFactory = new ComposedAdapterFactory(new org.eclipse.emf.common.notify.AdapterFactory[] {
                new ResourceItemProviderAdapterFactory(), new SiteItemProviderAdapterFactory(),
                new ReflectiveItemProviderAdapterFactory() });
        commandStack = new BasicCommandStack();
        // its commands say what they change: the Undo and Redo menu items name them
        domain = new SiteEditingDomain(adapterFactory, commandStack);
        domain.getResourceSet().getResourceFactoryRegistry().getExtensionToFactoryMap()
                .put(Resource.Factory.Registry.DEFAULT_EXTENSION, new XMIResourceFactoryImpl());
        // The project lives in a resource of the domain's resource set so that DeleteCommand finds
        // every reference to a deleted object. Files are still written by ProjectFiles (a copy).
        Resource resource = domain.getResourceSet().createResource(URI.createFileURI(this.file.toString()));
        resource.getContents().add(project);
        commandStack.addCommandStackListener(e -> fireDirty());
        contentAdapter = new EContentAdapter() {
            @Override
            public void notifyChanged(Notification notification) {
                super.notifyChanged(notification);
                if (!notification.isTouch()) {
                    changeCount++;
                    for (Listener l : listeners) {
                        l.modelChanged(ProjectDocument.this, notification);
                    }
                }
            }
        };
        project.eAdapters().add(contentAdapter);
    }

    /**
     * Opens a project file.
     *
     * @throws ProjectFileException when the file cannot be read (the message names the file and line)
     */
    public static ProjectDocument open(Path file) throws ProjectFileException {
        return new ProjectDocument(ProjectFiles.load(file), file, false);
    }

    /** A document for a project that is already in memory (new, or read from elsewhere) and belongs to {@code file}. */
    public static ProjectDocument of(Project project, Path file) {
        return new ProjectDocument(project, file, false);
    }

    /**
     * A document whose content was recovered from an autosave of {@code file}: dirty until saved.
     *
     * @throws ProjectFileException when the autosave cannot be read
     */
    public static ProjectDocument recover(Path file, Path autosave) throws ProjectFileException {
        return new ProjectDocument(ProjectFiles.load(autosave), file, true);
    }

    public Project project() {
        return project;
    }

    /** The project file, absolute and normalised. */
    public Path file() {
        return file;
    }

    public AdapterFactoryEditingDomain domain() {
        return domain;
    }

    public BasicCommandStack commandStack() {
        return commandStack;
    }

    public ComposedAdapterFactory adapterFactory() {
        return adapterFactory;
    }

    /** True when there are changes that are not in the file. */
    public boolean isDirty() {
        return recoveredUnsaved || commandStack.isSaveNeeded();
    }

    /** Counts model changes; lets the autosave tell whether anything changed since it last wrote. */
    public long changeCount() {
        return changeCount;
    }

    /**
     * Runs an edit through the command stack, so that it can be undone.
     *
     * @return false when the command cannot execute (nothing changes)
     */
    public boolean execute(Command command) {
        if (command == null || !command.canExecute()) {
            return false;
        }
        commandStack.execute(command);
        return true;
    }

    public boolean canUndo() {
        return commandStack.canUndo();
    }

    public boolean canRedo() {
        return commandStack.canRedo();
    }

    public void undo() {
        if (commandStack.canUndo()) {
            commandStack.undo();
        }
    }

    public void redo() {
        if (commandStack.canRedo()) {
            commandStack.redo();
        }
    }

    /** The label of the command {@link #undo()} would undo, or an empty string. */
    public String undoLabel() {
        Command c = commandStack.getUndoCommand();
        return c == null || c.getLabel() == null ? "" : c.getLabel();
    }

    /** The label of the command {@link #redo()} would redo, or an empty string. */
    public String redoLabel() {
        Command c = commandStack.getRedoCommand();
        return c == null || c.getLabel() == null ? "" : c.getLabel();
    }

    /** Writes the project to its file (atomically, keeping one backup) and removes its autosave. */
    public void save() throws IOException {
        ProjectFiles.save(project, file);
        commandStack.saveIsDone();
        recoveredUnsaved = false;
        Autosave.discard(file);
        fireDirty();
    }

    /** Writes the project to another file, which the document then belongs to. */
    public void saveAs(Path newFile) throws IOException {
        Path target = newFile.toAbsolutePath().normalize();
        ProjectFiles.save(project, target);
        Path old = file;
        file = target;
        project.eResource().setURI(URI.createFileURI(target.toString()));
        commandStack.saveIsDone();
        recoveredUnsaved = false;
        Autosave.discard(old);
        Autosave.discard(target);
        for (Listener l : listeners) {
            l.fileChanged(this);
        }
        fireDirty();
    }

    /** The bytes of the project file on disk, or null when it cannot be read. */
    public byte[] fileBytes() {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            return null;
        }
    }

    /**
     * A deep copy of the project for work off the UI thread. References inside the project are
     * copied along, so the copy is self-contained.
     */
    public Project snapshot() {
        return org.eclipse.emf.ecore.util.EcoreUtil.copy(project);
    }

    public void addListener(Listener listener) {
        listeners.add(listener);
    }

    public void removeListener(Listener listener) {
        listeners.remove(listener);
    }

    /** Detaches the model from the domain's adapters; the document cannot be used afterwards. */
    public void dispose() {
        listeners.clear();
        project.eAdapters().remove(contentAdapter);
        adapterFactory.dispose();
    }

    private void fireDirty() {
        for (Listener l : listeners) {
            l.dirtyChanged(this);
        }
    }
}
