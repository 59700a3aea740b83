package org.inkgate.analysis.graphics;

import java.awt.Color;
import java.util.List;
import java.util.Locale;

/**
 * The report's one series palette: the charts' lines and bars (JFreeChart and the many-facet
 * charts alike) and the stylesheet's {@code --series-n} properties take their colours from here.
 * Chosen so that every colour reaches 4.5:1 contrast against the white page (WCAG 2.1, SC 1.4.3
 * and 1.4.11) and any two differ by at least 20 CIELAB units (CIE76); SeriesPaletteTest checks
 * both against R's colour conversion. Past the eighth series the colours repeat with a dashed
 * line, so every series stays distinct.
 */
public final class SeriesPalette {

    private static final List<Color> COLOURS = List.of(new Color(0x0A66C2), new Color(0xC24E00),
            new Color(0x007A5A), new Color(0xA8388F), new Color(0x8A6A00), new Color(0x5A5A5A),
            new Color(0x6B4FBB), new Color(0x1F1F1F));

    private SeriesPalette() {
    }

    /** How many distinct colours there are before they repeat dashed. */
    public static int size() {
        return COLOURS.size();
    }

    /** The colour of series i (0-based). */
    public static Color colour(int i) {
        return COLOURS.get(Math.floorMod(i, COLOURS.size()));
    }

    /** Whether series i is drawn dashed (from the ninth series on, where the colours repeat). */
    public static boolean dashed(int i) {
        return i >= COLOURS.size();
    }

    /** The colour as CSS hex, e.g. "#0a66c2". */
    public static String hex(int i) {
        Color c = colour(i);
        return String.format(Locale.ROOT, "#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }
}
