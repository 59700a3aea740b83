package org.inkgate.packs.spelling;

import com.fasterxml.jackson.annotation.JsonProperty;

/** The English spellings an exam may check against, as LanguageTool 6.6 offers them. */
public enum EnglishVariant {
    @JsonProperty("en-US") EN_US("en-US"),
    @JsonProperty("en-GB") EN_GB("en-GB"),
    @JsonProperty("en-CA") EN_CA("en-CA"),
    @JsonProperty("en-AU") EN_AU("en-AU"),
    @JsonProperty("en-NZ") EN_NZ("en-NZ"),
    @JsonProperty("en-ZA") EN_ZA("en-ZA");

    private final String tag;

    EnglishVariant(String tag) {
        this.tag = tag;
    }

    /** The BCP 47 tag, e.g. {@code en-GB}. */
    public String tag() {
        return tag;
    }

    /** The variant for a tag such as {@code en-GB}; throws naming the tags offered. */
    public static EnglishVariant fromTag(String tag) {
        for (EnglishVariant v : values()) {
            if (v.tag.equalsIgnoreCase(tag)) {
                return v;
            }
        }
        throw new IllegalArgumentException("English variant \"" + tag + "\" is not offered; use one of en-US, en-GB, en-CA, en-AU, en-NZ, en-ZA");
    }
}
