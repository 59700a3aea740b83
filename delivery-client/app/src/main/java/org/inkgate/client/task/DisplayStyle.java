package org.inkgate.client.task;

import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.Locale;

/**
 * Turns a candidate's display accommodations into a small stylesheet for the workspace: type
 * size (QTI PNP text-appearance font-size) and line spacing. High contrast is a style class
 * (see workspace.css) because it changes colours, not sizes.
 */
final class DisplayStyle {

    /** The workspace's normal type size in px (readable body text, common practice 16 px). */
    static final double BASE_FONT_PX = 16;
    /** The theme's own extra line spacing, as a share of the font size, when none is asked for. */
    static final double THEME_LINE_SPACING = 0.45;

    private DisplayStyle() {
    }

    /** The font size in px for this scale. */
    static double fontPx(DisplaySettings d) {
        return BASE_FONT_PX * (d.fontScale() > 0 ? d.fontScale() : 1.0);
    }

    /** A data-URL stylesheet for these settings (JavaFX reads data: URLs as stylesheets). */
    static String stylesheet(DisplaySettings d) {
        double font = fontPx(d);
        double spacing = font * (d.lineSpacing() > 0 ? d.lineSpacing() : THEME_LINE_SPACING);
        String css = String.format(Locale.ROOT, """
                .task-workspace { -fx-font-size: %.1fpx; }
                .task-workspace .answer-area .paragraph-text { -fx-line-spacing: %.1fpx; }
                .task-workspace .prompt-view .label { -fx-line-spacing: %.1fpx; }
                """, font, spacing, spacing / 2);
        return "data:text/css;base64," + Base64.getEncoder().encodeToString(css.getBytes(StandardCharsets.UTF_8));
    }
}
