package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import org.inkgate.admin.core.testutil.StoreFixture;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 15 §3: a response the test owner settled by a resolution entry leaves every queue, and a
 * rating that arrives for it afterwards, from the desk or a sheet, is refused with the reason.
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class SettledResponseTest {

    @Parameter
    StoreFixture.Kind kind;


    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-02T09:00:00Z"), ZoneOffset.UTC);

    @TempDir
    Path dir;

    @Test
    void resolvedBeforeTheAdjudicatorRated_leavesTheQueue_andDeskAndSheetRatingsAreRefused() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 1, List.of("t1"));
        try (RatingStore s = db.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            for (int i = 1; i <= 3; i++) {
                s.addRater("R0" + i, "Invented rater " + i, null);
            }
            s.assign(2, 5L, false);
            s.setRule(new DiscrepancyRule(1, null, DiscrepancyRule.AdjudicatedScore.ADJUDICATOR));
            List<String[]> firstTwo = ratings(db);
            s.submit(firstTwo.get(0)[1], firstTwo.get(0)[0], sheet(2, 5));
            s.submit(firstTwo.get(1)[1], firstTwo.get(1)[0], sheet(8, 5));
            RatingStore.Flag flag = s.flags().get(0);
            String third = flag.adjudicator();
            String blind = flag.adjudicatorBlindId();
            assertEquals(1, s.queue(third).size(), "the adjudication waits in the third rater's queue");
            String sheetBefore = exportSheet(s, third);

            s.resolve(flag.flagId(), "Invented panel lead", Map.of("content", 5, "language", 5), "agreed in discussion");

            assertEquals(List.of(), s.queue(third), "the settled response left the queue");
            assertEquals(0, s.progress(third).total());
            // the raters who had rated it keep it as done
            assertTrue(s.queue(firstTwo.get(0)[1]).get(0).done());
            RatingException desk = assertThrows(RatingException.class, () -> s.submit(third, blind, sheet(5, 5)));
            assertTrue(desk.getMessage().contains("settled by the test owner's resolution entry (2026-12-02T09:00:00Z)"),
                    desk.getMessage());
            assertTrue(desk.getMessage().contains("nothing was stored"), desk.getMessage());
            assertThrows(RatingException.class, () -> s.saveDraft(third, blind, sheet(5, 5)));
            // a second rater re-submitting a changed rating is refused too
            assertThrows(RatingException.class, () -> s.submit(firstTwo.get(0)[1], firstTwo.get(0)[0], sheet(3, 5)));

            // the sheet exported before the resolution comes back filled in
            String filled = sheetBefore.replace(blind + ",t1,,,", blind + ",t1,5,5,fine");
            assertFalse(filled.equals(sheetBefore), sheetBefore);
            RatingSheets.SheetRejected rejected = assertThrows(RatingSheets.SheetRejected.class,
                    () -> RatingSheets.importSheet(s, third, "R03.csv", filled));
            assertEquals(1, rejected.problems().size(), rejected.getMessage());
            assertEquals(2, rejected.problems().get(0).row());
            assertTrue(rejected.problems().get(0).message().contains("settled by the test owner's resolution entry"),
                    rejected.getMessage());
            // returned blank, the same sheet imports with nothing to store
            assertEquals(0, RatingSheets.importSheet(s, third, "R03.csv", sheetBefore).storedNewOrChanged());

            List<RatingStore.FinalRow> finals = new ArrayList<>();
            s.forEachFinalScore(finals::add);
            assertTrue(finals.stream().allMatch(r -> r.method().equals("resolution-entry") && r.score() == 5.0), "" + finals);
        }
    }

    private static String exportSheet(RatingStore s, String rater) throws Exception {
        java.io.StringWriter w = new java.io.StringWriter();
        RatingSheets.export(s, rater, w);
        return w.toString();
    }

    private static RatingDesk.RatingSheet sheet(int content, int language) {
        return new RatingDesk.RatingSheet(Map.of("content", content, "language", language), "");
    }

    private static List<String[]> ratings(StoreFixture db) throws Exception {
        List<String[]> out = new ArrayList<>();
        try (var c = db.connect(); var st = c.createStatement();
                var rs = st.executeQuery("SELECT blind_id, rater_id FROM rating_assignments WHERE kind = 'rating'"
                        + " ORDER BY assignment_id")) {
            while (rs.next()) {
                out.add(new String[] {rs.getString(1), rs.getString(2)});
            }
        }
        assertEquals(2, out.size());
        return out;
    }
}
