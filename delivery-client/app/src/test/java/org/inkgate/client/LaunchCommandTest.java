package org.inkgate.client;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class LaunchCommandTest {

    @Test
    void parse_practiceAlone_opensTheDemo() {
        assertEquals(new LaunchCommand.PracticeDemo(), LaunchCommand.parse(List.of("--practice")));
    }

    @Test
    void parse_practiceWithFile_opensThatFile() {
        assertEquals(new LaunchCommand.PracticeFile(Path.of("exams/mock.inkexam")),
                LaunchCommand.parse(List.of("--practice", "exams/mock.inkexam")));
    }

    @Test
    void parse_installation_takesSeatOutputAndDataFolder() {
        assertEquals(new LaunchCommand.ShowInstallation(Path.of("/d"), "seat 4", Path.of("/stick")),
                LaunchCommand.parse(List.of("--installation", "--seat", "seat 4", "--out", "/stick", "--data", "/d")));
        assertEquals(new LaunchCommand.ShowInstallation(null, null, Path.of("")),
                LaunchCommand.parse(List.of("--installation")));
    }

    @Test
    void parse_installation_refusesOtherOptionsAndRepeats() {
        IllegalArgumentException other = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--installation", "--owner-key", "x")));
        assertTrue(other.getMessage().contains("\"--owner-key\" is not one of them"), other.getMessage());
        IllegalArgumentException twice = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--installation", "--seat", "a", "--seat", "b")));
        assertTrue(twice.getMessage().contains("--seat is given twice"), twice.getMessage());
        assertThrows(IllegalArgumentException.class, () -> LaunchCommand.parse(List.of("--installation", "--out")));
    }

    @Test
    void parse_help_showsHelp() {
        assertEquals(new LaunchCommand.ShowHelp(), LaunchCommand.parse(List.of("--help")));
    }

    @Test
    void parse_noArguments_isRefusedPointingToPractice() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LaunchCommand.parse(List.of()));
        assertTrue(e.getMessage().contains("--practice"), e.getMessage());
    }

    @Test
    void parse_unknownOption_isRefusedNamingIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--live")));
        assertTrue(e.getMessage().contains("\"--live\""), e.getMessage());
    }

    @Test
    void parse_practiceWithTwoFiles_isRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--practice", "a.inkexam", "b.inkexam")));
    }

    @Test
    void parse_practiceFollowedByOption_isRefusedAsNotAFile() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--practice", "--help")));
        assertTrue(e.getMessage().contains("is not a bundle file"), e.getMessage());
    }

    @Test
    void demoBundleCopy_builtClient_copiesTheEmbeddedBundleToATemporaryFile() throws Exception {
        Path copy = Launcher.demoBundleCopy();
        assertEquals("demo.inkexam", copy.getFileName().toString());
        assertTrue(java.nio.file.Files.size(copy) > 0);
    }

    @Test
    void parse_sittingWithOwnerKeyAndData_opensALiveSitting() {
        assertEquals(new LaunchCommand.Sitting(Path.of("exam.inkexam"), java.util.Set.of("ea65-29d8"), Path.of("d")),
                LaunchCommand.parse(List.of("--sitting", "exam.inkexam", "--owner-key", "ea65-29d8", "--data", "d")));
    }

    @Test
    void parse_bundleFileFirst_isASitting() {
        assertEquals(new LaunchCommand.Sitting(Path.of("exam.inkexam"), java.util.Set.of("k1", "k2"), null),
                LaunchCommand.parse(List.of("exam.inkexam", "--owner-key", "k1", "--owner-key", "k2")));
    }

    @Test
    void parse_sittingWithoutOwnerKey_isRefusedAskingForTheFingerprint() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--sitting", "exam.inkexam")));
        assertTrue(e.getMessage().contains("--owner-key"), e.getMessage());
    }

    @Test
    void parse_ownerKeyWithoutValue_isRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--sitting", "exam.inkexam", "--owner-key")));
        assertTrue(e.getMessage().contains("needs a value"), e.getMessage());
    }

    @Test
    void parse_demo_opensTheDemoSitting() {
        assertEquals(new LaunchCommand.DemoSitting(null), LaunchCommand.parse(List.of("--demo")));
        assertEquals(new LaunchCommand.DemoSitting(Path.of("x")), LaunchCommand.parse(List.of("--demo", "--data", "x")));
    }

    @Test
    void parse_demoWithABundle_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> LaunchCommand.parse(List.of("--demo", "exam.inkexam")));
    }

    @Test
    void demoOwnerKey_isTheFingerprintOfThePublishedDemoSeed() throws Exception {
        // the key the demo sitting trusts must be the demo keys' own (src/demo/keys, DEMO ONLY)
        byte[] seed = org.inkgate.format.crypto.Hex.parse(java.nio.file.Files.readString(
                org.inkgate.client.testutil.DemoBundles.SOURCE.resolve("keys/demo-only-not-secret-owner-signing.ed25519-seed.hex")).strip());
        assertEquals(org.inkgate.format.crypto.Fingerprint.of(org.inkgate.format.crypto.Ed25519.rawPublic(
                org.inkgate.format.crypto.Ed25519.publicOf(org.inkgate.format.crypto.Ed25519.privateFromSeed(seed)))),
                Launcher.DEMO_OWNER_KEY);
    }

    @Test
    void demoNote_builtClient_namesThePinAndMarksItDemoOnly() throws Exception {
        String note = Launcher.demoNote();
        assertTrue(note.startsWith("DEMO ONLY, NOT SECRET"), note);
        assertTrue(note.contains(org.inkgate.client.demo.DemoSittingBuild.readSitting(
                org.inkgate.client.testutil.DemoBundles.SOURCE).invigilatorPin()), note);
    }
}
