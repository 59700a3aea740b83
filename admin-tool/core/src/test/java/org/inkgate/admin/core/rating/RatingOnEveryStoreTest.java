package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The whole rating of an invented exam on each kind of store: raters, an assignment run, drafts,
 * desk submissions, a discrepancy rule with flags, adjudication, a resolution entry, a referral and
 * its decision. Everything the store answers afterwards, written out as text (blind ids left out:
 * they are random by design), must be the same on PostgreSQL as on a SQLite file, the embedded
 * store whose behaviour the other rating tests pin down; so the two cannot drift.
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class RatingOnEveryStoreTest {

    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-03T09:00:00Z"), ZoneOffset.UTC);

    @Parameter
    StoreFixture.Kind kind;

    @TempDir
    Path dir;

    @Test
    void theSameRating_onThisStoreAndOnASqliteFile_givesTheSameRatingsFlagsAndFinalScores() throws Exception {
        String here = rateTheExam(InventedStore.make(kind, Files.createDirectories(dir.resolve("here")), 12,
                List.of("t1", "t2")));
        String sqlite = rateTheExam(InventedStore.make(StoreFixture.Kind.SQLITE,
                Files.createDirectories(dir.resolve("sqlite")), 12, List.of("t1", "t2")));
        assertEquals(sqlite, here);
        assertTrue(here.contains("rubric [content, language]"), "the rubric's own order, not the alphabet's only");
        assertTrue(here.contains("flag t"), "the scenario makes raters disagree: " + here);
        assertTrue(here.contains("method adjudicator"), here);
        assertTrue(here.contains("decision kept for the test owner"), here);
    }

    @Test
    void examsAndRubric_areRead_andAnEmptyStoreHasNoRubric() throws Exception {
        StoreFixture store = InventedStore.make(kind, dir, 2, List.of("t1"));
        assertEquals(List.of(InventedStore.EXAM), Stores.exams(store.location()));
        assertTrue(Stores.hasRubric(store.location(), InventedStore.EXAM));
        assertFalse(Stores.hasRubric(store.location(), "other-exam"));
        StoreFixture empty = StoreFixture.create(kind, Files.createDirectories(dir.resolve("empty")));
        assertFalse(Stores.hasRubric(empty.location(), InventedStore.EXAM));
        RatingException none = assertThrows(RatingException.class, () -> empty.rating(InventedStore.EXAM));
        assertTrue(none.getMessage().contains("no results store"), none.getMessage());
        RatingException other = assertThrows(RatingException.class, () -> store.rating("other-exam"));
        assertTrue(other.getMessage().contains("holds no exam other-exam"), other.getMessage());
    }

    /** Rates the exam the same way whatever the blind ids are; returns all the store says afterwards. */
    private static String rateTheExam(StoreFixture store) throws Exception {
        StringBuilder out = new StringBuilder();
        Map<String, String> scores = new TreeMap<>();
        try (RatingStore s = store.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            out.append("rubric ").append(s.rubric().criteria().stream().map(c -> c.id()).toList()).append('\n');
            for (int i = 1; i <= 5; i++) {
                s.addRater("R0" + i, "Invented rater " + i, i == 5 ? 14 : null);
            }
            RatingStore.AssignmentOutcome run = s.assign(2, 424242L, false);
            out.append("placed ").append(run.plan().placements().size()).append(" connected ")
                    .append(run.wholeDesign().connected()).append('\n');
            s.setRule(new DiscrepancyRule(1, null, DiscrepancyRule.AdjudicatedScore.ADJUDICATOR));
            boolean referred = false;
            for (RatingStore.RaterEntry rater : s.raterEntries()) {
                for (RatingDesk.QueueItem item : s.queue(rater.id())) {
                    RatingDesk.BlindResponse r = s.response(rater.id(), item.blindId());
                    int n = Integer.parseInt(r.text().replaceAll("\\D+", " ").trim().split(" ")[0]);
                    // scores from the response and the rater: rater R03 is harsh on content, two bands below the
                    // others, so the pairs with R03 break the rule
                    int content = rater.id().equals("R03") ? 1 + n % 3 : 7 + n % 3;
                    RatingDesk.RatingSheet sheet = new RatingDesk.RatingSheet(Map.of("content", content,
                            "language", 4 + n % 3), "invented comment " + n);
                    s.saveDraft(rater.id(), item.blindId(), new RatingDesk.RatingSheet(Map.of("content", content), ""));
                    out.append("draft ").append(s.sheet(rater.id(), item.blindId()).orElseThrow().scores()).append('\n');
                    s.submit(rater.id(), item.blindId(), sheet);
                    if (!referred && n == 7) {
                        s.refer(rater.id(), item.blindId(), Referrals.Reason.OFF_TASK, "invented note");
                        referred = true;
                    }
                }
            }
            s.review();
            List<RatingStore.Flag> flags = s.flags();
            for (int i = 0; i < flags.size(); i++) {
                RatingStore.Flag f = flags.get(i);
                if (i == 0 || f.adjudicator() == null) {
                    s.resolve(f.flagId(), "Invented panel lead", Map.of("content", 5, "language", 5), "agreed");
                } else {
                    s.submit(f.adjudicator(), f.adjudicatorBlindId(), new RatingDesk.RatingSheet(
                            Map.of("content", 6, "language", 6), "third rating"));
                }
            }
            for (Referrals.Referral r : s.referrals(true)) {
                s.decide(r.id(), "Invented test owner", "decision kept for the test owner");
            }
            for (RatingStore.Flag f : s.flags()) {
                out.append("flag ").append(f.taskId()).append(' ').append(f.reason()).append(' ').append(f.raters())
                        .append(' ').append(f.adjudicator()).append(' ').append(f.adjudicated()).append(' ')
                        .append(f.finalMethod()).append(' ').append(f.status()).append('\n');
            }
            for (Referrals.Referral r : s.referrals(false)) {
                out.append("referral ").append(r.taskId()).append(' ').append(r.candidateNumber()).append(' ')
                        .append(r.raterId()).append(' ').append(r.reason()).append(' ').append(r.decision()).append('\n');
            }
            s.forEachRating(r -> out.append("rating ").append(r).append('\n'));
            s.forEachFinalScore(r -> out.append("final ").append(r).append(" method ").append(r.method()).append('\n'));
            s.scoresByResponse().forEach((k, v) -> scores.put(k.toString(), v.toString()));
            scores.forEach((k, v) -> out.append("scores ").append(k).append(' ').append(v).append('\n'));
            s.progressRows().forEach(r -> out.append("progress ").append(r).append('\n'));
            out.append("design ").append(s.design().components()).append('\n');
            out.append("pending ").append(s.pendingResponses()).append('\n');
        }
        return out.toString();
    }
}
