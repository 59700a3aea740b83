package org.inkgate.packs.spelling;

import java.util.List;

/**
 * One problem the checker found in the text.
 *
 * @param kind        spelling or grammar
 * @param ruleId      LanguageTool's rule id, e.g. {@code MORFOLOGIK_RULE_EN_GB}
 * @param category    LanguageTool's category id, e.g. {@code TYPOS}
 * @param start       offset of the first character in the whole text
 * @param end         offset after the last character
 * @param message     message for the candidate; never names a correction when the mode gives no suggestions
 * @param suggestions replacements, always empty when the task's mode gives no suggestions
 */
public record CheckIssue(Kind kind, String ruleId, String category, int start, int end, String message, List<String> suggestions) {
    public CheckIssue {
        suggestions = List.copyOf(suggestions);
    }

    /** Spelling (a word not in the dictionary) or grammar (any other rule). */
    public enum Kind {
        SPELLING,
        GRAMMAR
    }

    CheckIssue shift(int offset) {
        return new CheckIssue(kind, ruleId, category, start + offset, end + offset, message, suggestions);
    }
}
