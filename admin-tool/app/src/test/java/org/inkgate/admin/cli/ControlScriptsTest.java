package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.ControlMonitor;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.gui.rating.RatedStore;
import org.inkgate.admin.study.StoreRatings;
import org.inkgate.analysis.raters.Agreement;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Issue 15 §3, control scripts through the real {@code rate control} and {@code rate monitor}
 * commands over a store made by the real collect ({@link RatedStore}, six invented raters): the
 * control items are mixed into queues looking like any other item; a rater with a planted drift is
 * flagged; the final scores, the ratings export and the analysis input are the same with and
 * without the control ratings.
 */
class ControlScriptsTest {

    private static final List<String> RATERS = List.of("R01", "R02", "R03", "R04", "R05", "R06");
    private static final List<String> CONTROLS = List.of("H1001", "H1002", "H1003", "H1004", "H1005", "H1006");
    private static final String AGREED = "task-fulfilment=6,language-control=5";

    @TempDir
    Path dir;

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out, true));
        cli.setErr(new PrintWriter(err, true));
        return new Result(cli.execute(args), out.toString(), err.toString());
    }

    @Test
    void controls_mixedUnannounced_driftFlagged_andCandidatesScoresUntouched() throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        String db = rated.file().toString();
        Set<String> realIds = new HashSet<>();
        try (RatingStore s = rated.open()) {
            s.setRule(new DiscrepancyRule(null, 4, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
            for (String r : RATERS) {
                s.queue(r).forEach(q -> realIds.add(q.blindId()));
            }
        }
        for (String c : CONTROLS) {
            Result mark = run("rate", "control", "mark", "--store", db, "--candidate", c, "--task", "ferry-complaint",
                    "--agreed", AGREED, "--source", "invented standardisation meeting");
            assertEquals(0, mark.code(), mark.err());
        }
        Result bad = run("rate", "control", "mark", "--store", db, "--candidate", "H1001", "--task", "ferry-complaint",
                "--agreed", "task-fulfilment=12,language-control=5", "--source", "x");
        assertEquals(InkgateAdmin.PROBLEMS, bad.code());
        assertTrue(bad.err().contains("outside 1-9"), bad.err());
        Result mix = run("rate", "control", "mix", "--store", db, "--seed", "7");
        assertEquals(0, mix.code(), mix.err());
        // each response already has 2 of the 6 raters: 6 controls x 4 other raters
        assertTrue(mix.out().startsWith("24 control item(s) added"), mix.out());

        Map<String, List<String>> controlIdsByRater = new java.util.TreeMap<>();
        try (RatingStore s = rated.open()) {
            for (String r : RATERS) {
                List<RatingDesk.QueueItem> queue = s.queue(r);
                for (RatingDesk.QueueItem q : queue) {
                    assertTrue(BlindIds.looksLikeId(q.blindId()));
                    assertEquals(RatingDesk.Kind.RATING, q.kind(), "a control item is asked as any first rating");
                    if (!realIds.contains(q.blindId())) {
                        controlIdsByRater.computeIfAbsent(r, k -> new ArrayList<>()).add(q.blindId());
                    }
                }
            }
            assertEquals(24, controlIdsByRater.values().stream().mapToInt(List::size).sum());
            assertTrue(controlIdsByRater.get("R06").size() >= 2, "R06 meets enough controls to drift: " + controlIdsByRater);
            for (String r : controlIdsByRater.keySet()) {
                List<RatingDesk.QueueItem> queue = s.queue(r);
                int n = controlIdsByRater.get(r).size();
                assertFalse(queue.subList(queue.size() - n, queue.size()).stream().allMatch(q -> !realIds.contains(
                        q.blindId())), r + ": the controls are mixed in, not appended at the end");
            }
            // every real item rated: R01 and R02 score 5/5, the others 6/5, so some pairs differ without a flag
            for (String r : RATERS) {
                int tf = r.equals("R01") || r.equals("R02") ? 5 : 6;
                for (RatingDesk.QueueItem q : s.queue(r)) {
                    if (realIds.contains(q.blindId())) {
                        s.submit(r, q.blindId(), sheet(tf, 5));
                    }
                }
            }
        }
        Snapshot before = snapshot(rated);
        assertFalse(before.finals().isEmpty());

        // control ratings: everyone agrees exactly, except R06, who drifts: agreed on the earlier half, +3 on the later
        try (RatingStore s = rated.open()) {
            for (String r : RATERS) {
                List<String> ids = controlIdsByRater.get(r);
                for (int i = 0; i < ids.size(); i++) {
                    int shift = r.equals("R06") && i >= ids.size() - ids.size() / 2 ? 3 : 0;
                    s.submit(r, ids.get(i), sheet(6 + shift, 5 + shift));
                }
            }
        }
        assertEquals(before, snapshot(rated), "control ratings change no final score, rating export or analysis input");

        Result monitor = run("rate", "monitor", "--store", db);
        assertEquals(InkgateAdmin.ATTENTION, monitor.code(), monitor.out() + monitor.err());
        String r06 = monitor.out().lines().filter(l -> l.strip().startsWith("R06")).findFirst().orElseThrow();
        // R06 with n scripts, h = n / 2 of them +3 on both criteria: 2n pairs, exact = adjacent = (n - h) / n,
        // mean difference 3h / n, drift (later half minus earlier half) 3 - 0 (by hand from the planted scores)
        int n = controlIdsByRater.get("R06").size();
        int h = n / 2;
        String expected = String.format(java.util.Locale.ROOT, "  %-12s %7d %6d %6.2f %8.2f %+9.2f %7s", "R06", n, 2 * n,
                (n - h) / (double) n, (n - h) / (double) n, 3.0 * h / n, "+3.00");
        assertTrue(r06.startsWith(expected + "  FLAGGED: "), r06 + "\nexpected " + expected);
        assertTrue(r06.contains("drift +3.00 beyond +-1.00"), r06);
        String r01 = monitor.out().lines().filter(l -> l.strip().startsWith("R01")).findFirst().orElseThrow();
        assertTrue(r01.matches("\\s+R01\\s+\\d+\\s+\\d+\\s+1\\.00\\s+1\\.00\\s+\\+0\\.00\\s+(\\+0\\.00|-)"), r01);

        // the same exact and adjacent agreement as the analysis's own definition over the same pairs
        try (RatingStore s = rated.open()) {
            List<ControlScripts.ControlRating> all = s.controlRatings();
            List<ControlScripts.ControlRating> mine = all.stream().filter(c -> c.raterId().equals("R06")).toList();
            double[] a = mine.stream().flatMap(c -> c.agreed().keySet().stream().sorted().map(k -> c.scores().get(k)))
                    .mapToDouble(Integer::doubleValue).toArray();
            double[] b = mine.stream().flatMap(c -> c.agreed().keySet().stream().sorted().map(k -> c.agreed().get(k)))
                    .mapToDouble(Integer::doubleValue).toArray();
            Agreement reference = Agreement.of(a, b);
            ControlMonitor.RaterReport report = ControlMonitor.of(all, new ControlMonitor.Thresholds(null, null, null,
                    null)).stream().filter(r -> r.raterId().equals("R06")).findFirst().orElseThrow();
            assertEquals(reference.exact(), report.exact(), 1e-12);
            assertEquals(reference.adjacent(), report.adjacent(), 1e-12);
            assertFalse(report.flagged(), "no limits, no flags");
        }
    }

    /** What candidates' results are made of: final scores, the ratings export rows and the analysis input. */
    private record Snapshot(List<String> finals, List<String> ratings, List<String> analysis) {
    }

    private static Snapshot snapshot(RatedStore rated) throws Exception {
        List<String> finals = new ArrayList<>();
        List<String> ratings = new ArrayList<>();
        try (RatingStore s = rated.open()) {
            s.forEachFinalScore(f -> finals.add(f.candidate() + " " + f.task() + " " + f.criterion() + " " + f.score()
                    + " " + f.method()));
            s.forEachRating(r -> ratings.add(r.candidate() + " " + r.task() + " " + r.rater() + " " + r.criterion() + " "
                    + r.score() + " " + r.kind()));
        }
        List<String> analysis = StoreRatings.read(rated.file(), rated.exam().examId()).stream().map(Object::toString)
                .toList();
        return new Snapshot(finals, ratings, analysis);
    }

    private static RatingDesk.RatingSheet sheet(int taskFulfilment, int languageControl) {
        return new RatingDesk.RatingSheet(Map.of("task-fulfilment", taskFulfilment, "language-control", languageControl),
                "");
    }
}
