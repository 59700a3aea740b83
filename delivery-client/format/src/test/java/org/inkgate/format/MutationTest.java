package org.inkgate.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.SampleResponse;
import org.inkgate.format.testutil.TempFolders;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Damages small real files in every way a byte-level accident or a careless attacker can, and
 * proves each damaged file is refused with a {@link FormatRefusal}: never opened, never a crash
 * of another kind, and never a temporary folder left behind. The figures are appended to
 * target/mutation-report.txt for the closing notes.
 */
class MutationTest {

    private static final long SEED = 20261202L;

    @TempDir
    Path dir;

    /** Something that opens a file completely or refuses it. */
    @FunctionalInterface
    interface Opener {
        void open(Path file) throws FormatRefusal, IOException;
    }

    /** One damaged copy: how it was made, and its bytes (made on demand to keep memory flat). */
    interface Damage {
        String describe();

        byte[] bytes() throws Exception;
    }

    record Outcome(int cases, Map<String, Integer> refusals) {
    }

    @Test
    void everySingleByteFlip_ofAnUnsealedBundle_isRefused() throws Exception {
        Path file = bundle(false);
        report("unsealed bundle, every byte flipped (all bits, then lowest bit)", refuseAll(flips(file), bundleOpener()));
    }

    @Test
    void everySingleByteFlip_ofASealedBundle_isRefused() throws Exception {
        // opening checks every stored byte; unsealing (PBKDF2, slow by design) is not needed to refuse
        Path file = bundle(true);
        report("sealed bundle, every byte flipped (all bits, then lowest bit)", refuseAll(flips(file), bundleOpener()));
    }

    @Test
    void everySingleByteFlip_ofAResponsePackage_isRefused() throws Exception {
        Path file = responsePackage();
        report("response package, every byte flipped (all bits, then lowest bit)", refuseAll(flips(file), packageOpener()));
    }

    /**
     * A CRC-32 is no defence against someone who recomputes it: every byte of every entry's
     * content is flipped and the archive rewritten with correct CRCs and headers, so each change
     * must be caught by the signature, the digests, the AES-GCM tag or the JSON checks.
     */
    @Test
    void everyContentByteFlip_withRecomputedChecksums_isRefusedByTheSignatureLayers() throws Exception {
        Outcome bundle = refuseAll(contentFlips(bundle(false)), bundleOpener());
        Outcome pkg = refuseAll(contentFlips(responsePackage()), packageOpener());
        assertTrue(!bundle.refusals().containsKey("MalformedArchive") && !pkg.refusals().containsKey("MalformedArchive"),
                "the archive layer saw nothing wrong, so the deeper checks must have refused: " + bundle + pkg);
        report("bundle, every content byte flipped, CRCs recomputed", bundle);
        report("response package, every content byte flipped, CRCs recomputed", pkg);
    }

    /** Copies cut short (an interrupted USB copy) and bytes inserted or removed, which flips never make. */
    @Test
    void everyTruncationAndSeededInsertionsAndDeletions_areRefused() throws Exception {
        Path bundle = bundle(false);
        Path pkg = responsePackage();
        report("bundle, truncated at every length", refuseAll(truncations(bundle), bundleOpener()));
        report("bundle, 2000 insertions/deletions of 1-16 bytes, seed " + SEED, refuseAll(lengthChanges(bundle, 2000), bundleOpener()));
        report("response package, truncated at every length", refuseAll(truncations(pkg), packageOpener()));
        report("response package, 2000 insertions/deletions of 1-16 bytes, seed " + SEED, refuseAll(lengthChanges(pkg, 2000), packageOpener()));
    }

    private Path bundle(boolean sealed) throws Exception {
        Path file = dir.resolve(sealed ? "sealed.inkexam" : "exam.inkexam");
        BundleWriter writer = new BundleWriter(TestKeys.OWNER_SIGNING);
        if (sealed) {
            writer.writeSealed(SampleExam.manifest(), SampleExam.contents(), "river-lamp-42".toCharArray(), file);
        } else {
            writer.write(SampleExam.manifest(), SampleExam.contents(), file);
        }
        return file;
    }

    private Path responsePackage() throws Exception {
        Path file = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), SampleResponse.events(30), file);
        return file;
    }

    private static Opener bundleOpener() {
        BundleReader reader = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint())));
        return path -> reader.open(path).close();
    }

    private static Opener packageOpener() {
        return new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations())::open;
    }

    private static List<Damage> flips(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        List<Damage> damages = new ArrayList<>();
        for (int i = 0; i < bytes.length; i++) {
            for (int mask : new int[] {0xFF, 0x01}) {
                int at = i;
                damages.add(damage("byte " + at + " ^ 0x" + Integer.toHexString(mask), () -> {
                    byte[] copy = bytes.clone();
                    copy[at] ^= (byte) mask;
                    return copy;
                }));
            }
        }
        return damages;
    }

    private List<Damage> contentFlips(Path file) throws Exception {
        Map<String, byte[]> entries = new LinkedHashMap<>();
        try (SafeZipReader zip = SafeZipReader.open(file, ArchiveLimits.defaults())) {
            for (var entry : zip.entries()) {
                entries.put(entry.name(), zip.read(entry));
            }
        }
        Path rewritten = dir.resolve("rewritten-" + file.getFileName());
        List<Damage> damages = new ArrayList<>();
        entries.forEach((name, content) -> {
            for (int i = 0; i < content.length; i++) {
                int at = i;
                damages.add(damage(name + " byte " + at, () -> {
                    byte[] copy = content.clone();
                    copy[at] ^= 0x01;
                    HostileArchives.replaceEntry(file, rewritten, name, copy);
                    return Files.readAllBytes(rewritten);
                }));
            }
        });
        return damages;
    }

    private static List<Damage> truncations(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        List<Damage> damages = new ArrayList<>();
        for (int length = 0; length < bytes.length; length++) {
            int n = length;
            damages.add(damage("truncated to " + n, () -> java.util.Arrays.copyOf(bytes, n)));
        }
        return damages;
    }

    private static List<Damage> lengthChanges(Path file, int count) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        Random random = new Random(SEED);
        List<Damage> damages = new ArrayList<>();
        for (int c = 0; c < count; c++) {
            int at = random.nextInt(bytes.length);
            int n = 1 + random.nextInt(16);
            if (random.nextBoolean()) {
                byte[] inserted = new byte[n];
                random.nextBytes(inserted);
                damages.add(damage(n + " bytes inserted at " + at, () -> {
                    byte[] changed = new byte[bytes.length + n];
                    System.arraycopy(bytes, 0, changed, 0, at);
                    System.arraycopy(inserted, 0, changed, at, n);
                    System.arraycopy(bytes, at, changed, at + n, bytes.length - at);
                    return changed;
                }));
            } else {
                int cut = Math.min(n, bytes.length - at);
                damages.add(damage(cut + " bytes removed at " + at, () -> {
                    byte[] changed = new byte[bytes.length - cut];
                    System.arraycopy(bytes, 0, changed, 0, at);
                    System.arraycopy(bytes, at + cut, changed, at, bytes.length - at - cut);
                    return changed;
                }));
            }
        }
        return damages;
    }

    @FunctionalInterface
    private interface ByteSource {
        byte[] get() throws Exception;
    }

    private static Damage damage(String description, ByteSource source) {
        return new Damage() {
            @Override
            public String describe() {
                return description;
            }

            @Override
            public byte[] bytes() throws Exception {
                return source.get();
            }
        };
    }

    private Outcome refuseAll(List<Damage> damages, Opener opener) throws Exception {
        long foldersBefore = TempFolders.count();
        Map<String, Integer> refusals = new TreeMap<>();
        List<String> opened = new ArrayList<>();
        Path mutant = dir.resolve("mutant.bin");
        for (Damage damage : damages) {
            Files.write(mutant, damage.bytes());
            try {
                opener.open(mutant);
                opened.add(damage.describe());
            } catch (FormatRefusal refusal) {
                refusals.merge(refusal.getClass().getSimpleName(), 1, Integer::sum);
            }
        }
        assertTrue(opened.isEmpty(), "damaged files were opened: " + opened);
        assertEquals(foldersBefore, TempFolders.count(), "no temporary folder is left behind by a refused file");
        return new Outcome(damages.size(), refusals);
    }


    private static synchronized void report(String what, Outcome outcome) throws IOException {
        Path target = Path.of("target", "mutation-report.txt");
        Files.createDirectories(target.getParent());
        Files.writeString(target, what + ": " + outcome.cases() + " damaged files, all refused: " + outcome.refusals()
                + System.lineSeparator(), java.nio.file.StandardOpenOption.CREATE, java.nio.file.StandardOpenOption.APPEND);
    }
}
