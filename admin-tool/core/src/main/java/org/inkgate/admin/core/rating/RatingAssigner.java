package org.inkgate.admin.core.rating;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

/**
 * Hands each response to {@code k} raters (1-3): workloads as equal as capacities allow, rater
 * pairs rotated so the rater-linking graph is connected, each rater's queue grouped by task with
 * no two responses of one candidate in a row, order otherwise random from the seed. The same
 * inputs and seed give the same plan whatever order the inputs come in. Blind ids are not made
 * here: they must not be reproducible from the seed (see {@link BlindIds}).
 *
 * <p>Balance: targets come from water-filling (every rater gets the same share, capped by its
 * capacity; the rest spread one each at random), so uncapped workloads differ by at most one;
 * for a later run, the level is set on totals including earlier work.
 * The choice per response keeps the remaining quotas feasible: with M responses left, each needing
 * k distinct raters, quotas q can be met exactly when sum q = M k and every q_r is at most M (the
 * Gale-Ryser theorem for a 0-1 matrix with equal row sums; Ryser 1957), so a rater whose quota
 * equals M is taken first and the others are picked to meet the raters they have shared fewest
 * responses with. A design still split after that is joined by swapping raters between two
 * responses of different components, which keeps every workload.
 */
public final class RatingAssigner {

    /** One response to be rated: the sitting and task it belongs to and whose it is (never shown to raters). */
    public record Response(long sittingId, String taskId, String candidate) {
    }

    /** A rater and the most responses they may take (null: no limit). */
    public record RaterCapacity(String raterId, Integer capacity) {
        public RaterCapacity {
            if (capacity != null && capacity < 0) {
                throw new IllegalArgumentException("rater " + raterId + ": capacity " + capacity
                        + " is negative; give 0 or more, or leave it out for no limit");
            }
        }
    }

    /** One response in one rater's queue at a 1-based position. */
    public record Placement(Response response, String raterId, int queuePosition) {
    }

    /** The assignment, its workloads, how the raters are linked, and anything the test owner should know. */
    public record Plan(long seed, int ratersPerResponse, List<Placement> placements, Map<String, Integer> workload,
            RaterLinks.Report links, List<String> warnings) {
        public Plan {
            placements = List.copyOf(placements);
            workload = Map.copyOf(workload);
            warnings = List.copyOf(warnings);
        }
    }

    private RatingAssigner() {
    }

    /** Makes the plan, or refuses (saying why and what to change) when the raters cannot cover the responses. */
    public static Plan assign(List<Response> responses, List<RaterCapacity> raters, int k, long seed)
            throws RatingException {
        return assign(responses, raters, Map.of(), k, seed);
    }

    /**
     * As {@link #assign(List, List, int, long)} for responses that arrive after an earlier run:
     * {@code earlier} holds each rater's workload so far, and the water level is set on the totals,
     * so raters with less work so far take more of the new responses. Capacities are what is left.
     */
    public static Plan assign(List<Response> responses, List<RaterCapacity> raters, Map<String, Integer> earlier, int k,
            long seed) throws RatingException {
        if (k < 1 || k > 3) {
            throw new RatingException("raters per response is " + k + "; give 1, 2 or 3");
        }
        Set<String> ids = new HashSet<>();
        for (RaterCapacity r : raters) {
            if (!ids.add(r.raterId())) {
                throw new RatingException("rater " + r.raterId() + " is listed twice; list each rater once");
            }
        }
        int n = responses.size();
        if (n == 0) {
            throw new RatingException("there are no responses to assign; collect response packages first");
        }
        List<RaterCapacity> usable = raters.stream().filter(r -> r.capacity() == null || r.capacity() > 0)
                .sorted(Comparator.comparing(RaterCapacity::raterId)).toList();
        if (usable.size() < k) {
            throw new RatingException("each response needs " + k + " different raters but only " + usable.size()
                    + " rater(s) can take responses; add raters or lower the raters per response");
        }
        long room = 0;
        for (RaterCapacity r : usable) {
            room += r.capacity() == null ? n : Math.min(r.capacity(), n);
        }
        if (room < (long) n * k) {
            throw new RatingException(n + " responses x " + k + " raters need " + ((long) n * k)
                    + " ratings but the raters' capacities allow only " + room
                    + " (a rater takes each response at most once); raise capacities or add raters");
        }
        Random rng = new Random(seed);
        List<Response> order = new ArrayList<>(responses);
        order.sort(Comparator.comparing(Response::taskId).thenComparing(Response::candidate)
                .thenComparingLong(Response::sittingId));
        java.util.Collections.shuffle(order, rng);

        Map<String, Integer> quota = targets(usable, earlier, n, k, rng);
        List<String> names = usable.stream().map(RaterCapacity::raterId).toList();
        int[] left = new int[names.size()];
        for (int i = 0; i < left.length; i++) {
            left[i] = quota.get(names.get(i));
        }
        int[][] shared = new int[left.length][left.length];
        List<int[]> chosen = new ArrayList<>(n);
        for (int m = 0; m < n; m++) {
            int remainingResponses = n - m;
            int[] pick = pick(left, shared, k, remainingResponses, rng);
            for (int a : pick) {
                left[a]--;
                for (int b : pick) {
                    if (a != b) {
                        shared[a][b]++;
                    }
                }
            }
            chosen.add(pick);
        }
        List<String> warnings = new ArrayList<>();
        RaterLinks.Report links = link(chosen, names, k, rng, warnings);

        Map<String, List<Response>> byRater = new LinkedHashMap<>();
        names.forEach(r -> byRater.put(r, new ArrayList<>()));
        for (int m = 0; m < n; m++) {
            for (int a : chosen.get(m)) {
                byRater.get(names.get(a)).add(order.get(m));
            }
        }
        List<Placement> placements = new ArrayList<>(n * k);
        Map<String, Integer> workload = new LinkedHashMap<>();
        raters.stream().map(RaterCapacity::raterId).sorted().forEach(r -> workload.put(r, 0));
        for (Map.Entry<String, List<Response>> e : byRater.entrySet()) {
            List<Response> queue = QueueOrder.arrange(e.getValue(), rng, e.getKey(), warnings);
            for (int i = 0; i < queue.size(); i++) {
                placements.add(new Placement(queue.get(i), e.getKey(), i + 1));
            }
            workload.put(e.getKey(), queue.size());
        }
        return new Plan(seed, k, placements, workload, links, warnings);
    }

    /**
     * Water-filling on totals: the smallest level L at which the raters' room up to L (earlier work
     * counted, capped by capacity and by one rating per response) covers n k ratings; every rater
     * is filled to L - 1 and the rest are spread one each, at random, over raters with room at L.
     */
    static Map<String, Integer> targets(List<RaterCapacity> raters, Map<String, Integer> earlier, int n, int k,
            Random rng) {
        long need = (long) n * k;
        int level = 0;
        while (sumAt(raters, earlier, level, n) < need) {
            level++;
        }
        Map<String, Integer> out = new HashMap<>();
        List<String> atLevel = new ArrayList<>();
        long given = 0;
        for (RaterCapacity r : raters) {
            int below = roomAt(r, earlier, level - 1, n);
            out.put(r.raterId(), below);
            given += below;
            if (roomAt(r, earlier, level, n) > below) {
                atLevel.add(r.raterId());
            }
        }
        java.util.Collections.shuffle(atLevel, rng);
        for (int i = 0; given < need; i++, given++) {
            out.merge(atLevel.get(i), 1, Integer::sum);
        }
        return out;
    }

    /** New ratings a rater can take before its total reaches {@code level}. */
    private static int roomAt(RaterCapacity r, Map<String, Integer> earlier, int level, int n) {
        int before = earlier.getOrDefault(r.raterId(), 0);
        return Math.max(0, Math.min(cap(r, n), level - before));
    }

    private static long sumAt(List<RaterCapacity> raters, Map<String, Integer> earlier, int level, int n) {
        long s = 0;
        for (RaterCapacity r : raters) {
            s += roomAt(r, earlier, level, n);
        }
        return s;
    }

    private static int cap(RaterCapacity r, int n) {
        return r.capacity() == null ? n : Math.min(r.capacity(), n);
    }

    /** The raters for one response: forced ones first, then the least-shared, then the most remaining. */
    private static int[] pick(int[] left, int[][] shared, int k, int remainingResponses, Random rng) {
        List<Integer> picked = new ArrayList<>(k);
        for (int a = 0; a < left.length; a++) {
            if (left[a] == remainingResponses) {
                picked.add(a);
            }
        }
        if (picked.size() > k) {
            throw new IllegalStateException("quotas became infeasible; this is a bug in the assigner");
        }
        while (picked.size() < k) {
            int best = -1;
            long bestKey = Long.MAX_VALUE;
            for (int a = 0; a < left.length; a++) {
                if (left[a] == 0 || picked.contains(a)) {
                    continue;
                }
                int together = 0;
                for (int b : picked) {
                    together += shared[a][b];
                }
                // lexicographic: fewest shared responses, then most quota left, then a random tie-break
                long key = ((long) together << 40) + ((long) (1_000_000 - left[a]) << 16) + rng.nextInt(1 << 16);
                if (key < bestKey) {
                    bestKey = key;
                    best = a;
                }
            }
            if (best < 0) {
                throw new IllegalStateException("no rater with quota left; this is a bug in the assigner");
            }
            picked.add(best);
        }
        return picked.stream().mapToInt(Integer::intValue).sorted().toArray();
    }

    /** Joins components by swapping raters between responses; every workload stays as it was. */
    private static RaterLinks.Report link(List<int[]> chosen, List<String> names, int k,
            Random rng, List<String> warnings) {
        RaterLinks.Report report = RaterLinks.of(names, chosen);
        if (k < 2) {
            warnings.add("with one rater per response no two raters share a response, so raters cannot be linked"
                    + " through shared responses; a many-facet Rasch analysis can then compare raters only through"
                    + " candidates' other tasks, and its rater measures may not be comparable");
            return report;
        }
        for (int attempt = 0; !report.connected() && attempt < 20 * names.size(); attempt++) {
            int[] comp = report.componentOf();
            List<Integer> first = new ArrayList<>();
            List<Integer> other = new ArrayList<>();
            int c0 = comp[chosen.get(0)[0]];
            for (int m = 0; m < chosen.size(); m++) {
                (comp[chosen.get(m)[0]] == c0 ? first : other).add(m);
            }
            if (first.isEmpty() || other.isEmpty()) {
                break;
            }
            int x = first.get(rng.nextInt(first.size()));
            int y = other.get(rng.nextInt(other.size()));
            int[] sx = chosen.get(x);
            int[] sy = chosen.get(y);
            int i = rng.nextInt(sx.length);
            int j = rng.nextInt(sy.length);
            int a = sx[i];
            sx[i] = sy[j];
            sy[j] = a;
            java.util.Arrays.sort(sx);
            java.util.Arrays.sort(sy);
            report = RaterLinks.of(names, chosen);
        }
        if (!report.connected()) {
            warnings.add("the raters fall into " + report.components().size() + " groups that share no response "
                    + report.components() + "; with so few responses per rater the design cannot be linked."
                    + " Add responses per rater (fewer raters) or raise raters per response");
        }
        return report;
    }
}
