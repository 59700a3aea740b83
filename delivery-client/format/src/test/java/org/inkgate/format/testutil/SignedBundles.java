package org.inkgate.format.testutil;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.crypto.Ed25519;

/**
 * Bundles for refusal tests: the good sample bundle, its entries, and bundles whose manifest is
 * whatever a test says but still validly signed by the owner, so that the checks behind the
 * signature are what refuses them.
 */
public final class SignedBundles {

    private SignedBundles() {
    }

    public static Path good(Path dir) throws Exception {
        Path file = dir.resolve("good.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), file);
        return file;
    }

    public static byte[] entry(Path archive, String name) throws Exception {
        try (SafeZipReader zip = SafeZipReader.open(archive, ArchiveLimits.defaults())) {
            return zip.read(zip.entry(name).orElseThrow());
        }
    }

    /** The manifest as given, signed by the owner, with the sample contents and any extra entries. */
    public static Path signedWith(Path dir, String fileName, byte[] manifest, Map<String, byte[]> extra) throws Exception {
        List<Map.Entry<String, byte[]>> entries = new ArrayList<>();
        entries.add(Map.entry("manifest.json", manifest));
        entries.add(Map.entry("manifest.sig", Ed25519.sign(TestKeys.OWNER_SIGNING, manifest)));
        SampleExam.contents().forEach((k, v) -> entries.add(Map.entry(k, v)));
        extra.forEach((k, v) -> entries.add(Map.entry(k, v)));
        Path file = dir.resolve(fileName);
        HostileArchives.writeRaw(file, entries.toArray(Map.Entry[]::new));
        return file;
    }
}
