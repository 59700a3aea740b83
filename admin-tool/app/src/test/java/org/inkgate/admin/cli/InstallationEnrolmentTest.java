package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Enrolment as the invigilator and test owner do it, through the real programs in separate
 * processes: the client's {@code --installation} writes the enrolment file on the seat machine,
 * {@code installations enrol} adds it to the list, and {@code collect --installations} then trusts
 * that machine's packages and refuses another machine's with advice that can be followed.
 */
class InstallationEnrolmentTest {

    private static final Path DEMO = Path.of("src/demo");

    @TempDir
    Path dir;

    record Run(int code, String out) {
    }

    private Run run(String mainClass, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"), mainClass));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put("TEST_PASSPHRASE", "invented passphrase for the demo");
        pb.environment().put("TEST_PIN", "invented-pin-8642");
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS));
        return new Run(p.exitValue(), out);
    }

    private Run admin(String... args) throws Exception {
        return run(InkgateAdmin.class.getName(), args);
    }

    private Run client(String... args) throws Exception {
        return run("org.inkgate.client.Launcher", args);
    }

    /** The admin command line in this process, for steps that need no passphrase. */
    private static Run adminHere(String... args) {
        StringWriter out = new StringWriter();
        var cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(out, true));
        int code = cl.execute(args);
        return new Run(code, out.toString());
    }

    @Test
    void enrolledMachineIsTrustedAndAnUnenrolledOneIsRefusedWithAdvice() throws Exception {
        String keys = dir.resolve("keys").toString();
        assertEquals(0, admin("keys", "init", "--keys", keys, "--passphrase-env", "TEST_PASSPHRASE").code());
        String assignment = dir.resolve("assignment.csv").toString();
        Run forms = admin("forms", DEMO.resolve("exam-source").toString(), "--roster", DEMO.resolve("roster.csv").toString(),
                "--seed", "7", "--out", assignment);
        assertEquals(0, forms.code(), forms.out());
        String bundle = dir.resolve("demo.inkexam").toString();
        Run built = admin("bundle", DEMO.resolve("exam-source").toString(), "--out", bundle, "--keys", keys,
                "--roster", DEMO.resolve("roster.csv").toString(), "--assignment", assignment,
                "--passphrase-env", "TEST_PASSPHRASE", "--pin-env", "TEST_PIN");
        assertEquals(0, built.code(), built.out());

        // on the seat machine: the invigilator shows and exports the installation
        Path seatData = dir.resolve("seat-14-data");
        Path handOver = dir.resolve("usb-stick");
        Run shown = client("--installation", "--data", seatData.toString(), "--seat", "Room 2, seat 14",
                "--out", handOver.toString());
        assertEquals(0, shown.code(), shown.out());
        InstallationKey seat14 = InstallationKey.loadOrCreate(new ClientDataFolder(seatData));
        assertTrue(shown.out().contains("Installation fingerprint: " + seat14.fingerprint()), shown.out());
        Path enrolment = handOver.resolve("installation-" + seat14.fingerprint() + ".inkenrol");
        assertTrue(Files.isRegularFile(enrolment), shown.out());

        // a second machine that was never enrolled
        InstallationKey stranger = InstallationKey.loadOrCreate(new ClientDataFolder(dir.resolve("other-data")));

        // at the test owner's desk
        Path list = dir.resolve("installations.txt");
        Run enrolled = adminHere("installations", "enrol", "--list", list.toString(), enrolment.toString());
        assertEquals(0, enrolled.code(), enrolled.out());
        assertTrue(enrolled.out().contains("enrolled   " + seat14.fingerprint() + "  Room 2, seat 14"), enrolled.out());
        Run again = adminHere("installations", "enrol", "--list", list.toString(), enrolment.toString());
        assertTrue(again.out().contains("already in " + seat14.fingerprint()), again.out());
        Run listed = adminHere("installations", "list", "--list", list.toString());
        assertTrue(listed.out().contains("1 installation enrolled"), listed.out());
        assertTrue(listed.out().contains(seat14.fingerprint() + "  Room 2, seat 14"), listed.out());
        Run help = adminHere("installations", "enrol", "--help");
        assertEquals(0, help.code(), help.out());
        assertTrue(help.out().contains("--list=FILE"), help.out());

        Path packages = dir.resolve("packages");
        Files.createDirectories(packages);
        OwnerKeyStore.PublicKeys owner = new OwnerKeyStore(Path.of(keys)).publicKeys();
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(owner.signingFingerprint())))
                .open(Path.of(bundle))) {
            var ownerEncryption = X25519.publicFromRaw(Base64.getDecoder().decode(owner.encryption()));
            List<RosterEntry> roster = b.manifest().roster();
            new SimulatedSitting(b.manifest(), b.manifestSha256(), seat14.key(), ownerEncryption)
                    .write(roster.get(0).candidateNumber(), roster.get(0).formId(), 1, 20, packages.resolve("seat14.inkresp"));
            new SimulatedSitting(b.manifest(), b.manifestSha256(), stranger.key(), ownerEncryption)
                    .write(roster.get(1).candidateNumber(), roster.get(1).formId(), 2, 20, packages.resolve("other.inkresp"));
        }

        Run collect = admin("collect", packages.toString(), "--store", dir.resolve("results.db").toString(),
                "--bundle", bundle, "--keys", keys, "--installations", list.toString(),
                "--passphrase-env", "TEST_PASSPHRASE");
        assertTrue(collect.out().contains("Imported 1,"), collect.out());
        assertTrue(collect.out().contains("refused 1."), collect.out());
        String refusal = collect.out().lines().filter(l -> l.startsWith("REFUSED")).findFirst().orElseThrow();
        assertTrue(refusal.contains("other.inkresp"), refusal);
        assertTrue(refusal.contains("not enrolled (installation fingerprint " + stranger.fingerprint() + ")"), refusal);
        assertTrue(refusal.contains("inkgate-client --installation"), refusal);
        assertTrue(refusal.contains("--any-installation"), refusal);
        assertFalse(refusal.contains("published"), "test owners publish only their own key: " + refusal);
    }

    @Test
    void tamperedForeignAndDamagedEnrolmentFilesAreRefusedAndTheListIsLeftAlone() throws Exception {
        Path out = dir.resolve("out");
        Run shown = client("--installation", "--data", dir.resolve("data").toString(), "--seat", "seat 3",
                "--out", out.toString());
        assertEquals(0, shown.code(), shown.out());
        Path good;
        try (Stream<Path> files = Files.list(out)) {
            good = files.findFirst().orElseThrow();
        }
        Path list = dir.resolve("installations.txt");
        Files.writeString(list, "# kept by hand\n");

        Path tampered = dir.resolve("tampered.inkenrol");
        Files.writeString(tampered, Files.readString(good).replace("seat 3", "seat 4"));
        Run refused = adminHere("installations", "enrol", "--list", list.toString(), good.toString(), tampered.toString());
        assertEquals(InkgateAdmin.PROBLEMS, refused.code(), refused.out());
        assertTrue(refused.out().contains("tampered.inkenrol: the signature does not match"), refused.out());
        assertEquals("# kept by hand\n", Files.readString(list), "one bad file adds nothing, not even the good one");

        Path foreign = dir.resolve("bundle.inkenrol");
        Files.write(foreign, new byte[] {'P', 'K', 3, 4, 0x1b, '[', '2', 'J'});
        Run notJson = adminHere("installations", "enrol", "--list", list.toString(), foreign.toString());
        assertEquals(InkgateAdmin.PROBLEMS, notJson.code());
        assertTrue(notJson.out().contains("bundle.inkenrol: this is not an installation enrolment file"), notJson.out());
        assertFalse(notJson.out().contains("\u001b"), "no terminal escape reaches the output");

        Path other = dir.resolve("other.inkenrol");
        Files.writeString(other, "{\"format\": \"inkgate-response-content\", \"schemaVersion\": 1}");
        Run wrongKind = adminHere("installations", "enrol", "--list", list.toString(), other.toString());
        assertEquals(InkgateAdmin.PROBLEMS, wrongKind.code());
        assertTrue(wrongKind.out().contains("not an installation enrolment file"), wrongKind.out());

        Run missing = adminHere("installations", "enrol", "--list", list.toString(), dir.resolve("nowhere.inkenrol").toString());
        assertEquals(InkgateAdmin.PROBLEMS, missing.code());
        assertTrue(missing.out().contains("nowhere.inkenrol: there is no such file"), missing.out());

        Files.writeString(list, "# kept by hand\nnot-a-fingerprint\n");
        Run badList = adminHere("installations", "list", "--list", list.toString());
        assertEquals(InkgateAdmin.PROBLEMS, badList.code());
        assertTrue(badList.out().contains("line 2: \"not-a-fingerprint\" is not an installation fingerprint"), badList.out());
    }
}
