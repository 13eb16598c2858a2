package eluvia.ui.internal.fields;

import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.widgets.Display;

/**
 * The workbench's own small marks, drawn pixel by pixel (no image files): a rust-red disc with a
 * white bar for a field that holds a bad value. One image per display, disposed with it.
 */
public final class Marks {

    /** Side of the mark in pixels. */
    static final int SIZE = 9;
    private static final String KEY = "eluvia.ui.mark.bad";

    private Marks() {
    }

    /** The bad-value mark of a display. */
    public static Image bad(Display display) {
        Object existing = display.getData(KEY);
        if (existing instanceof Image i && !i.isDisposed()) {
            return i;
        }
        ImageData data = new ImageData(SIZE, SIZE, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        byte[] alpha = new byte[SIZE * SIZE];
        double c = (SIZE - 1) / 2.0;
        for (int y = 0; y < SIZE; y++) {
            for (int x = 0; x < SIZE; x++) {
                double r = Math.hypot(x - c, y - c);
                boolean inside = r <= c + 0.3;
                boolean bar = x == (int) c && (y >= 2 && y <= SIZE - 4 || y == SIZE - 2);
                int rgb = bar ? 0xFFFFFF : 0xB4462D;
                data.setPixel(x, y, rgb);
                alpha[y * SIZE + x] = (byte) (inside ? 255 : 0);
            }
        }
        data.alphaData = alpha;
        Image image = new Image(display, data);
        display.setData(KEY, image);
        display.disposeExec(image::dispose);
        return image;
    }
}
