package eluvia.ui.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import eluvia.design.FlushingDesignResult;
import eluvia.site.files.ExampleProjects;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;

/** Opens the shipped example in the project editor's content under a real (virtual) display. */
final class ProjectEditorCompositeTest {

    private Display display;
    private Shell shell;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1280, 800);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    private ProjectEditorComposite editorOf(Project p, int[] edits) {
        ProjectEditorComposite c = new ProjectEditorComposite(shell, p, () -> edits[0]++);
        shell.layout(true, true);
        shell.open();
        flush();
        return c;
    }

    private void flush() {
        while (display.readAndDispatch()) {
            // run pending events
        }
    }

    @Test
    void theExampleShowsItsResultsAndAnEditRecomputesThem() throws Exception {
        Project p = ExampleProjects.loadRiversideDepot();
        int[] edits = { 0 };
        ProjectEditorComposite c = editorOf(p, edits);
        screenshot("project-editor");
        assertNotNull(c.lastRun(), c.headline().getText());
        FlushingDesignResult first = c.lastRun().flushing().get(0);
        assertTrue(c.resultsTable().getItemCount() >= 3, "a row per criterion");
        TableItem row = c.resultsTable().getItem(0);
        assertEquals(first.designName(), row.getText(0));
        // the first row's pore volumes read off the table, against the pipeline's value (3 significant figures)
        double shown = Double.parseDouble(row.getText(3));
        double computed = first.contaminants().get(0).estimates().values().iterator().next().result().poreVolumes();
        assertEquals(computed, shown, Math.abs(computed) * 5e-3 + 1e-9);
        assertTrue(c.headline().getText().contains("PV"), c.headline().getText());

        // Double the Darcy flux of the first design: duration is t = T theta L / q (REFERENCES.md), so the
        // calendar days fall by about half (T changes little: dispersion scales with v when alpha_L v >> tau D0).
        FlushingDesign d = p.getFlushingDesigns().get(0);
        double before = first.calendarDays();
        Text flux = findText(c, "Darcy flux (m/d)");
        flux.setText(Double.toString(d.getDarcyFluxMetresPerDay() * 2));
        flush();
        assertEquals(1, edits[0], "the edit marks the editor dirty");
        double after = c.lastRun().flushing().get(0).calendarDays();
        assertEquals(0.5, after / before, 0.05);
    }

    @Test
    void aBadValueIsKeptAndExplainedAndDoesNotReachTheModel() throws Exception {
        Project p = ExampleProjects.loadRiversideDepot();
        int[] edits = { 0 };
        ProjectEditorComposite c = editorOf(p, edits);
        double fluxBefore = p.getFlushingDesigns().get(0).getDarcyFluxMetresPerDay();
        Text flux = findText(c, "Darcy flux (m/d)");
        flux.setText("-3");
        flush();
        assertEquals("-3", flux.getText(), "what the user typed stays in the field");
        assertEquals(fluxBefore, p.getFlushingDesigns().get(0).getDarcyFluxMetresPerDay());
        assertTrue(c.messageLabel().getText().contains("Darcy flux (m/d)"), c.messageLabel().getText());
        assertTrue(c.messageLabel().getText().contains("greater than 0"), c.messageLabel().getText());
        assertEquals(0, edits[0]);
        flux.setText("0.1");
        flush();
        assertEquals("", c.messageLabel().getText());
    }

    private static Text findText(Composite root, String label) {
        List<Control> all = new ArrayList<>();
        collect(root, all);
        for (int i = 0; i < all.size() - 1; i++) {
            if (all.get(i) instanceof Label l && l.getText().equals(label) && all.get(i + 1) instanceof Text t) {
                return t;
            }
        }
        throw new AssertionError("no field labelled " + label);
    }

    private static void collect(Composite c, List<Control> out) {
        for (Control child : c.getChildren()) {
            out.add(child);
            if (child instanceof Composite k) {
                collect(k, out);
            }
        }
    }

    private void screenshot(String name) throws Exception {
        String dir = System.getProperty("eluvia.screenshotDir");
        if (dir == null) {
            return;
        }
        Files.createDirectories(Path.of(dir));
        var size = shell.getSize();
        Image image = new Image(display, size.x, size.y);
        GC gc = new GC(shell);
        gc.copyArea(image, 0, 0);
        gc.dispose();
        ImageData data = image.getImageData();
        ImageLoader loader = new ImageLoader();
        loader.data = new ImageData[] { data };
        loader.save(Path.of(dir, name + ".png").toString(), SWT.IMAGE_PNG);
        image.dispose();
    }
}
