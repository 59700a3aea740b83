package org.inkgate.rehearsal;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What one invented candidate does, decided from their place in the room (no randomness): how
 * fast they type, which planted misspellings they correct with a suggestion or ignore, which
 * lookups they make and whether they insert from the panel, how long each tool's page stays in
 * view, and their questionnaire answers. Every figure the rehearsal asserts follows from this
 * and the scripted clock, never from what the programs report.
 */
record CandidateScript(int index, String number, String level) {

    /** The tools task's text, typed in three parts around a glossary term and a dictionary word. */
    static final String TOOLS_PART_1 = "The ferry to the island will recieve a new ";
    static final String GLOSSARY_QUERY = "timetable";
    static final String TOOLS_PART_2 = " from Monday. Passengers shoud buy a ";
    static final String DICTIONARY_QUERY = "ticket";
    static final String TOOLS_PART_3 = " before the journey.";
    /** Planted misspellings and the suggestion a candidate who corrects them picks. */
    static final String MISSPELT_1 = "recieve";
    static final String CORRECTED_1 = "receive";
    static final String MISSPELT_2 = "shoud";
    /** A lookup that finds nothing (an empty query in the tool-use table). */
    static final String EMPTY_QUERY = "qzxvwk";
    /** The task without tools: misspellings stay, nothing flags them. */
    static final String PLAIN_TEXT = "Dear council, the Saturday markit is too smal for the stalls. Please open the old hall.";
    /** Where a killed candidate's client dies: after this many characters of the plain text. */
    static final int KILL_AFTER = "Dear council, the Saturday markit is too smal".length();

    /** Milliseconds between keystrokes (a typing speed of about 280 to 540 characters a minute). */
    long msPerChar() {
        return 110 + 35L * (index % 4);
    }

    boolean acceptsFirstSuggestion() {
        return index % 2 == 0;
    }

    /** Ignores the second misspelling (else leaves it as it is, neither accepted nor ignored). */
    boolean ignoresSecond() {
        return index % 3 == 0;
    }

    boolean insertsGlossaryTerm() {
        return index % 2 == 1;
    }

    boolean makesEmptyLookup() {
        return index % 3 == 1;
    }

    boolean insertsDictionaryWord() {
        return index % 3 != 2;
    }

    /** How long the candidate reads a tool's page before acting (k-th pause of the task). */
    long dwellMillis(int k) {
        return 2_500 + 700L * (index % 6) + 300L * k;
    }

    /** Answer to "the tools helped me" (1-5). */
    int toolsHelped() {
        return 1 + index % 5;
    }

    /** Answer to "I had enough time" (1-5). */
    int timeEnough() {
        return 5 - (index + 2) % 5;
    }

    String comment() {
        return "Invented comment " + (index + 1);
    }

    /** The tools task's final text under this script. */
    String toolsText() {
        String first = acceptsFirstSuggestion() ? TOOLS_PART_1.replace(MISSPELT_1, CORRECTED_1) : TOOLS_PART_1;
        return first + GLOSSARY_QUERY + TOOLS_PART_2 + DICTIONARY_QUERY + TOOLS_PART_3;
    }

    /** Words as a person counts them here: runs of non-space characters (the texts hold no hyphens or numbers). */
    static int words(String text) {
        String t = text.strip();
        return t.isEmpty() ? 0 : t.split("\\s+").length;
    }

    /**
     * The tools task's tool-use counts, per tool: queries, empty queries, entries opened,
     * suggestions shown, accepted, ignored, insertions (the order of the response format's ToolUse).
     */
    Map<String, List<Integer>> toolUse() {
        Map<String, List<Integer>> use = new LinkedHashMap<>();
        int shown = 1 + (ignoresSecond() ? 1 : 0);
        int accepted = acceptsFirstSuggestion() ? 1 : 0;
        int ignored = (acceptsFirstSuggestion() ? 0 : 1) + (ignoresSecond() ? 1 : 0);
        use.put("spelling", List.of(0, 0, 0, shown, accepted, ignored, 0));
        use.put("glossary", List.of(1, 0, 1, 0, 0, 0, insertsGlossaryTerm() ? 1 : 0));
        int dq = 1 + (makesEmptyLookup() ? 1 : 0);
        use.put("dictionary", List.of(dq, makesEmptyLookup() ? 1 : 0, 1, 0, 0, 0, insertsDictionaryWord() ? 1 : 0));
        return use;
    }

    /** The analysis's "uses" of a tool: the candidate's own actions (queries, accepted, ignored). */
    static int uses(List<Integer> counts) {
        return counts.get(0) + counts.get(4) + counts.get(5);
    }

    /** Lookups with text, as the process measures count them. */
    int lookups() {
        return 2 + (makesEmptyLookup() ? 1 : 0);
    }

    /** Every lookup but the empty one is followed within a minute by its word in the answer. */
    int lookupsUsed() {
        return 2;
    }

    static List<CandidateScript> room(int candidates, List<String> levels) {
        List<CandidateScript> out = new ArrayList<>();
        for (int i = 0; i < candidates; i++) {
            out.add(new CandidateScript(i, String.format("R%03d", i + 1), levels.get(i % levels.size())));
        }
        return out;
    }
}
