package org.inkgate.packs.glossary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Optional;
import org.inkgate.packs.event.Timed;
import org.inkgate.packs.event.ToolAction;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Search ranking (exact > prefix > stemmed, fuzzy when nothing else matched) on a small invented
 * term bank. Stemming is Lucene's: EnglishAnalyzer (Porter stemmer: "bees" -> "bee") and
 * SpanishAnalyzer (light stemmer: "colmenas" and "colmena" share a stem); edit distances are
 * Damerau-Levenshtein as Lucene's FuzzyQuery counts them (a transposition is one edit).
 */
class GlossarySearchTest {
    private static final Instant NOW = Instant.parse("2026-03-01T09:00:00Z");
    private static final String CSV = """
            entry_id,language,term,part_of_speech,definition
            e1,en,comb,noun,Wax cells in a frame.
            e1,es,panal,noun,
            e2,en,comb honey,noun,Honey sold in its comb.
            e3,en,honeycomb,noun,
            e5,en,bee,noun,A flying insect that makes honey.
            e5,es,abeja,noun,
            e6,en,beehive,noun,
            e6,es,colmena,noun,
            e7,en,worker bees,noun,
            e8,en,bey,noun,An invented neighbour of bee at one edit.
            """;
    @TempDir
    static Path dir;
    static List<GlossaryEntry> imported;
    static Glossary glossary;

    @BeforeAll
    static void build() throws Exception {
        imported = DelimitedImporter.read(new StringReader(CSV), "inline.csv", DelimitedImporter.Dialect.CSV);
        Path pack = dir.resolve("bees.inkpack");
        GlossaryPacks.build(imported, DelimitedImporterTest.meta(), pack, dir.resolve("work"));
        glossary = Glossary.open(PackFiles.open(pack, dir.resolve("open")), Clock.fixed(NOW, ZoneOffset.UTC));
    }

    @AfterAll
    static void close() {
        glossary.close();
    }

    private static List<String> ranked(String query) {
        return glossary.search(query, 10).value().stream().map(h -> h.entryId() + ":" + h.match()).toList();
    }

    @Test
    void search_bee_ranksExactThenPrefixThenStemmed() {
        assertEquals(List.of("e5:EXACT", "e6:PREFIX", "e7:STEMMED"), ranked("bee"));
    }

    @Test
    void search_noOtherMatch_fallsBackToFuzzy() {
        // "beyy" is one deletion from "bey"; no term equals it, starts with it or shares its stem
        assertEquals(List.of("e8:FUZZY"), ranked("beyy"));
    }

    @Test
    void search_exactIgnoresCaseAndWidth() {
        // NFKC folds the fullwidth letters U+FF22 U+FF25 U+FF25 to "BEE"
        assertEquals("e5:EXACT", ranked("\uFF22\uFF25\uFF25").get(0));
    }

    @Test
    void search_prefixAsYouType_findsLongerTerms() {
        assertEquals(List.of("e1:EXACT", "e2:PREFIX"), ranked("comb").subList(0, 2));
        assertEquals("e6:PREFIX", ranked("beeh").get(0));
    }

    @Test
    void search_inflectedForm_matchesByStem() {
        assertTrue(ranked("combs").containsAll(List.of("e1:STEMMED", "e2:STEMMED")), ranked("combs").toString());
        assertEquals(List.of("e6:STEMMED"), ranked("colmenas"));
    }

    @Test
    void search_misspelling_matchesFuzzy() {
        // one transposition from "comb": the whole term (e1) ranks above a term with "comb" as one word (e2)
        assertEquals(List.of("e1:FUZZY", "e2:FUZZY"), ranked("cmob"));
        assertEquals(List.of("e3:FUZZY"), ranked("honeycomd")); // one substitution
        assertEquals(List.of("e3:FUZZY"), ranked("honycomd"));  // two edits
    }

    @Test
    void search_hit_carriesOtherLanguageEquivalents() {
        GlossaryHit hit = glossary.search("abeja", 5).value().get(0);
        assertEquals("es", hit.language());
        assertEquals(List.of(new GlossaryHit.Equivalent("en", "bee")), hit.equivalents());
    }

    @Test
    void search_returnsEventForTheLog() {
        Timed<List<GlossaryHit>> r = glossary.search("bee", 2);
        assertEquals(2, r.value().size());
        assertEquals(Tool.GLOSSARY, r.event().tool());
        assertEquals(ToolAction.QUERY, r.event().action());
        assertEquals("test-bees", r.event().packId());
        assertEquals("bee", r.event().query());
        assertEquals(2, r.event().hitCount());
        assertEquals(NOW, r.event().at());
    }

    @Test
    void openEntry_returnsTheImportedEntryAndAnEvent() {
        Timed<Optional<GlossaryEntry>> r = glossary.openEntry("e5");
        assertEquals(imported.stream().filter(e -> e.id().equals("e5")).findFirst(), r.value());
        assertEquals(ToolAction.OPEN_ENTRY, r.event().action());
        assertEquals("e5", r.event().entryId());
        assertEquals(1, r.event().hitCount());
        assertEquals(Optional.empty(), glossary.openEntry("nope").value());
    }

    @Test
    void search_blankOrNull_returnsNothing() {
        assertEquals(List.of(), ranked("   "));
        assertEquals(0, glossary.search(null, 5).value().size());
    }
}
