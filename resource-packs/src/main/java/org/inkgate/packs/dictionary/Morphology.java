package org.inkgate.packs.dictionary;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * WordNet's morphological processing ("morphy", described in WordNet's morphy(7WN) manual
 * page): a word is first looked up in the part of speech's exception list (irregular forms such
 * as geese -> goose, went -> go, better -> good), and then the suffix detachment rules of that
 * part of speech are tried; a candidate counts only when it is a lemma of the dictionary.
 *
 * <p>Simplifications, stated so nobody relies on them: collocations are handled by inflecting
 * their first word (verb phrases such as "looked up") or their last word (noun compounds
 * such as "accretion discs") only, and morphy's special "-ful" rule is not applied.
 */
public final class Morphology {
    /** Whether a lemma exists in a part of speech. */
    @FunctionalInterface
    public interface LemmaIndex {
        boolean contains(PartOfSpeech pos, String lemma);
    }

    /** Detachment rules, suffix then replacement, from morphy(7WN). */
    private static final Map<PartOfSpeech, String[][]> RULES = new EnumMap<>(Map.of(
            PartOfSpeech.NOUN, new String[][] {
                    {"s", ""}, {"ses", "s"}, {"xes", "x"}, {"zes", "z"}, {"ches", "ch"}, {"shes", "sh"}, {"men", "man"}, {"ies", "y"}},
            PartOfSpeech.VERB, new String[][] {
                    {"s", ""}, {"ies", "y"}, {"es", "e"}, {"es", ""}, {"ed", "e"}, {"ed", ""}, {"ing", "e"}, {"ing", ""}},
            PartOfSpeech.ADJECTIVE, new String[][] {
                    {"er", ""}, {"est", ""}, {"er", "e"}, {"est", "e"}},
            PartOfSpeech.ADVERB, new String[][] {}));

    private final Map<PartOfSpeech, Map<String, List<String>>> exceptions;
    private final LemmaIndex index;

    /** @param exceptions inflected form -> base forms, per part of speech (WordNet's *.exc files) */
    public Morphology(Map<PartOfSpeech, Map<String, List<String>>> exceptions, LemmaIndex index) {
        this.exceptions = new EnumMap<>(PartOfSpeech.class);
        for (PartOfSpeech pos : PartOfSpeech.values()) {
            this.exceptions.put(pos, Map.copyOf(exceptions.getOrDefault(pos, new HashMap<>())));
        }
        this.index = index;
    }

    /** The lemmas of this part of speech the word may be a form of, the word itself first when it is one. */
    public List<String> baseForms(PartOfSpeech pos, String word) {
        Set<String> out = new LinkedHashSet<>();
        addSingle(pos, word, out);
        if (out.isEmpty() && word.indexOf(' ') > 0) {
            int first = word.indexOf(' ');
            int last = word.lastIndexOf(' ');
            for (String head : singleForms(pos, word.substring(0, first))) {
                String candidate = head + word.substring(first);
                if (index.contains(pos, candidate)) {
                    out.add(candidate);
                }
            }
            for (String tail : singleForms(pos, word.substring(last + 1))) {
                String candidate = word.substring(0, last + 1) + tail;
                if (index.contains(pos, candidate)) {
                    out.add(candidate);
                }
            }
        }
        return new ArrayList<>(out);
    }

    private void addSingle(PartOfSpeech pos, String word, Set<String> out) {
        for (String form : singleForms(pos, word)) {
            if (index.contains(pos, form)) {
                out.add(form);
            }
        }
    }

    /** Candidate forms before the existence check: the word, its exception bases, its detached forms. */
    private List<String> singleForms(PartOfSpeech pos, String word) {
        List<String> forms = new ArrayList<>();
        forms.add(word);
        forms.addAll(exceptions.get(pos).getOrDefault(word, List.of()));
        for (String[] rule : RULES.get(pos)) {
            if (word.endsWith(rule[0]) && word.length() > rule[0].length()) {
                forms.add(word.substring(0, word.length() - rule[0].length()) + rule[1]);
            }
        }
        return forms;
    }
}
