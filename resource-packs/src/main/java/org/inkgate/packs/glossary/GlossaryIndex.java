package org.inkgate.packs.glossary;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.miscellaneous.PerFieldAnalyzerWrapper;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;

/**
 * The Lucene layout of a glossary pack and the code that writes it. One document per term
 * (fields {@code key}, {@code tok}, {@code stem_<lang>}) and one per entry (its JSON).
 */
final class GlossaryIndex {
    static final String TYPE = "type";
    static final String TYPE_TERM = "term";
    static final String TYPE_ENTRY = "entry";
    static final String ENTRY_ID = "entry";
    /** The indexed id of entry documents (term documents only store {@link #ENTRY_ID}). */
    static final String ENTRY_KEY = "eid";
    static final String LANG = "lang";
    static final String TERM = "term";
    static final String KEY = "key";
    static final String TOKENS = "tok";
    static final String EQUIVALENTS = "equiv";
    static final String POS = "pos";
    static final String JSON = "json";

    static final ObjectMapper MAPPER = JsonMapper.builder().build();

    private GlossaryIndex() {
    }

    static Analyzer analyzer(Set<String> primaries) {
        Map<String, Analyzer> perField = new HashMap<>();
        for (String p : primaries) {
            perField.put("stem_" + p, LanguageAnalyzers.forLanguage(p));
        }
        perField.put(TOKENS, LanguageAnalyzers.plainTokens());
        return new PerFieldAnalyzerWrapper(LanguageAnalyzers.plainTokens(), perField);
    }

    /** Writes the index of these entries into {@code folder}; returns the languages (primary subtags) seen. */
    static Set<String> write(List<GlossaryEntry> entries, Path folder) throws IOException {
        Set<String> primaries = new LinkedHashSet<>();
        for (GlossaryEntry e : entries) {
            for (LanguageSection s : e.languages()) {
                primaries.add(LanguageAnalyzers.primary(s.language()));
            }
        }
        IndexWriterConfig config = new IndexWriterConfig(analyzer(primaries));
        config.setOpenMode(IndexWriterConfig.OpenMode.CREATE);
        config.setUseCompoundFile(true);
        try (Directory dir = FSDirectory.open(folder); IndexWriter writer = new IndexWriter(dir, config)) {
            for (GlossaryEntry e : entries) {
                writer.addDocument(entryDoc(e));
                for (LanguageSection s : e.languages()) {
                    String equivalents = equivalents(e, s.language());
                    for (GlossaryTerm t : s.terms()) {
                        writer.addDocument(termDoc(e.id(), s.language(), t, equivalents));
                    }
                }
            }
            writer.forceMerge(1);
            writer.commit();
        }
        return primaries;
    }

    private static Document entryDoc(GlossaryEntry e) throws JsonProcessingException {
        Document d = new Document();
        d.add(new StringField(TYPE, TYPE_ENTRY, Field.Store.NO));
        d.add(new StringField(ENTRY_KEY, e.id(), Field.Store.NO));
        d.add(new StoredField(JSON, MAPPER.writeValueAsBytes(e)));
        return d;
    }

    private static Document termDoc(String entryId, String language, GlossaryTerm t, String equivalents) {
        Document d = new Document();
        d.add(new StringField(TYPE, TYPE_TERM, Field.Store.NO));
        d.add(new StoredField(ENTRY_ID, entryId));
        d.add(new StringField(LANG, language, Field.Store.YES));
        d.add(new StoredField(TERM, t.text()));
        if (t.partOfSpeech() != null) {
            d.add(new StoredField(POS, t.partOfSpeech()));
        }
        d.add(new StringField(KEY, LanguageAnalyzers.key(t.text()), Field.Store.NO));
        d.add(new TextField(TOKENS, t.text(), Field.Store.NO));
        d.add(new TextField(LanguageAnalyzers.stemField(language), t.text(), Field.Store.NO));
        d.add(new StoredField(EQUIVALENTS, equivalents));
        return d;
    }

    /** The first (preferred) term of every other language, as "lang\tterm" lines. */
    private static String equivalents(GlossaryEntry e, String language) {
        StringBuilder sb = new StringBuilder();
        for (LanguageSection other : e.languages()) {
            if (!other.language().equals(language) && !other.terms().isEmpty()) {
                sb.append(other.language()).append('\t').append(other.terms().get(0).text()).append('\n');
            }
        }
        return sb.toString();
    }
}
