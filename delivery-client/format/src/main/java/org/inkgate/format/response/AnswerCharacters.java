package org.inkgate.format.response;

/**
 * Which characters a candidate's answer text may hold: all but the C0 control characters other than
 * tab, line feed and carriage return. Those are the controls XML 1.0 forbids outright (section 2.2,
 * production {@code Char}), so no QTI results file could carry them, and among them is U+0000, which
 * a PostgreSQL store cannot hold and collect refuses. A keyboard never types them; an input method
 * or a platform quirk could, so the client's editor drops them on the way in and the answer, the
 * process log and the package always agree.
 */
public final class AnswerCharacters {

    private AnswerCharacters() {
    }

    /** Whether {@code c} may stand in an answer. */
    public static boolean allowed(char c) {
        return c >= 0x20 || c == '\t' || c == '\n' || c == '\r';
    }

    /** {@code text} without the characters an answer may not hold; the same instance when it holds none. */
    public static String clean(String text) {
        if (text == null) {
            return null;
        }
        int first = 0;
        while (first < text.length() && allowed(text.charAt(first))) {
            first++;
        }
        if (first == text.length()) {
            return text;
        }
        StringBuilder kept = new StringBuilder(text.length()).append(text, 0, first);
        for (int i = first + 1; i < text.length(); i++) {
            char c = text.charAt(i);
            if (allowed(c)) {
                kept.append(c);
            }
        }
        return kept.toString();
    }
}
