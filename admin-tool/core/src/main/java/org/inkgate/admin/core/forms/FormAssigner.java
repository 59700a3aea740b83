package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.inkgate.format.bundle.FormSpec;

/**
 * Assigns candidates to forms, stratified by proficiency level, seeded and reproducible.
 *
 * <p>Within each level the candidates are shuffled with the seed and every form gets
 * {@code n / forms} of them; the few left over go one each to distinct forms, chosen by
 * {@link LeftoverSearch} so that three margins are as even as they can be within every level and
 * over the whole roster: for each task, the condition it is written under; the task written first;
 * the condition met first (ranked in that order, see {@link Imbalance}). What this guarantees:
 * <ul>
 * <li>within each level, form counts at most one apart;</li>
 * <li>for each task, its counts under the different conditions at most one apart, within each
 * level and overall (the earlier block construction reaches this and the search keeps nothing
 * worse);</li>
 * <li>no assignment with the two guarantees above has a first-task or first-condition count
 * further from even than the one chosen, in the cases checked exhaustively by the tests
 * (FormAssignerTest); for two tasks and two conditions (crossover, and the 2 x 2 Latin square with
 * rotated conditions) every count is within 1 of even within each level and overall, and exactly
 * even overall when the roster size is a multiple of 4.</li>
 * </ul>
 * Exactly even is not always possible: with two tasks and two conditions, a group of 4q + 2
 * candidates cannot have all three margins even (they would need 2q + 1.5 candidates on one form).
 * The achieved counts are in {@link AssignmentCounts}.
 */
public final class FormAssigner {

    /** A candidate to place: number and the stratum (proficiency level) to balance within. */
    public record Candidate(String candidateNumber, String level) {
    }

    private FormAssigner() {
    }

    public static Assignment assign(List<Candidate> candidates, List<FormSpec> forms, int blockSize, long seed) {
        if (forms.isEmpty()) {
            throw new IllegalArgumentException("there are no forms to assign");
        }
        if (blockSize < 1 || forms.size() % blockSize != 0) {
            throw new IllegalArgumentException("block size " + blockSize + " does not divide " + forms.size() + " forms");
        }
        SplittableRandom random = new SplittableRandom(seed);
        Map<String, List<Candidate>> byLevel = new TreeMap<>();
        candidates.stream().sorted(Comparator.comparing(Candidate::candidateNumber))
                .forEach(c -> byLevel.computeIfAbsent(c.level(), k -> new ArrayList<>()).add(c));
        int[] leftovers = byLevel.values().stream().mapToInt(l -> l.size() % forms.size()).toArray();
        List<int[]> extra = new LeftoverSearch(forms.size(), blockSize, BalanceMargins.of(forms), random)
                .choose(leftovers);
        List<Assignment.Row> rows = new ArrayList<>();
        int index = 0;
        for (Map.Entry<String, List<Candidate>> level : byLevel.entrySet()) {
            List<Candidate> members = new ArrayList<>(level.getValue());
            Collections.shuffle(members, new Random(random.nextLong()));
            int n = members.size();
            List<Integer> picks = new ArrayList<>(n);
            for (int round = 0; round < n / forms.size(); round++) {
                for (int f = 0; f < forms.size(); f++) {
                    picks.add(f);
                }
            }
            for (int f : extra.get(index++)) {
                picks.add(f);
            }
            Collections.shuffle(picks, new Random(random.nextLong()));
            for (int i = 0; i < n; i++) {
                rows.add(new Assignment.Row(members.get(i).candidateNumber(), level.getKey(), forms.get(picks.get(i)).id()));
            }
        }
        rows.sort(Comparator.comparing(Assignment.Row::candidateNumber));
        return new Assignment(seed, rows);
    }
}
