package org.inkgate.format.bundle;

import java.util.List;
import java.util.Objects;

/** A short questionnaire (Likert and free-text items) asked before or after the tasks. */
public record QuestionnaireSpec(String id, String title, List<QuestionItem> items) {

    public QuestionnaireSpec {
        items = List.copyOf(Objects.requireNonNullElse(items, List.of()));
    }
}
