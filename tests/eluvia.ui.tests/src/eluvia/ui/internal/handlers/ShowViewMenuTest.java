package eluvia.ui.internal.handlers;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.e4.ui.model.application.ui.MUIElement;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Menu;
import org.junit.jupiter.api.Test;

import eluvia.ui.internal.Workbench;

/**
 * Window > Show View and Reset Layout in the product's workbench (its shipped application model):
 * every view is listed, a closed view comes back from the menu where it was, also when it was
 * taken out of the model, and Reset Layout restores the shipped sashes and views.
 */
final class ShowViewMenuTest {

    private static final String RESULTS_STACK = "eluvia.app.partstack.results";

    /** The labels of the tabs of a part stack as shown. */
    private static List<String> tabs(MPartStack stack) {
        List<String> out = new ArrayList<>();
        for (CTabItem i : ((CTabFolder) stack.getWidget()).getItems()) {
            out.add(i.getText());
        }
        return out;
    }

    private static boolean shown(MPart part) {
        return part.isToBeRendered() && part.getWidget() instanceof Control c && !c.isDisposed() && c.isVisible();
    }

    @Test
    void aClosedViewComesBackFromTheWindowMenu() {
        try (Workbench wb = Workbench.start()) {
            MPartStack results = (MPartStack) wb.models().find(RESULTS_STACK, wb.window);
            MPart excavation = wb.parts().findPart("eluvia.ui.part.excavation");
            assertTrue(tabs(results).contains("Excavation"), tabs(results).toString());

            // every view of the shipped layout is listed, in its order (the application model, Application.e4xmi)
            Menu showView = wb.show("Window", "Show View");
            assertEquals(List.of("Start", "Flushing", "Residuals", "Depth profiles", "Pore volumes", "Plan",
                    "Section", "Enlargement", "Excavation", "Alternatives", "Uncertainty", "Calibration", "Problems",
                    "Cautions"), Workbench.texts(showView));
            wb.hide(showView);

            // closed as its tab's close button closes it: the part stays in the model, not rendered
            wb.parts().hidePart(excavation);
            wb.flush();
            assertFalse(excavation.isToBeRendered());
            assertFalse(tabs(results).contains("Excavation"), tabs(results).toString());

            showView = wb.show("Window", "Show View");
            wb.select(Workbench.item(showView, "Excavation"));
            wb.hide(showView);
            assertSame(excavation, wb.parts().findPart("eluvia.ui.part.excavation"), "the same part, back in its place");
            assertSame(results, excavation.getParent());
            assertTrue(shown(excavation), "the Excavation view is visible again");
            assertSame(excavation, results.getSelectedElement());
            assertSame(excavation, wb.parts().getActivePart());
            assertTrue(tabs(results).contains("Excavation"), tabs(results).toString());
            wb.screenshot("workbench-view-reopened");
            // a picture of Window > Show View open (keyboard: Alt+W, V); the menus are checked above
            wb.screenshotOfOpenMenus("workbench-window-show-view-menu", 'w', 'v');
        }
    }

    @Test
    void aViewTakenOutOfTheModelIsPutBackInItsStack() {
        try (Workbench wb = Workbench.start()) {
            MPartStack results = (MPartStack) wb.models().find(RESULTS_STACK, wb.window);
            MPart plan = wb.parts().findPart("eluvia.ui.part.plan");
            int shippedIndex = results.getChildren().indexOf(plan);
            // a forced hide removes the part from the model (as removeOnHide parts are)
            wb.parts().hidePart(plan, true);
            wb.flush();
            assertNull(wb.parts().findPart("eluvia.ui.part.plan"));

            Menu showView = wb.show("Window", "Show View");
            assertTrue(Workbench.texts(showView).contains("Plan"), "still listed: the shipped layout has it");
            wb.select(Workbench.item(showView, "Plan"));
            wb.hide(showView);
            MPart back = wb.parts().findPart("eluvia.ui.part.plan");
            assertNotNull(back);
            assertNotSame(plan, back, "a fresh copy of the shipped part");
            assertSame(results, back.getParent(), "in the stack the shipped layout has it in");
            assertEquals(shippedIndex, results.getChildren().indexOf(back), "at its shipped place among its neighbours");
            assertEquals("plan", back.getPersistedState().get("eluvia.ui.view"), "the same view kind");
            assertTrue(shown(back));
        }
    }

    @Test
    void resetLayoutRestoresTheShippedSashesAndViews() {
        try (Workbench wb = Workbench.start()) {
            MUIElement side = wb.models().find("eluvia.app.partstack.side", wb.window);
            MUIElement centre = wb.models().find("eluvia.app.sash.centre", wb.window);
            // the shipped weights (Application.e4xmi)
            assertEquals("26", side.getContainerData());
            assertEquals("74", centre.getContainerData());
            side.setContainerData("50");
            centre.setContainerData("50");
            MPart problems = wb.parts().findPart("eluvia.ui.part.problems");
            MPart calibration = wb.parts().findPart("eluvia.ui.part.calibration");
            wb.parts().hidePart(problems);
            wb.parts().hidePart(calibration, true);
            wb.flush();

            Menu window = wb.show("Window");
            wb.select(Workbench.item(window, "Reset Layout"));
            wb.hide(window);
            assertEquals("26", side.getContainerData());
            assertEquals("74", centre.getContainerData());
            assertTrue(problems.isToBeRendered());
            MPart back = wb.parts().findPart("eluvia.ui.part.calibration");
            assertNotNull(back);
            assertTrue(back.isToBeRendered());
            MPartStack sideStack = (MPartStack) side;
            assertNotNull(sideStack.getSelectedElement());
            assertTrue(sideStack.getSelectedElement().isToBeRendered(), "the side stack shows a view");
            assertTrue(shown((MPart) sideStack.getSelectedElement()));
        }
    }
}
