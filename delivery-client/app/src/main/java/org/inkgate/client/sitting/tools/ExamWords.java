package org.inkgate.client.sitting.tools;

import java.util.LinkedHashSet;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Words of a prompt that the spelling check must accept: the capitalised words (names of people,
 * places and things the prompt invents, such as a town's name), so that a candidate who copies a
 * name from the prompt is never told it is misspelled. Ordinary lower-case words are left to the
 * dictionary.
 */
public final class ExamWords {

    private static final Pattern CAPITALISED = Pattern.compile("\\b\\p{Lu}[\\p{L}'\u2019-]*\\p{L}\\b");

    private ExamWords() {
    }

    /** The capitalised words of the text, in first-seen order, without repeats. */
    public static Set<String> of(String text) {
        Set<String> words = new LinkedHashSet<>();
        Matcher m = CAPITALISED.matcher(text == null ? "" : text);
        while (m.find()) {
            words.add(m.group());
        }
        return words;
    }
}
