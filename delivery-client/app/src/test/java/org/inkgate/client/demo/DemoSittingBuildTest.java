package org.inkgate.client.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PinHasher;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoSittingBuildTest {

    @TempDir
    Path temp;

    @Test
    void build_demoSource_writesALiveBundleWithTheDemoRosterAndPin() throws Exception {
        Path out = temp.resolve("demo-sitting.inkexam");
        DemoSittingBuild.build(DemoBundles.SOURCE, out);
        DemoSittingBuild.DemoSitting sitting = DemoSittingBuild.readSitting(DemoBundles.SOURCE);

        try (OpenedBundle opened = new BundleReader(TrustPolicy.anySigner()).open(out)) {
            BundleManifest m = opened.manifest();
            assertFalse(m.practice());
            assertEquals(sitting.roster(), m.roster());
            assertTrue(PinHasher.matches(m.invigilatorPin(), sitting.invigilatorPin().toCharArray()));
            assertFalse(PinHasher.matches(m.invigilatorPin(), "000000".toCharArray()));
        }
        String note = Files.readString(out.resolveSibling(out.getFileName() + DemoSittingBuild.NOTE_SUFFIX));
        assertTrue(note.startsWith("DEMO ONLY, NOT SECRET"), note);
    }

    @Test
    void build_sameSourceTwice_givesTheSameBytes() throws Exception {
        Path one = temp.resolve("one.inkexam");
        Path two = temp.resolve("two.inkexam");
        DemoSittingBuild.build(DemoBundles.SOURCE, one);
        DemoSittingBuild.build(DemoBundles.SOURCE, two);
        assertArrayEquals(Files.readAllBytes(one), Files.readAllBytes(two));
    }
}
