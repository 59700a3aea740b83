package org.inkgate.admin.core.rating;

import java.nio.file.Path;
import java.util.Map;
import org.inkgate.admin.core.testutil.StoreFixture;

/**
 * A rater's session in its own process, for {@link KilledDeskTest}: saves a draft of the first
 * item, submits the second, says so on standard output and then waits to be killed.
 * Arguments: store file, rater id.
 */
public final class DeskProcess {

    private DeskProcess() {
    }

    public static void main(String[] args) throws Exception {
        RatingStore s = StoreFixture.of(Path.of(args[0])).rating(InventedStore.EXAM);
        var queue = s.queue(args[1]);
        s.saveDraft(args[1], queue.get(0).blindId(), new RatingDesk.RatingSheet(Map.of("content", 4), "typed before the kill"));
        s.submit(args[1], queue.get(1).blindId(), new RatingDesk.RatingSheet(Map.of("content", 7, "language", 6), ""));
        System.out.println("SAVED " + queue.get(0).blindId() + " " + queue.get(1).blindId());
        System.out.flush();
        Thread.sleep(120_000); // never closes the store: the test kills this process
    }
}
