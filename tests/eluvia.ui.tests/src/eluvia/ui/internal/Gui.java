package eluvia.ui.internal;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import java.util.function.Predicate;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

import eluvia.ui.internal.fields.Bindings;

/** A shell on the (virtual) display for one test, with helpers to wait, find controls and take screenshots. */
public final class Gui implements AutoCloseable {

    /** Longest wait for a background computation, milliseconds (generous: CI machines are shared and the example takes seconds per pipeline run under load). */
    public static final long WAIT_MILLISECONDS = 240_000;

    public final Display display;
    public final Shell shell;

    private Gui(int width, int height) {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
    }

    public static Gui open(int width, int height) {
        return new Gui(width, height);
    }

    /** Lays out and shows the shell, then runs pending events. */
    public void show() {
        shell.layout(true, true);
        shell.open();
        flush();
    }

    /** Runs the pending events. */
    public void flush() {
        while (display.readAndDispatch()) {
            // pending events
        }
    }

    /** Runs events until the condition holds; fails the test after {@link #WAIT_MILLISECONDS}. */
    public void waitUntil(String what, BooleanSupplier condition) {
        long end = System.currentTimeMillis() + WAIT_MILLISECONDS;
        while (!condition.getAsBoolean()) {
            if (System.currentTimeMillis() > end) {
                throw new AssertionError("timed out waiting for " + what);
            }
            if (!display.readAndDispatch()) {
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new AssertionError(e);
                }
            }
        }
        flush();
    }

    /** Runs events for a while (e.g. to let a debounce delay pass). */
    public void idle(long millis) {
        long end = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < end) {
            if (!display.readAndDispatch()) {
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }
    }

    /** Every control under a composite, depth first. */
    public static List<Control> all(Composite root) {
        List<Control> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    private static void collect(Composite c, List<Control> out) {
        for (Control child : c.getChildren()) {
            out.add(child);
            if (child instanceof Composite k) {
                collect(k, out);
            }
        }
    }

    /** The first control of a type matching a condition. */
    public static <T extends Control> T find(Composite root, Class<T> type, Predicate<T> condition) {
        for (Control c : all(root)) {
            if (type.isInstance(c) && !c.isDisposed() && condition.test(type.cast(c))) {
                return type.cast(c);
            }
        }
        throw new AssertionError("no " + type.getSimpleName() + " matching the condition");
    }

    /** The bound field whose label is the given text (with its unit), e.g. "Darcy flux (m/d)". */
    public static <T extends Control> T field(Composite root, Class<T> type, String label) {
        return find(root, type, c -> label.equals(c.getData(Bindings.LABEL_KEY)));
    }

    /** Saves a picture of the shell to {@code eluvia.screenshotDir} (if set) as {@code name.png}. */
    public void screenshot(String name) {
        String dir = System.getProperty("eluvia.screenshotDir");
        if (dir == null) {
            return;
        }
        flush();
        try {
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
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Override
    public void close() {
        if (!shell.isDisposed()) {
            shell.dispose();
        }
        flush();
    }
}
