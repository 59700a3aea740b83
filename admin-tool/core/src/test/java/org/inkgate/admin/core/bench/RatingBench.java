package org.inkgate.admin.core.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.rating.InventedStore;
import org.inkgate.admin.core.testutil.StoreFixture;

/**
 * Bench command (not a test): per run a fresh store of invented responses; times the assignment
 * (plan and stored with blind ids), single desk submissions (one synced transaction each), and a
 * sheet-sized batch per rater, then the rule over everything. Prints each run and the medians.
 * Arguments: folder, candidates, tasks, raters, runs, desk submissions timed per run.
 */
public final class RatingBench {

    private RatingBench() {
    }

    public static void main(String[] args) throws Exception {
        Path root = Path.of(args[0]);
        int candidates = Integer.parseInt(args[1]);
        int tasks = Integer.parseInt(args[2]);
        int raters = Integer.parseInt(args[3]);
        int runs = Integer.parseInt(args[4]);
        int single = Integer.parseInt(args[5]);
        List<String> taskIds = new ArrayList<>();
        for (int t = 1; t <= tasks; t++) {
            taskIds.add("t" + t);
        }
        double[] assign = new double[runs];
        double[] perSubmit = new double[runs];
        double[] batch = new double[runs];
        double[] rule = new double[runs];
        for (int run = 0; run < runs; run++) {
            Path dir = Files.createDirectories(root.resolve("run" + run));
            Path db = InventedStore.make(dir, candidates, taskIds);
            try (RatingStore s = StoreFixture.of(db).rating(InventedStore.EXAM)) {
                for (int r = 1; r <= raters; r++) {
                    s.addRater(String.format("R%02d", r), "Invented " + r, null);
                }
                long t0 = System.nanoTime();
                s.assign(2, 1000L + run, false);
                assign[run] = (System.nanoTime() - t0) / 1e9;
                List<RatingDesk.QueueItem> q = s.queue("R01");
                t0 = System.nanoTime();
                for (int i = 0; i < single; i++) {
                    s.submit("R01", q.get(i).blindId(), sheet(i));
                }
                perSubmit[run] = (System.nanoTime() - t0) / 1e6 / single;
                t0 = System.nanoTime();
                for (int r = 1; r <= raters; r++) {
                    String id = String.format("R%02d", r);
                    Map<String, RatingDesk.RatingSheet> all = new LinkedHashMap<>();
                    int i = 0;
                    for (RatingDesk.QueueItem item : s.queue(id)) {
                        all.put(item.blindId(), sheet(i++ * r));
                    }
                    s.submitAll(id, all, "bench");
                }
                batch[run] = (System.nanoTime() - t0) / 1e9;
                t0 = System.nanoTime();
                int flagged = s.setRule(new DiscrepancyRule(1, null, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
                rule[run] = (System.nanoTime() - t0) / 1e9;
                System.out.printf("run %d: assign %.2f s, desk submit %.1f ms each, all sheets %.2f s, rule %.2f s"
                        + " (%d flagged)%n", run + 1, assign[run], perSubmit[run], batch[run], rule[run], flagged);
            }
        }
        System.out.printf("medians: assign %.2f s, desk submit %.1f ms, all sheets %.2f s, rule %.2f s%n", median(assign),
                median(perSubmit), median(batch), median(rule));
    }

    private static RatingDesk.RatingSheet sheet(int i) {
        return new RatingDesk.RatingSheet(Map.of("content", 1 + i % 9, "language", 1 + (i * 7) % 9), "");
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }
}
