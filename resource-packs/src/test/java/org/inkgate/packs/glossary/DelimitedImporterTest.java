package org.inkgate.packs.glossary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** CSV per RFC 4180 section 2 (quoted fields, doubled quotes, line breaks in quotes) and TSV. */
class DelimitedImporterTest {

    private static List<GlossaryEntry> csv(String text) throws Exception {
        return DelimitedImporter.read(new StringReader(text), "test.csv", DelimitedImporter.Dialect.CSV);
    }

    @Test
    void read_rfc4180Quoting_keepsCommasQuotesAndLineBreaks() throws Exception {
        // RFC 4180 section 2, rules 5-7: fields with commas, CRLF or double quotes are quoted; a quote inside is doubled
        String text = "entry_id,language,term,definition,example\r\n"
                + "e1,en,smoker,\"A can that puffs smoke, calming bees\",\"He said \"\"gently\"\"\r\nand waited\"\r\n"
                + "e1,es,ahumador,,\r\n";
        List<GlossaryEntry> entries = csv(text);
        assertEquals(1, entries.size());
        LanguageSection en = entries.get(0).languages().get(0);
        assertEquals("A can that puffs smoke, calming bees", en.definition());
        assertEquals("He said \"gently\"\r\nand waited", en.terms().get(0).context());
        assertEquals("ahumador", entries.get(0).languages().get(1).terms().get(0).text());
    }

    @Test
    void read_tsv_readsTabsWithoutQuoting() throws Exception {
        String text = "language\tterm\tpart_of_speech\nen\t\"quoted\" term\tnoun\n";
        List<GlossaryEntry> entries = DelimitedImporter.read(new StringReader(text), "t.tsv", DelimitedImporter.Dialect.TSV);
        assertEquals("\"quoted\" term", entries.get(0).languages().get(0).terms().get(0).text());
        assertEquals("row-2", entries.get(0).id());
    }

    @Test
    void read_unknownColumn_namesItAndTheAllowedOnes() {
        GlossaryImportException e = assertThrows(GlossaryImportException.class, () -> csv("language,trem\nen,x\n"));
        assertTrue(e.getMessage().contains("\"trem\"") && e.getMessage().contains("part_of_speech"), e.getMessage());
        assertEquals(1, e.line());
        assertEquals(2, e.column());
    }

    @Test
    void read_badLanguageTag_reportsRowAndColumn() {
        GlossaryImportException e = assertThrows(GlossaryImportException.class,
                () -> csv("entry_id,language,term\na,en,bee\nb,e n,wasp\n"));
        assertTrue(e.getMessage().contains("row 3, column language"), e.getMessage());
        assertEquals(3, e.line());
        assertEquals(2, e.column());
    }

    @Test
    void read_textAfterClosingQuote_isRefused() {
        // RFC 4180 section 2, rule 5: a quoted field is enclosed in quotes as a whole
        GlossaryImportException e = assertThrows(GlossaryImportException.class, () -> csv("language,term\nen,\"bee\"hive\n"));
        assertEquals(2, e.line());
    }

    @Test
    void read_unclosedQuote_pointsAtTheLineWhereItOpened() {
        GlossaryImportException e = assertThrows(GlossaryImportException.class,
                () -> csv("language,term\nen,ok\nen,\"never closed\nen,x\n"));
        assertEquals(3, e.line());
    }

    @Test
    void build_hundredThousandRowsFailingAtRow70000_reportsTheRowAndWritesNoPack(@TempDir Path dir) throws Exception {
        Path source = dir.resolve("big.csv");
        try (Writer w = Files.newBufferedWriter(source, StandardCharsets.UTF_8)) {
            w.write("entry_id,language,term\n");
            for (int row = 2; row <= 100_001; row++) {
                // data row 70,000 is file row 70,001 (the header is row 1); its term is empty
                w.write("e" + row + ",en," + (row == 70_001 ? "" : "term" + row) + "\n");
            }
        }
        Path target = dir.resolve("out.inkpack");
        GlossaryImportException e = assertThrows(GlossaryImportException.class, () -> GlossaryPacks.build(
                GlossaryPacks.importFile(source), meta(), target, dir.resolve("work")));
        assertTrue(e.getMessage().contains("row 70001, column term"), e.getMessage());
        assertEquals(70_001, e.line());
        assertFalse(Files.exists(target));
        try (var files = Files.list(dir)) {
            assertEquals(List.of("big.csv"), files.map(p -> p.getFileName().toString()).sorted().toList());
        }
    }

    static GlossaryPacks.Metadata meta() {
        return new GlossaryPacks.Metadata("test-bees", "1", "Bees (test)", "Apache-2.0", "", Instant.parse("2026-01-01T00:00:00Z"));
    }
}
