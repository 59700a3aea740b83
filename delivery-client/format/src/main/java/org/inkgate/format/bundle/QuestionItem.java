package org.inkgate.format.bundle;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Objects;

/**
 * One questionnaire item.
 *
 * @param id     stable item id
 * @param text   the question
 * @param kind   Likert scale or free text
 * @param labels for a Likert item, the labels of its points from lowest to highest
 */
public record QuestionItem(String id, String text, Kind kind, List<String> labels) {

    public enum Kind {
        @JsonProperty("likert") LIKERT,
        @JsonProperty("free-text") FREE_TEXT
    }

    public QuestionItem {
        labels = List.copyOf(Objects.requireNonNullElse(labels, List.of()));
    }
}
