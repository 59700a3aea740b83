package org.inkgate.client.sitting.killtest;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;

/**
 * Drives a typing process through the {@link TypingProtocol}, kills it with
 * {@link Process#destroyForcibly()} (SIGKILL on Linux and macOS, TerminateProcess on Windows) at
 * seeded random moments, restarts it, and checks each recovered text: it must be a text the
 * typing actually passed through (nothing that was not typed), and it must contain every
 * keystroke the process acknowledged more than {@value #GRACE_MILLIS} ms before the kill (the
 * issue's "at most the last 0.5 s of typing lost").
 */
final class KillHarness {

    /** Typing acknowledged at least this long before a kill must survive it (issue 4, item 7). */
    static final long GRACE_MILLIS = 500;

    /** What one run measured. */
    record Figures(int kills, int earlyKills, long keystrokesAcknowledged, int keystrokesLost, long maxLostMillis,
            int finalLength, long medianReadyMillis, long maxReadyMillis) {

        String describe() {
            return "kills=" + kills + " (of which before the editor was ready: " + earlyKills + ")"
                    + ", keystrokes acknowledged=" + keystrokesAcknowledged + ", keystrokes lost=" + keystrokesLost
                    + ", max lost window=" + maxLostMillis + " ms (age at the kill of the oldest lost keystroke)"
                    + ", final text " + finalLength + " chars; start to typable editor: median " + medianReadyMillis
                    + " ms, max " + maxReadyMillis + " ms";
        }
    }

    /** One run of the process between two kills. */
    private record Cycle(String startText, List<Integer> sent, List<Long> ackNanos, long killNanos) {
    }

    private static final int[] ALPHABET = "abcdefghijklmnopqrstuvwxyz     ,.'é".codePoints().toArray();

    private final List<String> command;
    private final Path stderr;
    private final Random random;
    private final long readyTimeoutMillis;
    private final List<String> failures = new ArrayList<>();

    KillHarness(List<String> command, Path stderr, long seed, long readyTimeoutMillis) {
        this.command = List.copyOf(command);
        this.stderr = stderr;
        this.random = new Random(seed);
        this.readyTimeoutMillis = readyTimeoutMillis;
    }

    /** Problems found; empty when every recovery kept what it must. */
    List<String> failures() {
        return failures;
    }

    Figures run(int kills) throws Exception {
        String confirmed = null;
        Cycle previous = null;
        int early = 0;
        long acked = 0;
        int lost = 0;
        long maxLostMillis = 0;
        List<Long> readyMillis = new ArrayList<>();
        for (int k = 0; k <= kills; k++) {
            boolean last = k == kills;
            // about one kill in six lands while the process is still starting or recovering
            boolean killEarly = !last && random.nextInt(6) == 0;
            long spawned = System.nanoTime();
            Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.appendTo(stderr.toFile())).start();
            LinkedBlockingQueue<Object[]> lines = new LinkedBlockingQueue<>();
            Thread reader = Thread.ofPlatform().daemon(true).start(() -> readLines(p, lines));
            Writer stdin = new OutputStreamWriter(p.getOutputStream(), StandardCharsets.UTF_8);
            String recovered = null;
            List<Integer> sent = new ArrayList<>();
            List<Long> ackNanos = new ArrayList<>();
            long killAt;
            if (killEarly) {
                early++;
                sleep(random.nextInt(900));
                killAt = System.nanoTime();
                p.destroyForcibly();
            } else {
                recovered = awaitReady(p, lines);
                readyMillis.add(TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - spawned));
                if (recovered == null) {
                    p.destroyForcibly();
                    failures.add("run " + k + ": the process did not become ready within " + readyTimeoutMillis
                            + " ms (see " + stderr + ")");
                    return null;
                }
                if (previous != null) {
                    long[] result = check(k, previous, recovered);
                    lost += (int) result[0];
                    maxLostMillis = Math.max(maxLostMillis, result[1]);
                } else if (confirmed != null && !confirmed.equals(recovered)) {
                    failures.add("run " + k + ": recovered text differs from the text confirmed before");
                }
                confirmed = recovered;
                previous = null;
                if (last) {
                    stdin.close();
                    p.destroyForcibly();
                    p.waitFor(30, TimeUnit.SECONDS);
                    long[] ready = readyMillis.stream().mapToLong(Long::longValue).sorted().toArray();
                    return new Figures(kills, early, acked, lost, maxLostMillis, recovered.length(), ready[ready.length / 2],
                            ready[ready.length - 1]);
                }
                long typingMillis = 300 + random.nextInt(2700);
                long until = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(typingMillis);
                StringBuilder model = new StringBuilder(recovered);
                try {
                    while (System.nanoTime() < until) {
                        int key = model.length() > 0 && random.nextInt(12) == 0 ? -1 : ALPHABET[random.nextInt(ALPHABET.length)];
                        stdin.write(TypingProtocol.command(key) + "\n");
                        stdin.flush();
                        sent.add(key);
                        apply(model, key);
                        drainAcks(lines, ackNanos);
                        sleep(15 + random.nextInt(50));
                    }
                } catch (IOException e) {
                    failures.add("run " + k + ": the process stopped taking keystrokes before the kill: " + e.getMessage());
                }
                drainAcks(lines, ackNanos);
                killAt = System.nanoTime();
                p.destroyForcibly();
            }
            p.waitFor(30, TimeUnit.SECONDS);
            reader.join(5_000);
            if (killEarly) {
                // nothing was typed: the check of the last typing run waits for the next ready process
                if (previous == null) {
                    previous = new Cycle(confirmed == null ? "" : confirmed, List.of(), List.of(), killAt);
                }
                continue;
            }
            drainAcks(lines, ackNanos);
            // acknowledgements read before the kill are the ones that count
            List<Long> acksBeforeKill = new ArrayList<>();
            for (long t : ackNanos) {
                if (t <= killAt) {
                    acksBeforeKill.add(t);
                }
            }
            acked += acksBeforeKill.size();
            String start = confirmed;
            previous = new Cycle(start == null ? "" : start, sent, acksBeforeKill, killAt);
        }
        throw new IllegalStateException("unreachable");
    }

    /**
     * Checks a recovered text against the cycle before it.
     *
     * @return keystrokes lost and the age at the kill (ms) of the oldest lost acknowledged keystroke
     */
    private long[] check(int run, Cycle c, String recovered) {
        List<String> states = new ArrayList<>();
        StringBuilder text = new StringBuilder(c.startText());
        states.add(text.toString());
        for (int key : c.sent()) {
            apply(text, key);
            states.add(text.toString());
        }
        int match = -1;
        for (int j = states.size() - 1; j >= 0; j--) {
            if (states.get(j).equals(recovered)) {
                match = j;
                break;
            }
        }
        if (match < 0) {
            failures.add("run " + run + ": the recovered text (" + recovered.length() + " chars) is not any text the typing"
                    + " passed through: something not typed appeared, or a middle part was lost");
            return new long[] {0, 0};
        }
        long graceNanos = TimeUnit.MILLISECONDS.toNanos(GRACE_MILLIS);
        int required = 0;
        for (long t : c.ackNanos()) {
            if (t <= c.killNanos() - graceNanos) {
                required++;
            }
        }
        if (match < required) {
            failures.add("run " + run + ": " + (required - match) + " keystrokes acknowledged more than " + GRACE_MILLIS
                    + " ms before the kill were lost (recovered up to keystroke " + match + " of " + required + " required)");
        }
        int ackedCount = c.ackNanos().size();
        int lostKeys = Math.max(0, ackedCount - match);
        long lostMillis = lostKeys == 0 ? 0 : TimeUnit.NANOSECONDS.toMillis(c.killNanos() - c.ackNanos().get(match));
        return new long[] {lostKeys, lostMillis};
    }

    private static void apply(StringBuilder text, int key) {
        if (key >= 0) {
            text.appendCodePoint(key);
        } else if (text.length() > 0) {
            int end = text.length();
            int from = Character.isLowSurrogate(text.charAt(end - 1)) && end >= 2 ? end - 2 : end - 1;
            text.delete(from, end);
        }
    }

    private String awaitReady(Process p, LinkedBlockingQueue<Object[]> lines) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(readyTimeoutMillis);
        while (System.nanoTime() < deadline) {
            Object[] line = lines.poll(200, TimeUnit.MILLISECONDS);
            if (line != null && ((String) line[0]).startsWith(TypingProtocol.READY)) {
                return TypingProtocol.readyText((String) line[0]);
            }
            if (line == null && !p.isAlive() && lines.isEmpty()) {
                return null;
            }
        }
        return null;
    }

    private static void drainAcks(LinkedBlockingQueue<Object[]> lines, List<Long> ackNanos) {
        for (Object[] line = lines.poll(); line != null; line = lines.poll()) {
            String text = (String) line[0];
            if (text.startsWith(TypingProtocol.ACK)) {
                int n = Integer.parseInt(text.substring(TypingProtocol.ACK.length()).strip());
                while (ackNanos.size() < n) {
                    ackNanos.add((Long) line[1]);
                }
            }
        }
    }

    private static void readLines(Process p, LinkedBlockingQueue<Object[]> lines) {
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                lines.add(new Object[] {line, System.nanoTime()});
                if (!line.startsWith(TypingProtocol.ACK)) {
                    System.err.println("[child] " + (line.length() > 200 ? line.substring(0, 200) + "..." : line));
                }
            }
        } catch (IOException e) {
            // the process was killed
        }
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
