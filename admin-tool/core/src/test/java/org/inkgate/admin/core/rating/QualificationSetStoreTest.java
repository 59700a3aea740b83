package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The qualification set through the real SQLite rating store over an invented exam (6 candidates,
 * one task, criteria content and language 1-9): scripts given to every rater ahead of their live
 * items, live rating closed until the rater scores the set within the test owner's limits or is
 * admitted, and qualification ratings kept out of every candidate's scores. Agreement figures are
 * those of the control monitor (exact, adjacent within 1 point, mean difference; common practice).
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class QualificationSetStoreTest {

    @Parameter
    StoreFixture.Kind kind;


    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-03T09:00:00Z"), ZoneOffset.UTC);
    private static final Map<String, Integer> AGREED_1 = Map.of("content", 5, "language", 6);
    private static final Map<String, Integer> AGREED_2 = Map.of("content", 3, "language", 4);

    @TempDir
    Path dir;

    @Test
    void liveRating_opensOnlyAfterTheSetIsPassed_orTheRaterIsAdmitted() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 6, List.of("t1"));
        try (RatingStore s = db.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            for (int i = 1; i <= 3; i++) {
                s.addRater("R0" + i, "Invented rater " + i, null);
            }
            s.assign(2, 7L, false);
            List<String> liveOfR1 = s.queue("R01").stream().map(RatingDesk.QueueItem::blindId).toList();
            assertFalse(liveOfR1.isEmpty());

            s.markQualification("C0001", "t1", AGREED_1, "invented standardisation meeting");
            s.markQualification("C0002", "t1", AGREED_2, "invented standardisation meeting");
            assertThrows(IllegalArgumentException.class, () -> new QualificationSet.Rule(null, null, null));
            assertThrows(IllegalArgumentException.class, () -> new QualificationSet.Rule(1.5, null, null));
            assertEquals(6, s.giveQualificationSet(), "2 scripts x 3 raters, even to raters who rate them live");
            assertEquals(0, s.giveQualificationSet(), "giving again adds nothing");
            assertEquals(liveOfR1.size() + 2, s.queue("R01").size(), "no rule yet: the set first, live items open");

            s.setQualificationRule(new QualificationSet.Rule(null, 1.0, 0.5));
            List<RatingDesk.QueueItem> closed = s.queue("R01");
            assertEquals(2, closed.size(), "only the set while live rating is closed: " + closed);
            assertTrue(closed.stream().allMatch(q -> q.kind() == RatingDesk.Kind.QUALIFICATION));
            RatingException early = assertThrows(RatingException.class, () -> s.submit("R01", liveOfR1.get(0),
                    new RatingDesk.RatingSheet(Map.of("content", 5, "language", 5), "")));
            assertTrue(early.getMessage().contains("0 of 2 qualification scripts scored"), early.getMessage());

            // R01 within the limits: differences 0,1 and 0,-1: adjacent 1.0, mean difference 0
            s.submit("R01", closed.get(0).blindId(), new RatingDesk.RatingSheet(plus(agreedOf(s, "R01", closed.get(0)), 0, 1), ""));
            assertEquals(2, s.queue("R01").size(), "one of two scored: still closed");
            s.submit("R01", closed.get(1).blindId(), new RatingDesk.RatingSheet(plus(agreedOf(s, "R01", closed.get(1)), 0, -1), ""));
            assertEquals(QualificationStanding.Status.PASSED, standing(s, "R01").status());
            assertEquals(liveOfR1.size() + 2, s.queue("R01").size(), "passed: live items open");
            s.submit("R01", liveOfR1.get(0), new RatingDesk.RatingSheet(Map.of("content", 5, "language", 5), ""));
            RatingException changed = assertThrows(RatingException.class, () -> s.submit("R01", closed.get(0).blindId(),
                    new RatingDesk.RatingSheet(Map.of("content", 9, "language", 9), "")));
            assertTrue(changed.getMessage().contains("has passed"), changed.getMessage());

            // R02 two points off everywhere: adjacent 0, mean difference 2
            List<RatingDesk.QueueItem> r2 = s.queue("R02");
            for (RatingDesk.QueueItem q : r2) {
                s.submit("R02", q.blindId(), new RatingDesk.RatingSheet(plus(agreedOf(s, "R02", q), 2, 2), ""));
            }
            QualificationStanding failed = standing(s, "R02");
            assertEquals(QualificationStanding.Status.NOT_PASSED, failed.status());
            assertEquals(0.0, failed.agreement().adjacent(), 1e-12);
            assertEquals(2.0, failed.agreement().meanDifference(), 1e-12);
            assertEquals(2, s.queue("R02").size(), "not passed: still only the set");
            s.admitRater("R02", "Invented test owner", "retrained on 2026-12-03");
            assertEquals(QualificationStanding.Status.ADMITTED, standing(s, "R02").status());
            assertTrue(s.queue("R02").size() > 2);
            assertEquals(QualificationStanding.Status.IN_PROGRESS, standing(s, "R03").status());

            // qualification ratings never reach a candidate's ratings
            List<String> rated = new ArrayList<>();
            s.forEachRating(r -> rated.add(r.toString()));
            assertEquals(2, rated.size(), "R01's one live rating, two criteria: " + rated);
        }
    }

    @Test
    void sheet_carriesTheSetFirst_andItsImportIsChecked() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 6, List.of("t1"));
        try (RatingStore s = db.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            s.addRater("R01", "Invented rater one", null);
            s.addRater("R02", "Invented rater two", null);
            s.assign(2, 7L, false);
            s.markQualification("C0003", "t1", AGREED_1, "invented meeting");
            s.giveQualificationSet();
            s.setQualificationRule(new QualificationSet.Rule(0.5, null, null));
            StringWriter out = new StringWriter();
            assertEquals(1, RatingSheets.export(s, "R01", out), out.toString());
            String id = s.queue("R01").get(0).blindId();
            RatingSheets.Imported in = RatingSheets.importSheet(s, "R01", "R01.csv",
                    "blind_id,task,content,language,comment\r\n" + id + ",t1,5,6,\r\n");
            assertEquals(1, in.storedNewOrChanged());
            assertEquals(QualificationStanding.Status.PASSED, standing(s, "R01").status());
            assertEquals(1 + 6, s.queue("R01").size(), "the set, then all six live responses (2 raters of 2)");
        }
    }

    private static QualificationStanding standing(RatingStore s, String rater) throws RatingException {
        return s.qualificationStandings().stream().filter(q -> q.raterId().equals(rater)).findFirst().orElseThrow();
    }

    /** The agreed scores of the script behind a queue item, found by its text's candidate. */
    private static Map<String, Integer> agreedOf(RatingStore s, String rater, RatingDesk.QueueItem q)
            throws RatingException {
        String text = s.response(rater, q.blindId()).text(); // InventedStore: "Invented response 1 to t1." for C0001
        return text.contains("response 1 ") ? AGREED_1 : AGREED_2;
    }

    private static Map<String, Integer> plus(Map<String, Integer> agreed, int content, int language) {
        return Map.of("content", agreed.get("content") + content, "language", agreed.get("language") + language);
    }
}
