package org.inkgate.packs.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.lucene.index.IndexWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A term longer than one Lucene index term may be ({@link IndexWriter#MAX_TERM_LENGTH}, 32,766 bytes
 * of UTF-8: Lucene's own constant) is refused by {@code pack build glossary} with its file and line,
 * and no pack is written. Before, Lucene's "immense term" error ended the build.
 */
class ImmenseTermTest {
    @TempDir
    Path dir;

    private PackCommandTest.Run build(Path source, Path out) {
        return PackCommandTest.run("build", "glossary", "--source", source.toString(), "--out", out.toString(), "--id",
                "immense", "--pack-version", "1", "--title", "Immense term", "--licence", "CC-BY-4.0", "--attribution",
                "Test author", "--built-at", "2026-02-01T10:00:00Z");
    }

    @Test
    void buildGlossary_csvTermBeyondTheIndexLimit_isRefusedWithItsRow() throws Exception {
        Path source = dir.resolve("terms.csv");
        Files.writeString(source, "entry_id,language,term\nt1,en,tide table\nt2,en,"
                + "a".repeat(IndexWriter.MAX_TERM_LENGTH + 1) + "\n");
        Path out = dir.resolve("g.inkpack");
        PackCommandTest.Run r = build(source, out);
        assertEquals(ExitCodes.BAD_SOURCE, r.code(), r.err());
        assertTrue(r.err().contains("line 3") && r.err().contains("column term"), r.err());
        assertTrue(r.err().contains("at most 32766 bytes"), r.err());
        assertFalse(r.err().contains("immense"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void buildGlossary_csvTermExactlyAtTheLimit_isBuilt() throws Exception {
        Path source = dir.resolve("terms.csv");
        Files.writeString(source, "entry_id,language,term\nt1,en," + "a".repeat(IndexWriter.MAX_TERM_LENGTH) + "\n");
        PackCommandTest.Run r = build(source, dir.resolve("g.inkpack"));
        assertEquals(ExitCodes.OK, r.code(), r.err());
    }

    @Test
    void buildGlossary_tbxTermBeyondTheIndexLimit_isRefusedWithItsLine() throws Exception {
        Path source = dir.resolve("terms.tbx");
        Files.writeString(source, """
                <?xml version="1.0" encoding="UTF-8"?>
                <tbx type="TBX-Basic" style="dca" xml:lang="en" xmlns="urn:iso:std:iso:30042:ed-2">
                <tbxHeader><fileDesc><sourceDesc><p>invented</p></sourceDesc></fileDesc></tbxHeader>
                <text><body>
                <conceptEntry id="c1">
                <langSec xml:lang="en">
                <termSec><term>%s</term></termSec>
                </langSec>
                </conceptEntry>
                </body></text>
                </tbx>
                """.formatted("é".repeat(IndexWriter.MAX_TERM_LENGTH / 2 + 1)));
        Path out = dir.resolve("g.inkpack");
        PackCommandTest.Run r = build(source, out);
        assertEquals(ExitCodes.BAD_SOURCE, r.code(), r.err());
        assertTrue(r.err().contains("line 7") && r.err().contains("concept \"c1\""), r.err());
        assertTrue(r.err().contains("32768 bytes long"), r.err());
        assertFalse(Files.exists(out));
    }
}
