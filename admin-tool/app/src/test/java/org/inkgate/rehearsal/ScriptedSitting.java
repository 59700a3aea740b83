package org.inkgate.rehearsal;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javafx.scene.input.KeyCode;
import org.inkgate.packs.spelling.CheckIssue;

/**
 * Walks one candidate through a whole sitting in a {@link Seat} as their {@link CandidateScript}
 * says, and writes down, on the scripted clock, what the script did: the times each tool's page
 * was in view and how long the tools task lasted. Those times are the expected values of the
 * process measures; nothing here reads a figure from the programs.
 */
final class ScriptedSitting {

    /** What the script did in one sitting, on its clock. */
    static final class Done {
        /** Milliseconds the candidate was in the panel (keyboard focus in it) on each tool's page, in the tools task. */
        final Map<String, Long> pageInView = new LinkedHashMap<>();
        /** From the tools task's start (its editor and panel shown) to its end (finish confirmed). */
        long toolsTaskMillis;
        /** The text the recovered client showed on resuming (killed candidate only). */
        String recoveredText;
    }

    private final Seat seat;
    private final CandidateScript script;
    private final Done done = new Done();

    ScriptedSitting(Seat seat, CandidateScript script) {
        this.seat = seat;
        this.script = script;
    }

    /** A sitting from the invigilator's set-up to the hand-in; {@code toolsFirst} per task in form order. */
    Done sitFromStart(String pin, Path output, List<Boolean> withTools) {
        seat.fill("setupPin", pin);
        seat.fill("setupOutput", output.toString());
        seat.press("setupContinue");
        seat.fill("candidateNumber", script.number());
        seat.press("signInButton");
        seat.press("startButton");
        for (int k = 0; k < withTools.size(); k++) {
            seat.awaitTask(k + 1);
            if (withTools.get(k)) {
                toolsTask();
            } else {
                seat.type(CandidateScript.PLAIN_TEXT, script.msPerChar());
                finishTask();
            }
        }
        questionnaireAndHandIn();
        return done;
    }

    /**
     * A sitting whose client was killed in its first task (without tools) after typing
     * {@code typedBefore}: the invigilator's recovery PIN, downtime not credited, then the rest.
     */
    Done sitFromRecovery(String pin, Path output, String typedBefore, List<Boolean> withTools) {
        seat.await("recoveryScreen", javafx.scene.Node.class);
        // the screen proposes the output folder chosen at set-up, remembered in the sitting's database: kept as proposed
        javafx.scene.control.TextField field = seat.await("recoveryOutput", javafx.scene.control.TextField.class);
        String proposed = Seat.onFx(field::getText);
        if (!Path.of(proposed).toAbsolutePath().equals(output.toAbsolutePath())) {
            throw new AssertionError("the recovery screen proposes " + proposed + ", not the set-up's output folder " + output);
        }
        seat.fill("recoveryPin", pin);
        seat.press("resumeButton");
        seat.press("continueButton");
        seat.awaitTask(1);
        done.recoveredText = seat.answerText();
        seat.type(CandidateScript.PLAIN_TEXT.substring(typedBefore.length()), script.msPerChar());
        finishTask();
        for (int k = 1; k < withTools.size(); k++) {
            seat.awaitTask(k + 1);
            if (withTools.get(k)) {
                toolsTask();
            } else {
                seat.type(CandidateScript.PLAIN_TEXT, script.msPerChar());
                finishTask();
            }
        }
        questionnaireAndHandIn();
        return done;
    }

    private void toolsTask() {
        ScriptedClock clock = seat.clock;
        long ms = script.msPerChar();
        int pause = 0;
        // the panel stands beside the answer from the start, but the candidate is in it only while
        // keyboard focus is: from a tool's shortcut until the insertion or Esc hands focus back to the answer
        long start = clock.millis();
        long since;

        seat.type(CandidateScript.TOOLS_PART_1, ms);

        // glossary: look the term up, open the entry, insert it or type it
        since = switchPage("glossary", KeyCode.G, "glossaryQuery");
        clock.advanceMillis(script.dwellMillis(pause++));
        seat.typeAndEnter(CandidateScript.GLOSSARY_QUERY);
        seat.waitUntil("the glossary's hits", () -> seat.textOf("glossaryStatus").contains("Choose one"));
        clock.advanceMillis(script.dwellMillis(pause++));
        seat.focus("glossaryResults");
        seat.key(KeyCode.ENTER);
        seat.waitUntil("the glossary entry", () -> !seat.items("glossaryInsertable").isEmpty());
        clock.advanceMillis(script.dwellMillis(pause++));
        if (script.insertsGlossaryTerm()) {
            seat.select("glossaryInsertable", CandidateScript.GLOSSARY_QUERY);
            seat.press("glossaryInsert"); // the insertion puts focus back in the answer
            leftPanel("glossary", since);
            seat.awaitTask(seat.workspaces.size());
        } else {
            backToAnswer();
            leftPanel("glossary", since);
            seat.type(CandidateScript.GLOSSARY_QUERY, ms);
        }

        seat.type(CandidateScript.TOOLS_PART_2, ms);

        // dictionary: perhaps a lookup that finds nothing, then the word, its entry, insert or type
        since = switchPage("dictionary", KeyCode.D, "dictionaryQuery");
        if (script.makesEmptyLookup()) {
            clock.advanceMillis(script.dwellMillis(pause++));
            seat.typeAndEnter(CandidateScript.EMPTY_QUERY);
            seat.waitUntil("the empty lookup's answer", () -> seat.textOf("dictionaryStatus").startsWith("No entry"));
            seat.focus("dictionaryQuery");
        }
        clock.advanceMillis(script.dwellMillis(pause++));
        if (script.makesEmptyLookup()) {
            // the field still holds the empty query: select it so the word replaces it, as a person would
            Seat.onFx(() -> {
                ((javafx.scene.control.TextField) seat.await("dictionaryQuery", javafx.scene.control.TextField.class)).selectAll();
                return null;
            });
        }
        seat.typeAndEnter(CandidateScript.DICTIONARY_QUERY);
        seat.waitUntil("the dictionary's entries", () -> seat.textOf("dictionaryStatus").contains("for \u201C"
                + CandidateScript.DICTIONARY_QUERY + "\u201D. Choose"));
        clock.advanceMillis(script.dwellMillis(pause++));
        seat.focus("dictionaryResults");
        seat.key(KeyCode.ENTER);
        seat.waitUntil("the dictionary entry", () -> !seat.items("dictionaryInsertable").isEmpty());
        clock.advanceMillis(script.dwellMillis(pause++));
        if (script.insertsDictionaryWord()) {
            seat.select("dictionaryInsertable", CandidateScript.DICTIONARY_QUERY);
            seat.press("dictionaryInsert");
            leftPanel("dictionary", since);
            seat.awaitTask(seat.workspaces.size());
        } else {
            backToAnswer();
            leftPanel("dictionary", since);
            seat.type(CandidateScript.DICTIONARY_QUERY, ms);
        }

        seat.type(CandidateScript.TOOLS_PART_3, ms);

        // spelling: the planted misspellings are flagged; correct or ignore the first, ignore or leave the second
        since = switchPage("spelling", KeyCode.K, "flagList");
        seat.waitUntil("both planted misspellings flagged", () -> flagged(CandidateScript.MISSPELT_1)
                && flagged(CandidateScript.MISSPELT_2));
        clock.advanceMillis(script.dwellMillis(pause++));
        showFlag(CandidateScript.MISSPELT_1);
        clock.advanceMillis(script.dwellMillis(pause++));
        boolean inPanel = true;
        if (script.acceptsFirstSuggestion()) {
            seat.select("suggestionList", CandidateScript.CORRECTED_1);
            seat.focus("suggestionList");
            seat.key(KeyCode.ENTER);
            // a suggestion used from the panel hands the caret back to the answer (issue 13 section 3):
            // the candidate has left the panel until they go back into it
            seat.awaitTask(seat.workspaces.size());
            leftPanel("spelling", since);
            inPanel = false;
        } else {
            seat.press("ignoreSuggestion");
        }
        seat.waitUntil("the first flag gone", () -> !flagged(CandidateScript.MISSPELT_1));
        if (script.ignoresSecond()) {
            clock.advanceMillis(script.dwellMillis(pause++));
            if (!inPanel) {
                since = clock.millis(); // back into the panel, as a click on the flag list would
                inPanel = true;
            }
            showFlag(CandidateScript.MISSPELT_2);
            clock.advanceMillis(script.dwellMillis(pause++));
            seat.press("ignoreSuggestion");
            seat.waitUntil("the second flag gone", () -> !flagged(CandidateScript.MISSPELT_2));
        }
        if (!inPanel) {
            since = clock.millis();
        }
        seat.focus("flagList");
        clock.advanceMillis(script.dwellMillis(pause++));
        backToAnswer();
        leftPanel("spelling", since);
        clock.advanceMillis(1_000);
        long end = clock.millis();
        done.toolsTaskMillis = end - start;
        finishTask();
    }

    /** Goes into the panel on a tool's page with its shortcut; returns the moment focus went in. */
    private long switchPage(String to, KeyCode key, String focusedId) {
        long now = seat.clock.millis();
        seat.shortcut(key);
        seat.waitUntil("#" + focusedId + " focused after the " + to + " shortcut",
                () -> seat.showing(focusedId) && seat.await(focusedId, javafx.scene.Node.class).isFocused());
        return now;
    }

    /** Counts the time in the panel on this page, up to now (focus has just gone back to the answer). */
    private void leftPanel(String page, long since) {
        done.pageInView.merge(page, seat.clock.millis() - since, Long::sum);
    }

    private void backToAnswer() {
        seat.key(KeyCode.ESCAPE);
        seat.awaitTask(seat.workspaces.size());
    }

    private boolean flagged(String word) {
        return seat.items("flagList").stream().anyMatch(i -> i instanceof CheckIssue c
                && word.equals(seat.answerBetween(c.start(), c.end())));
    }

    private void showFlag(String word) {
        seat.selectWhere("flagList", i -> i instanceof CheckIssue c && word.equals(seat.answerBetween(c.start(), c.end())),
                "the flag of \"" + word + "\"");
        seat.focus("flagList");
        seat.key(KeyCode.ENTER);
        seat.waitUntil("suggestions for \"" + word + "\"", () -> !seat.textOf("flagMessage").isEmpty());
    }

    private void finishTask() {
        seat.press("finishTaskButton");
        seat.press("confirmFinishButton");
    }

    private void questionnaireAndHandIn() {
        seat.press("q-tools-helped-" + script.toolsHelped());
        seat.press("q-time-enough-" + script.timeEnough());
        seat.focus("q-comments");
        seat.type(script.comment(), script.msPerChar());
        seat.press("questionnaireDone");
        seat.press("confirmCheck");
        seat.press("submitButton");
        seat.await("finishedScreen", javafx.scene.Node.class);
    }
}
