package org.inkgate.packs.glossary;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.document.Document;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.FuzzyQuery;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.PrefixQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.store.FSDirectory;
import org.inkgate.packs.event.Timed;
import org.inkgate.packs.event.ToolAction;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.pack.OpenedPack;
import org.inkgate.packs.pack.PackKind;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.Tool;

/**
 * A read-only term bank opened from a verified glossary pack. Searches rank exact matches
 * first, then prefix (search as you type), stemmed and fuzzy (up to two edits) matches; each
 * entry appears once, under its best match. Safe for use from several threads.
 */
public final class Glossary implements AutoCloseable {
    /** Most hits one search returns. */
    public static final int MAX_HITS = 50;
    private static final int MAX_QUERY_CHARS = 200;

    private final OpenedPack pack;
    private final DirectoryReader reader;
    private final IndexSearcher searcher;
    private final Set<String> primaries;
    private final Analyzer analyzer;
    private final Clock clock;

    private Glossary(OpenedPack pack, Clock clock) throws IOException {
        this.pack = pack;
        this.clock = clock;
        this.reader = DirectoryReader.open(FSDirectory.open(pack.folder().resolve(GlossaryPacks.INDEX_FOLDER)));
        this.searcher = new IndexSearcher(reader);
        this.primaries = new LinkedHashSet<>();
        for (String tag : pack.manifest().languages()) {
            primaries.add(LanguageAnalyzers.primary(tag));
        }
        this.analyzer = GlossaryIndex.analyzer(primaries);
    }

    /** Opens an already verified pack; refuses a pack that is not a glossary. Takes ownership of {@code pack}. */
    public static Glossary open(OpenedPack pack, Clock clock) throws PackRefusal {
        pack.requireKind(PackKind.GLOSSARY);
        try {
            return new Glossary(pack, clock);
        } catch (IOException e) {
            pack.close();
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, "glossary pack " + pack.manifest().id()
                    + " has a verified but unreadable index (" + e.getMessage() + "); rebuild the pack with this version of Inkgate", e);
        }
    }

    /** The manifest of the pack this glossary reads. */
    public PackManifest manifest() {
        return pack.manifest();
    }

    /** Searches all language sides; returns at most {@code limit} hits (1..{@value #MAX_HITS}) and the event to log. */
    public Timed<List<GlossaryHit>> search(String query, int limit) {
        Instant at = clock.instant();
        long start = System.nanoTime();
        List<GlossaryHit> hits = searchQuietly(query, Math.max(1, Math.min(limit, MAX_HITS)));
        long micros = (System.nanoTime() - start) / 1000;
        return new Timed<>(hits, new ToolEvent(Tool.GLOSSARY, ToolAction.QUERY, manifest().id(), query, hits.size(), null, at, micros));
    }

    /** The full entry, and the event recording that the candidate opened it. */
    public Timed<Optional<GlossaryEntry>> openEntry(String entryId) {
        Instant at = clock.instant();
        long start = System.nanoTime();
        Optional<GlossaryEntry> entry = Optional.empty();
        try {
            TopDocs top = searcher.search(new BooleanQuery.Builder()
                    .add(new TermQuery(new Term(GlossaryIndex.TYPE, GlossaryIndex.TYPE_ENTRY)), BooleanClause.Occur.FILTER)
                    .add(new TermQuery(new Term(GlossaryIndex.ENTRY_KEY, entryId)), BooleanClause.Occur.FILTER).build(), 1);
            if (top.scoreDocs.length == 1) {
                Document d = searcher.storedFields().document(top.scoreDocs[0].doc);
                entry = Optional.of(GlossaryIndex.MAPPER.readValue(d.getBinaryValue(GlossaryIndex.JSON).bytes, GlossaryEntry.class));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("glossary pack " + manifest().id() + " could not be read", e);
        }
        long micros = (System.nanoTime() - start) / 1000;
        return new Timed<>(entry, new ToolEvent(Tool.GLOSSARY, ToolAction.OPEN_ENTRY, manifest().id(), null,
                entry.isPresent() ? 1 : 0, entryId, at, micros));
    }

    private List<GlossaryHit> searchQuietly(String query, int limit) {
        if (query == null) {
            return List.of();
        }
        String q = query.length() > MAX_QUERY_CHARS ? query.substring(0, MAX_QUERY_CHARS) : query;
        String key = LanguageAnalyzers.key(q);
        if (key.isEmpty()) {
            return List.of();
        }
        List<GlossaryHit> hits = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        try {
            collect(new TermQuery(new Term(GlossaryIndex.KEY, key)), MatchKind.EXACT, limit, hits, seen);
            if (hits.size() < limit) {
                collect(new PrefixQuery(new Term(GlossaryIndex.KEY, key)), MatchKind.PREFIX, limit, hits, seen);
            }
            if (hits.size() < limit) {
                Query stemmed = stemmedQuery(q);
                if (stemmed != null) {
                    collect(stemmed, MatchKind.STEMMED, limit, hits, seen);
                }
            }
            if (hits.size() < limit) {
                Query fuzzy = fuzzyQuery(key);
                if (fuzzy != null) {
                    collect(fuzzy, MatchKind.FUZZY, limit, hits, seen);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("glossary pack " + manifest().id() + " could not be read", e);
        }
        return hits;
    }

    /** Adds the hits of one stage, skipping entries already found by a better stage. */
    private void collect(Query q, MatchKind kind, int limit, List<GlossaryHit> hits, Set<String> seen) throws IOException {
        Query filtered = new BooleanQuery.Builder()
                .add(q, BooleanClause.Occur.MUST)
                .add(new TermQuery(new Term(GlossaryIndex.TYPE, GlossaryIndex.TYPE_TERM)), BooleanClause.Occur.FILTER).build();
        // fetch more than needed: several terms of one entry may match
        TopDocs top = searcher.search(filtered, (limit - hits.size()) * 3 + 5);
        StoredFields stored = searcher.storedFields();
        for (ScoreDoc sd : top.scoreDocs) {
            Document d = stored.document(sd.doc);
            String entryId = d.get(GlossaryIndex.ENTRY_ID);
            if (!seen.add(entryId)) {
                continue;
            }
            hits.add(new GlossaryHit(entryId, d.get(GlossaryIndex.TERM), d.get(GlossaryIndex.LANG), d.get(GlossaryIndex.POS),
                    kind, parseEquivalents(d.get(GlossaryIndex.EQUIVALENTS))));
            if (hits.size() >= limit) {
                return;
            }
        }
    }

    private Query stemmedQuery(String q) throws IOException {
        BooleanQuery.Builder any = new BooleanQuery.Builder();
        int clauses = 0;
        for (String p : primaries) {
            String field = "stem_" + p;
            List<String> tokens = tokens(field, q);
            if (tokens.isEmpty()) {
                continue;
            }
            BooleanQuery.Builder all = new BooleanQuery.Builder();
            for (String t : tokens) {
                all.add(new TermQuery(new Term(field, t)), BooleanClause.Occur.MUST);
            }
            any.add(all.build(), BooleanClause.Occur.SHOULD);
            clauses++;
        }
        return clauses == 0 ? null : any.build();
    }

    /**
     * Fuzzy stage: the whole term within the edit distance, or (one-word queries) any word of a
     * term. Edits allowed: none below 3 characters, 1 up to 5, else 2 (common practice: short
     * words have too many neighbours at distance 2).
     */
    private Query fuzzyQuery(String key) throws IOException {
        int edits = key.length() < 3 ? 0 : key.length() <= 5 ? 1 : 2;
        if (edits == 0) {
            return null;
        }
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        b.add(new FuzzyQuery(new Term(GlossaryIndex.KEY, key), edits, 1), BooleanClause.Occur.SHOULD);
        List<String> words = tokens(GlossaryIndex.TOKENS, key);
        if (words.size() == 1) {
            b.add(new FuzzyQuery(new Term(GlossaryIndex.TOKENS, words.get(0)), edits, 1), BooleanClause.Occur.SHOULD);
        }
        return b.build();
    }

    private List<String> tokens(String field, String text) throws IOException {
        List<String> out = new ArrayList<>();
        try (TokenStream ts = analyzer.tokenStream(field, text)) {
            CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                out.add(term.toString());
            }
            ts.end();
        }
        return out;
    }

    private static List<GlossaryHit.Equivalent> parseEquivalents(String stored) {
        List<GlossaryHit.Equivalent> out = new ArrayList<>();
        if (stored == null) {
            return out;
        }
        for (String line : stored.split("\n")) {
            int tab = line.indexOf('\t');
            if (tab > 0) {
                out.add(new GlossaryHit.Equivalent(line.substring(0, tab), line.substring(tab + 1)));
            }
        }
        return out;
    }

    @Override
    public void close() {
        try {
            reader.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            analyzer.close();
            pack.close();
        }
    }
}
