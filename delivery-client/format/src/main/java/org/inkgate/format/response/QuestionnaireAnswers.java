package org.inkgate.format.response;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/** Answers to one questionnaire: item id to the chosen Likert point (1-based) or the free text. */
public record QuestionnaireAnswers(String questionnaireId, Map<String, String> answers) {

    public QuestionnaireAnswers {
        answers = java.util.Collections.unmodifiableMap(new TreeMap<>(Objects.requireNonNullElse(answers, Map.of())));
    }
}
