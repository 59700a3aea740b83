package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Many rating desks on one store at once, each with its own connection (its own store opened, as
 * each rater's machine opens it), and two assignment runs started together: every submission is
 * stored once, no final score is decided from half of a response's ratings, and the runs do not
 * interleave. Parameterised over SQLite and PostgreSQL (docs/formats.md, "Isolation and locking").
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class ConcurrentRatingTest {

    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-03T10:00:00Z"), ZoneOffset.UTC);
    private static final int RATERS = 10;
    private static final int DESKS_PER_RATER = 2;
    private static final int CANDIDATES = 40;

    @Parameter
    StoreFixture.Kind kind;

    @TempDir
    Path dir;

    @Test
    void twentyDesksSubmittingAtOnce_storeEverySubmissionOnce_andDecideTheSameFinalScoresAsOneDeskAfterAnother()
            throws Exception {
        // on a SQLite file the desks queue for its one writer (each write transaction begins IMMEDIATE); on a
        // server they lock the response's row (docs/formats.md, "Isolation and locking")
        StoreFixture together = prepared("together");
        StoreFixture inTurn = prepared("in-turn");
        // each rater signed in at two desks (two machines, or a double click), sending the same sheets
        List<Callable<Integer>> desks = new ArrayList<>();
        CountDownLatch start = new CountDownLatch(1);
        for (int r = 1; r <= RATERS; r++) {
            for (int d = 0; d < DESKS_PER_RATER; d++) {
                String rater = rater(r);
                desks.add(() -> {
                    try (RatingStore s = together.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
                        start.await();
                        return rateQueue(s, rater);
                    }
                });
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(desks.size());
        List<Future<Integer>> done = new ArrayList<>();
        for (Callable<Integer> desk : desks) {
            done.add(pool.submit(desk));
        }
        start.countDown();
        int submitted = 0;
        for (Future<Integer> f : done) {
            submitted += f.get(120, TimeUnit.SECONDS); // a desk's failure fails the test here
        }
        pool.shutdown();
        try (RatingStore s = inTurn.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            for (int r = 1; r <= RATERS; r++) {
                rateQueue(s, rater(r));
            }
        }
        assertEquals(CANDIDATES * 2 * DESKS_PER_RATER, submitted, "every desk sent every sheet of its rater's queue");
        assertEquals(List.of((long) CANDIDATES * 2, (long) CANDIDATES * 2), count(together,
                "SELECT COUNT(*), COUNT(DISTINCT assignment_id) FROM rating_submissions"),
                "each rating stored once though sent from two desks");
        assertEquals(outcome(inTurn), outcome(together));
        assertTrue(outcome(together).contains("final"), "final scores were decided");
    }

    @Test
    void twoAssignmentRunsStartedTogether_oneStoresThePlan_theOtherFindsNothingLeftToAssign() throws Exception {
        StoreFixture store = InventedStore.make(kind, dir, CANDIDATES, List.of("t1"));
        try (RatingStore s = store.rating(InventedStore.EXAM)) {
            for (int r = 1; r <= RATERS; r++) {
                s.addRater(rater(r), "Invented rater " + r, null);
            }
        }
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        List<Future<String>> runs = new ArrayList<>();
        for (long seed : new long[] {11L, 12L}) {
            runs.add(pool.submit(() -> {
                try (RatingStore s = store.rating(InventedStore.EXAM)) {
                    start.await();
                    return "stored " + s.assign(2, seed, false).plan().placements().size();
                } catch (RatingException e) {
                    return "refused: " + e.getMessage();
                }
            }));
        }
        start.countDown();
        List<String> said = new ArrayList<>();
        for (Future<String> f : runs) {
            said.add(f.get(120, TimeUnit.SECONDS));
        }
        pool.shutdown();
        said.sort(null);
        assertEquals("refused: every response of exam " + InventedStore.EXAM + " already has its raters; nothing to"
                + " assign", said.get(0), said.toString());
        assertEquals("stored " + CANDIDATES * 2, said.get(1), said.toString());
        assertEquals(List.of((long) CANDIDATES * 2, (long) CANDIDATES * 2, 1L), count(store,
                "SELECT COUNT(*), COUNT(DISTINCT sitting_id || '/' || rater_id), COUNT(DISTINCT run_id)"
                        + " FROM rating_assignments"), "one run's assignments, none twice");
    }

    private StoreFixture prepared(String name) throws Exception {
        StoreFixture store = InventedStore.make(kind, Files.createDirectories(dir.resolve(name)), CANDIDATES,
                List.of("t1"));
        try (RatingStore s = store.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            for (int r = 1; r <= RATERS; r++) {
                s.addRater(rater(r), "Invented rater " + r, null);
            }
            s.assign(2, 20261203L, false);
            s.setRule(new DiscrepancyRule(1, null, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
        }
        return store;
    }

    private static String rater(int r) {
        return String.format("R%02d", r);
    }

    /** Submits a sheet for every first-rating item in the rater's queue; scores from the response and the rater. */
    private static int rateQueue(RatingStore s, String rater) throws RatingException {
        int sent = 0;
        for (RatingDesk.QueueItem item : s.queue(rater)) {
            if (item.kind() != RatingDesk.Kind.RATING) {
                continue;
            }
            RatingDesk.BlindResponse r = s.response(rater, item.blindId());
            int n = Integer.parseInt(r.text().replaceAll("\\D+", " ").trim().split(" ")[0]);
            // rater R04 rates content three bands' worth lower on every fifth candidate: those responses are flagged
            int content = rater.equals("R04") && n % 5 == 0 ? 1 : 7 + n % 3;
            s.submit(rater, item.blindId(), new RatingDesk.RatingSheet(Map.of("content", content, "language",
                    4 + n % 3), ""));
            sent++;
        }
        return sent;
    }

    /** Final scores and flags as the store reports them (blind ids and adjudicators left out: they may differ). */
    private static String outcome(StoreFixture store) throws Exception {
        StringBuilder out = new StringBuilder();
        try (RatingStore s = store.rating(InventedStore.EXAM)) {
            s.forEachFinalScore(r -> out.append("final ").append(r.candidate()).append(' ').append(r.task()).append(' ')
                    .append(r.criterion()).append(' ').append(r.score()).append(' ').append(r.method()).append(' ')
                    .append(r.basis()).append('\n'));
            for (RatingStore.Flag f : s.flags()) {
                out.append("flag ").append(f.taskId()).append(' ').append(f.reason()).append(' ')
                        .append(f.raters()).append('\n');
            }
            out.append("pending ").append(s.pendingResponses()).append('\n');
        }
        return out.toString();
    }

    private static List<Long> count(StoreFixture store, String sql) throws Exception {
        try (Connection c = store.connect(); Statement st = c.createStatement(); ResultSet rs = st.executeQuery(sql)) {
            rs.next();
            List<Long> out = new ArrayList<>();
            for (int i = 1; i <= rs.getMetaData().getColumnCount(); i++) {
                out.add(rs.getLong(i));
            }
            return out;
        }
    }
}
