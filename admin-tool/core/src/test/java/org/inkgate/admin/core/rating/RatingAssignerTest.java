package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IntSummaryStatistics;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Properties of the rating assignment on generated cases (invented responses; no check value
 * comes from this data). Each property is checked by code written here, independent of the
 * assigner's own bookkeeping: the linking graph by breadth-first search, balance by counting.
 */
class RatingAssignerTest {

    /** {@code candidates} x {@code tasks} responses of invented candidates. */
    static List<RatingAssigner.Response> responses(int candidates, int tasks) {
        List<RatingAssigner.Response> out = new ArrayList<>();
        long sitting = 1;
        for (int c = 0; c < candidates; c++) {
            for (int t = 0; t < tasks; t++) {
                out.add(new RatingAssigner.Response(sitting, "task-" + (char) ('a' + t), String.format("C%04d", c)));
            }
            sitting++;
        }
        return out;
    }

    static List<RatingAssigner.RaterCapacity> raters(int n) {
        List<RatingAssigner.RaterCapacity> out = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            out.add(new RatingAssigner.RaterCapacity(String.format("R%02d", i), null));
        }
        return out;
    }

    private static Map<String, List<RatingAssigner.Placement>> queues(RatingAssigner.Plan plan) {
        Map<String, List<RatingAssigner.Placement>> q = new TreeMap<>();
        plan.placements().forEach(p -> q.computeIfAbsent(p.raterId(), r -> new ArrayList<>()).add(p));
        q.values().forEach(l -> l.sort((a, b) -> Integer.compare(a.queuePosition(), b.queuePosition())));
        return q;
    }

    /** Connectedness of the rater graph by breadth-first search over shared responses. */
    static boolean connectedByBfs(RatingAssigner.Plan plan) {
        Map<RatingAssigner.Response, List<String>> byResponse = new HashMap<>();
        plan.placements().forEach(p -> byResponse.computeIfAbsent(p.response(), r -> new ArrayList<>()).add(p.raterId()));
        Map<String, Set<String>> adj = new HashMap<>();
        for (List<String> rs : byResponse.values()) {
            for (String a : rs) {
                for (String b : rs) {
                    adj.computeIfAbsent(a, x -> new HashSet<>()).add(b);
                }
            }
        }
        if (adj.isEmpty()) {
            return true;
        }
        Deque<String> todo = new ArrayDeque<>(List.of(adj.keySet().iterator().next()));
        Set<String> seen = new HashSet<>(todo);
        while (!todo.isEmpty()) {
            for (String n : adj.get(todo.poll())) {
                if (seen.add(n)) {
                    todo.add(n);
                }
            }
        }
        return seen.size() == adj.size();
    }

    private static void assertProperties(List<RatingAssigner.Response> responses, RatingAssigner.Plan plan, int k,
            int tasks) {
        // every response exactly k different raters
        Map<RatingAssigner.Response, Set<String>> byResponse = new HashMap<>();
        plan.placements().forEach(p -> byResponse.computeIfAbsent(p.response(), r -> new HashSet<>()).add(p.raterId()));
        assertEquals(responses.size(), byResponse.size());
        byResponse.values().forEach(s -> assertEquals(k, s.size()));
        assertEquals(responses.size() * k, plan.placements().size(), "no rater twice on one response");
        for (List<RatingAssigner.Placement> q : queues(plan).values()) {
            for (int i = 0; i < q.size(); i++) {
                assertEquals(i + 1, q.get(i).queuePosition(), "positions run 1..n");
            }
            // no two responses of one candidate in a row (common practice: halo effect)
            for (int i = 1; i < q.size(); i++) {
                assertNotEquals(q.get(i - 1).response().candidate(), q.get(i).response().candidate(),
                        "same candidate adjacent in " + q.get(i).raterId() + " at " + i);
            }
            // grouped by task: the task changes at most tasks-1 times
            int changes = 0;
            for (int i = 1; i < q.size(); i++) {
                if (!q.get(i).response().taskId().equals(q.get(i - 1).response().taskId())) {
                    changes++;
                }
            }
            assertTrue(changes <= tasks - 1, "queue of " + q.get(0).raterId() + " changes task " + changes + " times");
        }
    }

    @Test
    void assign_500Responses7Raters2Tasks_balancedLinkedGroupedAndHaloSafe() throws Exception {
        List<RatingAssigner.Response> rs = responses(250, 2);
        RatingAssigner.Plan plan = RatingAssigner.assign(rs, raters(7), 2, 20261202L);
        assertProperties(rs, plan, 2, 2);
        IntSummaryStatistics w = plan.workload().values().stream().mapToInt(Integer::intValue).summaryStatistics();
        assertEquals(1000, w.getSum());
        assertTrue(w.getMax() - w.getMin() <= 1, "workloads 142-143: " + plan.workload());
        assertTrue(connectedByBfs(plan), "rater graph connected");
        assertTrue(plan.links().connected());
        // pairs rotate: with 7 raters there are 21 pairs and each should occur (500 responses spread over them)
        Set<String> pairs = new HashSet<>();
        Map<RatingAssigner.Response, List<String>> byResponse = new HashMap<>();
        plan.placements().forEach(p -> byResponse.computeIfAbsent(p.response(), r -> new ArrayList<>()).add(p.raterId()));
        byResponse.values().forEach(l -> pairs.add(l.stream().sorted().toList().toString()));
        assertEquals(21, pairs.size(), "every pair of 7 raters shares responses");
        assertTrue(plan.warnings().isEmpty(), plan.warnings().toString());
    }

    @Test
    void assign_sameSeedShuffledInput_samePlan_otherSeedOtherPlan() throws Exception {
        List<RatingAssigner.Response> rs = responses(120, 2);
        RatingAssigner.Plan a = RatingAssigner.assign(rs, raters(5), 2, 7L);
        List<RatingAssigner.Response> shuffled = new ArrayList<>(rs);
        Collections.shuffle(shuffled, new Random(99));
        List<RatingAssigner.RaterCapacity> ratersShuffled = new ArrayList<>(raters(5));
        Collections.reverse(ratersShuffled);
        RatingAssigner.Plan b = RatingAssigner.assign(shuffled, ratersShuffled, 2, 7L);
        assertEquals(new HashSet<>(a.placements()), new HashSet<>(b.placements()));
        RatingAssigner.Plan c = RatingAssigner.assign(rs, raters(5), 2, 8L);
        assertNotEquals(new HashSet<>(a.placements()), new HashSet<>(c.placements()));
    }

    @ParameterizedTest(name = "{0} candidates x {1} tasks, {2} raters, {3} per response")
    @CsvSource({"250, 2, 7, 1", "250, 2, 7, 3", "7, 1, 3, 2", "13, 3, 4, 3", "1, 1, 2, 2", "101, 2, 6, 2", "9, 2, 9, 2"})
    void assign_oddSizes_keepEveryProperty(int candidates, int tasks, int raters, int k) throws Exception {
        List<RatingAssigner.Response> rs = responses(candidates, tasks);
        RatingAssigner.Plan plan = RatingAssigner.assign(rs, raters(raters), k, candidates * 31L + k);
        assertProperties(rs, plan, k, tasks);
        IntSummaryStatistics w = plan.workload().values().stream().mapToInt(Integer::intValue).summaryStatistics();
        assertTrue(w.getMax() - w.getMin() <= 1, plan.workload().toString());
        if (k >= 2) {
            assertEquals(connectedByBfs(plan), plan.links().connected(), "the report agrees with a BFS");
            if ((long) candidates * tasks * (k - 1) >= raters) {
                assertTrue(plan.links().connected(), "enough shared ratings to link " + raters + " raters");
            }
        } else {
            assertFalse(plan.warnings().isEmpty(), "one rater per response: the unlinked design is warned about");
        }
    }

    @Test
    void assign_fewCandidatesManyTasks_noCandidateTwiceInARowAcrossTaskBlocks() throws Exception {
        // 3 candidates x 8 tasks, both raters get all 24: a random order would repeat a candidate at about one
        // block boundary in three; over 20 seeds that cannot go unnoticed
        for (long seed = 1; seed <= 20; seed++) {
            List<RatingAssigner.Response> rs = responses(3, 8);
            assertProperties(rs, RatingAssigner.assign(rs, raters(2), 2, seed), 2, 8);
        }
    }

    @Test
    void assign_duplicateResponsesOfOneCandidate_areSeparatedWithinTheTask() throws Exception {
        // two copies of C0000's response to one task (a conflict in the store): 5 responses in one block
        List<RatingAssigner.Response> rs = new ArrayList<>(responses(3, 1));
        rs.add(new RatingAssigner.Response(99, "task-a", "C0000"));
        rs.add(new RatingAssigner.Response(98, "task-a", "C0000"));
        for (long seed = 1; seed <= 20; seed++) {
            RatingAssigner.Plan plan = RatingAssigner.assign(rs, raters(2), 2, seed);
            assertProperties(rs, plan, 2, 1);
            assertTrue(plan.warnings().isEmpty(), plan.warnings().toString());
        }
    }

    @Test
    void assign_capacities_respectedAndTheRestBalanced() throws Exception {
        List<RatingAssigner.Response> rs = responses(250, 2);
        List<RatingAssigner.RaterCapacity> raters = new ArrayList<>(raters(7));
        raters.set(0, new RatingAssigner.RaterCapacity("R01", 40));
        raters.set(1, new RatingAssigner.RaterCapacity("R02", 0));
        raters.set(2, new RatingAssigner.RaterCapacity("R03", 500));
        RatingAssigner.Plan plan = RatingAssigner.assign(rs, raters, 2, 3L);
        assertProperties(rs, plan, 2, 2);
        assertEquals(40, plan.workload().get("R01"));
        assertEquals(0, plan.workload().get("R02"));
        // 1000 - 40 = 960 over the five others: 192 each
        for (String r : List.of("R03", "R04", "R05", "R06", "R07")) {
            assertEquals(192, plan.workload().get(r), r);
        }
        assertTrue(connectedByBfs(plan));
    }

    @Test
    void assign_capacitiesTooSmall_isRefusedSayingWhatIsShort() {
        List<RatingAssigner.RaterCapacity> raters = List.of(new RatingAssigner.RaterCapacity("R01", 10),
                new RatingAssigner.RaterCapacity("R02", 10), new RatingAssigner.RaterCapacity("R03", 5));
        RatingException e = assertThrows(RatingException.class, () -> RatingAssigner.assign(responses(13, 1), raters, 2, 1L));
        // 13 x 2 = 26 ratings needed; capacities 10 + 10 + 5 = 25
        assertTrue(e.getMessage().contains("need 26 ratings but the raters' capacities allow only 25"), e.getMessage());
        // a rater takes a response once: 3 raters with large capacities cannot give 4 ratings per response
        RatingException k4 = assertThrows(RatingException.class, () -> RatingAssigner.assign(responses(3, 1), raters(3), 4, 1L));
        assertTrue(k4.getMessage().contains("give 1, 2 or 3"), k4.getMessage());
        RatingException few = assertThrows(RatingException.class, () -> RatingAssigner.assign(responses(3, 1),
                List.of(new RatingAssigner.RaterCapacity("R01", null), new RatingAssigner.RaterCapacity("R02", 0)), 2, 1L));
        assertTrue(few.getMessage().contains("only 1 rater(s) can take responses"), few.getMessage());
    }

    @Test
    void assign_capacityForcesOneRaterOntoEveryResponse_stillExact() throws Exception {
        // 20 responses, 2 per response = 40; R01 and R02 capped at 20 and 15, R03 at 5: only one way to fill
        List<RatingAssigner.RaterCapacity> raters = List.of(new RatingAssigner.RaterCapacity("R01", 20),
                new RatingAssigner.RaterCapacity("R02", 15), new RatingAssigner.RaterCapacity("R03", 5));
        RatingAssigner.Plan plan = RatingAssigner.assign(responses(20, 1), raters, 2, 5L);
        assertEquals(Map.of("R01", 20, "R02", 15, "R03", 5), plan.workload());
        assertTrue(connectedByBfs(plan));
    }

    @Test
    void assign_laterRun_levelsTotalsIncludingEarlierWork() throws Exception {
        // R01 rated 30 earlier; 50 new responses x 2 = 100 ratings: totals level at 26 would need 130 - 30 = 100
        // from the other four (25 each) and none from R01 (worked by hand from the water-filling rule)
        RatingAssigner.Plan plan = RatingAssigner.assign(responses(50, 1), raters(5), Map.of("R01", 30), 2, 4L);
        assertEquals(Map.of("R01", 0, "R02", 25, "R03", 25, "R04", 25, "R05", 25), plan.workload());
        // R01 with 10 earlier: totals 110 + 10 = 120 over 5 = 22 each -> R01 gets 12, the others 22
        RatingAssigner.Plan two = RatingAssigner.assign(responses(50, 1), raters(5), Map.of("R01", 10), 2, 4L);
        assertEquals(Map.of("R01", 12, "R02", 22, "R03", 22, "R04", 22, "R05", 22), two.workload());
    }

    @Test
    void assign_tooFewResponsesToLinkSevenRaters_warnsAndReportsTheGroups() throws Exception {
        RatingAssigner.Plan plan = RatingAssigner.assign(responses(3, 1), raters(7), 2, 1L);
        assertFalse(plan.links().connected());
        assertFalse(connectedByBfs(plan));
        assertTrue(plan.warnings().stream().anyMatch(w -> w.contains("cannot be linked")), plan.warnings().toString());
    }
}
