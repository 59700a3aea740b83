package org.inkgate.rehearsal;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.inkgate.client.sitting.killtest.HookedClient;
import org.inkgate.client.sitting.killtest.TypingProtocol;

/**
 * The first part of a killed candidate's sitting: the real client in its own process
 * ({@link HookedClient}, the client's launcher plus the kill test's typing hook, from the client's
 * test-jar), walked through set-up, sign-in and instructions to the first task, fed keystrokes
 * until each is acknowledged, then killed with SIGKILL ({@link Process#destroyForcibly()}) once the
 * log has had well over its half second to make them durable. Its recovery is done by the
 * rehearsal in a {@link Seat} over the same client data folder.
 */
final class KilledClient {

    private KilledClient() {
    }

    static void typeThenKill(Path bundle, String ownerFingerprint, Path data, Path output, String pin, String candidate,
            String text, Path stderr) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED"));
        // the headless platform of the UI tests (the parent pom's ui.test.argLine)
        for (String p : List.of("testfx.robot", "testfx.headless", "glass.platform", "monocle.platform", "prism.order",
                "java.awt.headless")) {
            if (System.getProperty(p) != null) {
                command.add("-D" + p + "=" + System.getProperty(p));
            }
        }
        command.addAll(List.of("-Dinkgate.killtest.pin=" + pin, "-Dinkgate.killtest.output=" + output,
                "-Dinkgate.killtest.candidate=" + candidate, "-cp", System.getProperty("java.class.path"),
                HookedClient.class.getName(), "--sitting", bundle.toString(), "--owner-key", ownerFingerprint,
                "--data", data.toString()));
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.appendTo(stderr.toFile())).start();
        BlockingQueue<String> lines = new LinkedBlockingQueue<>();
        Thread reader = Thread.ofPlatform().daemon(true).start(() -> {
            try (BufferedReader in = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                for (String line = in.readLine(); line != null; line = in.readLine()) {
                    lines.add(line);
                }
            } catch (java.io.IOException ended) {
                // the process was killed
            }
        });
        try {
            String ready = awaitLine(lines, TypingProtocol.READY, p);
            if (!TypingProtocol.readyText(ready).isEmpty()) {
                throw new AssertionError("the killed client's first task did not start empty: " + ready);
            }
            Writer in = new OutputStreamWriter(p.getOutputStream(), StandardCharsets.UTF_8);
            int[] keys = text.codePoints().toArray();
            for (int key : keys) {
                in.write(TypingProtocol.command(key) + "\n");
            }
            in.flush();
            String ack;
            do {
                ack = awaitLine(lines, TypingProtocol.ACK, p);
            } while (Integer.parseInt(ack.substring(TypingProtocol.ACK.length()).strip()) < keys.length);
            // durable within half a second (ProcessLog's contract); wait three times that, then kill
            Thread.sleep(1_500);
        } finally {
            p.destroyForcibly();
            p.waitFor(60, TimeUnit.SECONDS);
            reader.join(10_000);
        }
    }

    private static String awaitLine(BlockingQueue<String> lines, String prefix, Process p) throws InterruptedException {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(240);
        while (System.nanoTime() < end) {
            String line = lines.poll(200, TimeUnit.MILLISECONDS);
            if (line == null) {
                if (!p.isAlive()) {
                    throw new AssertionError("the client ended (exit " + p.exitValue() + ") before printing " + prefix);
                }
                continue;
            }
            if (line.startsWith("HOOK-FAILED")) {
                throw new AssertionError("the typing hook failed: " + line);
            }
            if (line.startsWith(prefix)) {
                return line;
            }
        }
        throw new AssertionError("no " + prefix.strip() + " line from the client within 240 s");
    }
}
