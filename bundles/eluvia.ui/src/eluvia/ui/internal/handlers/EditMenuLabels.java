package eluvia.ui.internal.handlers;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.ui.model.application.ui.menu.MMenuItem;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.emf.common.command.CommandStackListener;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.document.ProjectDocument;
import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * Keeps the Undo and Redo menu items naming the edit they would undo or redo ("Undo Set Darcy
 * flux (m/d)"), from the label of the active project's command stack top; plain "Undo" and
 * "Redo" (disabled by their handlers) when there is nothing to undo or redo.
 *
 * <p>An add-on of the application model; the items it labels are the main-menu items tagged
 * {@link #UNDO_TAG} or {@link #REDO_TAG}. Labels follow every change of the command stack and
 * every change of the active project.
 */
public final class EditMenuLabels {

    /** Tag of the menu items that name the edit Undo would undo. */
    public static final String UNDO_TAG = "eluvia.ui.tag.undoLabel";
    /** Tag of the menu items that name the edit Redo would redo. */
    public static final String REDO_TAG = "eluvia.ui.tag.redoLabel";

    @Inject
    private MApplication application;
    @Inject
    private OpenDocuments documents;
    @Inject
    private EModelService modelService;

    private final CommandStackListener stackListener = e -> update();
    private final OpenDocuments.Listener activeListener = new OpenDocuments.Listener() {
        @Override
        public void activeChanged(ProjectDocument activeOrNull) {
            follow(activeOrNull);
        }
    };
    private ProjectDocument followed;

    @PostConstruct
    void start() {
        documents.addListener(activeListener);
        follow(documents.active());
    }

    @PreDestroy
    void stop() {
        documents.removeListener(activeListener);
        follow(null);
    }

    private void follow(ProjectDocument document) {
        if (followed != null) {
            followed.commandStack().removeCommandStackListener(stackListener);
        }
        followed = document;
        if (followed != null) {
            followed.commandStack().addCommandStackListener(stackListener);
        }
        update();
    }

    /** Sets the labels from the active project's command stack. */
    void update() {
        String undo = followed == null ? "" : followed.undoLabel();
        String redo = followed == null ? "" : followed.redoLabel();
        for (MMenuItem item : items(UNDO_TAG)) {
            item.setLabel(undo.isEmpty() ? Messages.Edit_undo : Messages.bind(Messages.Edit_undoNamed, mnemonicSafe(undo)));
        }
        for (MMenuItem item : items(REDO_TAG)) {
            item.setLabel(redo.isEmpty() ? Messages.Edit_redo : Messages.bind(Messages.Edit_redoNamed, mnemonicSafe(redo)));
        }
    }

    /** A command label shown literally in a menu item ("&" marks a mnemonic there). */
    static String mnemonicSafe(String label) {
        return label.replace("&", "&&");
    }

    private List<MMenuItem> items(String tag) {
        List<MMenuItem> out = new ArrayList<>();
        for (MWindow w : application.getChildren()) {
            out.addAll(modelService.findElements(w, null, MMenuItem.class, List.of(tag), EModelService.IN_MAIN_MENU));
        }
        return out;
    }
}
