package org.inkgate.admin.core.roster;

import java.util.Map;

/**
 * One row of the roster as imported.
 *
 * @param candidateNumber   the number the candidate signs in with
 * @param level             proficiency level, the stratum forms are balanced within
 * @param firstLanguage     first language as written in the roster, or empty
 * @param extraTimePercent  extra time as a percentage of each limit (0-400)
 * @param largePrint        larger type
 * @param highContrast      high-contrast theme
 * @param personal          every other column (names, emails...): stays in the results store,
 *                          never goes into bundles or rater-facing exports
 */
public record RosterCandidate(String candidateNumber, String level, String firstLanguage, int extraTimePercent,
        boolean largePrint, boolean highContrast, Map<String, String> personal) {

    public RosterCandidate {
        personal = Map.copyOf(personal);
    }
}
