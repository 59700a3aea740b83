package org.inkgate.client.sitting.killtest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.PinHash;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Pbkdf2;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.packs.policy.ResourcePolicy;
import org.junit.jupiter.api.Test;

/**
 * The kill test on the real client: {@link HookedClient} runs the real launcher (live
 * sitting, headless under Monocle as the UI tests run) on a test bundle with a test PIN, the test
 * types through it, kills it with SIGKILL at 24 seeded random moments, restarts it (the client
 * finds the unfinished sitting and asks for the PIN) and checks each recovered text: everything
 * acknowledged more than 0.5 s before the kill is there, and nothing that was not typed. Figures
 * go to target/kill-test/client-figures.txt.
 */
class ClientKillTest {

    private static final long SEED = 20261202L;
    /** 24 kills; a smaller number may be asked for while working on the test (-Dinkgate.killtest.kills=N). */
    private static final int KILLS = Integer.getInteger("inkgate.killtest.kills", 24);
    private static final String PIN = "kill-test-pin-4711";

    @Test
    void sigkillAtRandomMoments_restartedClientKeepsEverythingTypedMoreThanHalfASecondBefore() throws Exception {
        // kept under target/ after the run, so that a failure can be examined (child stderr, sitting databases)
        Path dir = Path.of("target", "kill-test", "client-run").toAbsolutePath();
        deleteTree(dir);
        Files.createDirectories(dir);
        Path bundle = testBundle(dir);
        Path data = Files.createDirectories(dir.resolve("data"));
        Path output = Files.createDirectories(dir.resolve("out"));
        String ownerKey = Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(TestKeys.OWNER_SIGNING)));
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> command = new ArrayList<>(List.of(java, "--enable-native-access=ALL-UNNAMED"));
        // the headless platform the UI tests use (the parent pom's ui.test.argLine)
        for (String p : List.of("testfx.robot", "testfx.headless", "glass.platform", "monocle.platform", "prism.order",
                "java.awt.headless")) {
            if (System.getProperty(p) != null) {
                command.add("-D" + p + "=" + System.getProperty(p));
            }
        }
        command.addAll(List.of("-Dinkgate.killtest.pin=" + PIN, "-Dinkgate.killtest.output=" + output,
                "-Dinkgate.killtest.candidate=1001", "-cp", System.getProperty("java.class.path"), HookedClient.class.getName(),
                "--sitting", bundle.toString(), "--owner-key", ownerKey, "--data", data.toString()));
        Path stderr = dir.resolve("client-stderr.txt");
        KillHarness harness = new KillHarness(command, stderr, SEED, 120_000);
        KillHarness.Figures figures = harness.run(KILLS);
        String report = "client kill test (the real client through a test-only typing hook), seed " + SEED + ": "
                + (figures == null ? "did not finish" : figures.describe());
        Path out = Path.of("target", "kill-test");
        Files.createDirectories(out);
        Files.writeString(out.resolve("client-figures.txt"), report + "\n" + String.join("\n", harness.failures()) + "\n");
        System.out.println(report);
        assertNotNull(figures, () -> harness.failures() + "\n" + tail(stderr));
        assertEquals(List.of(), harness.failures());
        // a floor against a vacuous run, not a speed check: typing is timed, so a loaded machine acknowledges
        // fewer keystrokes (about 800 are sent over 24 kills; a run at load 13-15 acknowledged 332)
        assertTrue(figures.keystrokesAcknowledged() > 150, "the test typed too little to mean anything: " + report);
    }

    /**
     * The sample exam as a live bundle: the test PIN (PBKDF2 at the readers' minimum of 100,000
     * iterations, to keep 25 restarts quick), and no tools in any task, so that no restart waits
     * for the spelling engine.
     */
    static Path testBundle(Path folder) throws Exception {
        BundleManifest m = SampleExam.manifest(TestKeys.ownerKeys(), false);
        List<FormSpec> forms = m.forms().stream().map(f -> new FormSpec(f.id(),
                f.slots().stream().map(s -> new FormSlot(s.taskId(), s.conditionId(), ResourcePolicy.noTools())).toList(),
                f.preQuestionnaire(), f.postQuestionnaire(), f.sittingLimitSeconds())).toList();
        byte[] salt = Pbkdf2.newSalt();
        byte[] hash = Pbkdf2.derive(PIN.toCharArray(), salt, Pbkdf2.MIN_ITERATIONS, 32);
        PinHash pin = new PinHash(Base64.getEncoder().encodeToString(salt), Pbkdf2.MIN_ITERATIONS,
                Base64.getEncoder().encodeToString(hash));
        BundleManifest live = new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), m.tasks(), m.conditions(), forms, m.questionnaires(), m.packs(), m.roster(),
                m.ownerKeys(), pin, null, false, null);
        Path out = folder.resolve("kill-test.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(live, SampleExam.contents(), out);
        return out;
    }

    private static String tail(Path file) {
        try {
            if (!Files.exists(file)) {
                return "";
            }
            String s = Files.readString(file);
            return s.length() > 4000 ? s.substring(s.length() - 4000) : s;
        } catch (java.io.IOException e) {
            return e.getMessage();
        }
    }

    static void deleteTree(Path dir) throws java.io.IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (var paths = Files.walk(dir)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
