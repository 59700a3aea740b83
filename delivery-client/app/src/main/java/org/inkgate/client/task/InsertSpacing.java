package org.inkgate.client.task;

/**
 * The spaces a writer would type around a word inserted from the panel: one space between it and
 * a word or sentence before it, one between it and a word after it; none next to a space already
 * there (no double spaces), after an opening bracket or quote, or before punctuation that closes
 * or ends (. , ; : ! ? and closing brackets and quotes). English typing convention (common practice).
 */
final class InsertSpacing {

    /** What goes into the answer, and where the caret goes in it: just after the inserted word. */
    record Spaced(String text, int caret) {
    }

    private static final String OPENING = "([{\u201C\u2018\u00AB";
    private static final String NO_SPACE_BEFORE = ".,;:!?)]}\u201D\u2019\u00BB";

    private InsertSpacing() {
    }

    /**
     * @param answer the answer as it stands
     * @param from   start of the selection the word replaces (the caret when nothing is selected)
     * @param to     end of that selection
     * @param word   the word or term from the entry
     */
    static Spaced around(String answer, int from, int to, String word) {
        String core = word.strip();
        if (core.isEmpty()) {
            return new Spaced(word, word.length());
        }
        boolean before = from > 0 && needsSpaceAfter(answer, from - 1);
        boolean after = to < answer.length() && needsSpaceBefore(answer.charAt(to));
        String lead = before ? " " : "";
        return new Spaced(lead + core + (after ? " " : ""), lead.length() + core.length());
    }

    /** Whether the character at {@code i}, just before the insertion, wants a space between it and a word. */
    private static boolean needsSpaceAfter(String answer, int i) {
        char c = answer.charAt(i);
        if (Character.isWhitespace(c) || OPENING.indexOf(c) >= 0 || c == '-' || c == '/' || c == '\u2014' || c == '\u2013') {
            return false;
        }
        if (c == '"' || c == '\'') {
            // a straight quote opens when a space (or the start) is before it, and closes after a word
            return i > 0 && !Character.isWhitespace(answer.charAt(i - 1)) && OPENING.indexOf(answer.charAt(i - 1)) < 0;
        }
        return true;
    }

    /** Whether the character just after the insertion wants a space between the word and it. */
    private static boolean needsSpaceBefore(char c) {
        if (Character.isWhitespace(c) || NO_SPACE_BEFORE.indexOf(c) >= 0 || c == '"' || c == '\'' || c == '-' || c == '/') {
            return false;
        }
        return Character.isLetterOrDigit(c) || OPENING.indexOf(c) >= 0;
    }
}
