package org.inkgate.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.TrustPolicy;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.SampleResponse;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Flips every byte of small real files in turn, twice (all bits, then the lowest bit), and
 * proves each altered file is refused with a {@link FormatRefusal}: never opened, never a
 * crash of another kind, and never a temporary folder left behind. The figures are written
 * to target/mutation-report.txt.
 */
class MutationTest {

    private static final int[] MASKS = {0xFF, 0x01};

    @TempDir
    Path dir;

    @Test
    void everySingleByteChange_ofAnUnsealedBundle_isRefused() throws Exception {
        Path file = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), file);
        BundleReader reader = new BundleReader(TrustPolicy.trusting(java.util.Set.of(TestKeys.ownerFingerprint())));
        report("unsealed bundle", mutateEveryByte(file, path -> reader.open(path).close()));
    }

    @Test
    void everySingleByteChange_ofASealedBundle_isRefused() throws Exception {
        Path file = dir.resolve("sealed.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).writeSealed(SampleExam.manifest(), SampleExam.contents(),
                "river-lamp-42".toCharArray(), file);
        BundleReader reader = new BundleReader(TrustPolicy.trusting(java.util.Set.of(TestKeys.ownerFingerprint())));
        // opening checks every stored byte; unsealing (PBKDF2, slow by design) is not needed to refuse
        report("sealed bundle", mutateEveryByte(file, path -> reader.open(path).close()));
    }

    @Test
    void everySingleByteChange_ofAResponsePackage_isRefused() throws Exception {
        Path file = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), SampleResponse.events(30), file);
        ResponsePackageReader reader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION);
        report("response package", mutateEveryByte(file, reader::open));
    }

    /**
     * A CRC-32 is no defence against someone who recomputes it: here every byte of every entry's
     * content is flipped and the archive rewritten with correct CRCs and headers, so each change
     * must be caught by the signature, the digests, the AES-GCM tag or the JSON checks.
     */
    @Test
    void everyContentByteChange_withRecomputedChecksums_isRefusedByTheSignatureLayers() throws Exception {
        Path bundle = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), bundle);
        BundleReader bundleReader = new BundleReader(TrustPolicy.trusting(java.util.Set.of(TestKeys.ownerFingerprint())));
        report("bundle entries, CRC recomputed", mutateEveryContentByte(bundle, path -> bundleReader.open(path).close()));

        Path pkg = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), SampleResponse.events(30), pkg);
        ResponsePackageReader packageReader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION);
        report("response package entries, CRC recomputed", mutateEveryContentByte(pkg, packageReader::open));
    }

    private Outcome mutateEveryContentByte(Path original, Opener opener) throws Exception {
        Map<String, byte[]> entries = new java.util.LinkedHashMap<>();
        try (var zip = org.inkgate.format.archive.SafeZipReader.open(original, org.inkgate.format.archive.ArchiveLimits.defaults())) {
            for (var entry : zip.entries()) {
                entries.put(entry.name(), zip.read(entry));
            }
        }
        Map<String, Integer> refusals = new TreeMap<>();
        List<String> accepted = new ArrayList<>();
        Path mutant = dir.resolve("content-mutant-" + original.getFileName());
        int mutations = 0;
        int bytes = 0;
        for (Map.Entry<String, byte[]> entry : entries.entrySet()) {
            byte[] content = entry.getValue();
            bytes += content.length;
            for (int i = 0; i < content.length; i++) {
                byte[] copy = content.clone();
                copy[i] ^= 0x01;
                org.inkgate.format.archive.HostileArchives.replaceEntry(original, mutant, entry.getKey(), copy);
                mutations++;
                try {
                    opener.open(mutant);
                    accepted.add(entry.getKey() + " byte " + i);
                } catch (FormatRefusal refusal) {
                    refusals.merge(refusal.getClass().getSimpleName(), 1, Integer::sum);
                }
            }
        }
        assertTrue(accepted.isEmpty(), "altered files were opened: " + accepted);
        assertTrue(!refusals.containsKey("MalformedArchive"), "the archive layer saw nothing wrong: " + refusals);
        return new Outcome(bytes, mutations, refusals);
    }

    /** Copies cut short (an interrupted USB copy) and bytes inserted or removed, which flips never make. */
    @Test
    void everyTruncationAndSeededInsertionsAndDeletions_areRefused() throws Exception {
        Path bundle = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), bundle);
        BundleReader bundleReader = new BundleReader(TrustPolicy.trusting(java.util.Set.of(TestKeys.ownerFingerprint())));
        report("bundle, truncated at every length", changeLength(bundle, path -> bundleReader.open(path).close(), 0));
        report("bundle, 2000 seeded insertions/deletions (seed 20261202)",
                changeLength(bundle, path -> bundleReader.open(path).close(), 2000));

        Path pkg = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), SampleResponse.events(30), pkg);
        ResponsePackageReader packageReader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION);
        report("response package, truncated at every length", changeLength(pkg, packageReader::open, 0));
        report("response package, 2000 seeded insertions/deletions (seed 20261202)",
                changeLength(pkg, packageReader::open, 2000));
    }

    /** With {@code randomCases} 0, every truncation; otherwise that many seeded insertions or deletions of 1-16 bytes. */
    private Outcome changeLength(Path original, Opener opener, int randomCases) throws Exception {
        byte[] bytes = Files.readAllBytes(original);
        long foldersBefore = tempFolders();
        Map<String, Integer> refusals = new TreeMap<>();
        List<String> accepted = new ArrayList<>();
        Path mutant = dir.resolve("length-mutant-" + original.getFileName());
        java.util.Random random = new java.util.Random(20261202L);
        int cases = randomCases == 0 ? bytes.length : randomCases;
        for (int c = 0; c < cases; c++) {
            byte[] changed;
            String what;
            if (randomCases == 0) {
                changed = java.util.Arrays.copyOf(bytes, c);
                what = "truncated to " + c;
            } else {
                int at = random.nextInt(bytes.length);
                int n = 1 + random.nextInt(16);
                if (random.nextBoolean()) {
                    byte[] inserted = new byte[n];
                    random.nextBytes(inserted);
                    changed = new byte[bytes.length + n];
                    System.arraycopy(bytes, 0, changed, 0, at);
                    System.arraycopy(inserted, 0, changed, at, n);
                    System.arraycopy(bytes, at, changed, at + n, bytes.length - at);
                    what = n + " bytes inserted at " + at;
                } else {
                    int cut = Math.min(n, bytes.length - at);
                    changed = new byte[bytes.length - cut];
                    System.arraycopy(bytes, 0, changed, 0, at);
                    System.arraycopy(bytes, at + cut, changed, at, bytes.length - at - cut);
                    what = cut + " bytes removed at " + at;
                }
            }
            Files.write(mutant, changed);
            try {
                opener.open(mutant);
                accepted.add(what);
            } catch (FormatRefusal refusal) {
                refusals.merge(refusal.getClass().getSimpleName(), 1, Integer::sum);
            }
        }
        assertTrue(accepted.isEmpty(), "changed files were opened: " + accepted);
        assertEquals(foldersBefore, tempFolders(), "no temporary folder is left behind by a refused file");
        return new Outcome(bytes.length, cases, refusals);
    }

    @FunctionalInterface
    interface Opener {
        void open(Path file) throws FormatRefusal, IOException;
    }

    record Outcome(int bytes, int mutations, Map<String, Integer> refusals) {
    }

    private Outcome mutateEveryByte(Path original, Opener opener) throws Exception {
        opener.open(original); // the unaltered file opens
        byte[] bytes = Files.readAllBytes(original);
        long foldersBefore = tempFolders();
        Map<String, Integer> refusals = new TreeMap<>();
        List<String> accepted = new ArrayList<>();
        Path mutant = dir.resolve("mutant-" + original.getFileName());
        int mutations = 0;
        for (int i = 0; i < bytes.length; i++) {
            for (int mask : MASKS) {
                byte[] copy = bytes.clone();
                copy[i] ^= (byte) mask;
                Files.write(mutant, copy);
                mutations++;
                try {
                    opener.open(mutant);
                    accepted.add("byte " + i + " ^ 0x" + Integer.toHexString(mask));
                } catch (FormatRefusal refusal) {
                    refusals.merge(refusal.getClass().getSimpleName(), 1, Integer::sum);
                }
            }
        }
        assertTrue(accepted.isEmpty(), "altered files were opened: " + accepted);
        assertEquals(foldersBefore, tempFolders(), "no temporary folder is left behind by a refused file");
        return new Outcome(bytes.length, mutations, refusals);
    }

    private static long tempFolders() throws IOException {
        // surefire points inkgate.tmpdir at this module's target folder, so other processes cannot disturb the count
        try (Stream<Path> s = Files.list(org.inkgate.format.io.PrivateTempFolder.parent())) {
            return s.filter(p -> p.getFileName().toString().startsWith("inkgate-")).count();
        }
    }

    private static synchronized void report(String what, Outcome outcome) throws IOException {
        Path target = Path.of("target", "mutation-report.txt");
        Files.createDirectories(target.getParent());
        String line = what + ": " + outcome.bytes() + " bytes, " + outcome.mutations() + " altered files, all refused: "
                + outcome.refusals() + System.lineSeparator();
        Files.writeString(target, line, java.nio.file.StandardOpenOption.CREATE, java.nio.file.StandardOpenOption.APPEND);
    }
}
