package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;
import org.inkgate.analysis.graphics.SeriesPalette;

/** Colours and sizes shared by the charts: dark text, light grid, the report's series palette. */
final class Palette {
    static final Color TEXT = new Color(0x22, 0x22, 0x22);
    static final Color MUTED = new Color(0x66, 0x66, 0x66);
    static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    static final Color BAR = new Color(0x4C, 0x72, 0xB0);
    static final Color MARK = new Color(0xC4, 0x4E, 0x52);
    /** Points and whiskers of the Wright map. */
    static final Color INK = new Color(0x1D, 0x3F, 0x6E);
    static final double TITLE = 14;
    static final double LABEL = 11;
    static final double SMALL = 10;
    static final double TINY = 9;

    private Palette() {
    }

    /** Series colours come from the report's one palette (dashed past its size). */
    static Color series(int i) {
        return SeriesPalette.colour(i);
    }
}
