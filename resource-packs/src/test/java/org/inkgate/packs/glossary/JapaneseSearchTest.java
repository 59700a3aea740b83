package org.inkgate.packs.glossary;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringReader;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import org.inkgate.packs.pack.PackFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Japanese side is analysed with Lucene's kuromoji analyzer, which reduces inflected verbs
 * to their dictionary form (JapaneseBaseFormFilter): 食べた ("ate") -> 食べる ("to eat"), a
 * textbook example of the past form (from memory). A plain tokenizer would not match them.
 */
class JapaneseSearchTest {
    @TempDir
    Path dir;

    @Test
    void search_pastTenseVerb_findsDictionaryForm() throws Exception {
        String csv = "entry_id,language,term,part_of_speech\nv1,en,to eat,verb\nv1,ja,食べる,verb\n";
        List<GlossaryEntry> entries = DelimitedImporter.read(new StringReader(csv), "ja.csv", DelimitedImporter.Dialect.CSV);
        Path pack = dir.resolve("ja.inkpack");
        GlossaryPacks.build(entries, DelimitedImporterTest.meta(), pack, dir.resolve("work"));
        try (Glossary g = Glossary.open(PackFiles.open(pack, dir.resolve("open")), Clock.systemUTC())) {
            List<GlossaryHit> hits = g.search("食べた", 5).value();
            assertEquals(1, hits.size());
            assertEquals(MatchKind.STEMMED, hits.get(0).match());
            assertEquals("食べる", hits.get(0).term());
            assertEquals(List.of(new GlossaryHit.Equivalent("en", "to eat")), hits.get(0).equivalents());
        }
    }
}
