package org.inkgate.analysis.data;

/**
 * One questionnaire item asked of one candidate: {@code answer} is the Likert point ("1" for the
 * lowest label), the free text, or empty when the candidate left the item unanswered.
 * {@code conditions} are the resource conditions the candidate sat, in the order sat, separated by
 * spaces (the groups the section compares); level may be empty.
 */
public record QuestionnaireAnswer(String candidate, String level, String conditions, String questionnaire, String item,
        String answer) {

    public QuestionnaireAnswer {
        level = level == null ? "" : level;
        conditions = conditions == null ? "" : conditions;
        answer = answer == null ? "" : answer;
    }

    public boolean answered() {
        return !answer.isEmpty();
    }
}
