package org.inkgate.admin.gui.ratingadmin;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Scores typed as {@code criterion=score, criterion=score}, as the command line's {@code --score}
 * and {@code --agreed} take them; shared by resolution entries and control scripts.
 */
final class CriterionScores {

    static final String HOW = "give the scores as CRITERION=WHOLE-NUMBER once per criterion, separated by commas,"
            + " e.g. content=5, language=6";

    private CriterionScores() {
    }

    /** The scores in typed order, or an {@link IllegalArgumentException} naming the bad pair and {@link #HOW}. */
    static Map<String, Integer> parse(String typed) {
        Map<String, Integer> parsed = new LinkedHashMap<>();
        for (String pair : (typed == null ? "" : typed).split(",")) {
            String[] kv = pair.split("=", 2);
            try {
                if (kv.length != 2 || kv[0].isBlank() || parsed.put(kv[0].strip(), Integer.parseInt(kv[1].strip())) != null) {
                    throw new NumberFormatException();
                }
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("\"" + pair.strip() + "\": " + HOW + ".", e);
            }
        }
        return parsed;
    }
}
