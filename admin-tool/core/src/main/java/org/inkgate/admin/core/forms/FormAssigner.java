package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;

/**
 * Assigns candidates to forms, stratified by proficiency level, seeded and reproducible.
 *
 * <p>Within each level the candidates are shuffled with the seed, every form gets
 * {@code n / forms} of them, and the remaining few are given one by one to distinct forms
 * chosen greedily: first so that within the level each task stays under every condition
 * equally often (at most one apart), then so that form counts overall stay at most one apart,
 * then so that task-by-condition counts overall do; ties go to the seeded random order. With a
 * level size that is a multiple of the number of forms the counts are exact.
 */
public final class FormAssigner {

    /** A candidate to place: number and the stratum (proficiency level) to balance within. */
    public record Candidate(String candidateNumber, String level) {
    }

    private FormAssigner() {
    }

    public static Assignment assign(List<Candidate> candidates, List<FormSpec> forms, long seed) {
        if (forms.isEmpty()) {
            throw new IllegalArgumentException("there are no forms to assign");
        }
        SplittableRandom random = new SplittableRandom(seed);
        Map<String, List<Candidate>> byLevel = new TreeMap<>();
        candidates.stream().sorted(Comparator.comparing(Candidate::candidateNumber))
                .forEach(c -> byLevel.computeIfAbsent(c.level(), k -> new ArrayList<>()).add(c));
        int[] overallForms = new int[forms.size()];
        Map<String, Integer> overallCells = new HashMap<>();
        List<Assignment.Row> rows = new ArrayList<>();
        for (Map.Entry<String, List<Candidate>> level : byLevel.entrySet()) {
            List<Candidate> members = new ArrayList<>(level.getValue());
            java.util.Collections.shuffle(members, new Random(random.nextLong()));
            int full = members.size() / forms.size();
            List<Integer> picks = new ArrayList<>();
            for (int f = 0; f < forms.size(); f++) {
                for (int i = 0; i < full; i++) {
                    picks.add(f);
                }
            }
            Map<String, Integer> levelCells = new HashMap<>();
            picks.forEach(f -> add(levelCells, forms.get(f)));
            picks.addAll(leftovers(members.size() - picks.size(), forms, levelCells, overallForms, overallCells, random));
            java.util.Collections.shuffle(picks, new Random(random.nextLong()));
            for (int i = 0; i < members.size(); i++) {
                int f = picks.get(i);
                overallForms[f]++;
                add(overallCells, forms.get(f));
                rows.add(new Assignment.Row(members.get(i).candidateNumber(), level.getKey(), forms.get(f).id()));
            }
        }
        rows.sort(Comparator.comparing(Assignment.Row::candidateNumber));
        return new Assignment(seed, rows);
    }

    private static List<Integer> leftovers(int count, List<FormSpec> forms, Map<String, Integer> levelCells,
            int[] overallForms, Map<String, Integer> overallCells, SplittableRandom random) {
        List<Integer> order = new ArrayList<>();
        for (int f = 0; f < forms.size(); f++) {
            order.add(f);
        }
        java.util.Collections.shuffle(order, new Random(random.nextLong()));
        Map<String, Integer> level = new HashMap<>(levelCells);
        int[] overall = overallForms.clone();
        Map<String, Integer> cells = new HashMap<>(overallCells);
        List<Integer> chosen = new ArrayList<>();
        for (int n = 0; n < count; n++) {
            int best = -1;
            long bestScore = Long.MAX_VALUE;
            for (int f : order) {
                if (chosen.contains(f)) {
                    continue;
                }
                Map<String, Integer> l = new HashMap<>(level);
                add(l, forms.get(f));
                int[] o = overall.clone();
                o[f]++;
                Map<String, Integer> c = new HashMap<>(cells);
                add(c, forms.get(f));
                long score = spread(l, forms) * 1_000_000L + spread(o) * 1_000L + spread(c, forms);
                if (score < bestScore) {
                    bestScore = score;
                    best = f;
                }
            }
            chosen.add(best);
            add(level, forms.get(best));
            overall[best]++;
            add(cells, forms.get(best));
        }
        return chosen;
    }

    private static void add(Map<String, Integer> cells, FormSpec form) {
        for (FormSlot slot : form.slots()) {
            cells.merge(slot.taskId() + "\u0000" + slot.conditionId(), 1, Integer::sum);
        }
    }

    /** Largest gap, over tasks, between the most and least frequent condition of that task. */
    static int spread(Map<String, Integer> cells, List<FormSpec> forms) {
        Map<String, List<String>> conditionsByTask = new TreeMap<>();
        for (FormSpec form : forms) {
            for (FormSlot slot : form.slots()) {
                List<String> cs = conditionsByTask.computeIfAbsent(slot.taskId(), k -> new ArrayList<>());
                if (!cs.contains(slot.conditionId())) {
                    cs.add(slot.conditionId());
                }
            }
        }
        int worst = 0;
        for (var e : conditionsByTask.entrySet()) {
            int min = Integer.MAX_VALUE;
            int max = 0;
            for (String condition : e.getValue()) {
                int n = cells.getOrDefault(e.getKey() + "\u0000" + condition, 0);
                min = Math.min(min, n);
                max = Math.max(max, n);
            }
            worst = Math.max(worst, max - min);
        }
        return worst;
    }

    private static int spread(int[] counts) {
        int min = Integer.MAX_VALUE;
        int max = 0;
        for (int n : counts) {
            min = Math.min(min, n);
            max = Math.max(max, n);
        }
        return max - min;
    }
}
