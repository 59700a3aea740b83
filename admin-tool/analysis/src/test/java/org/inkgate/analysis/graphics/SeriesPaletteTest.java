package org.inkgate.analysis.graphics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * The one series palette: distinct colours, readable on the white page. CIELAB values are R's
 * grDevices::convertColor (reference/palette/palette-lab.R, R 4.2.2 from Debian); contrast is the
 * WCAG 2.1 relative-luminance ratio (W3C, "contrast ratio" and "relative luminance" definitions).
 */
class SeriesPaletteTest {
    /** Least CIE76 colour difference between any two series; about 2.3 is a just-noticeable difference (Sharma 2003), 20 is common practice for categorical palettes. */
    private static final double MIN_DELTA_E = 20;

    @Test
    void palette_everyPairIsDistinct_byRsCielab() {
        List<Map<String, String>> lab = ReferenceData.rows("palette/palette-lab.csv");
        assertEquals(SeriesPalette.size(), lab.size(), "the R script lists the palette as it is");
        for (int i = 0; i < lab.size(); i++) {
            assertEquals("#" + lab.get(i).get("hex").toLowerCase(java.util.Locale.ROOT), SeriesPalette.hex(i),
                    "rerun palette-lab.R after changing the palette");
        }
        for (int i = 0; i < lab.size(); i++) {
            for (int j = i + 1; j < lab.size(); j++) {
                double d = Math.sqrt(sq(lab, i, j, "L") + sq(lab, i, j, "a") + sq(lab, i, j, "b"));
                assertTrue(d >= MIN_DELTA_E, SeriesPalette.hex(i) + " and " + SeriesPalette.hex(j) + ": delta E " + d);
            }
        }
    }

    @Test
    void palette_everyColourReaches4point5To1OnWhite() {
        for (int i = 0; i < SeriesPalette.size(); i++) {
            double ratio = 1.05 / (luminance(SeriesPalette.colour(i)) + 0.05);
            assertTrue(ratio >= 4.5, SeriesPalette.hex(i) + ": contrast " + ratio);
        }
    }

    @Test
    void series_pastThePalette_repeatDashedSoEverySeriesIsDistinct() {
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < 2 * SeriesPalette.size(); i++) {
            assertTrue(seen.add(SeriesPalette.hex(i) + SeriesPalette.dashed(i)), "series " + i);
        }
        assertNotEquals(SeriesPalette.dashed(0), SeriesPalette.dashed(SeriesPalette.size()));
    }

    private static double sq(List<Map<String, String>> lab, int i, int j, String k) {
        double d = Double.parseDouble(lab.get(i).get(k)) - Double.parseDouble(lab.get(j).get(k));
        return d * d;
    }

    // WCAG 2.1 relative luminance of an sRGB colour
    private static double luminance(Color c) {
        return 0.2126 * channel(c.getRed()) + 0.7152 * channel(c.getGreen()) + 0.0722 * channel(c.getBlue());
    }

    private static double channel(int v) {
        double s = v / 255.0;
        return s <= 0.04045 ? s / 12.92 : Math.pow((s + 0.055) / 1.055, 2.4);
    }
}
