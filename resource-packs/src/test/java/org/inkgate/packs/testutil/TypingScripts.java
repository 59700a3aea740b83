package org.inkgate.packs.testutil;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;

/**
 * Seeded random typing scripts with planted misspellings, for the property tests of issue 13
 * (the checker's marks after it settles equal what a newly built checker finds in the final
 * text). The same seed gives the same script to the engine test in resource-packs and to the
 * task workspace test in the client, so a failure seen in one can be replayed in the other.
 *
 * <p>A script is a list of {@link Step}s a typist does: type text at the caret, stop for a while
 * (a check may run), move the caret, delete backwards, copy part of the answer and paste it at the
 * caret, accept a suggestion. Positions are fractions of the text's length, so a script needs no
 * knowledge of the text; {@link Text} resolves them the same way for every interpreter.
 *
 * <p>The misspellings are commonly cited ones (from memory; they appear on many published lists
 * of commonly misspelled English words); the other words are plain English words. Which words a
 * checker flags is never asserted here: the reference is always a newly built checker.
 */
public final class TypingScripts {

    /** Misspellings planted in the text. */
    public static final List<String> MISSPELLINGS = List.of("recieve", "seperate", "definately", "occured", "accomodate",
            "untill", "tommorow", "wierd", "beleive", "freind", "goverment", "neccessary", "adress", "begining",
            "enviroment", "existance", "foriegn", "independant", "noticable", "reccomend", "truely", "leeve", "mornig",
            "folowing", "evning");
    private static final List<String> WORDS = List.of("the", "ferry", "harbour", "leaves", "early", "and", "returns",
            "late", "every", "day", "we", "walk", "to", "the", "quay", "with", "our", "bags", "a", "small", "boat",
            "waits", "near", "old", "bridge", "people", "buy", "tickets", "at", "office", "weather", "changes", "quickly",
            "in", "winter", "council", "should", "add", "another", "crossing", "for", "workers", "children", "school",
            "town", "island", "market", "opens", "on", "Saturday", "Sunday", "evening", "morning", "water", "is", "calm");

    /** The default number of scripts, unless the named system property says more. */
    public static List<Long> seeds(String property, int defaultCount, long firstSeed) {
        int n = Integer.getInteger(property, defaultCount);
        long first = Long.getLong(property + ".seed", firstSeed);
        return LongStream.range(first, first + n).boxed().toList();
    }

    /** One thing the typist does. */
    public sealed interface Step {
        /** Types this text at the caret, key by key. */
        record Type(String text) implements Step {
        }

        /** Stops typing for this long (at 300 ms or more a check of the text so far runs). */
        record Pause(int millis) implements Step {
        }

        /** Puts the caret at this fraction of the text's length. */
        record MoveCaret(double where) implements Step {
        }

        /** Deletes this many characters before the caret (Backspace). */
        record Backspace(int count) implements Step {
        }

        /** Copies up to {@code length} characters starting at the fraction {@code from} of the text, and pastes them at the caret. */
        record Paste(double from, int length) implements Step {
        }

        /** Accepts the first suggestion of one of the flags shown (picked by this fraction of their number), if any has one. */
        record AcceptSuggestion(double which) implements Step {
        }
    }

    /** A script and the seed that made it. */
    public record Script(long seed, List<Step> steps) {
        public Script {
            steps = List.copyOf(steps);
        }

        @Override
        public String toString() {
            return "typing script of seed " + seed + " (" + steps.size() + " steps)";
        }
    }

    private TypingScripts() {
    }

    /**
     * A script of three to six sentences over one to three paragraphs, with planted misspellings,
     * edits earlier in the text, pastes and accepted suggestions, typed by a fast, steady or slow
     * typist (pauses mostly below, around or above the 300 ms the client waits before checking).
     */
    public static Script generate(long seed) {
        Random r = new Random(seed);
        int[] pauses = switch (r.nextInt(3)) {
            case 0 -> new int[] {0, 0, 0, 40, 120, 450};   // fast: rarely stops long enough for a check
            case 1 -> new int[] {0, 60, 150, 250, 320, 600};
            default -> new int[] {150, 350, 500, 800, 1200}; // slow: a check after most words
        };
        List<Step> steps = new ArrayList<>();
        int sentences = 3 + r.nextInt(4);
        for (int s = 0; s < sentences; s++) {
            if (s > 0 && r.nextInt(4) == 0) {
                steps.add(new Step.Type("\n"));
            }
            List<String> chunks = chunks(sentence(r), r);
            for (String chunk : chunks) {
                steps.add(new Step.Type(chunk));
                int pause = pauses[r.nextInt(pauses.length)];
                if (pause > 0) {
                    steps.add(new Step.Pause(pause));
                }
            }
            switch (r.nextInt(8)) {
                case 0 -> { // go back and add a word, then carry on at the end
                    steps.add(new Step.MoveCaret(r.nextDouble()));
                    steps.add(new Step.Type(word(r) + " "));
                    steps.add(new Step.MoveCaret(1.0));
                }
                case 1 -> { // go back and delete a few characters
                    steps.add(new Step.MoveCaret(0.2 + 0.8 * r.nextDouble()));
                    steps.add(new Step.Backspace(1 + r.nextInt(6)));
                    steps.add(new Step.MoveCaret(1.0));
                }
                case 2 -> steps.add(new Step.Backspace(1 + r.nextInt(4))); // a slip at the end
                case 3 -> steps.add(new Step.Paste(r.nextDouble(), 3 + r.nextInt(20)));
                case 4 -> { // stop, look at the marks, take a suggestion, carry on at the end
                    steps.add(new Step.Pause(900));
                    steps.add(new Step.AcceptSuggestion(r.nextDouble()));
                    steps.add(new Step.MoveCaret(1.0));
                }
                default -> {
                }
            }
        }
        return new Script(seed, steps);
    }

    private static String sentence(Random r) {
        int words = 4 + r.nextInt(6);
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < words; i++) {
            String w = r.nextInt(4) == 0 ? MISSPELLINGS.get(r.nextInt(MISSPELLINGS.size())) : word(r);
            if (i == 0) {
                w = Character.toUpperCase(w.charAt(0)) + w.substring(1);
            }
            b.append(i == 0 ? "" : " ").append(w);
        }
        return b.append(". ").toString();
    }

    private static String word(Random r) {
        return WORDS.get(r.nextInt(WORDS.size()));
    }

    /** Splits a sentence into runs of one to four words typed without a stop. */
    private static List<String> chunks(String sentence, Random r) {
        List<String> out = new ArrayList<>();
        String[] words = sentence.split("(?<= )");
        int i = 0;
        while (i < words.length) {
            int n = Math.min(words.length - i, 1 + r.nextInt(4));
            out.add(String.join("", List.of(words).subList(i, i + n)));
            i += n;
        }
        return out;
    }

    /** The answer as a script leaves it: text and caret, with positions resolved the same way for every interpreter. */
    public static final class Text {
        private final StringBuilder text = new StringBuilder();
        private int caret;

        public String text() {
            return text.toString();
        }

        public int caret() {
            return caret;
        }

        /** The offset a fraction of the text's length stands for. */
        public int at(double fraction) {
            return Math.max(0, Math.min(text.length(), (int) Math.round(fraction * text.length())));
        }

        public void type(String s) {
            text.insert(caret, s);
            caret += s.length();
        }

        public void moveCaret(double where) {
            caret = at(where);
        }

        /** Deletes up to {@code count} characters before the caret; returns how many it deleted. */
        public int backspace(int count) {
            int n = Math.min(count, caret);
            text.delete(caret - n, caret);
            caret -= n;
            return n;
        }

        /** The range a paste step copies: [start, end). */
        public int[] pasteRange(Step.Paste p) {
            int start = at(p.from());
            return new int[] {start, Math.min(text.length(), start + p.length())};
        }

        public void paste(Step.Paste p) {
            int[] range = pasteRange(p);
            type(text.substring(range[0], range[1]));
        }

        /** Replaces [start, end) (an accepted suggestion); the caret goes after the replacement. */
        public void replace(int start, int end, String with) {
            text.replace(start, end, with);
            caret = start + with.length();
        }
    }
}
