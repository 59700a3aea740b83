package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import org.inkgate.admin.core.testutil.StoreFixture;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/** Control scripts in the store over an invented exam, and the monitor's figures on a worked example. */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class ControlScriptsStoreTest {

    @Parameter
    StoreFixture.Kind kind;


    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-02T09:00:00Z"), ZoneOffset.UTC);

    @TempDir
    Path dir;

    @Test
    void mark_unknownOrOutOfRange_refused_andMixBeforeAssign_refusedWithWhatToDo() throws Exception {
        StoreFixture db = InventedStore.make(kind, dir, 6, List.of("t1"));
        try (RatingStore s = db.rating(InventedStore.EXAM, CLOCK, new BlindIds())) {
            for (int i = 1; i <= 3; i++) {
                s.addRater("R0" + i, "Invented rater " + i, null);
            }
            ControlScripts controls = s;
            RatingException unknown = assertThrows(RatingException.class, () -> controls.markControl("C9999", "t1",
                    Map.of("content", 5, "language", 5), "invented meeting"));
            assertTrue(unknown.getMessage().contains("no response of candidate C9999 to task t1"), unknown.getMessage());
            RatingException range = assertThrows(RatingException.class, () -> controls.markControl("C0001", "t1",
                    Map.of("content", 0, "language", 5), "invented meeting"));
            assertTrue(range.getMessage().contains("content score 0 is outside 1-9"), range.getMessage());
            RatingException missing = assertThrows(RatingException.class, () -> controls.markControl("C0001", "t1",
                    Map.of("content", 5), "invented meeting"));
            assertTrue(missing.getMessage().contains("language has no score"), missing.getMessage());

            controls.markControl("C0001", "t1", Map.of("content", 5, "language", 6), "invented meeting");
            RatingException early = assertThrows(RatingException.class, () -> controls.mixControls(3));
            assertTrue(early.getMessage().contains("run rate assign first"), early.getMessage());
            assertEquals(0, controls.controls().get(0).inQueues());

            s.assign(2, 5L, false);
            assertEquals(1, controls.mixControls(3), "the one rater of three who does not rate C0001 already");
            assertEquals(0, controls.mixControls(3), "mixing again adds nothing");
            ControlScripts.Control c = controls.controls().get(0);
            assertEquals(Map.of("content", 5, "language", 6), c.agreed());
            assertEquals(1, c.inQueues());
        }
    }

    /**
     * Worked by hand: agreed 5/5 on each script; the rater gives 5/5, 6/5, 7/7, 8/6 in that order.
     * Differences 0,0 | 1,0 | 2,2 | 3,1: exact 3 of 8, adjacent 5 of 8, mean 9/8 = 1.125; per script
     * 0, 0.5, 2, 2; drift = mean(2, 2) - mean(0, 0.5) = 1.75.
     */
    @Test
    void monitor_workedExample_exactAdjacentMeanAndDrift() {
        Map<String, Integer> agreed = Map.of("content", 5, "language", 5);
        List<ControlScripts.ControlRating> ratings = List.of(
                new ControlScripts.ControlRating("R01", "A", "t1", Map.of("content", 5, "language", 5), agreed),
                new ControlScripts.ControlRating("R01", "B", "t2", Map.of("content", 6, "language", 5), agreed),
                new ControlScripts.ControlRating("R01", "C", "t3", Map.of("content", 7, "language", 7), agreed),
                new ControlScripts.ControlRating("R01", "D", "t4", Map.of("content", 8, "language", 6), agreed));
        ControlMonitor.RaterReport r = ControlMonitor.of(ratings, new ControlMonitor.Thresholds(0.5, 0.7, 1.0, 1.0))
                .get(0);
        assertEquals(4, r.scripts());
        assertEquals(8, r.pairs());
        assertEquals(3 / 8.0, r.exact(), 1e-12);
        assertEquals(5 / 8.0, r.adjacent(), 1e-12);
        assertEquals(1.125, r.meanDifference(), 1e-12);
        assertEquals(1.75, r.drift(), 1e-12);
        assertEquals(List.of(0.0, 0.5, 2.0, 2.0), r.timeline().stream().map(ControlMonitor.Point::meanDifference).toList());
        assertEquals(4, r.flags().size(), "every limit crossed: " + r.flags());
        assertTrue(ControlMonitor.of(ratings, new ControlMonitor.Thresholds(0.3, 0.6, 1.2, 2.0)).get(0).flags().isEmpty());
    }
}
