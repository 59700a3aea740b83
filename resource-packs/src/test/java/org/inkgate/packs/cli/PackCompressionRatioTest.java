package org.inkgate.packs.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.inkgate.packs.pack.PackDraft;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackKind;
import org.inkgate.packs.testutil.BuiltPacks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A pack whose entry would expand more than {@link PackFiles#MAX_COMPRESSION_RATIO} times (here 16
 * MiB of zeros, which deflate to about 16 KiB: a ratio near 1,000) is refused by {@code pack verify}
 * before it is unpacked, like bundles and response packages; the packs Inkgate builds pass.
 */
class PackCompressionRatioTest {
    @TempDir
    Path dir;

    @Test
    void verify_packThatExpandsOverTheRatioLimit_isRefused() throws Exception {
        Path content = dir.resolve("content");
        Files.createDirectories(content.resolve("index"));
        Files.write(content.resolve("index/zeros.bin"), new byte[16 << 20]);
        Path pack = dir.resolve("bomb.inkpack");
        PackFiles.write(pack, new PackDraft("bomb-pack", PackKind.GLOSSARY, "1.0", "Expanding pack", List.of("en"),
                "Apache-2.0", "", 1, Instant.parse("2026-01-01T00:00:00Z")), content);

        PackCommandTest.Run r = PackCommandTest.run("verify", pack.toString());
        assertEquals(ExitCodes.REFUSED, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("index/zeros.bin would expand from") && r.err().contains("more than 100 times"), r.err());
    }

    @Test
    void verify_builtPacks_stayUnderTheRatioLimit() {
        PackCommandTest.Run r = PackCommandTest.run("verify", BuiltPacks.demoGlossary().toString(), BuiltPacks.wordnet().toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
    }
}
