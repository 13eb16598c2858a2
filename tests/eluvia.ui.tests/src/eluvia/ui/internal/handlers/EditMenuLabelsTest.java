package eluvia.ui.internal.handlers;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.menu.MMenuItem;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.files.ExampleProjects;
import eluvia.site.model.FlushingDesign;
import eluvia.ui.ProjectEditors;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.Workbench;
import eluvia.ui.internal.editor.ProjectEditorPart;
import eluvia.ui.internal.editor.ProjectEditorComposite;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * Edit > Undo and Redo in the product's workbench name the edit they would undo or redo, and are
 * plain and disabled when there is none.
 */
final class EditMenuLabelsTest {

    @TempDir
    Path dir;

    private String home;

    @BeforeEach
    void privateHome() {
        home = System.getProperty("user.home");
        System.setProperty("user.home", dir.resolve("home").toString());
        UiPreferences.reset();
    }

    @AfterEach
    void restoreHome() {
        System.setProperty("user.home", home);
        UiPreferences.reset();
    }

    private static MMenuItem modelItem(Workbench wb, String id) {
        return (MMenuItem) wb.models().find(id, wb.window.getMainMenu());
    }

    @Test
    void undoAndRedoNameTheEdit() throws Exception {
        Path file = dir.resolve("example.eluvia");
        try (InputStream in = ExampleProjects.open(ExampleProjects.RIVERSIDE_DEPOT)) {
            Files.copy(in, file);
        }
        try (Workbench wb = Workbench.start()) {
            Menu edit = wb.show("Edit");
            MenuItem undo = Workbench.item(edit, "Undo");
            assertEquals("Undo", Workbench.plain(undo.getText()), "nothing to undo: the plain label");
            assertFalse(undo.isEnabled(), "nothing to undo: disabled");
            assertFalse(Workbench.item(edit, "Redo").isEnabled());
            wb.hide(edit);

            MPart part = ProjectEditors.open(file, wb.parts(), wb.models(), wb.application);
            wb.flush();
            ProjectEditorComposite editor = ((ProjectEditorPart) part.getObject()).content();
            editor.showPage(editor.pageIndex("Flushing"));
            wb.flush();
            FlushingDesign design = ((ProjectEditorPart) part.getObject()).document().project().getFlushingDesigns().get(0);
            double before = design.getDarcyFluxMetresPerDay();
            Text flux = Gui.field(editor, Text.class, "Darcy flux (m/d)");
            flux.setFocus();
            flux.setText(Double.toString(before * 2));
            wb.flush();
            assertEquals(before * 2, design.getDarcyFluxMetresPerDay(), 1e-15);

            // the field's label with its unit, as the editor shows it
            assertEquals("&Undo Set Darcy flux (m/d)", modelItem(wb, "eluvia.app.menuitem.undo").getLabel());
            // a picture of Edit open (keyboard: Alt+E); the items are checked below
            wb.screenshotOfOpenMenus("workbench-edit-menu-undo", 'e');
            assertEquals(before * 2, design.getDarcyFluxMetresPerDay(), 1e-15);
            edit = wb.show("Edit");
            undo = Workbench.item(edit, "Undo");
            assertEquals("Undo Set Darcy flux (m/d)", Workbench.plain(undo.getText()));
            assertTrue(undo.getText().contains("\t"), "the key binding is still shown: " + undo.getText());
            assertTrue(undo.isEnabled());
            assertEquals("Redo", Workbench.plain(Workbench.item(edit, "Redo").getText()));
            wb.select(undo);
            wb.hide(edit);
            assertEquals(before, design.getDarcyFluxMetresPerDay(), "Undo from the menu took the edit back");
            assertEquals(Numbers.format(before), flux.getText());

            edit = wb.show("Edit");
            assertEquals("Undo", Workbench.plain(Workbench.item(edit, "Undo").getText()));
            assertFalse(Workbench.item(edit, "Undo").isEnabled());
            MenuItem redo = Workbench.item(edit, "Redo");
            assertEquals("Redo Set Darcy flux (m/d)", Workbench.plain(redo.getText()));
            wb.select(redo);
            wb.hide(edit);
            assertEquals(before * 2, design.getDarcyFluxMetresPerDay(), 1e-15, "Redo from the menu");
            assertEquals("&Undo Set Darcy flux (m/d)", modelItem(wb, "eluvia.app.menuitem.undo").getLabel());
            assertEquals("&Redo", modelItem(wb, "eluvia.app.menuitem.redo").getLabel());

            // closing the project leaves nothing to undo
            wb.parts().hidePart(part, true);
            wb.flush();
            assertEquals("&Undo", modelItem(wb, "eluvia.app.menuitem.undo").getLabel());
        }
    }

    @Test
    void aCommandLabelIsShownLiterally() {
        // "&" marks a mnemonic in a menu item's text; a label's own "&" is doubled to be shown as it is
        assertEquals("Set Cost && rates", EditMenuLabels.mnemonicSafe("Set Cost & rates"));
        assertEquals("Set Cost & rates", Workbench.plain("&Undo Set Cost && rates").substring("Undo ".length()));
    }
}
