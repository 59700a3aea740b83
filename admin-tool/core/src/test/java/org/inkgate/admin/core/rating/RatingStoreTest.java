package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import org.inkgate.admin.core.testutil.StoreFixture;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/** The rating store, opened through the store factory, over a real results store holding an invented exam, on SQLite and PostgreSQL. */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class RatingStoreTest {

    @Parameter
    StoreFixture.Kind kind;


    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-02T09:00:00Z"), ZoneOffset.UTC);

    @TempDir
    Path dir;

    private RatingStore open(StoreFixture db) throws RatingException {
        return db.rating(InventedStore.EXAM, CLOCK, new BlindIds());
    }

    private static RatingDesk.RatingSheet sheet(int content, int language) {
        return new RatingDesk.RatingSheet(Map.of("content", content, "language", language), "");
    }

    private static void addRaters(RatingStore s, int n) throws RatingException {
        for (int i = 1; i <= n; i++) {
            s.addRater(String.format("R%02d", i), "Invented rater " + i, null);
        }
    }

    /** Candidate data behind every blind id, read straight from the store for the blindness checks. */
    private static Map<String, List<String>> hidden(StoreFixture db) throws Exception {
        Map<String, List<String>> out = new HashMap<>();
        try (var c = db.connect(); var st = c.createStatement();
                var rs = st.executeQuery("SELECT a.blind_id, s.candidate_number, c.level, s.form_id, r.condition_id,"
                        + " s.submitted_at, s.package_id, a.sitting_id FROM rating_assignments a JOIN sittings s"
                        + " ON s.sitting_id = a.sitting_id JOIN responses r ON r.sitting_id = a.sitting_id AND"
                        + " r.task_id = a.task_id JOIN candidates c ON c.candidate_number = s.candidate_number")) {
            while (rs.next()) {
                out.put(rs.getString(1), List.of(rs.getString(2), rs.getString(3), rs.getString(4), rs.getString(5),
                        rs.getString(6), rs.getString(7), rs.getString(8)));
            }
        }
        return out;
    }

    @Test
    void assign_storesQueuesWithBlindIdsThatRevealNothingAndAreNotReproducibleFromTheSeed() throws Exception {
        StoreFixture a = InventedStore.make(kind, Files.createDirectories(dir.resolve("a")), 60, List.of("t1", "t2"));
        StoreFixture b = InventedStore.make(kind, Files.createDirectories(dir.resolve("b")), 60, List.of("t1", "t2"));
        Map<String, Set<String>> raterSetsA = new HashMap<>();
        Map<String, Set<String>> raterSetsB = new HashMap<>();
        for (StoreFixture db : List.of(a, b)) {
            try (RatingStore s = open(db)) {
                addRaters(s, 5);
                RatingStore.AssignmentOutcome out = s.assign(2, 424242L, false);
                assertTrue(out.wholeDesign().connected());
                assertEquals(240, out.plan().placements().size());
            }
        }
        Map<String, List<String>> ha = hidden(a);
        Map<String, List<String>> hb = hidden(b);
        assertEquals(240, ha.size(), "ids unique within the store");
        Set<String> common = new HashSet<>(ha.keySet());
        common.retainAll(hb.keySet());
        assertTrue(common.isEmpty(), "the same data and seed give other ids: ids are not derived from them");
        for (Map.Entry<String, List<String>> e : ha.entrySet()) {
            assertTrue(BlindIds.looksLikeId(e.getKey()));
            String compact = e.getKey().replace("-", "");
            // values of five or more characters (candidate number, times): a chance match is below 1e-6 per id
            for (String v : e.getValue()) {
                if (v != null && v.length() >= 5) {
                    assertFalse(compact.contains(v) || e.getKey().contains(v), e.getKey() + " contains " + v);
                }
            }
        }
        // ids sorted carry no order of sittings: the correlation of id rank and sitting id is near 0
        // (under independence its SD is about 1/sqrt(n-1) = 0.065 for n = 240; 0.3 is 4.6 SD)
        List<String> sorted = ha.keySet().stream().sorted().toList();
        double[] x = new double[sorted.size()];
        double[] y = new double[sorted.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = i;
            y[i] = Long.parseLong(ha.get(sorted.get(i)).get(6));
        }
        double rho = pearson(x, y);
        assertTrue(Math.abs(rho) < 0.3, "rho " + rho);
        // the same seed gives the same raters per response (determinism of the design)
        for (var entry : List.of(Map.entry(a, raterSetsA), Map.entry(b, raterSetsB))) {
            try (var c = entry.getKey().connect(); var st = c.createStatement();
                    var rs = st.executeQuery("SELECT sitting_id || '/' || task_id, rater_id FROM rating_assignments")) {
                while (rs.next()) {
                    entry.getValue().computeIfAbsent(rs.getString(1), k -> new HashSet<>()).add(rs.getString(2));
                }
            }
        }
        assertEquals(raterSetsA, raterSetsB);
        try (RatingStore s = open(a)) {
            RatingException again = assertThrows(RatingException.class, () -> s.assign(2, 1L, false));
            assertTrue(again.getMessage().contains("already has its raters"), again.getMessage());
            List<RatingDesk.QueueItem> q = s.queue("R01");
            assertEquals(48, q.size(), "240 ratings over 5 raters");
            RatingDesk.BlindResponse r = s.response("R01", q.get(0).blindId());
            assertTrue(r.text().startsWith("Invented response"));
            RatingException other = assertThrows(RatingException.class, () -> s.response("R02", q.get(0).blindId()));
            assertTrue(other.getMessage().contains("is not in rater R02's queue"), other.getMessage());
        }
    }

    @Test
    void assign_laterRunForLateResponses_balancesTotalsAndKeepsQueuesGrouped() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 30, List.of("t1", "t2"));
        try (RatingStore s = open(db)) {
            addRaters(s, 3);
            s.assign(2, 1L, false);
            s.addRater("R04", "Invented late rater", null);
        }
        InventedStore.addCandidates(db, 30, 10, List.of("t1", "t2"));
        try (RatingStore s = open(db)) {
            assertEquals(20, s.unassignedResponses().size());
            s.assign(2, 2L, false);
            // by hand from the water-filling rule: 40 earlier ratings each for R01-R03, 40 new ratings of 20 responses.
            // R04 takes each new response at most once (20); the level where R01-R03 cover the other 20 is 47
            // (3 x 6 = 18 < 20 at 46, 3 x 7 = 21 at 47): totals 46 or 47 for R01-R03, 20 for R04
            Map<String, Integer> totals = new java.util.TreeMap<>();
            for (RatingStore.ProgressRow r : s.progressRows()) {
                totals.merge(r.raterId(), r.total(), Integer::sum);
            }
            assertEquals(20, totals.get("R04"));
            assertEquals(160, totals.values().stream().mapToInt(Integer::intValue).sum());
            assertTrue(totals.get("R01") >= 46 && totals.get("R01") <= 47, totals.toString());
            assertTrue(s.design().connected());
            List<RatingDesk.QueueItem> q = s.queue("R01");
            for (int i = 0; i < q.size(); i++) {
                assertEquals(i + 1, q.get(i).position());
            }
        }
    }

    @Test
    void assign_unlinkableDesign_isRefusedAndNothingStored_unlessAllowed() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 3, List.of("t1"));
        try (RatingStore s = open(db)) {
            addRaters(s, 7);
            RatingException e = assertThrows(RatingException.class, () -> s.assign(2, 9L, false));
            assertTrue(e.getMessage().contains("share no response") && e.getMessage().contains("Nothing was stored"),
                    e.getMessage());
            assertEquals(3, s.unassignedResponses().size(), "nothing stored");
            RatingStore.AssignmentOutcome ok = s.assign(2, 9L, true);
            assertFalse(ok.wholeDesign().connected());
            assertEquals(0, s.unassignedResponses().size());
        }
    }

    @Test
    void desk_draftSurvivesReopen_submitValidates_resubmissionKeepsHistoryWithWhoAndWhen() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 10, List.of("t1", "t2"));
        String id;
        try (RatingStore s = open(db)) {
            addRaters(s, 3);
            s.assign(2, 11L, false);
            id = s.queue("R01").get(0).blindId();
            s.saveDraft("R01", id, new RatingDesk.RatingSheet(Map.of("content", 6), "half done"));
        }
        try (RatingStore s = open(db)) {
            assertEquals(new RatingDesk.RatingSheet(Map.of("content", 6), "half done"), s.sheet("R01", id).orElseThrow());
            RatingException incomplete = assertThrows(RatingException.class,
                    () -> s.submit("R01", id, new RatingDesk.RatingSheet(Map.of("content", 6), "")));
            assertTrue(incomplete.getMessage().contains("language has no score"), incomplete.getMessage());
            RatingException range = assertThrows(RatingException.class, () -> s.submit("R01", id, sheet(10, 5)));
            assertTrue(range.getMessage().contains("content score 10 is outside 1-9"), range.getMessage());
            RatingException draftRange = assertThrows(RatingException.class,
                    () -> s.saveDraft("R01", id, new RatingDesk.RatingSheet(Map.of("content", 0), "")));
            assertTrue(draftRange.getMessage().contains("outside 1-9"), draftRange.getMessage());
            s.submit("R01", id, sheet(6, 5));
            assertTrue(s.queue("R01").get(0).done());
            assertEquals(sheet(6, 5), s.sheet("R01", id).orElseThrow(), "the draft is gone once submitted");
            s.submit("R01", id, sheet(6, 5));
            s.submit("R01", id, new RatingDesk.RatingSheet(Map.of("content", 7, "language", 5), "on second reading"));
            List<RatingStore.HistoryEntry> h = s.history(id);
            assertEquals(2, h.size(), "an identical resubmission adds nothing; a changed one is kept beside the first");
            assertEquals(Map.of("content", 6, "language", 5), h.get(0).scores());
            assertEquals(Map.of("content", 7, "language", 5), h.get(1).scores());
            assertEquals("R01", h.get(1).raterId());
            assertEquals("2026-12-02T09:00:00Z", h.get(1).submittedAt());
            assertEquals("desk", h.get(1).via());
            RatingDesk.Progress p = s.progress("R01");
            assertEquals(p.total() - 1, p.remaining());
            assertEquals(1, p.rated());
        }
    }

    @Test
    void rule_disagreementFlagsAndGoesToAThirdRater_adjudicationSettlesByClosestPair() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 6, List.of("t1"));
        try (RatingStore s = open(db)) {
            addRaters(s, 4);
            s.assign(2, 5L, false);
            // rule: a criterion more than 1 band apart (bands 1-3, 4-6, 7-9), or totals more than 4 apart
            s.setRule(new DiscrepancyRule(1, 4, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
            Map<String, List<String[]>> byResponse = responses(db);
            List<String> flaggedIds = new ArrayList<>();
            int n = 0;
            for (List<String[]> raters : byResponse.values()) {
                String[] first = raters.get(0);
                String[] second = raters.get(1);
                if (n++ == 0) {
                    // content 2 (band 1-3) and 8 (band 7-9): two bands apart -> flagged
                    s.submit(first[1], first[0], sheet(2, 5));
                    s.submit(second[1], second[0], sheet(8, 5));
                    flaggedIds.add(first[0]);
                } else {
                    // 4 and 6 lie in one band, totals 9 and 11: within the rule -> mean of the two
                    s.submit(first[1], first[0], sheet(4, 5));
                    s.submit(second[1], second[0], sheet(6, 5));
                }
            }
            List<RatingStore.Flag> flags = s.flags();
            assertEquals(1, flags.size());
            RatingStore.Flag f = flags.get(0);
            assertTrue(f.reason().contains("content: scores 2 and 8 lie 2 bands apart"), f.reason());
            assertNotNull(f.adjudicator(), f.status());
            assertFalse(f.raters().contains(f.adjudicator()), "the adjudicator is not one of the first raters");
            assertEquals(1, s.pendingResponses());
            List<RatingDesk.QueueItem> q = s.queue(f.adjudicator());
            RatingDesk.QueueItem last = q.get(q.size() - 1);
            assertEquals(RatingDesk.Kind.ADJUDICATION, last.kind(), "adjudications come after the rater's own items");
            assertEquals(f.adjudicatorBlindId(), last.blindId());
            // adjudicator gives 7/6 (total 13); totals 7 (2+5), 13 (8+5), 13: closest pair is second and adjudicator
            s.submit(f.adjudicator(), last.blindId(), sheet(7, 6));
            Map<String, RatingStore.FinalRow> finals = new HashMap<>();
            List<RatingStore.FinalRow> all = new ArrayList<>();
            s.forEachFinalScore(all::add);
            assertEquals(12, all.size(), "6 responses x 2 criteria");
            all.forEach(r -> finals.put(r.candidate() + "/" + r.criterion() + "/" + r.method(), r));
            long closest = all.stream().filter(r -> r.method().equals("closest-pair-mean")).count();
            assertEquals(2, closest);
            RatingStore.FinalRow content = all.stream().filter(r -> r.method().equals("closest-pair-mean")
                    && r.criterion().equals("content")).findFirst().orElseThrow();
            assertEquals(7.5, content.score(), 1e-12, "(8 + 7) / 2, by hand");
            assertTrue(content.rule().contains("more than 1 band"), content.rule());
            RatingStore.FinalRow mean = all.stream().filter(r -> r.method().equals("mean-of-ratings")
                    && r.criterion().equals("content")).findFirst().orElseThrow();
            assertEquals(5.0, mean.score(), 1e-12, "(4 + 6) / 2, by hand");
            assertEquals(0, s.pendingResponses());
            assertEquals("settled (closest-pair-mean)", s.flags().get(0).status());
            int flaggedRows = s.progressRows().stream().mapToInt(RatingStore.ProgressRow::flagged).sum();
            assertEquals(3, flaggedRows, "two first raters and the adjudicator hold the flagged response");
            // a resolution entry overrides: recorded with who, and the method says so
            s.resolve(f.flagId(), "Invented panel lead", Map.of("content", 6, "language", 6), "agreed in discussion");
            all.clear();
            s.forEachFinalScore(all::add);
            assertEquals(2, all.stream().filter(r -> r.method().equals("resolution-entry")
                    && r.basis().equals("Invented panel lead")).count());
            RatingException bad = assertThrows(RatingException.class, () -> s.resolve(999, "x", Map.of("content", 5,
                    "language", 5), ""));
            assertTrue(bad.getMessage().contains("no flag 999"), bad.getMessage());
        }
    }

    @Test
    void rule_noThirdRaterLeft_staysInTheQueueAndSaysSo() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 2, List.of("t1"));
        try (RatingStore s = open(db)) {
            addRaters(s, 2);
            s.assign(2, 5L, false);
            for (List<String[]> raters : responses(db).values()) {
                s.submit(raters.get(0)[1], raters.get(0)[0], sheet(1, 1));
                s.submit(raters.get(1)[1], raters.get(1)[0], sheet(9, 9));
            }
            assertEquals(0, s.flags().size(), "no rule yet: nothing flagged");
            assertEquals(2, s.setRule(new DiscrepancyRule(null, 3, DiscrepancyRule.AdjudicatedScore.ADJUDICATOR)));
            RatingStore.Flag f = s.flags().get(0);
            assertTrue(f.status().startsWith("no adjudicator available"), f.status());
            assertEquals(2, s.pendingResponses());
            s.addRater("R03", "Invented third", null);
            assertEquals(0, s.review(), "flags are raised once");
            List<RatingStore.Flag> now = s.flags();
            assertEquals(List.of("R03", "R03"), now.stream().map(RatingStore.Flag::adjudicator).toList(),
                    "a rater added later takes the waiting adjudications when the rule runs again");
            // ADJUDICATOR method: the third rater's scores become the final score
            s.submit("R03", now.get(0).adjudicatorBlindId(), sheet(4, 6));
            List<RatingStore.FinalRow> finals = new ArrayList<>();
            s.forEachFinalScore(finals::add);
            assertEquals(List.of("adjudicator", "adjudicator"), finals.stream().map(RatingStore.FinalRow::method)
                    .toList());
            assertEquals(List.of(4.0, 6.0), finals.stream().map(RatingStore.FinalRow::score).toList());
            assertEquals(1, s.pendingResponses());
        }
    }

    private static double pearson(double[] x, double[] y) {
        double mx = java.util.Arrays.stream(x).average().orElseThrow();
        double my = java.util.Arrays.stream(y).average().orElseThrow();
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }
        return sxy / Math.sqrt(sxx * syy);
    }

    @Test
    void adjudicator_amongEquallyLoaded_avoidsAQueueEndingWithTheSameCandidate() throws Exception {
        // a hand-made design: (C0000,t1) by R01 and R02; R03's queue ends with C0000's t2, R04's with C0001's t1;
        // R03 and R04 carry 2 each. Over 8 seeds the adjudicator of (C0000,t1) must always be R04 (a coin would
        // pick R03 about half the time)
        for (int seed = 1; seed <= 8; seed++) {
            StoreFixture db = InventedStore.make(kind, Files.createDirectories(dir.resolve("s" + seed)), 2, List.of("t1", "t2"));
            try (RatingStore s = open(db)) {
                addRaters(s, 4);
            }
            try (var c = db.connect(); var st = c.createStatement()) {
                String[][] rows = {{"1", "t1", "R01", "1"}, {"1", "t1", "R02", "1"}, {"2", "t1", "R03", "1"},
                    {"1", "t2", "R03", "2"}, {"1", "t2", "R04", "1"}, {"2", "t1", "R04", "2"}};
                int n = 0;
                for (String[] r : rows) {
                    st.execute("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed, created_at, blind_id,"
                            + " kind, queue_position) VALUES (" + r[0] + ", '" + r[1] + "', '" + r[2] + "', " + seed
                            + ", 't', 'TEST-000" + (n++) + "', 'rating', " + r[3] + ")");
                }
            }
            try (RatingStore s = open(db)) {
                s.setRule(new DiscrepancyRule(1, null, DiscrepancyRule.AdjudicatedScore.ADJUDICATOR));
                s.submit("R01", "TEST-0000", sheet(1, 1));
                s.submit("R02", "TEST-0001", sheet(9, 9));
                assertEquals("R04", s.flags().get(0).adjudicator(), "seed " + seed);
            }
        }
    }

    /** Per response (sitting/task) its assignments as [blind id, rater], in assignment order. */
    private static Map<String, List<String[]>> responses(StoreFixture db) throws Exception {
        Map<String, List<String[]>> out = new java.util.TreeMap<>();
        try (var c = db.connect(); var st = c.createStatement();
                var rs = st.executeQuery("SELECT sitting_id || '/' || task_id, blind_id, rater_id FROM rating_assignments"
                        + " WHERE kind = 'rating' ORDER BY assignment_id")) {
            while (rs.next()) {
                out.computeIfAbsent(rs.getString(1), x -> new ArrayList<>()).add(new String[] {rs.getString(2),
                        rs.getString(3)});
            }
        }
        return out;
    }

    @Test
    void open_missingStoreOrExam_saysWhatToGive() throws Exception {
        StoreFixture empty = StoreFixture.create(kind, Files.createDirectories(dir.resolve("empty")), "nope.db");
        RatingException none = assertThrows(RatingException.class, () -> open(empty));
        assertTrue(none.getMessage().contains("no results store " + (kind == StoreFixture.Kind.SQLITE ? "at" : "in")),
                none.getMessage());
        StoreFixture db = InventedStore.make(kind, dir, 1, List.of("t1"));
        RatingException exam = assertThrows(RatingException.class, () -> db.rating("other"));
        assertTrue(exam.getMessage().contains("holds no exam other"), exam.getMessage());
        assertNotEquals(null, org.inkgate.admin.core.store.Stores.exams(db.location()));
    }
}
