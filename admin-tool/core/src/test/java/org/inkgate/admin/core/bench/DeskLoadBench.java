package org.inkgate.admin.core.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.InventedStore;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.testutil.StoreFixture;

/**
 * Bench command (not a test): rating desks on one PostgreSQL store (the tests' embedded server on
 * this machine), each desk its own thread and connection, submitting ratings at a set total rate
 * for a set time; prints the rate reached, the errors and the submission times. Issue 19 asks for
 * 20 concurrent desk submissions per second sustained without errors. A discrepancy rule is set
 * first, so submissions also flag responses and give them to adjudicators, as in real rating.
 * Arguments: folder (unused by PostgreSQL, kept for the fixture), desks, seconds per rate, then the
 * total rates per second to try, e.g. {@code /tmp/deskbench 20 30 20 40 80}.
 */
public final class DeskLoadBench {

    private DeskLoadBench() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createDirectories(Path.of(args[0]));
        int desks = Integer.parseInt(args[1]);
        int seconds = Integer.parseInt(args[2]);
        for (int i = 3; i < args.length; i++) {
            run(dir, desks, seconds, Integer.parseInt(args[i]));
        }
        System.exit(0); // the embedded server stops with the JVM
    }

    private static void run(Path dir, int desks, int seconds, int perSecond) throws Exception {
        int needed = perSecond * seconds;
        // two raters per response: enough responses that no desk runs out of its queue
        int candidates = needed / 2 + needed / 10 + desks * 2;
        StoreFixture store = InventedStore.make(StoreFixture.Kind.POSTGRESQL, dir, candidates, List.of("t1"));
        List<String> raters = new ArrayList<>();
        try (RatingStore s = store.rating(InventedStore.EXAM)) {
            for (int r = 1; r <= desks; r++) {
                raters.add(String.format("R%02d", r));
                s.addRater(raters.get(r - 1), "Invented rater " + r, null);
            }
            s.assign(2, 19L, false);
            s.setRule(new DiscrepancyRule(1, null, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
        }
        long periodNanos = TimeUnit.SECONDS.toNanos(1) * desks / perSecond; // each desk's interval
        ConcurrentLinkedQueue<Long> times = new ConcurrentLinkedQueue<>();
        ConcurrentLinkedQueue<String> errors = new ConcurrentLinkedQueue<>();
        AtomicInteger late = new AtomicInteger();
        CountDownLatch ready = new CountDownLatch(desks);
        CountDownLatch go = new CountDownLatch(1);
        List<Thread> threads = new ArrayList<>();
        long[] start = new long[1];
        for (int d = 0; d < desks; d++) {
            String rater = raters.get(d);
            int offset = d;
            Thread t = new Thread(() -> {
                try (RatingStore s = store.rating(InventedStore.EXAM)) {
                    List<RatingDesk.QueueItem> queue = s.queue(rater);
                    ready.countDown();
                    go.await();
                    long next = start[0] + periodNanos * offset / desks; // desks staggered over one interval
                    int i = 0;
                    while (next < start[0] + TimeUnit.SECONDS.toNanos(seconds) && i < queue.size()) {
                        long wait = next - System.nanoTime();
                        if (wait > 0) {
                            TimeUnit.NANOSECONDS.sleep(wait);
                        } else if (wait < -periodNanos) {
                            late.incrementAndGet();
                        }
                        RatingDesk.QueueItem item = queue.get(i++);
                        int n = i + offset;
                        long t0 = System.nanoTime();
                        try {
                            s.submit(rater, item.blindId(), new RatingDesk.RatingSheet(Map.of("content", 1 + n % 9,
                                    "language", 1 + (n * 7) % 9), ""));
                            times.add(System.nanoTime() - t0);
                        } catch (Exception e) {
                            errors.add(e.getMessage());
                        }
                        next += periodNanos;
                    }
                } catch (Exception e) {
                    errors.add("desk " + rater + ": " + e.getMessage());
                    ready.countDown();
                }
            });
            threads.add(t);
            t.start();
        }
        ready.await();
        start[0] = System.nanoTime();
        go.countDown();
        for (Thread t : threads) {
            t.join();
        }
        double elapsed = (System.nanoTime() - start[0]) / 1e9;
        double[] ms = times.stream().mapToDouble(x -> x / 1e6).sorted().toArray();
        System.out.printf("%d desks, target %d submissions/s for %d s: %d stored in %.1f s = %.1f/s; %d errors;"
                + " %d sent more than one interval late; submission median %.1f ms, p95 %.1f ms, max %.1f ms%n",
                desks, perSecond, seconds, ms.length, elapsed, ms.length / elapsed, errors.size(), late.get(),
                pct(ms, 0.5), pct(ms, 0.95), ms.length == 0 ? 0 : ms[ms.length - 1]);
        errors.stream().limit(3).forEach(e -> System.out.println("  error: " + e));
    }

    private static double pct(double[] sorted, double p) {
        return sorted.length == 0 ? 0 : sorted[Math.min(sorted.length - 1, (int) Math.floor(p * sorted.length))];
    }
}
