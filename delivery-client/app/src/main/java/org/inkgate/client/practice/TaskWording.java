package org.inkgate.client.practice;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;

/** Puts a task's resource policy, word guidance and time limit into plain words for candidates. */
public final class TaskWording {

    /** Shown when a task's policy offers nothing. */
    public static final String NO_TOOLS = "No writing tools in this task";

    private TaskWording() {
    }

    /** One line per tool the policy offers, or the single line {@link #NO_TOOLS}. */
    public static List<String> tools(ResourcePolicy policy) {
        List<String> lines = new ArrayList<>();
        switch (policy.spelling()) {
            case OFF -> { }
            case UNDERLINE_ONLY -> lines.add("Spelling check (marks mistakes, no suggestions)");
            case SUGGESTIONS -> lines.add("Spelling check with suggestions");
            case SPELLING_AND_GRAMMAR -> lines.add("Spelling and grammar check with suggestions");
        }
        if (policy.glossaryPack() != null) {
            lines.add("Glossary of terms");
        }
        if (policy.dictionaryPack() != null) {
            lines.add("Dictionary");
        }
        if (policy.insertFromPanel()) {
            lines.add("Insert text from the resource panel");
        }
        if (policy.paste() == PastePolicy.WITHIN_RESPONSE) {
            lines.add("Copy and paste within your own answer");
        }
        return lines.isEmpty() ? List.of(NO_TOOLS) : List.copyOf(lines);
    }

    /** The word guidance as advice, e.g. "Aim for 80 to 120 words", or empty text when there is none. */
    public static String guidance(WordGuidance words) {
        if (words == null || (words.min() == 0 && words.max() == 0)) {
            return "";
        }
        if (words.max() == 0) {
            return "Aim for at least " + words.min() + " words";
        }
        if (words.min() == 0) {
            return "Aim for at most " + words.max() + " words";
        }
        return "Aim for " + words.min() + " to " + words.max() + " words";
    }

    /** What the time limit means here: practice itself is never timed. */
    public static String time(int timeLimitSeconds) {
        if (timeLimitSeconds <= 0) {
            return "Untimed. Practice is not timed either.";
        }
        int minutes = (timeLimitSeconds + 59) / 60;
        return minutes + (minutes == 1 ? " minute" : " minutes") + " in a real sitting. Practice is not timed.";
    }

    /** The live count, e.g. "1 word" or "42 words". */
    public static String wordCount(int words) {
        return words + (words == 1 ? " word" : " words");
    }
}
