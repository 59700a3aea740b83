package org.inkgate.client.sitting.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.atomic.AtomicBoolean;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.store.SittingDatabase;
import org.inkgate.client.sitting.store.SqliteProcessLog;
import org.inkgate.format.response.EventType;

/**
 * Bench command (not a test): how long {@link SqliteProcessLog#record} plus
 * {@link SqliteProcessLog#snapshot} take on the calling (UI) thread, and how long after the call
 * each event is committed, seen from a second connection polling the database every millisecond.
 * Types {@code words} words of six keystrokes each, one keystroke every {@code gapMillis} ms, a
 * snapshot of the whole text offered after each, as the task workspace does.
 *
 * <p>Usage: {@code ProcessLogBench <folder> [words=600] [gapMillis=20] [rounds=3]}. Prints
 * medians, 99th percentiles and maxima in microseconds (call) and milliseconds (durable).
 */
public final class ProcessLogBench {

    private ProcessLogBench() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Files.createDirectories(Path.of(args[0]));
        int words = args.length > 1 ? Integer.parseInt(args[1]) : 600;
        long gap = args.length > 2 ? Long.parseLong(args[2]) : 20;
        int rounds = args.length > 3 ? Integer.parseInt(args[3]) : 3;
        for (int round = 1; round <= rounds; round++) {
            Path file = folder.resolve("bench-" + System.nanoTime() + SittingDatabase.SUFFIX);
            int keystrokes = words * 6;
            long[] callNanos = new long[keystrokes];
            long[] recordedAt = new long[keystrokes];
            long[] visibleAt = new long[keystrokes + 1];
            AtomicBoolean done = new AtomicBoolean();
            Thread watcher;
            try (SqliteProcessLog log = SqliteProcessLog.open(file, SittingClock.system())) {
                watcher = Thread.ofPlatform().start(() -> watch(file, visibleAt, done));
                StringBuilder text = new StringBuilder();
                for (int i = 0; i < keystrokes; i++) {
                    String key = i % 6 == 5 ? " " : String.valueOf((char) ('a' + i % 26));
                    int pos = text.length();
                    text.append(key);
                    long t0 = System.nanoTime();
                    log.record(EventType.TEXT_INSERT, "t1", Map.of("pos", pos, "len", 1, "text", key, "source", "typing"));
                    log.snapshot("t1", text.toString(), text.length());
                    long t1 = System.nanoTime();
                    callNanos[i] = t1 - t0;
                    recordedAt[i] = t0;
                    Thread.sleep(gap);
                }
                log.flush();
                Thread.sleep(50);
                done.set(true);
                watcher.join();
            }
            long[] durable = new long[keystrokes];
            for (int i = 0; i < keystrokes; i++) {
                durable[i] = visibleAt[i + 1] - recordedAt[i];
            }
            System.out.printf("round %d: %d keystrokes, text of %d chars; record+snapshot call: median %.1f us, p99 %.1f us,"
                    + " max %.1f us; committed after: median %.1f ms, p99 %.1f ms, max %.1f ms%n", round, keystrokes,
                    keystrokes, pct(callNanos, 50) / 1e3, pct(callNanos, 99) / 1e3, max(callNanos) / 1e3,
                    pct(durable, 50) / 1e6, pct(durable, 99) / 1e6, max(durable) / 1e6);
            Files.deleteIfExists(file);
            Files.deleteIfExists(Path.of(file + "-wal"));
            Files.deleteIfExists(Path.of(file + "-shm"));
        }
    }

    /** Notes when each sequence number first becomes visible to another connection. */
    private static void watch(Path file, long[] visibleAt, AtomicBoolean done) {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath()); Statement s = c.createStatement()) {
            int seen = 0;
            while (!done.get()) {
                try (ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(seq), 0) FROM events")) {
                    int max = rs.getInt(1);
                    long now = System.nanoTime();
                    for (int q = seen + 1; q <= max && q < visibleAt.length; q++) {
                        visibleAt[q] = now;
                    }
                    seen = Math.max(seen, max);
                }
                Thread.sleep(1);
            }
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private static double pct(long[] values, int p) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        int index = (int) Math.ceil(p / 100.0 * sorted.length) - 1;
        return sorted[Math.max(0, index)];
    }

    private static double max(long[] values) {
        return Arrays.stream(values).max().orElse(0);
    }
}
