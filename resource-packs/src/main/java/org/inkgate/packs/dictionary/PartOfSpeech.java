package org.inkgate.packs.dictionary;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.Locale;

/** WordNet's four parts of speech (adjective satellites count as adjectives). */
public enum PartOfSpeech {
    @JsonProperty("noun") NOUN("noun"),
    @JsonProperty("verb") VERB("verb"),
    @JsonProperty("adjective") ADJECTIVE("adj"),
    @JsonProperty("adverb") ADVERB("adv");

    private final String fileSuffix;

    PartOfSpeech(String fileSuffix) {
        this.fileSuffix = fileSuffix;
    }

    /** The suffix of WordNet's files for this part of speech: {@code noun}, {@code verb}, {@code adj}, {@code adv}. */
    public String fileSuffix() {
        return fileSuffix;
    }

    /** Lower-case English name, e.g. {@code noun}. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
