package org.inkgate.client.sitting.ui;

import java.util.Locale;
import java.util.Objects;
import javafx.scene.Parent;
import javafx.scene.Scene;
import org.inkgate.client.task.DisplaySettings;
import org.inkgate.format.bundle.RosterEntry;

/** The sitting window's stylesheet and the candidate's display accommodations applied to it. */
public final class SittingTheme {

    /** Base type size in the stylesheet; large print multiplies it. */
    public static final double BASE_FONT_PX = 17;
    static final String STYLESHEET = "sitting.css";
    static final String HIGH_CONTRAST = "high-contrast";

    private SittingTheme() {
    }

    /** Adds the sitting stylesheet to the scene. */
    public static void install(Scene scene) {
        scene.getStylesheets().add(Objects.requireNonNull(SittingTheme.class.getResource(STYLESHEET),
                "the sitting window's stylesheet is missing from the build").toExternalForm());
    }

    /** Applies type size and theme to the root. */
    public static void apply(Parent root, DisplaySettings display) {
        root.setStyle(String.format(Locale.ROOT, "-fx-font-size: %.1fpx;", BASE_FONT_PX * display.fontScale()));
        root.getStyleClass().remove(HIGH_CONTRAST);
        if (display.highContrast()) {
            root.getStyleClass().add(HIGH_CONTRAST);
        }
    }

    /**
     * The display settings a roster entry asks for (QTI PNP: text-appearance font size for large
     * print, high-contrast); no entry means standard display.
     */
    public static DisplaySettings of(RosterEntry entry) {
        if (entry == null) {
            return DisplaySettings.standard();
        }
        double scale = entry.largePrint() ? DisplaySettings.LARGE_PRINT_SCALE : 1.0;
        return new DisplaySettings(scale, entry.largePrint() ? 0.3 : 0.0, entry.highContrast());
    }
}
