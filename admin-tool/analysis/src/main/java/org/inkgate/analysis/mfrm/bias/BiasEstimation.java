package org.inkgate.analysis.mfrm.bias;

/** How the size of a bias/interaction combination is estimated; each names itself in the report. */
public enum BiasEstimation {
    /**
     * Every measure and threshold held at its main-effects estimate, one term per combination on its
     * own ratings (Linacre 1989). Fast; when both columns are modelled facets, their main effects
     * have already absorbed part of any interaction, so sizes understate it.
     */
    MAIN_EFFECTS_FIXED("fixed", "with the main effects held at their estimates"),
    /**
     * The combination's own term estimated jointly with every main effect and threshold, one refit of
     * the whole model per combination; the main effects no longer absorb that combination's effect.
     */
    JOINT("joint", "jointly with the main effects (one refit of the model per combination)");

    private final String option;
    private final String description;

    BiasEstimation(String option, String description) {
        this.option = option;
        this.description = description;
    }

    /** The value of the command line option. */
    public String option() {
        return option;
    }

    /** How the sizes were estimated, in words for the report. */
    public String description() {
        return description;
    }

    /** The estimation named by a command line value. */
    public static BiasEstimation ofOption(String value) {
        for (BiasEstimation b : values()) {
            if (b.option.equals(value)) {
                return b;
            }
        }
        throw new IllegalArgumentException("'" + value + "' is not a bias estimation; use fixed or joint");
    }
}
