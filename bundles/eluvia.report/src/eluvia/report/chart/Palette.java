package eluvia.report.chart;

import java.awt.Color;
import java.util.List;

/**
 * The colours of Eluvia's charts and documents: dark blue-grey ink on white, a deep teal accent,
 * warm ochre for cautions, muted series colours that stay apart in print, a sequential scale
 * from pale sand to dark wine for concentrations, and a scale split at a level (the cleanup level):
 * cool near-white to light slate below it, golden sand to dark wine above it, so that the step at
 * the level shows in hue as well as in lightness. The HTML style sheet and the PDF use the same
 * colours through {@link #hex(Color)}.
 */
public final class Palette {

    /** Text, axes and outlines. */
    public static final Color INK = new Color(0x24, 0x31, 0x38);
    /** Secondary text: tick labels, notes, running header. */
    public static final Color MUTED = new Color(0x5E, 0x6A, 0x72);
    /** Grid lines and table rules. */
    public static final Color RULE = new Color(0xD9, 0xDF, 0xE3);
    /** Faint fill: alternate table rows. */
    public static final Color TINT = new Color(0xF4, 0xF6, 0xF7);
    /** Headings and the first series. */
    public static final Color ACCENT = new Color(0x1B, 0x66, 0x6E);
    /** Fill behind key figures and table headers. */
    public static final Color ACCENT_TINT = new Color(0xE6, 0xF0, 0xF0);
    /** The edge of a caution box. */
    public static final Color CAUTION = new Color(0xB4, 0x7A, 0x22);
    /** The fill of a caution box. */
    public static final Color CAUTION_TINT = new Color(0xFB, 0xF4, 0xE6);

    /** Series colours in order; they repeat after the last. */
    public static final List<Color> SERIES = List.of(ACCENT, new Color(0xC2, 0x85, 0x2A), new Color(0x4A, 0x66, 0x9A),
            new Color(0x9E, 0x4B, 0x3A), new Color(0x66, 0x86, 0x4E), new Color(0x77, 0x59, 0x86),
            new Color(0x84, 0x80, 0x74));

    private static final Color[] SEQUENTIAL = { new Color(0xF5, 0xEF, 0xDA), new Color(0xE9, 0xC8, 0x7C),
            new Color(0xD4, 0x8C, 0x3E), new Color(0xA6, 0x4E, 0x31), new Color(0x58, 0x22, 0x33) };

    /** Below a level: near white far below it, light slate just below it. */
    private static final Color[] BELOW_LEVEL = { new Color(0xF3, 0xF5, 0xF5), new Color(0xC4, 0xD2, 0xD9) };

    /** Above a level: golden sand just above it to dark wine. */
    private static final Color[] ABOVE_LEVEL = { new Color(0xE9, 0xC9, 0x82), new Color(0xD3, 0x8D, 0x44),
            new Color(0xA6, 0x50, 0x34), new Color(0x58, 0x22, 0x33) };

    /** Outlines of zones grown from another (e.g. by dispersion): a deep slate blue that stays apart from the warm cells. */
    public static final Color GROWN = new Color(0x2F, 0x4F, 0x8A);

    private Palette() {
    }

    /** The colour of series {@code index} (0-based), repeating after the last. */
    public static Color series(int index) {
        return SERIES.get(Math.floorMod(index, SERIES.size()));
    }

    /**
     * A colour of the sequential scale: pale at {@code fraction} 0, dark at 1 (values outside are
     * clamped), interpolated linearly in RGB between five stops.
     *
     * @param fraction position on the scale, dimensionless
     */
    public static Color sequential(double fraction) {
        return interpolate(SEQUENTIAL, fraction);
    }

    /**
     * A colour of the part of the split scale below the level: near white at {@code fraction} 0
     * (far below), light slate at 1 (just below); clamped, linear in RGB.
     *
     * @param fraction position below the level, dimensionless
     */
    public static Color belowLevel(double fraction) {
        return interpolate(BELOW_LEVEL, fraction);
    }

    /**
     * A colour of the part of the split scale above the level: golden sand at {@code fraction} 0
     * (just above), dark wine at 1; clamped, linear in RGB between four stops.
     *
     * @param fraction position above the level, dimensionless
     */
    public static Color aboveLevel(double fraction) {
        return interpolate(ABOVE_LEVEL, fraction);
    }

    private static Color interpolate(Color[] stops, double fraction) {
        double f = Double.isNaN(fraction) ? 0 : Math.min(1, Math.max(0, fraction));
        double pos = f * (stops.length - 1);
        int i = Math.min((int) Math.floor(pos), stops.length - 2);
        double t = pos - i;
        Color a = stops[i];
        Color b = stops[i + 1];
        return new Color(mix(a.getRed(), b.getRed(), t), mix(a.getGreen(), b.getGreen(), t), mix(a.getBlue(), b.getBlue(), t));
    }

    /** The colour as CSS hex, e.g. "#1b666e". */
    public static String hex(Color c) {
        return String.format("#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }

    private static int mix(int a, int b, double t) {
        return (int) Math.round(a + (b - a) * t);
    }
}
