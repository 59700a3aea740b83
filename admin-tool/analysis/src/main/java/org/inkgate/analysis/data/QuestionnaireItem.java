package org.inkgate.analysis.data;

import java.util.List;
import java.util.Objects;

/**
 * One questionnaire item as the exam defined it: a Likert item with its labels (lowest first; the
 * answer is the point, 1 for the lowest), a free-text item, or an item whose definition the input
 * did not carry ({@code UNDEFINED}: its answers are listed as given, never interpreted).
 */
public record QuestionnaireItem(String questionnaire, String id, String text, Kind kind, List<String> labels) {

    /** What the answer is. */
    public enum Kind { LIKERT, FREE_TEXT, UNDEFINED }

    public QuestionnaireItem {
        Objects.requireNonNull(questionnaire, "questionnaire");
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(kind, "kind");
        text = text == null ? "" : text;
        labels = List.copyOf(labels == null ? List.of() : labels);
        if (kind == Kind.LIKERT && labels.size() < 2) {
            throw new IllegalArgumentException("Likert item " + id + " of " + questionnaire + " needs at least 2 labels");
        }
    }

    /** Points of a Likert scale (0 for other kinds). */
    public int points() {
        return kind == Kind.LIKERT ? labels.size() : 0;
    }
}
