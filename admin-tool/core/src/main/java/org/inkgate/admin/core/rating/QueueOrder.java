package org.inkgate.admin.core.rating;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;

/**
 * A rater's working order: one block per task (blocks in random order), inside a block a random
 * order in which no candidate's response directly follows another of the same candidate, across
 * block boundaries too (common practice in writing assessment against the halo effect: a rater's
 * impression of one response colouring the next by the same writer).
 */
final class QueueOrder {

    private QueueOrder() {
    }

    static List<RatingAssigner.Response> arrange(List<RatingAssigner.Response> items, Random rng, String rater,
            List<String> warnings) {
        Map<String, List<RatingAssigner.Response>> byTask = new TreeMap<>();
        for (RatingAssigner.Response r : items) {
            byTask.computeIfAbsent(r.taskId(), t -> new ArrayList<>()).add(r);
        }
        List<String> tasks = new ArrayList<>(byTask.keySet());
        Collections.shuffle(tasks, rng);
        List<RatingAssigner.Response> out = new ArrayList<>(items.size());
        String previous = null;
        for (String task : tasks) {
            List<RatingAssigner.Response> block = new ArrayList<>(byTask.get(task));
            block.sort(Comparator.comparing(RatingAssigner.Response::candidate)
                    .thenComparingLong(RatingAssigner.Response::sittingId));
            previous = arrangeBlock(block, previous, rng, out);
        }
        for (int i = 1; i < out.size(); i++) {
            if (out.get(i).candidate().equals(out.get(i - 1).candidate())) {
                warnings.add("rater " + rater + " gets two responses of one candidate in a row at positions " + i
                        + " and " + (i + 1) + ": that candidate has several responses to one task (see the conflicts"
                        + " in the collect report) and the queue could not separate them");
            }
        }
        return out;
    }

    /**
     * Random order avoiding a repeat of the previous candidate. When one candidate holds more than
     * half of what is left (only possible with duplicate responses) it is placed first so the rest
     * can still separate its items.
     */
    private static String arrangeBlock(List<RatingAssigner.Response> block, String previous, Random rng,
            List<RatingAssigner.Response> out) {
        Map<String, Integer> count = new HashMap<>();
        block.forEach(r -> count.merge(r.candidate(), 1, Integer::sum));
        List<RatingAssigner.Response> left = new ArrayList<>(block);
        // counts only fall, so no candidate can hold more than half of what is left while 2 x max <= remaining
        int maxCount = count.values().stream().mapToInt(Integer::intValue).max().orElse(0);
        while (!left.isEmpty()) {
            int remaining = left.size();
            String forced = null;
            for (Map.Entry<String, Integer> e : maxCount * 2 > remaining ? new TreeMap<>(count).entrySet()
                    : Map.<String, Integer>of().entrySet()) {
                if (e.getValue() * 2 > remaining && !e.getKey().equals(previous)) {
                    forced = e.getKey();
                }
            }
            List<Integer> allowed = new ArrayList<>();
            for (int i = 0; i < left.size(); i++) {
                String c = left.get(i).candidate();
                if (forced != null ? c.equals(forced) : !c.equals(previous)) {
                    allowed.add(i);
                }
            }
            int at = allowed.isEmpty() ? rng.nextInt(left.size()) : allowed.get(rng.nextInt(allowed.size()));
            RatingAssigner.Response r = left.remove(at);
            count.merge(r.candidate(), -1, Integer::sum);
            out.add(r);
            previous = r.candidate();
        }
        return previous;
    }
}
