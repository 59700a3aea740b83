package org.inkgate.client.task;

/**
 * How text is shown to one candidate, from the roster's accommodations (QTI PNP terms:
 * magnification, high contrast; see the admin tool's PNP export).
 *
 * @param fontScale    1.0 for normal type; large print uses more
 * @param lineSpacing  extra space between lines, as a multiple of the font size (0 = the theme's)
 * @param highContrast the high-contrast theme
 */
public record DisplaySettings(double fontScale, double lineSpacing, boolean highContrast) {

    public static final double LARGE_PRINT_SCALE = org.inkgate.format.bundle.RosterEntry.LARGE_PRINT_SCALE;

    /** Normal type, normal spacing, normal theme. */
    public static DisplaySettings standard() {
        return new DisplaySettings(1.0, 0.0, false);
    }
}
