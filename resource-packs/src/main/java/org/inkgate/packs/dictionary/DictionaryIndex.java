package org.inkgate.packs.dictionary;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.core.KeywordAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.FSDirectory;

/** The layout of a dictionary pack: a Lucene index of entries and WordNet's exception lists. */
final class DictionaryIndex {
    static final String INDEX_FOLDER = "index";
    static final String EXCEPTIONS_FILE = "morphology/exceptions.tsv";
    static final String KEY = "pk";
    static final String LEMMA = "lemma";
    static final String JSON = "json";
    static final ObjectMapper MAPPER = JsonMapper.builder().build();

    private DictionaryIndex() {
    }

    static String key(PartOfSpeech pos, String lemma) {
        return pos.label() + ":" + lemma;
    }

    /** Receives entries one at a time so the builder never holds all of WordNet twice. */
    static final class Writer implements AutoCloseable {
        private final IndexWriter writer;

        Writer(Path folder) throws IOException {
            IndexWriterConfig config = new IndexWriterConfig(new KeywordAnalyzer());
            config.setOpenMode(IndexWriterConfig.OpenMode.CREATE);
            config.setUseCompoundFile(true);
            config.setRAMBufferSizeMB(64);
            writer = new IndexWriter(FSDirectory.open(folder), config);
        }

        void add(DictionaryEntry e) throws IOException {
            Document d = new Document();
            d.add(new StringField(KEY, key(e.partOfSpeech(), e.lemma()), Field.Store.NO));
            d.add(new StringField(LEMMA, e.lemma(), Field.Store.NO));
            d.add(new StoredField(JSON, MAPPER.writeValueAsBytes(e)));
            writer.addDocument(d);
        }

        @Override
        public void close() throws IOException {
            // one segment: the reader checks lemma existence through one terms dictionary
            writer.forceMerge(1);
            writer.commit();
            var dir = writer.getDirectory();
            writer.close();
            dir.close();
        }
    }

    static void writeExceptions(Map<PartOfSpeech, Map<String, List<String>>> exceptions, Path file) throws IOException {
        Files.createDirectories(file.getParent());
        try (java.io.Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            for (PartOfSpeech pos : PartOfSpeech.values()) {
                var map = exceptions.getOrDefault(pos, Map.of());
                for (String form : map.keySet().stream().sorted().toList()) {
                    w.write(pos.label() + "\t" + form + "\t" + String.join("\t", map.get(form)) + "\n");
                }
            }
        }
    }
}
