package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The desk's colours, read from its shipped stylesheet, against WCAG 2.2: 1.4.3 Contrast
 * (Minimum), 4.5:1 for text, and 1.4.11 Non-text Contrast, 3:1 for the focus ring and the band
 * marker. The contrast ratio and relative luminance are computed as WCAG 2.2 defines them (its
 * "Definitions" section: (L1 + 0.05) / (L2 + 0.05), sRGB channels linearised with the 0.03928
 * threshold). Limits: declared colours only; JavaFX derives button shading from -fx-base, which
 * this does not see.
 */
class DeskContrastTest {

    @Test
    void contrastRatio_wcagDefinitionEndpoints() {
        // from the definition itself: black on white (1.05 / 0.05) and a colour on itself
        assertEquals(21.0, ratio("#000000", "#ffffff"), 1e-9);
        assertEquals(1.0, ratio("#5a5f66", "#5a5f66"), 1e-9);
        // a value often quoted for mid grey #777777 on white, 4.48:1 (from memory)
        assertEquals(4.48, ratio("#777777", "#ffffff"), 0.01);
    }

    @Test
    void deskColours_textPairsReach4point5AndMarksReach3() throws Exception {
        Map<String, String> c = colours();
        String[][] text = {
            {"-dk-ink", "-dk-paper"}, {"-dk-ink", "-dk-card"}, {"-dk-muted", "-dk-paper"}, {"-dk-muted", "-dk-card"},
            {"-dk-accent", "-dk-card"}, {"-dk-card", "-dk-accent"}, {"-dk-ink", "-dk-accent-soft"},
            {"-dk-problem-ink", "-dk-problem-paper"}, {"-dk-problem-ink", "-dk-card"}, {"-dk-ink", "-dk-note-paper"},
            {"-dk-ink", "-dk-selection"},
        };
        for (String[] pair : text) {
            double r = ratio(c.get(pair[0]), c.get(pair[1]));
            assertTrue(r >= 4.5, pair[0] + " on " + pair[1] + ": " + r + ":1 is under 4.5:1 (WCAG 2.2, 1.4.3)");
        }
        String[][] marks = {
            {"-dk-focus", "-dk-paper"}, {"-dk-focus", "-dk-card"}, {"-dk-accent", "-dk-accent-soft"},
            {"-dk-problem-line", "-dk-problem-paper"}, {"-dk-note-line", "-dk-note-paper"},
        };
        for (String[] pair : marks) {
            double r = ratio(c.get(pair[0]), c.get(pair[1]));
            assertTrue(r >= 3.0, pair[0] + " against " + pair[1] + ": " + r + ":1 is under 3:1 (WCAG 2.2, 1.4.11)");
        }
    }

    /**
     * The admin window's colour variables (admin.css), the rating step's flagged-rater rows among
     * them (issue 15: the control-script monitor), against the same two limits.
     */
    @Test
    void adminWindowColours_textPairsReach4point5AndMarksReach3() throws Exception {
        Map<String, String> c = colours("/org/inkgate/admin/gui/admin.css", "-ig-", 10);
        String[][] text = {
            {"-ig-ink", "-ig-paper"}, {"-ig-muted", "-ig-paper"}, {"-ig-on-accent", "-ig-accent"},
            {"-ig-flag-ink", "-ig-flag-paper"}, {"-ig-on-accent", "-ig-flag-line"},
        };
        for (String[] pair : text) {
            double r = ratio(c.get(pair[0]), c.get(pair[1]));
            assertTrue(r >= 4.5, pair[0] + " on " + pair[1] + ": " + r + ":1 is under 4.5:1 (WCAG 2.2, 1.4.3)");
        }
        String[][] marks = {
            {"-ig-focus", "-ig-paper"}, {"-ig-flag-line", "-ig-flag-paper"}, {"-ig-accent", "-ig-paper"},
        };
        for (String[] pair : marks) {
            double r = ratio(c.get(pair[0]), c.get(pair[1]));
            assertTrue(r >= 3.0, pair[0] + " against " + pair[1] + ": " + r + ":1 is under 3:1 (WCAG 2.2, 1.4.11)");
        }
    }

    /** The -dk- colour variables of desk.css. */
    private static Map<String, String> colours() throws Exception {
        return colours(DeskWindow.STYLESHEET, "-dk-", 14);
    }

    /** The colour variables starting with {@code prefix} that a stylesheet declares, at least {@code atLeast}. */
    private static Map<String, String> colours(String stylesheet, String prefix, int atLeast) throws Exception {
        String css;
        try (InputStream in = DeskWindow.class.getResourceAsStream(stylesheet)) {
            css = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        Map<String, String> out = new HashMap<>();
        Matcher m = Pattern.compile("(" + Pattern.quote(prefix) + "[a-z-]+)\\s*:\\s*(#[0-9a-fA-F]{6})\\s*;")
                .matcher(css);
        while (m.find()) {
            out.put(m.group(1), m.group(2));
        }
        assertTrue(out.size() >= atLeast, "the colour variables of " + stylesheet + ": " + out);
        return out;
    }

    static double ratio(String a, String b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    /** WCAG 2.2 relative luminance of an sRGB colour "#rrggbb". */
    static double luminance(String hex) {
        double[] channel = new double[3];
        for (int i = 0; i < 3; i++) {
            double s = Integer.parseInt(hex.substring(1 + 2 * i, 3 + 2 * i), 16) / 255.0;
            channel[i] = s <= 0.03928 ? s / 12.92 : Math.pow((s + 0.055) / 1.055, 2.4);
        }
        return 0.2126 * channel[0] + 0.7152 * channel[1] + 0.0722 * channel[2];
    }
}
