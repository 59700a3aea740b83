package org.inkgate.analysis.data;

import java.util.List;

/** The questionnaire input of one analysis: the items (in the order asked) and every item asked of every candidate. */
public record QuestionnaireData(List<QuestionnaireItem> items, List<QuestionnaireAnswer> answers) {

    public QuestionnaireData {
        items = List.copyOf(items);
        answers = List.copyOf(answers);
    }

    public boolean isEmpty() {
        return answers.isEmpty();
    }
}
