package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;

/** Colours and sizes shared by the charts: dark text, light grid, a colour-blind-safe series set. */
final class Palette {
    static final Color TEXT = new Color(0x22, 0x22, 0x22);
    static final Color MUTED = new Color(0x66, 0x66, 0x66);
    static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    static final Color BAR = new Color(0x4C, 0x72, 0xB0);
    static final Color MARK = new Color(0xC4, 0x4E, 0x52);
    /** Points and whiskers of the Wright map. */
    static final Color INK = new Color(0x1D, 0x3F, 0x6E);
    /** Okabe & Ito (2008) colour-blind-safe set, repeated for more series. */
    private static final Color[] SERIES = {
        new Color(0x00, 0x72, 0xB2), new Color(0xE6, 0x9F, 0x00), new Color(0x00, 0x9E, 0x73),
        new Color(0xCC, 0x79, 0xA7), new Color(0x56, 0xB4, 0xE9), new Color(0xD5, 0x5E, 0x00),
        new Color(0xF0, 0xE4, 0x42), new Color(0x00, 0x00, 0x00)};
    static final double TITLE = 14;
    static final double LABEL = 11;
    static final double SMALL = 10;
    static final double TINY = 9;

    private Palette() {
    }

    static Color series(int i) {
        return SERIES[i % SERIES.length];
    }
}
