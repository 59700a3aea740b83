package org.inkgate.packs.policy;

import com.fasterxml.jackson.annotation.JsonProperty;

/** A writing tool a task may offer; the closed set the whole system controls. */
public enum Tool {
    @JsonProperty("spelling") SPELLING,
    @JsonProperty("grammar") GRAMMAR,
    @JsonProperty("glossary") GLOSSARY,
    @JsonProperty("dictionary") DICTIONARY
}
