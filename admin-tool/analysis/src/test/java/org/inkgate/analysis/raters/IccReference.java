package org.inkgate.analysis.raters;

/**
 * ICC confidence bounds for the Shrout-Fleiss (1979) data from R 4.2.2 psych 2.2.9
 * {@code ICC(..., alpha = 0.05)}: produced by src/test/resources/reference/r_reference.R, output
 * in r_reference.txt. Order: ICC1, ICC2, ICC3, ICC1k, ICC2k, ICC3k; {lower, upper}.
 */
final class IccReference {

    static final double[][] BOUNDS = {
        {-0.132932324874751, 0.722560062328121},
        {0.018786513374712, 0.761084369648953},
        {0.342464765033925, 0.94585825995536},
        {-0.884442155238119, 0.912415420340776},
        {0.0711368153025035, 0.927232040167722},
        {0.675674713816305, 0.985891678169062}};

    private IccReference() {
    }
}
