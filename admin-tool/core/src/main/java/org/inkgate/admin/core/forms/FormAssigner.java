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
 * <p>The forms come in blocks ({@link FormDesigner#blockSize}): consecutive forms that together
 * give every task every condition once, and within which consecutive forms give each task the
 * next condition. Within each level the candidates are shuffled with the seed and every form gets
 * {@code n / forms} of them; of the few left over, whole blocks go to blocks taken in turn, and
 * the rest to consecutive forms of one block chosen by the seed, continuing across levels where
 * the previous level stopped. So, for each task, the counts under the different conditions are
 * equal when every level's size is a multiple of the number of forms, and at most one apart
 * otherwise, both within each level and overall; form counts are at most one apart within each
 * level. Overall form counts can differ by more (the leftovers of all levels meet in one block);
 * the task-by-condition balance is what the design exists for.
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
        int blocks = forms.size() / blockSize;
        int partialBlock = random.nextInt(blocks);
        int shift = random.nextInt(blockSize);
        List<Integer> others = new ArrayList<>();
        for (int b = 0; b < blocks; b++) {
            if (b != partialBlock) {
                others.add(b);
            }
        }
        Collections.shuffle(others, new Random(random.nextLong()));
        int nextOther = 0;

        Map<String, List<Candidate>> byLevel = new TreeMap<>();
        candidates.stream().sorted(Comparator.comparing(Candidate::candidateNumber))
                .forEach(c -> byLevel.computeIfAbsent(c.level(), k -> new ArrayList<>()).add(c));
        List<Assignment.Row> rows = new ArrayList<>();
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
            int left = n % forms.size();
            for (int b = 0; b < left / blockSize; b++) {
                int block = others.get(nextOther++ % others.size());
                for (int s = 0; s < blockSize; s++) {
                    picks.add(block * blockSize + s);
                }
            }
            for (int i = 0; i < left % blockSize; i++) {
                picks.add(partialBlock * blockSize + shift);
                shift = (shift + 1) % blockSize;
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
