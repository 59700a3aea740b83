package org.inkgate.packs.dictionary;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.Term;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.search.spell.DirectSpellChecker;
import org.apache.lucene.search.spell.SuggestMode;
import org.apache.lucene.search.spell.SuggestWord;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.util.BytesRef;
import org.inkgate.packs.event.Timed;
import org.inkgate.packs.event.ToolAction;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.pack.OpenedPack;
import org.inkgate.packs.pack.PackKind;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.Tool;

/**
 * A read-only dictionary opened from a verified dictionary pack. Lookups accept inflected
 * forms (WordNet's morphology, see {@link Morphology}) and suggest near spellings when nothing
 * matches. Safe for use from several threads.
 */
public final class Dictionary implements AutoCloseable {
    private static final int MAX_QUERY_CHARS = 100;
    private static final int SUGGESTIONS = 5;

    private final OpenedPack pack;
    private final DirectoryReader reader;
    private final LeafReader leaf;
    private final List<DirectSpellChecker> spellers;
    private final Morphology morphology;
    private final Clock clock;
    private final ThreadLocal<TermsEnum> keys;

    private Dictionary(OpenedPack pack, Clock clock) throws IOException, PackRefusal {
        this.pack = pack;
        this.clock = clock;
        this.reader = DirectoryReader.open(FSDirectory.open(pack.folder().resolve(DictionaryIndex.INDEX_FOLDER)));
        if (reader.leaves().size() != 1) {
            reader.close();
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, "dictionary pack " + pack.manifest().id()
                    + " has an index of " + reader.leaves().size() + " segments, expected 1; rebuild the pack");
        }
        this.leaf = reader.leaves().get(0).reader();
        DirectSpellChecker one = new DirectSpellChecker();
        one.setMaxEdits(1);
        one.setMinQueryLength(3);
        DirectSpellChecker two = new DirectSpellChecker();
        two.setMaxEdits(2);
        two.setMinQueryLength(3);
        this.spellers = List.of(one, two);
        Terms terms = leaf.terms(DictionaryIndex.KEY);
        this.keys = ThreadLocal.withInitial(() -> {
            try {
                return terms.iterator();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
        this.morphology = new Morphology(readExceptions(), this::contains);
    }

    /** Opens an already verified pack; refuses a pack that is not a dictionary. Takes ownership of {@code pack}. */
    public static Dictionary open(OpenedPack pack, Clock clock) throws PackRefusal {
        pack.requireKind(PackKind.DICTIONARY);
        try {
            return new Dictionary(pack, clock);
        } catch (IOException | RuntimeException e) {
            pack.close();
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, "dictionary pack " + pack.manifest().id()
                    + " is verified but unreadable (" + e.getMessage() + "); rebuild it with this version of Inkgate", e);
        } catch (PackRefusal e) {
            pack.close();
            throw e;
        }
    }

    /** The manifest of the pack this dictionary reads. */
    public PackManifest manifest() {
        return pack.manifest();
    }

    /** Looks a word up in every part of speech, inflected forms included; returns the answer and the event to log. */
    public Timed<Lookup> lookup(String word) {
        Instant at = clock.instant();
        long start = System.nanoTime();
        Lookup result = lookupQuietly(word);
        long micros = (System.nanoTime() - start) / 1000;
        return new Timed<>(result, new ToolEvent(Tool.DICTIONARY, ToolAction.QUERY, manifest().id(), word,
                result.entries().size(), null, at, micros));
    }

    /** Opens one entry by its id ({@code noun:goose}), and the event recording that the candidate opened it. */
    public Timed<Optional<DictionaryEntry>> openEntry(String entryId) {
        Instant at = clock.instant();
        long start = System.nanoTime();
        Optional<DictionaryEntry> entry = Optional.empty();
        int colon = entryId == null ? -1 : entryId.indexOf(':');
        if (colon > 0) {
            for (PartOfSpeech pos : PartOfSpeech.values()) {
                if (pos.label().equals(entryId.substring(0, colon))) {
                    entry = fetch(pos, entryId.substring(colon + 1));
                }
            }
        }
        long micros = (System.nanoTime() - start) / 1000;
        return new Timed<>(entry, new ToolEvent(Tool.DICTIONARY, ToolAction.OPEN_ENTRY, manifest().id(), null,
                entry.isPresent() ? 1 : 0, entryId, at, micros));
    }

    private Lookup lookupQuietly(String word) {
        String q = word == null ? "" : word.strip().toLowerCase(Locale.ROOT).replace('_', ' ').replaceAll("\\s+", " ");
        if (q.length() > MAX_QUERY_CHARS) {
            q = q.substring(0, MAX_QUERY_CHARS);
        }
        if (q.isEmpty()) {
            return new Lookup(q, List.of(), List.of());
        }
        List<DictionaryEntry> entries = new ArrayList<>();
        for (PartOfSpeech pos : PartOfSpeech.values()) {
            for (String lemma : morphology.baseForms(pos, q)) {
                fetch(pos, lemma).ifPresent(entries::add);
            }
        }
        return new Lookup(q, entries, entries.isEmpty() ? suggest(q) : List.of());
    }

    private Optional<DictionaryEntry> fetch(PartOfSpeech pos, String lemma) {
        try {
            TermsEnum te = keys.get();
            if (!te.seekExact(new BytesRef(DictionaryIndex.key(pos, lemma)))) {
                return Optional.empty();
            }
            PostingsEnum postings = te.postings(null, PostingsEnum.NONE);
            int doc = postings.nextDoc();
            if (doc == DocIdSetIterator.NO_MORE_DOCS) {
                return Optional.empty();
            }
            byte[] json = leaf.storedFields().document(doc).getBinaryValue(DictionaryIndex.JSON).bytes;
            return Optional.of(DictionaryIndex.MAPPER.readValue(json, DictionaryEntry.class));
        } catch (IOException e) {
            throw new UncheckedIOException("dictionary pack " + manifest().id() + " could not be read", e);
        }
    }

    /**
     * Lemmas within one, else two edits of the query (first letter kept), closest first, by Lucene's
     * DirectSpellChecker over the lemma terms (no document is read).
     */
    private List<String> suggest(String q) {
        if (q.length() < 3) {
            return List.of();
        }
        try {
            List<String> out = new ArrayList<>();
            // one edit first, two only when one finds nothing (see Glossary's fuzzy stage for why)
            for (DirectSpellChecker speller : spellers) {
                for (SuggestWord w : speller.suggestSimilar(new Term(DictionaryIndex.LEMMA, q), SUGGESTIONS, reader, SuggestMode.SUGGEST_ALWAYS)) {
                    out.add(w.string);
                }
                if (!out.isEmpty()) {
                    break;
                }
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException("dictionary pack " + manifest().id() + " could not be read", e);
        }
    }

    private boolean contains(PartOfSpeech pos, String lemma) {
        try {
            return keys.get().seekExact(new BytesRef(DictionaryIndex.key(pos, lemma)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private Map<PartOfSpeech, Map<String, List<String>>> readExceptions() throws IOException {
        Map<PartOfSpeech, Map<String, List<String>>> out = new EnumMap<>(PartOfSpeech.class);
        for (PartOfSpeech pos : PartOfSpeech.values()) {
            out.put(pos, new HashMap<>());
        }
        try (BufferedReader r = Files.newBufferedReader(pack.folder().resolve(DictionaryIndex.EXCEPTIONS_FILE), StandardCharsets.UTF_8)) {
            for (String line; (line = r.readLine()) != null; ) {
                String[] f = line.split("\t");
                if (f.length < 3) {
                    continue;
                }
                for (PartOfSpeech pos : PartOfSpeech.values()) {
                    if (pos.label().equals(f[0])) {
                        out.get(pos).put(f[1], List.copyOf(Arrays.asList(f).subList(2, f.length)));
                    }
                }
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
            pack.close();
        }
    }
}
