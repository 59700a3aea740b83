package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import org.inkgate.admin.core.testutil.StoreFixture;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a real rater process with SIGKILL (Process.destroyForcibly) after a draft was saved and a
 * rating submitted, without closing the store: both must be there when the desk is opened again.
 */
class KilledDeskTest {

    @TempDir
    Path dir;

    @Test
    void saveDraftAndSubmit_processKilledWithoutClosing_bothSurviveAndTheQueueResumes() throws Exception {
        Path db = InventedStore.make(dir, 6, List.of("t1"));
        // the store's durability settings (synchronous FULL, WAL) are checked in store.sqlite.SqliteDurabilityTest
        try (RatingStore s = StoreFixture.of(db).rating(InventedStore.EXAM)) {
            s.addRater("R01", "Invented one", null);
            s.addRater("R02", "Invented two", null);
            s.assign(2, 3L, false);
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "--enable-native-access=ALL-UNNAMED", "-cp",
                System.getProperty("java.class.path"), DeskProcess.class.getName(), db.toString(), "R01")
                .redirectErrorStream(true).start();
        String line;
        try (BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            while ((line = out.readLine()) != null && !line.startsWith("SAVED ")) {
                // skip driver warnings
            }
            assertTrue(line != null, "the rater process said it saved");
            p.destroyForcibly();
            assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        }
        String[] ids = line.split(" ");
        try (RatingStore s = StoreFixture.of(db).rating(InventedStore.EXAM)) {
            assertEquals(new RatingDesk.RatingSheet(Map.of("content", 4), "typed before the kill"),
                    s.sheet("R01", ids[1]).orElseThrow());
            assertEquals(Map.of("content", 7, "language", 6), s.submitted("R01", ids[2]).orElseThrow().scores());
            List<RatingDesk.QueueItem> q = s.queue("R01");
            assertEquals(false, q.get(0).done(), "a draft is not a rating");
            assertEquals(true, q.get(1).done());
            assertEquals(1, s.progress("R01").rated());
        }
    }
}
