package eluvia.ui.internal.charts;

import java.awt.image.BufferedImage;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;

import eluvia.report.chart.ChartSpec;
import eluvia.report.chart.Charts;

/**
 * Shows a chart of the report bundle ({@link Charts}, JFreeChart drawn off screen) on screen, so
 * that a chart in the workbench and in the design package is the same drawing: the chart is drawn
 * into a {@link BufferedImage} of the canvas's size and copied into an SWT image. Without a chart
 * the canvas shows a message instead.
 */
public final class ChartCanvas extends Canvas {

    static {
        // Charts are drawn off screen; AWT must not open a connection of its own next to SWT's.
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    /** Smallest size a chart is drawn at, pixels (the report bundle's lower limit). */
    static final int MIN_PIXELS = 50;

    private ChartSpec spec;
    private String message = "";
    private Image image;
    private Point imageSize = new Point(0, 0);
    private int renders;

    public ChartCanvas(Composite parent) {
        super(parent, SWT.DOUBLE_BUFFERED | SWT.NO_BACKGROUND);
        addListener(SWT.Paint, e -> paint(e.gc));
        addListener(SWT.Resize, e -> redraw());
        addDisposeListener(e -> disposeImage());
    }

    /** Shows a chart (null: shows the message instead). */
    public void setChart(ChartSpec newSpec, String messageWhenNone) {
        spec = newSpec;
        message = messageWhenNone == null ? "" : messageWhenNone;
        disposeImage();
        redraw();
    }

    /** The chart shown, or null. */
    public ChartSpec chart() {
        return spec;
    }

    /** The message shown when there is no chart. */
    public String message() {
        return message;
    }

    /** How many times the chart was drawn (tests: a picture was made). */
    public int renderCount() {
        return renders;
    }

    /** Draws the chart now at the canvas's size, or returns null without a chart or room. */
    public Image renderNow() {
        Rectangle area = getClientArea();
        if (spec == null || area.width < MIN_PIXELS || area.height < MIN_PIXELS) {
            return null;
        }
        if (image == null || imageSize.x != area.width || imageSize.y != area.height) {
            disposeImage();
            BufferedImage drawn = Charts.image(spec, area.width, area.height, 1.0);
            image = new Image(getDisplay(), toImageData(drawn));
            imageSize = new Point(area.width, area.height);
            renders++;
        }
        return image;
    }

    private void paint(GC gc) {
        Rectangle area = getClientArea();
        gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
        gc.fillRectangle(area);
        Image shown = null;
        try {
            shown = renderNow();
        } catch (RuntimeException e) {
            message = e.getMessage();
        }
        if (shown != null) {
            gc.drawImage(shown, 0, 0);
            return;
        }
        gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        gc.drawText(message == null ? "" : message, 12, 12, true);
    }

    private void disposeImage() {
        if (image != null) {
            image.dispose();
            image = null;
        }
    }

    /** An AWT image as SWT image data (24-bit RGB). */
    public static ImageData toImageData(BufferedImage awt) {
        int w = awt.getWidth();
        int h = awt.getHeight();
        ImageData data = new ImageData(w, h, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        int[] row = new int[w];
        for (int y = 0; y < h; y++) {
            awt.getRGB(0, y, w, 1, row, 0, w);
            for (int x = 0; x < w; x++) {
                row[x] &= 0xFFFFFF;
            }
            data.setPixels(0, y, w, row, 0);
        }
        return data;
    }
}
