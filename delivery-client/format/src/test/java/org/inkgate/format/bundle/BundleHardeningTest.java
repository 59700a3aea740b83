package org.inkgate.format.bundle;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.lang.management.ManagementFactory;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.DuplicateEntry;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.SignedBundles;
import org.inkgate.format.testutil.TempFolders;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Attacks found in the format review, each kept as a test that builds the hostile file. */
class BundleHardeningTest {

    @TempDir
    Path dir;
    Path good;
    final BundleReader reader = new BundleReader(TrustPolicy.anySigner());

    @BeforeEach
    void writeGoodBundle() throws Exception {
        good = SignedBundles.good(dir);
    }

    private byte[] entry(String name) throws Exception {
        return SignedBundles.entry(good, name);
    }

    private Path signed(String fileName, byte[] manifest, Map<String, byte[]> extra) throws Exception {
        return SignedBundles.signedWith(dir, fileName, manifest, extra);
    }

    @Test
    void open_namesEqualIgnoringCase_isRefusedOnEveryPlatform() throws Exception {
        // on NTFS or APFS both would unpack into one file, the later one replacing a checked prompt
        Path file = signed("case.inkexam", entry("manifest.json"), Map.of("prompts/T1.md", "Another prompt.\n".getBytes(StandardCharsets.UTF_8)));
        DuplicateEntry refusal = assertThrows(DuplicateEntry.class, () -> reader.open(file).close());
        assertTrue(refusal.getMessage().contains("ignores case"), refusal.getMessage());
    }

    @Test
    void open_entryThatIsBothFileAndFolder_isRefusedAndLeavesNothingBehind() throws Exception {
        Path file = signed("clash.inkexam", entry("manifest.json"), Map.of("prompts/t1.md/x", new byte[] {2}));
        long before = TempFolders.count();
        DuplicateEntry refusal = assertThrows(DuplicateEntry.class, () -> reader.open(file).close());
        assertTrue(refusal.getMessage().contains("also a file"), refusal.getMessage());
        assertEquals(before, TempFolders.count());
    }

    @Test
    void open_lowOrderEncryptionKey_isRefusedAtOpenNotAtTheEndOfTheSitting() throws Exception {
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(entry("manifest.json"));
        ((ObjectNode) tree.get("ownerKeys")).put("encryption", Base64.getEncoder().encodeToString(new byte[32]));
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> reader.open(signed("lowkey.inkexam", Json.write(tree), Map.of())).close());
        assertTrue(refusal.getMessage().contains("not a usable X25519 public key"), refusal.getMessage());
    }

    @Test
    void open_editedSchemaVersion_isAnAlteredFileNotANewerOne() throws Exception {
        String edited = new String(entry("manifest.json"), StandardCharsets.UTF_8)
                .replace("\"schemaVersion\" : 1", "\"schemaVersion\" : 7");
        Path file = dir.resolve("edited.inkexam");
        HostileArchives.replaceEntry(good, file, "manifest.json", edited.getBytes(StandardCharsets.UTF_8));
        assertThrows(BadSignature.class, () -> reader.open(file).close());
    }

    @Test
    void open_hugeUnsignedManifest_isRefusedFromItsHeaderWithoutParsing() throws Exception {
        // 7.5 MB of "[],[],...": as a JSON tree this would cost over 20 times its size
        int elements = 2_500_000;
        StringBuilder json = new StringBuilder(elements * 3 + 2).append('[');
        for (int i = 0; i < elements; i++) {
            json.append(i == 0 ? "[]" : ",[]");
        }
        byte[] manifest = json.append(']').toString().getBytes(StandardCharsets.US_ASCII);
        Path file = dir.resolve("tree.inkexam");
        HostileArchives.writeRaw(file, Map.entry("manifest.json", manifest), Map.entry("manifest.sig", new byte[64]));
        long before = allocatedByThisThread();
        SizeLimitExceeded refusal = assertThrows(SizeLimitExceeded.class, () -> reader.open(file).close());
        long allocated = allocatedByThisThread() - before;
        assertTrue(refusal.getMessage().contains("manifest.json"), refusal.getMessage());
        assertTrue(allocated < manifest.length, "allocated " + (allocated >> 20) + " MiB to refuse it");
    }

    @Test
    void open_signatureOfWrongLength_isRefusedAsBadSignature() throws Exception {
        Path file = dir.resolve("longsig.inkexam");
        HostileArchives.replaceEntry(good, file, "manifest.sig", Arrays.copyOf(entry("manifest.sig"), 65));
        BadSignature refusal = assertThrows(BadSignature.class, () -> reader.open(file).close());
        assertTrue(refusal.getMessage().contains("65 bytes"), refusal.getMessage());
    }

    /** RFC 8032 section 5.1.7: a verifier must reject S >= L, or signatures become malleable. */
    @Test
    void open_signatureWithGroupOrderAddedToS_isRefused() throws Exception {
        byte[] sig = entry("manifest.sig");
        BigInteger l = BigInteger.TWO.pow(252).add(new BigInteger("27742317777372353535851937790883648493"));
        BigInteger s = new BigInteger(1, reverse(Arrays.copyOfRange(sig, 32, 64))).add(l);
        byte[] malleated = sig.clone();
        System.arraycopy(reverse(toFixedBigEndian(s, 32)), 0, malleated, 32, 32);
        Path file = dir.resolve("malleated.inkexam");
        HostileArchives.replaceEntry(good, file, "manifest.sig", malleated);
        assertThrows(BadSignature.class, () -> reader.open(file).close());
    }

    @Test
    void write_rosterEntryWithoutForm_isRefusedBeforeWriting() {
        BundleManifest m = SampleExam.manifest();
        BundleManifest noForm = new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), m.tasks(), m.conditions(), m.forms(), m.questionnaires(), m.packs(),
                List.of(new RosterEntry("1001", null, 0, false, false)), m.ownerKeys(), m.invigilatorPin(), m.seal(),
                m.practice(), m.entries());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BundleWriter(TestKeys.OWNER_SIGNING).write(noForm, SampleExam.contents(), dir.resolve("noform.inkexam")));
        assertTrue(e.getMessage().contains("no form"), e.getMessage());
    }

    @Test
    void open_pinHashThatCouldNeverMatch_isRefusedAtOpen() throws Exception {
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(entry("manifest.json"));
        ObjectNode pin = tree.putObject("invigilatorPin");
        pin.put("salt", "not base64!");
        pin.put("iterations", 5);
        pin.put("hash", Base64.getEncoder().encodeToString(new byte[8]));
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> reader.open(signed("pin.inkexam", Json.write(tree), Map.of())).close());
        assertTrue(refusal.getMessage().contains("invigilatorPin.iterations 5")
                && refusal.getMessage().contains("invigilatorPin.salt")
                && refusal.getMessage().contains("invigilatorPin.hash"), refusal.getMessage());
    }

    @Test
    void open_sealWithUnsealedEntries_isRefused() throws Exception {
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(entry("manifest.json"));
        ObjectNode seal = tree.putObject("seal");
        seal.put("kdf", SealSpec.KDF);
        seal.put("iterations", 600_000);
        seal.put("salt", Base64.getEncoder().encodeToString(new byte[16]));
        seal.put("check", Base64.getEncoder().encodeToString(new byte[40]));
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> reader.open(signed("halfsealed.inkexam", Json.write(tree), Map.of())).close());
        assertTrue(refusal.getMessage().contains("is not sealed in a sealed bundle"), refusal.getMessage());
    }

    @Test
    void write_warningInAnUntimedTask_isRefused() {
        BundleManifest m = SampleExam.manifest();
        TaskSpec t = m.tasks().get(0);
        List<TaskSpec> tasks = List.of(new TaskSpec(t.id(), t.title(), t.promptFile(), 0, List.of(5), t.words()), m.tasks().get(1));
        BundleManifest untimed = new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), tasks, m.conditions(), m.forms(), m.questionnaires(), m.packs(), m.roster(),
                m.ownerKeys(), m.invigilatorPin(), m.seal(), m.practice(), m.entries());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new BundleWriter(TestKeys.OWNER_SIGNING)
                .write(untimed, SampleExam.contents(), dir.resolve("untimed.inkexam")));
        assertTrue(e.getMessage().contains("not inside the time limit"), e.getMessage());
    }

    @Test
    void writeSealed_shortReleaseCode_isRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new BundleWriter(TestKeys.OWNER_SIGNING)
                .writeSealed(SampleExam.manifest(), SampleExam.contents(), "short-code".toCharArray(), dir.resolve("s.inkexam")));
        assertTrue(e.getMessage().contains("offline"), e.getMessage());
    }

    @Test
    void generate_releaseCode_isFourGroupsOfFiveFromTheReadableAlphabet() {
        Set<String> seen = new java.util.HashSet<>();
        for (int i = 0; i < 200; i++) {
            String code = new String(ReleaseCode.generate());
            assertTrue(code.matches("[0-9A-HJKMNP-TV-Z]{5}(-[0-9A-HJKMNP-TV-Z]{5}){3}"), code);
            seen.add(code);
        }
        assertEquals(200, seen.size(), "100 random bits: no repeats in 200 codes");
    }

    @Test
    void hash_pinShorterThanSix_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> PinHasher.hash("12345".toCharArray()));
    }


    private static long allocatedByThisThread() {
        return ((com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean()).getCurrentThreadAllocatedBytes();
    }

    private static byte[] reverse(byte[] b) {
        byte[] out = new byte[b.length];
        for (int i = 0; i < b.length; i++) {
            out[i] = b[b.length - 1 - i];
        }
        return out;
    }

    private static byte[] toFixedBigEndian(BigInteger value, int length) {
        byte[] be = value.toByteArray();
        byte[] out = new byte[length];
        int copy = Math.min(length, be.length);
        System.arraycopy(be, be.length - copy, out, length - copy, copy);
        return out;
    }
}
