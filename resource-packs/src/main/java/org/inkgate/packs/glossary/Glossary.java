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
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.StringHelper;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.FuzzyQuery;
import org.apache.lucene.search.IndexSearcher;
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
 * first, then prefix (search as you type, in alphabetical order) and stemmed matches; when none
 * of these finds anything, fuzzy matches (up to two edits) are offered for a likely misspelling.
 * Each entry appears once, under its best match. Safe for use from several threads.
 */
public final class Glossary implements AutoCloseable {
    /** Most hits one search returns. */
    public static final int MAX_HITS = 50;
    private static final int MAX_QUERY_CHARS = 200;
    /** Most distinct terms a prefix stage reads (a one-letter prefix can match thousands). */
    private static final int MAX_PREFIX_TERMS = 200;

    private final OpenedPack pack;
    private final DirectoryReader reader;
    private final IndexSearcher searcher;
    private final LeafReader leaf;
    private final Set<String> primaries;
    private final Analyzer analyzer;
    private final Clock clock;

    private Glossary(OpenedPack pack, Clock clock) throws IOException {
        this.pack = pack;
        this.clock = clock;
        this.reader = DirectoryReader.open(FSDirectory.open(pack.folder().resolve(GlossaryPacks.INDEX_FOLDER)));
        if (reader.leaves().size() != 1) {
            reader.close();
            throw new IOException("the index has " + reader.leaves().size() + " segments, expected 1");
        }
        this.searcher = new IndexSearcher(reader);
        this.leaf = reader.leaves().get(0).reader();
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
            // only entry documents carry the indexed entry key
            TopDocs top = searcher.search(new TermQuery(new Term(GlossaryIndex.ENTRY_KEY, entryId)), 1);
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
            StoredFields stored = leaf.storedFields();
            TermsEnum keys = leaf.terms(GlossaryIndex.KEY).iterator();
            BytesRef target = new BytesRef(key);
            // exact and prefix read the sorted term dictionary directly: cost bounded by the hits wanted
            if (keys.seekExact(target)) {
                addPostings(keys, MatchKind.EXACT, limit, hits, seen, stored);
            }
            if (hits.size() < limit && keys.seekCeil(target) != TermsEnum.SeekStatus.END) {
                int terms = 0;
                do {
                    if (!StringHelper.startsWith(keys.term(), target) || ++terms > MAX_PREFIX_TERMS) {
                        break;
                    }
                    addPostings(keys, MatchKind.PREFIX, limit, hits, seen, stored);
                } while (hits.size() < limit && keys.next() != null);
            }
            if (hits.size() < limit) {
                Query stemmed = stemmedQuery(q);
                if (stemmed != null) {
                    collect(stemmed, MatchKind.STEMMED, limit, hits, seen, stored);
                }
            }
            // fuzzy matching is the fallback for a likely misspelling: only when nothing else matched
            if (hits.isEmpty()) {
                fuzzy(key, limit, hits, seen, stored);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("glossary pack " + manifest().id() + " could not be read", e);
        }
        return hits;
    }

    private void addPostings(TermsEnum keys, MatchKind kind, int limit, List<GlossaryHit> hits, Set<String> seen,
                             StoredFields stored) throws IOException {
        PostingsEnum postings = keys.postings(null, PostingsEnum.NONE);
        for (int doc = postings.nextDoc(); doc != DocIdSetIterator.NO_MORE_DOCS && hits.size() < limit; doc = postings.nextDoc()) {
            add(stored.document(doc), kind, hits, seen);
        }
    }

    /** Adds the hits of one stage, skipping entries already found by a better stage. */
    private void collect(Query q, MatchKind kind, int limit, List<GlossaryHit> hits, Set<String> seen, StoredFields stored)
            throws IOException {
        // fetch more than needed: several terms of one entry may match
        TopDocs top = searcher.search(q, (limit - hits.size()) * 3 + 5);
        for (ScoreDoc sd : top.scoreDocs) {
            add(stored.document(sd.doc), kind, hits, seen);
            if (hits.size() >= limit) {
                return;
            }
        }
    }

    private static void add(Document d, MatchKind kind, List<GlossaryHit> hits, Set<String> seen) {
        String entryId = d.get(GlossaryIndex.ENTRY_ID);
        if (seen.add(entryId)) {
            hits.add(new GlossaryHit(entryId, d.get(GlossaryIndex.TERM), d.get(GlossaryIndex.LANG), d.get(GlossaryIndex.POS),
                    kind, parseEquivalents(d.get(GlossaryIndex.EQUIVALENTS))));
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
     * term; the first letter must match. Edits allowed: none below 3 characters, 1 up to 5,
     * else 2 (common practice: short words have too many neighbours at distance 2). One edit is
     * tried first and two only when one finds nothing: most misspellings are a single edit
     * (Damerau 1964 found about 80%), and the two-edit automaton costs several times more.
     */
    private void fuzzy(String key, int limit, List<GlossaryHit> hits, Set<String> seen, StoredFields stored) throws IOException {
        int maxEdits = key.length() < 3 ? 0 : key.length() <= 5 ? 1 : 2;
        List<String> words = tokens(GlossaryIndex.TOKENS, key);
        for (int edits = 1; edits <= maxEdits && hits.isEmpty(); edits++) {
            Query q;
            if (words.size() == 1) {
                q = new BooleanQuery.Builder()
                        .add(new FuzzyQuery(new Term(GlossaryIndex.KEY, key), edits, 1), BooleanClause.Occur.SHOULD)
                        .add(new FuzzyQuery(new Term(GlossaryIndex.TOKENS, words.get(0)), edits, 1), BooleanClause.Occur.SHOULD)
                        .build();
            } else {
                q = new FuzzyQuery(new Term(GlossaryIndex.KEY, key), edits, 1);
            }
            collect(q, MatchKind.FUZZY, limit, hits, seen, stored);
        }
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
