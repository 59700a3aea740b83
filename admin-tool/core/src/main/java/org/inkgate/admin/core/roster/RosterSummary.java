package org.inkgate.admin.core.roster;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * What a test owner checks in a roster before assigning forms: candidates per level, how many
 * have each accommodation, and which personal fields stay in the results store.
 *
 * @param candidates     candidates on the roster
 * @param perLevel       level to candidates, sorted by level
 * @param extraTime      candidates with extra time
 * @param largePrint     candidates with large print
 * @param highContrast   candidates with high contrast
 * @param personalFields the free columns (kept in the results store, never sent to raters)
 */
public record RosterSummary(int candidates, Map<String, Integer> perLevel, long extraTime, long largePrint,
        long highContrast, Set<String> personalFields) {

    /** Summarises a roster as read by {@link RosterReader}. */
    public static RosterSummary of(List<RosterCandidate> roster) {
        Map<String, Integer> levels = new TreeMap<>();
        roster.forEach(r -> levels.merge(r.level(), 1, Integer::sum));
        return new RosterSummary(roster.size(), levels,
                roster.stream().filter(r -> r.extraTimePercent() > 0).count(),
                roster.stream().filter(RosterCandidate::largePrint).count(),
                roster.stream().filter(RosterCandidate::highContrast).count(),
                roster.stream().findFirst().map(r -> (Set<String>) new java.util.TreeSet<>(r.personal().keySet()))
                        .orElse(Set.of()));
    }
}
