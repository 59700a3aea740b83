package org.inkgate.format.bundle;

/**
 * A candidate allowed to sit, with the accommodations the client must apply. No names: the
 * bundle travels on shared media.
 *
 * @param candidateNumber   the number the candidate signs in with
 * @param formId            the form assigned to the candidate
 * @param extraTimePercent  extra time as a percentage of each limit (QTI PNP additional-testing-time)
 * @param largePrint        larger type, {@link #LARGE_PRINT_SCALE} times the normal size (PNP magnification)
 * @param highContrast      high-contrast theme (PNP high-contrast)
 */
public record RosterEntry(String candidateNumber, String formId, int extraTimePercent, boolean largePrint,
        boolean highContrast) {

    /**
     * How much larger large print is: the client's font scale and the zoom amount of the PNP documents
     * the admin tool writes. Defined here because both sides read it.
     */
    public static final double LARGE_PRINT_SCALE = 1.5;
}
